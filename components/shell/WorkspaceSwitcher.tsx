import { Disclosure } from "./Disclosure";

export interface WorkspaceSwitcherProps {
  current: { id?: string; name: string };
  workspaces?: { id: string; name: string }[];
  /** POST target that switches the session's workspace (field: workspaceId). */
  action: string;
}

/** The workspace name; a menu of the others when the member has more than one. */
export function WorkspaceSwitcher({ current, workspaces = [], action }: WorkspaceSwitcherProps) {
  const isCurrent = (w: { id: string; name: string }) => (current.id ? w.id === current.id : w.name === current.name);
  if (workspaces.length < 2) {
    return (
      <span className="min-w-0 truncate text-sm text-paper/85">
        <span className="sr-only">Workspace: </span>
        {current.name}
      </span>
    );
  }
  return (
    <Disclosure
      className="relative min-w-0 [&[open]>summary]:bg-white/10"
      summaryClassName="flex cursor-pointer list-none items-center gap-1.5 rounded-md px-2 py-1 text-sm text-paper/85 hover:bg-white/8 hover:text-paper [&::-webkit-details-marker]:hidden"
      summary={
        <>
          <span className="sr-only">Workspace: </span>
          <span className="max-w-48 truncate">{current.name}</span>
          <span className="sr-only">, switch workspace</span>
          <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3 text-paper/60">
            <path d="M3 4.8 6 2l3 2.8M3 7.2 6 10l3-2.8" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
          </svg>
        </>
      }
    >
      <form
        method="post"
        action={action}
        className="absolute left-0 z-30 mt-2 w-64 rounded-panel border border-paper-line bg-paper-raised p-1.5 text-ink shadow-lift"
      >
        <p className="px-3 pt-1.5 pb-1 text-xs font-semibold tracking-wider text-ink-faint uppercase">Workspaces</p>
        <ul>
          {workspaces.map((w) => (
            <li key={w.id}>
              <button
                type="submit"
                name="workspaceId"
                value={w.id}
                aria-current={isCurrent(w) ? "true" : undefined}
                className="flex w-full items-center justify-between gap-2 rounded-md px-3 py-2 text-left text-sm hover:bg-paper-sunk aria-[current]:font-medium"
              >
                <span className="truncate">{w.name}</span>
                {isCurrent(w) && <span className="size-2 shrink-0 rounded-full bg-copper-500" aria-hidden="true" />}
              </button>
            </li>
          ))}
        </ul>
      </form>
    </Disclosure>
  );
}
