import type { Metadata } from "next";
import { requirePageMember } from "@/app/_lib/access";
import { isPartKind } from "@/lib/parts/kinds";
import { Caution, PageHeader } from "@/components/ui";
import { PartForm } from "../_components/PartForm";
import { emptyFormValues } from "../_components/formValues";

export const metadata: Metadata = { title: "New part" };

export default async function NewPartPage({ searchParams }: { searchParams: Promise<{ kind?: string }> }) {
  await requirePageMember("part:write");
  const { kind } = await searchParams;
  return (
    <>
      <PageHeader
        title="New part"
        subtitle='Type figures as the datasheet prints them, with their unit ("47 nC", "4.7 mΩ", "62 K/W"); they are stored in SI.'
        back={{ href: "/parts", label: "Parts library" }}
      />
      <PartForm initial={emptyFormValues(isPartKind(kind) ? kind : "mosfet")} />
      <Caution className="mt-8" />
    </>
  );
}
