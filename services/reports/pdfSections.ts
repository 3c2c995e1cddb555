import "server-only";
import { CAUTION_BENCH, CAUTION_HOT, CAUTION_MAINS } from "@/lib/cautions";
import { formatSi } from "@/lib/format";
import { LOSS_MECHANISMS, type LossMechanism } from "@/models/losses";
import { PART_TYPES } from "@/models/policy";
import type { CornerResult } from "@/models/evaluate";
import { groupWarnings } from "@/models/warningGroups";
import type { ReportData } from "./data";
import { line, para, type Doc } from "./pdfText";
import { CONTENT_WIDTH, PAGE, SOFT, ensure, heading, table, type Column } from "./pdfLayout";

// The text sections of the design-review report, top to bottom.
const M = PAGE.margin;
/** Column heads short enough for a portrait page; the legend of the loss chart spells them out. */
export const MECH_SHORT: Record<LossMechanism, string> = {
  quiescent: "Quiesc.", gateDrive: "Gate", conduction: "Cond.", turnOn: "Turn-on", turnOff: "Turn-off",
  coss: "Coss", reverseRecovery: "Qrr", diodeConduction: "Diode", clamp: "Clamp", buffer: "Buffer",
};
const MECH_KEY = "Columns: Quiesc. = quiescent supply (Vcc·Iq), Gate = share of the gate-drive power, Cond. = channel conduction, Turn-on / Turn-off = switching edges, Coss = Eoss at hard turn-on, Qrr = reverse recovery, Diode = body-diode conduction, Clamp = self-driven clamp, Buffer = follower drop.";
export const fmtT = (v: number) => formatSi(v, "°C", 4);
export const fmtK = (v: number) => formatSi(v, "K", 3);
export const fmtW = (v: number) => formatSi(v, "W", 3);

export function titleBlock(doc: Doc, d: ReportData): number {
  line(doc, "Heatsplit · design-review report", M, M, { size: 9, color: SOFT });
  line(doc, d.option.name, M, M + 14, { size: 18, weight: "bold" });
  const rows: [string, string][] = [
    ["Project", d.projectName],
    ["Design", d.design.name],
    ["Revision", `${d.revision.revision}${d.revision.frozen ? " (frozen)" : ""}, saved ${d.revision.createdAt.slice(0, 16).replace("T", " ")} UTC${d.revision.createdByName ? ` by ${d.revision.createdByName}` : ""}`],
    ["Note", d.revision.note || "—"],
    ["Generated", `${d.generatedAt.slice(0, 16).replace("T", " ")} UTC`],
  ];
  let y = M + 42;
  for (const [k, v] of rows) {
    line(doc, k, M, y, { size: 9, color: SOFT });
    line(doc, v, M + 80, y, { size: 9 });
    y += 13;
  }
  return y + 6;
}

export function cautions(doc: Doc, y: number): number {
  const top = ensure(doc, y, 90);
  let at = top + 8;
  line(doc, "Cautions", M + 10, at, { size: 10, weight: "bold" });
  at += 15;
  for (const [head, text] of [["Estimates", CAUTION_BENCH], ["Mains", CAUTION_MAINS], ["Heat", CAUTION_HOT]]) {
    line(doc, head.toUpperCase(), M + 10, at, { size: 7, weight: "bold", color: "#8a5a0c" });
    at = para(doc, text, M + 80, at, CONTENT_WIDTH - 95, { size: 8.5 });
  }
  doc.roundedRect(M, top, CONTENT_WIDTH, at - top + 4, 4).lineWidth(0.8).strokeColor("#c48a12").stroke();
  return at + 16;
}

export function junctionSummary(doc: Doc, d: ReportData, y: number): number {
  let at = heading(doc, "Junction temperatures at the worst corner", y);
  const cols: Column[] = [
    { title: "Part", width: 150 }, { title: "Worst corner", width: 85 }, { title: "Tj", width: 60, align: "right" },
    { title: "Derated limit", width: 70, align: "right" }, { title: "Tj(max)", width: 60, align: "right" }, { title: "Margin", width: 90, align: "right" },
  ];
  const rows = d.evaluation.parts.filter((p) => p.junction).map((p) => {
    const j = p.junction!;
    if (j.runaway) return { cells: [p.label, p.worstCornerId, "runaway", fmtT(j.limit), fmtT(j.tjMax), "no steady state"], color: "#8e2a20", weight: "bold" as const };
    return { cells: [p.label, p.worstCornerId, fmtT(j.tj), fmtT(j.limit), fmtT(j.tjMax), fmtK(j.margin)], color: j.margin < 0 ? "#8e2a20" : undefined, weight: j.margin < 0 ? ("bold" as const) : undefined };
  });
  at = table(doc, at, cols, rows);
  const w = d.evaluation.worstTotal;
  return para(doc, `Largest total modelled loss: ${fmtW(w.totalLoss)} at corner ${w.cornerId}. Margin = derated limit − Tj; negative margins are printed in red.`, M, at, CONTENT_WIDTH, { size: 8, color: SOFT }) + 8;
}

export function deratingPolicy(doc: Doc, d: ReportData, y: number): number {
  let at = heading(doc, "Derating policy in force", y);
  const p = d.design.derating;
  const cols: Column[] = [{ title: "Rule", width: 260 }, { title: "Value", width: 120, align: "right" }];
  const names = { controller: "controller", mosfet: "MOSFET", bjt: "bipolar buffer", driverIc: "driver IC", clamp: "clamp transistor" } as const;
  const rows = [
    ...PART_TYPES.map((t) => ({ cells: [`Tj margin below Tj(max), ${names[t]}`, fmtK(p.tjMargin[t])] })),
    { cells: ["|Vgs| at most this fraction of Vgs(max)", `${Number((p.vgsMaxFraction * 100).toPrecision(3))} %`] },
    { cells: ["Gate drive above the Miller plateau, at least", formatSi(p.minHeadroomAbovePlateau, "V", 3)] },
  ];
  at = table(doc, at, cols, rows);
  const w = d.workspacePolicy;
  const source = w
    ? `The workspace's derating policy (set${w.updatedBy ? ` by ${w.updatedBy.displayName}` : ""} ${w.updatedAt.slice(0, 16).replace("T", " ")} UTC); it replaces the design document's own block in every evaluation of the workspace.`
    : "No workspace policy is set: the design document's own derating block (or the model defaults) applies.";
  return para(doc, source, M, at, CONTENT_WIDTH, { size: 8, color: SOFT }) + 8;
}

export function reviewSection(doc: Doc, d: ReportData, y: number): number {
  let at = heading(doc, "Review status", y);
  if (!d.review) return para(doc, "Not reviewed: no review record exists for this revision.", M, at, CONTENT_WIDTH, { size: 9 }) + 8;
  const entries = [...d.review.decisions.map((e) => ({ ...e, kind: "Decision" })), ...d.review.comments.map((e) => ({ ...e, kind: "Comment" }))];
  for (const e of entries) {
    at = ensure(doc, at, 30);
    const head = [e.kind, e.status, e.by, e.at ? `${e.at.slice(0, 16).replace("T", " ")} UTC` : null].filter(Boolean).join(" · ");
    line(doc, head, M, at, { size: 8, weight: "bold", color: SOFT });
    at = para(doc, e.text ?? "", M, at + 11, CONTENT_WIDTH, { size: 9 }) + 4;
  }
  return at + 8;
}

export function warningsSection(doc: Doc, d: ReportData, y: number): number {
  let at = heading(doc, "Warnings", y);
  if (d.evaluation.warnings.length === 0) return para(doc, "The model raised no warnings at any corner.", M, at, CONTENT_WIDTH, { size: 9 }) + 8;
  for (const w of groupWarnings(d.evaluation.warnings)) {
    at = ensure(doc, at, 24);
    const corners = w.cornerIds.length === 1 ? `corner ${w.cornerIds[0]}` : `corners ${w.cornerIds.join(", ")}`;
    at = para(doc, `[${w.severity}] ${w.partId} (${corners}): ${w.message}`, M, at, CONTENT_WIDTH, { size: 8.5, color: w.severity === "error" ? "#8e2a20" : undefined }) + 2;
  }
  return at + 8;
}

/** One corner: every part's loss by mechanism (columns with any loss at this corner), total and Tj. */
export function budgetKey(doc: Doc, y: number): number {
  return para(doc, `${MECH_KEY} Losses in W with SI prefixes; Tj in °C.`, M, y, CONTENT_WIDTH, { size: 7.5, color: SOFT }) + 6;
}

export function cornerBudget(doc: Doc, c: CornerResult, y: number): number {
  let at = heading(doc, `Corner ${c.cornerId}: ${c.label}`, y, 11, 11 + 30 + 12 * (c.parts.length + 2));
  const eff = c.efficiency === null ? "" : `, efficiency of the modelled losses ${(c.efficiency * 100).toFixed(2)} %`;
  at = para(doc, `Vin ${formatSi(c.vin, "V")}, fsw ${formatSi(c.fsw, "Hz")}, ambient ${fmtT(c.ambient)}, load ${(c.loadFraction * 100).toFixed(0)} %; total modelled loss ${fmtW(c.totalLoss)}${eff}.`, M, at, CONTENT_WIDTH, { size: 8, color: SOFT });
  const mechs = LOSS_MECHANISMS.filter((m) => c.parts.some((p) => p.losses[m] > 0));
  const numW = Math.min(52, (CONTENT_WIDTH - 105 - 2 * 50) / Math.max(mechs.length, 1));
  const cols: Column[] = [
    { title: "Part", width: 105 },
    ...mechs.map((m) => ({ title: MECH_SHORT[m], width: numW, align: "right" as const })),
    { title: "Total", width: 50, align: "right" }, { title: "Tj", width: 50, align: "right" },
  ];
  const rows = c.parts.map((p) => ({
    cells: [p.label, ...mechs.map((m) => (p.losses[m] > 0 ? fmtW(p.losses[m]) : "–")), fmtW(p.total), p.junction ? (p.junction.runaway ? "runaway" : fmtT(p.junction.tj)) : ""],
  }));
  return table(doc, at + 2, cols, rows, 7) + 6;
}
