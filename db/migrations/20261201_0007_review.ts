import type { Knex } from "knex";

// Review workflow, workspace derating policy, API tokens and the activity log.
//
// - option_review: one review per (option, revision). Submitting freezes the
//   revision; the reviewer's decision (approved | rejected) is final for that
//   revision, so a rejected design comes back as a new revision.
// - review_comment: the reviewer's comments, each optionally pinned to a part
//   id ("Q1") or a figure ("Q1 Tj at vin-max"). option_id/revision repeat the
//   review's so the report reader (db/queries/report-review.ts) finds them.
// - workspace_derating: the team's derating policy; it overrides the design
//   document's own derating block in every evaluation of the workspace.
// - api_token: personal tokens for scripts and CI; only the SHA-256 is kept.
// - activity_log: append-only. A trigger refuses UPDATE, DELETE and TRUNCATE,
//   so the history cannot be edited through the app or by hand. It has no
//   foreign keys on purpose: a cascade would have to delete or rewrite rows.
// - option_revision gets two triggers: every inserted revision is logged
//   (whoever inserts it), and a frozen revision refuses in-place changes with
//   SQLSTATE HS409 (the routes answer 409).
const MARGIN_COLUMNS = ["tj_margin_controller", "tj_margin_mosfet", "tj_margin_bjt", "tj_margin_driver_ic", "tj_margin_clamp"];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("option_review", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("project_id").notNullable().references("project.id").onDelete("CASCADE");
    t.text("option_id").notNullable();
    t.integer("revision").notNullable();
    t.text("status").notNullable().defaultTo("submitted");
    t.text("submitted_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("submitted_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("decided_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("decided_at", { useTz: true }).nullable();
    t.foreign(["option_id", "revision"]).references(["option_id", "revision"]).inTable("option_revision").onDelete("CASCADE");
    t.unique(["option_id", "revision"], { indexName: "option_review_revision_key" });
    t.index(["workspace_id", "status"], "option_review_workspace_status_idx");
  });
  await knex.raw("alter table option_review add constraint option_review_status_check check (status in ('submitted','approved','rejected'))");
  await knex.raw(
    "alter table option_review add constraint option_review_decision_check check ((status = 'submitted') = (decided_at is null))",
  );

  await knex.schema.createTable("review_comment", (t) => {
    t.text("id").primary();
    t.text("review_id").notNullable().references("option_review.id").onDelete("CASCADE");
    t.text("option_id").notNullable();
    t.integer("revision").notNullable();
    t.text("author_id").nullable().references("auth_user.id").onDelete("SET NULL");
    t.text("body").notNullable();
    t.text("target_part").nullable();
    t.text("target_figure").nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["review_id", "created_at"], "review_comment_review_idx");
    t.index(["option_id", "revision"], "review_comment_revision_idx");
  });
  await knex.raw("alter table review_comment add constraint review_comment_body_check check (length(btrim(body)) between 1 and 4000)");

  await knex.schema.createTable("workspace_derating", (t) => {
    t.text("workspace_id").primary().references("workspace.id").onDelete("CASCADE");
    for (const c of MARGIN_COLUMNS) t.double(c).notNullable(); // K below Tj(max)
    t.double("vgs_max_fraction").notNullable(); // ratio of Vgs(max)
    t.double("min_headroom_above_plateau").notNullable(); // V
    t.text("updated_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(
    `alter table workspace_derating add constraint workspace_derating_range_check check (${MARGIN_COLUMNS.map((c) => `${c} between 0 and 200`).join(" and ")}
      and vgs_max_fraction > 0 and vgs_max_fraction <= 1 and min_headroom_above_plateau between 0 and 50)`,
  );

  await knex.schema.createTable("api_token", (t) => {
    t.text("id").primary();
    t.text("user_id").notNullable().references("auth_user.id").onDelete("CASCADE");
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("token_hash").notNullable().unique();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).nullable();
    t.timestamp("last_used_at", { useTz: true }).nullable();
    t.timestamp("revoked_at", { useTz: true }).nullable();
    t.index(["user_id", "workspace_id"], "api_token_user_idx");
  });

  await knex.schema.createTable("activity_log", (t) => {
    t.bigIncrements("id").primary();
    t.text("workspace_id").notNullable();
    t.text("project_id").nullable(); // null: a workspace-wide change (derating policy)
    t.text("option_id").nullable();
    t.integer("revision").nullable();
    t.text("actor").nullable(); // auth_user.id; null for changes made outside a request
    t.text("action").notNullable();
    t.jsonb("detail").notNullable().defaultTo("{}");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["workspace_id", "project_id", "id"], "activity_log_project_idx");
  });

  await knex.raw(`
    create function activity_log_refuse_change() returns trigger language plpgsql as $$
    begin
      raise exception 'activity_log is append-only: % refused', tg_op using errcode = 'HS403';
    end $$;
    create trigger activity_log_no_update_delete before update or delete on activity_log
      for each row execute function activity_log_refuse_change();
    create trigger activity_log_no_truncate before truncate on activity_log
      for each statement execute function activity_log_refuse_change();

    create function option_revision_log_insert() returns trigger language plpgsql as $$
    declare o record;
    begin
      select workspace_id, project_id into o from design_option where id = new.option_id;
      insert into activity_log (workspace_id, project_id, option_id, revision, actor, action, detail)
        values (o.workspace_id, o.project_id, new.option_id, new.revision, new.created_by, 'revision.saved', jsonb_build_object('note', new.note));
      return null;
    end $$;
    create trigger option_revision_logged after insert on option_revision
      for each row execute function option_revision_log_insert();

    create function option_revision_frozen_guard() returns trigger language plpgsql as $$
    begin
      if old.frozen and (new.frozen is distinct from old.frozen or new.document is distinct from old.document
          or new.part_refs is distinct from old.part_refs or new.note is distinct from old.note
          or new.option_id is distinct from old.option_id or new.revision is distinct from old.revision
          or new.created_at is distinct from old.created_at) then
        raise exception 'revision % of option % is frozen for review', old.revision, old.option_id using errcode = 'HS409';
      end if;
      return new;
    end $$;
    create trigger option_revision_frozen before update on option_revision
      for each row execute function option_revision_frozen_guard();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists option_revision_frozen on option_revision");
  await knex.raw("drop trigger if exists option_revision_logged on option_revision");
  await knex.raw("drop function if exists option_revision_frozen_guard()");
  await knex.raw("drop function if exists option_revision_log_insert()");
  for (const t of ["activity_log", "api_token", "workspace_derating", "review_comment", "option_review"]) await knex.schema.dropTableIfExists(t);
  await knex.raw("drop function if exists activity_log_refuse_change()");
}
