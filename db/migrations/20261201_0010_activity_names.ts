import type { Knex } from "knex";

// The activity log keeps the names as they were when an entry was written:
// actor_name and option_name are filled by a BEFORE INSERT trigger from the
// rows as they stand in that transaction, so every writer (insertActivity
// and the option_revision trigger) records them without being changed, and
// a later rename does not rewrite how old entries read. Entries written
// before this migration get today's names once (the best record there is);
// the append-only trigger is paused for that one backfill only.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("activity_log", (t) => {
    t.text("actor_name").nullable();
    t.text("option_name").nullable();
  });
  await knex.raw(`
    alter table activity_log disable trigger activity_log_no_update_delete;
    update activity_log a set actor_name = u.display_name from auth_user u where u.id = a.actor and a.actor_name is null;
    update activity_log a set option_name = o.name from design_option o where o.id = a.option_id and a.option_name is null;
    alter table activity_log enable trigger activity_log_no_update_delete;

    create function activity_log_fill_names() returns trigger language plpgsql as $$
    begin
      if new.actor is not null and new.actor_name is null then
        select display_name into new.actor_name from auth_user where id = new.actor;
      end if;
      if new.option_id is not null and new.option_name is null then
        select name into new.option_name from design_option where id = new.option_id;
      end if;
      return new;
    end $$;
    create trigger activity_log_names before insert on activity_log
      for each row execute function activity_log_fill_names();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists activity_log_names on activity_log");
  await knex.raw("drop function if exists activity_log_fill_names()");
  await knex.schema.alterTable("activity_log", (t) => {
    t.dropColumn("option_name");
    t.dropColumn("actor_name");
  });
}
