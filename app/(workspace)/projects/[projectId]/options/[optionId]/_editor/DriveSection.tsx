"use client";

import { Button, Select } from "@/components/ui";
import { useEditor } from "./EditorContext";
import { FieldGrid } from "./FieldGrid";
import { RowsTable } from "./RowsTable";
import { defaultClamp, defaultDrive } from "./driveDefaults";
import {
  BJT_FIELDS,
  CLAMP_FIELDS,
  DRIVE_KIND_LABELS,
  DRIVE_KINDS,
  DRIVER_IC_FIELDS,
  FOLLOWER_FIELDS,
  HFE_COLUMNS,
  SELF_DRIVEN_FIELDS,
  TRANSFORMER_FIELDS,
  WINDING_FIELDS,
  type DriveKind,
} from "./fields";

function SubBlock({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="flex flex-col gap-3 border-t border-paper-line pt-3">
      <h4 className="text-sm font-semibold text-ink">{title}</h4>
      {children}
    </section>
  );
}

function Transistor({ path, title }: { path: string; title: string }) {
  return (
    <SubBlock title={title}>
      <FieldGrid base={path} fields={BJT_FIELDS} />
      <RowsTable path={`${path}.hfe`} caption={`${title} hFE(Ic)`} columns={HFE_COLUMNS} newRow={() => ({ ic: "", hfe: "" })} minRows={1} />
    </SubBlock>
  );
}

/** The drive stage of one position: what carries the gate current, and its datasheet values. */
export function DriveSection({ path }: { path: string }) {
  const ed = useEditor();
  const drive = (ed.get(path) as Record<string, unknown> | undefined) ?? {};
  const kind = (drive.kind as DriveKind | undefined) ?? "direct";
  const windingRef = ((drive.winding as Record<string, unknown> | undefined)?.ref as "vin" | "vout" | undefined) ?? "vout";
  return (
    <div className="flex flex-col gap-4">
      <Select
        id={`doc-${path.replace(/\./g, "-")}-kind`}
        name=""
        label="Drive stage"
        value={kind}
        disabled={ed.readOnly}
        error={ed.issues[`${path}.kind`]}
        hint="Switching the kind starts from the template values for that kind."
        options={DRIVE_KINDS.map((k) => ({ value: k, label: DRIVE_KIND_LABELS[k] }))}
        onChange={(e) => ed.set(path, defaultDrive(e.target.value as DriveKind))}
        fieldClassName="max-w-sm"
      />
      {kind === "direct" && <p className="text-sm text-ink-soft">The controller&apos;s own pin charges the gate: all of the gate power is burnt in the pin, the gate resistors and Rg(int).</p>}
      {kind === "none" && <p className="text-sm text-ink-soft">The channel is never driven; the device conducts through its body diode.</p>}
      {kind === "bjt-follower" && (
        <>
          <FieldGrid base={path} fields={FOLLOWER_FIELDS} />
          <Transistor path={`${path}.npn`} title="NPN (source)" />
          <Transistor path={`${path}.pnp`} title="PNP (sink)" />
        </>
      )}
      {kind === "driver-ic" && <FieldGrid base={path} fields={DRIVER_IC_FIELDS} />}
      {kind === "transformer" && (
        <>
          <FieldGrid base={path} fields={TRANSFORMER_FIELDS} />
          <SubBlock title="Primary driver IC">
            {drive.driver ? (
              <>
                <FieldGrid base={`${path}.driver`} fields={DRIVER_IC_FIELDS} />
                {!ed.readOnly && <Button size="sm" variant="ghost" onClick={() => ed.set(`${path}.driver`, undefined)}>Drive the primary from the controller pin instead</Button>}
              </>
            ) : (
              <>
                <p className="text-sm text-ink-soft">The controller pin drives the primary.</p>
                {!ed.readOnly && <Button size="sm" variant="secondary" onClick={() => ed.set(`${path}.driver`, stripKind(defaultDrive("driver-ic")))}>Add a driver IC on the primary</Button>}
              </>
            )}
          </SubBlock>
        </>
      )}
      {kind === "self-driven" && (
        <>
          <Select
            id={`doc-${path.replace(/\./g, "-")}-winding-ref`}
            name=""
            label="Winding reference"
            value={windingRef}
            disabled={ed.readOnly}
            options={[{ value: "vin", label: "Scales with Vin (k · Vin)" }, { value: "vout", label: "Fixed levels from the output" }]}
            onChange={(e) => ed.set(`${path}.winding`, e.target.value === "vin" ? { ref: "vin", k: 0.2 } : { ref: "vout", vHigh: "10 V" })}
            fieldClassName="max-w-sm"
          />
          <FieldGrid base={`${path}.winding`} fields={WINDING_FIELDS[windingRef]} />
          <FieldGrid base={path} fields={SELF_DRIVEN_FIELDS} />
          <SubBlock title="Zener-referenced clamp">
            {drive.clamp ? (
              <>
                <FieldGrid base={`${path}.clamp`} fields={CLAMP_FIELDS} />
                {!ed.readOnly && <Button size="sm" variant="ghost" onClick={() => ed.set(`${path}.clamp`, undefined)}>Remove the clamp</Button>}
              </>
            ) : (
              !ed.readOnly && <Button size="sm" variant="secondary" onClick={() => ed.set(`${path}.clamp`, defaultClamp())}>Add a clamp</Button>
            )}
          </SubBlock>
        </>
      )}
    </div>
  );
}

function stripKind(block: Record<string, unknown>): Record<string, unknown> {
  const { kind: _kind, ...rest } = block;
  void _kind;
  return rest;
}
