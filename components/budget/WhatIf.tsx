"use client";

import { useState } from "react";
import { Button, FormMessage, cx, formatSi } from "@/components/ui";
import { knobRanges, type KnobTargets, type Knobs } from "./trialEdits";

type KnobKey = keyof Knobs;

interface KnobSpec {
  key: KnobKey;
  label: string;
  unit: string;
  /** Display factor: the number field shows value / scale in `fieldUnit`. */
  scale: number;
  fieldUnit: string;
  help: string;
}

function specs(t: KnobTargets): KnobSpec[] {
  return [
    { key: "fsw", label: "Switching frequency", unit: "Hz", scale: 1e3, fieldUnit: "kHz", help: "First corner's value; every corner scales by the same factor." },
    { key: "rOn", label: `${t.positionId} gate resistor (turn-on)`, unit: "Ω", scale: 1, fieldUnit: "Ω", help: "A separate turn-off resistor scales with it." },
    {
      key: "driveVoltage",
      label: `${t.positionId} drive voltage`,
      unit: "V",
      scale: 1,
      fieldUnit: "V",
      help: t.driveElement ? `Sets ${t.driveElement}.` : "This gate is driven from a winding: no drive rail to set.",
    },
    { key: "ambient", label: "Ambient, hottest corner", unit: "°C", scale: 1, fieldUnit: "°C", help: "Every corner shifts by the same amount." },
  ];
}

export interface WhatIfProps {
  knobs: Knobs;
  original: Knobs;
  targets: KnobTargets;
  positions: readonly { index: number; id: string; label: string }[];
  onKnobs: (k: Knobs) => void;
  onPosition: (index: number) => void;
  onReset: () => void;
  changed: boolean;
  /** Issues when the trial document does not parse (e.g. a value out of range). */
  issues: readonly string[];
  canSave: boolean;
  onSave: (note: string) => Promise<{ ok: boolean; message: string }>;
}

/** Trial knobs: the dashboard above re-evaluates at once, in the browser, with the same model. */
export function WhatIf(p: WhatIfProps) {
  const ranges = knobRanges(p.original);
  const [note, setNote] = useState("");
  const [saving, setSaving] = useState(false);
  const [result, setResult] = useState<{ ok: boolean; message: string } | null>(null);

  return (
    <div className="flex flex-col gap-4">
      {p.positions.length > 1 && (
        <label className="flex items-center gap-3 text-sm">
          <span className="font-medium">Gate to adjust</span>
          <select
            className="h-9 rounded-md border border-paper-edge bg-paper-raised px-2"
            value={p.targets.positionIndex}
            onChange={(e) => p.onPosition(Number(e.target.value))}
          >
            {p.positions.map((o) => (
              <option key={o.index} value={o.index}>
                {o.id} · {o.label}
              </option>
            ))}
          </select>
        </label>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        {specs(p.targets).map((s) => {
          const value = p.knobs[s.key];
          const r = ranges[s.key];
          const disabled = value === null;
          const id = `whatif-${s.key}`;
          const moved = value !== p.original[s.key];
          return (
            <div key={s.key} className={cx("rounded-md border px-3 py-2.5", moved ? "border-copper-300 bg-copper-50/50" : "border-paper-line")}>
              <div className="flex items-baseline justify-between gap-3">
                <label htmlFor={id} className="text-sm font-medium text-ink">
                  {s.label}
                </label>
                <span className="font-mono text-xs text-ink-soft">
                  design {p.original[s.key] === null ? "—" : formatSi(p.original[s.key] as number, s.unit, 4)}
                </span>
              </div>
              <div className="mt-2 flex items-center gap-3">
                <input
                  id={id}
                  type="range"
                  data-knob={s.key}
                  className="h-2 flex-1 accent-copper-600"
                  min={r.min}
                  max={r.max}
                  step={r.step}
                  value={value ?? r.min}
                  disabled={disabled}
                  onChange={(e) => p.onKnobs({ ...p.knobs, [s.key]: Number(e.target.value) })}
                />
                <span className="relative">
                  <input
                    aria-label={`${s.label} in ${s.fieldUnit}`}
                    type="number"
                    data-knob-field={s.key}
                    className="h-8 w-24 rounded-md border border-paper-edge bg-paper-raised pr-9 pl-2 text-right font-mono text-sm"
                    step="any"
                    value={value === null ? "" : Number((value / s.scale).toPrecision(5))}
                    disabled={disabled}
                    onChange={(e) => {
                      const v = Number(e.target.value);
                      if (e.target.value !== "" && Number.isFinite(v)) p.onKnobs({ ...p.knobs, [s.key]: v * s.scale });
                    }}
                  />
                  <span className="pointer-events-none absolute inset-y-0 right-2 flex items-center font-mono text-xs text-ink-soft">{s.fieldUnit}</span>
                </span>
              </div>
              <p className="mt-1 text-xs text-ink-faint">{s.help}</p>
            </div>
          );
        })}
      </div>
      {p.issues.length > 0 && (
        <FormMessage tone="error">
          The trial values do not make a valid design: {p.issues.join("; ")}
        </FormMessage>
      )}
      <div className="flex flex-wrap items-end gap-3 border-t border-paper-line pt-3">
        <Button variant="secondary" size="sm" onClick={p.onReset} disabled={!p.changed}>
          Back to the saved design
        </Button>
        {p.canSave && (
          <>
            <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm">
              <span className="font-medium">Note for the new revision</span>
              <input
                className="h-9 rounded-md border border-paper-edge bg-paper-raised px-2"
                value={note}
                maxLength={500}
                placeholder="e.g. gate resistor 3.3 Ω after the trial"
                onChange={(e) => setNote(e.target.value)}
              />
            </label>
            <Button
              size="sm"
              disabled={!p.changed || p.issues.length > 0 || saving}
              onClick={async () => {
                setSaving(true);
                setResult(await p.onSave(note || "Saved from the what-if trial"));
                setSaving(false);
              }}
            >
              {saving ? "Saving…" : "Save as new revision"}
            </Button>
          </>
        )}
      </div>
      {result && <FormMessage tone={result.ok ? "success" : "error"} message={result.message} />}
    </div>
  );
}
