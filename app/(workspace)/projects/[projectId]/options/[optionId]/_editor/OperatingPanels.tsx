"use client";

import { Panel } from "@/components/ui";
import { FieldGrid } from "./FieldGrid";
import { RowsTable } from "./RowsTable";
import { CORNER_COLUMNS, COUPLING_COLUMNS, DERATING_FIELDS, DOCUMENT_FIELDS } from "./fields";

/** Corners, board coupling and the derating policy: the parts of the document outside the chains. */
export function OperatingPanels() {
  return (
    <>
      <div id="panel-name">
        <Panel title="Design document" description="The name the budget and reports carry; the option's own name is in the page title.">
          <FieldGrid base="" fields={DOCUMENT_FIELDS} />
        </Panel>
      </div>
      <div id="panel-corners">
        <Panel title="Operating corners" description="Every corner is evaluated; the budget reports the worst one per part. Load scales the waveform currents.">
          <RowsTable path="corners" caption="Corners" columns={CORNER_COLUMNS} minRows={1} newRow={() => ({ id: "", vin: "", ambient: "", fsw: "" })} />
        </Panel>
      </div>
      <div id="panel-thermal">
        <Panel title="Thermal coupling" description="Parts on one board heat each other: Θ in K/W between two junction parts (controller, Q1, Q1.npn …); one entry couples both ways.">
          <RowsTable path="thermal.coupling" caption="Couplings" columns={COUPLING_COLUMNS} newRow={() => ({ from: "controller", to: "", theta: "" })} />
        </Panel>
      </div>
      <div id="panel-derating">
        <Panel title="Derating policy" description="Blank fields take the workspace defaults (common practice: Tj 25 K under its maximum, |Vgs| ≤ 80 % of its rating).">
          <FieldGrid base="derating" fields={DERATING_FIELDS} />
        </Panel>
      </div>
    </>
  );
}
