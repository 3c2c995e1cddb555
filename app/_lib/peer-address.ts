// The socket address of each HTTP request, stamped into a header we own.
//
// Why: `next start` hides the socket from route handlers and server
// actions. Next fills `x-forwarded-for` from the socket only when the client
// did not send one (`??=`), so without a trusted proxy that header is
// whatever the client says. Installed once from instrumentation.ts, before
// the server handles requests; any client-sent copy of the header is
// replaced, so the value is always the real peer.
import http from "node:http";

export const PEER_HEADER = "x-heatsplit-peer-address";

const marker = Symbol.for("heatsplit.peerAddressInstalled");

export function installPeerAddressHeader(): void {
  const proto = http.Server.prototype as unknown as Record<symbol, boolean> & { emit: (event: string | symbol, ...args: unknown[]) => boolean };
  if (proto[marker]) return;
  proto[marker] = true;
  const originalEmit = proto.emit;
  proto.emit = function emit(this: http.Server, event: string | symbol, ...args: unknown[]): boolean {
    if (event === "request" || event === "checkContinue" || event === "checkExpectation") {
      const req = args[0] as http.IncomingMessage;
      req.headers[PEER_HEADER] = req.socket?.remoteAddress ?? "unknown";
    }
    return originalEmit.call(this, event, ...args);
  };
}
