// Generic Gummel–Poon cards for the follower references. Invented parts:
// every value is from memory of the two transistor classes (not any one
// part's datasheet) and is only meant to behave like its class:
//  - small-signal SOT-23 pair (45 V / 0.5 A class): hFE ~300 falling to
//    about half by 0.2–0.3 A (IKF ~0.15 A), Cje ~30 pF, Cjc ~10 pF,
//    TF ~0.5 ns (fT a few hundred MHz);
//  - high-current small-package pair (low-VCE(sat), 3–5 A class): hFE held
//    to 2–3 A (IKF 3–4 A), Cje 300–400 pF, Cjc 60–90 pF, TF ~1 ns,
//    sub-ohm RB and tens of mΩ RE/RC.
// The PNP of each pair is a little slower and has less gain, as usual.
import type { BjtCard } from "./bjt";

export const SMALL_NPN: BjtCard = {
  name: "qsn", polarity: "npn",
  gp: {
    is: 2e-14, bf: 320, nf: 1, ikf: 0.15, ise: 3e-14, ne: 1.6, br: 8, ikr: 0.1, vaf: 90,
    rb: 8, re: 0.15, rc: 0.6,
    cje: 28e-12, vje: 0.75, mje: 0.35, cjc: 8e-12, vjc: 0.6, mjc: 0.4, tf: 0.45e-9, tr: 40e-9,
  },
};

export const SMALL_PNP: BjtCard = {
  name: "qsp", polarity: "pnp",
  gp: {
    is: 3e-14, bf: 260, nf: 1, ikf: 0.12, ise: 4e-14, ne: 1.6, br: 6, ikr: 0.08, vaf: 60,
    rb: 10, re: 0.2, rc: 0.8,
    cje: 30e-12, vje: 0.75, mje: 0.35, cjc: 10e-12, vjc: 0.6, mjc: 0.42, tf: 0.55e-9, tr: 50e-9,
  },
};

export const HIGH_NPN: BjtCard = {
  name: "qhn", polarity: "npn",
  gp: {
    is: 6e-13, bf: 380, nf: 1, ikf: 4, ise: 4e-13, ne: 1.55, br: 30, ikr: 1, vaf: 70,
    rb: 0.6, re: 0.02, rc: 0.025,
    cje: 320e-12, vje: 0.7, mje: 0.38, cjc: 65e-12, vjc: 0.6, mjc: 0.42, tf: 0.9e-9, tr: 30e-9,
  },
};

export const HIGH_PNP: BjtCard = {
  name: "qhp", polarity: "pnp",
  gp: {
    is: 8e-13, bf: 320, nf: 1, ikf: 3, ise: 6e-13, ne: 1.55, br: 25, ikr: 0.8, vaf: 50,
    rb: 0.8, re: 0.025, rc: 0.035,
    cje: 380e-12, vje: 0.7, mje: 0.38, cjc: 90e-12, vjc: 0.6, mjc: 0.45, tf: 1.3e-9, tr: 40e-9,
  },
};

export type BjtFamily = "small" | "high";

export const BJT_PAIRS: Record<BjtFamily, { npn: BjtCard; pnp: BjtCard }> = {
  small: { npn: SMALL_NPN, pnp: SMALL_PNP },
  high: { npn: HIGH_NPN, pnp: HIGH_PNP },
};
