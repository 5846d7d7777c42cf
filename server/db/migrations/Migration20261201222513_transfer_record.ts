import { Migration } from "@mikro-orm/migrations";

export class Migration20261201222513_transfer_record extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "idempotency_key" ("id" uuid not null, "actor_id" uuid not null, "key" varchar(255) not null, "scope" varchar(200) not null, "request_hash" varchar(64) not null, "status" text check ("status" in ('in_progress', 'done')) not null, "response_status" int null, "response_body" jsonb null, "created_at" timestamptz not null, constraint "idempotency_key_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "idempotency_key" add constraint "idempotency_key_actor_id_key_unique" unique ("actor_id", "key");`,
    );

    this.addSql(
      `create table "taxon" ("id" uuid not null, "rank" text check ("rank" in ('class', 'order', 'family', 'genus', 'species', 'subspecies')) not null, "scientific_name" varchar(200) not null, "parent_id" uuid null, "common_names" text[] not null default '{}', "synonyms" text[] not null default '{}', "venomous" boolean not null default false, "profile_group" text check ("profile_group" in ('temperate_aquatic_turtle', 'tropical_tortoise', 'temperate_tortoise', 'desert_reptile', 'temperate_snake', 'tropical_snake', 'tropical_lizard', 'temperate_lizard', 'salamander', 'frog_toad', 'tropical_frog', 'crocodilian')) null, constraint "taxon_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "taxon" add constraint "taxon_scientific_name_unique" unique ("scientific_name");`);
    this.addSql(`create index "taxon_parent_id_index" on "taxon" ("parent_id");`);

    this.addSql(
      `create table "taxon_name" ("id" uuid not null, "taxon_id" uuid not null, "name" varchar(200) not null, "kind" text check ("kind" in ('scientific', 'common', 'synonym')) not null, constraint "taxon_name_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "taxon_name_taxon_id_index" on "taxon_name" ("taxon_id");`);

    this.addSql(
      `create table "transfer" ("id" uuid not null, "number" varchar(20) not null, "status" text check ("status" in ('draft', 'awaiting_receiver', 'ready', 'in_transit', 'delivered', 'checked_in', 'closed', 'cancelled')) not null default 'draft', "version" int not null default 1, "sender_organization_id" uuid not null, "sender_contact_id" uuid null, "receiver_organization_id" uuid not null, "receiver_contact_id" uuid null, "origin_street" varchar(200) not null, "origin_city" varchar(100) not null, "origin_state" varchar(2) not null, "origin_zip" varchar(10) not null, "origin_lat" double precision null, "origin_lon" double precision null, "origin_time_zone" varchar(64) null, "destination_street" varchar(200) not null, "destination_city" varchar(100) not null, "destination_state" varchar(2) not null, "destination_zip" varchar(10) not null, "destination_lat" double precision null, "destination_lon" double precision null, "destination_time_zone" varchar(64) null, "mode" text check ("mode" in ('overnight_air', 'ground_courier', 'hand_delivery')) not null, "planned_departure_at" timestamptz not null, "expected_arrival_at" timestamptz not null, "purpose" text check ("purpose" in ('education_exhibition', 'breeding', 'private_keeping', 'rescue_rehoming', 'scientific', 'commercial_sale')) not null, "sale" boolean not null, "sale_price_usd" double precision null, "handling_notes" text null, "sender_private_notes" text null, "receiver_private_notes" text null, "confirmed_at" timestamptz null, "confirmed_by_id" uuid null, "cancelled_reason" text null, "reconfirmation_reason" text null, "created_by_id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, constraint "transfer_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "transfer" add constraint "transfer_number_unique" unique ("number");`);

    this.addSql(
      `create table "transfer_change" ("id" uuid not null, "transfer_id" uuid not null, "actor_id" uuid not null, "field" varchar(200) not null, "old_value" jsonb null, "new_value" jsonb null, "created_at" timestamptz not null, constraint "transfer_change_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "transfer_change_transfer_id_index" on "transfer_change" ("transfer_id");`);

    this.addSql(
      `create table "custody_entry" ("id" uuid not null, "transfer_id" uuid not null, "seq" int not null, "kind" varchar(40) not null, "actor_id" uuid null, "actor_name" varchar(200) not null, "at" timestamptz not null, "payload" jsonb not null, "prev_hash" varchar(64) not null, "hash" varchar(64) not null, constraint "custody_entry_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "custody_entry" add constraint "custody_entry_transfer_id_seq_unique" unique ("transfer_id", "seq");`,
    );

    this.addSql(
      `create table "container" ("id" uuid not null, "transfer_id" uuid not null, "key" varchar(64) not null, "position" int not null, "label" varchar(80) not null, "length_mm" double precision not null, "width_mm" double precision not null, "height_mm" double precision not null, "wall_material" text check ("wall_material" in ('eps', 'corrugated')) not null, "wall_thickness_mm" double precision not null, "pack" text check ("pack" in ('none', 'heat_40h', 'heat_72h', 'cold')) not null, "seal_number" varchar(60) null, constraint "container_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "container_transfer_id_index" on "container" ("transfer_id");`);

    this.addSql(
      `create table "animal" ("id" uuid not null, "transfer_id" uuid not null, "container_id" uuid null, "position" int not null, "taxon_id" uuid not null, "count" int not null, "sex" text check ("sex" in ('male', 'female', 'unknown')) not null, "identifier" varchar(120) null, "identifier_kind" text check ("identifier_kind" in ('microchip', 'shell_notch', 'photo_id', 'band', 'other')) null, "origin" text check ("origin" in ('captive_bred', 'captive_hatched', 'wild_caught', 'long_term_captive', 'rescued')) not null, "length_mm" double precision null, "length_kind" text check ("length_kind" in ('carapace', 'snout_vent', 'total')) null, "weight_g" double precision null, "hatch_date" date null, "notes" text null, constraint "animal_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "animal_transfer_id_index" on "animal" ("transfer_id");`);

    this.addSql(
      `create table "register_entry" ("id" uuid not null, "organization_id" uuid not null, "taxon_id" uuid not null, "sex" text check ("sex" in ('male', 'female', 'unknown')) not null, "count" int not null, "identifier" varchar(120) null, "date_acquired" date not null, "source_organization_id" uuid not null, "source_organization_name" varchar(200) not null, "transfer_id" uuid not null, "transfer_number" varchar(20) not null, "animal_id" uuid not null, "condition" text check ("condition" in ('well', 'problem')) not null, "notes" text null, "created_at" timestamptz not null, constraint "register_entry_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "register_entry_organization_id_index" on "register_entry" ("organization_id");`);

    this.addSql(
      `create table "transfer_message" ("id" uuid not null, "transfer_id" uuid not null, "author_id" uuid not null, "body" text not null, "created_at" timestamptz not null, constraint "transfer_message_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "transfer_message_transfer_id_index" on "transfer_message" ("transfer_id");`);

    this.addSql(
      `create table "leg" ("id" uuid not null, "transfer_id" uuid not null, "sequence" int not null, "courier_id" uuid not null, "from_label" varchar(120) null, "to_label" varchar(120) null, constraint "leg_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "leg_transfer_id_index" on "leg" ("transfer_id");`);
    this.addSql(`create index "leg_courier_id_index" on "leg" ("courier_id");`);

    this.addSql(
      `create table "check_in" ("id" uuid not null, "transfer_id" uuid not null, "signed_by_id" uuid not null, "signed_name" varchar(120) not null, "signed_at" timestamptz not null, "notes" text null, constraint "check_in_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "check_in" add constraint "check_in_transfer_id_unique" unique ("transfer_id");`);

    this.addSql(
      `create table "check_in_item" ("id" uuid not null, "check_in_id" uuid not null, "animal_id" uuid not null, "arrived_well" int not null, "arrived_problem" int not null, "dead_on_arrival" int not null, "missing" int not null, "problem" text null, "weight_g" double precision null, "notes" text null, constraint "check_in_item_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "check_in_item_check_in_id_index" on "check_in_item" ("check_in_id");`);

    this.addSql(
      `create table "check_in_extra" ("id" uuid not null, "check_in_id" uuid not null, "taxon_id" uuid not null, "count" int not null, "sex" text check ("sex" in ('male', 'female', 'unknown')) not null, "notes" text null, constraint "check_in_extra_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "check_in_extra_check_in_id_index" on "check_in_extra" ("check_in_id");`);

    this.addSql(
      `alter table "taxon" add constraint "taxon_parent_id_foreign" foreign key ("parent_id") references "taxon" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "taxon_name" add constraint "taxon_name_taxon_id_foreign" foreign key ("taxon_id") references "taxon" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "transfer" add constraint "transfer_sender_organization_id_foreign" foreign key ("sender_organization_id") references "organization" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "transfer" add constraint "transfer_sender_contact_id_foreign" foreign key ("sender_contact_id") references "app_user" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "transfer" add constraint "transfer_receiver_organization_id_foreign" foreign key ("receiver_organization_id") references "organization" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "transfer" add constraint "transfer_receiver_contact_id_foreign" foreign key ("receiver_contact_id") references "app_user" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "transfer" add constraint "transfer_confirmed_by_id_foreign" foreign key ("confirmed_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "transfer" add constraint "transfer_created_by_id_foreign" foreign key ("created_by_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "transfer_change" add constraint "transfer_change_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "transfer_change" add constraint "transfer_change_actor_id_foreign" foreign key ("actor_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "custody_entry" add constraint "custody_entry_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );

    this.addSql(
      `alter table "container" add constraint "container_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "animal" add constraint "animal_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "animal" add constraint "animal_container_id_foreign" foreign key ("container_id") references "container" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "animal" add constraint "animal_taxon_id_foreign" foreign key ("taxon_id") references "taxon" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "register_entry" add constraint "register_entry_organization_id_foreign" foreign key ("organization_id") references "organization" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_taxon_id_foreign" foreign key ("taxon_id") references "taxon" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_source_organization_id_foreign" foreign key ("source_organization_id") references "organization" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_animal_id_foreign" foreign key ("animal_id") references "animal" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "transfer_message" add constraint "transfer_message_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "transfer_message" add constraint "transfer_message_author_id_foreign" foreign key ("author_id") references "app_user" ("id") on update cascade;`,
    );

    // The lists page by departure then id (keyset): one index per way a caller sees transfers.
    this.addSql(
      `create index "transfer_sender_departure_index" on "transfer" ("sender_organization_id", "planned_departure_at" desc, "id" desc);`,
    );
    this.addSql(
      `create index "transfer_receiver_departure_index" on "transfer" ("receiver_organization_id", "planned_departure_at" desc, "id" desc);`,
    );
    this.addSql(`create index "transfer_departure_index" on "transfer" ("planned_departure_at" desc, "id" desc);`);
    this.addSql(
      `create index "register_entry_org_date_index" on "register_entry" ("organization_id", "date_acquired" desc);`,
    );

    // Typo-tolerant species search.
    this.addSql(`create index "taxon_name_trgm_index" on "taxon_name" using gin (lower("name") gin_trgm_ops);`);

    // One record per handoff position: a second confirmation of the same handoff fails here
    // even if two requests slipped past the application's checks.
    this.addSql(
      `create unique index "custody_entry_one_handoff_index" on "custody_entry" ("transfer_id", (("payload"->>'handoffIndex')::int)) where "kind" = 'handoff';`,
    );

    // The custody log and the edit history are append-only in the database itself.
    this.addSql(`create function hatchway_append_only() returns trigger language plpgsql as $$
      begin
        raise exception '% is append-only: % is not allowed', tg_table_name, tg_op using errcode = 'P0001';
      end $$;`);
    for (const table of ["custody_entry", "transfer_change"]) {
      this.addSql(
        `create trigger "${table}_no_update_delete" before update or delete on "${table}" for each row execute function hatchway_append_only();`,
      );
      this.addSql(
        `create trigger "${table}_no_truncate" before truncate on "${table}" for each statement execute function hatchway_append_only();`,
      );
    }

    this.addSql(
      `alter table "leg" add constraint "leg_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "leg" add constraint "leg_courier_id_foreign" foreign key ("courier_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "check_in" add constraint "check_in_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "check_in" add constraint "check_in_signed_by_id_foreign" foreign key ("signed_by_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "check_in_item" add constraint "check_in_item_check_in_id_foreign" foreign key ("check_in_id") references "check_in" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "check_in_item" add constraint "check_in_item_animal_id_foreign" foreign key ("animal_id") references "animal" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "check_in_extra" add constraint "check_in_extra_check_in_id_foreign" foreign key ("check_in_id") references "check_in" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "check_in_extra" add constraint "check_in_extra_taxon_id_foreign" foreign key ("taxon_id") references "taxon" ("id") on update cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "taxon" drop constraint "taxon_parent_id_foreign";`);

    this.addSql(`alter table "taxon_name" drop constraint "taxon_name_taxon_id_foreign";`);

    this.addSql(`alter table "animal" drop constraint "animal_taxon_id_foreign";`);

    this.addSql(`alter table "register_entry" drop constraint "register_entry_taxon_id_foreign";`);

    this.addSql(`alter table "check_in_extra" drop constraint "check_in_extra_taxon_id_foreign";`);

    this.addSql(`alter table "transfer_change" drop constraint "transfer_change_transfer_id_foreign";`);

    this.addSql(`alter table "custody_entry" drop constraint "custody_entry_transfer_id_foreign";`);

    this.addSql(`alter table "container" drop constraint "container_transfer_id_foreign";`);

    this.addSql(`alter table "animal" drop constraint "animal_transfer_id_foreign";`);

    this.addSql(`alter table "register_entry" drop constraint "register_entry_transfer_id_foreign";`);

    this.addSql(`alter table "transfer_message" drop constraint "transfer_message_transfer_id_foreign";`);

    this.addSql(`alter table "leg" drop constraint "leg_transfer_id_foreign";`);

    this.addSql(`alter table "check_in" drop constraint "check_in_transfer_id_foreign";`);

    this.addSql(`alter table "animal" drop constraint "animal_container_id_foreign";`);

    this.addSql(`alter table "register_entry" drop constraint "register_entry_animal_id_foreign";`);

    this.addSql(`alter table "check_in_item" drop constraint "check_in_item_animal_id_foreign";`);

    this.addSql(`alter table "check_in_item" drop constraint "check_in_item_check_in_id_foreign";`);

    this.addSql(`alter table "check_in_extra" drop constraint "check_in_extra_check_in_id_foreign";`);

    this.addSql(`drop table if exists "idempotency_key" cascade;`);

    this.addSql(`drop table if exists "taxon" cascade;`);

    this.addSql(`drop table if exists "taxon_name" cascade;`);

    this.addSql(`drop table if exists "transfer" cascade;`);

    this.addSql(`drop table if exists "transfer_change" cascade;`);

    this.addSql(`drop table if exists "custody_entry" cascade;`);

    this.addSql(`drop table if exists "container" cascade;`);

    this.addSql(`drop table if exists "animal" cascade;`);

    this.addSql(`drop table if exists "register_entry" cascade;`);

    this.addSql(`drop table if exists "transfer_message" cascade;`);

    this.addSql(`drop table if exists "leg" cascade;`);

    this.addSql(`drop table if exists "check_in" cascade;`);

    this.addSql(`drop table if exists "check_in_item" cascade;`);

    this.addSql(`drop table if exists "check_in_extra" cascade;`);
  }
}
