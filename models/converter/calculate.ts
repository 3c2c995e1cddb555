/**
 * The operating-point calculator: a converter's specs at one corner in,
 * every switch position's waveform figures out (or a refusal in words).
 * Pure and browser-safe: no parser, no schema, no I/O.
 */
import { formatQuantity } from "../quantityFormat";
import { buildBoost } from "./boost";
import { buildBridge } from "./bridge";
import { buildBuck } from "./buck";
import { contextOf, isRefusal, type BuildResult, type Context } from "./built";
import { applyDeadTimes } from "./deadTimes";
import { positionFigures } from "./figures";
import { buildFlyback } from "./flyback";
import { buildForwardResetWinding } from "./forward";
import { buildForwardActiveClamp } from "./forwardClamp";
import { dropEmpty } from "./spans";
import type { ConverterSpec, OperatingResult } from "./types";
import { checkSpec } from "./validate";

function build(c: Context): BuildResult {
  switch (c.spec.topology) {
    case "buck": return buildBuck(c);
    case "boost": return buildBoost(c);
    case "flyback": return buildFlyback(c);
    case "forward": return c.spec.forwardReset === "active-clamp" ? buildForwardActiveClamp(c) : buildForwardResetWinding(c);
    case "half-bridge": return buildBridge(c, false);
    case "full-bridge": return buildBridge(c, true);
  }
}

export function operatingPoint(spec: ConverterSpec): OperatingResult {
  const bad = checkSpec(spec);
  if (bad) return { ok: false, refusal: bad };
  const c = contextOf(spec);
  const b = build(c);
  if (isRefusal(b)) return { ok: false, refusal: b };
  if (spec.dutyMax !== undefined && b.duty > spec.dutyMax)
    return {
      ok: false,
      refusal: {
        field: "dutyMax",
        message: `this corner needs a duty of ${b.duty.toFixed(3)}, above the controller's maximum ${spec.dutyMax}; ` +
          (spec.turnsRatio !== undefined ? "lower Np/Ns, " : "") + `raise the minimum input voltage or choose another controller`,
      },
    };
  const timeline = applyDeadTimes(dropEmpty(b.timeline), c.deadTimes);
  if (isRefusal(timeline)) return { ok: false, refusal: timeline };
  const positions = timeline.positions.map((p) => positionFigures(timeline, p));
  const avgOf = (id: string) => positions.find((p) => p.id === id)?.deviceIAvg ?? 0;
  const inputCurrent = b.input.reduce((s, x) => s + x.sign * avgOf(x.id), 0);
  const notes = [...b.notes];
  if (spec.rectifier === "synchronous" && b.mode !== "continuous")
    notes.push("the synchronous rectifiers turn off when their current reaches zero (diode emulation), so they have no dead time at turn-off");
  notes.push(`efficiency ${spec.efficiency} taken as an input drop: the converter is ideal from ${formatQuantity(c.vinE, "voltage")}`);
  return {
    ok: true,
    point: {
      topology: spec.topology,
      vin: spec.vin,
      vout: spec.vout,
      iout: spec.iout,
      mode: b.mode,
      fsw: b.fsw,
      duty: b.duty,
      dutyFreewheel: b.dutyFreewheel,
      k: b.k,
      kCrit: b.kCrit,
      inputCurrent,
      inputPower: spec.vin * inputCurrent,
      outputPower: spec.vout * spec.iout,
      inductors: b.inductors,
      positions,
      notes,
    },
  };
}
