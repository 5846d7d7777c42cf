import { Migration } from "@mikro-orm/migrations";

/**
 * Compliance: the versioned rule library, permits and certificates held by organisations with
 * their scans (the files live in S3; only key, checksum and type are here), the documents a
 * transfer carries, and the evaluations and overrides behind each "ready to ship".
 */
export class Migration20261201300000_compliance extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "compliance_rule" ("id" uuid not null, "rule_key" text not null, "version" int not null, "data" jsonb not null, "retired" boolean not null default false, "reviewed_on" date not null, "reviewed_by" text not null, "created_by_id" uuid null, "created_at" timestamptz not null, constraint "compliance_rule_pkey" primary key ("id"), constraint "compliance_rule_version_check" check ("version" >= 1), constraint "compliance_rule_key_matches_data" check ("data"->>'id' = "rule_key" and ("data"->>'version')::int = "version"));`,
    );
    this.addSql(
      `alter table "compliance_rule" add constraint "compliance_rule_rule_key_version_unique" unique ("rule_key", "version");`,
    );
    this.addSql(
      `alter table "compliance_rule" add constraint "compliance_rule_created_by_id_foreign" foreign key ("created_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `create table "permit_document" ("id" uuid not null, "organization_id" uuid not null, "kind" text check ("kind" in ('state_import_permit', 'possession_permit', 'export_permit', 'federal_permit', 'captive_bred_registration', 'cvi')) not null, "jurisdiction" varchar(2) not null, "number" varchar(200) not null, "holder_name" varchar(200) not null, "species_covered" text[] not null default '{}', "valid_from" date null, "valid_to" date null, "issued_on" date null, "veterinarian" varchar(200) null, "veterinarian_accredited" boolean null, "inspection_date" date null, "statements" text[] not null default '{}', "animals_covered" jsonb not null default '[]', "notes" text null, "created_by_id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "reminder_sent_at" timestamptz null, constraint "permit_document_pkey" primary key ("id"), constraint "permit_document_validity_check" check ("valid_from" is null or "valid_to" is null or "valid_from" <= "valid_to"));`,
    );
    this.addSql(`create index "permit_document_organization_id_index" on "permit_document" ("organization_id");`);
    // The expiry reminder looks for documents ending soon that have not been reminded about.
    this.addSql(
      `create index "permit_document_reminder_index" on "permit_document" ("valid_to") where "reminder_sent_at" is null;`,
    );
    this.addSql(
      `alter table "permit_document" add constraint "permit_document_organization_id_foreign" foreign key ("organization_id") references "organization" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "permit_document" add constraint "permit_document_created_by_id_foreign" foreign key ("created_by_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `create table "document_scan" ("id" uuid not null, "document_id" uuid not null, "storage_key" varchar(300) not null, "sha256" varchar(64) not null, "content_type" text check ("content_type" in ('application/pdf', 'image/jpeg', 'image/png')) not null, "size_bytes" int not null, "original_name" varchar(200) not null, "uploaded_by_id" uuid not null, "created_at" timestamptz not null, constraint "document_scan_pkey" primary key ("id"), constraint "document_scan_size_check" check ("size_bytes" > 0));`,
    );
    this.addSql(
      `alter table "document_scan" add constraint "document_scan_storage_key_unique" unique ("storage_key");`,
    );
    this.addSql(`create index "document_scan_document_id_index" on "document_scan" ("document_id");`);
    this.addSql(
      `alter table "document_scan" add constraint "document_scan_document_id_foreign" foreign key ("document_id") references "permit_document" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "document_scan" add constraint "document_scan_uploaded_by_id_foreign" foreign key ("uploaded_by_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `create table "transfer_document" ("id" uuid not null, "transfer_id" uuid not null, "document_id" uuid not null, "attached_by_id" uuid not null, "created_at" timestamptz not null, constraint "transfer_document_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "transfer_document" add constraint "transfer_document_transfer_id_document_id_unique" unique ("transfer_id", "document_id");`,
    );
    this.addSql(`create index "transfer_document_document_id_index" on "transfer_document" ("document_id");`);
    this.addSql(
      `alter table "transfer_document" add constraint "transfer_document_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "transfer_document" add constraint "transfer_document_document_id_foreign" foreign key ("document_id") references "permit_document" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "transfer_document" add constraint "transfer_document_attached_by_id_foreign" foreign key ("attached_by_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `create table "compliance_evaluation" ("id" uuid not null, "transfer_id" uuid not null, "evaluated_at" timestamptz not null, "verdict" text check ("verdict" in ('clear', 'needs_documents', 'blocked')) not null, "rules_used" jsonb not null, "result" jsonb not null, "transfer_version" int not null, constraint "compliance_evaluation_pkey" primary key ("id"));`,
    );
    this.addSql(
      `create index "compliance_evaluation_transfer_id_index" on "compliance_evaluation" ("transfer_id", "evaluated_at" desc);`,
    );
    this.addSql(
      `alter table "compliance_evaluation" add constraint "compliance_evaluation_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );

    this.addSql(
      `create table "compliance_override" ("id" uuid not null, "transfer_id" uuid not null, "transfer_version" int not null, "reason" text not null, "admin_id" uuid not null, "created_at" timestamptz not null, constraint "compliance_override_pkey" primary key ("id"));`,
    );
    this.addSql(
      `create index "compliance_override_transfer_id_index" on "compliance_override" ("transfer_id", "transfer_version");`,
    );
    this.addSql(
      `alter table "compliance_override" add constraint "compliance_override_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "compliance_override" add constraint "compliance_override_admin_id_foreign" foreign key ("admin_id") references "app_user" ("id") on update cascade;`,
    );

    // Rule versions, evaluations and overrides are records: never changed or removed
    // (hatchway_append_only() comes from the transfer-record migration).
    for (const table of ["compliance_rule", "compliance_evaluation", "compliance_override"]) {
      this.addSql(
        `create trigger "${table}_no_update_delete" before update or delete on "${table}" for each row execute function hatchway_append_only();`,
      );
      this.addSql(
        `create trigger "${table}_no_truncate" before truncate on "${table}" for each statement execute function hatchway_append_only();`,
      );
    }
  }

  override async down(): Promise<void> {
    for (const table of [
      "compliance_override",
      "compliance_evaluation",
      "transfer_document",
      "document_scan",
      "permit_document",
      "compliance_rule",
    ]) {
      this.addSql(`drop table if exists "${table}" cascade;`);
    }
  }
}
