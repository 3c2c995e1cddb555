import type { Knex } from "knex";

// Projects (one converter each), their design options, and the numbered
// revisions of every option's design document.
//
// option_revision's primary key (option_id, revision) is the concurrency
// guard: a save inserts revision = base + 1, so two saves made from the same
// base revision collide on the key and the second is refused (409), instead
// of one silently overwriting the other.
const TOPOLOGIES = ["flyback", "forward", "active-clamp-forward", "half-bridge", "full-bridge", "buck", "boost", "llc", "other"];
const STATUSES = ["concept", "design", "review", "released", "archived"];

const list = (values: string[]) => values.map((v) => `'${v}'`).join(",");

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("project", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("topology").notNullable();
    t.double("vin_min").notNullable(); // V
    t.double("vin_nom").notNullable();
    t.double("vin_max").notNullable();
    t.jsonb("outputs").notNullable().defaultTo("[]"); // [{label, voltage (V), current (A)}]
    t.double("fsw").notNullable(); // Hz
    t.double("ambient_max").notNullable(); // °C
    t.double("efficiency_target").nullable(); // ratio 0..1
    t.text("notes").notNullable().defaultTo("");
    t.text("status").notNullable().defaultTo("concept");
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["workspace_id", "updated_at"], "project_workspace_updated_idx");
    t.index(["workspace_id", "status"], "project_workspace_status_idx");
  });
  await knex.raw(`alter table project add constraint project_topology_check check (topology in (${list(TOPOLOGIES)}))`);
  await knex.raw(`alter table project add constraint project_status_check check (status in (${list(STATUSES)}))`);
  await knex.raw("alter table project add constraint project_vin_order_check check (vin_min <= vin_nom and vin_nom <= vin_max)");

  await knex.schema.createTable("design_option", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("project_id").notNullable().references("project.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("summary").notNullable().defaultTo("");
    t.integer("latest_revision").notNullable().defaultTo(0);
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.boolean("archived").notNullable().defaultTo(false);
    t.index(["project_id"], "design_option_project_idx");
    t.index(["workspace_id"], "design_option_workspace_idx");
  });

  await knex.schema.createTable("option_revision", (t) => {
    t.text("option_id").notNullable().references("design_option.id").onDelete("CASCADE");
    t.integer("revision").notNullable();
    t.jsonb("document").notNullable(); // the model's DesignInput, unit strings as typed
    t.jsonb("part_refs").notNullable().defaultTo("{}"); // element path -> part id
    t.text("note").notNullable().defaultTo("");
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.boolean("frozen").notNullable().defaultTo(false); // set by the review workflow
    t.primary(["option_id", "revision"]);
  });
  await knex.raw("alter table option_revision add constraint option_revision_positive_check check (revision >= 1)");
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ["option_revision", "design_option", "project"]) await knex.schema.dropTableIfExists(t);
}
