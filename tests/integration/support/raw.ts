// Raw HTTP for the attack tests, below what fetch allows: a request from
// another loopback address (the server sees it as another client), and a
// chunked body without Content-Length that is written piece by piece until
// the server answers, so a test can tell whether the server refused it
// while it was still arriving.
import http from "node:http";
import fs from "node:fs";
import { ORIGIN } from "./http";

export interface RawReply {
  status: number;
  headers: http.IncomingHttpHeaders;
  text: string;
}

/** One request whose socket is bound to `localAddress` (any 127.x.y.z reaches the app on loopback). */
export function requestFrom(localAddress: string, method: string, path: string, opts: { json?: unknown; cookie?: string; headers?: Record<string, string> } = {}): Promise<RawReply> {
  const url = new URL(path, ORIGIN);
  const body = opts.json === undefined ? undefined : JSON.stringify(opts.json);
  const headers: Record<string, string> = { ...opts.headers };
  if (body !== undefined) headers["content-type"] = "application/json";
  if (method !== "GET") headers.origin = ORIGIN;
  if (opts.cookie) headers.cookie = opts.cookie;
  return new Promise((resolve, reject) => {
    const req = http.request({ host: url.hostname, port: url.port, path: url.pathname + url.search, method, headers, localAddress }, (res) => {
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (c: string) => (text += c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
    });
    req.on("error", reject);
    req.end(body);
  });
}

export interface StreamResult {
  status: number;
  text: string;
  /** Bytes written into the request before the answer arrived (or all of them). */
  sentBytes: number;
  /** True when every byte was written before the server answered. */
  sentAll: boolean;
}

/**
 * POSTs `totalBytes` of `fill` (after an optional `prefix`) in `chunkBytes`
 * pieces, with Transfer-Encoding: chunked and no Content-Length unless
 * headers gives one, waiting for each piece to drain; stops writing as soon
 * as the response starts. With `holdAfterPrefix` it writes only the prefix
 * and then waits (up to 10 s) for an answer: a server that decides from the
 * headers answers without the rest of the body, whatever the sockets buffer.
 */
export function streamChunked(
  path: string,
  opts: {
    totalBytes: number; contentType: string; prefix?: string; fill?: number; chunkBytes?: number; cookie?: string;
    headers?: Record<string, string>; holdAfterPrefix?: boolean;
  },
): Promise<StreamResult> {
  const url = new URL(path, ORIGIN);
  const chunk = Buffer.alloc(opts.chunkBytes ?? 64 * 1024, opts.fill ?? 0x61);
  // chunked unless the caller declares a length (which may be a lie the server has to survive)
  const framing: Record<string, string> = opts.headers?.["content-length"] ? {} : { "transfer-encoding": "chunked" };
  const headers: Record<string, string> = { "content-type": opts.contentType, origin: ORIGIN, ...framing, ...opts.headers };
  if (opts.cookie) headers.cookie = opts.cookie;
  return new Promise((resolve, reject) => {
    let sent = 0;
    let answered = false;
    let settled = false;
    const req = http.request({ host: url.hostname, port: url.port, path: url.pathname + url.search, method: "POST", headers });
    const finish = (r: StreamResult) => {
      if (settled) return;
      settled = true;
      resolve(r);
    };
    req.on("response", (res) => {
      answered = true;
      const sentAll = sent >= opts.totalBytes;
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (c: string) => (text += c));
      res.on("end", () => {
        finish({ status: res.statusCode ?? 0, text, sentBytes: sent, sentAll });
        req.destroy();
      });
      res.on("error", () => finish({ status: res.statusCode ?? 0, text, sentBytes: sent, sentAll }));
    });
    req.on("error", (err) => {
      if (!answered) reject(err);
    });
    const pump = async () => {
      if (opts.prefix) {
        req.write(opts.prefix);
        sent += Buffer.byteLength(opts.prefix);
      }
      if (opts.holdAfterPrefix) {
        const timer = setTimeout(() => {
          if (!answered) {
            req.destroy();
            reject(new Error(`no answer within 10 s after ${sent} bytes of a declared ${opts.totalBytes}`));
          }
        }, 10_000);
        req.once("response", () => clearTimeout(timer));
        return;
      }
      while (!answered && sent < opts.totalBytes) {
        const ok = req.write(chunk);
        sent += chunk.length;
        if (!ok) await new Promise((r) => req.once("drain", r));
      }
      if (!answered) req.end();
    };
    pump().catch((err) => {
      if (!answered) reject(err);
    });
  });
}

/** Resident memory of the app server in bytes, when the stack told us its PID (HEATSPLIT_APP_PID). */
export function appRssBytes(): number | null {
  const pid = process.env.HEATSPLIT_APP_PID;
  if (!pid) return null;
  try {
    const m = /VmRSS:\s+(\d+) kB/.exec(fs.readFileSync(`/proc/${pid}/status`, "utf8"));
    return m ? Number(m[1]) * 1024 : null;
  } catch {
    return null;
  }
}
