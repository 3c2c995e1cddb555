"use client";

import { Button } from "@/components/ui";
import { useEditor } from "./EditorContext";
import { QuantityInput } from "./QuantityInput";
import type { ColumnDef } from "./fields";

/**
 * An editable table over an array of the document (corners, waveform
 * points, hFE points, couplings). Cells use the same unit-aware fields as
 * the blocks; labels are visually hidden, the column header names them.
 */
export function RowsTable({ path, columns, caption, newRow, minRows = 0 }: { path: string; columns: ColumnDef[]; caption: string; newRow: () => Record<string, unknown>; minRows?: number }) {
  const ed = useEditor();
  const rows = (ed.get(path) as Record<string, unknown>[] | undefined) ?? [];
  const arrayIssue = ed.issues[path];
  return (
    <div className="overflow-x-auto">
      <table className="w-auto border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" className="px-1.5 pb-1 text-left text-xs font-semibold text-ink-soft">
                {c.label}
              </th>
            ))}
            <th scope="col">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => (
            <tr key={i} className="align-top [&_label]:sr-only">
              {columns.map((c) => {
                const cellPath = `${path}.${i}.${c.key}`;
                const label = `${caption} row ${i + 1} ${c.label}`;
                return (
                  <td key={c.key} className="min-w-28 px-1.5 py-1">
                    {c.type === "qty" && c.dim ? (
                      <QuantityInput id={`doc-${cellPath.replace(/\./g, "-")}`} label={label} dim={c.dim} value={row?.[c.key]} issue={ed.issues[cellPath]} readOnly={ed.readOnly} onCommit={(v) => ed.set(cellPath, v)} />
                    ) : (
                      <TextCell path={cellPath} label={label} value={row?.[c.key]} />
                    )}
                  </td>
                );
              })}
              <td className="px-1.5 py-1">
                {!ed.readOnly && rows.length > minRows && (
                  <Button size="sm" variant="ghost" aria-label={`Remove ${caption} row ${i + 1}`} onClick={() => ed.set(path, rows.filter((_, j) => j !== i))}>
                    ×
                  </Button>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {arrayIssue && <p className="mt-1 text-xs font-medium text-alarm-700">{arrayIssue}</p>}
      {!ed.readOnly && (
        <Button size="sm" variant="secondary" className="mt-2" onClick={() => ed.set(path, [...rows, newRow()])}>
          Add row
        </Button>
      )}
    </div>
  );
}

function TextCell({ path, label, value }: { path: string; label: string; value: unknown }) {
  const ed = useEditor();
  const id = `doc-${path.replace(/\./g, "-")}`;
  const issue = ed.issues[path];
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        key={String(value ?? "")}
        defaultValue={typeof value === "string" ? value : ""}
        readOnly={ed.readOnly}
        aria-invalid={issue ? true : undefined}
        className="h-10 w-full rounded-md border border-paper-edge bg-paper-raised px-2 font-mono text-sm aria-invalid:border-alarm-500"
        onBlur={(e) => {
          const t = e.target.value.trim();
          if (t !== (value ?? "")) ed.set(path, t === "" ? undefined : t);
        }}
      />
      {issue && <p className="text-xs text-alarm-700">{issue}</p>}
    </div>
  );
}
