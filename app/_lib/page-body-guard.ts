// Bodies sent to page paths (server actions and the plain-form routes under
// them) are bounded before Next sees them. Next reads a server action's body
// itself and, past its bodySizeLimit, throws a 413 that it then answers as a
// 500 page; so here, on the socket's request event (as peer-address.ts does),
// a POST to a page path with a declared length over the limit is answered
// 413, and one without a declared length (chunked) 411 Length Required:
// browsers always declare it for forms and actions. Nothing of the body is
// read (Node discards what the client still sends). API routes are not
// touched: route() and the upload routes enforce their own limits while the
// body streams (app/_lib/body-limit.ts).
import http from "node:http";
import { MAX_JSON_BODY_BYTES } from "@/lib/limits";

/** The same bound as next.config.mjs's serverActions.bodySizeLimit ("256kb") and route() bodies. */
export const PAGE_BODY_LIMIT_BYTES = MAX_JSON_BODY_BYTES;

const marker = Symbol.for("heatsplit.pageBodyGuardInstalled");

function refusal(req: http.IncomingMessage): { status: number; message: string } | null {
  if (req.method === "GET" || req.method === "HEAD" || req.method === "OPTIONS") return null;
  const url = req.url ?? "/";
  if (url.startsWith("/api/")) return null;
  const declared = req.headers["content-length"];
  if (declared === undefined) {
    return req.headers["transfer-encoding"] ? { status: 411, message: "Send a Content-Length with a form post." } : null;
  }
  return Number(declared) > PAGE_BODY_LIMIT_BYTES ? { status: 413, message: `A form post may be at most ${PAGE_BODY_LIMIT_BYTES / 1024} kB.` } : null;
}

export function installPageBodyGuard(): void {
  const proto = http.Server.prototype as unknown as Record<symbol, boolean> & { emit: (event: string | symbol, ...args: unknown[]) => boolean };
  if (proto[marker]) return;
  proto[marker] = true;
  const originalEmit = proto.emit;
  proto.emit = function emit(this: http.Server, event: string | symbol, ...args: unknown[]): boolean {
    if (event === "request") {
      const [req, res] = args as [http.IncomingMessage, http.ServerResponse];
      const refused = refusal(req);
      if (refused) {
        res.writeHead(refused.status, { "content-type": "text/plain; charset=utf-8", "x-content-type-options": "nosniff" });
        res.end(`${refused.message}\n`);
        return true;
      }
    }
    return originalEmit.call(this, event, ...args);
  };
}
