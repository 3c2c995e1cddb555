/**
 * Gate-drive power and where it is burnt (DOMAIN items 2–3).
 *
 * Each cycle the drive moves ΔQ from V− to V+ and back, drawing ΔQ·(V+ − V−)
 * from the rails; none of it is returned (the gate capacitance is emptied
 * into the sink path). Hence P = ΔQ·ΔV·fsw, independent of resistances.
 *
 * For a linear capacitance charged through resistors by a voltage step the
 * energy burnt is ½CΔV² per edge whatever the resistance (the classic RC
 * charging result; e.g. Erickson & Maksimović 3rd ed. 2020 on switching loss
 * from capacitances, from memory), and with resistors in series carrying the
 * same current it divides in proportion to resistance. We apply the same
 * split to the real, nonlinear gate charge with half of ΔQ·ΔV per edge:
 * exact for linear C, an approximation for the plateau (documented choice).
 */

export function gateDrivePower({ deltaQ, vHigh, vLow, fsw }: { deltaQ: number; vHigh: number; vLow: number; fsw: number }): number {
  return deltaQ * (vHigh - vLow) * fsw;
}

/**
 * Split an energy (or power) over series resistances in proportion to their
 * values. All-zero resistances split evenly (no information, and the sum
 * must still add up).
 */
export function splitByResistance(energy: number, resistances: Record<string, number>): Record<string, number> {
  const keys = Object.keys(resistances);
  const total = keys.reduce((s, k) => s + Math.max(resistances[k], 0), 0);
  const out: Record<string, number> = {};
  for (const k of keys) out[k] = total > 0 ? (energy * Math.max(resistances[k], 0)) / total : energy / keys.length;
  return out;
}
