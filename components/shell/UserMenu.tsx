import Link from "next/link";
import type { Role } from "@/lib/roles";
import { RoleBadge } from "@/components/ui/Badge";
import { Disclosure } from "./Disclosure";

function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? parts[0][0] + parts[parts.length - 1][0] : (parts[0] ?? "?").slice(0, 2);
  return letters.toUpperCase();
}

export interface UserMenuProps {
  displayName: string;
  email: string;
  workspaceName: string;
  role: Role;
}

export function UserMenu({ displayName, email, workspaceName, role }: UserMenuProps) {
  return (
    <Disclosure
      className="relative [&[open]>summary]:bg-white/10"
      summaryClassName="flex cursor-pointer list-none items-center gap-2 rounded-md py-1 pr-2 pl-1 text-sm text-paper/90 hover:bg-white/8 [&::-webkit-details-marker]:hidden"
      summary={
        <>
          <span
            aria-hidden="true"
            className="grid size-7 place-items-center rounded-full bg-copper-300 font-mono text-[0.6875rem] font-medium text-ink"
          >
            {initials(displayName)}
          </span>
          <span className="hidden max-w-40 truncate sm:inline">{displayName}</span>
          <span className="sr-only sm:hidden">{displayName}</span>
          <span className="sr-only">: account menu</span>
          <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3 text-paper/60">
            <path d="M2.5 4.5 6 8l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
        </>
      }
    >
      <div className="absolute right-0 z-30 mt-2 w-72 rounded-panel border border-paper-line bg-paper-raised p-1.5 text-ink shadow-lift">
        <div className="border-b border-paper-line px-3 pt-2 pb-3">
          <p className="truncate font-medium">{displayName}</p>
          <p className="truncate font-mono text-xs text-ink-soft">{email}</p>
          <p className="mt-2 flex items-center gap-2 text-xs text-ink-soft">
            <RoleBadge role={role} />
            <span className="truncate">in {workspaceName}</span>
          </p>
        </div>
        <Link href="/settings/tokens" className="mt-1.5 flex w-full items-center rounded-md px-3 py-2 text-sm text-ink hover:bg-paper-sunk">
          API tokens
        </Link>
        <form method="post" action="/sign-out" className="pt-1.5">
          <button
            type="submit"
            className="flex w-full items-center gap-2 rounded-md px-3 py-2 text-left text-sm text-ink hover:bg-paper-sunk"
          >
            <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4 text-ink-soft">
              <path d="M9.5 3H4.5a1 1 0 0 0-1 1v8a1 1 0 0 0 1 1h5" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
              <path d="M7.5 8h6m-2.2-2.4L13.5 8l-2.2 2.4" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" strokeLinejoin="round" />
            </svg>
            Sign out
          </button>
        </form>
      </div>
    </Disclosure>
  );
}
