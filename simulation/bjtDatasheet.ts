// Datasheet figures of a BJT card, measured in ngspice the way a datasheet
// measures them: hFE(Ic) and VBE(on) from a DC sweep at fixed VCE, VCE(sat)
// with forced Ic and Ib = Ic/10, Cobo (VCB, IE = 0) and Cibo (VEB reverse,
// IC = 0) from a 1 MHz AC current, fT from the common-emitter AC current
// gain |h21| above the beta corner. Each deck is written for an NPN; a PNP
// gets every source reversed (polaritySign).
import { bjtModel, polaritySign, type BjtCard } from "./bjt";
import { runNgspice, sp, valueOf } from "./ngspice";

export interface DatasheetConditions {
  ics: number[]; // collector currents of the hFE plot, A
  hfeVce: number; // VCE of the hFE plot and of VBE(on), V
  vbeIc: number;
  vceSatIc: number; // Ib = Ic/10
  cobVcb: number;
  cibVeb: number; // reverse bias, V
  ftIc: number;
  ftVce: number;
}

export interface Datasheet {
  hfe: Array<{ ic: number; hfe: number }>;
  vbe: number; vbeIc: number;
  vceSat: number; vceSatIc: number;
  cob: number; cobVcb: number;
  cib: number; cibVeb: number;
  ft: number; ftIc: number; ftVce: number;
}

/** n currents spaced evenly in log from lo to hi. */
export function logSpaced(lo: number, hi: number, n: number): number[] {
  return Array.from({ length: n }, (_, k) => lo * Math.pow(hi / lo, k / (n - 1)));
}

/** DC base-voltage sweep at fixed VCE: Ib at each wanted Ic, and VBE at vbeIc. */
export function hfeDeck(card: BjtCard, ics: number[], vce: number, vbeIc: number): string {
  const s = polaritySign(card);
  const at = (name: string, what: string, ic: number) => `meas dc ${name} find ${what} when ic=${sp(ic)}`;
  return `* hFE(Ic) and VBE(on) of ${card.name}
${bjtModel(card)}
Vb b 0 0
Vc c 0 ${sp(s * vce)}
Q1 c b 0 ${card.name}
.control
dc Vb 0 ${sp(s * 2)} ${sp(s * 5e-4)}
let ic = ${-s}*i(Vc)
let ib = ${-s}*i(Vb)
let vb = ${s}*v(b)
${ics.map((ic, k) => at(`ib_${k}`, "ib", ic)).join("\n")}
${at("vbe_on", "vb", vbeIc)}
.endc
.end
`;
}

/** Forced collector current and Ib = Ic/10 (the datasheet's saturation condition). */
export function vceSatDeck(card: BjtCard, ic: number): string {
  const s = polaritySign(card);
  return `* VCE(sat) of ${card.name}
${bjtModel(card)}
Ib 0 b ${sp(s * ic / 10)}
Ic 0 c ${sp(s * ic)}
Q1 c b 0 ${card.name}
.control
op
let vce_sat = ${s}*v(c)
print vce_sat
.endc
.end
`;
}

/**
 * A junction capacitance from the 1 MHz AC current of a DC-biased terminal
 * (the other terminal of the pair grounded, the third held open by a 0 A
 * source): C = −Im(I)/(2πf·1 V).
 */
function capacitanceDeck(card: BjtCard, kind: "cob" | "cib", reverse: number): string {
  const s = polaritySign(card);
  const [driven, open] = kind === "cob" ? ["c", "e"] : ["e", "c"];
  const pins = kind === "cob" ? "c 0 e" : "c 0 e";
  return `* ${kind} of ${card.name}
${bjtModel(card)}
Vx ${driven} 0 DC ${sp(s * reverse)} AC 1
Iopen ${open} 0 0
Q1 ${pins} ${card.name}
.control
ac dec 10 1e5 1e7
let cap = -imag(i(Vx))/(2*pi*frequency)
meas ac ${kind} find cap at=1e6
.endc
.end
`;
}

export const cobDeck = (card: BjtCard, vcb: number): string => capacitanceDeck(card, "cob", vcb);
export const cibDeck = (card: BjtCard, veb: number): string => capacitanceDeck(card, "cib", veb);

// |h21| is read where it has fallen to H21_READ, well above the beta corner
// for gains above ~50, and fT = f·|h21| corrected for the single-pole roll-off
// (|h21|² = β0²/(1 + (f/fβ)²), fT = β0·fβ), with β0 read at 100 kHz.
const H21_READ = 5;

/**
 * Common-emitter current gain: the base voltage that gives ftIc at ftVce is
 * found by a DC sweep and set with `alter`; the DC feed is an inductor (an AC
 * open above a few kHz) and a 1 A AC current source drives the base while
 * the collector source is an AC short.
 */
export function ftDeck(card: BjtCard, ic: number, vce: number): string {
  const s = polaritySign(card);
  return `* fT of ${card.name}
${bjtModel(card)}
Vbb bb 0 0
Lb bb b 10
Iac 0 b DC 0 AC 1
Vc c 0 ${sp(s * vce)}
Q1 c b 0 ${card.name}
.control
dc Vbb 0 ${sp(s * 2)} ${sp(s * 5e-4)}
let ic = ${-s}*i(Vc)
meas dc vbias find v(bb) when ic=${sp(ic)}
alter Vbb dc = vbias
ac dec 40 1e5 1e11
let h = mag(i(Vc))
meas ac beta0 find h at=1e5
meas ac f_read when h=${H21_READ}
.endc
.end
`;
}

/** fT from the two readings of ftDeck (single-pole correction, see H21_READ). */
export function ftFromH21(beta0: number, fRead: number, h = H21_READ): number {
  return (h * fRead) / Math.sqrt(1 - (h / beta0) ** 2);
}

export async function extractDatasheet(card: BjtCard, c: DatasheetConditions): Promise<Datasheet> {
  const [h, sat, cob, cib, ft] = await Promise.all([
    runNgspice(hfeDeck(card, c.ics, c.hfeVce, c.vbeIc)),
    runNgspice(vceSatDeck(card, c.vceSatIc)),
    runNgspice(cobDeck(card, c.cobVcb)),
    runNgspice(cibDeck(card, c.cibVeb)),
    runNgspice(ftDeck(card, c.ftIc, c.ftVce)),
  ]);
  return {
    hfe: c.ics.map((ic, k) => ({ ic, hfe: ic / valueOf(h, `ib_${k}`) })),
    vbe: valueOf(h, "vbe_on"), vbeIc: c.vbeIc,
    vceSat: valueOf(sat, "vce_sat"), vceSatIc: c.vceSatIc,
    cob: valueOf(cob, "cob"), cobVcb: c.cobVcb,
    cib: valueOf(cib, "cib"), cibVeb: c.cibVeb,
    ft: ftFromH21(valueOf(ft, "beta0"), valueOf(ft, "f_read")), ftIc: c.ftIc, ftVce: c.ftVce,
  };
}
