import type { ReviewRecord, ReviewStatus } from "@/db/queries/reviews";
import { Badge } from "@/components/ui";

export const STATUS_TEXT: Record<ReviewStatus, { label: string; tone: "info" | "ok" | "over" }> = {
  submitted: { label: "awaiting review", tone: "info" },
  approved: { label: "approved", tone: "ok" },
  rejected: { label: "rejected", tone: "over" },
};

const when = (iso: string) => `${iso.slice(0, 16).replace("T", " ")} UTC`;

/** Every review of the option, newest revision first, with the reviewer's comments. */
export function ReviewHistory({ reviews }: { reviews: ReviewRecord[] }) {
  if (reviews.length === 0) return <p className="text-sm text-ink-soft">No revision of this option has been submitted for review yet.</p>;
  return (
    <ol className="flex flex-col gap-4" aria-label="Reviews, newest first">
      {reviews.map((r) => (
        <li key={r.id} className="rounded-md border border-paper-line px-4 py-3" data-review-revision={r.revision}>
          <p className="flex flex-wrap items-center gap-2 text-sm">
            <span className="font-medium">Revision {r.revision}</span>
            <Badge tone={STATUS_TEXT[r.status].tone}>{STATUS_TEXT[r.status].label}</Badge>
          </p>
          <p className="mt-1 text-xs text-ink-faint">
            Submitted by {r.submittedBy?.displayName ?? "a former member"}, {when(r.submittedAt)}
            {r.decidedAt && `; ${r.status} by ${r.decidedBy?.displayName ?? "a former member"}, ${when(r.decidedAt)}`}
          </p>
          {r.comments.length > 0 && (
            <ul className="mt-3 flex flex-col gap-2" aria-label={`Comments on revision ${r.revision}`}>
              {r.comments.map((c) => (
                <li key={c.id} className="rounded-md bg-paper-sunk px-3 py-2 text-sm" data-testid="review-comment">
                  {(c.targetPart || c.targetFigure) && (
                    <p className="mb-1 font-mono text-xs text-copper-700">{[c.targetPart, c.targetFigure].filter(Boolean).join(" · ")}</p>
                  )}
                  <p className="whitespace-pre-wrap">{c.body}</p>
                  <p className="mt-1 text-xs text-ink-faint">{c.author?.displayName ?? "a former member"}</p>
                </li>
              ))}
            </ul>
          )}
        </li>
      ))}
    </ol>
  );
}
