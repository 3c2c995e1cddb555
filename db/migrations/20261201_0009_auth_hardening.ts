import type { Knex } from "knex";

// Holes found when the running product was attacked (issue 11), on the
// account side:
// - auth_guard replaces auth_throttle: one row per bucket, claimed and
//   counted by a single INSERT ... ON CONFLICT DO UPDATE ... WHERE, so
//   parallel requests cannot all pass the check before any of them counts.
// - pending_sign_up: a sign-up waits here until its mailed link is followed,
//   so the answer to a sign-up is the same whether the address has an
//   account or not.
// - user_session.created_at: the start of the session's absolute lifetime.
// - dev_mailbox.caused_by: the user whose action sent the message, so the
//   development inbox can show each member only their own mail.
// - api_token.expires_at becomes mandatory (at most a year; the old maximum
//   of 366 days is the bound the check allows). Tokens without one get a
//   year from their creation.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("auth_guard", (t) => {
    t.text("bucket").primary(); // "pair:<email>|<address>", "address:<address>", "signup:<address>", "mail:<email>"
    t.integer("attempts").notNullable();
    t.timestamp("window_start", { useTz: true }).notNullable();
    t.timestamp("retry_at", { useTz: true }).notNullable();
    t.index(["window_start"], "auth_guard_window_idx");
  });
  await knex.schema.dropTable("auth_throttle");

  await knex.schema.createTable("pending_sign_up", (t) => {
    t.text("token_hash").primary();
    t.text("email").notNullable();
    t.text("display_name").notNullable();
    t.text("workspace_name").notNullable();
    t.text("password_hash").notNullable();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email"], "pending_sign_up_email_idx");
  });

  await knex.schema.alterTable("user_session", (t) => {
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.alterTable("dev_mailbox", (t) => {
    t.text("caused_by").nullable();
    t.index(["caused_by"], "dev_mailbox_caused_by_idx");
  });

  await knex.raw("update api_token set expires_at = created_at + interval '365 days' where expires_at is null");
  await knex.raw("alter table api_token alter column expires_at set not null");
  await knex.raw("alter table api_token add constraint api_token_expiry_check check (expires_at <= created_at + interval '366 days')");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table api_token drop constraint if exists api_token_expiry_check");
  await knex.raw("alter table api_token alter column expires_at drop not null");
  await knex.schema.alterTable("dev_mailbox", (t) => {
    t.dropIndex(["caused_by"], "dev_mailbox_caused_by_idx");
    t.dropColumn("caused_by");
  });
  await knex.schema.alterTable("user_session", (t) => t.dropColumn("created_at"));
  await knex.schema.dropTableIfExists("pending_sign_up");
  await knex.schema.createTable("auth_throttle", (t) => {
    t.text("bucket").notNullable();
    t.timestamp("window_start", { useTz: true }).notNullable();
    t.integer("attempts").notNullable().defaultTo(0);
    t.primary(["bucket", "window_start"]);
  });
  await knex.schema.dropTableIfExists("auth_guard");
}
