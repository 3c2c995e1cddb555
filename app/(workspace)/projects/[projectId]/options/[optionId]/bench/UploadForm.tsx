"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, FormMessage, Select } from "@/components/ui";
import type { ApiIssue } from "@/lib/api-client";

/** Posts the CSV as multipart to the bench route; row-level refusals are listed as sent back. */
export function UploadForm({ optionId, revisions }: { optionId: string; revisions: number[] }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string; issues: ApiIssue[] } | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    try {
      const res = await fetch(`/api/v1/options/${optionId}/bench`, { method: "POST", body: new FormData(e.currentTarget), credentials: "same-origin" });
      const data = await res.json().catch(() => ({}));
      if (!res.ok) setMessage({ tone: "error", text: data?.error?.message ?? `The server answered ${res.status}.`, issues: data?.error?.issues ?? [] });
      else {
        setMessage({ tone: "success", text: `Stored ${data.run.rowCount} readings.`, issues: [] });
        router.push(`${window.location.pathname}/${data.run.id}`);
      }
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
