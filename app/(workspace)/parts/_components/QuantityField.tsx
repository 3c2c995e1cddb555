"use client";

import { useState } from "react";
import { TextInput, type FieldError } from "@/components/ui";
import type { Normalised } from "./normalise";

export interface QuantityFieldProps {
  name: string;
  label: string;
  value: string;
  onChange: (text: string) => void;
  /** Parses the typed text; runs on blur. */
  normalise: (text: string) => Normalised;
  /** Error from the last submit (server or full-record check). */
  error?: FieldError;
  hint?: string;
  placeholder?: string;
  optional?: boolean;
  unit?: string;
}

/**
 * A unit-aware text field: the user types "0.047 µC", sees "47 nC" when the
 * field loses focus, and a value of the wrong dimension is refused right
 * here with the parser's message.
 */
export function QuantityField({ name, label, value, onChange, normalise, error, hint, placeholder, optional, unit }: QuantityFieldProps) {
  const [blurError, setBlurError] = useState<string | null>(null);
  return (
    <TextInput
      name={name}
      label={label}
      value={value}
      hint={hint}
      placeholder={placeholder}
      optional={optional}
      unit={unit}
      autoComplete="off"
      spellCheck={false}
      error={blurError ?? error}
      onChange={(e) => {
        onChange(e.target.value);
        if (blurError) setBlurError(null);
      }}
      onBlur={() => {
        const r = normalise(value);
        if (r.ok) {
          setBlurError(null);
          if (r.text !== value) onChange(r.text);
        } else setBlurError(r.message);
      }}
    />
  );
}
