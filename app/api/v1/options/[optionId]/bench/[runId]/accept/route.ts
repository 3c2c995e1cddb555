import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { loadRunCorrelation } from "@/services/bench/service";
import { acceptFitSchema, benchRunParamsSchema } from "@/lib/bench/schema";
import { parseDesign } from "@/models/schema";
import { withDocumentValue } from "@/models/fitDesign";
import { getBenchRunById } from "@/db/queries/bench";
import { getRevisionByNumber } from "@/db/queries/options";
import { insertRevisionOnBase } from "@/db/queries/option-revisions";

// POST /api/v1/options/:optionId/bench/:runId/accept { parts: ["controller", …] }
//   -> 201 { revision } : a NEW revision (base = the run's revision) whose
//   document carries each chosen part's fitted RθJA (or RθSA of a MOSFET
//   heatsink chain). 409 when the option moved on since the measured revision.
export const POST = route({ permission: "option:review", params: benchRunParamsSchema, body: acceptFitSchema }, async ({ member, params, body }) => {
  const workspaceId = member.workspace.id;
  const run = await loadInWorkspace(member, (ws) => getBenchRunById({ workspaceId: ws, optionId: params.optionId, runId: params.runId }));
  const { document, correlation } = await loadRunCorrelation({ workspaceId, run });
  let next = document;
  const changes: string[] = [];
  const issues = body.parts.flatMap((id, i) => {
    const p = correlation.parts.find((c) => c.part.id === id);
    if (!p?.proposal) return [{ path: `parts.${i}`, message: `no fit for "${id}" in this run` }];
    if ("error" in p.proposal) return [{ path: `parts.${i}`, message: `${id}: ${p.proposal.error}` }];
    next = withDocumentValue(next, p.proposal.path, p.proposal.value);
    changes.push(`${id} ${p.proposal.path.split(".").pop()} ${Number(p.proposal.previous.toPrecision(4))} → ${Number(p.proposal.value.toPrecision(4))} K/W`);
    return [];
  });
  if (issues.length) throw new AppError("bad_request", "Check the request body.", issues);
  if (!parseDesign(next).ok) throw new AppError("bad_request", "The fitted values do not make a valid design.");
  const base = await loadInWorkspace(member, (ws) => getRevisionByNumber({ workspaceId: ws, optionId: run.optionId, revision: run.revision }));
  const note = body.note ? `${body.note} (${changes.join("; ")})` : `Bench fit from run ${run.id}: ${changes.join("; ")}`;
  const saved = await insertRevisionOnBase({ workspaceId, optionId: run.optionId, baseRevision: run.revision, document: next, partRefs: base.partRefs, note: note.slice(0, 500), createdBy: member.user.id });
  if (!saved.ok && saved.reason === "not_found") throw new AppError("not_found", "Not found.");
  if (!saved.ok) throw new AppError("conflict", `Revision ${saved.latestRevision} was saved after revision ${run.revision}, which these readings were taken against. Upload them against the latest revision.`);
  return reply({ revision: { revision: saved.revision, createdAt: saved.createdAt, note: note.slice(0, 500), changes } }, 201);
});
