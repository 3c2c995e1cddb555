"use client";
import { useState } from "react";
import { Button, FormMessage, Select } from "@/components/ui";
import { ApiError, fetchJson, type ApiIssue } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";

/** Posts the CSV as multipart to the bench route; row-level refusals are listed as sent back. */
export function UploadForm({ optionId, revisions }: { optionId: string; revisions: number[] }) {
  const afterChange = useAfterChange();
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string; issues: ApiIssue[] } | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    try {
      const { run } = await fetchJson<{ run: { id: string; rowCount: number } }>(`/api/v1/options/${optionId}/bench`, { method: "POST", form: new FormData(e.currentTarget) });
      setMessage({ tone: "success", text: `Stored ${run.rowCount} readings.`, issues: [] });
      await afterChange({ goTo: `${window.location.pathname}/${run.id}` });
    } catch (err) {
      setMessage({ tone: "error", text: err instanceof Error ? err.message : "The upload failed.", issues: err instanceof ApiError ? err.issues : [] });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="grid max-w-xl gap-4">
      <Select name="revision" label="Measured against revision" defaultValue={String(revisions[0] ?? 1)} options={revisions.map((r) => ({ value: String(r), label: `Revision ${r}` }))} />
      <label className="grid gap-1 text-sm font-medium text-ink">
        CSV file
        <input name="file" type="file" accept=".csv,text/csv" required className="text-sm font-normal" />
      </label>
      <div>
        <Button type="submit" disabled={busy}>{busy ? "Checking…" : "Upload and compare"}</Button>
      </div>
      {message && (
        <FormMessage tone={message.tone} message={message.text}>
          {message.issues.length > 0 && (
            <span className="grid gap-1">
              <span>{message.text}</span>
              <ul className="list-disc pl-5">
                {message.issues.slice(0, 50).map((i, k) => <li key={k}>{i.message}</li>)}
              </ul>
            </span>
          )}
        </FormMessage>
      )}
    </form>
  );
}
