"use client";

import { useRef, useState } from "react";
import { fetchJson } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";
import { Button, FormMessage } from "@/components/ui";

export interface DatasheetPanelProps {
  partId: string;
  datasheet: { filename: string; sizeBytes: number } | null;
  canWrite: boolean;
  maxBytes: number;
}

function size(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`;
}

/** Download, upload or replace the part's datasheet PDF (checked by content on the server). */
export function DatasheetPanel({ partId, datasheet, canWrite, maxBytes }: DatasheetPanelProps) {
  const afterChange = useAfterChange();
  const input = useRef<HTMLInputElement>(null);
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload() {
    const file = input.current?.files?.[0];
    if (!file) return setMessage({ tone: "error", text: "Choose a PDF first." });
    if (file.size > maxBytes) return setMessage({ tone: "error", text: `That file is ${size(file.size)}; the limit is ${size(maxBytes)}.` });
    setBusy(true);
    setMessage(null);
    try {
      const form = new FormData();
      form.append("file", file);
      await fetchJson(`/api/v1/parts/${partId}/datasheet`, { method: "POST", form });
      setMessage({ tone: "success", text: "Datasheet stored." });
      if (input.current) input.current.value = "";
      await afterChange();
    } catch (e) {
      setMessage({ tone: "error", text: e instanceof Error ? e.message : "The upload failed." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="datasheet-heading" className="flex flex-col gap-3 rounded-panel border border-paper-line bg-paper-raised p-4">
      <h2 id="datasheet-heading" className="text-sm font-semibold text-ink">Datasheet</h2>
      {datasheet ? (
        <p className="text-sm">
          <a href={`/api/v1/parts/${partId}/datasheet`} className="font-medium text-copper-700 underline hover:text-copper-900">
            Download {datasheet.filename}
          </a>{" "}
          <span className="text-ink-faint">({size(datasheet.sizeBytes)})</span>
        </p>
      ) : (
        <p className="text-sm text-ink-faint">No datasheet stored.</p>
      )}
      {canWrite && (
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex flex-col gap-1 text-sm font-medium text-ink">
            {datasheet ? "Replace with a PDF" : "Upload a PDF"}
            <input ref={input} type="file" name="file" accept="application/pdf,.pdf" className="text-sm text-ink-soft" />
          </label>
          <Button onClick={upload} disabled={busy} variant="secondary">
            {busy ? "Uploading…" : "Upload"}
          </Button>
          <p className="w-full text-xs text-ink-faint">PDF only, up to {size(maxBytes)}.</p>
        </div>
      )}
      {message && <FormMessage tone={message.tone} message={message.text} />}
    </section>
  );
}
