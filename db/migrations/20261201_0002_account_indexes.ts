import type { Knex } from "knex";

// Lookups the account screens make on every request: a user's memberships
// (workspace switcher, session workspace), a workspace's pending invites and
// a user's reset tokens (invalidated together when one is used).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("membership", (t) => t.index(["user_id"], "membership_user_id_idx"));
  await knex.schema.alterTable("invite", (t) => t.index(["workspace_id"], "invite_workspace_id_idx"));
  await knex.schema.alterTable("password_reset", (t) => t.index(["user_id"], "password_reset_user_id_idx"));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("password_reset", (t) => t.dropIndex(["user_id"], "password_reset_user_id_idx"));
  await knex.schema.alterTable("invite", (t) => t.dropIndex(["workspace_id"], "invite_workspace_id_idx"));
  await knex.schema.alterTable("membership", (t) => t.dropIndex(["user_id"], "membership_user_id_idx"));
}
