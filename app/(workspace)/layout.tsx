import type { ReactNode } from "react";
import { getSignedInContext, requirePageMember } from "@/app/_lib/access";
import { devInboxEnabled } from "@/services/mail/dev-inbox";
import { AppShell } from "@/components/shell/AppShell";

// Every workspace page renders inside the shell, for a signed-in member only.
// Pages still call requirePageMember() themselves with their own permission:
// a layout does not re-render on client navigation between its pages.
export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const member = await requirePageMember();
  const ctx = await getSignedInContext();
  const workspaces = (ctx?.memberships ?? []).map((m) => m.workspace);
  return (
    <AppShell member={member} workspaces={workspaces} devInbox={devInboxEnabled()} switchWorkspaceAction="/switch-workspace">
      {children}
    </AppShell>
  );
}
