// Records for the projects/options tests and the role matrix, made through
// the API as a signed-in member (so they are shaped exactly as the app
// stores them).
import { demoOptions } from "@/models/demo";
import { Client } from "./http";
import { TEST_PASSWORD } from "./db";

export function projectBody(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    name: "Test brick",
    topology: "active-clamp-forward",
    vinMin: 36,
    vinNom: 48,
    vinMax: 75,
    outputs: [{ label: "Main", voltage: 12, current: 20 }],
    fsw: "250 kHz",
    ambientMax: 85,
    efficiencyTarget: "92 %",
    ...overrides,
  };
}

export const TEMPLATE_KEY = demoOptions[0].key;
export const templateInput = (): Record<string, any> => structuredClone(demoOptions[0].input) as Record<string, any>;

export async function signedInClient(email: string): Promise<Client> {
  const c = new Client();
  const r = await c.post("/api/v1/auth/sign-in", { email, password: TEST_PASSWORD });
  if (r.status !== 200) throw new Error(`sign-in failed: ${r.status} ${r.text}`);
  return c;
}

export async function createProject(client: Client, overrides: Record<string, unknown> = {}): Promise<string> {
  const r = await client.post("/api/v1/projects", projectBody(overrides));
  if (r.status !== 201) throw new Error(`project not created: ${r.status} ${r.text}`);
  return r.json<{ project: { id: string } }>().project.id;
}

export async function createOption(client: Client, projectId: string, name = "Option A"): Promise<string> {
  const r = await client.post(`/api/v1/projects/${projectId}/options`, { name, template: TEMPLATE_KEY });
  if (r.status !== 201) throw new Error(`option not created: ${r.status} ${r.text}`);
  return r.json<{ option: { id: string } }>().option.id;
}

export async function createProjectWithOption(client: Client): Promise<{ projectId: string; optionId: string }> {
  const projectId = await createProject(client);
  return { projectId, optionId: await createOption(client, projectId) };
}
