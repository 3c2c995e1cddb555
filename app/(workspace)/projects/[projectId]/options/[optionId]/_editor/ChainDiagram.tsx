"use client";

import type { ReactNode } from "react";
import { cx } from "@/components/ui";
import { issuesUnder, useEditor } from "./EditorContext";
import { displayQuantity } from "./QuantityInput";
import { DRIVE_KIND_LABELS, type DriveKind } from "./fields";

type Rec = Record<string, unknown>;

/**
 * The gate-drive chain of every switch position, as linked blocks:
 * source (controller pin, or the winding of a self-driven SR) -> drive
 * stage -> gate network -> switch. Each block selects its element for
 * editing; a red count marks the issues found inside it.
 */
export function ChainDiagram({ selected, onSelect }: { selected: string; onSelect: (path: string) => void }) {
  const ed = useEditor();
  const positions = (ed.get("positions") as Rec[] | undefined) ?? [];
  const controller = (ed.get("controller") as Rec | undefined) ?? {};
  return (
    <ol className="flex flex-col gap-5" aria-label="Gate-drive chains">
      {positions.map((p, i) => {
        const at = `positions.${i}`;
        const drive = (p.drive as Rec | undefined) ?? {};
        const kind = (drive.kind as DriveKind | undefined) ?? "direct";
        const gate = (p.gate as Rec | undefined) ?? {};
        const mosfet = (p.mosfet as Rec | undefined) ?? {};
        const selfDriven = kind === "self-driven";
        const block = (path: string, title: string, lines: ReactNode[], tone: "source" | "stage" | "network" | "switch") => (
          <Block path={path} title={title} lines={lines} tone={tone} selected={selected === path} issues={issuesUnder(ed.issues, path)} onSelect={onSelect} />
        );
        return (
          <li key={i} className="flex flex-col gap-2">
            <div className="flex flex-wrap items-center gap-2">
              <button
                type="button"
                onClick={() => onSelect(at)}
                aria-pressed={selected === at}
                className={cx("rounded px-1 text-sm font-semibold", selected === at ? "text-copper-700 underline" : "text-ink hover:text-copper-700")}
              >
                {String(p.id ?? `#${i + 1}`)} <span className="font-normal text-ink-soft">· {String(p.role ?? "")}{p.label ? ` · ${String(p.label)}` : ""}</span>
                {issuesUnder(ed.issues, at) > 0 && <span className="sr-only"> (has issues)</span>}
              </button>
              <button
                type="button"
                onClick={() => onSelect(`${at}.conduction`)}
                aria-pressed={selected === `${at}.conduction`}
                data-block={`${at}.conduction`}
                className={cx(
                  "rounded-full border px-2.5 py-0.5 font-mono text-xs",
                  selected === `${at}.conduction` ? "border-copper-500 bg-copper-50 text-copper-700" : "border-paper-line text-ink-soft hover:border-copper-300",
                  issuesUnder(ed.issues, `${at}.conduction`) > 0 && "border-alarm-500 text-alarm-700",
                )}
              >
                waveforms: {((p.conduction as Rec | undefined)?.points as unknown[] | undefined)?.length ?? 0} Vin points, {String((p.conduction as Rec | undefined)?.switching ?? "hard")}
              </button>
            </div>
            <div className="flex flex-wrap items-stretch gap-y-3">
              {selfDriven
                ? block(`${at}.drive`, "Drive winding", [String((drive.winding as Rec | undefined)?.ref === "vin" ? "k · Vin" : "fixed levels")], "source")
                : block("controller", "Controller", [String(controller.partNumber ?? "PWM controller"), `Vcc ${displayQuantity(controller.vcc, "voltage")}`], "source")}
              <Link label={selfDriven ? "Vw" : "PWM"} />
              {block(`${at}.drive`, "Drive stage", [DRIVE_KIND_LABELS[kind], ...driveParts(drive)], "stage")}
              <Link label="Ig" />
              {block(`${at}.gate`, "Gate network", [`on ${displayQuantity(gate.rTurnOn, "resistance")}`, `off ${gate.rTurnOff !== undefined ? displayQuantity(gate.rTurnOff, "resistance") : "= on"}${gate.steeringDiode ? " + diode" : ""}`], "network")}
              <Link label="Vgs" />
              {block(`${at}.mosfet`, `Switch ${String(p.id ?? "")}`, [String(mosfet.partNumber ?? "MOSFET") + (Number(mosfet.count ?? 1) > 1 ? ` ×${String(mosfet.count)}` : ""), `Qg ${displayQuantity(mosfet.qg, "charge")}`], "switch")}
            </div>
          </li>
        );
      })}
    </ol>
  );
}

function driveParts(drive: Rec): string[] {
  const pn = (x: unknown) => ((x as Rec | undefined)?.partNumber as string | undefined) ?? null;
  if (drive.kind === "bjt-follower") return [[pn(drive.npn), pn(drive.pnp)].filter(Boolean).join(" / ") || "NPN / PNP"];
  if (drive.kind === "driver-ic") return [pn(drive) ?? "driver IC"];
  if (drive.kind === "transformer") return [`n = ${displayQuantity(drive.turnsRatio, "ratio")}`, String(drive.mode ?? "")];
  if (drive.kind === "self-driven") return [drive.clamp ? "with zener clamp" : "no clamp"];
  return [];
}

const TONES = {
  source: "border-slateblue-300 bg-slateblue-50",
  stage: "border-copper-300 bg-copper-50",
  network: "border-paper-edge/50 bg-paper-raised",
  switch: "border-verdigris-300 bg-verdigris-50",
};

function Block({ path, title, lines, tone, selected, issues, onSelect }: { path: string; title: string; lines: ReactNode[]; tone: keyof typeof TONES; selected: boolean; issues: number; onSelect: (p: string) => void }) {
  return (
    <button
      type="button"
      onClick={() => onSelect(path)}
      aria-pressed={selected}
      data-block={path}
      className={cx(
        "relative flex min-w-36 flex-col items-start gap-0.5 rounded-panel border-2 px-3 py-2 text-left shadow-panel transition-shadow",
        TONES[tone],
        selected ? "ring-2 ring-copper-500 ring-offset-2 ring-offset-paper" : "hover:shadow-lift",
      )}
    >
      {/* pads on the block's edges: where the traces land */}
      <span aria-hidden="true" className="absolute top-1/2 -left-1.5 h-2.5 w-1.5 -translate-y-1/2 rounded-l-sm bg-copper-300" />
      <span aria-hidden="true" className="absolute top-1/2 -right-1.5 h-2.5 w-1.5 -translate-y-1/2 rounded-r-sm bg-copper-300" />
      <span className="text-xs font-semibold tracking-wide text-ink-soft uppercase">{title}</span>
      {lines.map((l, i) => (
        <span key={i} className={cx("font-mono text-xs", i === 0 ? "text-sm text-ink" : "text-ink-soft")}>
          {l}
        </span>
      ))}
      {issues > 0 && (
        <span className="absolute -top-2 -right-2 rounded-full bg-alarm-700 px-1.5 text-xs font-semibold text-white" aria-label={`${issues} issue${issues > 1 ? "s" : ""}`}>
          {issues}
        </span>
      )}
    </button>
  );
}

/** A trace between two blocks, with the signal it carries. */
function Link({ label }: { label: string }) {
  return (
    <span aria-hidden="true" className="flex w-14 flex-col items-center justify-center self-center">
      <span className="font-mono text-[10px] text-ink-faint">{label}</span>
      <svg viewBox="0 0 56 10" className="h-2.5 w-14 text-copper-500">
        <line x1="2" y1="5" x2="48" y2="5" stroke="currentColor" strokeWidth="2" />
        <circle cx="3" cy="5" r="2" fill="currentColor" />
        <path d="M46 1 54 5 46 9z" fill="currentColor" />
      </svg>
    </span>
  );
}
