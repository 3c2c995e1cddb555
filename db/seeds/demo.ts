// Demo workspace: an invented company (Tallowbrook Power Ltd) and its team,
// one user per role. Idempotent: rows are keyed by fixed ids and e-mails and
// inserted only when missing, so a second `npm start` adds nothing and keeps
// whatever users changed.
import type { Knex } from "knex";
import { hash } from "@node-rs/argon2";
import users from "./demo-users.json";
import { seedDemoParts } from "./demo-parts";
import { seedDemoProjects } from "./demo-projects";

export const DEMO_WORKSPACE_ID = "ws_tallowbrook";
export const DEMO_PASSWORD = "heatsplit-demo";

export async function seedDemoWorkspace(knex: Knex): Promise<string> {
  let added = 0;
  await knex.transaction(async (trx) => {
    const ws = await trx("workspace").where({ id: DEMO_WORKSPACE_ID }).first();
    if (!ws) {
      await trx("workspace").insert({ id: DEMO_WORKSPACE_ID, name: "Tallowbrook Power Ltd" });
      added++;
    }
    for (const u of users) {
      const id = `usr_demo_${u.role}`;
      const existing = await trx("auth_user").where({ email: u.email }).first();
      if (!existing) {
        const password_hash = await hash(DEMO_PASSWORD, { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 });
        await trx("auth_user").insert({ id, email: u.email, display_name: u.name, password_hash });
        await trx("membership").insert({ workspace_id: DEMO_WORKSPACE_ID, user_id: id, role: u.role });
        added++;
      }
    }
    added += await seedDemoParts(trx, DEMO_WORKSPACE_ID);
    added += await seedDemoProjects(trx, DEMO_WORKSPACE_ID);
  });
  return added ? `${added} records added` : "already present, nothing added";
}
