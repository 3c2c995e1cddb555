import "server-only";
import { appLink, sendMail } from "@/services/mail/mail";
import { listMemberEmailsByRoles } from "@/db/queries/reviews";

// Who hears about each step, and the text they get. Mail goes out after the
// change is committed; a mail failure is logged and does not undo the step
// (the activity log and the review page are the record, e-mail is a nudge).
export function reviewPath({ projectId, optionId, revision }: { projectId: string; optionId: string; revision: number }): string {
  return `/projects/${encodeURIComponent(projectId)}/options/${encodeURIComponent(optionId)}/review?revision=${revision}`;
}

export async function mailEach(to: string[], subject: string, text: string): Promise<void> {
  const results = await Promise.allSettled(to.map((address) => sendMail({ to: address, subject, text })));
  results.forEach((r, i) => {
    if (r.status === "rejected") console.error(`review mail to ${to[i]} failed:`, r.reason);
  });
}

/** Reviewers of the workspace; admins when the workspace has no reviewer. */
export async function reviewerEmails(workspaceId: string): Promise<string[]> {
  const reviewers = await listMemberEmailsByRoles({ workspaceId, roles: ["reviewer"] });
  return reviewers.length ? reviewers : listMemberEmailsByRoles({ workspaceId, roles: ["admin"] });
}

export interface StepMail {
  workspaceId: string;
  projectId: string;
  optionId: string;
  optionName: string;
  revision: number;
  actorName: string;
  actorEmail: string;
}

const others = (to: string[], actorEmail: string) => to.filter((e) => e.toLowerCase() !== actorEmail.toLowerCase());

export async function mailSubmitted(m: StepMail & { note?: string }): Promise<void> {
  const link = appLink(reviewPath(m));
  await mailEach(
    others(await reviewerEmails(m.workspaceId), m.actorEmail),
    `Review requested: ${m.optionName}, revision ${m.revision}`,
    `${m.actorName} submitted "${m.optionName}" revision ${m.revision} for review.${m.note ? `\n\nNote: ${m.note}` : ""}\n\nOpen it: ${link}\n\nThe revision is frozen while it is reviewed; edits make a new revision.`,
  );
}

export async function mailDecided(m: StepMail & { decision: "approved" | "rejected"; submitterEmail: string | null; comments: { body: string; targetPart?: string | null; targetFigure?: string | null }[] }): Promise<void> {
  if (!m.submitterEmail) return;
  const link = appLink(reviewPath(m));
  const lines = m.comments.map((c) => {
    const at = [c.targetPart, c.targetFigure].filter(Boolean).join(", ");
    return `- ${at ? `[${at}] ` : ""}${c.body}`;
  });
  await mailEach(
    [m.submitterEmail],
    `Review ${m.decision}: ${m.optionName}, revision ${m.revision}`,
    `${m.actorName} ${m.decision} "${m.optionName}" revision ${m.revision}.${lines.length ? `\n\nComments:\n${lines.join("\n")}` : ""}\n\nOpen it: ${link}`,
  );
}

export async function mailChosen(m: StepMail & { reason: string }): Promise<void> {
  const link = appLink(reviewPath(m));
  const to = await listMemberEmailsByRoles({ workspaceId: m.workspaceId, roles: ["designer", "reviewer"] });
  await mailEach(
    others(to, m.actorEmail),
    `Option chosen: ${m.optionName}, revision ${m.revision}`,
    `${m.actorName} chose "${m.optionName}" revision ${m.revision} for the project.\n\nReason: ${m.reason}\n\nOpen it: ${link}`,
  );
}
