/**
 * Starting points for a new design option: the invented demo options of
 * models/demo.ts (a 36–75 V -> 12 V converter). Client-safe: the new-option
 * form lists them, the server copies the chosen document.
 */
import { demoOptions } from "@/models/demo";
import type { DesignInput } from "@/models/input/schema";

export interface OptionTemplate {
  key: string;
  name: string;
  summary: string;
}

export const OPTION_TEMPLATES: OptionTemplate[] = demoOptions.map(({ key, name, summary }) => ({ key, name, summary }));

/** A fresh copy of the template's document, or undefined for an unknown key. */
export function templateDocument(key: string): DesignInput | undefined {
  const t = demoOptions.find((o) => o.key === key);
  return t ? (structuredClone(t.input) as DesignInput) : undefined;
}

export function isTemplateKey(key: string): boolean {
  return demoOptions.some((o) => o.key === key);
}
