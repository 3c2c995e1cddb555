import "server-only";
/**
 * Is this upload a PDF? Decided by content, never by file name or declared
 * type: the header "%PDF-<major>.<minor>" at byte 0 (ISO 32000-1:2008 §7.5.2;
 * we are stricter than readers that skip leading junk), at least one indirect
 * object ("obj"), and a trailer with "startxref" and "%%EOF" in the last
 * kilobyte (§7.5.5). A PNG, ZIP or HTML page renamed ".pdf" fails at once.
 */
const HEADER = /^%PDF-[12]\.\d/;
const TAIL_BYTES = 1024;

function ascii(bytes: Uint8Array, start: number, end: number): string {
  return Buffer.from(bytes.buffer, bytes.byteOffset + start, Math.max(0, end - start)).toString("latin1");
}

export function looksLikePdf(bytes: Uint8Array): boolean {
  if (bytes.byteLength < 32) return false;
  if (!HEADER.test(ascii(bytes, 0, 16))) return false;
  const tail = ascii(bytes, Math.max(0, bytes.byteLength - TAIL_BYTES), bytes.byteLength);
  if (!tail.includes("%%EOF") || !tail.includes("startxref")) return false;
  return /\d+\s+\d+\s+obj\b/.test(ascii(bytes, 0, Math.min(bytes.byteLength, 1 << 20)));
}

/** A name safe for Content-Disposition and the file list: no path, plain characters, ".pdf". */
export function safePdfFilename(name: string | null | undefined): string {
  const base = (name ?? "").split(/[\\/]/).pop() ?? "";
  const cleaned = base.replace(/[^A-Za-z0-9._ ()-]+/g, "_").replace(/^[.\s]+/, "").slice(0, 120).trim();
  const stem = cleaned.replace(/\.pdf$/i, "") || "datasheet";
  return `${stem}.pdf`;
}
