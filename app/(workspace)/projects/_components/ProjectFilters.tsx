import { Button, LinkButton, Select, TextInput } from "@/components/ui";
import { PROJECT_PAGE_SIZES, PROJECT_STATUSES, STATUS_LABELS, TOPOLOGIES, TOPOLOGY_LABELS, type ProjectListQuery } from "@/lib/projects/schema";

/** A plain GET form: filters live in the URL, so a filtered list can be shared and reloaded. */
export function ProjectFilters({ query }: { query: ProjectListQuery }) {
  return (
    <form method="get" action="/projects" role="search" aria-label="Filter projects" className="mb-4 flex flex-wrap items-end gap-3">
      <TextInput name="q" label="Search" placeholder="Name or notes" defaultValue={query.q ?? ""} fieldClassName="w-64" type="search" />
      <Select
        name="status"
        label="Status"
        defaultValue={query.status ?? ""}
        placeholder="Any status"
        options={PROJECT_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))}
        fieldClassName="w-40"
      />
      <Select
        name="topology"
        label="Topology"
        defaultValue={query.topology ?? ""}
        placeholder="Any topology"
        options={TOPOLOGIES.map((t) => ({ value: t, label: TOPOLOGY_LABELS[t] }))}
        fieldClassName="w-48"
      />
      <Select
        name="pageSize"
        label="Per page"
        defaultValue={String(query.pageSize)}
        options={PROJECT_PAGE_SIZES.map((n) => ({ value: String(n), label: String(n) }))}
        fieldClassName="w-24"
      />
      {query.sort !== "updated" && <input type="hidden" name="sort" value={query.sort} />}
      {query.dir && <input type="hidden" name="dir" value={query.dir} />}
      <Button type="submit" variant="secondary">
        Apply
      </Button>
      {(query.q || query.status || query.topology) && (
        <LinkButton href="/projects" variant="ghost">
          Clear
        </LinkButton>
      )}
    </form>
  );
}
