/**
 * Discrete NPN/PNP emitter-follower buffer (DOMAIN item 4).
 *
 * The controller pin drives the tied bases; each transistor carries the
 * gate current and the pin only supplies base current Ie/(hFE+1).
 * Model of one edge (our derivation, small-signal follower algebra as in
 * any circuits text): seen from the gate, the transistor is a source
 * V_pin − VBE behind R_eq = R_base,total/(hFE+1), where R_base,total is
 * the pin resistance plus the base resistor. The gate current is
 *
 *   Ie = min( V_avail / (R_eq + R_gate),  (hFE(Ie)+1) · I_pin,limit )
 *
 * with hFE depending on Ic, solved by bisection (the right side falls as Ie
 * rises, so the root is unique). When the gain term binds, the transistor
 * is current-limited: the voltage it cannot pass drops across its C–E.
 *
 * Energy: the ½·ΔQ·ΔV of each edge splits over [transistor R_eff, gate
 * resistor, Rg(int)]; of the transistor's part a fraction 1/(hFE+1) is in the base
 * circuit (the pin and the base resistor, carrying Ib), the rest in the
 * transistor (carrying Ic). The follower drop (supply − V_gate,high on the
 * way up, V_gate,low − V− on the way down) × ΔQ is burnt in the transistor.
 * hFE is taken at the edge's peak current, the lowest gain of the edge,
 * which is conservative for the controller.
 */
import type { Design } from "./input/schema";
import { NO_LIMIT, type EdgePath, type PathElement, type StageContext, type StageResult, gateElements } from "./driveCommon";
import { STARVATION_FRACTION } from "./policy";

type Bjt = Extract<Design["positions"][number]["drive"], { kind: "bjt-follower" }>["npn"];
export type HfePoint = { ic: number; hfe: number };

/**
 * hFE(Ic), interpolated linearly in hFE against log(Ic) (datasheet plots are
 * log-scaled in Ic). Below the first point: the first value. Beyond the last
 * point the last segment's slope is extended (gain keeps collapsing), never
 * below 1.
 */
export function hfeAt(points: readonly HfePoint[], ic: number): number {
  const n = points.length;
  if (n === 0) return 1;
  if (n === 1 || !(ic > points[0].ic)) return Math.max(points[0].hfe, 1);
  const x = Math.log(ic);
  let i = 1;
  while (i < n - 1 && ic > points[i].ic) i++;
  const a = points[i - 1];
  const b = points[i];
  const slope = (b.hfe - a.hfe) / (Math.log(b.ic) - Math.log(a.ic));
  const h = ic <= b.ic || slope < 0 ? a.hfe + slope * (x - Math.log(a.ic)) : b.hfe;
  return Math.max(h, 1);
}

export function peakHfe(points: readonly HfePoint[]): number {
  let h = 1;
  for (const p of points) h = Math.max(h, p.hfe);
  return h;
}

export interface FollowerCurrent {
  current: number;
  hfe: number;
  /** Current with the gain held at its peak value (what the resistors and pin limit allow). */
  nominal: number;
}

/** Solve the follower edge current for a drive voltage across the emitter-side path. */
export function followerCurrent({ vAvail, rBase, rGate, pinLimit, points }: {
  vAvail: number; rBase: number; rGate: number; pinLimit: number; points: readonly HfePoint[];
}): FollowerCurrent {
  const v = Math.max(vAvail, 0);
  const hPeak = peakHfe(points);
  const f = (h: number) => Math.min(v / (rBase / (h + 1) + rGate), (h + 1) * pinLimit);
  const nominal = f(hPeak);
  if (!(nominal > 0)) return { current: 0, hfe: hfeAt(points, 0), nominal: 0 };
  let lo = 0;
  let hi = nominal;
  for (let k = 0; k < 48; k++) {
    const mid = 0.5 * (lo + hi);
    if (f(hfeAt(points, mid)) > mid) lo = mid;
    else hi = mid;
  }
  return { current: lo, hfe: hfeAt(points, lo), nominal };
}

function followerEdge(
  t: Bjt, tPart: string, pinR: number, pinLimit: number, controllerPart: string, basePart: string,
  gate: PathElement[], swing: number, plateauDrive: number,
): EdgePath {
  let rGiven = 0;
  for (const e of gate) rGiven += Math.max(e.r, 0);
  // Gate resistors and Rg(int) may all be 0: the floor keeps the divisions
  // finite, and the gate elements then get no share (the transistor takes it).
  const rGate = Math.max(rGiven, 1e-9);
  const rBase = pinR + t.rBase;
  const peak = followerCurrent({ vAvail: swing, rBase, rGate, pinLimit, points: t.hfe });
  const pl = followerCurrent({ vAvail: plateauDrive, rBase, rGate, pinLimit, points: t.hfe });
  const h = peak.hfe;
  const rEq = rBase / (h + 1);
  // Effective transistor resistance swing/I − R_gate, written as conductances so
  // a vanishing current stays finite.
  const g = peak.current > 0 && swing > 0 ? peak.current / swing : 1 / Math.max(rEq + rGate, 1e-6);
  const tShare = rGiven > 0 ? Math.min(Math.max(1 - rGate * g, rEq / Math.max(rEq + rGate, 1e-6)), 1) : 1;
  const total = Math.min(1 / g, 1e15);
  const baseShare = tShare / (h + 1);
  const rEff = total - rGate;
  const resistive = rEff > 0 ? Math.min(rEq / rEff, 1) : 1;
  // Base circuit: the resistive part splits pin : base resistor; the excess of
  // a limited edge is dropped across the pin at its current limit.
  const pinFrac = resistive * (rBase > 0 ? pinR / rBase : 1) + (1 - resistive);
  const shares = [
    { part: tPart, fraction: tShare - baseShare },
    { part: controllerPart, fraction: baseShare * pinFrac },
    ...(t.rBase > 0 ? [{ part: basePart, fraction: baseShare * (1 - pinFrac) }] : []),
    ...gate.map((e) => ({ part: e.part, fraction: rGiven > 0 ? ((1 - tShare) * Math.max(e.r, 0)) / rGiven : 0 })),
  ];
  return {
    shares,
    iPeak: peak.current,
    iPlateau: pl.current,
    rTotal: total,
    starved: pl.current < STARVATION_FRACTION * pl.nominal,
    hfe: h,
    hfeNominal: peakHfe(t.hfe),
    // Quasi-static follower seen from the gate: base path divided by (hFE+1) in
    // series with the gate resistors, gain-limited at (hFE+1)·pin limit.
    source: { drive: Math.max(swing, 0), r: rEq + rGate, iLimit: (h + 1) * pinLimit },
  };
}

export function bjtFollowerStage(ctx: StageContext): StageResult {
  const drive = ctx.position.drive;
  if (drive.kind !== "bjt-follower") throw new Error("not a bjt-follower drive");
  const { controller, position } = ctx;
  const id = position.id;
  const supply = drive.supply ?? controller.vcc;
  // Emitter follows the base minus VBE, unless the collector rail saturates it first.
  const vHigh = Math.max(Math.min(controller.vcc - drive.npn.vbe, supply - drive.npn.vceSat), 0);
  const vLow = Math.min(Math.max(drive.pnp.vbe, drive.vNeg + drive.pnp.vceSat), vHigh);
  const net = gateElements(ctx);
  const vpl = position.mosfet.vpl;
  const pin = controller.pin;
  const on = followerEdge(drive.npn, `${id}.npn`, pin.sourceResistance, pin.sourceCurrentLimit ?? NO_LIMIT,
    "controller", `${id}.rBase`, net.on, vHigh - vLow, vHigh - vpl);
  const off = followerEdge(drive.pnp, `${id}.pnp`, pin.sinkResistance, pin.sinkCurrentLimit ?? NO_LIMIT,
    "controller", `${id}.rBase`, net.off, vHigh - vLow - net.offOffset, vpl - vLow - net.offOffset);
  const el = `positions.${ctx.positionIndex}.drive`;
  return {
    vHigh, vLow, on, off,
    drops: [
      { part: `${id}.npn`, mechanism: "buffer", volts: supply - vHigh },
      { part: `${id}.pnp`, mechanism: "buffer", volts: vLow - drive.vNeg },
    ],
    fixed: [],
    magnetizing: null,
    transistors: [
      { part: `${id}.npn`, icPeak: on.iPeak, icMax: drive.npn.icMax, pMax: drive.npn.pMax, element: `${el}.npn` },
      { part: `${id}.pnp`, icPeak: off.iPeak, icMax: drive.pnp.icMax, pMax: drive.pnp.pMax, element: `${el}.pnp` },
    ],
    windingHigh: null,
    levelElement: el,
  };
}
