import { PART_KINDS, PART_KIND_DEFS, PART_KIND_LABELS, TOLERANCE_LABELS, allParamAliases } from "@/lib/parts/kinds";
import { DIMENSIONS } from "@/models/input/units";
import { MAX_IMPORT_ROWS } from "@/lib/parts/csv";

function example(f: (typeof PART_KIND_DEFS)["mosfet"]["fields"][number]): string {
  if (f.type === "qty") return DIMENSIONS[f.dim].example;
  if (f.type === "voltSecond") return "25 V·µs";
  if (f.type === "hfeCurve") return "10 mA: 200; 0.5 A: 150";
  return f.options.join(" / ");
}

/** The CSV layout, generated from the same field definitions the importer checks against. */
export function CsvHelp() {
  return (
    <section aria-labelledby="csv-help" className="flex flex-col gap-3 text-sm text-ink-soft">
      <h2 id="csv-help" className="text-base font-semibold text-ink">CSV format</h2>
      <p>
        One part per row, a header row first, comma-separated, UTF-8. Columns: <code>kind</code>, <code>manufacturer</code>,{" "}
        <code>mpn</code> (the part number: a re-import updates the part with the same number instead of adding a copy),{" "}
        <code>description</code>, <code>unit_cost_usd</code>, then <code>param.&lt;name&gt;</code> for datasheet figures and{" "}
        <code>tol.&lt;name&gt;</code> for part spread (0.1 or 10 % = ±10 %). Leave a cell empty when the datasheet does not
        give the figure or the column does not apply to the row&apos;s kind.
      </p>
      <p>
        Figures carry their unit: <code>47 nC</code>, <code>4.7 mohm</code> or <code>4.7 mΩ</code>, <code>62 K/W</code>,{" "}
        <code>150 degC</code>. A bare number is refused (is &quot;47&quot; in C or nC?), except for ratios and hFE. Every row is
        checked before anything is written; one bad cell stops the whole import, and each problem is listed by row (the header
        is row 1) and column. At most {MAX_IMPORT_ROWS} rows per file. The export writes this same format.
      </p>
      <p>
        Older files keep working: {Object.entries(allParamAliases()).map(([old, key], i) => (
          <span key={old}>
            {i > 0 ? ", " : ""}
            <code>param.{old}</code> is read as <code>param.{key}</code>
          </span>
        ))}
        . A MOSFET&apos;s output capacitance takes any of Eoss, Qoss and Coss at its test Vds; the model uses Eoss when given.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-xs">
          <caption className="py-1 text-left font-semibold text-ink">Columns per kind (* required)</caption>
          <thead>
            <tr>
              <th scope="col" className="border-b border-paper-line py-1 pr-4 text-left">kind</th>
              <th scope="col" className="border-b border-paper-line py-1 text-left">param.&lt;name&gt; (example) and tol.&lt;name&gt;</th>
            </tr>
          </thead>
          <tbody>
            {PART_KINDS.map((k) => (
              <tr key={k} className="align-top">
                <th scope="row" className="border-b border-paper-line py-1.5 pr-4 text-left font-mono font-medium text-ink">
                  {k}
                  <span className="block font-sans font-normal text-ink-faint">{PART_KIND_LABELS[k]}</span>
                </th>
                <td className="border-b border-paper-line py-1.5">
                  <span className="font-mono">
                    {PART_KIND_DEFS[k].fields.map((f) => `param.${f.key}${f.required ? "*" : ""} (${example(f)})`).join(", ")}
                  </span>
                  <span className="block text-ink-faint">
                    tol: {PART_KIND_DEFS[k].tolerances.map((t) => `tol.${t} (${TOLERANCE_LABELS[t]})`).join(", ")}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
