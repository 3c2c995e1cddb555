import type { Metadata } from "next";
import { requirePageMember } from "@/app/_lib/access";
import { MAX_IMPORT_BYTES } from "@/lib/limits";
import { PageHeader } from "@/components/ui";
import { ImportWizard } from "../_components/ImportWizard";
import { CsvHelp } from "../_components/CsvHelp";

export const metadata: Metadata = { title: "Import parts" };

export default async function ImportPartsPage() {
  await requirePageMember("part:write");
  return (
    <>
      <PageHeader
        title="Import parts from CSV"
        subtitle="Choose a file: every row is checked and previewed; the import writes all rows or none."
        back={{ href: "/parts", label: "Parts library" }}
      />
      <div className="grid gap-10 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <ImportWizard maxBytes={MAX_IMPORT_BYTES} />
        <CsvHelp />
      </div>
    </>
  );
}
