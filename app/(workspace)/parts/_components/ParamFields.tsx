"use client";

import { Select } from "@/components/ui";
import { PART_KIND_DEFS, TOLERANCE_LABELS, type PartKind } from "@/lib/parts/kinds";
import { DIMENSIONS } from "@/models/input/units";
import { QuantityField } from "./QuantityField";
import { normaliseParam, normaliseTolerance } from "./normalise";

export interface ParamFieldsProps {
  kind: PartKind;
  params: Record<string, string>;
  tolerance: Record<string, string>;
  errors: Record<string, string>;
  onParam: (key: string, text: string) => void;
  onTolerance: (key: string, text: string) => void;
}

function exampleOf(field: (typeof PART_KIND_DEFS)[PartKind]["fields"][number]): string | undefined {
  if (field.type === "qty") return `e.g. ${DIMENSIONS[field.dim].example}`;
  if (field.type === "voltSecond") return "e.g. 25 V·µs";
  if (field.type === "hfeCurve") return "e.g. 10 mA: 200; 0.5 A: 150; 2 A: 80";
  return undefined;
}

/** The datasheet figures of one part kind, then its tolerances. */
export function ParamFields({ kind, params, tolerance, errors, onParam, onTolerance }: ParamFieldsProps) {
  const def = PART_KIND_DEFS[kind];
  return (
    <>
      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="mb-2 text-sm font-semibold text-ink">Datasheet figures</legend>
        {def.fields.map((f) =>
          f.type === "enum" ? (
            <Select
              key={f.key}
              name={`param.${f.key}`}
              label={f.label}
              optional={!f.required}
              value={params[f.key] ?? ""}
              placeholder={f.required ? "Choose" : "Not given"}
              options={f.options.map((o) => ({ value: o, label: o.toUpperCase() }))}
              error={errors[`params.${f.key}`]}
              onChange={(e) => onParam(f.key, e.target.value)}
            />
          ) : (
            <QuantityField
              key={f.key}
              name={`param.${f.key}`}
              label={f.label}
              optional={!f.required}
              value={params[f.key] ?? ""}
              hint={f.hint}
              placeholder={exampleOf(f)}
              error={errors[`params.${f.key}`]}
              normalise={(t) => normaliseParam(f, t)}
              onChange={(t) => onParam(f.key, t)}
            />
          ),
        )}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <legend className="mb-2 text-sm font-semibold text-ink">Part spread (for the Monte Carlo run)</legend>
        {def.tolerances.map((k) => (
          <QuantityField
            key={k}
            name={`tol.${k}`}
            label={TOLERANCE_LABELS[k]}
            optional
            value={tolerance[k] ?? ""}
            placeholder="e.g. 10 %"
            hint="± relative, 0.1 or 10 %"
            error={errors[`tolerance.${k}`]}
            normalise={normaliseTolerance}
            onChange={(t) => onTolerance(k, t)}
          />
        ))}
      </fieldset>
    </>
  );
}
