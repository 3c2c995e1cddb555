"use client";

import { Select, TextInput } from "@/components/ui";
import { useEditor } from "./EditorContext";
import { QuantityInput } from "./QuantityInput";
import type { EditorField } from "./fields";

const fieldId = (path: string) => `doc-${path.replace(/[^A-Za-z0-9]+/g, "-")}`;

/** One field of the document at `path`, of any descriptor type. */
export function DocField({ path, field }: { path: string; field: EditorField }) {
  const ed = useEditor();
  const value = ed.get(path);
  const issue = ed.issues[path];
  const common = { id: fieldId(path), label: field.label, hint: field.hint, optional: !field.required };
  if (field.type === "qty")
    return <QuantityInput {...common} dim={field.dim} value={value} issue={issue} readOnly={ed.readOnly} onCommit={(v) => ed.set(path, v)} />;
  if (field.type === "enum")
    return (
      <Select
        {...common}
        name=""
        value={typeof value === "string" ? value : ""}
        disabled={ed.readOnly}
        error={issue}
        placeholder={field.required ? undefined : "Default"}
        options={field.options.map((o) => ({ value: o, label: o }))}
        onChange={(e) => ed.set(path, e.target.value === "" ? undefined : e.target.value)}
      />
    );
  if (field.type === "int")
    return (
      <TextInput
        {...common}
        name=""
        inputMode="numeric"
        defaultValue={value === undefined ? "" : String(value)}
        key={String(value)}
        readOnly={ed.readOnly}
        error={issue}
        onBlur={(e) => {
          const t = e.target.value.trim();
          const n = Number(t);
          ed.set(path, t === "" ? undefined : Number.isInteger(n) ? n : t);
        }}
      />
    );
  return (
    <TextInput
      {...common}
      name=""
      defaultValue={typeof value === "string" ? value : ""}
      key={typeof value === "string" ? value : ""}
      readOnly={ed.readOnly}
      error={issue}
      onBlur={(e) => {
        const t = e.target.value.trim();
        if (t !== (value ?? "")) ed.set(path, t === "" ? undefined : t);
      }}
    />
  );
}

/** The fields of one block, laid out in a responsive grid. */
export function FieldGrid({ base, fields }: { base: string; fields: EditorField[] }) {
  return (
    <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 xl:grid-cols-3">
      {fields.map((f) => (
        <DocField key={f.key} path={base ? `${base}.${f.key}` : f.key} field={f} />
      ))}
    </div>
  );
}
