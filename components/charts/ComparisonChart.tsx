"use client";

import { ResponsiveBar, type BarTooltipProps } from "@nivo/bar";
import { formatSi } from "@/lib/format";
import { CHART_THEME } from "@/lib/palette";

/** One option: its margins to the derated limits, K (negative = over). */
export type ComparisonRow = { option: string; label: string; controllerMargin: number; hottestMargin: number; hottestPart: string };

const SERIES = {
  controllerMargin: { label: "Controller margin", colour: "#b8652f" },
  hottestMargin: { label: "Tightest part margin", colour: "#36456b" },
} as const;
type SeriesKey = keyof typeof SERIES;

function Tip({ id, value, data }: BarTooltipProps<ComparisonRow>) {
  const key = id as SeriesKey;
  return (
    <div className="rounded-md border border-paper-line bg-paper-raised px-3 py-2 text-xs shadow-lift">
      <p className="font-semibold text-ink">{data.label}</p>
      <p className="mt-1">
        {SERIES[key].label}
        {key === "hottestMargin" ? ` (${data.hottestPart})` : ""}: <span className="font-mono">{formatSi(value, "K", 3)}</span>
      </p>
    </div>
  );
}

/**
 * Margins side by side: for each option, how far the controller and the
 * tightest part sit below their derated limits. A bar below zero is over.
 */
export default function ComparisonChart({ rows, title }: { rows: readonly ComparisonRow[]; title: string }) {
  const values = rows.flatMap((r) => [r.controllerMargin, r.hottestMargin]).filter(Number.isFinite);
  const min = Math.min(0, ...values);
  return (
    <figure aria-label={title} data-chart="comparison" data-bars={rows.length} className="h-[300px] w-full">
      <ResponsiveBar<ComparisonRow>
        data={rows as ComparisonRow[]}
        keys={Object.keys(SERIES)}
        indexBy="option"
        groupMode="grouped"
        layout="vertical"
        margin={{ top: 12, right: 16, bottom: 56, left: 64 }}
        padding={0.28}
        innerPadding={3}
        valueScale={{ type: "linear", min, nice: true }}
        colors={({ id }) => SERIES[id as SeriesKey].colour}
        borderRadius={2}
        enableLabel={false}
        enableGridY
        theme={CHART_THEME}
        axisBottom={{ tickSize: 0, tickPadding: 8, format: (v) => rows.find((r) => r.option === v)?.label ?? String(v) }}
        axisLeft={{
          tickSize: 4,
          tickPadding: 4,
          tickValues: 5,
          format: (v) => formatSi(Number(v), "K", 2),
          legend: "Margin to derated limit (K)",
          legendPosition: "middle",
          legendOffset: -52,
        }}
        markers={[{ axis: "y", value: 0, lineStyle: { stroke: "#8e2a20", strokeWidth: 1.5 } }]}
        tooltip={Tip}
        animate={false}
        role="img"
        ariaLabel={title}
      />
      <figcaption className="mt-1 flex flex-wrap gap-4 text-xs text-ink-soft">
        {Object.values(SERIES).map((s) => (
          <span key={s.label} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block size-2.5 rounded-sm" style={{ background: s.colour }} />
            {s.label}
          </span>
        ))}
      </figcaption>
    </figure>
  );
}
