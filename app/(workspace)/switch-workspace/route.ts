import { route } from "@/app/_lib/access";
import { switchWorkspaceSchema } from "@/lib/accounts/schema";
import { switchWorkspace } from "@/services/accounts/switch-workspace";

// Target of the shell's workspace switcher (a plain form posting workspaceId);
// same flow as POST /api/v1/auth/workspace. Not a member of it -> 404.
export const POST = route({ permission: "read", body: switchWorkspaceSchema }, async ({ member, body }) => {
  await switchWorkspace(member, body.workspaceId);
  return new Response(null, { status: 303, headers: { location: "/home" } });
});
