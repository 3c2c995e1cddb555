import "server-only";
import { line, widthOf, type Doc, type Weight } from "./pdfText";

// Page geometry and a plain table for the report (A4 portrait, points).
export const PAGE = { width: 595.28, height: 841.89, margin: 40 } as const;
export const CONTENT_WIDTH = PAGE.width - 2 * PAGE.margin;
const BOTTOM = PAGE.height - PAGE.margin - 16;
export const INK = "#1f2a30";
export const SOFT = "#46545c";
export const RULE = "#d9d3c7";

/** Room for `h` points below y, else a new page; returns the y to draw at. */
export function ensure(doc: Doc, y: number, h: number): number {
  if (y + h <= BOTTOM) return y;
  doc.addPage();
  return PAGE.margin;
}

/** `keep`: height that should follow on the same page (the section's body), capped at a page. */
export function heading(doc: Doc, text: string, y: number, size = 13, keep = 40): number {
  const at = ensure(doc, y, Math.min(size + keep, PAGE.height - 2 * PAGE.margin - 40));
  line(doc, text, PAGE.margin, at, { size, weight: "bold" });
  return at + size + 8;
}

export interface Column {
  title: string;
  width: number;
  align?: "left" | "right";
}

/** Header row repeated on every page the table runs onto; cells are single lines. */
export function table(doc: Doc, y: number, cols: Column[], rows: { cells: string[]; weight?: Weight; color?: string }[], size = 7.5): number {
  const rowH = size + 5;
  const drawHeader = (at: number) => {
    let x = PAGE.margin;
    for (const c of cols) {
      line(doc, c.title, x + 2, at, { size, weight: "bold", color: SOFT, width: c.width - 4, align: c.align ?? "left" });
      x += c.width;
    }
    doc.moveTo(PAGE.margin, at + rowH - 2).lineTo(PAGE.margin + cols.reduce((s, c) => s + c.width, 0), at + rowH - 2).lineWidth(0.6).strokeColor(RULE).stroke();
    return at + rowH;
  };
  let at = drawHeader(ensure(doc, y, rowH * 3));
  for (const r of rows) {
    if (at + rowH > BOTTOM) at = drawHeader(ensure(doc, at, rowH * 3 + BOTTOM));
    let x = PAGE.margin;
    r.cells.forEach((cell, i) => {
      const c = cols[i];
      line(doc, fit(doc, cell, c.width - 4, size, r.weight), x + 2, at, { size, weight: r.weight, color: r.color, width: c.width - 4, align: c.align ?? "left" });
      x += c.width;
    });
    at += rowH;
  }
  return at + 6;
}

/** Shorten a cell that would overrun its column (labels only; numbers are sized to fit). */
function fit(doc: Doc, text: string, width: number, size: number, weight: Weight = "regular"): string {
  if (widthOf(doc, text, size, weight) <= width) return text;
  let t = text;
  while (t.length > 1 && widthOf(doc, `${t}…`, size, weight) > width) t = t.slice(0, -1);
  return `${t}…`;
}
