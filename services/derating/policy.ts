import "server-only";
import type { Design } from "@/models/schema";
import { DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V, DEFAULT_TJ_MARGIN_K, DEFAULT_VGS_MAX_FRACTION } from "@/models/policy";
import { getDeratingByWorkspace, type DeratingValues, type WorkspaceDerating } from "@/db/queries/derating";

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

export async function loadWorkspaceDerating(workspaceId: string): Promise<WorkspaceDerating | null> {
  return getDeratingByWorkspace(workspaceId);
}
