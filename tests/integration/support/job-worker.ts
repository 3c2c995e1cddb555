// A worker process with the app's own job code, for the restart test: run as
//   node --conditions react-server --import tsx tests/integration/support/job-worker.ts
// (the react-server condition makes `import "server-only"` a no-op outside
// Next). It works the queues of JOBS_SCHEMA until it is killed.
import { startJobWorkers } from "@/services/jobs/queue";

void (async () => {
  await startJobWorkers();
  process.stdout.write("job worker ready\n");
})().catch((e) => {
  console.error("job worker failed to start:", e);
  process.exit(1);
});
