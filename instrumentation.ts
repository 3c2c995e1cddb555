// Runs once per server process before requests are served (Next.js
// instrumentation hook). Node runtime only: the hook patches node:http.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { installPeerAddressHeader } = await import("./app/_lib/peer-address");
    installPeerAddressHeader();
  }
}
