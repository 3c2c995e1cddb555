import type { BadgeTone } from "@/components/ui";
import type { ProjectStatus } from "@/lib/projects/schema";

export const STATUS_TONES: Record<ProjectStatus, BadgeTone> = {
  concept: "neutral",
  design: "info",
  review: "copper",
  released: "ok",
  archived: "neutral",
};
