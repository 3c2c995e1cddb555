"use client";

import { useState } from "react";
import Link from "next/link";
import { Button, FormMessage, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import type { ImportPreview } from "@/services/parts/import";
import { fetchJson } from "@/lib/api-client";

type State =
  | { step: "choose" }
  | { step: "preview"; file: File; text: string; preview: ImportPreview }
  | { step: "done"; created: number; updated: number };

const post = <T,>(url: string, csv: string) => fetchJson<T>(url, { method: "POST", csv });

/** Upload -> preview (every row checked, every problem listed) -> commit all rows or none. */
export function ImportWizard({ maxBytes }: { maxBytes: number }) {
  const [state, setState] = useState<State>({ step: "choose" });
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function preview(file: File) {
    setError(null);
    if (file.size > maxBytes) return setError(`That file is larger than ${maxBytes / (1024 * 1024)} MB.`);
    setBusy(true);
    try {
      const text = await file.text();
      setState({ step: "preview", file, text, preview: await post<ImportPreview>("/api/v1/parts/import/preview", text) });
    } catch (e) {
      setError(e instanceof Error ? e.message : "The file could not be read.");
    } finally {
      setBusy(false);
    }
  }

  async function commit(text: string) {
    setBusy(true);
    setError(null);
    try {
      const r = await post<{ created: number; updated: number }>("/api/v1/parts/import/commit", text);
      setState({ step: "done", created: r.created, updated: r.updated });
    } catch (e) {
      setError(e instanceof Error ? e.message : "Nothing was imported.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-4">
      <label className="flex flex-col gap-1.5 text-sm font-medium text-ink">
        CSV file
        <input
          type="file"
          name="file"
          accept=".csv,text/csv"
          disabled={busy}
          className="text-sm text-ink-soft"
          onChange={(e) => {
            const f = e.target.files?.[0];
            if (f) void preview(f);
          }}
        />
      </label>
      {error && <FormMessage tone="error" message={error} />}
      {state.step === "done" && (
        <FormMessage tone="success">
          Imported: {state.created} new, {state.updated} updated.{" "}
          <Link href="/parts" className="underline">Open the parts library</Link>
        </FormMessage>
      )}
      {state.step === "preview" && <PreviewView state={state} busy={busy} onCommit={() => commit(state.text)} />}
    </div>
  );
}

function PreviewView({ state, busy, onCommit }: { state: Extract<State, { step: "preview" }>; busy: boolean; onCommit: () => void }) {
  const p = state.preview;
  const clean = p.issues.length === 0 && p.valid > 0;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink" role="status">
        {state.file.name}: {p.total} rows, {p.valid} valid ({p.create} new, {p.update} to update), {p.issues.length} problem{p.issues.length === 1 ? "" : "s"}.
      </p>
      {p.issues.length > 0 && (
        <Table caption={`Problems (${p.issues.length}): fix them in the file and choose it again; nothing is imported until every row is valid`} dense>
          <THead>
            <tr>
              <Th numeric>Row</Th>
              <Th>Column</Th>
              <Th>Problem</Th>
            </tr>
          </THead>
          <TBody>
            {p.issues.map((i, n) => (
              <Tr key={n}>
                <Td numeric>{i.row || "file"}</Td>
                <Td className="font-mono">{i.column || "—"}</Td>
                <Td>{i.message}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
      <Button variant="primary" disabled={!clean || busy} onClick={onCommit} className="self-start">
        {busy ? "Importing…" : `Import all ${p.valid} parts`}
      </Button>
      {p.rows.length > 0 && (
        <Table caption="Rows that passed the checks" dense>
          <THead>
            <tr>
              <Th numeric>Row</Th>
              <Th>Part number</Th>
              <Th>Manufacturer</Th>
              <Th>Kind</Th>
              <Th>Action</Th>
            </tr>
          </THead>
          <TBody>
            {p.rows.map((r) => (
              <Tr key={r.row}>
                <Td numeric>{r.row}</Td>
                <Td className="font-mono">{r.mpn}</Td>
                <Td>{r.manufacturer}</Td>
                <Td>{r.kind}</Td>
                <Td>{r.action === "create" ? "new" : "update"}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}
