"use client";

import { useState } from "react";
import { Button, FormMessage, Select, TextInput, Textarea } from "@/components/ui";
import { PART_KINDS, PART_KIND_LABELS, type PartKind } from "@/lib/parts/kinds";
import { partBodySchema } from "@/lib/parts/schema";
import { ApiError, fetchJson, issuesByPath } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";
import { ParamFields } from "./ParamFields";
import { QuantityField } from "./QuantityField";
import { normaliseCost } from "./normalise";

export interface PartFormValues {
  kind: PartKind;
  manufacturer: string;
  mpn: string;
  description: string;
  unitCost: string;
  params: Record<string, string>;
  tolerance: Record<string, string>;
}

export interface PartFormProps {
  /** Absent: a new part (POST); present: PATCH this part. */
  partId?: string;
  initial: PartFormValues;
}

/** Create or edit a part; checked in the browser with the server's schema, then sent to /api/v1/parts. */
export function PartForm({ partId, initial }: PartFormProps) {
  const afterChange = useAfterChange();
  const [v, setV] = useState<PartFormValues>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const clear = (key: string) => setErrors((e) => (key in e ? Object.fromEntries(Object.entries(e).filter(([k]) => k !== key)) : e));
  const set = <K extends keyof PartFormValues>(key: K, value: PartFormValues[K], errorKey: string = key) => {
    setV((old) => ({ ...old, [key]: value }));
    clear(errorKey);
  };

  const setIn = (group: "params" | "tolerance", key: string, text: string) => {
    setV((old) => ({ ...old, [group]: { ...old[group], [key]: text } }));
    clear(`${group}.${key}`);
  };

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setMessage(null);
    const body = { ...v, unitCost: v.unitCost || null };
    const local = partBodySchema.safeParse(body);
    if (!local.success) {
      setErrors(issuesByPath(local.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }))));
      setMessage({ tone: "error", text: "Check the highlighted fields." });
      return;
    }
    setBusy(true);
    try {
      const { part } = await fetchJson<{ part: { id: string } }>(partId ? `/api/v1/parts/${partId}` : "/api/v1/parts", { method: partId ? "PATCH" : "POST", body });
      setErrors({});
      if (partId) setMessage({ tone: "success", text: "Saved." });
      await afterChange(partId ? {} : { goTo: `/parts/${part.id}` });
    } catch (e) {
      setErrors(issuesByPath(e instanceof ApiError ? e.issues : []));
      setMessage({ tone: "error", text: e instanceof Error ? e.message : "The part could not be saved." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      {message && <FormMessage tone={message.tone} message={message.text} />}
      {errors.form && <FormMessage tone="error" message={errors.form} />}
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <Select
          name="kind"
          label="Kind"
          value={v.kind}
          error={errors.kind}
          options={PART_KINDS.map((k) => ({ value: k, label: PART_KIND_LABELS[k] }))}
          onChange={(e) => setV((old) => ({ ...old, kind: e.target.value as PartKind, params: {}, tolerance: {} }))}
        />
        <TextInput name="manufacturer" label="Manufacturer" value={v.manufacturer} error={errors.manufacturer} onChange={(e) => set("manufacturer", e.target.value)} />
        <TextInput name="mpn" label="Part number" value={v.mpn} error={errors.mpn} autoComplete="off" spellCheck={false} onChange={(e) => set("mpn", e.target.value)} />
        <QuantityField name="unitCost" label="Unit cost" unit="USD" optional value={v.unitCost} error={errors.unitCost} normalise={normaliseCost} onChange={(t) => set("unitCost", t, "unitCost")} placeholder="e.g. 0.42" />
        <Textarea name="description" label="Description" optional rows={2} value={v.description} error={errors.description} fieldClassName="sm:col-span-2" onChange={(e) => set("description", e.target.value)} />
      </div>
      <ParamFields
        kind={v.kind}
        params={v.params}
        tolerance={v.tolerance}
        errors={errors}
        onParam={(key, text) => setIn("params", key, text)}
        onTolerance={(key, text) => setIn("tolerance", key, text)}
      />
      <div className="flex gap-3">
        <Button type="submit" variant="primary" disabled={busy}>
          {busy ? "Saving…" : partId ? "Save part" : "Add part"}
        </Button>
      </div>
    </form>
  );
}
