/**
 * Colours and words for the loss mechanisms, shared by the stacked bar, its
 * legend and the ledger table. Our own assignment from the Heatsplit palette
 * (tailwind.config.ts): copper for gate-drive heat (the heat a drive choice
 * moves around), warm tones for switching edges, cool tones for conduction.
 * Neighbours in the stack differ in lightness as well as hue, so the bar
 * still reads in greyscale.
 */
import { LOSS_MECHANISMS, type LossMechanism } from "@/models/losses";

export const MECHANISM_COLOURS: Record<LossMechanism, string> = {
  quiescent: "#9aa8c8",
  gateDrive: "#b8652f",
  conduction: "#36456b",
  turnOn: "#e9c46a",
  turnOff: "#c48a12",
  coss: "#7fbfae",
  reverseRecovery: "#e39a94",
  diodeConduction: "#1f5f51",
  clamp: "#8e2a20",
  buffer: "#dc9a6c",
};

export const MECHANISM_LABELS: Record<LossMechanism, string> = {
  quiescent: "Quiescent supply",
  gateDrive: "Gate drive",
  conduction: "Channel conduction",
  turnOn: "Turn-on edge",
  turnOff: "Turn-off edge",
  coss: "Coss discharge",
  reverseRecovery: "Reverse recovery",
  diodeConduction: "Body-diode conduction",
  clamp: "Gate clamp",
  buffer: "Buffer drop",
};

export { LOSS_MECHANISMS };
export type { LossMechanism };

/** Sequential ramp for temperature rise: cool paper-blue through copper to alarm red. */
export const RISE_RAMP = ["#eef1f7", "#dbe1ee", "#f3dccb", "#dc9a6c", "#b8652f", "#8a4720", "#8e2a20"] as const;

/** Theme for nivo charts: our fonts and ink colours instead of the library's. */
export const CHART_THEME = {
  background: "transparent",
  text: { fontFamily: "var(--font-plex-sans), system-ui, sans-serif", fontSize: 12, fill: "#46545c" },
  axis: {
    domain: { line: { stroke: "#8f8676", strokeWidth: 1 } },
    ticks: { line: { stroke: "#8f8676", strokeWidth: 1 }, text: { fontFamily: "var(--font-plex-mono), ui-monospace, monospace", fontSize: 11, fill: "#46545c" } },
    legend: { text: { fontSize: 12, fontWeight: 600, fill: "#1f2a30" } },
  },
  grid: { line: { stroke: "#d9d3c7", strokeWidth: 1 } },
  legends: { text: { fontSize: 11, fill: "#46545c" }, title: { text: { fontSize: 11, fontWeight: 600, fill: "#1f2a30" } }, ticks: { text: { fontFamily: "var(--font-plex-mono), ui-monospace, monospace", fontSize: 10, fill: "#46545c" } } },
  tooltip: { container: { background: "#fffdf8", color: "#1f2a30", fontSize: 12, borderRadius: 6, boxShadow: "0 2px 4px rgba(31,42,48,0.08), 0 8px 24px rgba(31,42,48,0.12)" } },
  labels: { text: { fontFamily: "var(--font-plex-mono), ui-monospace, monospace", fontSize: 10 } },
} as const;
