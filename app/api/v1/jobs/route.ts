import { reply, route } from "@/app/_lib/access";
import { jobCreateSchema } from "@/lib/jobs/schema";
import { startJob } from "@/services/jobs/service";
import { publicJob } from "@/services/jobs/view";

// POST /api/v1/jobs { kind: "sweep" | "monte-carlo" | "report", payload }
//   -> 202 { job } ; poll GET /api/v1/jobs/:jobId. The payload names an
//   option revision of the caller's workspace (another's: 404).
export const POST = route({ permission: "job:start", body: jobCreateSchema }, async ({ member, body }) => reply({ job: publicJob(await startJob(member, body)) }, 202));
