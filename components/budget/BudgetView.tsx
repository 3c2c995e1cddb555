"use client";

import dynamic from "next/dynamic";
import { useEffect, useMemo, useRef, useState } from "react";
import { ApiError, fetchJson } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";
import type { Evaluation } from "@/models/evaluate";
import type { Design } from "@/models/input/schema";
import { Badge, Caution, Panel, Quantity } from "@/components/ui";
import { MechanismLegend } from "@/components/charts/MechanismLegend";
import { CornerStrip } from "./CornerStrip";
import { JunctionLadder } from "./JunctionLadder";
import { Ledger } from "./Ledger";
import { ChangeList } from "./ChangeList";
import { ControllerView, type OptionControllerSummary } from "./ControllerView";
import { WhatIf } from "./WhatIf";
import { ThermalMap } from "./ThermalMap";
import { lossBarData, warningsFor } from "./shape";
import { knobEdits, knobTargets, knobsChanged, readKnobs, trialIssues, withEdits, type Knobs } from "./trialEdits";

const loadLossChart = () => import("@/components/charts/LossStackChart");
// Fetch the chart's chunk while the page hydrates instead of after.
if (typeof window !== "undefined") void loadLossChart();
const LossStackChart = dynamic(loadLossChart, {
  ssr: false,
  loading: () => <div className="h-48 animate-pulse rounded-md bg-paper-sunk" />,
});

type Evaluate = typeof import("@/models/evaluate").evaluateDesign;

/**
 * The evaluator loads in its own chunk after first paint: the page opens on
 * the server's numbers. Trials start from the server's parsed design, so the
 * browser never loads the schema or the unit parser (zod, mathjs).
 */
function loadEvaluator(): Promise<Evaluate> {
  return import("@/models/evaluate").then((m) => m.evaluateDesign);
}

export interface BudgetViewProps {
  projectId: string;
  optionId: string;
  optionName: string;
  revision: number;
  document: unknown;
  partRefs: Record<string, string>;
  design: Design;
  evaluation: Evaluation;
  options: OptionControllerSummary[];
  canWrite: boolean;
}

export function BudgetView(props: BudgetViewProps) {
  const { projectId, optionId, design } = props;
  const afterChange = useAfterChange();
  const [cornerId, setCornerId] = useState(props.evaluation.worstTotal.cornerId || props.evaluation.corners[0]?.cornerId);
  const [positionIndex, setPositionIndex] = useState(0);
  const targets = useMemo(() => knobTargets(design, positionIndex), [design, positionIndex]);
  const original = useMemo(() => readKnobs(design, targets), [design, targets]);
  const [knobs, setKnobs] = useState<Knobs>(original);
  const [trial, setTrial] = useState<{ document: unknown; evaluation: Evaluation; design: Design } | null>(null);
  const [issues, setIssues] = useState<string[]>([]);
  const evaluator = useRef<Promise<Evaluate> | null>(null);

  useEffect(() => {
    evaluator.current ??= loadEvaluator();
  }, []);

  // New server numbers (a saved revision) put the knobs back on the design's values.
  const [knobsFor, setKnobsFor] = useState(original);
  if (knobsFor !== original) {
    setKnobsFor(original);
    setKnobs(original);
  }

  useEffect(() => {
    if (!knobsChanged(knobs, original)) {
      // eslint-disable-next-line react-hooks/set-state-in-effect -- the trial is evaluated asynchronously below; this clears it in the same pass
      setTrial(null);
      setIssues([]);
      return;
    }
    const edits = knobEdits(design, targets, knobs);
    const problems = trialIssues(edits);
    setIssues(problems);
    if (problems.length) return;
    let live = true;
    (evaluator.current ??= loadEvaluator()).then((evaluateDesign) => {
      if (!live) return;
      // `design` carries the workspace derating policy the server applied; the trial keeps it.
      const trialDesign = withEdits(design, edits);
      setTrial({ document: withEdits(props.document, edits), design: trialDesign, evaluation: evaluateDesign(trialDesign) });
    });
    return () => {
      live = false;
    };
  }, [knobs, original, design, targets, props.document]);

  const evaluation = trial?.evaluation ?? props.evaluation;
  const corner = evaluation.corners.find((c) => c.cornerId === cornerId) ?? evaluation.corners[0];
  const bars = lossBarData(corner);
  const { here, elsewhere } = warningsFor(evaluation, corner.cornerId);
  const positionIds = design.positions.map((p) => p.id);
  const cornerLabels = Object.fromEntries(evaluation.corners.map((c) => [c.cornerId, c.label]));
  const ctl = corner.parts.find((p) => p.kind === "controller");

  async function save(note: string): Promise<{ ok: boolean; message: string }> {
    if (!trial) return { ok: false, message: "Nothing changed: move a knob first." };
    try {
      const r = await fetchJson<{ revision: { revision: number } }>(`/api/v1/options/${encodeURIComponent(optionId)}/revisions`, {
        method: "POST",
        body: { baseRevision: props.revision, document: trial.document, partRefs: props.partRefs, note },
      });
      await afterChange();
      return { ok: true, message: `Saved as revision ${r.revision.revision}. The page now shows it.` };
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) return { ok: false, message: `${e.message} Reload the page to see the latest revision, then set your trial values again.` };
      return { ok: false, message: e instanceof Error ? e.message : "The save failed." };
    }
  }

  return (
    <div className="flex flex-col gap-6" data-budget-view data-trial={trial ? "on" : "off"}>
      <CornerStrip evaluation={evaluation} selected={corner.cornerId} onSelect={setCornerId} />

      {trial && (
        <p role="status" className="rounded-md border-l-4 border-copper-500 bg-copper-50 px-4 py-2 text-sm text-copper-900">
          Showing <strong>trial values</strong> from the knobs below, evaluated in your browser. Nothing is saved until you save a new revision.
        </p>
      )}

      <section aria-label="Headline figures" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Figure label="Total modelled loss" figure="total-loss" value={corner.totalLoss} unit="W" />
        <Figure label="Efficiency of the modelled losses" figure="efficiency" value={corner.efficiency === null ? null : corner.efficiency * 100} unit="%" digits={4} />
        <Figure
          label="Controller Tj"
          figure="controller-tj"
          value={ctl?.junction && !ctl.junction.runaway ? ctl.junction.tj : null}
          unit="°C"
          digits={4}
          note={ctl?.junction?.runaway ? "runaway" : undefined}
        />
        <Figure
          label="Controller margin"
          figure="controller-margin"
          value={ctl?.junction && !ctl.junction.runaway ? ctl.junction.margin : null}
          unit="K"
        />
      </section>

      <div className="grid gap-6 xl:grid-cols-[3fr_2fr]">
        <Panel title="Where the watts go" description={`Loss of every part at ${corner.label}, by mechanism.`}>
          <LossStackChart rows={bars.rows} keys={bars.keys} title={`Loss by part at ${corner.label}`} />
          <div className="mt-3">
            <MechanismLegend keys={bars.keys} />
          </div>
        </Panel>
        <Panel title="Junction ladder" description="Tj against the derated limit (Tj max less the derating margin); hatched: the reserve.">
          <JunctionLadder corner={corner} />
        </Panel>
      </div>

      <Panel
        title="Things to change"
        description="Each finding names the element to change; the link opens it in the editor."
        actions={<Badge tone={here.some((w) => w.severity === "error") ? "over" : here.length ? "close" : "ok"}>{here.length} at this corner</Badge>}
      >
        <div className="flex flex-col gap-4">
          <ChangeList warnings={here} label={`Findings at ${corner.label}`} projectId={projectId} optionId={optionId} positionIds={positionIds} cornerLabels={cornerLabels} />
          {elsewhere.length > 0 && (
            <details>
              <summary className="cursor-pointer text-sm font-medium text-ink-soft">{elsewhere.length} more at other corners</summary>
              <div className="mt-2">
                <ChangeList warnings={elsewhere} label="Findings at other corners" projectId={projectId} optionId={optionId} positionIds={positionIds} cornerLabels={cornerLabels} />
              </div>
            </details>
          )}
        </div>
      </Panel>

      <Panel title="Controller first" description="The controller's own heat at every corner: quiescent supply against gate drive through its pin.">
        <ControllerView evaluation={evaluation} options={props.options} />
      </Panel>

      <Panel title="Trial knobs" description="Move a knob and every figure on this page follows, computed in your browser by the same model.">
        <WhatIf
          knobs={knobs}
          original={original}
          targets={targets}
          positions={design.positions.map((p, index) => ({ index, id: p.id, label: p.label ?? p.role }))}
          onKnobs={setKnobs}
          onPosition={setPositionIndex}
          onReset={() => setKnobs(original)}
          changed={trial !== null}
          issues={issues}
          canSave={props.canWrite}
          onSave={save}
        />
      </Panel>

      <Panel title="Thermal map" description="One part's temperature rise over two swept quantities, with the line where it meets its derated limit.">
        <ThermalMap design={trial?.design ?? design} />
      </Panel>

      <Panel title="Ledger" flush>
        <Ledger corner={corner} />
      </Panel>

      <Caution variant="full" />
    </div>
  );
}

function Figure({ label, figure, value, unit, digits, note }: { label: string; figure: string; value: number | null; unit: string; digits?: number; note?: string }) {
  return (
    <div className="rounded-panel border border-paper-line bg-paper-raised px-4 py-3 shadow-panel" data-figure={figure}>
      <p className="text-xs font-medium tracking-wide text-ink-soft uppercase">{label}</p>
      <p className="mt-1 text-xl">{value === null ? <span className="text-ink-faint">{note ?? "—"}</span> : <Quantity value={value} unit={unit} digits={digits} strong />}</p>
    </div>
  );
}
