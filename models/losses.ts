/**
 * Loss mechanisms: one fixed list so every table, chart and export uses the
 * same keys in the same order.
 *
 *   quiescent        supply current of controller / driver ICs (Vcc·Iq)
 *   gateDrive        the part's share of the gate charge energy ΔQ·ΔV·fsw
 *   conduction       channel I²·Rds(on)(Tj)
 *   turnOn/turnOff   V–I overlap of the hard-switched edges
 *   coss             Eoss dumped in the channel at hard turn-on
 *   reverseRecovery  Qrr·V of the diode commutated at turn-on
 *   diodeConduction  body diode: Vsd·I (+ rD·I²), incl. dead times
 *   clamp            self-driven clamp transistor and zener string
 *   buffer           follower transistor drop (VBE or VCE(sat)) × ΔQ·fsw
 */
export const LOSS_MECHANISMS = [
  "quiescent",
  "gateDrive",
  "conduction",
  "turnOn",
  "turnOff",
  "coss",
  "reverseRecovery",
  "diodeConduction",
  "clamp",
  "buffer",
] as const;

export type LossMechanism = (typeof LOSS_MECHANISMS)[number];
export type Losses = Record<LossMechanism, number>;

export const MECH_INDEX: Record<LossMechanism, number> = Object.fromEntries(
  LOSS_MECHANISMS.map((m, i) => [m, i]),
) as Record<LossMechanism, number>;

export function emptyLosses(): Losses {
  return Object.fromEntries(LOSS_MECHANISMS.map((m) => [m, 0])) as Losses;
}
