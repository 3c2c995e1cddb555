import Link from "next/link";
import type { OptionComparison } from "@/models/compare";
import type { DriveChainBill } from "@/components/budget/bill";
import { Quantity, Table, TBody, Td, Th, THead, Tr, formatSi } from "@/components/ui";

export const MIN_COMPARED = 2;
export const MAX_COMPARED = 5;

type Row = { label: string; figure: string; cell: (r: OptionComparison) => React.ReactNode };

const dash = <span className="text-ink-faint">—</span>;

function part(p: OptionComparison["controller"], what: "tj" | "margin") {
  if (!p) return dash;
  if (p.runaway) return <span className="text-alarm-700">runaway</span>;
  const v = what === "tj" ? p.tj : p.margin;
  return v === null ? dash : <Quantity value={v} unit={what === "tj" ? "°C" : "K"} digits={what === "tj" ? 4 : 3} className={what === "margin" && v < 0 ? "text-alarm-700" : undefined} />;
}

/** Options as columns, figures as rows: read across to compare, down to see one option. */
export function LineUp({ projectId, rows, bills, chosenId }: { projectId: string; rows: OptionComparison[]; bills: Record<string, DriveChainBill>; chosenId?: string }) {
  const lines: Row[] = [
    { label: "Controller Tj (worst corner)", figure: "controller-tj", cell: (r) => part(r.controller, "tj") },
    { label: "Controller margin", figure: "controller-margin", cell: (r) => part(r.controller, "margin") },
    { label: "Hottest part", figure: "hottest", cell: (r) => (r.hottest ? <span>{r.hottest.partId} · {part(r.hottest, "tj")}</span> : dash) },
    { label: "Tightest margin", figure: "tightest", cell: (r) => (r.tightest ? <span>{r.tightest.partId} · {part(r.tightest, "margin")}</span> : dash) },
    { label: "Total loss (worst corner)", figure: "total-loss", cell: (r) => <Quantity value={r.totalLoss} unit="W" /> },
    { label: "Efficiency (lowest corner)", figure: "efficiency", cell: (r) => (r.efficiency === null ? dash : <Quantity value={r.efficiency * 100} unit="%" digits={4} />) },
    { label: "Parts in the drive chain", figure: "part-count", cell: (r) => <span className="font-mono">{r.partCount ?? "—"}</span> },
    {
      label: "Drive-chain cost",
      figure: "cost",
      cell: (r) => (
        <span title={bills[r.id]?.missingCost.length ? `no cost given for: ${bills[r.id].missingCost.join(", ")}` : undefined}>
          {r.cost === null ? dash : `${r.cost.toFixed(2)}\u00a0USD`}
          {bills[r.id]?.missingCost.length ? <span className="ml-1 text-xs text-amber-700">+{bills[r.id].missingCost.length} unpriced</span> : null}
        </span>
      ),
    },
    {
      label: "Heat moved out of the controller vs baseline",
      figure: "controller-delta",
      cell: (r) =>
        r.isBaseline ? (
          <span className="text-ink-faint">baseline</span>
        ) : r.vsBaseline ? (
          <span>
            {formatSi(-r.vsBaseline.controllerPowerDelta, "W", 3)}
            {r.vsBaseline.controllerTjDelta !== null && <span className="text-ink-soft"> · Tj {formatSi(r.vsBaseline.controllerTjDelta, "K", 3)}</span>}
          </span>
        ) : (
          dash
        ),
    },
    { label: "Warnings (errors)", figure: "warnings", cell: (r) => <span className="font-mono">{r.warnings.total} ({r.warnings.errors})</span> },
  ];
  return (
    <Table caption="Options side by side" captionHidden className="rounded-none border-0">
      <THead>
        <tr>
          <Th>Figure</Th>
          {rows.map((r) => (
            <Th key={r.id} numeric data-option={r.id}>
              <Link href={`/projects/${projectId}/options/${r.id}/budget`} className="hover:text-copper-700">
                {r.name}
              </Link>
              {r.id === chosenId && <span className="ml-1 text-verdigris-700">✓</span>}
            </Th>
          ))}
        </tr>
      </THead>
      <TBody>
        {lines.map((l) => (
          <Tr key={l.figure} data-line={l.figure}>
            <Th scope="row" className="font-medium text-ink">
              {l.label}
            </Th>
            {rows.map((r) => (
              <Td key={r.id} numeric>
                {l.cell(r)}
              </Td>
            ))}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
