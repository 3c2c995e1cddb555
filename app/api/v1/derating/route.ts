import { route } from "@/app/_lib/access";
import { deratingPolicySchema } from "@/lib/derating/schema";
import { describeDerating, saveDeratingPolicy } from "@/services/derating/policy";

// The workspace derating policy (SI: margins K, fraction ratio, headroom V).
// GET -> { policy, source: "workspace" | "model-defaults", updatedBy, updatedAt }
export const GET = route({ permission: "read" }, async ({ member }) => describeDerating(member.workspace.id));

// PUT { tjMargin: { controller, mosfet, bjt, driverIc, clamp }, vgsMaxFraction, minHeadroomAbovePlateau }
//   ("25 K", "80 %", "4 V" or SI numbers) -> { policy, source: "workspace", ... }; logged.
export const PUT = route({ permission: "derating:write", body: deratingPolicySchema }, async ({ member, body }) => saveDeratingPolicy(member, body));
