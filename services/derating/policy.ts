import "server-only";
import type { Design } from "@/models/input/schema";
import { DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V, DEFAULT_TJ_MARGIN_K, DEFAULT_VGS_MAX_FRACTION } from "@/models/policy";
import { getDeratingByWorkspace, upsertDeratingByWorkspace, type DeratingValues, type WorkspaceDerating } from "@/db/queries/derating";
import type { DeratingPolicy } from "@/lib/derating/schema";
import type { Member } from "@/services/auth/member";

// The workspace's derating policy is the team's rule: when one is set it
// replaces the derating block a design document carries, in every budget,
// comparison and review of that workspace. Without one, each document's own
// block (or the model defaults) applies, as before.
export const MODEL_DEFAULT_DERATING: DeratingValues = {
  tjMargin: { ...DEFAULT_TJ_MARGIN_K },
  vgsMaxFraction: DEFAULT_VGS_MAX_FRACTION,
  minHeadroomAbovePlateau: DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V,
};

export function applyWorkspaceDerating(design: Design, policy: DeratingValues | null): Design {
  if (!policy) return design;
  return { ...design, derating: { tjMargin: { ...policy.tjMargin }, vgsMaxFraction: policy.vgsMaxFraction, minHeadroomAbovePlateau: policy.minHeadroomAbovePlateau } };
}

export interface DeratingView {
  policy: DeratingValues;
  source: "workspace" | "model-defaults";
  updatedBy: WorkspaceDerating["updatedBy"];
  updatedAt: string | null;
}

/** The policy in force: the workspace's, or the model defaults when none is set. */
export async function describeDerating(workspaceId: string): Promise<DeratingView> {
  const set = await getDeratingByWorkspace(workspaceId);
  if (!set) return { policy: MODEL_DEFAULT_DERATING, source: "model-defaults", updatedBy: null, updatedAt: null };
  const { updatedBy, updatedAt, ...policy } = set;
  return { policy, source: "workspace", updatedBy, updatedAt };
}

/** Sets the workspace policy (logged with the old and new values); the settings form and PUT /api/v1/derating. */
export async function saveDeratingPolicy(member: Member, values: DeratingPolicy): Promise<DeratingView> {
  await upsertDeratingByWorkspace({ workspaceId: member.workspace.id, values, updatedBy: member.user.id });
  return describeDerating(member.workspace.id);
}
