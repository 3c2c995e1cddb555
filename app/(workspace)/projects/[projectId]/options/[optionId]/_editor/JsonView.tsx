"use client";

import { useState } from "react";
import { Button, FormMessage } from "@/components/ui";

/**
 * The raw design document, for power users: edit the JSON and apply it to
 * the editor. Nothing is saved until "Save revision"; issues appear as in
 * the diagram view.
 */
export function JsonView({ doc, readOnly, onApply }: { doc: unknown; readOnly: boolean; onApply: (doc: unknown) => void }) {
  const [text, setText] = useState(() => JSON.stringify(doc, null, 2));
  const [error, setError] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-3">
      <label htmlFor="document-json" className="text-sm font-medium text-ink">
        Design document (JSON)
      </label>
      <textarea
        id="document-json"
        value={text}
        readOnly={readOnly}
        onChange={(e) => setText(e.target.value)}
        spellCheck={false}
        rows={28}
        className="w-full rounded-md border border-paper-edge bg-paper-raised p-3 font-mono text-xs leading-relaxed text-ink"
      />
      {error && <FormMessage tone="error" message={error} />}
      {!readOnly && (
        <div className="flex gap-2">
          <Button
            onClick={() => {
              try {
                onApply(JSON.parse(text));
                setError(null);
              } catch (e) {
                setError(`Not valid JSON: ${(e as Error).message}`);
              }
            }}
          >
            Apply JSON to the editor
          </Button>
          <Button variant="ghost" onClick={() => (setText(JSON.stringify(doc, null, 2)), setError(null))}>
            Reset to the editor&apos;s document
          </Button>
        </div>
      )}
    </div>
  );
}
