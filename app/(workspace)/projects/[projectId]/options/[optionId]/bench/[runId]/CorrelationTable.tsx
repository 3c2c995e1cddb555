import { Badge, formatSi, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import type { PartCorrelation } from "@/models/fitDesign";

const t = (v: number | null) => (v === null ? "runaway" : formatSi(v, "°C", 4));
const k = (v: number | null) => (v === null ? "—" : formatSi(v, "K", 3));

/** Predicted vs measured for one part, the fitted own-path resistance and its residual per reading. */
export function CorrelationTable({ part: p, bandK }: { part: PartCorrelation; bandK: number }) {
  const residual = new Map(p.fit?.residuals.map((r, i) => [i, r.residual]) ?? []);
  let fi = 0;
  const caption = (
    <span className="flex flex-wrap items-center gap-2">
      {p.part.label}
      {p.outsideBand ? <Badge tone="over">outside ±{bandK} K</Badge> : <Badge tone="ok">within ±{bandK} K</Badge>}
      <span className="font-normal text-ink-soft">
        model Rθ {formatSi(p.part.theta, "K/W", 4)}
        {p.fit && <> → fitted {formatSi(p.fit.rth, "K/W", 4)}, RMS residual {formatSi(p.fit.rmsResidual, "K", 2)}</>}
        {!p.fit && <> (no fit: the readings carry no modelled power)</>}
        {p.proposal && "error" in p.proposal && <> ({p.proposal.error})</>}
      </span>
    </span>
  );
  return (
    <Table caption={caption} dense>
      <THead>
        <Tr>
          <Th numeric>Row</Th>
          <Th>Corner</Th>
          <Th>Method</Th>
          <Th>Surface</Th>
          <Th numeric>Ambient</Th>
          <Th numeric>Loss</Th>
          <Th numeric>Predicted</Th>
          <Th numeric>Measured</Th>
          <Th numeric>Difference</Th>
          <Th numeric>Residual after fit</Th>
        </Tr>
      </THead>
      <TBody>
        {p.readings.map((r) => {
          const res = r.predicted === null ? null : (residual.get(fi++) ?? null);
          return (
            <Tr key={r.row}>
              <Td numeric>{r.row}</Td>
              <Td>{r.cornerId}</Td>
              <Td>{r.method === "ir" ? "IR" : "thermocouple"}</Td>
              <Td>{r.surface}</Td>
              <Td numeric>{t(r.ambient)}</Td>
              <Td numeric>{formatSi(r.power, "W")}</Td>
              <Td numeric>{t(r.predicted)}</Td>
              <Td numeric>{t(r.temperature)}</Td>
              <Td numeric className={r.outsideBand ? "font-semibold text-alarm-700" : undefined}>{k(r.difference)}</Td>
              <Td numeric>{k(res)}</Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
