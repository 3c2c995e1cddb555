/** The thermal-map worker, created next to its module so the bundler resolves it here. */
export function createSweepWorker(): Worker {
  return new Worker(new URL("./sweep.worker.ts", import.meta.url), { type: "module" });
}
