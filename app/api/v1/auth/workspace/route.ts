import { route } from "@/app/_lib/access";
import { switchWorkspaceSchema } from "@/lib/accounts/schema";
import { switchWorkspace } from "@/services/accounts/switch-workspace";

// Switches the session to another workspace of the same user (404 otherwise).
export const POST = route({ permission: "read", body: switchWorkspaceSchema }, async ({ member, body }) => {
  const target = await switchWorkspace(member, body.workspaceId);
  return { workspace: target.workspace, role: target.role };
});
