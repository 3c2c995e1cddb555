import { formatQuantity } from "@/models/input/units";
import type { ProjectFormText } from "./ProjectFields";

interface ProjectLike {
  name: string;
  topology: string;
  vinMin: number;
  vinNom: number;
  vinMax: number;
  fsw: number;
  ambientMax: number;
  efficiencyTarget: number | null;
  status: string;
  notes: string;
  outputs: { label: string; voltage: number; current: number }[];
}

const plain = (x: number) => String(Number(x.toPrecision(6)));

/** A stored project as the form shows it: plain V, A and °C, fsw with a prefix, efficiency in %. */
export function projectFormText(p: ProjectLike): ProjectFormText {
  return {
    name: p.name,
    topology: p.topology,
    vinMin: plain(p.vinMin),
    vinNom: plain(p.vinNom),
    vinMax: plain(p.vinMax),
    fsw: formatQuantity(p.fsw, "frequency", 6),
    ambientMax: plain(p.ambientMax),
    efficiencyTarget: p.efficiencyTarget === null ? "" : `${plain(p.efficiencyTarget * 100)} %`,
    status: p.status,
    notes: p.notes,
    outputs: p.outputs.map((o) => ({ label: o.label, voltage: plain(o.voltage), current: plain(o.current) })),
  };
}
