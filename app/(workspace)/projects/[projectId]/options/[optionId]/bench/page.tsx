import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { getDesignOptionById, listRevisionsByOption } from "@/db/queries/options";
import { getProjectById } from "@/db/queries/projects";
import { listBenchRunsByOption } from "@/db/queries/bench";
import { Caution, EmptyState, PageHeader, Panel, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { CORRELATION_BAND_K } from "@/models/fit";
import { BENCH_COLUMNS, BENCH_TEMPLATE } from "@/lib/bench/schema";
import { UploadForm } from "./UploadForm";

export const metadata: Metadata = { title: "Bench correlation" };

export default async function BenchPage({ params }: { params: Promise<{ projectId: string; optionId: string }> }) {
  const member = await requirePageMember("read");
  const { projectId, optionId } = await params;
  const project = await loadPageInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId }));
  const option = await loadPageInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId }));
  if (option.projectId !== project.id) notFound();
  const workspaceId = member.workspace.id;
  const [runs, revisions] = await Promise.all([listBenchRunsByOption({ workspaceId, optionId }), listRevisionsByOption({ workspaceId, optionId })]);
  const base = `/projects/${project.id}/options/${option.id}`;

  return (
    <>
      <PageHeader
        title={`Bench correlation: ${option.name}`}
        subtitle={`Measured temperatures against the model, part by part, with a fitted thermal resistance. Band ±${CORRELATION_BAND_K} K.`}
        back={{ href: `${base}/budget`, label: "Budget" }}
      />
      <div className="grid gap-6">
        {can(member.role, "bench:write") && (
          <Panel title="Upload readings" description="A CSV against one revision; every row is checked and nothing is stored unless all rows are good.">
            <UploadForm optionId={option.id} revisions={revisions.map((r) => r.revision)} />
            <details className="mt-4 text-sm text-ink-soft">
              <summary className="cursor-pointer font-medium text-ink">File format</summary>
              <p className="mt-2">
                Columns: <code>{BENCH_COLUMNS.join(", ")}</code> (note optional). <code>part_id</code> is a part with a junction
                (controller, Q1, Q1.npn, Q1.driver …), <code>corner_id</code> a corner of the revision, <code>method</code> thermocouple or ir,
                <code> measured_at</code> case or junction (case only for parts with an RθJC), temperatures with the unit °C.
              </p>
              <pre className="mt-2 overflow-x-auto rounded-md bg-paper-sunk p-3 font-mono text-xs">{BENCH_TEMPLATE}</pre>
            </details>
          </Panel>
        )}
        {runs.length === 0 ? (
          <EmptyState title="No bench runs yet">Upload the readings of a bench session to compare them with the model.</EmptyState>
        ) : (
          <Table caption="Bench runs">
            <THead>
              <Tr>
                <Th>Run</Th>
                <Th numeric>Revision</Th>
                <Th numeric>Readings</Th>
                <Th>Uploaded by</Th>
                <Th>When</Th>
              </Tr>
            </THead>
            <TBody>
              {runs.map((r) => (
                <Tr key={r.id}>
                  <Td>
                    <Link className="font-medium text-copper-700 hover:underline" href={`${base}/bench/${r.id}`}>{r.id}</Link>
                  </Td>
                  <Td numeric>{r.revision}</Td>
                  <Td numeric>{r.rowCount}</Td>
                  <Td>{r.createdByName ?? "—"}</Td>
                  <Td>{r.createdAt.slice(0, 16).replace("T", " ")} UTC</Td>
                </Tr>
              ))}
            </TBody>
          </Table>
        )}
        <Caution />
      </div>
    </>
  );
}
