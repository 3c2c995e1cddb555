// fast-check generators for the write-route fuzz test: malformed versions of
// a valid JSON body (one field replaced with junk, removed, or an unknown
// field added), whole bodies of random JSON, JSON nested 100 000 deep, lone
// surrogates, CSV imports with spoiled cells and headers, and datasheet bytes. Each generated case says what it changed,
// so a validation refusal can be checked for naming that field.
import fc from "fast-check";

export type Mutation =
  | { kind: "replace"; path: string; value: unknown }
  | { kind: "delete"; path: string }
  | { kind: "addKey"; path: string; key: string }
  | { kind: "whole"; value: unknown }
  | { kind: "rawText"; text: string };

/** Values that are wrong for most fields: wrong types, NaN-like and huge strings, units of the wrong dimension, nested junk. */
export const junkValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom("NaN", "Infinity", "-Infinity", "1e309", "-1e309", "nan V", "0x1F", "", " ", "null", "undefined", "true", "[object Object]"),
  fc.constantFrom("47 V", "3 kHz", "12 mΩ", "85 °C", "5 nC", "10 %", "2 A", "40 K/W", "1e400 nC", "-5 nC", "abc V", "5 nC/V", "12 furlongs", "½ V"),
  fc.constantFrom(1e308, -1e308, 5e-324, -0, 2 ** 53 + 2, -1, 0, 1.5, 123456789),
  fc.constantFrom(true, false, null, [], {}, [null], { "": "" }, { __proto__: { polluted: 1 } }, { constructor: { prototype: { x: 1 } } }),
  fc.constantFrom("x".repeat(5_000), "x".repeat(70_000), "\u0000\u0001\u0002", "🔥".repeat(200), "<script>alert(1)</script>", "'; drop table project; --"),
  // a lone surrogate (PostgreSQL refuses it), line breaks and controls (names, redirect targets), off-site paths
  fc.constantFrom("\ud800", "rev \udfff B", "a\ud83d", "line\nbreak", "a\r\nSet-Cookie: x=1", "\t/evil.example", "/.//evil.example", "/€", "\u202egnp.exe", "=HYPERLINK(\"http://evil.example\")"),
  fc.string({ maxLength: 40 }),
  fc.integer(),
  fc.double(),
  fc.jsonValue({ maxDepth: 3 }),
);

/** JSON nested far deeper than any route accepts (once a stack overflow, unauthenticated): arrays, objects, or both. */
export const deepJson: fc.Arbitrary<string> = fc
  .record({ depth: fc.constantFrom(65, 1_000, 100_000), shape: fc.constantFrom("array", "object", "mixed") })
  .map(({ depth, shape }) => {
    if (shape === "array") return "[".repeat(depth) + "]".repeat(depth);
    if (shape === "object") return '{"a":'.repeat(depth) + "1" + "}".repeat(depth);
    return '{"a":['.repeat(depth / 2) + "1" + "]}".repeat(depth / 2);
  });

/** Dotted paths of every value inside `body` (objects and arrays), up to a depth. */
export function pathsOf(body: unknown, prefix = "", depth = 0, out: string[] = []): string[] {
  if (depth > 7 || body === null || typeof body !== "object") return out;
  for (const [k, v] of Object.entries(body as Record<string, unknown>)) {
    const p = prefix ? `${prefix}.${k}` : k;
    out.push(p);
    pathsOf(v, p, depth + 1, out);
  }
  return out;
}

function parentAndKey(root: Record<string, unknown>, path: string): { parent: Record<string, unknown>; key: string } | null {
  const parts = path.split(".");
  let node: unknown = root;
  for (const p of parts.slice(0, -1)) {
    if (node === null || typeof node !== "object") return null;
    node = (node as Record<string, unknown>)[p];
  }
  if (node === null || typeof node !== "object") return null;
  return { parent: node as Record<string, unknown>, key: parts[parts.length - 1] };
}

/** Applies a mutation to a deep copy of `valid`; the JSON text to send. */
export function applyMutation(valid: unknown, m: Mutation): string {
  if (m.kind === "rawText") return m.text;
  if (m.kind === "whole") return JSON.stringify(m.value);
  const copy = structuredClone(valid ?? {}) as Record<string, unknown>;
  if (m.kind === "addKey") {
    const target = m.path ? parentAndKey(copy, m.path + ".x") : { parent: copy, key: "x" };
    if (target) target.parent[m.key] = "unexpected";
    return JSON.stringify(copy);
  }
  const at = parentAndKey(copy, m.path);
  if (at) {
    if (m.kind === "delete") {
      if (Array.isArray(at.parent)) at.parent.splice(Number(at.key), 1);
      else delete at.parent[at.key];
    } else at.parent[at.key] = m.value;
  }
  return JSON.stringify(copy);
}

/** A mutation of `valid` (or a whole-body replacement). */
export function mutationOf(valid: unknown): fc.Arbitrary<Mutation> {
  const paths = pathsOf(valid);
  const objectPaths = ["", ...paths.filter((p) => {
    const at = parentAndKey(structuredClone(valid ?? {}) as Record<string, unknown>, p);
    const v = at?.parent[at.key];
    return v !== null && typeof v === "object" && !Array.isArray(v);
  })];
  const alternatives: fc.WeightedArbitrary<Mutation>[] = [
    { weight: 1, arbitrary: fc.record({ kind: fc.constant("addKey" as const), path: fc.constantFrom(...objectPaths), key: fc.constantFrom("extra", "__proto__x", "isAdmin", "workspaceId", "role") }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant("whole" as const), value: fc.oneof(fc.jsonValue({ maxDepth: 4 }), junkValue) }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant("rawText" as const), text: fc.oneof(fc.constantFrom("{", "{\"a\":", "not json", "[1,2,", "{\"x\": NaN}", "{\"x\": Infinity}", "\u0000", "{}}", "{\"a\":\"\\ud800\"}", "[\"\\udc00\"]"), deepJson) }) },
  ];
  // a body without fields (e.g. {}) gets unknown keys and whole-body junk only
  if (paths.length) {
    const field = fc.constantFrom(...paths);
    alternatives.push(
      { weight: 5, arbitrary: fc.record({ kind: fc.constant("replace" as const), path: field, value: junkValue }) },
      { weight: 2, arbitrary: fc.record({ kind: fc.constant("delete" as const), path: field }) },
    );
  }
  return fc.oneof(...alternatives);

}

const CSV_HEADER = ["kind", "manufacturer", "mpn", "description", "unit_cost_usd", "param.qg", "param.qgs", "param.qgd", "param.vth", "param.vpl", "param.rds25", "param.rthJA"];

function csvCell(c: string): string {
  return /[",\n\r]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c;
}

/** A small valid parts CSV, then spoiled: cells, header and framing. */
export const csvBody: fc.Arbitrary<{ text: string; spoiled: string }> = fc
  .record({
    rows: fc.integer({ min: 0, max: 6 }),
    cellJunk: fc.array(fc.record({ row: fc.nat(6), col: fc.nat(CSV_HEADER.length - 1), value: fc.oneof(junkValue.map((v) => (typeof v === "string" ? v : JSON.stringify(v) ?? ""))) }), { maxLength: 3 }),
    header: fc.constantFrom("keep", "drop", "rename", "duplicate", "extra", "empty"),
    framing: fc.constantFrom("none", "bom", "crlf", "unbalancedQuote", "nul", "blankLines", "semicolons", "binary"),
    seed: fc.nat(1_000_000),
  })
  .map(({ rows, cellJunk, header, framing, seed }) => {
    const head = [...CSV_HEADER];
    if (header === "rename") head[2] = "part number";
    if (header === "duplicate") head.push("mpn");
    if (header === "extra") head.push("param.nonsense");
    const lines: string[][] = [];
    for (let i = 0; i < rows; i++) lines.push(["mosfet", "Fuzzworks", `FZ-${seed}-${i}`, `row ${i}`, "0.5", "47 nC", "12 nC", "15 nC", "2.5 V", "4.6 V", "12 mohm", "40 K/W"]);
    for (const j of cellJunk) if (lines[j.row]) lines[j.row][j.col] = j.value;
    const body = lines.map((l) => l.map(csvCell).join(","));
    const all = header === "drop" ? body : [header === "empty" ? "" : head.join(","), ...body];
    let text = all.join("\n") + "\n";
    if (framing === "bom") text = "\uFEFF" + text;
    if (framing === "crlf") text = text.replace(/\n/g, "\r\n");
    if (framing === "unbalancedQuote") text = text.replace(",row", ',"row');
    if (framing === "nul") text = text.replace("Fuzzworks", "Fuzz\u0000works");
    if (framing === "blankLines") text = text.replace(/\n/g, "\n\n,,,\n");
    if (framing === "semicolons") text = text.replace(/,/g, ";");
    if (framing === "binary") text = String.fromCharCode(...Array.from({ length: 64 }, (_, i) => (seed * (i + 7)) % 256));
    return { text, spoiled: `header ${header}, framing ${framing}, ${cellJunk.length} junk cells, ${rows} rows` };
  });

/** Datasheet bytes: a valid tiny PDF, a truncated or corrupted one, or random bytes. */
export function datasheetBytes(validPdf: Uint8Array): fc.Arbitrary<{ bytes: Uint8Array; what: string }> {
  return fc.oneof(
    fc.constant({ bytes: validPdf, what: "valid pdf" }),
    fc.nat(validPdf.length - 1).map((n) => ({ bytes: validPdf.slice(0, n), what: `pdf cut at ${n}` })),
    fc.uint8Array({ maxLength: 2048 }).map((b) => ({ bytes: b, what: `${b.length} random bytes` })),
    fc.uint8Array({ minLength: 1, maxLength: 64 }).map((b) => ({ bytes: new Uint8Array([...new TextEncoder().encode("%PDF-1.4\n"), ...b]), what: "pdf header then junk" })),
  );
}
