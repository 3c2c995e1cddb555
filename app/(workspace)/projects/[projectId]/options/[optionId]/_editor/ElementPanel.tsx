"use client";

import { Button } from "@/components/ui";
import { partSlots } from "@/lib/parts/slots";
import { useEditor } from "./EditorContext";
import { DriveSection } from "./DriveSection";
import { FieldGrid } from "./FieldGrid";
import { PartPicker } from "./PartPicker";
import { RowsTable } from "./RowsTable";
import { CONDUCTION_FIELDS, CONTROLLER_FIELDS, GATE_FIELDS, MOSFET_FIELDS, POINT_COLUMNS, POSITION_FIELDS } from "./fields";

const TITLES: Record<string, string> = { drive: "Drive stage", gate: "Gate network", mosfet: "Switch (MOSFET)", conduction: "Waveforms at full load" };

/** The editing form of the element selected in the diagram. */
export function ElementPanel({ selected, onRemovePosition }: { selected: string; onRemovePosition: (index: number) => void }) {
  const ed = useEditor();
  const m = /^positions\.(\d+)(?:\.(drive|gate|mosfet|conduction))?$/.exec(selected);
  const slots = m && !m[2] ? [] : partSlots(ed.doc).filter((s) => s.target === selected || s.target.startsWith(`${selected}.`));
  const position = m ? (ed.get(`positions.${m[1]}`) as Record<string, unknown> | undefined) : undefined;
  const title = selected === "controller" ? "Controller" : m ? `${String(position?.id ?? "")} · ${m[2] ? TITLES[m[2]] : "Position"}` : selected;
  return (
    <section aria-label={`Edit ${title}`} className="flex flex-col gap-4">
      <h3 className="text-base font-semibold text-ink">{title}</h3>
      {slots.map((s) => (
        <PartPicker key={s.ref} slot={s} />
      ))}
      {selected === "controller" && <FieldGrid base="controller" fields={CONTROLLER_FIELDS} />}
      {m && !m[2] && (
        <>
          <FieldGrid base={selected} fields={POSITION_FIELDS} />
          {!ed.readOnly && ((ed.get("positions") as unknown[]).length ?? 0) > 1 && (
            <div>
              <Button variant="danger" size="sm" onClick={() => onRemovePosition(Number(m[1]))}>
                Remove this position
              </Button>
            </div>
          )}
        </>
      )}
      {m?.[2] === "drive" && <DriveSection path={selected} />}
      {m?.[2] === "gate" && <GateNetwork path={selected} />}
      {m?.[2] === "mosfet" && <FieldGrid base={selected} fields={MOSFET_FIELDS} />}
      {m?.[2] === "conduction" && (
        <>
          <FieldGrid base={selected} fields={CONDUCTION_FIELDS} />
          <p className="text-sm text-ink-soft">
            One row per input voltage, at full load, in rising Vin. At each corner the values are interpolated in Vin and currents scaled by the corner&apos;s load.
          </p>
          <RowsTable path={`${selected}.points`} caption="Waveform points" columns={POINT_COLUMNS} minRows={1} newRow={() => ({})} />
        </>
      )}
    </section>
  );
}

function GateNetwork({ path }: { path: string }) {
  const ed = useEditor();
  const diode = ed.get(`${path}.steeringDiode`);
  return (
    <div className="flex flex-col gap-3">
      <FieldGrid base={path} fields={GATE_FIELDS} />
      <label className="flex items-center gap-2 text-sm text-ink">
        <input type="checkbox" checked={diode !== undefined} disabled={ed.readOnly} onChange={(e) => ed.set(`${path}.steeringDiode`, e.target.checked ? {} : undefined)} />
        Steering diode: rTurnOff with a diode across rTurnOn speeds up turn-off
      </label>
      {diode !== undefined && <FieldGrid base={`${path}.steeringDiode`} fields={[{ key: "vf", label: "Diode Vf", type: "qty", dim: "voltage", hint: "default 0.7 V" }]} />}
    </div>
  );
}
