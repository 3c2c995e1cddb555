import { route } from "@/app/_lib/access";
import { MODEL_DEFAULT_DERATING } from "@/services/derating/policy";
import { deratingPolicySchema } from "@/lib/derating/schema";
import { getDeratingByWorkspace, upsertDeratingByWorkspace } from "@/db/queries/derating";

// The workspace derating policy (SI: margins K, fraction ratio, headroom V).
// GET -> { policy, source: "workspace" | "model-defaults", updatedBy, updatedAt }
export const GET = route({ permission: "read" }, async ({ member }) => {
  const set = await getDeratingByWorkspace(member.workspace.id);
  if (!set) return { policy: MODEL_DEFAULT_DERATING, source: "model-defaults", updatedBy: null, updatedAt: null };
  const { updatedBy, updatedAt, ...policy } = set;
  return { policy, source: "workspace", updatedBy, updatedAt };
});

// PUT { tjMargin: { controller, mosfet, bjt, driverIc, clamp }, vgsMaxFraction, minHeadroomAbovePlateau }
//   ("25 K", "80 %", "4 V" or SI numbers) -> { policy, source: "workspace", ... }; logged.
export const PUT = route({ permission: "derating:write", body: deratingPolicySchema }, async ({ member, body }) => {
  await upsertDeratingByWorkspace({ workspaceId: member.workspace.id, values: body, updatedBy: member.user.id });
  const set = (await getDeratingByWorkspace(member.workspace.id))!;
  const { updatedBy, updatedAt, ...policy } = set;
  return { policy, source: "workspace", updatedBy, updatedAt };
});
