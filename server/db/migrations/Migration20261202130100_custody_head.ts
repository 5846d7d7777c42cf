import { Migration } from "@mikro-orm/migrations";

/**
 * The custody chain's head, kept apart from the entries (D19 in DEVELOPERS.md): per transfer,
 * the last sequence number and hash. A trigger moves it in the same statement that inserts an
 * entry, and refuses an entry that does not continue the chain; the app may only read it.
 * Removing the last entries, even with every trigger switched off, leaves the head pointing
 * past the end of the log, which verification reports.
 */
export class Migration20261202130100_custody_head extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "custody_head" ("transfer_id" uuid not null, "seq" int not null, "hash" varchar(64) not null, "updated_at" timestamptz not null, constraint "custody_head_pkey" primary key ("transfer_id"));`,
    );
    this.addSql(
      `alter table "custody_head" add constraint "custody_head_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );
    // Only the trigger below writes the head (it runs as the owner); the app reads it.
    this.addSql(`revoke insert, update, delete on "custody_head" from hatchway_app;`);

    this.addSql(
      `insert into "custody_head" ("transfer_id", "seq", "hash", "updated_at")
         select distinct on ("transfer_id") "transfer_id", "seq", "hash", now()
           from "custody_entry" order by "transfer_id", "seq" desc;`,
    );

    this.addSql(`create function hatchway_custody_head() returns trigger language plpgsql
      security definer set search_path = pg_catalog, public as $$
      declare head record;
      begin
        select "seq", "hash" into head from "custody_head" where "transfer_id" = new."transfer_id" for update;
        if not found then
          if new."seq" <> 1 or new."prev_hash" <> repeat('0', 64) then
            raise exception 'custody entry % does not start the chain of transfer %', new."seq", new."transfer_id"
              using errcode = 'P0001';
          end if;
          insert into "custody_head" ("transfer_id", "seq", "hash", "updated_at")
            values (new."transfer_id", new."seq", new."hash", now());
        else
          if new."seq" <> head."seq" + 1 or new."prev_hash" <> head."hash" then
            raise exception 'custody entry % does not continue the chain of transfer % (its head is entry %)',
              new."seq", new."transfer_id", head."seq" using errcode = 'P0001';
          end if;
          update "custody_head" set "seq" = new."seq", "hash" = new."hash", "updated_at" = now()
           where "transfer_id" = new."transfer_id";
        end if;
        return new;
      end $$;`);
    this.addSql(
      `create trigger "custody_entry_advance_head" before insert on "custody_entry" for each row execute function hatchway_custody_head();`,
    );
    // The head moves forward, never away.
    this.addSql(
      `create trigger "custody_head_no_delete" before delete on "custody_head" for each row execute function hatchway_append_only();`,
    );
    this.addSql(
      `create trigger "custody_head_no_truncate" before truncate on "custody_head" for each statement execute function hatchway_append_only();`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop trigger if exists "custody_entry_advance_head" on "custody_entry";`);
    this.addSql(`drop table if exists "custody_head" cascade;`);
    this.addSql(`drop function if exists hatchway_custody_head();`);
  }
}
