import type { Knex } from "knex";

// The manager's sign-off: which design option (at which revision) a project
// goes ahead with, and why. Rows are never updated or deleted by the app, so
// the history of choices stays; the latest row (chosen_at, then id) wins.
// workspace_id is denormalised from the project so every query can filter by
// the caller's workspace without a join.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("option_choice", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("project_id").notNullable().references("project.id").onDelete("CASCADE");
    t.text("option_id").notNullable().references("design_option.id").onDelete("CASCADE");
    t.integer("revision").notNullable();
    t.text("reason").notNullable();
    t.text("chosen_by").notNullable().references("auth_user.id");
    t.timestamp("chosen_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["workspace_id", "project_id", "chosen_at"], "option_choice_project_idx");
  });
  await knex.raw("alter table option_choice add constraint option_choice_revision_check check (revision >= 1)");
  await knex.raw("alter table option_choice add constraint option_choice_reason_check check (length(btrim(reason)) between 1 and 2000)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("option_choice");
}
