/// <reference lib="webworker" />
/**
 * Thermal-map sweep off the main thread, on the model's sweepGrid in row
 * chunks. Protocol:
 *   in   { type: "start", runId, design, spec, chunkRows } | { type: "cancel", runId }
 *   out  { type: "progress", runId, done, total } after every chunk of rows
 *        { type: "done", runId, xs, ys, z, contour, designPoint, runawayCells }
 *        | { type: "cancelled", runId } | { type: "error", runId, message }
 * Between chunks the worker yields to its event loop, so a cancel message is
 * seen within one chunk; shouldStop also ends a chunk early.
 */
import type { Design } from "@/models/input/schema";
import { mergeSweepChunks, sweepGrid, type SweepResult } from "@/models/sweep";
import { toModelSpec, type SweepSpec } from "./sweepAxes";

type In = { type: "start"; runId: number; design: Design; spec: SweepSpec; chunkRows: number } | { type: "cancel"; runId: number };

const scope = self as unknown as DedicatedWorkerGlobalScope;
const cancelled = new Set<number>();

scope.onmessage = async (e: MessageEvent<In>) => {
  const msg = e.data;
  if (msg.type === "cancel") {
    cancelled.add(msg.runId);
    return;
  }
  const { runId, design } = msg;
  try {
    const spec = toModelSpec(design, msg.spec);
    const total = msg.spec.y.steps;
    const chunk = Math.max(1, msg.chunkRows);
    const chunks: SweepResult[] = [];
    for (let from = 0; from < total; from += chunk) {
      if (cancelled.has(runId)) {
        scope.postMessage({ type: "cancelled", runId });
        return;
      }
      chunks.push(sweepGrid(design, { ...spec, rows: { from, to: Math.min(total, from + chunk) }, shouldStop: () => cancelled.has(runId) }));
      scope.postMessage({ type: "progress", runId, done: Math.min(total, from + chunk), total });
      await new Promise((r) => setTimeout(r, 0));
    }
    const r = mergeSweepChunks(chunks);
    scope.postMessage({
      type: "done",
      runId,
      xs: r.x.values,
      ys: r.y.values,
      z: r.z,
      contour: r.contour.map((line) => line.map((p) => ({ x: p.x, y: p.y }))),
      designPoint: { x: r.designPoint.x, y: r.designPoint.y },
      runawayCells: r.runawayCells,
    });
  } catch (err) {
    scope.postMessage({ type: "error", runId, message: (err as Error).message });
  }
};
