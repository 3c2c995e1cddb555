import { demoOptions } from "@/models/demo";
import type { DriveKind } from "./fields";

/**
 * A starting drive block when the user switches a position to another kind
 * of drive: the one the worked templates use for that kind (so the fields
 * start filled with a coherent set), else the minimum the schema needs.
 */
export function defaultDrive(kind: DriveKind): Record<string, unknown> {
  for (const o of demoOptions)
    for (const p of o.input.positions ?? []) {
      const drive = p.drive as Record<string, unknown>;
      if (drive.kind === kind) return structuredClone(drive);
    }
  if (kind === "bjt-follower") return { kind, npn: { hfe: [{ ic: "0.1 A", hfe: 100 }], icMax: "1 A", pMax: "0.5 W", rthJA: "250 K/W" }, pnp: { hfe: [{ ic: "0.1 A", hfe: 100 }], icMax: "1 A", pMax: "0.5 W", rthJA: "250 K/W" } };
  if (kind === "driver-ic") return { kind, sourceResistance: "2 Ω", sinkResistance: "1 Ω", rthJA: "150 K/W" };
  if (kind === "transformer") return { kind, mode: "ac-coupled", turnsRatio: 1 };
  if (kind === "self-driven") return { kind, winding: { ref: "vout", vHigh: "10 V" } };
  return { kind };
}

/** A starting self-driven clamp, as the templates have it. */
export function defaultClamp(): Record<string, unknown> {
  for (const o of demoOptions)
    for (const p of o.input.positions ?? []) {
      const drive = p.drive as Record<string, unknown>;
      if (drive.kind === "self-driven" && drive.clamp) return structuredClone(drive.clamp as Record<string, unknown>);
    }
  return { zenerVoltage: "12 V", zenerBiasCurrent: "2 mA", rthJA: "250 K/W" };
}
