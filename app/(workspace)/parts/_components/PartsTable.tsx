"use client";

import Link from "next/link";
import useSWR from "swr";
import { Badge, Button, Table, TBody, Td, Th, THead, Tr, type SortDirection } from "@/components/ui";
import { PART_KIND_LABELS } from "@/lib/parts/kinds";
import { ApiError, fetchJson, getJson } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";
import type { PartPage } from "@/db/queries/parts";
import { paramText, summaryOf } from "./summary";

export interface PartsTableProps {
  /** "/api/v1/parts?..." for the same filter as the page: SWR refreshes the rows from it. */
  apiKey: string;
  initial: PartPage;
  sortHrefs: Record<string, string>;
  sorted: { key: string; dir: SortDirection } | null;
  param: { key: string; label: string } | null;
  canWrite: boolean;
}

export function PartsTable({ apiKey, initial, sortHrefs, sorted, param, canWrite }: PartsTableProps) {
  const { data } = useSWR<PartPage>(apiKey, getJson, { fallbackData: initial, revalidateOnMount: false });
  const afterChange = useAfterChange();
  const page = data ?? initial;
  const th = (key: string, label: string, numeric = false) => (
    <Th numeric={numeric} sortHref={sortHrefs[key]} sorted={sorted?.key === key ? sorted.dir : undefined}>
      {label}
    </Th>
  );
  async function remove(id: string, mpn: string) {
    if (!window.confirm(`Delete ${mpn} from the library?`)) return;
    try {
      await fetchJson(`/api/v1/parts/${id}`, { method: "DELETE" });
    } catch (e) {
      if (!(e instanceof ApiError && e.status === 404)) return; // gone already is as good as deleted
    }
    await afterChange({ revalidate: [apiKey], page: false });
  }
  return (
    <Table caption={`Parts (${page.total})`}>
      <THead>
        <tr>
          {th("mpn", "Part number")}
          {th("manufacturer", "Manufacturer")}
          {th("kind", "Kind")}
          <Th>Key figures</Th>
          {param && th("param", param.label, true)}
          {th("unitCost", "Unit cost", true)}
          <Th>Datasheet</Th>
          {th("updatedAt", "Updated", true)}
          {canWrite && <Th><span className="sr-only">Actions</span></Th>}
        </tr>
      </THead>
      <TBody>
        {page.items.map((p) => (
          <Tr key={p.id}>
            <Td>
              <Link href={`/parts/${p.id}`} className="font-mono font-medium text-ink hover:text-copper-700">
                {p.mpn}
              </Link>
              {p.description && <p className="max-w-xs truncate text-xs text-ink-faint">{p.description}</p>}
            </Td>
            <Td>{p.manufacturer}</Td>
            <Td>
              <Badge>{PART_KIND_LABELS[p.kind]}</Badge>
            </Td>
            <Td>
              <ul className="flex flex-wrap gap-x-3 gap-y-0.5 text-xs">
                {summaryOf(p.kind, p.params).map((s) => (
                  <li key={s.label}>
                    <span className="text-ink-faint">{s.label}</span> <span className="font-mono tabular-nums">{s.text}</span>
                  </li>
                ))}
              </ul>
            </Td>
            {param && <Td numeric>{paramText(p.kind, p.params, param.key)}</Td>}
            <Td numeric>{p.unitCost === null ? "—" : `${p.unitCost.toFixed(p.unitCost < 1 ? 3 : 2)} USD`}</Td>
            <Td>{p.datasheet ? <a className="text-copper-700 underline" href={`/api/v1/parts/${p.id}/datasheet`}>PDF</a> : <span className="text-ink-faint">—</span>}</Td>
            <Td numeric>{p.updatedAt.slice(0, 10)}</Td>
            {canWrite && (
              <Td>
                <Button size="sm" variant="ghost" onClick={() => remove(p.id, p.mpn)} aria-label={`Delete ${p.mpn}`}>
                  Delete
                </Button>
              </Td>
            )}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
