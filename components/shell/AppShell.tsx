import Link from "next/link";
import type { ReactNode } from "react";
import { can, type Role } from "@/lib/roles";
import { ROLE_LABELS } from "@/components/ui/Badge";
import { Caution } from "@/components/ui/Caution";
import { Wordmark } from "./Mark";
import { ShellNav, type NavItem } from "./ShellNav";
import { UserMenu } from "./UserMenu";
import { WorkspaceSwitcher } from "./WorkspaceSwitcher";

export interface AppShellMember {
  user: { displayName: string; email: string };
  workspace: { name: string; id?: string };
  role: Role;
}

export interface AppShellProps {
  member: AppShellMember;
  /** Every workspace the user belongs to; a switcher appears when there are two or more. */
  workspaces?: { id: string; name: string }[];
  /** Show the development mail inbox link (admins only, development builds only). */
  devInbox?: boolean;
  /** POST target of the workspace switcher. */
  switchWorkspaceAction?: string;
  children: ReactNode;
}

/** Which sections a member sees. Permissions come from the one role table. */
export function navItemsFor(role: Role, devInbox: boolean): NavItem[] {
  const items: NavItem[] = [
    { href: "/projects", label: "Projects" },
    { href: "/parts", label: "Parts library" },
    { href: "/settings/derating", label: "Derating" },
  ];
  if (can(role, "members:manage")) items.push({ href: "/members", label: "Members" });
  if (devInbox && can(role, "dev:inbox")) items.push({ href: "/dev/inbox", label: "Dev inbox" });
  return items;
}

/** The signed-in frame: top band, main content, cautions footer. */
export function AppShell({ member, workspaces, devInbox = false, switchWorkspaceAction = "/switch-workspace", children }: AppShellProps) {
  const items = navItemsFor(member.role, devInbox);
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-md bg-paper-raised px-4 py-2 text-sm font-medium text-ink shadow-lift focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="hs-dark bg-ink text-paper">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-3 gap-y-1 px-4 py-2 sm:px-6">
          <Link href="/projects" className="rounded-md py-1" aria-label="Heatsplit, projects">
            <Wordmark tone="dark" />
          </Link>
          <span aria-hidden="true" className="h-5 w-px bg-white/20" />
          <WorkspaceSwitcher current={member.workspace} workspaces={workspaces} action={switchWorkspaceAction} />
          <ShellNav
            items={items}
            className="order-last -mx-1 w-full border-t border-white/10 pt-1.5 md:order-none md:mx-0 md:ml-4 md:w-auto md:border-0 md:pt-0"
          />
          <div className="ml-auto flex items-center gap-2">
            <span className="hidden rounded-full border border-white/25 px-2 py-0.5 text-[0.6875rem] font-medium tracking-wider text-paper/85 uppercase sm:inline">
              <span className="sr-only">Role: </span>
              {ROLE_LABELS[member.role]}
            </span>
            <UserMenu
              displayName={member.user.displayName}
              email={member.user.email}
              workspaceName={member.workspace.name}
              role={member.role}
            />
          </div>
        </div>
        {/* a thin copper-to-verdigris rule: the heat gradient the product is about */}
        <div aria-hidden="true" className="h-0.5 bg-linear-to-r from-copper-500 via-amber-300 to-verdigris-300" />
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 focus:outline-none sm:px-6">
        {children}
      </main>
      <footer className="border-t border-paper-line bg-paper-sunk/50">
        <div className="mx-auto max-w-7xl px-4 py-3 sm:px-6">
          <Caution variant="compact" />
        </div>
      </footer>
    </div>
  );
}
