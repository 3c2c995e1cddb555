/**
 * Input checks of the calculator itself. The calculator runs in the browser
 * too, where no zod schema stands in front of it, so it treats every spec as
 * hostile: each field is checked for type, finiteness and range, and a
 * failure names the field in plain words. Physical impossibilities (a buck
 * asked to step up) are refused by each topology.
 */
import { formatQuantity, type Dimension } from "../quantityFormat";
import { FSW_RANGE_HZ } from "../bounds";
import type { ConverterSpec, Refusal, Topology } from "./types";

export const TOPOLOGIES: readonly Topology[] = ["buck", "boost", "flyback", "forward", "half-bridge", "full-bridge"];
const ISOLATED = new Set<Topology>(["flyback", "forward", "half-bridge", "full-bridge"]);
const NEEDS_LM = new Set<Topology>(["flyback", "forward"]);
const NEEDS_LF = new Set<Topology>(["buck", "boost", "forward", "half-bridge", "full-bridge"]);

/** Plausibility limits, far wider than any converter this product budgets (common practice). */
const LIMITS = {
  vin: { dim: "voltage", max: 1e4, noun: "the input voltage" },
  vout: { dim: "voltage", max: 1e4, noun: "the output voltage" },
  iout: { dim: "current", max: 1e4, noun: "the output current" },
  fsw: { dim: "frequency", max: FSW_RANGE_HZ.max, noun: "the switching frequency" },
  turnsRatio: { dim: "ratio", max: 1e3, noun: "the turns ratio Np/Ns" },
  magnetizingInductance: { dim: "inductance", max: 10, noun: "the magnetizing inductance" },
  filterInductance: { dim: "inductance", max: 10, noun: "the filter inductance" },
  resetTurnsRatio: { dim: "ratio", max: 100, noun: "the reset turns ratio Np/Nr" },
} as const satisfies Partial<Record<keyof ConverterSpec, { dim: Dimension; max: number; noun: string }>>;

const isNum = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x);

function positive(spec: ConverterSpec, field: keyof typeof LIMITS): Refusal | null {
  const { dim, max, noun } = LIMITS[field];
  const x: unknown = spec[field];
  if (!isNum(x) || x <= 0 || x > max)
    return { field, message: `${noun} must be a number above 0 and at most ${formatQuantity(max, dim)}, got ${String(x)}` };
  return null;
}

export function checkSpec(spec: ConverterSpec): Refusal | null {
  if (typeof spec !== "object" || spec === null) return { field: "topology", message: "no converter spec given" };
  if (!TOPOLOGIES.includes(spec.topology))
    return { field: "topology", message: `the topology must be one of ${TOPOLOGIES.join(", ")}, got ${String(spec.topology)}` };
  for (const f of ["vin", "vout", "iout", "fsw"] as const) {
    const r = positive(spec, f);
    if (r) return r;
  }
  if (spec.fsw < FSW_RANGE_HZ.min) return { field: "fsw", message: `the switching frequency must be at least ${FSW_RANGE_HZ.min} Hz` };
  if (!isNum(spec.efficiency) || spec.efficiency <= 0 || spec.efficiency > 1)
    return { field: "efficiency", message: `the efficiency estimate must be above 0 and at most 1 (100 %), got ${String(spec.efficiency)}` };
  if (spec.rectifier !== "synchronous" && spec.rectifier !== "diode")
    return { field: "rectifier", message: `the rectifier must be "synchronous" or "diode", got ${String(spec.rectifier)}` };
  if (!["continuous", "discontinuous", "boundary", "auto"].includes(spec.mode))
    return { field: "mode", message: `the conduction mode must be continuous, discontinuous, boundary or auto, got ${String(spec.mode)}` };
  const needs: [boolean, keyof typeof LIMITS][] = [
    [ISOLATED.has(spec.topology), "turnsRatio"],
    [NEEDS_LM.has(spec.topology), "magnetizingInductance"],
    [NEEDS_LF.has(spec.topology), "filterInductance"],
  ];
  for (const [needed, f] of needs) {
    if (needed && spec[f] === undefined) return { field: f, message: `a ${spec.topology} needs ${LIMITS[f].noun}` };
    if (needed) {
      const r = positive(spec, f);
      if (r) return r;
    }
  }
  if (spec.topology === "forward") {
    if (spec.forwardReset !== "reset-winding" && spec.forwardReset !== "active-clamp")
      return { field: "forwardReset", message: `a forward converter needs its core reset: "reset-winding" or "active-clamp", got ${String(spec.forwardReset)}` };
    if (spec.forwardReset === "reset-winding" && spec.resetTurnsRatio !== undefined) {
      const r = positive(spec, "resetTurnsRatio");
      if (r) return r;
    }
  }
  if (spec.deadTimes !== undefined) {
    const d: unknown = spec.deadTimes;
    if (!Array.isArray(d) || d.length !== 2 || !d.every((t) => isNum(t) && t >= 0 && t < 1 / spec.fsw))
      return { field: "deadTimes", message: "the dead times must be two times [t1, t2], each at least 0 and shorter than the switching period" };
  }
  if (spec.dutyMax !== undefined && (!isNum(spec.dutyMax) || spec.dutyMax <= 0 || spec.dutyMax > 1))
    return { field: "dutyMax", message: `the controller's maximum duty must be above 0 and at most 1, got ${String(spec.dutyMax)}` };
  return null;
}
