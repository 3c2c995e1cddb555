"use client";

import { useState } from "react";
import { Button, Select, TextInput, Textarea } from "@/components/ui";
import { PROJECT_STATUSES, STATUS_LABELS, TOPOLOGIES, TOPOLOGY_LABELS } from "@/lib/projects/schema";

/** Form text for every project field, as the inputs hold it. */
export interface ProjectFormText {
  name: string;
  topology: string;
  vinMin: string;
  vinNom: string;
  vinMax: string;
  fsw: string;
  ambientMax: string;
  efficiencyTarget: string;
  status: string;
  notes: string;
  outputs: { label: string; voltage: string; current: string }[];
}

export const EMPTY_PROJECT_TEXT: ProjectFormText = {
  name: "",
  topology: "",
  vinMin: "",
  vinNom: "",
  vinMax: "",
  fsw: "",
  ambientMax: "",
  efficiencyTarget: "",
  status: "concept",
  notes: "",
  outputs: [{ label: "Main", voltage: "", current: "" }],
};

const MAX_OUTPUTS = 8;

/**
 * The project fields, uncontrolled except the output rows (sent as one JSON
 * field "outputs", which the shared schema reads). Errors are keyed by the
 * schema's paths ("vinNom", "outputs.0.voltage").
 */
export function ProjectFields({ initial, errors, disabled }: { initial: ProjectFormText; errors: Record<string, string>; disabled?: boolean }) {
  const [outputs, setOutputs] = useState(initial.outputs.length ? initial.outputs : EMPTY_PROJECT_TEXT.outputs);
  const setOutput = (i: number, key: "label" | "voltage" | "current", value: string) =>
    setOutputs((rows) => rows.map((r, j) => (j === i ? { ...r, [key]: value } : r)));
  return (
    <fieldset disabled={disabled} className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      <TextInput name="name" label="Project name" defaultValue={initial.name} error={errors.name} fieldClassName="sm:col-span-2" required />
      <Select
        name="topology"
        label="Topology"
        defaultValue={initial.topology}
        error={errors.topology}
        placeholder="Choose a topology"
        options={TOPOLOGIES.map((t) => ({ value: t, label: TOPOLOGY_LABELS[t] }))}
      />
      <TextInput name="vinMin" label="Vin min" hint="V, or with a unit" inputMode="decimal" defaultValue={initial.vinMin} error={errors.vinMin} />
      <TextInput name="vinNom" label="Vin nom" hint="V" inputMode="decimal" defaultValue={initial.vinNom} error={errors.vinNom} />
      <TextInput name="vinMax" label="Vin max" hint="V" inputMode="decimal" defaultValue={initial.vinMax} error={errors.vinMax} />
      <TextInput name="fsw" label="Switching frequency" hint='Hz, or e.g. "250 kHz"' defaultValue={initial.fsw} error={errors.fsw} />
      <TextInput name="ambientMax" label="Max ambient" hint="°C" inputMode="decimal" defaultValue={initial.ambientMax} error={errors.ambientMax} />
      <TextInput
        name="efficiencyTarget"
        label="Efficiency target"
        hint='e.g. "92 %" or 0.92'
        optional
        defaultValue={initial.efficiencyTarget}
        error={errors.efficiencyTarget}
      />
      <Select
        name="status"
        label="Status"
        defaultValue={initial.status}
        error={errors.status}
        options={PROJECT_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))}
      />
      <div className="sm:col-span-2 lg:col-span-3">
        <input type="hidden" name="outputs" value={JSON.stringify(outputs)} />
        <p className="mb-1.5 text-sm font-medium text-ink">Outputs</p>
        {errors.outputs && <p className="mb-2 text-xs font-medium text-alarm-700">{errors.outputs}</p>}
        <div className="flex flex-col gap-3">
          {outputs.map((o, i) => (
            <div key={i} className="grid grid-cols-[1fr_1fr_1fr_auto] items-start gap-3">
              <TextInput id={`out-${i}-label`} name="" label={`Output ${i + 1} name`} value={o.label} onChange={(e) => setOutput(i, "label", e.target.value)} error={errors[`outputs.${i}.label`]} />
              <TextInput id={`out-${i}-voltage`} name="" label="Voltage" hint="V" value={o.voltage} onChange={(e) => setOutput(i, "voltage", e.target.value)} error={errors[`outputs.${i}.voltage`]} />
              <TextInput id={`out-${i}-current`} name="" label="Current" hint="A" value={o.current} onChange={(e) => setOutput(i, "current", e.target.value)} error={errors[`outputs.${i}.current`]} />
              <Button variant="ghost" size="sm" className="mt-7" disabled={outputs.length <= 1} onClick={() => setOutputs((rows) => rows.filter((_, j) => j !== i))} aria-label={`Remove output ${i + 1}`}>
                Remove
              </Button>
            </div>
          ))}
        </div>
        {outputs.length < MAX_OUTPUTS && (
          <Button variant="secondary" size="sm" className="mt-2" onClick={() => setOutputs((rows) => [...rows, { label: "", voltage: "", current: "" }])}>
            Add output
          </Button>
        )}
      </div>
      <Textarea name="notes" label="Notes" optional defaultValue={initial.notes} error={errors.notes} fieldClassName="sm:col-span-2 lg:col-span-3" rows={3} />
    </fieldset>
  );
}

/** The form's values for the shared schema (the output rows have no name: they travel as the one "outputs" field). */
export function projectFormObject(form: HTMLFormElement): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  new FormData(form).forEach((v, k) => {
    if (typeof v === "string") out[k] = v;
  });
  return out;
}
