// Runs once per server process before requests are served (Next.js
// instrumentation hook). Node runtime only: the hook patches node:http.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { installPeerAddressHeader } = await import("./app/_lib/peer-address");
    installPeerAddressHeader();
    const { installPageBodyGuard } = await import("./app/_lib/page-body-guard");
    installPageBodyGuard();
    // Every app instance works the job queue (pg-boss, services/jobs/queue.ts).
    // Not awaited: a database that is not up yet must not stop the server;
    // the workers start on the first success. JOB_WORKERS=off disables them.
    if (process.env.JOB_WORKERS !== "off") {
      const { startJobWorkers } = await import("./services/jobs/queue");
      const start = (attempt: number): void => {
        startJobWorkers().catch((e) => {
          console.error(`job workers did not start (attempt ${attempt}):`, e);
          if (attempt < 30) setTimeout(() => start(attempt + 1), 10_000).unref();
        });
      };
      start(1);
    }
  }
}
