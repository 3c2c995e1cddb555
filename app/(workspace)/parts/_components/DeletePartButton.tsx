"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button, FormMessage } from "@/components/ui";

/** Deletes the part (and its datasheet) after a confirmation, then returns to the library. */
export function DeletePartButton({ partId, mpn }: { partId: string; mpn: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (!window.confirm(`Delete ${mpn} from the library? Design options that copied it keep their copy.`)) return;
    const res = await fetch(`/api/v1/parts/${partId}`, { method: "DELETE" });
    if (!res.ok) {
      const json = (await res.json().catch(() => ({}))) as { error?: { message: string } };
      return setError(json.error?.message ?? "The part could not be deleted.");
    }
    router.push("/parts");
    router.refresh();
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
