// Runs a follower deck and reads its period into SI figures.
import { perEdge, type PerEdge } from "./driveMeasure";
import { followerDeck, type FollowerCase } from "./follower";
import { runNgspice, valueOf } from "./ngspice";

export interface FollowerMeasurement {
  /** Heat in the pin's own source/sink resistance: the controller's share. */
  pinHeat: PerEdge;
  /**
   * Energy the pin's source delivers (what the controller draws for this pin from Vcc). With the
   * Thevenin pin it can be negative on the falling edge: the PULSE absorbs the current that flows
   * while it is still ramping, which a real output stage would burn.
   */
  pinSupply: PerEdge;
  /** Net charge out of the pin per window, and ∫|i| (sourced + sunk). */
  pinCharge: PerEdge;
  pinChargeAbs: PerEdge;
  pinPeakSource: number;
  pinPeakSink: number; // positive, A
  /**
   * Pin current 1 ns before the falling edge: the DC base current while the gate is held high, once
   * the gate's tail has died (at 500 kHz a large gate can still be settling, and it reads near 0).
   */
  pinHoldHigh: number;
  npn: PerEdge; // VCE·IC + VBE·IB, J (zero in direct drive)
  pnp: PerEdge;
  rBase: PerEdge; // both base resistors
  rGate: PerEdge;
  rgInt: PerEdge;
  rGs: PerEdge;
  /** Energy into the gate element or the switch's gate terminal (stored, or passed on through Cgd). */
  gate: PerEdge;
  vcc: PerEdge; // NPN collector rail
  vNeg: PerEdge; // PNP collector rail
  gateCharge: PerEdge; // through the gate resistor (the pull-down's share included)
  igOnPeak: number;
  igOffPeak: number; // positive, A
  vgTop: number;
  vgBottom: number;
  vgMax: number;
  vgMin: number;
  wallMs: number;
}

const ZERO: PerEdge = { on: 0, off: 0 };

export async function simulateFollower(c: FollowerCase): Promise<FollowerMeasurement> {
  const r = await runNgspice(followerDeck(c).deck, { timeoutMs: 60_000 });
  const e = (n: string) => perEdge(r, n);
  const v = (n: string) => valueOf(r, n);
  return {
    pinHeat: e("e_pin"), pinSupply: e("e_pin_supply"), pinCharge: e("q_pin"), pinChargeAbs: e("q_pin_abs"),
    pinPeakSource: v("ipin_max"), pinPeakSink: -v("ipin_min"), pinHoldHigh: v("ipin_hold_high"),
    npn: c.direct ? ZERO : e("e_npn"), pnp: c.direct ? ZERO : e("e_pnp"), rBase: c.direct ? ZERO : e("e_rbase"),
    rGate: e("e_rgate"), rgInt: e("e_rgint"), rGs: c.rGs !== undefined ? e("e_rgs") : ZERO, gate: e("e_gate"),
    vcc: e("e_vcc"), vNeg: e("e_vneg"), gateCharge: e("q_gate"),
    igOnPeak: v("ig_on_peak"), igOffPeak: -v("ig_off_peak"),
    vgTop: v("vg_top"), vgBottom: v("vg_bottom"), vgMax: v("vg_max"), vgMin: v("vg_min"),
    wallMs: r.wallMs,
  };
}

/** Energy drawn from the rails in a window: the pin's source, Vcc and V−. */
export function drawn(m: FollowerMeasurement, edge: keyof PerEdge): number {
  return m.pinSupply[edge] + m.vcc[edge] + m.vNeg[edge];
}

/** Heat of every element plus the energy into the gate, in a window. */
export function accounted(m: FollowerMeasurement, edge: keyof PerEdge): number {
  return [m.pinHeat, m.npn, m.pnp, m.rBase, m.rGate, m.rgInt, m.rGs, m.gate].reduce((s, x) => s + x[edge], 0);
}
