"use client";

/** Where an issue's path is edited: the diagram element, or the corners/thermal panels. */
export function selectionForPath(path: string): string {
  const m = /^positions\.(\d+)(?:\.(drive|gate|mosfet|conduction))?/.exec(path);
  if (m) return m[2] ? `positions.${m[1]}.${m[2]}` : `positions.${m[1]}`;
  if (path.startsWith("controller")) return "controller";
  const head = path.split(".")[0] ?? "";
  return head === "description" ? "name" : head;
}

export function IssueList({ issues, onGo }: { issues: Record<string, string>; onGo: (path: string) => void }) {
  const entries = Object.entries(issues);
  if (entries.length === 0) return <p className="text-sm text-verdigris-700">The model accepts this document.</p>;
  return (
    <ul className="flex flex-col gap-1 text-sm" aria-label="Validation issues">
      {entries.map(([path, message]) => (
        <li key={path}>
          <button type="button" className="text-left hover:underline" onClick={() => onGo(path)}>
            <code className="font-mono text-xs text-alarm-700">{path || "document"}</code> <span className="text-ink">{message}</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
