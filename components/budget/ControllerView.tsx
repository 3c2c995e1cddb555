import type { Evaluation } from "@/models/evaluate";
import { MarginBar, Quantity, StatusBadge, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { MECHANISM_COLOURS } from "@/lib/palette";
import { controllerByCorner, type ControllerSplit } from "./shape";

export interface OptionControllerSummary {
  optionId: string;
  name: string;
  current: boolean;
  /** The controller at its worst corner for that option; null when the option did not evaluate. */
  worst: ControllerSplit | null;
  href: string;
}

function SplitBar({ c, scale }: { c: ControllerSplit; scale: number }) {
  const pct = (w: number) => `${((w / scale) * 100).toFixed(2)}%`;
  return (
    <div aria-hidden="true" className="flex h-2.5 w-full overflow-hidden rounded-sm bg-paper-sunk">
      <div style={{ width: pct(c.quiescent), background: MECHANISM_COLOURS.quiescent }} />
      <div style={{ width: pct(c.gateDrive), background: MECHANISM_COLOURS.gateDrive }} />
      <div style={{ width: pct(c.other), background: "#8f8676" }} />
    </div>
  );
}

/**
 * The controller first: its Tj at every corner, its loss split into the
 * quiescent supply (Vcc·Iq) and the gate drive burnt in its own output pin,
 * and the same figures for every option of the project, so the heat a
 * buffer or driver IC takes off the controller is visible.
 */
export function ControllerView({ evaluation, options }: { evaluation: Evaluation; options: readonly OptionControllerSummary[] }) {
  const rows = controllerByCorner(evaluation);
  if (rows.length === 0) return <p className="text-sm text-ink-soft">This design has no controller part.</p>;
  const scale = Math.max(...rows.map((r) => r.total), ...options.map((o) => o.worst?.total ?? 0), 1e-9);
  return (
    <div className="flex flex-col gap-5">
      <ul className="flex flex-col gap-4" aria-label="Controller at every corner">
        {rows.map((r) => (
          <li key={r.cornerId} data-controller-corner={r.cornerId} className="grid gap-2 md:grid-cols-[1fr_16rem] md:items-end md:gap-6">
            {r.tj !== null && r.limit !== null && r.tjMax !== null && r.status ? (
              <MarginBar label={r.cornerLabel} tj={r.tj} limit={r.limit} tjMax={r.tjMax} status={r.status} from={r.ambient} />
            ) : (
              <p className="text-sm">
                <span className="font-medium">{r.cornerLabel}</span> <span className="text-alarm-700">thermal runaway: no steady temperature</span>
              </p>
            )}
            <div className="pb-5">
              <SplitBar c={r} scale={scale} />
              <p className="mt-1 flex justify-between gap-2 text-xs text-ink-soft">
                <span>
                  Iq <Quantity value={r.quiescent} unit="W" />
                </span>
                <span>
                  pin <Quantity value={r.gateDrive} unit="W" />
                </span>
                <span data-figure="controller-total">
                  Σ <Quantity value={r.total} unit="W" strong />
                </span>
              </p>
            </div>
          </li>
        ))}
      </ul>
      {options.length > 1 && (
        <Table caption="What each option of this project does to the controller (its worst corner)" dense>
          <THead>
            <tr>
              <Th>Option</Th>
              <Th numeric>Quiescent</Th>
              <Th numeric>Gate drive in the pin</Th>
              <Th numeric>
                Controller T<sub>j</sub>
              </Th>
              <Th numeric>Margin</Th>
              <Th>Status</Th>
            </tr>
          </THead>
          <TBody>
            {options.map((o) => (
              <Tr key={o.optionId} className={o.current ? "bg-copper-50/60" : undefined}>
                <Td>
                  <a href={o.href} className="font-medium hover:text-copper-700">
                    {o.name}
                  </a>
                  {o.current && <span className="ml-2 text-xs text-ink-faint">(this option)</span>}
                </Td>
                {o.worst ? (
                  <>
                    <Td numeric>
                      <Quantity value={o.worst.quiescent} unit="W" />
                    </Td>
                    <Td numeric>
                      <Quantity value={o.worst.gateDrive} unit="W" />
                    </Td>
                    <Td numeric>{o.worst.tj !== null ? <Quantity value={o.worst.tj} unit="°C" digits={4} /> : "runaway"}</Td>
                    <Td numeric>{o.worst.margin !== null ? <Quantity value={o.worst.margin} unit="K" /> : "—"}</Td>
                    <Td>{o.worst.status && <StatusBadge status={o.worst.status} />}</Td>
                  </>
                ) : (
                  <Td colSpan={5} className="text-ink-soft">
                    The latest revision does not evaluate; open it in the editor.
                  </Td>
                )}
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}
