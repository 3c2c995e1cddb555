/**
 * Bench readings against one design: which parts can be measured, the
 * model's prediction for each reading (the corner re-evaluated at the
 * bench's ambient), the difference, and the fitted own-path resistance
 * written back as the document value it corresponds to. Pure: the caller
 * loads the design and the readings.
 */
import type { Design } from "./input/schema";
import type { PartKind } from "./partIds";
import { getAt, setAt, splitPath } from "./documentPath";
import { buildCornerResult, computeCorner, prepare, type Prepared } from "./evaluate";
import { CORRELATION_BAND_K, fitThermalResistance, type FitPoint, type Surface, type ThermalFit } from "./fit";

export interface BenchPart {
  id: string;
  label: string;
  kind: PartKind;
  /** Devices in parallel (MOSFET sets), else 1. */
  count: number;
  /** Network RθJC (per device ÷ count), K/W; null when the part has only an RθJA. */
  rthJC: number | null;
  /** Own path as used by the network, K/W. */
  theta: number;
  /** Document path of the value a fit replaces ("controller.rthJA", "positions.0.mosfet.rthSA"). */
  element: string;
}

export function benchParts(design: Design, prep: Prepared = prepare(design)): BenchPart[] {
  return prep.parts.flatMap((def) => {
    if (!def.junction) return [];
    const m = def.kind === "mosfet" && def.positionIndex !== null ? design.positions[def.positionIndex].mosfet : null;
    const count = m?.count ?? 1;
    return [{
      id: def.id, label: def.label, kind: def.kind, count, theta: def.junction.theta, element: def.junction.thermalElement,
      rthJC: m?.rthJC !== undefined ? m.rthJC / count : null,
    }];
  });
}

export interface BenchReadingInput {
  row: number;
  partId: string;
  cornerId: string;
  method: "thermocouple" | "ir";
  surface: Surface;
  temperature: number;
  ambient: number;
  note: string;
}

export interface ReadingComparison extends BenchReadingInput {
  /** Model at this corner and the bench ambient; null = runaway (no temperature). */
  predicted: number | null;
  /** measured − predicted, K. */
  difference: number | null;
  outsideBand: boolean;
  power: number;
  coupling: number;
}

export interface PartCorrelation {
  part: BenchPart;
  readings: ReadingComparison[];
  fit: ThermalFit | null;
  /** The document change accepting the fit would make, or why it cannot. */
  proposal: { path: string; value: number; previous: number } | { error: string } | null;
  outsideBand: boolean;
}

export interface BenchCorrelation {
  bandK: number;
  parts: PartCorrelation[];
}

export function correlateBench(design: Design, readings: BenchReadingInput[], bandK = CORRELATION_BAND_K): BenchCorrelation {
  const prep = prepare(design);
  const parts = benchParts(design, prep);
  const cache = new Map<string, ReturnType<typeof buildCornerResult>>();
  const cornerAt = (cornerId: string, ambient: number) => {
    const key = `${cornerId}|${ambient}`;
    let r = cache.get(key);
    if (!r) {
      computeCorner(prep, design.corners.findIndex((c) => c.id === cornerId), { ambient });
      r = buildCornerResult(prep);
      cache.set(key, r);
    }
    return r;
  };
  const out = parts.map((part): PartCorrelation => {
    const mine = readings.filter((r) => r.partId === part.id);
    const compared = mine.map((r): ReadingComparison => {
      const c = cornerAt(r.cornerId, r.ambient);
      const pr = c.parts.find((p) => p.id === part.id)!;
      const loss = (id: string) => c.parts.find((p) => p.id === id)?.total ?? 0;
      const coupling = design.thermal.coupling.reduce(
        (s, k) => s + (k.from === part.id ? k.theta * loss(k.to) : k.to === part.id ? k.theta * loss(k.from) : 0), 0);
      const j = pr.junction;
      const predicted = !j || j.runaway ? null : r.surface === "case" ? j.tj - pr.total * (part.rthJC ?? 0) : j.tj;
      const difference = predicted === null ? null : r.temperature - predicted;
      return { ...r, predicted, difference, outsideBand: difference === null || Math.abs(difference) > bandK, power: pr.total, coupling };
    });
    const points: FitPoint[] = compared
      .filter((r) => r.predicted !== null)
      .map((r) => ({ cornerId: r.cornerId, ambient: r.ambient, power: r.power, coupling: r.coupling, rthJC: part.rthJC ?? 0, surface: r.surface, measured: r.temperature }));
    const fit = fitThermalResistance(points);
    return { part, readings: compared, fit, proposal: fit ? proposalFor(design, part, fit.rth) : null, outsideBand: compared.some((r) => r.outsideBand) };
  });
  return { bandK, parts: out.filter((p) => p.readings.length > 0) };
}

/** The document value that gives the network the fitted resistance. */
export function proposalFor(design: Design, part: BenchPart, rthFit: number): PartCorrelation["proposal"] {
  const segs = part.element.split(".");
  const previous = getAt(design, part.element);
  let value = rthFit;
  if (part.kind === "mosfet" && segs[segs.length - 1] === "rthSA") {
    const m = design.positions[Number(segs[1])].mosfet;
    value = rthFit * part.count - (m.rthJC ?? 0) - (m.rthCS ?? 0);
    if (!(value > 0)) return { error: `the fitted path (${(rthFit * part.count).toFixed(2)} K/W per device) is below RθJC + RθCS; check those values or the readings` };
  } else if (part.kind === "mosfet") value = rthFit * part.count;
  if (!(value > 0) || !Number.isFinite(value)) return { error: "the fitted resistance is not positive; check the readings" };
  return { path: part.element, value, previous: typeof previous === "number" ? previous : Number.NaN };
}

/** A copy of a raw document (unit strings kept) with one value set, written in K/W. */
export function withDocumentValue(document: unknown, path: string, value: number): unknown {
  const parent = getAt(document, splitPath(path).slice(0, -1).join("."));
  if (!parent || typeof parent !== "object") throw new Error(`no element at ${path}`);
  return setAt(document, path, `${Number(value.toPrecision(4))} K/W`);
}
