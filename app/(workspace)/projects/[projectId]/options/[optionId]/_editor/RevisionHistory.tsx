"use client";

import useSWR from "swr";
import { Badge, Button } from "@/components/ui";
import type { RevisionSummary } from "@/db/queries/options";
import { getJson } from "@/lib/api-client";

export type RevisionList = { latestRevision: number; items: RevisionSummary[] };

export function revisionsKey(optionId: string): string {
  return `/api/v1/options/${optionId}/revisions`;
}

/** Every saved revision, newest first; any one can be loaded into the editor. */
export function RevisionHistory({ optionId, initial, baseRevision, onOpen }: { optionId: string; initial: RevisionList; baseRevision: number; onOpen: (revision: number) => void }) {
  const { data } = useSWR<RevisionList>(revisionsKey(optionId), getJson, { fallbackData: initial });
  const items = data?.items ?? [];
  return (
    <ol className="flex flex-col divide-y divide-paper-line" aria-label="Revision history">
      {items.map((r) => (
        <li key={r.revision} className="flex items-start justify-between gap-3 py-2.5">
          <div className="min-w-0 text-sm">
            <p className="flex flex-wrap items-center gap-2">
              <span className="font-mono font-medium text-ink">rev {r.revision}</span>
              {r.revision === data?.latestRevision && <Badge tone="ok">latest</Badge>}
              {r.revision === baseRevision && <Badge tone="info">editing from</Badge>}
              {r.frozen && <Badge tone="copper">frozen</Badge>}
            </p>
            {r.note && <p className="mt-0.5 text-ink-soft">{r.note}</p>}
            <p className="mt-0.5 text-xs text-ink-faint">
              {r.createdByName ?? "unknown"} · <time dateTime={r.createdAt}>{r.createdAt.slice(0, 16).replace("T", " ")}</time>
            </p>
          </div>
          <Button size="sm" variant="ghost" onClick={() => onOpen(r.revision)} aria-label={`Open revision ${r.revision}`}>
            Open
          </Button>
        </li>
      ))}
    </ol>
  );
}
