import Link from "next/link";
import type { OptionListItem } from "@/db/queries/options";
import { EmptyState, LinkButton, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { DuplicateButton } from "./DuplicateButton";

export function OptionsTable({ projectId, options, canWrite }: { projectId: string; options: OptionListItem[]; canWrite: boolean }) {
  if (options.length === 0)
    return (
      <div className="p-5">
        <EmptyState title="No design options yet">{canWrite ? "Add one below, starting from a template." : "A designer adds the options to compare."}</EmptyState>
      </div>
    );
  return (
    <Table caption="Design options" captionHidden className="rounded-none border-0">
      <THead>
        <tr>
          <Th>Option</Th>
          <Th>Summary</Th>
          <Th numeric>Revision</Th>
          <Th>Last saved</Th>
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </THead>
      <TBody>
        {options.map((o) => (
          <Tr key={o.id}>
            <Td>
              <Link href={`/projects/${projectId}/options/${o.id}`} className="font-medium text-ink hover:text-copper-700">
                {o.name}
              </Link>
            </Td>
            <Td className="max-w-md text-ink-soft">{o.summary}</Td>
            <Td numeric>rev {o.latestRevision}</Td>
            <Td className="whitespace-nowrap text-ink-soft">
              {o.savedAt && <time dateTime={o.savedAt}>{o.savedAt.slice(0, 16).replace("T", " ")}</time>}
              {o.savedByName && <span> · {o.savedByName}</span>}
            </Td>
            <Td className="whitespace-nowrap">
              <div className="flex justify-end gap-2">
                <LinkButton size="sm" href={`/projects/${projectId}/options/${o.id}/budget`}>
                  Budget
                </LinkButton>
                {canWrite && <DuplicateButton optionId={o.id} optionName={o.name} />}
              </div>
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
