"use client";

import { useState } from "react";
import { TextInput } from "@/components/ui";
import { DIMENSIONS, formatQuantity, parseQuantity, type Dimension } from "@/models/input/units";

/** Digits kept when a typed value is rewritten in canonical form ("0.0068 kΩ" -> "6.8 Ω"). */
const NORMALISE_DIGITS = 6;

export function displayQuantity(value: unknown, dim: Dimension): string {
  if (typeof value === "number") return formatQuantity(value, dim, NORMALISE_DIGITS);
  if (typeof value === "string") return value;
  return "";
}

/**
 * A unit-aware field: type "47 nC" or "0.047 µC"; on leaving the field the
 * text is parsed (models/units) and rewritten canonically. A value of the
 * wrong dimension ("47 nF" for a charge) or no unit is refused here and the
 * document keeps its previous value. Clearing an optional field removes it.
 */
export function QuantityInput({
  id,
  label,
  dim,
  value,
  issue,
  hint,
  optional,
  readOnly,
  onCommit,
}: {
  id: string;
  label: string;
  dim: Dimension;
  value: unknown;
  issue?: string;
  hint?: string;
  optional?: boolean;
  readOnly?: boolean;
  onCommit: (value: string | number | undefined) => void;
}) {
  const shown = displayQuantity(value, dim);
  const [text, setText] = useState(shown);
  const [refused, setRefused] = useState<string | null>(null);
  const [focused, setFocused] = useState(false);
  // Outside editing, the field follows the document (a revision loaded, an undo, its own commit).
  const [synced, setSynced] = useState({ shown, focused });
  if (synced.shown !== shown || synced.focused !== focused) {
    setSynced({ shown, focused });
    if (!focused) setText(shown);
  }

  function commit() {
    setFocused(false);
    if (text === shown) return setRefused(null);
    if (text.trim() === "") {
      setRefused(null);
      return onCommit(undefined);
    }
    try {
      const si = parseQuantity(text, dim);
      const canonical = dim === "ratio" ? si : formatQuantity(si, dim, NORMALISE_DIGITS);
      setRefused(null);
      setText(typeof canonical === "number" ? String(canonical) : canonical);
      onCommit(canonical);
    } catch (e) {
      setRefused(`${(e as Error).message}; not applied`);
    }
  }

  return (
    <TextInput
      id={id}
      name=""
      label={label}
      value={text}
      readOnly={readOnly}
      placeholder={`e.g. ${DIMENSIONS[dim].example}`}
      hint={hint}
      optional={optional}
      error={refused ?? issue}
      onFocus={() => setFocused(true)}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === "Enter") (e.target as HTMLInputElement).blur();
      }}
      autoComplete="off"
      spellCheck={false}
      className="font-mono"
      data-dim={dim}
    />
  );
}
