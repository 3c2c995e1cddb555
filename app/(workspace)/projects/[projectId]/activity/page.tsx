import type { Metadata } from "next";
import Link from "next/link";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { getProjectById } from "@/db/queries/projects";
import { listActivityByProject, type ActivityEntry } from "@/db/queries/activity";
import { EmptyState, PageHeader, Table, TBody, THead, Td, Th, Tr } from "@/components/ui";

export const metadata: Metadata = { title: "Activity" };

const ACTION_TEXT: Record<string, string> = {
  "revision.saved": "saved a revision",
  "revision.note_changed": "corrected a revision's note",
  "review.submitted": "submitted for review",
  "review.approved": "approved",
  "review.rejected": "rejected",
  "option.chosen": "chose the option",
  "option.renamed": "renamed the option",
  "option.archived": "archived the option",
  "option.restored": "restored the option",
  "derating.changed": "changed the workspace derating policy",
  "member.role_changed": "changed a member's role",
  "member.removed": "removed a member",
  "token.created": "created an API token",
  "token.revoked": "revoked an API token",
  "part.updated": "edited a part",
  "part.deleted": "deleted a part",
  "parts.imported": "imported parts",
};

function what(e: ActivityEntry, projectId: string) {
  if (!e.optionId) return <span className="text-ink-soft">whole workspace</span>;
  const label = `${e.optionName ?? e.optionId}${e.revision ? `, rev ${e.revision}` : ""}`;
  const href = `/projects/${projectId}/options/${e.optionId}/review${e.revision ? `?revision=${e.revision}` : ""}`;
  return <Link className="underline" href={href}>{label}</Link>;
}

const str = (v: unknown) => (typeof v === "string" ? v : "");

function detailText(e: ActivityEntry): string {
  const d = e.detail as Record<string, unknown>;
  const member = d.member as { displayName?: unknown } | undefined;
  if (e.action === "option.renamed") return `${str(d.from)} → ${str(d.to)}`;
  if (e.action === "member.role_changed") return `${str(member?.displayName)}: ${str(d.from)} → ${str(d.to)}`;
  if (e.action === "member.removed") return `${str(member?.displayName)} (${str(d.role)})`;
  if (e.action.startsWith("token.")) return str(d.name);
  if (e.action.startsWith("part.")) return `${str(d.manufacturer)} ${str(d.mpn)}`.trim();
  if (e.action === "parts.imported") return `${Number(d.created) || 0} new, ${Number(d.updated) || 0} updated`;
  if (typeof d.reason === "string") return d.reason;
  if (typeof d.note === "string") return d.note;
  if (typeof d.comments === "number" && d.comments > 0) return `${d.comments} comment${d.comments === 1 ? "" : "s"}`;
  return "";
}

/** The project's activity log, oldest first. Read-only: the table refuses edits and deletions. */
export default async function ActivityPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requirePageMember("read");
  const { projectId } = await params;
  const project = await loadPageInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId }));
  const items = await listActivityByProject({ workspaceId: member.workspace.id, projectId: project.id });
  return (
    <>
      <PageHeader title="Activity" subtitle={`${project.name}: every saved revision, review step, choice and option change, and the workspace-wide changes (derating, members, API tokens, parts), with the names as they were then. Entries cannot be edited or removed.`} back={{ href: `/projects/${project.id}`, label: project.name }} />
      {items.length === 0 ? (
        <EmptyState title="Nothing yet">Saved revisions, reviews and choices will appear here.</EmptyState>
      ) : (
        <Table caption={`${items.length} entr${items.length === 1 ? "y" : "ies"}, oldest first`}>
          <THead>
            <Tr>
              <Th>When (UTC)</Th>
              <Th>Who</Th>
              <Th>What</Th>
              <Th>Option</Th>
              <Th>Detail</Th>
            </Tr>
          </THead>
          <TBody>
            {items.map((e) => (
              <Tr key={e.id} data-action={e.action}>
                <Td className="font-mono text-xs whitespace-nowrap">{e.at.slice(0, 19).replace("T", " ")}</Td>
                <Td>{e.actor?.displayName ?? "—"}</Td>
                <Td>{ACTION_TEXT[e.action] ?? e.action}</Td>
                <Td>{what(e, project.id)}</Td>
                <Td className="max-w-md truncate text-ink-soft">{detailText(e)}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </>
  );
}
