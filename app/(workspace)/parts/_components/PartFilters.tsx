import { Button, LinkButton, Select, TextInput } from "@/components/ui";
import { PART_KINDS, PART_KIND_LABELS } from "@/lib/parts/kinds";
import { DEFAULT_HFE_IC, FILTER_PARAMS } from "@/lib/parts/schema";

export interface PartFiltersProps {
  /** The raw search params, so a typed "40 nC" stays as typed. */
  values: Record<string, string>;
  errors: Record<string, string>;
}

/**
 * A plain GET form: the filter lives in the URL (shareable, works without
 * JavaScript) and the server runs it. Parameter bounds take unit strings.
 */
export function PartFilters({ values, errors }: PartFiltersProps) {
  return (
    <form method="get" action="/parts" role="search" aria-label="Filter parts" className="mb-4 grid items-end gap-3 rounded-panel border border-paper-line bg-paper-raised p-4 sm:grid-cols-2 lg:grid-cols-7">
      <TextInput name="q" label="Search" defaultValue={values.q ?? ""} placeholder="Part number, maker, text" fieldClassName="lg:col-span-2" error={errors.q} />
      <Select
        name="kind"
        label="Kind"
        defaultValue={values.kind ?? ""}
        placeholder="All kinds"
        options={PART_KINDS.map((k) => ({ value: k, label: PART_KIND_LABELS[k] }))}
        error={errors.kind}
      />
      <Select
        name="param"
        label="Parameter"
        defaultValue={values.param ?? ""}
        placeholder="No parameter filter"
        options={FILTER_PARAMS.map((p) => ({ value: p.key, label: p.label }))}
        error={errors.param}
      />
      <TextInput name="min" label="At least" defaultValue={values.min ?? ""} placeholder="e.g. 20 nC" error={errors.min} autoComplete="off" />
      <TextInput name="max" label="At most" defaultValue={values.max ?? ""} placeholder="e.g. 10 mΩ" error={errors.max} autoComplete="off" />
      <TextInput name="ic" label="hFE at Ic" defaultValue={values.ic ?? ""} placeholder={DEFAULT_HFE_IC} hint="hFE filter only" error={errors.ic} autoComplete="off" />
      {values.sort && <input type="hidden" name="sort" value={values.sort} />}
      {values.dir && <input type="hidden" name="dir" value={values.dir} />}
      {values.pageSize && <input type="hidden" name="pageSize" value={values.pageSize} />}
      <div className="flex gap-2 lg:col-span-7">
        <Button type="submit" variant="secondary">
          Apply filters
        </Button>
        <LinkButton href="/parts" variant="ghost">
          Clear
        </LinkButton>
      </div>
    </form>
  );
}
