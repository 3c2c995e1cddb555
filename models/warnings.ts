/**
 * Design warnings for one computed corner, in plain words, each naming the
 * input element to change. Thresholds come from the design's derating
 * policy (policy.ts defaults).
 */
import type { Prepared } from "./evaluateCore";
import type { CornerResult } from "./evaluateReport";
import { formatQuantity as fq } from "./quantityFormat";
import { MIN_ENHANCEMENT_V } from "./policy";

export type WarningCode =
  | "gate-drive-starved"
  | "vgs-over-rating"
  | "drive-headroom-low"
  | "edge-too-slow"
  | "thermal-runaway"
  | "transistor-over-rating"
  | "junction-over-limit";

export interface Warning {
  code: WarningCode;
  severity: "info" | "warning" | "error";
  partId: string;
  cornerId: string;
  message: string;
  element: string;
}

export function cornerWarnings(prep: Prepared, result: CornerResult): Warning[] {
  const out: Warning[] = [];
  const { design } = prep;
  const cornerId = result.cornerId;
  const where = `at corner "${result.label}"`;
  const add = (w: Omit<Warning, "cornerId">) => out.push({ ...w, cornerId });
  const policy = design.derating;

  prep.positions.forEach((pp, i) => {
    const p = pp.position;
    if (p.conduction.mode !== "channel" || p.drive.kind === "none") return;
    const w = prep.work[i];
    const st = w.stage;
    const el = `positions.${i}`;
    for (const [edgeName, e, tPart] of [["turn-on", st.on, `${p.id}.npn`], ["turn-off", st.off, `${p.id}.pnp`]] as const) {
      if (!e.starved) continue;
      add({
        code: "gate-drive-starved", severity: "warning", partId: tPart,
        message: `${p.id} ${edgeName}: the buffer transistor's gain falls to hFE ≈ ${Math.round(e.hfe ?? 0)} at ` +
          `${fq(e.iPeak, "current")} (from ${Math.round(e.hfeNominal ?? 0)} at low current), so the gate gets only ` +
          `${fq(e.iPlateau, "current")} on the Miller plateau ${where}. Edges slow down and switching loss rises. ` +
          `Use a transistor that keeps its gain at this current, or give the bases more current.`,
        element: `${el}.drive.${edgeName === "turn-on" ? "npn" : "pnp"}.hfe`,
      });
    }
    const m = p.mosfet;
    const allowed = policy.vgsMaxFraction * m.vgsMax;
    const worstVgs = Math.max(st.vHigh, -st.vLow);
    if (worstVgs > allowed) {
      const level = st.vHigh >= -st.vLow ? st.vHigh : st.vLow;
      add({
        code: "vgs-over-rating", severity: worstVgs > m.vgsMax ? "error" : "warning", partId: p.id,
        message: `${p.id} gate reaches ${fq(level, "voltage")} ${where}` +
          (st.windingHigh !== null && !("clamp" in p.drive && p.drive.clamp) ? ` (the winding follows Vin = ${fq(result.vin, "voltage")})` : "") +
          `, beyond ${Math.round(policy.vgsMaxFraction * 100)} % of its ±${fq(m.vgsMax, "voltage")} rating. ` +
          (p.drive.kind === "self-driven" ? "Add or lower a clamp on the drive winding." : "Lower the drive voltage."),
        element: st.levelElement,
      });
    }
    const headroom = st.vHigh - m.vpl;
    if (headroom < policy.minHeadroomAbovePlateau) {
      const dead = headroom < MIN_ENHANCEMENT_V;
      add({
        code: "drive-headroom-low", severity: dead ? "error" : "warning", partId: p.id,
        message: dead
          ? `${p.id} gate only reaches ${fq(st.vHigh, "voltage")} ${where}, not above its ${fq(m.vpl, "voltage")} Miller plateau: the switch never turns fully on.`
          : `${p.id} gate reaches ${fq(st.vHigh, "voltage")} ${where}, only ${fq(headroom, "voltage")} above its plateau ` +
            `(policy: ${fq(policy.minHeadroomAbovePlateau, "voltage")}); Rds(on) will be above its rated value and turn-on slower.`,
        element: st.levelElement,
      });
    }
    for (const [name, e] of [["turn-on", w.turnOn], ["turn-off", w.turnOff]] as const) {
      if (!e?.capped) continue;
      add({
        code: "edge-too-slow", severity: "error", partId: p.id,
        message: `${p.id} ${name} would take longer than half a switching period ${where}: the gate current on the plateau is too small. The loss shown is capped and not trustworthy.`,
        element: `${el}.gate.${name === "turn-on" ? "rTurnOn" : "rTurnOff"}`,
      });
    }
    for (const t of st.transistors) {
      const part = result.parts.find((x) => x.id === t.part);
      if (t.icMax !== null && t.icPeak > t.icMax)
        add({
          code: "transistor-over-rating", severity: "error", partId: t.part,
          message: `${t.part} peak collector current ${fq(t.icPeak, "current")} exceeds its ${fq(t.icMax, "current")} rating ${where}.`,
          element: `${t.element}.icMax`,
        });
      if (t.pMax !== null && part && part.total > t.pMax)
        add({
          code: "transistor-over-rating", severity: "error", partId: t.part,
          message: `${t.part} dissipates ${fq(part.total, "power")}, above its ${fq(t.pMax, "power")} rating ${where}.`,
          element: `${t.element}.pMax`,
        });
    }
  });

  result.parts.forEach((part, i) => {
    const j = part.junction;
    const def = prep.parts[i];
    if (!j || !def.junction) return;
    if (j.runaway) {
      // Report at the parts whose loss rises with temperature (the loop), else at the part.
      if (def.kind === "mosfet" || !result.parts.some((q, k) => q.junction?.runaway && prep.parts[k].kind === "mosfet"))
        add({
          code: "thermal-runaway", severity: "error", partId: part.id,
          message: `${part.id} has no thermal steady state ${where}: each degree of heating raises its loss enough to heat it by a degree or more (loop gain dP/dT·Θ ≥ 1). Lower its thermal resistance or its current.`,
          element: def.junction.thermalElement,
        });
      return;
    }
    // A transistor past its own Tj(max) is over its rating; otherwise a derating miss.
    const transistorOver = (def.kind === "bjt" || def.kind === "clamp") && j.tj > j.tjMax;
    if (j.margin < 0)
      add({
        code: transistorOver ? "transistor-over-rating" : "junction-over-limit", severity: j.tj > j.tjMax ? "error" : "warning", partId: part.id,
        message: `${part.id} junction reaches ${fq(j.tj, "temperature")} ${where}, ${fq(-j.margin, "temperatureDifference")} over its derated limit of ${fq(j.limit, "temperature")} (Tj max ${fq(j.tjMax, "temperature")}).`,
        element: def.junction.thermalElement,
      });
  });
  return out;
}
