"use client";

import { useState } from "react";
import useSWR from "swr";
import { Badge, Button, LinkButton, PageHeader, TextInput } from "@/components/ui";
import type { OptionRecord } from "@/db/queries/options";
import { optionPatchSchema } from "@/lib/options/schema";
import { fetchJson, getJson } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";

type OptionResponse = { option: OptionRecord };

/** Title with optimistic rename, and the option's actions (budget, duplicate). */
export function OptionHeader({ option: initial, projectName, canWrite, dirty }: { option: OptionRecord; projectName: string; canWrite: boolean; dirty: boolean }) {
  const key = `/api/v1/options/${initial.id}`;
  const { data, mutate } = useSWR<OptionResponse>(key, getJson, { fallbackData: { option: initial }, revalidateOnMount: false, revalidateOnFocus: false });
  const option = data?.option ?? initial;
  const [renaming, setRenaming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [duplicating, setDuplicating] = useState(false);
  const afterChange = useAfterChange();

  async function rename(name: string) {
    const parsed = optionPatchSchema.safeParse({ name });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Check the name.");
    setRenaming(false);
    setError(null);
    try {
      await mutate(fetchJson<OptionResponse>(key, { method: "PATCH", body: { name } }), {
        optimisticData: (cur) => ({ option: { ...(cur?.option ?? option), name: parsed.data.name ?? option.name } }),
        rollbackOnError: true,
        populateCache: (r, cur) => ({ ...cur, option: r.option }),
        revalidate: false,
      });
    } catch (e) {
      setError(`Not renamed: ${(e as Error).message}`);
    }
  }

  async function duplicate() {
    if (dirty && !window.confirm("The copy starts from the latest saved revision; your unsaved edits stay here. Duplicate?")) return;
    setDuplicating(true);
    try {
      const r = await fetchJson<OptionResponse>(`/api/v1/options/${option.id}/duplicate`, { method: "POST", body: {} });
      await afterChange({ goTo: `/projects/${option.projectId}/options/${r.option.id}` });
    } catch (e) {
      setError(`Not duplicated: ${(e as Error).message}`);
      setDuplicating(false);
    }
  }

  const title = renaming ? (
    <form
      className="flex items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        void rename(String(new FormData(e.currentTarget).get("name") ?? ""));
      }}
    >
      <TextInput name="name" id="option-name" label="Option name" defaultValue={option.name} autoFocus error={error} />
      <Button type="submit" size="sm">Rename</Button>
      <Button size="sm" variant="ghost" onClick={() => (setRenaming(false), setError(null))}>Cancel</Button>
    </form>
  ) : (
    option.name
  );
  return (
    <>
      <PageHeader
        title={title}
        subtitle={option.summary || undefined}
        back={{ href: `/projects/${option.projectId}`, label: projectName }}
        meta={<Badge tone="info">rev {option.latestRevision}</Badge>}
        actions={
          <>
            <LinkButton href={`/projects/${option.projectId}/options/${option.id}/budget`}>Budget</LinkButton>
            <LinkButton href={`/projects/${option.projectId}/options/${option.id}/review`}>Review</LinkButton>
            <LinkButton href={`/projects/${option.projectId}/compare`}>Compare options</LinkButton>
            {canWrite && !renaming && (
              <Button variant="secondary" onClick={() => setRenaming(true)}>
                Rename
              </Button>
            )}
            {canWrite && (
              <Button variant="secondary" onClick={duplicate} disabled={duplicating}>
                {duplicating ? "Duplicating…" : "Duplicate option"}
              </Button>
            )}
          </>
        }
      />
      {error && !renaming && (
        <p role="alert" className="-mt-4 mb-4 text-sm text-alarm-700">
          {error}
        </p>
      )}
    </>
  );
}
