import type { ReactNode } from "react";
import { STATUS_LABELS, StatusGlyph, type Status } from "./Badge";
import { cx } from "./cx";
import { formatSi } from "@/lib/format";

export interface MarginBarProps {
  /** Junction temperature at the corner shown, °C. */
  tj: number;
  /** Derated limit (Tj max less the company's derating margin), °C. */
  limit: number;
  /** Absolute maximum junction temperature from the datasheet, °C. */
  tjMax: number;
  /** Decided by the model's derating rule; the bar only draws it. */
  status: Status;
  /** Left end of the scale, °C: usually the ambient of that corner. */
  from?: number;
  /** Part or element the bar belongs to, e.g. "Q1 high side". */
  label?: ReactNode;
  className?: string;
}

const fill: Record<Status, string> = {
  ok: "bg-verdigris-500",
  close: "bg-amber-500",
  over: "bg-alarm-500",
};
const text: Record<Status, string> = {
  ok: "text-verdigris-700",
  close: "text-amber-700",
  over: "text-alarm-700",
};

const t = (v: number) => formatSi(v, "°C", 4);
const k = (v: number) => formatSi(Math.abs(v), "K", 3);

export interface MarginSummary {
  /** Size of the gap in kelvin (always positive); null without a temperature. */
  kelvin: number | null;
  relation: "below the derated limit" | "over the derated limit" | "above Tj max" | "no temperature";
}

/** Plain-words margin: headroom below the derated limit, or how far past it. */
export function marginSummary(tj: number, limit: number, tjMax: number): MarginSummary {
  if (!Number.isFinite(tj)) return { kelvin: null, relation: "no temperature" };
  if (tj > tjMax) return { kelvin: tj - tjMax, relation: "above Tj max" };
  const m = limit - tj;
  return m >= 0 ? { kelvin: m, relation: "below the derated limit" } : { kelvin: -m, relation: "over the derated limit" };
}

export function marginWords(tj: number, limit: number, tjMax: number): string {
  const { kelvin, relation } = marginSummary(tj, limit, tjMax);
  return kelvin === null ? relation : `${k(kelvin)} ${relation}`;
}

/**
 * Tj against the derated limit and Tj max. The track runs from `from` to a
 * little past the larger of Tj max and Tj; the stretch between the derated
 * limit and Tj max is hatched (the reserve the derating rule keeps back),
 * anything past Tj max is tinted red.
 */
export function MarginBar({ tj, limit, tjMax, status, from = 25, label, className }: MarginBarProps) {
  const top = Math.max(tjMax, Number.isFinite(tj) ? tj : tjMax);
  const lo = Math.min(from, limit, Number.isFinite(tj) ? tj : from);
  const span = top - lo || 1;
  const hi = top + span * 0.06;
  const pct = (v: number) => `${(Math.min(Math.max((v - lo) / (hi - lo), 0), 1) * 100).toFixed(2)}%`;
  const { kelvin, relation } = marginSummary(tj, limit, tjMax);

  return (
    <figure className={cx("min-w-0", className)}>
      <figcaption className="mb-1.5 flex flex-wrap items-baseline justify-between gap-x-4 gap-y-0.5 text-sm">
        <span className="flex min-w-0 items-baseline gap-2">
          {label && <span className="truncate font-medium text-ink">{label}</span>}
          <span className="font-mono text-ink tabular-nums">
            <span className="text-ink-soft">T</span>
            <sub className="text-ink-soft">j</sub> {Number.isFinite(tj) ? t(tj) : "\u2014"}
          </span>
        </span>
        <span className={cx("flex items-center gap-1.5 font-medium", text[status])}>
          <StatusGlyph status={status} />
          <span className="sr-only">{STATUS_LABELS[status]}: </span>
          <span>
            {kelvin !== null && <span className="font-mono tabular-nums">{k(kelvin)}</span>} {relation}
          </span>
        </span>
      </figcaption>

      <div aria-hidden="true" className="relative pt-4 pb-5">
        {/* derated limit label above the track, Tj max label below: they never collide */}
        <span
          className="absolute top-0 -translate-x-full pr-1 font-mono text-[0.6875rem] leading-none whitespace-nowrap text-ink-soft"
          style={{ left: pct(limit) }}
        >
          limit {t(limit)}
        </span>
        <div className="relative h-2.5 overflow-hidden rounded-sm bg-paper-sunk">
          <div className="hs-hatch absolute inset-y-0" style={{ left: pct(limit), width: `calc(${pct(tjMax)} - ${pct(limit)})` }} />
          <div className="absolute inset-y-0 right-0 bg-alarm-100" style={{ left: pct(tjMax) }} />
          {Number.isFinite(tj) && (
            <div className={cx("absolute inset-y-0 left-0 rounded-r-sm", fill[status])} style={{ width: pct(tj) }} />
          )}
        </div>
        <span className="absolute top-3 h-[1.125rem] w-0.5 -translate-x-1/2 bg-ink" style={{ left: pct(limit) }} />
        <span className="absolute top-3 h-[1.125rem] w-0.5 -translate-x-1/2 bg-alarm-700" style={{ left: pct(tjMax) }} />
        <span
          className="absolute bottom-0 -translate-x-full pr-1 font-mono text-[0.6875rem] leading-none whitespace-nowrap text-alarm-700"
          style={{ left: pct(tjMax) }}
        >
          max {t(tjMax)}
        </span>
      </div>
      <p className="sr-only">
        Derated limit {t(limit)}, Tj max {t(tjMax)}.
      </p>
    </figure>
  );
}
