// The shared CSV writer (lib/csv.ts): every cell quoted, formula
// starts neutralised (OWASP "CSV Injection"), numbers left as numbers, and
// what it writes reads back cell for cell.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvCell, writeCsv } from "@/lib/csv";

describe("writeCsv", () => {
  it("quotes every cell, header and comment lines included, so a comma or quote cannot split a line", () => {
    const text = writeCsv([["# note: Rev B,=HYPERLINK(\"x\")"], ["a", "b"], ['say "hi"', "x,y"]]);
    expect(text).toBe('"# note: Rev B,=HYPERLINK(""x"")"\r\n"a","b"\r\n"say ""hi""","x,y"\r\n');
  });

  it("puts an apostrophe before a text cell a spreadsheet would run, and nowhere else", () => {
    for (const start of ["=", "+", "-", "@", "\t", "\r"]) expect(csvCell(`${start}cmd`)).toBe(`"'${start}cmd"`);
    expect(csvCell("plain -5 V")).toBe('"plain -5 V"');
    expect(csvCell("'=already")).toBe(`"'=already"`);
  });

  it("writes numbers as numbers (a negative margin is data), and nothing for null or a non-finite number", () => {
    expect(csvCell(-3.25)).toBe('"-3.25"');
    expect(csvCell(1e-9)).toBe('"1e-9"');
    expect(csvCell(null)).toBe('""');
    expect(csvCell(Number.NaN)).toBe('""');
  });

  it("reads back cell for cell (apostrophes aside)", () => {
    const rows = [["kind", "note"], ["mosfet", "line\nbreak, and \"quotes\""], ["=SUM(1)", "ok"]];
    const back = Papa.parse<string[]>(writeCsv(rows), { skipEmptyLines: true }).data;
    expect(back).toEqual([["kind", "note"], ["mosfet", "line\nbreak, and \"quotes\""], ["'=SUM(1)", "ok"]]);
  });
});
