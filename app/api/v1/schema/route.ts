import { route } from "@/app/_lib/access";
import { designJsonSchema } from "@/models/input";

// The design option document's JSON Schema, generated from the zod schema
// the evaluator validates with (input form: unit strings are accepted).
export const GET = route({ permission: "read" }, async () => designJsonSchema());
