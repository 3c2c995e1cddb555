import "server-only";
import { formatSi } from "@/lib/format";
import { MECHANISM_COLOURS, MECHANISM_LABELS, RISE_RAMP } from "@/lib/palette";
import { LOSS_MECHANISMS } from "@/models/losses";
import type { CornerResult } from "@/models/evaluate";
import type { SweepResult } from "@/models/sweep";
import { line, para, type Doc } from "./pdfText";
import { CONTENT_WIDTH, PAGE, RULE, SOFT, ensure, heading } from "./pdfLayout";

// Vector charts drawn with pdfkit's path operators (no raster images).
const M = PAGE.margin;

/** Stacked horizontal bars: every part's loss by mechanism at one corner. */
export function lossChart(doc: Doc, c: CornerResult, y: number): number {
  const parts = c.parts.filter((p) => p.total > 0);
  let at = heading(doc, `Losses by part and mechanism at corner ${c.cornerId}`, y, 13, parts.length * 13 + 60);
  const max = Math.max(...parts.map((p) => p.total), 1e-9);
  const labelW = 130, barW = CONTENT_WIDTH - labelW - 60, rowH = 13;
  at = ensure(doc, at, parts.length * rowH + 60);
  for (const p of parts) {
    line(doc, p.label, M, at + 2, { size: 7.5, width: labelW - 6 });
    let x = M + labelW;
    for (const m of LOSS_MECHANISMS) {
      const w = (p.losses[m] / max) * barW;
      if (w <= 0) continue;
      doc.rect(x, at, w, rowH - 3).fill(MECHANISM_COLOURS[m]);
      x += w;
    }
    line(doc, formatSi(p.total, "W"), x + 4, at + 2, { size: 7.5, color: SOFT });
    at += rowH;
  }
  doc.moveTo(M + labelW, at).lineTo(M + labelW + barW, at).lineWidth(0.6).strokeColor(RULE).stroke();
  for (const f of [0, 0.5, 1]) line(doc, formatSi(max * f, "W"), M + labelW + barW * f - 20, at + 3, { size: 7, color: SOFT, width: 40, align: "center" });
  at += 16;
  let lx = M;
  for (const m of LOSS_MECHANISMS.filter((k) => parts.some((p) => p.losses[k] > 0))) {
    const label = MECHANISM_LABELS[m];
    if (lx + 110 > M + CONTENT_WIDTH) { lx = M; at += 11; }
    doc.rect(lx, at + 1, 7, 7).fill(MECHANISM_COLOURS[m]);
    line(doc, label, lx + 10, at, { size: 7.5 });
    lx += 110;
  }
  return at + 22;
}

function hexToRgb(h: string): [number, number, number] {
  return [parseInt(h.slice(1, 3), 16), parseInt(h.slice(3, 5), 16), parseInt(h.slice(5, 7), 16)];
}

function ramp(t: number): string {
  const f = Math.min(Math.max(t, 0), 1) * (RISE_RAMP.length - 1);
  const i = Math.min(Math.floor(f), RISE_RAMP.length - 2);
  const a = hexToRgb(RISE_RAMP[i]), b = hexToRgb(RISE_RAMP[i + 1]);
  const mix = a.map((v, k) => Math.round(v + (b[k] - v) * (f - i)));
  return `#${mix.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
}

/** Coloured cells of a sweep with its limit contour and the design point. */
export function heatmap(doc: Doc, s: SweepResult, y: number, title: string): number {
  const size = Math.min(CONTENT_WIDTH - 90, 330);
  const at = heading(doc, title, y, 13, size + 70);
  const x0 = M + 50, y0 = at, nx = s.x.values.length, ny = s.y.values.length;
  const cw = size / nx, ch = size / ny;
  const vals = s.z.flat().filter((v): v is number => v !== null);
  const lo = Math.min(...vals), hi = Math.max(...vals);
  // Row 0 (smallest y value) at the bottom, as on a plot.
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) {
      const v = s.z[j]?.[i];
      doc.rect(x0 + i * cw, y0 + size - (j + 1) * ch, cw + 0.3, ch + 0.3).fill(v === null || v === undefined ? "#1f2a30" : ramp((v - lo) / (hi - lo || 1)));
    }
  const px = (i: number) => x0 + (i + 0.5) * cw;
  const py = (j: number) => y0 + size - (j + 0.5) * ch;
  for (const poly of s.contour) {
    poly.forEach((p, k) => (k === 0 ? doc.moveTo(px(p.i), py(p.j)) : doc.lineTo(px(p.i), py(p.j))));
    doc.lineWidth(1.6).strokeColor("#ffffff").stroke();
    poly.forEach((p, k) => (k === 0 ? doc.moveTo(px(p.i), py(p.j)) : doc.lineTo(px(p.i), py(p.j))));
    doc.lineWidth(0.8).dash(3, { space: 2 }).strokeColor("#8e2a20").stroke().undash();
  }
  if (s.designPoint.inRange) {
    const fi = (Math.log(s.designPoint.x / s.x.values[0]) / Math.log(s.x.values[nx - 1] / s.x.values[0])) * (nx - 1);
    const fj = ((s.designPoint.y - s.y.values[0]) / (s.y.values[ny - 1] - s.y.values[0])) * (ny - 1);
    doc.circle(px(fi), py(fj), 3.2).lineWidth(1.2).fillAndStroke("#ffffff", "#1f2a30");
  }
  doc.rect(x0, y0, size, size).lineWidth(0.6).strokeColor(SOFT).stroke();
  for (const i of [0, Math.floor((nx - 1) / 2), nx - 1]) line(doc, formatSi(s.x.values[i], "Hz"), px(i) - 25, y0 + size + 4, { size: 7, color: SOFT, width: 50, align: "center" });
  for (const j of [0, Math.floor((ny - 1) / 2), ny - 1]) line(doc, `${Number(s.y.values[j].toPrecision(3))}×`, M, py(j) - 4, { size: 7, color: SOFT, width: 44, align: "right" });
  line(doc, "switching frequency (log)", x0, y0 + size + 15, { size: 7.5, width: size, align: "center" });
  line(doc, "Qg ×", M, y0 - 11, { size: 7.5 });
  // Colour key.
  const kx = x0 + size + 14;
  for (let k = 0; k < 40; k++) doc.rect(kx, y0 + size - (k + 1) * (size / 40), 10, size / 40 + 0.3).fill(ramp(k / 39));
  line(doc, formatSi(hi, s.unit), kx + 13, y0 - 2, { size: 7, color: SOFT });
  line(doc, formatSi(lo, s.unit), kx + 13, y0 + size - 7, { size: 7, color: SOFT });
  const lim = s.limit === null ? "none" : formatSi(s.limit, s.unit);
  return para(doc, `Controller temperature rise Tj − Ta (${s.unit}) at corner ${s.cornerId}, ${nx} × ${ny} grid; dashed red line: the derated limit (${lim} rise); ring: the design point; black cells: thermal runaway (${s.runawayCells}).`, M, y0 + size + 30, CONTENT_WIDTH, { size: 8, color: SOFT }) + 8;
}
