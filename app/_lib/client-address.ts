import "server-only";
import { PEER_HEADER } from "./peer-address";

// The client address the throttle counts by. Behind a reverse proxy
// (TRUST_PROXY=1) it is the last x-forwarded-for entry: the address our own
// proxy saw and appended (assumes exactly one proxy hop in front of the
// app). Otherwise the socket address, never a client-supplied header.
export function clientAddress(headers: Headers): string {
  if (process.env.TRUST_PROXY === "1") {
    const forwarded = headers.get("x-forwarded-for");
    const last = forwarded?.split(",").map((s) => s.trim()).filter(Boolean).pop();
    if (last) return normalise(last);
  }
  return normalise(headers.get(PEER_HEADER) ?? "unknown");
}

// IPv4 clients on a dual-stack socket appear as ::ffff:a.b.c.d.
function normalise(address: string): string {
  return address.startsWith("::ffff:") ? address.slice(7) : address;
}
