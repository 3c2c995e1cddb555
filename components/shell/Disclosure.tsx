"use client";

import { useEffect, useRef, type ReactNode } from "react";

export interface DisclosureProps {
  /** Content of the <summary>: the button that opens the panel. */
  summary: ReactNode;
  summaryClassName?: string;
  className?: string;
  children: ReactNode;
}

/**
 * A <details> menu that works without JavaScript and, once hydrated, also
 * closes on Escape (focus back to its button) and on a click elsewhere.
 */
export function Disclosure({ summary, summaryClassName, className, children }: DisclosureProps) {
  const ref = useRef<HTMLDetailsElement>(null);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape" && el.open) {
        el.open = false;
        el.querySelector("summary")?.focus();
      }
    };
    const onPointer = (e: PointerEvent) => {
      if (el.open && e.target instanceof Node && !el.contains(e.target)) el.open = false;
    };
    document.addEventListener("keydown", onKey);
    document.addEventListener("pointerdown", onPointer);
    return () => {
      document.removeEventListener("keydown", onKey);
      document.removeEventListener("pointerdown", onPointer);
    };
  }, []);
  return (
    <details ref={ref} className={className}>
      <summary className={summaryClassName}>{summary}</summary>
      {children}
    </details>
  );
}
