"use client";

import { useState } from "react";
import useSWR from "swr";
import { Button, Select } from "@/components/ui";
import { PART_KIND_LABELS } from "@/lib/parts/kinds";
import { partToModelBlock } from "@/lib/parts/modelBlock";
import type { PartRecord } from "@/db/queries/parts";
import { getJson } from "@/lib/api-client";
import { applyPartBlock, type PartSlot } from "@/lib/parts/slots";
import { useEditor } from "./EditorContext";

/** Parts offered per kind: the library's list limit (GET /api/v1/parts pageSize max). */
const PICKER_PAGE_SIZE = 100;

/**
 * Choose a library part for one element: its datasheet values are copied
 * into the document (so the revision stays self-contained) and the part id
 * is recorded in the revision's part references. The list loads only when
 * opened.
 */
export function PartPicker({ slot }: { slot: PartSlot }) {
  const ed = useEditor();
  const [open, setOpen] = useState(false);
  const [chosen, setChosen] = useState("");
  const key = open ? `/api/v1/parts?kind=${encodeURIComponent(slot.kind)}&pageSize=${PICKER_PAGE_SIZE}&sort=mpn` : null;
  const { data, error, isLoading } = useSWR<{ items: PartRecord[]; total: number }>(key, getJson);
  const linked = ed.partRefs[slot.ref];
  const current = slot.partNumberKey ? (ed.get(`${slot.target}.${slot.partNumberKey}`) as string | undefined) : undefined;

  function use() {
    const part = data?.items.find((p) => p.id === chosen);
    if (!part) return;
    ed.set(slot.target, applyPartBlock(slot, ed.get(slot.target), partToModelBlock(part)));
    ed.setPartRef(slot.ref, part.id);
    setOpen(false);
  }

  return (
    <div className="flex flex-wrap items-end gap-2 rounded-md border border-dashed border-paper-line bg-paper/60 px-3 py-2 text-sm">
      <p className="mr-auto text-ink-soft">
        <span className="font-medium text-ink">{slot.label}</span>
        {": "}
        {linked ? <span className="text-verdigris-700">library part {current ?? linked}</span> : current ? <span>{current} (values typed in)</span> : <span>values typed in</span>}
      </p>
      {!ed.readOnly && linked && (
        <Button size="sm" variant="ghost" onClick={() => ed.setPartRef(slot.ref, undefined)}>
          Unlink
        </Button>
      )}
      {!ed.readOnly && !open && (
        <Button size="sm" variant="secondary" onClick={() => setOpen(true)}>
          Choose from library
        </Button>
      )}
      {open && (
        <div className="flex w-full flex-wrap items-end gap-2">
          <Select
            id={`pick-${slot.ref.replace(/\./g, "-")}`}
            name=""
            label={`${PART_KIND_LABELS[slot.kind]} from the library`}
            value={chosen}
            onChange={(e) => setChosen(e.target.value)}
            placeholder={isLoading ? "Loading…" : data?.items.length ? "Choose a part" : "No parts of this kind yet"}
            options={(data?.items ?? []).map((p) => ({ value: p.id, label: `${p.mpn} — ${p.manufacturer}` }))}
            error={error ? "The parts library could not be loaded." : undefined}
            fieldClassName="min-w-64 flex-1"
          />
          <Button size="sm" disabled={!chosen} onClick={use}>
            Use this part
          </Button>
          <Button size="sm" variant="ghost" onClick={() => setOpen(false)}>
            Cancel
          </Button>
        </div>
      )}
    </div>
  );
}
