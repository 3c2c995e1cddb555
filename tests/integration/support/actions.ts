// Calling a server action over HTTP the way React does from a form with
// useActionState: POST to the page that shows the form, header Next-Action
// with the action's id, a multipart body whose field "0" is the argument
// list ([previous state, form data]) and whose "_1_<name>" fields are the
// form's fields (React's reply encoding). The id comes from the build's
// server-reference manifest, which names each action's file and export.
import fs from "node:fs";
import path from "node:path";
import { STATUS_OF_CODE } from "@/lib/errors";
import type { Client } from "./http";

interface ManifestEntry {
  filename: string;
  exportedName: string;
}

let ids: Map<string, string> | undefined;

/** "app/(workspace)/members/actions.ts#inviteMemberAction" -> the action id of this build. */
export function actionId(key: string): string {
  if (!ids) {
    const dist = process.env.NEXT_DIST_DIR ?? ".next-test";
    const file = path.resolve(__dirname, "../../..", dist, "server/server-reference-manifest.json");
    const manifest = JSON.parse(fs.readFileSync(file, "utf8")) as { node: Record<string, ManifestEntry> };
    ids = new Map(Object.entries(manifest.node).map(([id, e]) => [`${e.filename}#${e.exportedName}`, id]));
  }
  const id = ids.get(key);
  if (!id) throw new Error(`no server action ${key} in the build's manifest`);
  return id;
}

export type ActionReply =
  { kind: "done"; status: number; state?: Record<string, unknown>; redirect?: string } | { kind: "refused"; status: number; code: string; message: string };

/** The action's returned state, read from the RSC stream of the answer (a line "<id>:<json>" holding { ok, … }). */
function stateOf(text: string): Record<string, unknown> | undefined {
  for (const line of text.split("\n")) {
    const m = /^[0-9a-f]+:(\{.*\})$/.exec(line);
    if (!m) continue;
    try {
      const v = JSON.parse(m[1]) as Record<string, unknown>;
      if (typeof v.ok === "boolean") return v;
    } catch {
      // not a JSON row
    }
  }
  return undefined;
}

export async function callAction(client: Client, opts: { key: string; page: string; fields: Record<string, string> }): Promise<ActionReply> {
  const form = new FormData();
  for (const [k, v] of Object.entries(opts.fields)) form.append(`_1_${k}`, v);
  // after the fields, as React writes it: the server reads the form's entries in order
  form.append("0", JSON.stringify([{ ok: true }, "$K1"]));
  const r = await client.request("POST", opts.page, { formData: form, headers: { "next-action": actionId(opts.key), accept: "text/x-component" } });
  const redirect = r.headers.get("x-action-redirect") ?? (r.status >= 300 && r.status < 400 ? r.location : null);
  if (redirect) return { kind: "done", status: r.status, redirect };
  const state = stateOf(r.text);
  if (!state) return { kind: "refused", status: r.status, code: "no-state", message: `HTTP ${r.status}: ${r.text.slice(0, 200)}` };
  if (state.ok) return { kind: "done", status: r.status, state };
  const code = String(state.code ?? "internal");
  return { kind: "refused", status: (STATUS_OF_CODE as Record<string, number>)[code] ?? 500, code, message: String(state.message) };
}
