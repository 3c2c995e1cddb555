import "server-only";
import fs from "node:fs";
import path from "node:path";
import type PDFDocument from "pdfkit";

// Fonts shipped with the app for reports: IBM Plex Sans (SIL OFL, see
// fonts/OFL-IBM-Plex.txt) as WOFF from @fontsource. pdfkit's subsetter fails
// on the WOFF2 files the web pages use, so the WOFF copies live here. The
// latin subset has no Greek: θ, Ω, Δ, µ-as-mu come from the greek subset, so
// every string is drawn as runs, each in the subset that has its glyphs.
export type Doc = InstanceType<typeof PDFDocument>;
export type Weight = "regular" | "bold";

const FONT_DIR = path.join(process.cwd(), "services/reports/fonts");
const FILES = {
  "latin-regular": "ibm-plex-sans-latin-400-normal.woff",
  "latin-bold": "ibm-plex-sans-latin-600-normal.woff",
  "greek-regular": "ibm-plex-sans-greek-400-normal.woff",
  "greek-bold": "ibm-plex-sans-greek-600-normal.woff",
} as const;

let cache: Record<string, Buffer> | null = null;

export function registerReportFonts(doc: Doc): void {
  cache ??= Object.fromEntries(Object.entries(FILES).map(([k, f]) => [k, fs.readFileSync(path.join(FONT_DIR, f))]));
  for (const [name, bytes] of Object.entries(cache)) doc.registerFont(name, bytes);
  doc.font("latin-regular");
}

const GREEK = /[\u0370-\u03ff]/;
/** Signs neither subset carries (model messages use a few): plain-text stand-ins rather than blanks. */
const STAND_INS: Record<string, string> = { "≈": "~", "≥": ">=", "≤": "<=", "→": "->", "←": "<-", "√": "sqrt", "∞": "inf", "‰": " per mille", "≠": "!=" };
const MISSING = new RegExp(`[${Object.keys(STAND_INS).join("")}]`, "g");

function runs(raw: string): { greek: boolean; text: string }[] {
  const text = raw.replace(MISSING, (c) => STAND_INS[c] ?? c);
  const out: { greek: boolean; text: string }[] = [];
  for (const ch of text) {
    const greek = GREEK.test(ch);
    const last = out[out.length - 1];
    if (last && last.greek === greek) last.text += ch;
    else out.push({ greek, text: ch });
  }
  return out;
}

const face = (greek: boolean, weight: Weight) => `${greek ? "greek" : "latin"}-${weight}`;

export function widthOf(doc: Doc, text: string, size: number, weight: Weight = "regular"): number {
  let w = 0;
  for (const r of runs(text)) w += doc.font(face(r.greek, weight)).fontSize(size).widthOfString(r.text);
  return w;
}

/** One line at (x, y), no wrapping; align within `width` when given. */
export function line(doc: Doc, text: string, x: number, y: number, o: { size?: number; weight?: Weight; color?: string; width?: number; align?: "left" | "right" | "center" } = {}): void {
  const size = o.size ?? 9;
  const weight = o.weight ?? "regular";
  let cx = x;
  if (o.width !== undefined && o.align && o.align !== "left") {
    const w = widthOf(doc, text, size, weight);
    cx = o.align === "right" ? x + o.width - w : x + (o.width - w) / 2;
  }
  doc.fillColor(o.color ?? "#1f2a30");
  for (const r of runs(text)) {
    doc.font(face(r.greek, weight)).fontSize(size).text(r.text, cx, y, { lineBreak: false });
    cx += doc.widthOfString(r.text);
  }
}

/** A wrapped paragraph from (x, y) in `width`; returns the y below it. */
export function para(doc: Doc, text: string, x: number, y: number, width: number, o: { size?: number; weight?: Weight; color?: string } = {}): number {
  const size = o.size ?? 9;
  const rs = runs(text);
  doc.fillColor(o.color ?? "#1f2a30");
  rs.forEach((r, i) => {
    doc.font(face(r.greek, o.weight ?? "regular")).fontSize(size);
    if (i === 0) doc.text(r.text, x, y, { width, continued: i < rs.length - 1 });
    else doc.text(r.text, { width, continued: i < rs.length - 1 });
  });
  return doc.y + 2;
}
