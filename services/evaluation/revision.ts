import "server-only";
import { LRUCache } from "lru-cache";
import { parseDesign, type Design, type DesignIssue } from "@/models/input/schema";
import { evaluateDesign, type Evaluation } from "@/models/evaluate";
import { applyWorkspaceDerating } from "@/services/derating/policy";
import { getRevisionByNumber, listOptionsByProject, type OptionRecord, type RevisionRecord } from "@/db/queries/options";
import { getDeratingByWorkspace, type DeratingValues, type WorkspaceDerating } from "@/db/queries/derating";

// THE evaluation of a stored revision: read the row, parse the document
// (models/input/schema.ts, which upgrades an older version), put the workspace's
// derating policy in place of the document's own block when one is set
// (services/derating/policy.ts), evaluate. The budget page and its data
// route, the comparison, the review page, the reports and the background
// jobs all load it here, so they show the same numbers.
//
// A stored revision's document never changes (a new revision is a new row),
// so its evaluation under a given policy is fixed for the life of this
// process: one evaluation per (option, revision, policy) is kept, frozen so
// no caller can change what another one reads. Up to 500 (~100 kB each).

export type RevisionEvaluation =
  | { ok: true; revision: RevisionRecord; design: Design; evaluation: Evaluation; policy: WorkspaceDerating | null }
  | { ok: false; revision: RevisionRecord; issues: DesignIssue[] };

const evaluated = new LRUCache<string, { design: Design; evaluation: Evaluation }>({ max: 500 });

function deepFreeze<T>(v: T): T {
  if (v !== null && typeof v === "object" && !Object.isFrozen(v)) {
    Object.freeze(v);
    for (const x of Object.values(v)) deepFreeze(x);
  }
  return v;
}

const policyValues = (p: DeratingValues | null): DeratingValues | null =>
  p && { tjMargin: p.tjMargin, vgsMaxFraction: p.vgsMaxFraction, minHeadroomAbovePlateau: p.minHeadroomAbovePlateau };

/**
 * null when the option has no such revision in this workspace.
 * `policy`: the workspace policy when the caller already has it (null: none
 * is set, the document's own block applies); read here when omitted.
 */
export async function loadRevisionEvaluation({
  workspaceId,
  optionId,
  revision,
  policy,
}: {
  workspaceId: string;
  optionId: string;
  revision: number;
  policy?: WorkspaceDerating | null;
}): Promise<RevisionEvaluation | null> {
  const [rev, rules] = await Promise.all([
    getRevisionByNumber({ workspaceId, optionId, revision }),
    policy === undefined ? getDeratingByWorkspace(workspaceId) : policy,
  ]);
  if (!rev) return null;
  const values = policyValues(rules);
  const key = `${workspaceId}|${optionId}|${rev.revision}|${JSON.stringify(values)}`;
  let done = evaluated.get(key);
  if (!done) {
    const parsed = parseDesign(rev.document);
    if (!parsed.ok) return { ok: false, revision: rev, issues: parsed.issues };
    const design = applyWorkspaceDerating(parsed.design, values);
    done = deepFreeze({ design, evaluation: evaluateDesign(design) });
    evaluated.set(key, done);
  }
  return { ok: true, revision: rev, design: done.design, evaluation: done.evaluation, policy: rules };
}

/** The latest revision of an option (what the budget dashboard shows). */
export function loadLatestEvaluation({ workspaceId, option, policy }: { workspaceId: string; option: OptionRecord; policy?: WorkspaceDerating | null }) {
  return loadRevisionEvaluation({ workspaceId, optionId: option.id, revision: option.latestRevision, policy });
}

/** Every (non-archived) option of a project with its latest evaluation, in the project's listing order. */
export async function loadProjectEvaluations({ workspaceId, projectId }: { workspaceId: string; projectId: string }) {
  const [options, policy] = await Promise.all([listOptionsByProject({ workspaceId, projectId }), getDeratingByWorkspace(workspaceId)]);
  return Promise.all(options.map(async (option) => ({ option, budget: await loadLatestEvaluation({ workspaceId, option, policy }) })));
}
