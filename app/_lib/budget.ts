import "server-only";
import { parseDesign, type Design, type DesignIssue } from "@/models/schema";
import { evaluateDesign, type Evaluation } from "@/models/evaluate";
import { getRevisionByNumber, listOptionsByProject, type OptionRecord, type PartRefs } from "@/db/queries/options";
import { getDeratingByWorkspace, type DeratingValues } from "@/db/queries/derating";
import { applyWorkspaceDerating } from "./derating";

// The budget of an option's latest revision, computed on the server by the
// same models code the browser runs. The dashboard page, its data route
// (GET /api/v1/options/:id/budget) and the comparison all go through here,
// so they show the same numbers. The workspace derating policy, when set,
// replaces the document's derating block (app/_lib/derating.ts); `design`
// carries the policy that was applied, so the browser's what-if agrees.
export type OptionBudget =
  | { ok: true; revision: number; document: unknown; partRefs: PartRefs; design: Design; evaluation: Evaluation }
  | { ok: false; revision: number; issues: DesignIssue[] };

export async function loadOptionBudget({
  workspaceId,
  option,
  policy,
}: {
  workspaceId: string;
  option: OptionRecord;
  /** The workspace policy if the caller already has it (null: none set); read here when omitted. */
  policy?: DeratingValues | null;
}): Promise<OptionBudget | null> {
  const rev = await getRevisionByNumber({ workspaceId, optionId: option.id, revision: option.latestRevision });
  if (!rev) return null;
  const parsed = parseDesign(rev.document);
  if (!parsed.ok) return { ok: false, revision: rev.revision, issues: parsed.issues };
  const design = applyWorkspaceDerating(parsed.design, policy === undefined ? await getDeratingByWorkspace(workspaceId) : policy);
  return { ok: true, revision: rev.revision, document: rev.document, partRefs: rev.partRefs, design, evaluation: evaluateDesign(design) };
}

/** Every (non-archived) option of a project with its budget, in the project's listing order. */
export async function loadProjectBudgets({ workspaceId, projectId }: { workspaceId: string; projectId: string }) {
  const [options, policy] = await Promise.all([listOptionsByProject({ workspaceId, projectId }), getDeratingByWorkspace(workspaceId)]);
  return Promise.all(options.map(async (option) => ({ option, budget: await loadOptionBudget({ workspaceId, option, policy }) })));
}
