"use client";

import { ResponsiveHeatMap, type CustomLayerProps, type TooltipProps } from "@nivo/heatmap";
import { formatSi } from "@/lib/format";
import { CHART_THEME, RISE_RAMP } from "@/lib/palette";
import { centreScale, contourPath, rampInterpolator, thinTicks, type Point } from "./geometry";

export interface HeatmapAxis {
  /** Sweep axis key (fsw, qgScale, vin, ambient, rGate). */
  key: string;
  /** Axis title with its unit, e.g. "Switching frequency (kHz)". */
  title: string;
  /** Unit passed to formatSi for tick labels ("Hz", "×", "V", "°C", "Ω"). */
  unit: string;
  values: readonly number[];
}

export interface SweepHeatmapProps {
  x: HeatmapAxis;
  y: HeatmapAxis;
  /** z[row][col]: temperature rise of the chosen part, K; null = thermal runaway. */
  z: readonly (readonly (number | null)[])[];
  /** Polylines (in axis values) where the part reaches its derated limit. */
  contour: readonly (readonly Point[])[];
  designPoint?: Point | null;
  /** Name of the part whose rise is shown. */
  partLabel: string;
  title: string;
}

type Cell = { x: string; y: number | null; xv: number; yv: number };
type Serie = { id: string; data: Cell[] };

const interpolator = rampInterpolator(RISE_RAMP);
const RUNAWAY_FILL = "#1f2a30";

/** Series ids and x keys are indices, so two values printing alike never collide. */
export function heatmapSeries(x: HeatmapAxis, y: HeatmapAxis, z: SweepHeatmapProps["z"]): Serie[] {
  // First series is drawn at the top: put the largest y value there.
  const rows = y.values.map((yv, i) => ({ yv, i })).reverse();
  return rows.map(({ yv, i }) => ({
    id: `y${i}`,
    data: x.values.map((xv, j) => ({ x: `x${j}`, y: z[i]?.[j] ?? null, xv, yv })),
  }));
}

function index(key: string | number): number {
  return Number(String(key).slice(1));
}

function makeOverlay(props: SweepHeatmapProps) {
  return function LimitOverlay({ cells }: CustomLayerProps<Cell>) {
    const xCentres = new Map<number, number>();
    const yCentres = new Map<number, number>();
    for (const c of cells) {
      xCentres.set(index(c.data.x), c.x);
      yCentres.set(index(c.serieId), c.y);
    }
    if (xCentres.size !== props.x.values.length || yCentres.size !== props.y.values.length) return null;
    const mapX = centreScale(props.x.values, props.x.values.map((_, j) => xCentres.get(j)!));
    const mapY = centreScale(props.y.values, props.y.values.map((_, i) => yCentres.get(i)!));
    const d = contourPath(props.contour, mapX, mapY);
    const runaway = cells.filter((c) => c.value === null);
    const p = props.designPoint;
    return (
      <g pointerEvents="none">
        {runaway.map((c) => (
          <g key={c.id} transform={`translate(${c.x},${c.y})`}>
            <line x1={-c.width / 4} y1={-c.height / 4} x2={c.width / 4} y2={c.height / 4} stroke="#f5d3d0" strokeWidth={1.5} />
            <line x1={-c.width / 4} y1={c.height / 4} x2={c.width / 4} y2={-c.height / 4} stroke="#f5d3d0" strokeWidth={1.5} />
          </g>
        ))}
        {d && (
          <g data-layer="limit-contour">
            <path d={d} fill="none" stroke="#fffdf8" strokeWidth={5} strokeLinejoin="round" strokeLinecap="round" />
            <path d={d} fill="none" stroke="#1f2a30" strokeWidth={2} strokeDasharray="7 4" strokeLinejoin="round" strokeLinecap="round" />
          </g>
        )}
        {p && Number.isFinite(p.x) && Number.isFinite(p.y) && (
          <g data-layer="design-point" transform={`translate(${mapX(p.x)},${mapY(p.y)})`}>
            <circle r={9} fill="none" stroke="#fffdf8" strokeWidth={4} />
            <circle r={9} fill="none" stroke="#1f2a30" strokeWidth={2} />
            <path d="M-13 0H-6M6 0H13M0 -13V-6M0 6V13" stroke="#1f2a30" strokeWidth={2} />
          </g>
        )}
      </g>
    );
  };
}

/**
 * Thermal map: the rise of one part over two swept quantities, the limit
 * line (dashed) where it meets its derated Tj, runaway cells crossed out, and
 * the current design marked with a sight. Colour legend in K beneath.
 */
export default function SweepHeatmap(props: SweepHeatmapProps) {
  const { x, y, z, title, partLabel } = props;
  const data = heatmapSeries(x, y, z);
  const finite = z.flat().filter((v): v is number => v !== null && Number.isFinite(v));
  const min = finite.length ? Math.min(...finite) : 0;
  const max = finite.length ? Math.max(...finite) : 1;
  const xTicks = thinTicks(x.values.map((_, j) => `x${j}`), 8);
  const yTicks = thinTicks(y.values.map((_, i) => `y${i}`), 8);
  const fmtX = (k: string | number) => formatSi(x.values[index(k)], x.unit, 3);
  const fmtY = (k: string | number) => formatSi(y.values[index(k)], y.unit, 3);

  function Tip({ cell }: TooltipProps<Cell>) {
    return (
      <div className="rounded-md border border-paper-line bg-paper-raised px-3 py-2 text-xs shadow-lift">
        <p className="font-mono text-ink-soft">
          {formatSi(cell.data.xv, x.unit)} · {formatSi(cell.data.yv, y.unit)}
        </p>
        <p className="mt-0.5 font-medium text-ink">
          {cell.value === null ? "Thermal runaway: no steady temperature" : `${partLabel} rise ${formatSi(cell.value, "K", 3)}`}
        </p>
      </div>
    );
  }

  return (
    <figure aria-label={title} data-chart="sweep-heatmap" data-rows={y.values.length} data-cols={x.values.length} className="h-[440px] w-full">
      <ResponsiveHeatMap<Cell, Record<string, never>>
        data={data as never}
        margin={{ top: 12, right: 96, bottom: 64, left: 88 }}
        valueFormat={(v) => formatSi(v, "K", 3)}
        colors={{ type: "sequential", interpolator, minValue: min, maxValue: max === min ? min + 1 : max }}
        emptyColor={RUNAWAY_FILL}
        enableLabels={false}
        xInnerPadding={0.04}
        yInnerPadding={0.04}
        borderRadius={1}
        axisTop={null}
        axisRight={null}
        axisBottom={{
          tickSize: 4,
          tickPadding: 4,
          tickValues: xTicks,
          format: fmtX,
          legend: x.title,
          legendPosition: "middle",
          legendOffset: 44,
        }}
        axisLeft={{
          tickSize: 4,
          tickPadding: 4,
          tickValues: yTicks,
          format: fmtY,
          legend: y.title,
          legendPosition: "middle",
          legendOffset: -74,
        }}
        legends={[
          {
            anchor: "right",
            translateX: 36,
            translateY: 0,
            length: 260,
            thickness: 10,
            direction: "column",
            tickPosition: "after",
            tickSize: 3,
            tickSpacing: 4,
            tickOverlap: false,
            tickFormat: (v: number) => formatSi(v, "K", 2),
            title: "Rise (K)",
            titleAlign: "start",
            titleOffset: 4,
          },
        ]}
        theme={CHART_THEME}
        hoverTarget="cell"
        tooltip={Tip}
        layers={["grid", "axes", "cells", makeOverlay(props), "legends"]}
        animate={false}
        role="img"
        ariaLabel={title}
      />
    </figure>
  );
}
