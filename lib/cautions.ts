// The standard cautions, word for word: the UI (components/ui/Caution.tsx),
// the reports and the CSV exports all show these.
export const CAUTION_BENCH = "Estimates, not measurements: confirm on the bench (thermocouple or IR) before release.";
export const CAUTION_MAINS =
  "Mains-connected supplies carry lethal voltages; isolation, creepage and safety approvals follow the applicable standards, local codes and licensed practice.";
export const CAUTION_HOT = "Hot surfaces can burn.";
export const CAUTION_TEXT = `${CAUTION_BENCH} ${CAUTION_MAINS} ${CAUTION_HOT}`;
