// An import or an upload cut off half way leaves nothing behind: a large
// CSV import commit and a large datasheet upload are sent with their full
// Content-Length, the socket is destroyed after half the body, and the
// workspace's parts, stored files and the object store's files must be
// unchanged. The same bodies sent whole must then write (so the counts can
// move and the check can fail).
import fs from "node:fs";
import net from "node:net";
import path from "node:path";
import knexFactory from "knex";
import { ORIGIN, api, signUp, type Account } from "../load/common";

const IMPORT_ROWS = 5_000; // the most one import takes (MAX_IMPORT_ROWS in lib/parts/csv.ts), about 0.6 MB
const PDF_BYTES = 6 * 1024 * 1024; // under the 10 MB datasheet limit

function bigCsv(prefix: string): string {
  const lines = ["kind,manufacturer,mpn,description,unit_cost_usd,param.qg,param.qgs,param.qgd,param.vth,param.vpl,param.rds25,param.rthJA"];
  for (let i = 0; i < IMPORT_ROWS; i++) lines.push(`mosfet,Faultworks,${prefix}-${i},row ${i} of an interrupted import,0.5,${20 + (i % 40)} nC,6 nC,5 nC,2.1 V,4.2 V,${3 + (i % 9)} mohm,45 K/W`);
  return lines.join("\n") + "\n";
}

/** A well-formed PDF padded with a comment block to `size` bytes. */
function bigPdf(size: number): Buffer {
  const head = "%PDF-1.4\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\n2 0 obj\n<< /Type /Pages /Kids [] /Count 0 >>\nendobj\n";
  const tail = "xref\n0 1\n0000000000 65535 f \ntrailer\n<< /Size 1 /Root 1 0 R >>\nstartxref\n0\n%%EOF\n";
  const padLine = "% padding padding padding padding padding padding padding padding padding\n";
  const pad = padLine.repeat(Math.ceil((size - head.length - tail.length) / padLine.length));
  return Buffer.from(head + pad + tail, "latin1");
}

function multipart(file: Buffer, filename: string): { body: Buffer; type: string } {
  const boundary = `----heatsplitfaults${Date.now()}`;
  const pre = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${filename}"\r\nContent-Type: application/pdf\r\n\r\n`;
  return { body: Buffer.concat([Buffer.from(pre), file, Buffer.from(`\r\n--${boundary}--\r\n`)]), type: `multipart/form-data; boundary=${boundary}` };
}

/** Sends the request line, headers and `fraction` of the body, then destroys the socket. */
function sendHalf(account: Account, urlPath: string, body: Buffer, contentType: string, fraction = 0.5): Promise<void> {
  const url = new URL(ORIGIN);
  return new Promise((resolve, reject) => {
    const s = net.connect({ host: url.hostname, port: Number(url.port) }, () => {
      s.write(
        `POST ${urlPath} HTTP/1.1\r\nHost: ${url.host}\r\nOrigin: ${ORIGIN}\r\nCookie: ${account.cookie}\r\n` +
          `Content-Type: ${contentType}\r\nContent-Length: ${body.length}\r\nConnection: close\r\n\r\n`,
      );
      s.write(body.subarray(0, Math.floor(body.length * fraction)), () => {
        // give the server time to start reading and processing what it got
        setTimeout(() => {
          s.destroy();
          resolve();
        }, 500);
      });
    });
    s.on("error", reject);
  });
}

function countFiles(dir: string): number {
  if (!fs.existsSync(dir)) return 0;
  return fs.readdirSync(dir, { withFileTypes: true }).reduce((n, d) => n + (d.isDirectory() ? countFiles(path.join(dir, d.name)) : 1), 0);
}

export async function runInterrupted(): Promise<{ ok: boolean; lines: string[] }> {
  const db = knexFactory({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 1 } });
  const s3Dir = process.env.FAKE_S3_DIR ?? "";
  try {
    const account = await signUp("faults-upload");
    const counts = async () => {
      const [parts, files] = await Promise.all([
        db("part").where("workspace_id", account.workspaceId).count<{ n: string }[]>({ n: "*" }),
        db("stored_file").where("workspace_id", account.workspaceId).count<{ n: string }[]>({ n: "*" }),
      ]);
      return { parts: Number(parts[0].n), files: Number(files[0].n), objects: countFiles(s3Dir) };
    };
    const part = await api<{ part: { id: string } }>(account, "POST", "/api/v1/parts", {
      kind: "mosfet", manufacturer: "Faultworks", mpn: "FW-SHEET", description: "datasheet target",
      params: { qg: "47 nC", qgs: "12 nC", qgd: "15 nC", vth: "2.5 V", vpl: "4.6 V", rds25: "12 mΩ", rthJA: "40 K/W" },
    });
    if (part.status !== 201) throw new Error(`part not created: ${part.status} ${JSON.stringify(part.json)}`);
    const csv = Buffer.from(bigCsv("FW"));
    const pdf = multipart(bigPdf(PDF_BYTES), "big.pdf");
    const sheetPath = `/api/v1/parts/${part.json.part.id}/datasheet`;

    const before = await counts();
    await sendHalf(account, "/api/v1/parts/import/commit", csv, "text/csv");
    await sendHalf(account, sheetPath, pdf.body, pdf.type);
    await sendHalf(account, "/api/v1/parts/import/commit", csv, "text/csv", 0.95);
    await sendHalf(account, sheetPath, pdf.body, pdf.type, 0.99);
    await new Promise((r) => setTimeout(r, 2000));
    const after = await counts();

    // control: the same bodies sent whole do write
    const whole = async (p: string, body: Buffer, type: string) =>
      (await fetch(`${ORIGIN}${p}`, { method: "POST", headers: { cookie: account.cookie, origin: ORIGIN, "content-type": type }, body: new Uint8Array(body) })).status;
    const importStatus = await whole("/api/v1/parts/import/commit", csv, "text/csv");
    const sheetStatus = await whole(sheetPath, pdf.body, pdf.type);
    const control = await counts();

    const unchanged = after.parts === before.parts && after.files === before.files && after.objects === before.objects;
    const controlOk = importStatus === 200 && sheetStatus === 201 && control.parts === before.parts + IMPORT_ROWS && control.files === before.files + 1;
    return {
      ok: unchanged && controlOk,
      lines: [
        `  ${unchanged ? "PASS" : "FAIL"} cut off at 50 % and 95-99 % of a ${(csv.length / 1e6).toFixed(1)} MB import and a ${(pdf.body.length / 1e6).toFixed(1)} MB upload: parts ${before.parts} -> ${after.parts}, stored files ${before.files} -> ${after.files}, objects ${before.objects} -> ${after.objects}`,
        `  ${controlOk ? "PASS" : "FAIL"} sent whole: import ${importStatus}, upload ${sheetStatus}; parts ${control.parts}, stored files ${control.files}`,
      ],
    };
  } finally {
    await db.destroy();
  }
}
