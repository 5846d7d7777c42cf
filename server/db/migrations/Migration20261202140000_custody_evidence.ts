import { Migration } from "@mikro-orm/migrations";

/**
 * Custody evidence (issue 12): photos at handoffs and check-in (append-only, like the custody log),
 * the receiver's one-time delivery codes (hashed), and losses at arrival in the register.
 */
export class Migration20261202140000_custody_evidence extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "transfer_photo" ("id" uuid not null, "transfer_id" uuid not null, "moment" text check ("moment" in ('handoff', 'check_in')) not null, "handoff_index" int null, "subject" text check ("subject" in ('box_outside', 'seal', 'animal', 'other')) not null, "container_id" uuid null, "animal_id" uuid null, "caption" varchar(200) null, "storage_key" varchar(300) not null, "sha256" varchar(64) not null, "content_type" text check ("content_type" in ('image/jpeg', 'image/png')) not null, "size_bytes" int not null, "uploaded_by_id" uuid not null, "uploaded_by_name" varchar(200) not null, "custody_seq" int not null, "created_at" timestamptz not null, constraint "transfer_photo_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "transfer_photo" add constraint "transfer_photo_storage_key_unique" unique ("storage_key");`,
    );
    this.addSql(
      `create index "transfer_photo_transfer_id_created_at_index" on "transfer_photo" ("transfer_id", "created_at");`,
    );
    this.addSql(
      `alter table "transfer_photo" add constraint "transfer_photo_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );
    // Evidence: no change, no delete, no truncate (the function comes with the custody log's migration).
    this.addSql(
      `create trigger "transfer_photo_no_update_delete" before update or delete on "transfer_photo" for each row execute function hatchway_append_only();`,
    );
    this.addSql(
      `create trigger "transfer_photo_no_truncate" before truncate on "transfer_photo" for each statement execute function hatchway_append_only();`,
    );
    // Where the app's own login exists (D18), it may add photos but never change or remove one.
    this.addSql(`do $$ begin
      if exists (select 1 from pg_roles where rolname = 'hatchway_app') then
        revoke update, delete, truncate on "transfer_photo" from hatchway_app;
      end if;
    end $$;`);

    this.addSql(
      `create table "delivery_code" ("id" uuid not null, "transfer_id" uuid not null, "code_hash" varchar(64) not null, "issued_by_id" uuid not null, "issued_by_name" varchar(200) not null, "expires_at" timestamptz not null, "used_at" timestamptz null, "used_by_id" uuid null, "revoked_at" timestamptz null, "failed_attempts" int not null default 0, "created_at" timestamptz not null, constraint "delivery_code_pkey" primary key ("id"));`,
    );
    this.addSql(
      `create index "delivery_code_transfer_id_created_at_index" on "delivery_code" ("transfer_id", "created_at");`,
    );
    this.addSql(
      `alter table "delivery_code" add constraint "delivery_code_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );

    this.addSql(`alter table "register_entry" drop constraint if exists "register_entry_condition_check";`);
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_condition_check" check ("condition" in ('well', 'problem', 'dead_on_arrival', 'missing'));`,
    );
    this.addSql(`alter table "register_entry" add column "weight_g" double precision null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "transfer_photo" cascade;`);
    this.addSql(`drop table if exists "delivery_code" cascade;`);
    this.addSql(`delete from "register_entry" where "condition" in ('dead_on_arrival', 'missing');`);
    this.addSql(`alter table "register_entry" drop constraint if exists "register_entry_condition_check";`);
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_condition_check" check ("condition" in ('well', 'problem'));`,
    );
    this.addSql(`alter table "register_entry" drop column "weight_g";`);
  }
}
