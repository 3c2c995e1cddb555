import type { ReactNode } from "react";
import type { Role } from "@/lib/roles";
import { cx } from "./cx";

export type BadgeTone = "neutral" | "copper" | "info" | "ok" | "close" | "over";

const tones: Record<BadgeTone, string> = {
  neutral: "border-paper-line bg-paper-sunk text-ink-soft",
  copper: "border-copper-100 bg-copper-50 text-copper-700",
  info: "border-slateblue-100 bg-slateblue-50 text-slateblue-700",
  ok: "border-verdigris-100 bg-verdigris-50 text-verdigris-700",
  close: "border-amber-100 bg-amber-50 text-amber-700",
  over: "border-alarm-100 bg-alarm-50 text-alarm-700",
};

export interface BadgeProps {
  tone?: BadgeTone;
  className?: string;
  children: ReactNode;
}

export function Badge({ tone = "neutral", className, children }: BadgeProps) {
  return (
    <span
      className={cx(
        "inline-flex items-center gap-1.5 rounded-full border px-2 py-0.5 text-xs leading-4 font-medium whitespace-nowrap",
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  designer: "Designer",
  reviewer: "Reviewer",
  manager: "Manager",
  viewer: "Viewer",
};

export function RoleBadge({ role, className }: { role: Role; className?: string }) {
  return (
    <Badge tone={role === "admin" ? "copper" : "neutral"} className={cx("uppercase tracking-wider", className)}>
      {ROLE_LABELS[role]}
    </Badge>
  );
}

export type Status = "ok" | "close" | "over";

export const STATUS_LABELS: Record<Status, string> = {
  ok: "Within limit",
  close: "Near limit",
  over: "Over limit",
};

/**
 * Shape as well as colour tells the status apart (a ring, a half-filled
 * ring, a solid square), so it survives greyscale print and colour-blindness.
 */
export function StatusGlyph({ status, className }: { status: Status; className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 10 10" className={cx("size-2.5 shrink-0", className)}>
      {status === "ok" && <circle cx="5" cy="5" r="3.6" fill="none" stroke="currentColor" strokeWidth="1.8" />}
      {status === "close" && (
        <>
          <circle cx="5" cy="5" r="3.6" fill="none" stroke="currentColor" strokeWidth="1.8" />
          <path d="M5 1.4a3.6 3.6 0 0 1 0 7.2z" fill="currentColor" />
        </>
      )}
      {status === "over" && <rect x="1" y="1" width="8" height="8" rx="1.5" fill="currentColor" />}
    </svg>
  );
}

export function StatusBadge({ status, children, className }: { status: Status; children?: ReactNode; className?: string }) {
  return (
    <Badge tone={status} className={className}>
      <StatusGlyph status={status} />
      {children ?? STATUS_LABELS[status]}
    </Badge>
  );
}
