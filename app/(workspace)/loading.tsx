// Shown inside the shell while a workspace page's data loads (budgets and
// comparisons evaluate on the server first).
export default function WorkspaceLoading() {
  return (
    <div className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-10 sm:px-6" aria-busy="true" aria-live="polite">
      <p className="font-mono text-sm text-ink-faint">Loading…</p>
      <div className="h-8 w-2/3 animate-pulse rounded bg-paper-line" />
      <div className="h-40 animate-pulse rounded-panel bg-paper-raised" />
    </div>
  );
}
