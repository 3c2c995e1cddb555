import type { ReactNode } from "react";
import type { ActionState } from "@/lib/action-state";
import { cx } from "./cx";

export type FormMessageTone = "success" | "error";

export interface FormMessageProps {
  /** Required unless `state` is given. */
  tone?: FormMessageTone;
  /** A server action's state: tone from `ok`, text from `message`. */
  state?: ActionState | null;
  /** Nothing renders when both message and children are empty. */
  message?: string | null;
  children?: ReactNode;
  className?: string;
}

/**
 * Banner for the outcome of a form action. Errors are announced at once
 * (role="alert"); successes politely (role="status").
 */
export function FormMessage({ tone, state, message, children, className }: FormMessageProps) {
  const body = children ?? message ?? state?.message;
  if (body === undefined || body === null || body === "") return null;
  const error = (tone ?? (state && !state.ok ? "error" : "success")) === "error";
  return (
    <div
      role={error ? "alert" : "status"}
      className={cx(
        "flex items-start gap-3 rounded-md border-l-4 px-4 py-3 text-sm",
        error ? "border-alarm-500 bg-alarm-50 text-alarm-700" : "border-verdigris-500 bg-verdigris-50 text-verdigris-700",
        className,
      )}
    >
      <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 size-4 shrink-0">
        {error ? (
          <>
            <rect x="1.5" y="1.5" width="13" height="13" rx="3" fill="currentColor" />
            <path d="M5.5 5.5l5 5m0-5-5 5" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
          </>
        ) : (
          <>
            <rect x="1.5" y="1.5" width="13" height="13" rx="3" fill="currentColor" />
            <path d="M4.8 8.3l2.2 2.2 4.2-4.6" fill="none" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
          </>
        )}
      </svg>
      <div className="min-w-0">
        <span className="sr-only">{error ? "Error: " : "Done: "}</span>
        {body}
      </div>
    </div>
  );
}
