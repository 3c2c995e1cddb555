/** Switch positions as the topologies name them: short ids, a role and a label. */
import type { PositionInfo } from "./spans";

export const primarySwitch = (id: string, label: string): PositionInfo => ({
  id, role: "primary", label, device: "mosfet", natural: false,
});

/** A rectifier: SRn when synchronous, Dn when a diode. */
export function rectifier(sync: boolean, n: number, label: string): PositionInfo {
  return sync
    ? { id: `SR${n}`, role: "synchronous-rectifier", label: `${label} (synchronous)`, device: "mosfet", natural: true }
    : { id: `D${n}`, role: "other", label: `${label} (diode)`, device: "diode", natural: true };
}
