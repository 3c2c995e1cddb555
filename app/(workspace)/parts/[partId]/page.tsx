import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { PART_KIND_DEFS, PART_KIND_LABELS, TOLERANCE_LABELS, type ToleranceKey } from "@/lib/parts/kinds";
import { formatParamValue } from "@/lib/parts/paramText";
import { getAt } from "@/models/documentPath";
import { MAX_DATASHEET_BYTES } from "@/lib/limits";
import { getPartById } from "@/db/queries/parts";
import { Badge, Caution, PageHeader } from "@/components/ui";
import { partParamsSchema } from "@/lib/parts/schema";
import { PartForm } from "../_components/PartForm";
import { formValuesOf } from "../_components/formValues";
import { DatasheetPanel } from "../_components/DatasheetPanel";
import { DeletePartButton } from "../_components/DeletePartButton";

export const metadata: Metadata = { title: "Part" };

export default async function PartPage({ params }: { params: Promise<{ partId: string }> }) {
  const member = await requirePageMember("read");
  const p = partParamsSchema.safeParse(await params);
  if (!p.success) notFound();
  const part = await getPartById({ workspaceId: member.workspace.id, id: p.data.partId });
  if (!part) notFound(); // another workspace's part is not found either
  const canWrite = can(member.role, "part:write");
  const fields = PART_KIND_DEFS[part.kind].fields;
  return (
    <>
      <PageHeader
        title={<span className="font-mono">{part.mpn}</span>}
        subtitle={`${part.manufacturer}${part.description ? ` · ${part.description}` : ""}`}
        meta={<Badge>{PART_KIND_LABELS[part.kind]}</Badge>}
        back={{ href: "/parts", label: "Parts library" }}
      />
      <div className="grid gap-8 lg:grid-cols-[1fr_18rem]">
        <div>
          {canWrite ? (
            <PartForm partId={part.id} initial={formValuesOf(part)} />
          ) : (
            <dl className="grid gap-x-6 gap-y-2 rounded-panel border border-paper-line bg-paper-raised p-4 text-sm sm:grid-cols-2">
              {fields.map((f) => (
                <div key={f.key} className="flex justify-between gap-4 border-b border-paper-line py-1">
                  <dt className="text-ink-soft">{f.label}</dt>
                  <dd className="font-mono tabular-nums">{formatParamValue(f, getAt(part.params, f.key))}</dd>
                </div>
              ))}
              {Object.entries(part.tolerance).map(([k, v]) => (
                <div key={k} className="flex justify-between gap-4 border-b border-paper-line py-1">
                  <dt className="text-ink-soft">{TOLERANCE_LABELS[k as ToleranceKey]}</dt>
                  <dd className="font-mono tabular-nums">±{Number((v * 100).toPrecision(3))} %</dd>
                </div>
              ))}
              <div className="flex justify-between gap-4 py-1">
                <dt className="text-ink-soft">Unit cost</dt>
                <dd className="font-mono tabular-nums">{part.unitCost === null ? "—" : `${part.unitCost} USD`}</dd>
              </div>
            </dl>
          )}
        </div>
        <aside className="flex flex-col gap-4">
          <DatasheetPanel partId={part.id} datasheet={part.datasheet} canWrite={canWrite} maxBytes={MAX_DATASHEET_BYTES} />
          {canWrite && <DeletePartButton partId={part.id} mpn={part.mpn} />}
          <p className="text-xs text-ink-faint">Figures left empty take the model&apos;s documented defaults when a design option uses this part.</p>
        </aside>
      </div>
      <Caution className="mt-8" />
    </>
  );
}
