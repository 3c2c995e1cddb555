"use client";

import { useState } from "react";
import { Button, FormMessage, TextInput } from "@/components/ui";
import type { Conflict, Notice, Snapshot } from "./useOptionEditor";

/**
 * Save as a new revision, with a note. On a conflict the edits stay in the
 * form; the user re-applies them onto the latest revision or discards them.
 */
export function SaveBar({
  baseRevision,
  dirty,
  issueCount,
  saving,
  conflict,
  notice,
  onSave,
  onReapply,
  onDiscard,
}: {
  baseRevision: number;
  dirty: boolean;
  issueCount: number;
  saving: boolean;
  conflict: Conflict | null;
  notice: Notice;
  onSave: (note: string) => Promise<number | null>;
  onReapply: (latest: Snapshot) => void;
  onDiscard: (latest: Snapshot) => void;
}) {
  const [note, setNote] = useState("");
  return (
    <div className="flex flex-col gap-3">
      {conflict && (
        <div role="alert" className="rounded-md border-l-4 border-amber-500 bg-amber-50 px-4 py-3 text-sm text-amber-700">
          <p className="font-semibold">Someone saved this option while you were editing.</p>
          <p className="mt-1">{conflict.message} Your edits are still here, unsaved.</p>
          {conflict.latest ? (
            <div className="mt-3 flex flex-wrap gap-2">
              <Button size="sm" onClick={() => onReapply(conflict.latest!)}>
                Re-apply my edits onto revision {conflict.latest.revision}
              </Button>
              <Button size="sm" variant="secondary" onClick={() => onDiscard(conflict.latest!)}>
                Discard my edits, load revision {conflict.latest.revision}
              </Button>
            </div>
          ) : (
            <p className="mt-2">The latest revision could not be loaded; reload the page (copy your edits from the JSON view first).</p>
          )}
        </div>
      )}
      {notice && <FormMessage tone={notice.tone} message={notice.text} />}
      <form
        className="flex flex-wrap items-end gap-3"
        onSubmit={async (e) => {
          e.preventDefault();
          if ((await onSave(note)) !== null) setNote("");
        }}
      >
        <TextInput name="note" id="revision-note" label="Revision note" optional value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} fieldClassName="min-w-72 flex-1" placeholder="What changed and why" />
        <Button type="submit" disabled={saving || !dirty || conflict !== null} aria-disabled={saving || undefined}>
          {saving ? "Saving…" : `Save revision ${baseRevision + 1}`}
        </Button>
      </form>
      <p className="text-xs text-ink-faint">
        {dirty ? "Unsaved changes" : "No unsaved changes"} · editing from revision {baseRevision}
        {issueCount > 0 ? ` · ${issueCount} issue${issueCount === 1 ? "" : "s"} to correct before the save is accepted` : ""}
      </p>
    </div>
  );
}
