import type { Metadata } from "next";
import Link from "next/link";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { loadProjectEvaluations } from "@/services/evaluation/revision";
import { can } from "@/lib/roles";
import { getProjectById } from "@/db/queries/projects";
import { listChoicesByProject } from "@/db/queries/choices";
import { compareOptions } from "@/models/compare";
import { Badge, Button, Caution, EmptyState, PageHeader, Panel } from "@/components/ui";
import { ComparisonChartLazy } from "@/components/charts/ComparisonChartLazy";
import { driveChainBill } from "@/components/budget/bill";
import { LineUp, MAX_COMPARED, MIN_COMPARED } from "./LineUp";
import { ChoiceForm } from "./ChoiceForm";
import { ChoiceHistory } from "./ChoiceHistory";

export const metadata: Metadata = { title: "Compare options" };

type Search = Promise<Record<string, string | string[] | undefined>>;

const asList = (v: string | string[] | undefined) => (v === undefined ? [] : Array.isArray(v) ? v : [v]);

export default async function ComparePage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Search }) {
  const member = await requirePageMember("read");
  const { projectId } = await params;
  const search = await searchParams;
  const project = await loadPageInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId }));
  const workspaceId = member.workspace.id;
  const all = await loadProjectEvaluations({ workspaceId, projectId: project.id });
  const evaluable = all.filter((x) => x.budget?.ok);
  const wanted = asList(search.o).filter((id) => evaluable.some((x) => x.option.id === id));
  const picked = (wanted.length >= MIN_COMPARED ? wanted : evaluable.map((x) => x.option.id)).slice(0, MAX_COMPARED);
  const chosen = evaluable.filter((x) => picked.includes(x.option.id));
  const baselineId = chosen.some((x) => x.option.id === search.baseline) ? String(search.baseline) : chosen[0]?.option.id;
  const history = await listChoicesByProject({ workspaceId, projectId: project.id });
  const canChoose = can(member.role, "option:choose");

  const list = chosen.map(({ option, budget }) => {
    if (!budget?.ok) throw new Error("unreachable: filtered to evaluable budgets");
    const bill = driveChainBill(budget.design);
    return { id: option.id, name: option.name, evaluation: budget.evaluation, partCount: bill.partCount, cost: bill.cost, bill, revision: budget.revision.revision };
  });
  const rows = baselineId ? compareOptions(list, baselineId) : [];

  return (
    <>
      <PageHeader
        title="Compare options"
        subtitle={`${project.name}: the options side by side at their worst corners, and the sign-off.`}
        back={{ href: `/projects/${project.id}`, label: project.name }}
        meta={history[0] ? <Badge tone="ok">chosen: {history[0].optionName}</Badge> : <Badge>no option chosen yet</Badge>}
      />
      {evaluable.length < MIN_COMPARED ? (
        <EmptyState title="Fewer than two options evaluate">A comparison needs at least two options whose latest revision evaluates.</EmptyState>
      ) : (
        <div className="flex flex-col gap-6">
          <Panel title="Line-up" description="Pick two to five options and the baseline that heat moved out of the controller is measured against." flush>
            <form method="get" className="flex flex-wrap items-end gap-4 border-b border-paper-line px-5 py-3 text-sm" aria-label="Options to compare">
              <fieldset className="flex flex-wrap gap-x-4 gap-y-2">
                <legend className="sr-only">Options</legend>
                {evaluable.map(({ option }) => (
                  <label key={option.id} className="flex items-center gap-1.5">
                    <input type="checkbox" name="o" value={option.id} defaultChecked={picked.includes(option.id)} className="accent-copper-600" />
                    {option.name}
                  </label>
                ))}
              </fieldset>
              <label className="flex items-center gap-2">
                Baseline
                <select name="baseline" defaultValue={baselineId} className="h-8 rounded-md border border-paper-edge bg-paper-raised px-2">
                  {evaluable.map(({ option }) => (
                    <option key={option.id} value={option.id}>
                      {option.name}
                    </option>
                  ))}
                </select>
              </label>
              <Button type="submit" size="sm" variant="secondary">
                Compare
              </Button>
            </form>
            <LineUp projectId={project.id} rows={rows} bills={Object.fromEntries(list.map((l) => [l.id, l.bill]))} chosenId={history[0]?.optionId} />
          </Panel>

          <Panel title="Margins at a glance" description="Controller and tightest part, K below their derated limits; below the red line is over.">
            <ComparisonChartLazy
              title="Margin to the derated limit per option"
              rows={rows.map((r) => ({
                option: r.id,
                label: r.name,
                controllerMargin: r.controller?.margin ?? Number.NaN,
                hottestMargin: r.tightest?.margin ?? Number.NaN,
                hottestPart: r.tightest?.partId ?? "",
              }))}
            />
          </Panel>

          <Panel title="Sign-off" description="The manager records which option goes ahead, and why. The latest record is the one in force.">
            <div className="grid gap-6 lg:grid-cols-2">
              {canChoose ? (
                <ChoiceForm projectId={project.id} options={list.map((l) => ({ id: l.id, name: l.name, revision: l.revision }))} preselect={history[0]?.optionId} />
              ) : (
                <p className="text-sm text-ink-soft">A manager records the choice; you can read it here.</p>
              )}
              <ChoiceHistory history={history} />
            </div>
          </Panel>
          <p className="text-xs text-ink-faint">
            Figures come from each option&apos;s latest revision; open its <Link className="underline" href={`/projects/${project.id}`}>budget</Link> for every corner.
          </p>
        </div>
      )}
      <Caution variant="full" className="mt-6" />
    </>
  );
}
