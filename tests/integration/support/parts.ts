// Parts test helpers: request bodies, CSV files, and PDF / PNG bytes for the
// datasheet upload checks. The parts are invented.
import { Client, ORIGIN } from "./http";

export function mosfetBody(mpn: string, overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    kind: "mosfet",
    manufacturer: "Testbench Semis",
    mpn,
    description: "invented test MOSFET",
    unitCost: "0.42 USD",
    params: { qg: "47 nC", qgs: "12 nC", qgd: "15 nC", vth: "2.5 V", vpl: "4.6 V", rds25: "12 mΩ", rthJA: "40 K/W" },
    tolerance: { qg: "10 %" },
    ...overrides,
  };
}

export async function createPart(client: Client, body: Record<string, unknown>): Promise<string> {
  const r = await client.post("/api/v1/parts", body);
  if (r.status !== 201) throw new Error(`part not created: ${r.status} ${r.text}`);
  return r.json<{ part: { id: string } }>().part.id;
}

const HEADER = "kind,manufacturer,mpn,description,unit_cost_usd,param.qg,param.qgs,param.qgd,param.vth,param.vpl,param.rds25,param.rthJA,param.hfe,param.icMax,param.pMax,param.polarity,tol.qg";

/** n rows alternating MOSFETs and NPN transistors; `mutate(i, cells)` may spoil one. */
export function partsCsv(n: number, prefix: string, mutate?: (i: number, cells: string[]) => void): string {
  const lines = [HEADER];
  for (let i = 0; i < n; i++) {
    const mpn = `${prefix}-${String(i).padStart(4, "0")}`;
    const qg = 20 + (i % 40);
    const cells =
      i % 2 === 0
        ? ["mosfet", "Importworks", mpn, `row ${i}`, "0.5", `${qg} nC`, "6 nC", "5 nC", "2.1 V", "4.2 V", `${3 + (i % 9)} mohm`, "45 K/W", "", "", "", "", "0.1"]
        : ["bjt", "Importworks", mpn, `row ${i}`, "0.05", "", "", "", "", "", "", "300 K/W", "10 mA: 200; 0.5 A: 150; 2 A: 60", "2 A", "0.5 W", "npn", ""];
    mutate?.(i, cells);
    lines.push(cells.map((c) => (/[",;\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(","));
  }
  return lines.join("\n") + "\n";
}

// Client.request only sends JSON or forms; raw and multipart bodies go through fetch with the client's cookies.
export async function sendRaw(client: Client, method: string, path: string, body: BodyInit, contentType?: string): Promise<{ status: number; headers: Headers; bytes: Uint8Array; json: () => any }> {
  const headers: Record<string, string> = { origin: ORIGIN, cookie: client.cookieHeader() };
  if (contentType) headers["content-type"] = contentType;
  const res = await fetch(new URL(path, ORIGIN), { method, headers, body, redirect: "manual" });
  const bytes = new Uint8Array(await res.arrayBuffer());
  return { status: res.status, headers: res.headers, bytes, json: () => JSON.parse(Buffer.from(bytes).toString("utf8")) };
}

export function csvRequest(client: Client, path: string, csv: string) {
  return sendRaw(client, "POST", path, csv, "text/csv");
}

export async function getRaw(client: Client, path: string) {
  const res = await fetch(new URL(path, ORIGIN), { headers: { cookie: client.cookieHeader() }, redirect: "manual" });
  return { status: res.status, headers: res.headers, bytes: new Uint8Array(await res.arrayBuffer()) };
}

export function uploadDatasheet(client: Client, partId: string, bytes: Uint8Array, filename: string, type = "application/pdf") {
  const form = new FormData();
  form.append("file", new Blob([Buffer.from(bytes)], { type }), filename);
  return sendRaw(client, "POST", `/api/v1/parts/${partId}/datasheet`, form);
}

/** A small well-formed PDF (one empty page) with a correct xref table. */
export function tinyPdf(note = "Heatsplit test"): Uint8Array {
  const objects = [
    "<< /Type /Catalog /Pages 2 0 R >>",
    "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
    "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >>",
    `<< /Title (${note}) >>`,
  ];
  let out = "%PDF-1.4\n";
  const offsets: number[] = [];
  objects.forEach((o, i) => {
    offsets.push(out.length);
    out += `${i + 1} 0 obj\n${o}\nendobj\n`;
  });
  const xref = out.length;
  out += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const off of offsets) out += `${String(off).padStart(10, "0")} 00000 n \n`;
  out += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R /Info 4 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return new Uint8Array(Buffer.from(out, "latin1"));
}

/** The start of a PNG (signature + IHDR), i.e. an image someone renamed to .pdf. */
export function pngBytes(): Uint8Array {
  const sig = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  const ihdr = [0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 6, 0, 0, 0, 0x1f, 0x15, 0xc4, 0x89];
  return new Uint8Array([...sig, ...ihdr, ...new Array(64).fill(0)]);
}
