import type { Knex } from "knex";

// Bench correlation runs (one uploaded CSV of measured temperatures against
// one option revision) with their readings, and the results of background
// jobs (sweeps, Monte Carlo, big reports) run through pg-boss.
//
// bench_run points at the revision it was measured against through the
// composite key of option_revision, so a run cannot name a revision that
// does not exist. Readings are stored in °C as validated; the original file
// stays in object storage (stored_file kind 'bench').
//
// job_result is the app's own record of a job: pg-boss keeps the queue
// (schema pgboss), this table keeps who asked, progress and checkpoints
// (so a retried job resumes), and the result (jsonb, or a stored file for a
// rendered report: stored_file kind 'report', added here).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("bench_run", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("option_id").notNullable();
    t.integer("revision").notNullable();
    t.text("file_id").nullable().references("stored_file.id").onDelete("SET NULL");
    t.integer("row_count").notNullable();
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(["option_id", "revision"]).references(["option_id", "revision"]).inTable("option_revision").onDelete("CASCADE");
    t.index(["workspace_id", "option_id", "created_at"], "bench_run_option_idx");
  });

  await knex.schema.createTable("bench_reading", (t) => {
    t.bigIncrements("id").primary();
    t.text("run_id").notNullable().references("bench_run.id").onDelete("CASCADE");
    t.integer("row_number").notNullable(); // line in the uploaded file (header = 1)
    t.text("part_id").notNullable();
    t.text("corner_id").notNullable();
    t.text("method").notNullable();
    t.text("measured_at").notNullable();
    t.double("temperature").notNullable(); // °C
    t.double("ambient").notNullable(); // °C
    t.text("note").notNullable().defaultTo("");
    t.index(["run_id"], "bench_reading_run_idx");
  });
  await knex.raw("alter table bench_reading add constraint bench_reading_method_check check (method in ('thermocouple','ir'))");
  await knex.raw("alter table bench_reading add constraint bench_reading_measured_at_check check (measured_at in ('case','junction'))");

  await knex.raw("alter table stored_file drop constraint stored_file_kind_check");
  await knex.raw("alter table stored_file add constraint stored_file_kind_check check (kind in ('datasheet','bench','report'))");

  await knex.schema.createTable("job_result", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("kind").notNullable();
    t.text("status").notNullable().defaultTo("queued");
    t.double("progress").notNullable().defaultTo(0);
    t.jsonb("payload").notNullable();
    t.jsonb("checkpoint").nullable(); // partial work a retried attempt resumes from
    t.jsonb("result").nullable();
    t.text("file_id").nullable().references("stored_file.id").onDelete("SET NULL");
    t.text("error").nullable(); // user-facing message only; causes go to the log
    t.integer("attempts").notNullable().defaultTo(0);
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("started_at", { useTz: true }).nullable();
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("finished_at", { useTz: true }).nullable();
    t.index(["workspace_id", "created_at"], "job_result_workspace_idx");
  });
  await knex.raw("alter table job_result add constraint job_result_kind_check check (kind in ('sweep','monte-carlo','report'))");
  await knex.raw("alter table job_result add constraint job_result_status_check check (status in ('queued','running','completed','failed'))");
  await knex.raw("alter table job_result add constraint job_result_progress_check check (progress >= 0 and progress <= 1)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("job_result");
  await knex.schema.dropTableIfExists("bench_reading");
  await knex.schema.dropTableIfExists("bench_run");
  await knex("stored_file").where({ kind: "report" }).delete();
  await knex.raw("alter table stored_file drop constraint stored_file_kind_check");
  await knex.raw("alter table stored_file add constraint stored_file_kind_check check (kind in ('datasheet','bench'))");
}
