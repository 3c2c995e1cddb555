import type { Knex } from "knex";

// Accounts, workspaces and roles; lucia's session table; the sign-in
// throttle counters; e-mail tokens; and the development mailbox that the
// fake SMTP server writes to.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("auth_user", (t) => {
    t.text("id").primary();
    t.text("email").notNullable().unique(); // stored lower-cased
    t.text("display_name").notNullable();
    t.text("password_hash").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("workspace", (t) => {
    t.text("id").primary();
    t.text("name").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("membership", (t) => {
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("user_id").notNullable().references("auth_user.id").onDelete("CASCADE");
    t.text("role").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["workspace_id", "user_id"]);
  });
  await knex.raw(
    "alter table membership add constraint membership_role_check check (role in ('admin','designer','reviewer','manager','viewer'))",
  );

  // lucia 3 session table (@lucia-auth/adapter-postgresql); workspace_id is
  // a session attribute: the workspace the session is working in.
  await knex.schema.createTable("user_session", (t) => {
    t.text("id").primary();
    t.text("user_id").notNullable().references("auth_user.id").onDelete("CASCADE");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.text("workspace_id").nullable().references("workspace.id").onDelete("SET NULL");
    t.index(["user_id"]);
  });

  await knex.schema.createTable("invite", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("email").notNullable();
    t.text("role").notNullable();
    t.text("token_hash").notNullable().unique();
    t.text("invited_by").notNullable().references("auth_user.id");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true }).nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("password_reset", (t) => {
    t.text("token_hash").primary();
    t.text("user_id").notNullable().references("auth_user.id").onDelete("CASCADE");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true }).nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Fixed-window counters shared by every app instance.
  await knex.schema.createTable("auth_throttle", (t) => {
    t.text("bucket").notNullable(); // e.g. "account:alice@x", "address:127.0.0.1"
    t.timestamp("window_start", { useTz: true }).notNullable();
    t.integer("attempts").notNullable().defaultTo(0);
    t.primary(["bucket", "window_start"]);
  });

  await knex.schema.createTable("dev_mailbox", (t) => {
    t.bigIncrements("id").primary();
    t.specificType("recipients", "text[]").notNullable();
    t.text("sender").nullable();
    t.text("subject").notNullable();
    t.text("text_body").notNullable();
    t.text("html_body").nullable();
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ["dev_mailbox", "auth_throttle", "password_reset", "invite", "user_session", "membership", "workspace", "auth_user"]) {
    await knex.schema.dropTableIfExists(t);
  }
}
