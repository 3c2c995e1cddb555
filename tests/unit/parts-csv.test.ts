// The parts CSV and part validation as pure functions: parse, validate every
// row, serialise, and read the export back unchanged.
import { describe, expect, it } from "vitest";
import { columnOfPath, parsePartsCsv, serializePartsCsv } from "@/lib/parts/csv";
import { validatePartDraft } from "@/lib/parts/values";
import { formatExact, parseHfeCurve, parseVoltSecond } from "@/lib/parts/paramText";
import { partToModelBlock } from "@/lib/parts/modelBlock";
import { bjtSchema, mosfetSchema } from "@/models/input/schemaParts";
import { demoPartValues } from "@/db/seeds/demo-parts";
import { PART_KINDS } from "@/lib/parts/kinds";

const HEAD = "kind,manufacturer,mpn,description,unit_cost_usd,param.qg,param.qgs,param.qgd,param.vth,param.vpl,param.rds25,param.rthJA";
const GOOD = "mosfet,Acme Test,QX-1,test part,0.40,47 nC,12 nC,15 nC,2.5 V,4.6 V,12 mΩ,40 K/W";

describe("parsePartsCsv", () => {
  it("reads unit strings into SI numbers", () => {
    const r = parsePartsCsv(`${HEAD}\n${GOOD}\n`);
    expect(r.issues).toEqual([]);
    expect(r.rows[0]).toMatchObject({ row: 2, value: { mpn: "QX-1", unitCost: 0.4, params: { qg: 4.7e-8, rds25: 0.012, rthJA: 40 } } });
  });

  it("lists every problem by spreadsheet row and column", () => {
    const rows = [GOOD, GOOD.replace("QX-1", "QX-2").replace("47 nC", "47 V"), GOOD.replace("QX-1", "QX-3").replace("mosfet", "thyristor"), GOOD];
    const r = parsePartsCsv(`${HEAD},param.colour\n${rows.map((x) => `${x},`).join("\n")}\n`);
    expect(r.total).toBe(4);
    expect(r.rows.map((x) => x.row)).toEqual([2]);
    expect(r.issues.map((i) => [i.row, i.column])).toEqual([
      [1, "param.colour"],
      [3, "param.qg"],
      [4, "kind"],
      [5, "mpn"], // QX-1 twice
    ]);
    expect(r.issues[1].message).toBe('expected a charge (e.g. "47 nC"), got "47 V"');
    expect(r.issues[3].message).toMatch(/already on row 2/);
  });

  it("refuses a bare number where a unit is needed, and a figure of another kind", () => {
    const r = parsePartsCsv(`${HEAD},param.vz\n${GOOD.replace("47 nC", "47")},12 V\n`);
    expect(r.issues.map((i) => i.column).sort()).toEqual(["param.qg", "param.vz"]);
  });

  it("reports a missing required column", () => {
    expect(parsePartsCsv("kind,mpn\nmosfet,Q\n").issues).toContainEqual({ row: 1, column: "manufacturer", message: 'the column "manufacturer" is missing' });
  });

  it("maps validation paths to columns", () => {
    expect(columnOfPath("params.pin.sinkResistance")).toBe("param.pin.sinkResistance");
    expect(columnOfPath("tolerance.qg")).toBe("tol.qg");
    expect(columnOfPath("unitCost")).toBe("unit_cost_usd");
  });
});

describe("old column names (design document version 1)", () => {
  const OLD = `${HEAD},param.vTest,param.outputCapacitance.vTest,param.outputCapacitance.eoss`;
  const NEW = `${HEAD},param.qgVgs,param.outputCapacitance.vds,param.outputCapacitance.eoss`;
  const CELLS = `${GOOD},12 V,40 V,1.1 uJ`;

  it("reads param.vTest and param.outputCapacitance.vTest as the new columns", () => {
    const old = parsePartsCsv(`${OLD}\n${CELLS}\n`);
    expect(old.issues).toEqual([]);
    expect(old.rows[0].value.params).toMatchObject({ qgVgs: 12, outputCapacitance: { vds: 40, eoss: 1.1e-6 } });
    expect(old.rows[0].value).toEqual(parsePartsCsv(`${NEW}\n${CELLS}\n`).rows[0].value);
  });

  it("exports the new names only", () => {
    const header = serializePartsCsv([parsePartsCsv(`${OLD}\n${CELLS}\n`).rows[0].value]).split("\r\n")[0];
    expect(header).toContain("param.qgVgs");
    expect(header).toContain("param.outputCapacitance.vds");
    expect(header).not.toMatch(/vTest/);
  });

  it("refuses a row that gives both the old and the new name, at the old column", () => {
    const r = parsePartsCsv(`${HEAD},param.vTest,param.qgVgs\n${GOOD},12 V,10 V\n`);
    expect(r.rows).toEqual([]);
    expect(r.issues).toEqual([{ row: 2, column: "param.vTest", message: "vTest is the old name of qgVgs; give only one of them" }]);
  });
});

describe("serializePartsCsv", () => {
  it("round-trips every demo part of every kind exactly", () => {
    const parts = demoPartValues();
    expect(new Set(parts.map((p) => p.kind))).toEqual(new Set(PART_KINDS));
    const back = parsePartsCsv(serializePartsCsv(parts));
    expect(back.issues).toEqual([]);
    expect(back.rows.map((r) => r.value)).toEqual(parts);
  });

  it("neutralises spreadsheet formulas and reads them back as text", () => {
    const r = validatePartDraft({ kind: "zener", manufacturer: "=HYPERLINK(1)", mpn: "Z1", params: { vz: "-12 V" }, tolerance: {} });
    expect(r.ok).toBe(false); // Vz must be positive: negative values are refused where the model needs it
    const ok = validatePartDraft({ kind: "zener", manufacturer: "=HYPERLINK(1)", mpn: "Z1", params: { vz: "12 V", pzMax: "0.5 W", rthJA: "300 K/W" }, tolerance: {} });
    if (!ok.ok) throw new Error("zener invalid");
    const csv = serializePartsCsv([ok.value]);
    expect(csv).toContain("'=HYPERLINK(1)");
    expect(parsePartsCsv(csv).rows[0].value.manufacturer).toBe("=HYPERLINK(1)");
  });
});

describe("part values", () => {
  it("writes exact ASCII quantities", () => {
    expect(formatExact(4.7e-8, "charge")).toBe("47 nC");
    expect(formatExact(0.0123, "resistance")).toBe("12.3 mohm");
    expect(formatExact(3e-4, "inductance")).toBe("300 uH");
    expect(formatExact(150, "temperature")).toBe("150 degC");
  });

  it("reads volt-seconds and hFE curves", () => {
    expect(parseVoltSecond("25 V·µs")).toBeCloseTo(2.5e-5, 15);
    expect(parseVoltSecond("25Vus")).toBeCloseTo(2.5e-5, 15);
    expect(() => parseVoltSecond("25")).toThrow(/volt-second/);
    expect(() => parseVoltSecond("25 V")).toThrow(/volt-second/);
    expect(parseHfeCurve("10 mA: 200; 1 A: 120")).toEqual([{ ic: 0.01, hfe: 200 }, { ic: 1, hfe: 120 }]);
    expect(() => parseHfeCurve("10 mA: 200; 1 V: 120")).toThrow(/point 2/);
  });

  it("refuses an hFE curve that is not in rising Ic (the model's rule)", () => {
    const r = validatePartDraft({ kind: "bjt", manufacturer: "X", mpn: "B", params: { polarity: "npn", hfe: "1 A: 100; 10 mA: 200", icMax: "2 A", pMax: "1 W", rthJA: "200 K/W" }, tolerance: {} });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toBe("params.hfe");
  });

  it("gives model blocks that the model's own schemas accept", () => {
    for (const p of demoPartValues()) {
      const block = partToModelBlock(p);
      if (p.kind === "mosfet") expect(mosfetSchema.safeParse(block).success).toBe(true);
      if (p.kind === "bjt") {
        expect(bjtSchema.safeParse(block).success).toBe(true);
        expect(block).not.toHaveProperty("polarity");
      }
    }
  });
});
