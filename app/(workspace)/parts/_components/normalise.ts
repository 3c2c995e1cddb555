/**
 * Field-level normalisation for the part form: the same parsers the server
 * runs (models/input/units.ts qty, the hFE and volt-second readers), so "0.047 µC"
 * becomes "47 nC" on blur and "47 V" in a charge field is refused there.
 */
import { qty } from "@/models/input/units";
import type { ParamField } from "@/lib/parts/kinds";
import { formatForInput, formatPercent, parseHfeCurve, parseVoltSecond } from "@/lib/parts/paramText";

export type Normalised = { ok: true; text: string } | { ok: false; message: string };

export function normaliseParam(field: ParamField, text: string): Normalised {
  if (!text.trim()) return { ok: true, text: "" };
  try {
    if (field.type === "voltSecond") return { ok: true, text: formatForInput(field, parseVoltSecond(text)) };
    if (field.type === "hfeCurve") return { ok: true, text: formatForInput(field, parseHfeCurve(text)) };
    if (field.type === "enum") {
      const v = text.trim().toLowerCase();
      return field.options.includes(v) ? { ok: true, text: v } : { ok: false, message: `expected one of ${field.options.join(", ")}` };
    }
    const r = qty(field.dim, field.opts).safeParse(text.trim());
    if (!r.success) return { ok: false, message: r.error.issues[0]?.message ?? "invalid value" };
    return { ok: true, text: formatForInput(field, r.data) };
  } catch (e) {
    return { ok: false, message: (e as Error).message };
  }
}

const tolerance = qty("ratio", { min: 0, max: 1 });

export function normaliseTolerance(text: string): Normalised {
  if (!text.trim()) return { ok: true, text: "" };
  const r = tolerance.safeParse(text.trim());
  return r.success ? { ok: true, text: formatPercent(r.data) } : { ok: false, message: r.error.issues[0]?.message ?? "invalid ratio" };
}

const cost = qty("cost");

export function normaliseCost(text: string): Normalised {
  if (!text.trim()) return { ok: true, text: "" };
  const r = cost.safeParse(text.trim());
  return r.success ? { ok: true, text: String(r.data) } : { ok: false, message: r.error.issues[0]?.message ?? "invalid cost" };
}
