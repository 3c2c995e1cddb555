"use client";

import { useState } from "react";
import { fetchJson } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";
import { Button, FormMessage } from "@/components/ui";

/** Deletes the part (and its datasheet) after a confirmation, then returns to the library. */
export function DeletePartButton({ partId, mpn }: { partId: string; mpn: string }) {
  const afterChange = useAfterChange();
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (!window.confirm(`Delete ${mpn} from the library? Design options that copied it keep their copy.`)) return;
    try {
      await fetchJson(`/api/v1/parts/${partId}`, { method: "DELETE" });
    } catch (e) {
      return setError(e instanceof Error ? e.message : "The part could not be deleted.");
    }
    await afterChange({ goTo: "/parts" });
  }
  return (
    <div className="flex flex-col gap-2">
      <Button variant="danger" onClick={remove}>
        Delete part
      </Button>
      {error && <FormMessage tone="error" message={error} />}
    </div>
  );
}
