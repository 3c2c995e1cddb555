import type { Metadata } from "next";
import Link from "next/link";
import { requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { listProjectsByWorkspace } from "@/db/queries/projects";
import { formatQuantity } from "@/models/input/units";
import { Badge, EmptyState, LinkButton, PageHeader, Pagination, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { defaultDirection, projectListQuerySchema, STATUS_LABELS, TOPOLOGY_LABELS, type ProjectListQuery, type ProjectSort } from "@/lib/projects/schema";
import { ProjectFilters } from "./_components/ProjectFilters";
import { STATUS_TONES } from "./_components/status";

export const metadata: Metadata = { title: "Projects" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

function first(sp: Record<string, string | string[] | undefined>): Record<string, string> {
  return Object.fromEntries(Object.entries(sp).flatMap(([k, v]) => (v === undefined ? [] : [[k, Array.isArray(v) ? v[0] : v]])));
}

/** The query as search params, without defaults, so links stay short. */
function keep(q: ProjectListQuery): Record<string, string | undefined> {
  return { q: q.q, status: q.status, topology: q.topology, sort: q.sort === "updated" ? undefined : q.sort, dir: q.dir, pageSize: q.pageSize === 20 ? undefined : String(q.pageSize) };
}

function sortHref(q: ProjectListQuery, sort: ProjectSort): string {
  const current = q.dir ?? defaultDirection(q.sort);
  const dir = q.sort === sort ? (current === "asc" ? "desc" : "asc") : defaultDirection(sort);
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...keep(q), sort, dir })) if (v) params.set(k, v);
  return `/projects?${params}`;
}

export default async function ProjectsPage({ searchParams }: { searchParams: SearchParams }) {
  const member = await requirePageMember("read");
  const parsed = projectListQuerySchema.safeParse(first(await searchParams));
  const query = parsed.success ? parsed.data : projectListQuerySchema.parse({});
  const { items, total } = await listProjectsByWorkspace({ workspaceId: member.workspace.id, query });
  const pageCount = Math.max(1, Math.ceil(total / query.pageSize));
  const dir = query.dir ?? defaultDirection(query.sort);
  const th = (sort: ProjectSort, label: string, numeric = false) => (
    <Th numeric={numeric} sortHref={sortHref(query, sort)} sorted={query.sort === sort ? (dir === "asc" ? "ascending" : "descending") : undefined}>
      {label}
    </Th>
  );
  const filtered = Boolean(query.q || query.status || query.topology);
  return (
    <>
      <PageHeader
        title="Projects"
        subtitle="Each project is one converter; its design options are the gate-drive choices you compare."
        actions={can(member.role, "project:write") ? <LinkButton href="/projects/new" variant="primary">New project</LinkButton> : undefined}
      />
      <ProjectFilters query={query} />
      {items.length === 0 ? (
        <EmptyState
          title={filtered ? "No project matches these filters" : "No projects yet"}
          action={filtered ? <LinkButton href="/projects">Clear filters</LinkButton> : can(member.role, "project:write") ? <LinkButton href="/projects/new" variant="primary">New project</LinkButton> : undefined}
        >
          {filtered ? "Try another search or status." : "Create a project for the converter whose gate drives you are choosing."}
        </EmptyState>
      ) : (
        <>
          <Table caption={`Projects (${total})`}>
            <THead>
              <tr>
                {th("name", "Name")}
                {th("topology", "Topology")}
                {th("status", "Status")}
                {th("vin", "Vin range", true)}
                {th("fsw", "fsw", true)}
                <Th numeric>Options</Th>
                {th("updated", "Updated", true)}
              </tr>
            </THead>
            <TBody>
              {items.map((p) => (
                <Tr key={p.id}>
                  <Td>
                    <Link href={`/projects/${p.id}`} className="font-medium text-ink hover:text-copper-700">
                      {p.name}
                    </Link>
                  </Td>
                  <Td>{TOPOLOGY_LABELS[p.topology]}</Td>
                  <Td>
                    <Badge tone={STATUS_TONES[p.status]}>{STATUS_LABELS[p.status]}</Badge>
                  </Td>
                  <Td numeric>
                    {p.vinMin}–{p.vinMax} V
                  </Td>
                  <Td numeric>{formatQuantity(p.fsw, "frequency")}</Td>
                  <Td numeric>{p.optionCount}</Td>
                  <Td numeric>
                    <time dateTime={p.updatedAt}>{p.updatedAt.slice(0, 10)}</time>
                  </Td>
                </Tr>
              ))}
            </TBody>
          </Table>
          <Pagination page={query.page} pageCount={pageCount} basePath="/projects" searchParams={keep(query)} label="Project pages" />
        </>
      )}
    </>
  );
}
