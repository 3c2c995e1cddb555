"use client";

import dynamic from "next/dynamic";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { Design } from "@/models/input/schema";
import { Button } from "@/components/ui";
import type { Point } from "@/components/charts/geometry";
import { createSweepWorker } from "@/components/charts/sweepWorker";
import { AXIS_INFO, SWEEP_AXES, type SweepAxis, type SweepAxisKey, type SweepSpec } from "@/components/charts/sweepAxes";

const SweepHeatmap = dynamic(() => import("@/components/charts/SweepHeatmap"), {
  ssr: false,
  loading: () => <div className="h-[440px] animate-pulse rounded-md bg-paper-sunk" />,
});

/** Grid sizes offered, columns × rows (our choice: the largest stays under a few seconds). */
export const GRIDS = [
  { id: "coarse", cols: 16, rows: 12 },
  { id: "medium", cols: 24, rows: 16 },
  { id: "fine", cols: 40, rows: 28 },
] as const;
const CHUNK_ROWS = 2;

type Result = { xs: number[]; ys: number[]; z: (number | null)[][]; contour: Point[][]; designPoint: Point; runawayCells: number; spec: SweepSpec };

/** Sweep range of an axis around the design (our choice of span). */
export function axisRange(design: Design, key: SweepAxisKey, positionId: string, cornerId: string, steps: number): SweepAxis {
  const c = design.corners.find((k) => k.id === cornerId) ?? design.corners[0];
  const vins = design.corners.map((k) => k.vin);
  const rOn = design.positions.find((p) => p.id === positionId)?.gate.rTurnOn ?? 0;
  const span: Record<SweepAxisKey, [number, number]> = {
    fsw: [c.fsw * 0.4, c.fsw * 2.5],
    qgScale: [0.5, 2],
    vin: [Math.min(...vins) * 0.9, Math.max(...vins) * 1.1],
    ambient: [-20, Math.max(...design.corners.map((k) => k.ambient)) + 40],
    rGate: [rOn * 0.25, rOn * 4 + 2],
  };
  return { key, from: span[key][0], to: span[key][1], steps };
}

function junctionParts(design: Design): { id: string; label: string }[] {
  const out = [{ id: "controller", label: `Controller${design.controller.partNumber ? ` ${design.controller.partNumber}` : ""}` }];
  for (const p of design.positions) {
    out.push({ id: p.id, label: `${p.id} ${p.label ?? "MOSFET"}` });
    const d = p.drive;
    if (d.kind === "bjt-follower") out.push({ id: `${p.id}.npn`, label: `${p.id} NPN` }, { id: `${p.id}.pnp`, label: `${p.id} PNP` });
    if (d.kind === "driver-ic" || (d.kind === "transformer" && d.driver)) out.push({ id: `${p.id}.driver`, label: `${p.id} driver IC` });
    if (d.kind === "self-driven" && d.clamp) out.push({ id: `${p.id}.clamp`, label: `${p.id} clamp` });
  }
  return out;
}

/** The thermal map: pick a part and two axes; the grid runs in a Web Worker with progress and Cancel. */
export function ThermalMap({ design }: { design: Design }) {
  const parts = useMemo(() => junctionParts(design), [design]);
  const [partId, setPartId] = useState(parts[0].id);
  const [cornerId, setCornerId] = useState(design.corners[0].id);
  const [xKey, setXKey] = useState<SweepAxisKey>("fsw");
  const [yKey, setYKey] = useState<SweepAxisKey>("qgScale");
  const [gridId, setGridId] = useState<(typeof GRIDS)[number]["id"]>("medium");
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [result, setResult] = useState<Result | null>(null);
  const [error, setError] = useState<string | null>(null);
  const worker = useRef<Worker | null>(null);
  const runId = useRef(0);

  const positionId = partId === "controller" ? design.positions[0].id : partId.split(".")[0];

  const run = useCallback(() => {
    const grid = GRIDS.find((g) => g.id === gridId)!;
    const spec: SweepSpec = {
      partId,
      cornerId,
      positionId,
      x: axisRange(design, xKey, positionId, cornerId, grid.cols),
      y: axisRange(design, yKey, positionId, cornerId, grid.rows),
    };
    worker.current ??= createSweepWorker();
    // a new run supersedes the one in flight (knobs moving re-run the map)
    worker.current.postMessage({ type: "cancel", runId: runId.current });
    const id = ++runId.current;
    setError(null);
    setProgress({ done: 0, total: grid.rows });
    worker.current.onmessage = (e: MessageEvent) => {
      const m = e.data as { type: string; runId: number; done?: number; total?: number; message?: string } & Partial<Result>;
      if (m.runId !== runId.current) return;
      if (m.type === "progress") setProgress({ done: m.done!, total: m.total! });
      else if (m.type === "done") {
        setProgress(null);
        setResult({ xs: m.xs!, ys: m.ys!, z: m.z!, contour: m.contour!, designPoint: m.designPoint!, runawayCells: m.runawayCells ?? 0, spec });
      } else if (m.type === "cancelled") setProgress(null);
      else if (m.type === "error") {
        setProgress(null);
        setError(m.message ?? "The sweep failed.");
      }
    };
    worker.current.postMessage({ type: "start", runId: id, design, spec, chunkRows: CHUNK_ROWS });
  }, [design, partId, cornerId, positionId, xKey, yKey, gridId]);

  // The first sweep waits until the map comes near the viewport, so it does
  // not compete with the page's own start-up; after that every change re-runs it.
  const box = useRef<HTMLDivElement | null>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = box.current;
    if (!el || typeof IntersectionObserver === "undefined") return setNear(true);
    const io = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setNear(true), { rootMargin: "200px" });
    io.observe(el);
    return () => io.disconnect();
  }, []);

  useEffect(() => {
    // eslint-disable-next-line react-hooks/set-state-in-effect -- run() starts the sweep worker; its busy flag is set as it starts
    if (near) run();
  }, [run, near]);

  useEffect(() => () => worker.current?.terminate(), []);

  const cancel = () => worker.current?.postMessage({ type: "cancel", runId: runId.current });

  const select = "h-9 rounded-md border border-paper-edge bg-paper-raised px-2 text-sm";
  const partLabel = parts.find((p) => p.id === (result?.spec.partId ?? partId))?.label ?? partId;
  return (
    <div className="flex flex-col gap-4" ref={box}>
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col gap-1">
          <span className="font-medium">Part</span>
          <select className={select} value={partId} onChange={(e) => setPartId(e.target.value)} data-sweep="part">
            {parts.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium">Corner</span>
          <select className={select} value={cornerId} onChange={(e) => setCornerId(e.target.value)}>
            {design.corners.map((c) => (
              <option key={c.id} value={c.id}>
                {c.label ?? c.id}
              </option>
            ))}
          </select>
        </label>
        {(
          [
            ["Across", xKey, setXKey, yKey],
            ["Up", yKey, setYKey, xKey],
          ] as const
        ).map(([label, value, set, other]) => (
          <label key={label} className="flex flex-col gap-1">
            <span className="font-medium">{label}</span>
            <select className={select} value={value} onChange={(e) => set(e.target.value as SweepAxisKey)} data-sweep={label === "Across" ? "x" : "y"}>
              {SWEEP_AXES.filter((k) => k !== other).map((k) => (
                <option key={k} value={k}>
                  {AXIS_INFO[k].title}
                </option>
              ))}
            </select>
          </label>
        ))}
        <label className="flex flex-col gap-1">
          <span className="font-medium">Grid</span>
          <select className={select} value={gridId} onChange={(e) => setGridId(e.target.value as typeof gridId)} data-sweep="grid">
            {GRIDS.map((g) => (
              <option key={g.id} value={g.id}>
                {g.cols} × {g.rows}
              </option>
            ))}
          </select>
        </label>
      </div>

      {progress && (
        <div className="flex items-center gap-3" role="status" aria-live="polite">
          <progress className="h-2 flex-1 accent-copper-600" max={progress.total} value={progress.done} aria-label="Sweep progress" />
          <span className="font-mono text-xs text-ink-soft">
            {progress.done} / {progress.total} rows
          </span>
          <Button size="sm" variant="secondary" onClick={cancel}>
            Cancel
          </Button>
        </div>
      )}
      {!progress && !result && (
        <Button size="sm" variant="secondary" onClick={run}>
          Draw the map
        </Button>
      )}
      {error && <p className="text-sm text-alarm-700">{error}</p>}

      {result && (
        <SweepHeatmap
          title={`Temperature rise of ${partLabel} over ${AXIS_INFO[result.spec.x.key].title} and ${AXIS_INFO[result.spec.y.key].title}`}
          partLabel={partLabel}
          x={{ key: result.spec.x.key, title: AXIS_INFO[result.spec.x.key].title, unit: AXIS_INFO[result.spec.x.key].unit, values: result.xs }}
          y={{ key: result.spec.y.key, title: AXIS_INFO[result.spec.y.key].title, unit: AXIS_INFO[result.spec.y.key].unit, values: result.ys }}
          z={result.z}
          contour={result.contour}
          designPoint={result.designPoint}
        />
      )}
      <p className="text-xs text-ink-faint">
        Dashed line: where the part meets its derated limit (the model&apos;s Tj max less the derating margin). Crossed-out dark cells: thermal runaway, no steady
        temperature. The sight marks the current design.
      </p>
    </div>
  );
}
