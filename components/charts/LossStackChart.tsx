"use client";

import { ResponsiveBar, type BarTooltipProps } from "@nivo/bar";
import { formatSi } from "@/lib/format";
import { CHART_THEME, MECHANISM_COLOURS, MECHANISM_LABELS, type LossMechanism } from "@/lib/palette";

/** One bar: a part and its loss by mechanism, W. */
export type LossBarRow = { part: string; label: string; total: number } & Partial<Record<LossMechanism, number>>;

export interface LossStackChartProps {
  rows: readonly LossBarRow[];
  /** Mechanisms that carry loss in at least one row, in stacking order. */
  keys: readonly LossMechanism[];
  /** Accessible summary, e.g. "Loss by part at corner Low line". */
  title: string;
}

const ROW_HEIGHT = 34;

function Tip({ id, value, color, data }: BarTooltipProps<LossBarRow>) {
  const mech = id as LossMechanism;
  return (
    <div className="rounded-md border border-paper-line bg-paper-raised px-3 py-2 text-xs shadow-lift">
      <p className="font-semibold text-ink">{data.label}</p>
      <p className="mt-1 flex items-center gap-2">
        <span aria-hidden="true" className="inline-block size-2.5 rounded-sm" style={{ background: color }} />
        {MECHANISM_LABELS[mech] ?? String(id)}
        <span className="ml-auto pl-3 font-mono">{formatSi(value, "W")}</span>
      </p>
      <p className="mt-0.5 text-ink-faint">
        of <span className="font-mono">{formatSi(data.total, "W")}</span> in this part
      </p>
    </div>
  );
}

/**
 * Where the watts go: one horizontal bar per part, stacked by loss
 * mechanism. Parts read top to bottom in the order given (the budget lists
 * the controller first, then the drive chain, then the switches).
 */
export default function LossStackChart({ rows, keys, title }: LossStackChartProps) {
  // nivo draws the first index at the bottom of a horizontal chart; reverse
  // so the list reads like the table below it.
  const data = [...rows].reverse() as LossBarRow[];
  const height = Math.max(160, rows.length * ROW_HEIGHT + 90);
  const labels = new Map(rows.map((r) => [r.part, r.label]));
  return (
    <figure aria-label={title} data-chart="loss-stack" data-bars={rows.length} style={{ height }} className="w-full">
      <ResponsiveBar<LossBarRow>
        data={data}
        keys={keys as string[]}
        indexBy="part"
        layout="horizontal"
        groupMode="stacked"
        margin={{ top: 8, right: 24, bottom: 48, left: 172 }}
        padding={0.32}
        valueScale={{ type: "linear", min: 0, nice: true }}
        colors={({ id }) => MECHANISM_COLOURS[id as LossMechanism] ?? "#8f8676"}
        borderRadius={2}
        enableLabel={false}
        enableGridX
        enableGridY={false}
        theme={CHART_THEME}
        axisLeft={{ tickSize: 0, tickPadding: 8, format: (v) => truncate(labels.get(String(v)) ?? String(v), 24) }}
        axisBottom={{
          tickSize: 4,
          tickPadding: 4,
          tickValues: 5,
          format: (v) => formatSi(Number(v), "W", 2),
          legend: "Loss (W)",
          legendPosition: "middle",
          legendOffset: 36,
        }}
        tooltip={Tip}
        animate={false}
        role="img"
        ariaLabel={title}
        barAriaLabel={(d) => `${labels.get(String(d.indexValue))}: ${MECHANISM_LABELS[d.id as LossMechanism]} ${formatSi(d.value ?? 0, "W")}`}
      />
    </figure>
  );
}

function truncate(s: string, n: number): string {
  return s.length > n ? `${s.slice(0, n - 1)}…` : s;
}
