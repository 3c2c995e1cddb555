import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";
import { cx } from "./cx";

/** zod's flattened field errors are string arrays; a single string works too. */
export type FieldError = string | readonly string[] | null | undefined;

export interface ControlA11y {
  id: string;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
}

export interface FieldProps {
  /** Control id; hint and error ids derive from it. */
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: FieldError;
  /** Shows "optional" beside the label (required is the usual case). */
  optional?: boolean;
  className?: string;
  /** Render the control with the ids and aria attributes it must carry. */
  children: (a11y: ControlA11y) => ReactNode;
}

function errorList(error: FieldError): string[] {
  if (!error) return [];
  return (typeof error === "string" ? [error] : [...error]).filter(Boolean);
}

/** Label, hint and field-level error around any control. */
export function Field({ id, label, hint, error, optional, className, children }: FieldProps) {
  const errors = errorList(error);
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = errors.length ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(" ") || undefined;
  return (
    <div className={cx("flex flex-col gap-1.5", className)}>
      <label htmlFor={id} className="flex items-baseline gap-2 text-sm font-medium text-ink">
        {label}
        {optional && <span className="text-xs font-normal text-ink-faint">optional</span>}
      </label>
      {children({ id, "aria-describedby": describedBy, "aria-invalid": errors.length ? true : undefined })}
      {hint && (
        <p id={hintId} className="text-xs text-ink-faint">
          {hint}
        </p>
      )}
      {errorId && (
        <p id={errorId} className="flex items-start gap-1.5 text-xs font-medium text-alarm-700">
          <svg aria-hidden="true" viewBox="0 0 12 12" className="mt-0.5 size-3 shrink-0">
            <rect x="1" y="1" width="10" height="10" rx="2" fill="currentColor" />
            <rect x="5.25" y="3" width="1.5" height="4" rx="0.5" fill="#fff" />
            <rect x="5.25" y="8" width="1.5" height="1.5" rx="0.5" fill="#fff" />
          </svg>
          <span>{errors.join(" ")}</span>
        </p>
      )}
    </div>
  );
}

const controlBase =
  "w-full rounded-md border bg-paper-raised text-sm text-ink placeholder:text-ink-faint " +
  "disabled:cursor-not-allowed disabled:bg-paper-sunk disabled:text-ink-faint";
const controlBorder = (invalid: boolean) =>
  invalid ? "border-alarm-500 ring-1 ring-alarm-500" : "border-paper-edge hover:border-ink-soft";

interface SharedProps {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: FieldError;
  optional?: boolean;
  /** Defaults to `field-${name}`; give one when a form repeats a name. */
  id?: string;
  fieldClassName?: string;
}

export interface TextInputProps extends SharedProps, Omit<InputHTMLAttributes<HTMLInputElement>, "name" | "id"> {
  /** Unit shown inside the box, right-aligned: "nC", "Ω", "°C". */
  unit?: ReactNode;
}

export function TextInput({ name, label, hint, error, optional, id, fieldClassName, unit, className, ...rest }: TextInputProps) {
  const controlId = id ?? `field-${name}`;
  const invalid = errorList(error).length > 0;
  const numeric = rest.inputMode === "decimal" || rest.inputMode === "numeric" || rest.type === "number";
  return (
    <Field id={controlId} label={label} hint={hint} error={error} optional={optional} className={fieldClassName}>
      {(a11y) => (
        <div className="relative">
          <input
            name={name}
            {...a11y}
            {...rest}
            className={cx(
              controlBase,
              controlBorder(invalid),
              "h-10 px-3",
              numeric && "font-mono tabular-nums",
              unit ? "pr-14" : undefined,
              className,
            )}
          />
          {unit && (
            <span
              aria-hidden="true"
              className="pointer-events-none absolute inset-y-0 right-0 flex items-center border-l border-paper-line px-2.5 font-mono text-xs text-ink-soft"
            >
              {unit}
            </span>
          )}
        </div>
      )}
    </Field>
  );
}

export interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

export interface SelectProps extends SharedProps, Omit<SelectHTMLAttributes<HTMLSelectElement>, "name" | "id"> {
  options?: readonly SelectOption[];
  /** First, empty choice, e.g. "Choose a driver". */
  placeholder?: string;
}

export function Select({ name, label, hint, error, optional, id, fieldClassName, options, placeholder, className, children, ...rest }: SelectProps) {
  const controlId = id ?? `field-${name}`;
  const invalid = errorList(error).length > 0;
  return (
    <Field id={controlId} label={label} hint={hint} error={error} optional={optional} className={fieldClassName}>
      {(a11y) => (
        <div className="relative">
          <select
            name={name}
            {...a11y}
            {...rest}
            className={cx(controlBase, controlBorder(invalid), "h-10 appearance-none pr-9 pl-3", className)}
          >
            {placeholder !== undefined && <option value="">{placeholder}</option>}
            {options?.map((o) => (
              <option key={o.value} value={o.value} disabled={o.disabled}>
                {o.label}
              </option>
            ))}
            {children}
          </select>
          <svg
            aria-hidden="true"
            viewBox="0 0 12 12"
            className="pointer-events-none absolute top-1/2 right-3 size-3 -translate-y-1/2 text-ink-soft"
          >
            <path d="M2 4.5 6 8.5l4-4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
        </div>
      )}
    </Field>
  );
}

export interface TextareaProps extends SharedProps, Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, "name" | "id"> {}

export function Textarea({ name, label, hint, error, optional, id, fieldClassName, className, rows = 4, ...rest }: TextareaProps) {
  const controlId = id ?? `field-${name}`;
  const invalid = errorList(error).length > 0;
  return (
    <Field id={controlId} label={label} hint={hint} error={error} optional={optional} className={fieldClassName}>
      {(a11y) => (
        <textarea
          name={name}
          rows={rows}
          {...a11y}
          {...rest}
          className={cx(controlBase, controlBorder(invalid), "px-3 py-2 leading-relaxed", className)}
        />
      )}
    </Field>
  );
}
