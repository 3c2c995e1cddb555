import type { CornerResult } from "@/models/evaluate";
import { Quantity, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { MECHANISM_LABELS } from "@/lib/palette";
import { LOSS_MECHANISMS } from "@/models/losses";

/**
 * Every figure of the corner with its unit: loss per part and mechanism,
 * the part total, and for junction parts Tj, derated limit and margin.
 * Mechanisms that are zero for every part are left out of the columns.
 */
export function Ledger({ corner }: { corner: CornerResult }) {
  const mechs = LOSS_MECHANISMS.filter((m) => corner.parts.some((p) => p.losses[m] !== 0));
  return (
    <Table caption={`Every figure at ${corner.label}`} dense>
      <THead>
        <tr>
          <Th>Part</Th>
          {mechs.map((m) => (
            <Th key={m} numeric>
              {MECHANISM_LABELS[m]}
            </Th>
          ))}
          <Th numeric>Total loss</Th>
          <Th numeric>
            T<sub>j</sub>
          </Th>
          <Th numeric>Derated limit</Th>
          <Th numeric>Margin</Th>
        </tr>
      </THead>
      <TBody>
        {corner.parts.map((p) => {
          const j = p.junction;
          return (
            <Tr key={p.id} data-ledger-part={p.id}>
              <Td className="whitespace-nowrap">
                <span className="font-medium">{p.label}</span> <span className="font-mono text-xs text-ink-faint">{p.id}</span>
              </Td>
              {mechs.map((m) => (
                <Td key={m} numeric>
                  {p.losses[m] === 0 ? <span className="text-ink-faint">0</span> : <Quantity value={p.losses[m]} unit="W" />}
                </Td>
              ))}
              <Td numeric data-figure="part-total">
                <Quantity value={p.total} unit="W" strong />
              </Td>
              <Td numeric data-figure="part-tj">
                {!j ? <span className="text-ink-faint">no junction</span> : j.runaway ? <span className="text-alarm-700">runaway</span> : <Quantity value={j.tj} unit="°C" digits={4} />}
              </Td>
              <Td numeric>{j ? <Quantity value={j.limit} unit="°C" digits={4} /> : null}</Td>
              <Td numeric data-figure="part-margin">
                {j && !j.runaway ? <Quantity value={j.margin} unit="K" className={j.margin < 0 ? "text-alarm-700" : undefined} /> : null}
              </Td>
            </Tr>
          );
        })}
        <Tr className="bg-paper-sunk/50 font-medium">
          <Td>All modelled parts</Td>
          {mechs.map((m) => (
            <Td key={m} numeric>
              <Quantity value={corner.parts.reduce((s, p) => s + p.losses[m], 0)} unit="W" />
            </Td>
          ))}
          <Td numeric data-figure="corner-total">
            <Quantity value={corner.totalLoss} unit="W" strong />
          </Td>
          <Td colSpan={3} className="text-right text-xs text-ink-soft">
            {corner.efficiency !== null ? (
              <>
                efficiency of the modelled losses <Quantity value={corner.efficiency * 100} unit="%" digits={4} />
              </>
            ) : (
              "no output power given: no efficiency"
            )}
          </Td>
        </Tr>
      </TBody>
    </Table>
  );
}
