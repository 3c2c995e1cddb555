// The one CSV writer for every file Heatsplit produces (budget report, parts
// export, bench files served back). Every cell is quoted, header and comment
// lines included, so no value can split a line into more cells; and a text
// cell that a spreadsheet would run as a formula (starting with = + - @, tab
// or carriage return, the OWASP "CSV Injection" list) gets a leading
// apostrophe, which spreadsheets show as text. Numbers are written as
// numbers: a negative figure is data, not a formula. Our own readers strip
// the apostrophe again (lib/parts/csv.ts).

export type CsvCell = string | number | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: CsvCell): string {
  if (value === null || value === undefined) return '""';
  const text = typeof value === "number" ? (Number.isFinite(value) ? String(value) : "") : FORMULA_START.test(value) ? `'${value}` : value;
  return `"${text.replace(/"/g, '""')}"`;
}

/** Rows -> CSV text, CRLF line ends (RFC 4180), a final CRLF. */
export function writeCsv(rows: readonly (readonly CsvCell[])[]): string {
  return rows.map((r) => r.map(csvCell).join(",")).join("\r\n") + "\r\n";
}
