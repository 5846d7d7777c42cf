import { Migration } from "@mikro-orm/migrations";

const kinds = (values: string[]) => values.map((value) => `'${value}'`).join(", ");
const EVENT_KINDS = [
  "acquired",
  "hatched",
  "measured",
  "died",
  "euthanised",
  "sold",
  "given",
  "transferred_out",
  "loaned_out",
  "loan_returned",
  "escaped",
  "released",
  "missing_on_arrival",
  "split_off",
  "split_from",
  "note",
  "voided",
];
const STATUSES = ["in_care", "died", "transferred_out", "on_loan", "escaped_or_released", "never_arrived", "split"];
const WAYS = ["transfer", "purchase", "gift", "loan_in", "rescue", "other"];

/**
 * The keeper's ledger (issue 15): register entries for animals added by hand or imported (no
 * transfer behind them), individual or group, with origin, hatch date, permits and quarantine; the
 * append-only `register_event` table holding everything that happens to them; permits' reporting
 * periods; the organisation's quarantine length; the animal line's register entry (a transfer started
 * from the register). Entries made by check-ins before this change get the events they imply.
 */
export class Migration20261204100000_register_ledger extends Migration {
  override async up(): Promise<void> {
    for (const column of [
      "source_organization_id",
      "source_organization_name",
      "transfer_id",
      "transfer_number",
      "animal_id",
      "condition",
    ])
      this.addSql(`alter table "register_entry" alter column "${column}" drop not null;`);
    this.addSql(`alter table "register_entry"
      add column "kind" text check ("kind" in ('individual', 'group')) not null default 'group',
      add column "identifier_kind" varchar(40) null,
      add column "origin" varchar(40) null,
      add column "hatch_date" date null,
      add column "source_permit_number" varchar(120) null,
      add column "acquired_how" text check ("acquired_how" in (${kinds(WAYS)})) null,
      add column "count_in_care" int not null default 0,
      add column "status" text check ("status" in (${kinds(STATUSES)})) not null default 'in_care',
      add column "quarantine_started_on" date null,
      add column "quarantine_until" date null,
      add column "previous_entry_id" uuid null,
      add column "parent_entry_id" uuid null,
      add column "permit_ids" uuid[] not null default '{}',
      add column "length_mm" double precision null,
      add column "created_by_id" uuid null;`);
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_previous_entry_id_foreign" foreign key ("previous_entry_id") references "register_entry" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "register_entry" add constraint "register_entry_parent_entry_id_foreign" foreign key ("parent_entry_id") references "register_entry" ("id") on update cascade on delete set null;`,
    );
    // The register's pages: newest acquisition first, then id, within an organisation (keyset).
    this.addSql(
      `create index "register_entry_org_page_index" on "register_entry" ("organization_id", "date_acquired" desc, "id" desc);`,
    );

    // A permit's report looks entries up by species within the organisation.
    this.addSql(`create index "register_entry_org_taxon_index" on "register_entry" ("organization_id", "taxon_id");`);
    this.addSql(`create table "register_event" (
      "id" uuid not null,
      "entry_id" uuid not null,
      "organization_id" uuid not null,
      "kind" text check ("kind" in (${kinds(EVENT_KINDS)})) not null,
      "on" date not null,
      "count" int not null check ("count" >= 0),
      "note" text null,
      "cause" text null,
      "acquired_how" text check ("acquired_how" in (${kinds(WAYS)})) null,
      "counterparty_name" varchar(200) null,
      "counterparty_address" varchar(300) null,
      "counterparty_permit_number" varchar(120) null,
      "corrects_event_id" uuid null,
      "transfer_id" uuid null,
      "other_entry_id" uuid null,
      "weight_g" double precision null,
      "length_mm" double precision null,
      "recorded_by_id" uuid null,
      "recorded_by_name" varchar(200) not null,
      "created_at" timestamptz not null,
      constraint "register_event_pkey" primary key ("id"));`);
    this.addSql(`create index "register_event_entry_id_on_index" on "register_event" ("entry_id", "on");`);
    this.addSql(
      `create index "register_event_organization_id_on_index" on "register_event" ("organization_id", "on");`,
    );
    this.addSql(
      `alter table "register_event" add constraint "register_event_entry_id_foreign" foreign key ("entry_id") references "register_entry" ("id") on update restrict on delete restrict;`,
    );
    this.addSql(
      `alter table "register_event" add constraint "register_event_corrects_event_id_foreign" foreign key ("corrects_event_id") references "register_event" ("id") on update restrict on delete restrict;`,
    );
    this.addSql(
      `alter table "register_event" add constraint "register_event_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );
    // The ledger is a record a permit holder keeps: append-only, like the custody log (D6, D18).
    this.addSql(
      `create trigger "register_event_no_update_delete" before update or delete on "register_event" for each row execute function hatchway_append_only();`,
    );
    this.addSql(
      `create trigger "register_event_no_truncate" before truncate on "register_event" for each statement execute function hatchway_append_only();`,
    );
    this.addSql(`do $$ begin
      if exists (select 1 from pg_roles where rolname = 'hatchway_app') then
        revoke update, delete, truncate on "register_event" from hatchway_app;
      end if;
    end $$;`);

    // Check-ins made before: what each entry already said, as events (acquired; a death on arrival;
    // animals that never came), and the entry's count and status from them.
    this
      .addSql(`insert into "register_event" ("id", "entry_id", "organization_id", "kind", "on", "count", "note", "acquired_how", "counterparty_name", "transfer_id", "recorded_by_name", "created_at")
      select gen_random_uuid(), e."id", e."organization_id", 'acquired', e."date_acquired", e."count", e."notes", 'transfer', e."source_organization_name", e."transfer_id", 'Hatchway (from the check-in)', e."created_at"
      from "register_entry" e where e."condition" in ('well', 'problem', 'dead_on_arrival');`);
    this
      .addSql(`insert into "register_event" ("id", "entry_id", "organization_id", "kind", "on", "count", "cause", "note", "transfer_id", "recorded_by_name", "created_at")
      select gen_random_uuid(), e."id", e."organization_id", 'died', e."date_acquired", e."count", 'Dead on arrival', e."notes", e."transfer_id", 'Hatchway (from the check-in)', e."created_at"
      from "register_entry" e where e."condition" = 'dead_on_arrival';`);
    this
      .addSql(`insert into "register_event" ("id", "entry_id", "organization_id", "kind", "on", "count", "note", "transfer_id", "recorded_by_name", "created_at")
      select gen_random_uuid(), e."id", e."organization_id", 'missing_on_arrival', e."date_acquired", e."count", e."notes", e."transfer_id", 'Hatchway (from the check-in)', e."created_at"
      from "register_entry" e where e."condition" = 'missing';`);
    this.addSql(`update "register_entry" set
      "count_in_care" = case when "condition" in ('well', 'problem') then "count" else 0 end,
      "status" = case "condition" when 'dead_on_arrival' then 'died' when 'missing' then 'never_arrived' else 'in_care' end,
      "acquired_how" = 'transfer',
      "kind" = case when "count" = 1 and "identifier" is not null then 'individual' else 'group' end;`);
    this
      .addSql(`update "register_entry" e set "origin" = a."origin", "hatch_date" = a."hatch_date", "identifier_kind" = a."identifier_kind", "length_mm" = a."length_mm"
      from "animal" a where a."id" = e."animal_id";`);

    this.addSql(`alter table "organization" add column "quarantine_days" int not null default 60;`);
    this.addSql(`alter table "permit_document"
      add column "report_start_month" int null check ("report_start_month" between 1 and 12),
      add column "report_due_month" int null check ("report_due_month" between 1 and 12),
      add column "report_due_day" int null check ("report_due_day" between 1 and 31),
      add column "report_reminded_30_for" date null,
      add column "report_reminded_7_for" date null;`);
    this.addSql(`alter table "animal" add column "register_entry_id" uuid null;`);
    this.addSql(
      `alter table "animal" add constraint "animal_register_entry_id_foreign" foreign key ("register_entry_id") references "register_entry" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "animal" drop column "register_entry_id";`);
    this.addSql(
      `alter table "permit_document" drop column "report_start_month", drop column "report_due_month", drop column "report_due_day", drop column "report_reminded_30_for", drop column "report_reminded_7_for";`,
    );
    this.addSql(`alter table "organization" drop column "quarantine_days";`);
    this.addSql(`drop table if exists "register_event" cascade;`);
    this.addSql(`delete from "register_entry" where "transfer_id" is null;`);
    this.addSql(`drop index if exists "register_entry_org_page_index";`);
    this.addSql(
      `alter table "register_entry" drop column "kind", drop column "identifier_kind", drop column "origin", drop column "hatch_date", drop column "source_permit_number", drop column "acquired_how", drop column "count_in_care", drop column "status", drop column "quarantine_started_on", drop column "quarantine_until", drop column "previous_entry_id", drop column "parent_entry_id", drop column "permit_ids", drop column "length_mm", drop column "created_by_id";`,
    );
  }
}
