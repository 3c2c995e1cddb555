import { cx } from "./cx";
import { siParts } from "@/lib/format";

export interface QuantityProps {
  /** In base SI units (C, W, s, Ω); temperatures in °C, differences in K. */
  value: number;
  unit: string;
  /** Significant figures; 3 by default. */
  digits?: number;
  /** Heavier figures for the headline number of a card. */
  strong?: boolean;
  className?: string;
}

/**
 * A number with its unit in tabular monospace: "47 nC", "1.32 W",
 * "104.6 °C". The machine-readable value rides along in <data value>.
 */
export function Quantity({ value, unit, digits = 3, strong, className }: QuantityProps) {
  const { mantissa, prefix } = siParts(value, unit, digits);
  const symbol = prefix + unit;
  return (
    <data
      value={Number.isFinite(value) ? String(value) : ""}
      className={cx("font-mono tabular-nums whitespace-nowrap", strong ? "font-medium text-ink" : undefined, className)}
    >
      {mantissa}
      {symbol && (
        <>
          {"\u00a0"}
          <span className="text-[0.92em] text-ink-soft">{symbol}</span>
        </>
      )}
    </data>
  );
}
