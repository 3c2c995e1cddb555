import type { Knex } from "knex";

// The parts library and stored files (datasheets, bench data).
//
// part.params holds model-ready SI numbers shaped like the model's datasheet
// block for the part's kind (models/schemaParts.ts), so a design option can
// copy it; only what the user gave is stored, the model fills its defaults.
// The natural key is (workspace_id, mpn): a CSV re-import updates by it.
//
// part_hfe_at(points, ic): hFE of a stored hFE(Ic) curve at collector
// current ic, for the "hFE at 1 A above ..." filter. Datasheet hFE curves are
// drawn on a log Ic axis, so we interpolate linearly in ln(Ic) between the
// neighbouring points (our assumption; the model may use its own fit). Below
// the first point the first gain holds; above the last point the gain is
// unknown (it usually keeps falling), so the function returns null and the
// part does not pass an "above" filter.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("stored_file", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("key").notNullable().unique(); // object key in the bucket
    t.text("filename").notNullable();
    t.text("content_type").notNullable();
    t.bigInteger("size_bytes").notNullable();
    t.text("sha256").notNullable();
    t.text("kind").notNullable();
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["workspace_id", "kind"], "stored_file_workspace_kind_idx");
  });
  await knex.raw("alter table stored_file add constraint stored_file_kind_check check (kind in ('datasheet','bench'))");

  await knex.schema.createTable("part", (t) => {
    t.text("id").primary();
    t.text("workspace_id").notNullable().references("workspace.id").onDelete("CASCADE");
    t.text("kind").notNullable();
    t.text("manufacturer").notNullable();
    t.text("mpn").notNullable();
    t.text("description").notNullable().defaultTo("");
    t.jsonb("params").notNullable().defaultTo("{}");
    t.jsonb("tolerance").notNullable().defaultTo("{}");
    t.decimal("unit_cost", 14, 4).nullable(); // USD per part
    t.text("datasheet_file_id").nullable().references("stored_file.id").onDelete("SET NULL");
    t.text("created_by").nullable().references("auth_user.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["workspace_id", "mpn"], { indexName: "part_workspace_mpn_key" });
    t.index(["workspace_id", "kind"], "part_workspace_kind_idx");
  });
  await knex.raw(
    "alter table part add constraint part_kind_check check (kind in ('controller','mosfet','bjt','driver-ic','diode','zener','gate-transformer'))",
  );
  await knex.raw("alter table part add constraint part_unit_cost_check check (unit_cost is null or unit_cost >= 0)");

  await knex.raw(`
    create function part_hfe_at(points jsonb, ic double precision) returns double precision
    language sql immutable as $$
      with p as (
        select (e->>'ic')::float8 as ic, (e->>'hfe')::float8 as hfe
        from jsonb_array_elements(case when jsonb_typeof(points) = 'array' then points else '[]'::jsonb end) as e
        where (e->>'ic')::float8 > 0
      ),
      lo as (select * from p where p.ic <= $2 order by p.ic desc limit 1),
      hi as (select * from p where p.ic >= $2 order by p.ic asc limit 1)
      select case
        when $2 is null or $2 <= 0 then null
        when not exists (select 1 from hi) then null
        when not exists (select 1 from lo) then (select hfe from hi)
        when (select ic from hi) = (select ic from lo) then (select hfe from lo)
        else (select lo.hfe + (hi.hfe - lo.hfe) * ln($2 / lo.ic) / ln(hi.ic / lo.ic) from lo, hi)
      end
    $$`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop function if exists part_hfe_at(jsonb, double precision)");
  await knex.schema.dropTableIfExists("part");
  await knex.schema.dropTableIfExists("stored_file");
}
