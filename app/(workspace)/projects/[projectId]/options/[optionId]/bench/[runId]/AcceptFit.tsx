"use client";
import { useState } from "react";
import { Button, FormMessage, Panel } from "@/components/ui";
import { ApiError, fetchJson } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";

interface Fittable {
  id: string;
  label: string;
  path: string;
  value: number;
  previous: number;
  outsideBand: boolean;
}

const kw = (v: number) => `${Number(v.toPrecision(4))} K/W`;

/** Reviewer only: write the chosen fitted resistances into a new revision of the option. */
export function AcceptFit({ optionId, runId, revision, latestRevision, parts }: { optionId: string; runId: string; revision: number; latestRevision: number; parts: Fittable[] }) {
  const afterChange = useAfterChange();
  const [chosen, setChosen] = useState<Set<string>>(() => new Set(parts.filter((p) => p.outsideBand).map((p) => p.id)));
  const [msg, setMsg] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  if (parts.length === 0) return null;

  async function accept() {
    setBusy(true);
    try {
      const r = await fetchJson<{ revision: { revision: number } }>(`/api/v1/options/${optionId}/bench/${runId}/accept`, { method: "POST", body: { parts: [...chosen] } });
      setMsg({ tone: "success", text: `Saved as revision ${r.revision.revision}.` });
      await afterChange();
    } catch (e) {
      setMsg({ tone: "error", text: e instanceof ApiError ? [e.message, ...e.issues.map((i) => i.message)].join(" ") : "Could not save." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <Panel title="Accept the fit" description={`Writes the chosen values into a new revision based on revision ${revision}${latestRevision !== revision ? ` (the option is at ${latestRevision}: this will be refused)` : ""}.`}>
      <fieldset className="grid gap-2">
        <legend className="sr-only">Parts</legend>
        {parts.map((p) => (
          <label key={p.id} className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={chosen.has(p.id)} onChange={(e) => setChosen((s) => { const n = new Set(s); if (e.target.checked) n.add(p.id); else n.delete(p.id); return n; })} />
            <span className="font-medium">{p.label}</span>
            <span className="font-mono text-ink-soft">{p.path.split(".").pop()}: {kw(p.previous)} → {kw(p.value)}</span>
          </label>
        ))}
      </fieldset>
      <div className="mt-4 flex items-center gap-3">
        <Button onClick={accept} disabled={busy || chosen.size === 0}>{busy ? "Saving…" : "Save as new revision"}</Button>
      </div>
      {msg && <FormMessage className="mt-3" tone={msg.tone} message={msg.text} />}
    </Panel>
  );
}
