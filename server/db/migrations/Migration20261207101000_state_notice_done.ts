import { Migration } from "@mikro-orm/migrations";

/**
 * A state notice after a move (D35) marked done: who, when, an optional note and the agency's
 * reference number. Append-only like the ledger (D6, D18): one mark per notice and transfer,
 * never changed; a mistake is explained in a later note, not erased.
 */
export class Migration20261207101000_state_notice_done extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "state_notice_done" (
      "id" uuid not null,
      "transfer_id" uuid not null,
      "notice_key" varchar(80) not null,
      "organization_id" uuid not null,
      "done_by_id" uuid null,
      "done_by_name" varchar(200) not null,
      "done_at" timestamptz not null,
      "note" text null,
      "reference" varchar(120) null,
      constraint "state_notice_done_pkey" primary key ("id"));`);
    this.addSql(
      `create unique index "state_notice_done_transfer_id_notice_key_unique" on "state_notice_done" ("transfer_id", "notice_key");`,
    );
    this.addSql(
      `alter table "state_notice_done" add constraint "state_notice_done_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );
    this.addSql(
      `alter table "state_notice_done" add constraint "state_notice_done_organization_id_foreign" foreign key ("organization_id") references "organization" ("id") on update restrict on delete restrict;`,
    );
    this.addSql(
      `alter table "state_notice_done" add constraint "state_notice_done_done_by_id_foreign" foreign key ("done_by_id") references "app_user" ("id") on update restrict on delete restrict;`,
    );
    this.addSql(
      `create trigger "state_notice_done_no_update_delete" before update or delete on "state_notice_done" for each row execute function hatchway_append_only();`,
    );
    this.addSql(
      `create trigger "state_notice_done_no_truncate" before truncate on "state_notice_done" for each statement execute function hatchway_append_only();`,
    );
    this.addSql(`do $$ begin
      if exists (select 1 from pg_roles where rolname = 'hatchway_app') then
        revoke update, delete, truncate on "state_notice_done" from hatchway_app;
      end if;
    end $$;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "state_notice_done";`);
  }
}
