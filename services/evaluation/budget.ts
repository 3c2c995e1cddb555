import "server-only";
import { parseDesign, type Design, type DesignIssue } from "@/models/schema";
import { evaluateDesign, type Evaluation } from "@/models/evaluate";
import { getRevisionByNumber, listOptionsByProject, type OptionRecord, type PartRefs } from "@/db/queries/options";
import { getDeratingByWorkspace, type DeratingValues } from "@/db/queries/derating";
import { LRUCache } from "lru-cache";
import { applyWorkspaceDerating } from "../derating/policy";

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
  const [rev, rules] = await Promise.all([
    getRevisionByNumber({ workspaceId, optionId: option.id, revision: option.latestRevision }),
    policy === undefined ? getDeratingByWorkspace(workspaceId) : policy,
  ]);
  if (!rev) return null;
  const values = rules && { tjMargin: rules.tjMargin, vgsMaxFraction: rules.vgsMaxFraction, minHeadroomAbovePlateau: rules.minHeadroomAbovePlateau };
  const key = `${workspaceId}|${option.id}|${rev.revision}|${JSON.stringify(values)}`;
  let done = evaluated.get(key);
  if (!done) {
    const parsed = parseDesign(rev.document);
    if (!parsed.ok) return { ok: false, revision: rev.revision, issues: parsed.issues };
    const design = applyWorkspaceDerating(parsed.design, values);
    done = deepFreeze({ design, evaluation: evaluateDesign(design) });
    evaluated.set(key, done);
  }
  return { ok: true, revision: rev.revision, document: rev.document, partRefs: rev.partRefs, design: done.design, evaluation: done.evaluation };
}

// A stored revision's document never changes (a new revision is a new row),
// so its evaluation under a given derating policy is fixed for the life of
// this process (the models code cannot change under it). The dashboard, its
// data route and the comparison re-read the same revisions all the time;
// they share one evaluation per (option, revision, policy). Frozen, so no
// caller can change what another one reads. Up to 500 budgets (~100 kB each).
const evaluated = new LRUCache<string, { design: Design; evaluation: Evaluation }>({ max: 500 });

function deepFreeze<T>(v: T): T {
  if (v !== null && typeof v === "object" && !Object.isFrozen(v)) {
    Object.freeze(v);
    for (const x of Object.values(v)) deepFreeze(x);
  }
  return v;
}

/** Every (non-archived) option of a project with its budget, in the project's listing order. */
export async function loadProjectBudgets({ workspaceId, projectId }: { workspaceId: string; projectId: string }) {
  const [options, policy] = await Promise.all([listOptionsByProject({ workspaceId, projectId }), getDeratingByWorkspace(workspaceId)]);
  return Promise.all(options.map(async (option) => ({ option, budget: await loadOptionBudget({ workspaceId, option, policy }) })));
}
