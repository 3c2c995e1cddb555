"use client";

import { useFormStatus } from "react-dom";
import { Button, type ButtonProps } from "./Button";

export interface SubmitButtonProps extends Omit<ButtonProps, "type"> {
  /** Label while the enclosing form's action runs, e.g. "Saving…". */
  pendingLabel?: string;
}

/**
 * Submit button for a form with a server action: it reports the pending
 * state to assistive technology (aria-disabled, not disabled, so focus stays)
 * and ignores repeat clicks while the action runs.
 */
export function SubmitButton({ pendingLabel, children, onClick, ...rest }: SubmitButtonProps) {
  const { pending } = useFormStatus();
  return (
    <Button
      type="submit"
      aria-disabled={pending || undefined}
      onClick={(event) => {
        if (pending) event.preventDefault();
        else onClick?.(event);
      }}
      {...rest}
    >
      {pending && (
        <span
          aria-hidden="true"
          className="inline-block size-3.5 animate-spin rounded-full border-2 border-current border-r-transparent"
        />
      )}
      {pending && pendingLabel ? pendingLabel : children}
    </Button>
  );
}
