import type { Metadata } from "next";
import { requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { listPartsByWorkspace } from "@/db/queries/parts";
import { EmptyState, FormMessage, LinkButton, PageHeader, Pagination } from "@/components/ui";
import { FILTER_PARAMS, partListQuerySchema, searchParamsObject, type PartListFilter, type SortKey } from "@/lib/parts/schema";
import { PartFilters } from "./_components/PartFilters";
import { PartsTable } from "./_components/PartsTable";

export const metadata: Metadata = { title: "Parts library" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

const SORTABLE: SortKey[] = ["mpn", "manufacturer", "kind", "unitCost", "updatedAt", "param"];

function hrefWith(raw: Record<string, string>, patch: Record<string, string | undefined>): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...raw, ...patch })) if (v) q.set(k, v);
  const s = q.toString();
  return s ? `/parts?${s}` : "/parts";
}

export default async function PartsPage({ searchParams }: { searchParams: SearchParams }) {
  const member = await requirePageMember("read");
  const raw = searchParamsObject(await searchParams);
  const parsed = partListQuerySchema.safeParse(raw);
  const errors: Record<string, string> = {};
  if (!parsed.success) for (const i of parsed.error.issues) errors[i.path.map(String).join(".")] ??= i.message;
  const filter: PartListFilter = parsed.success ? parsed.data : partListQuerySchema.parse({});
  const result = await listPartsByWorkspace({ workspaceId: member.workspace.id, filter });
  const canWrite = can(member.role, "part:write");
  const keep = Object.fromEntries(Object.entries(raw).filter(([k]) => k !== "page"));
  const sortHrefs = Object.fromEntries(
    SORTABLE.map((key) => [key, hrefWith(keep, { sort: key, dir: filter.sort === key && filter.dir === "asc" ? "desc" : "asc" })]),
  );
  const apiQuery = new URLSearchParams(Object.entries(raw).filter(([, v]) => v));
  const paramDef = filter.param ? FILTER_PARAMS.find((p) => p.key === filter.param!.key) : undefined;
  const filtered = Boolean(filter.search || filter.kind || filter.param);
  const exportHref = `/api/v1/parts/export${apiQuery.size ? `?${apiQuery}` : ""}`;
  return (
    <>
      <PageHeader
        title="Parts library"
        subtitle="Datasheet figures in SI, shared by every design option in this workspace."
        actions={
          <div className="flex gap-2">
            <LinkButton href={exportHref} prefetch={false}>Export CSV</LinkButton>
            {canWrite && <LinkButton href="/parts/import">Import CSV</LinkButton>}
            {canWrite && <LinkButton href="/parts/new" variant="primary">New part</LinkButton>}
          </div>
        }
      />
      <PartFilters values={raw} errors={errors} />
      {!parsed.success && <FormMessage tone="error" message="Some filters could not be read and were ignored; see the fields above." className="mb-4" />}
      {result.items.length === 0 ? (
        <EmptyState
          title={filtered ? "No part matches these filters" : "The library is empty"}
          action={filtered ? <LinkButton href="/parts">Clear filters</LinkButton> : canWrite ? <LinkButton href="/parts/import" variant="primary">Import a CSV</LinkButton> : undefined}
        >
          {filtered ? "Widen the range or search for another part number." : "Add parts one by one or import a CSV of datasheet figures."}
        </EmptyState>
      ) : (
        <>
          <PartsTable
            apiKey={`/api/v1/parts?${apiQuery}`}
            initial={result}
            sortHrefs={sortHrefs}
            sorted={{ key: filter.sort, dir: filter.dir === "asc" ? "ascending" : "descending" }}
            param={paramDef ? { key: paramDef.key, label: paramDef.label } : null}
            canWrite={canWrite}
          />
          <Pagination page={result.page} pageCount={result.pageCount} basePath="/parts" searchParams={keep} label="Parts pages" />
        </>
      )}
    </>
  );
}
