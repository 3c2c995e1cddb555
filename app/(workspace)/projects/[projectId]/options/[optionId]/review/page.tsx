import type { Metadata } from "next";
import Link from "next/link";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { loadRevisionEvaluation } from "@/services/evaluation/revision";
import { getDesignOptionById } from "@/db/queries/options";
import { listReviewsByOption } from "@/db/queries/reviews";
import { Badge, Caution, PageHeader, Panel, Table, TBody, THead, Td, Th, Tr } from "@/components/ui";
import { DecisionForm, SubmitReviewForm } from "./ReviewForms";
import { ReviewHistory, STATUS_TEXT } from "./ReviewHistory";

export const metadata: Metadata = { title: "Review" };

const kelvin = (x: number) => `${x.toFixed(1)} K`;
const celsius = (x: number) => `${x.toFixed(1)} °C`;

export default async function ReviewPage({ params, searchParams }: { params: Promise<{ projectId: string; optionId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const member = await requirePageMember("read");
  const { projectId, optionId } = await params;
  const search = await searchParams;
  const option = await loadPageInWorkspace(member, async (workspaceId) => {
    const o = await getDesignOptionById({ workspaceId, optionId });
    return o && o.projectId === projectId ? o : null;
  });
  const workspaceId = member.workspace.id;
  const wanted = Number(search.revision);
  const shown = Number.isInteger(wanted) && wanted >= 1 && wanted <= option.latestRevision ? wanted : option.latestRevision;
  const [reviews, loaded] = await Promise.all([listReviewsByOption({ workspaceId, optionId: option.id }), loadRevisionEvaluation({ workspaceId, optionId: option.id, revision: shown })]);
  const review = reviews.find((r) => r.revision === shown) ?? null;
  const evaluation = loaded?.ok ? loaded.evaluation : null;
  const junctions = evaluation?.parts.filter((p) => p.junction) ?? [];
  const canSubmit = can(member.role, "option:submit") && !review && shown === option.latestRevision;
  const canDecide = can(member.role, "option:review") && review?.status === "submitted" && review.submittedBy?.id !== member.user.id;
  const editor = `/projects/${projectId}/options/${option.id}`;

  return (
    <>
      <PageHeader
        title={`Review: ${option.name}`}
        subtitle={`Revision ${shown} of ${option.latestRevision}. A submitted revision is frozen; edits in the editor make a new revision.`}
        back={{ href: editor, label: option.name }}
        meta={review ? <Badge tone={STATUS_TEXT[review.status].tone}>{STATUS_TEXT[review.status].label}</Badge> : <Badge>not submitted</Badge>}
      />
      <div className="flex flex-col gap-6">
        <Panel title={`Revision ${shown}`} description={loaded?.revision.note ? `Note: ${loaded.revision.note}` : undefined}>
          {canSubmit && <SubmitReviewForm optionId={option.id} revision={shown} />}
          {!review && !canSubmit && <p className="text-sm text-ink-soft">{shown === option.latestRevision ? "Not submitted yet; a designer submits it." : "An older revision that was never submitted."}</p>}
          {review?.status === "submitted" && !canDecide && (
            <p className="text-sm text-ink-soft">Waiting for a reviewer{review.submittedBy?.id === member.user.id ? " (someone other than you)" : ""}.</p>
          )}
          {review?.status === "rejected" && (
            <p className="text-sm text-ink-soft">
              Rejected. Make the changes in the <Link className="underline" href={editor}>editor</Link>: saving makes a new revision, which can be submitted.
            </p>
          )}
          {review?.status === "approved" && <p className="text-sm text-ink-soft">Approved. The manager can record it as the project&apos;s choice on the <Link className="underline" href={`/projects/${projectId}/compare`}>comparison</Link>.</p>}
          {canDecide && <DecisionForm optionId={option.id} revision={shown} partIds={junctions.map((p) => p.id)} />}
        </Panel>

        <Panel title="Margins under the workspace policy" description={loaded?.ok && loaded.policy ? "Derated limits from the workspace derating policy, worst corner per part." : "No workspace policy is set: the document's own derating applies."} flush>
          {evaluation ? (
            <Table caption="Junction margins">
              <THead>
                <Tr>
                  <Th>Part</Th>
                  <Th>Worst corner</Th>
                  <Th>Tj</Th>
                  <Th>Derated limit</Th>
                  <Th>Margin</Th>
                </Tr>
              </THead>
              <TBody>
                {junctions.map((p) => (
                  <Tr key={p.id} data-part={p.id}>
                    <Td className="font-mono text-xs">{p.id}</Td>
                    <Td>{p.worstCornerId}</Td>
                    <Td>{p.junction && !p.junction.runaway ? celsius(p.junction.tj) : "runaway"}</Td>
                    <Td>{p.junction ? celsius(p.junction.limit) : "—"}</Td>
                    <Td>{p.junction && !p.junction.runaway ? kelvin(p.junction.margin) : "—"}</Td>
                  </Tr>
                ))}
              </TBody>
            </Table>
          ) : (
            <p className="px-5 py-3 text-sm text-ink-soft">This revision does not evaluate; see the editor for its issues.</p>
          )}
        </Panel>

        <Panel title="Review history">
          <ReviewHistory reviews={reviews} />
        </Panel>
        <Caution variant="full" />
      </div>
    </>
  );
}
