import { Migration } from "@mikro-orm/migrations";

/**
 * Rule coverage: one row per jurisdiction (federal, states, DC, territories) saying whether its
 * rules in the library were reviewed, when and by whom, and the offices to confirm with. The
 * compliance verdict gains "unverified" (no rule stops the move, but a jurisdiction on the route
 * is not reviewed).
 */
export class Migration20261202130200_jurisdiction_coverage extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "jurisdiction_coverage" ("jurisdiction" varchar(2) not null, "wildlife_agency_name" text not null, "wildlife_agency_url" text not null, "state_veterinarian_name" text not null, "state_veterinarian_url" text not null, "source" text not null, "notes" text null, "reviewed_on" date null, "reviewed_by" text null, "updated_at" timestamptz not null, "updated_by_id" uuid null, constraint "jurisdiction_coverage_pkey" primary key ("jurisdiction"), constraint "jurisdiction_coverage_review_check" check (("reviewed_on" is null) = ("reviewed_by" is null)));`,
    );
    this.addSql(
      `alter table "jurisdiction_coverage" add constraint "jurisdiction_coverage_updated_by_id_foreign" foreign key ("updated_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );
    this.addSql(`alter table "compliance_evaluation" drop constraint if exists "compliance_evaluation_verdict_check";`);
    this.addSql(
      `alter table "compliance_evaluation" add constraint "compliance_evaluation_verdict_check" check ("verdict" in ('clear', 'unverified', 'needs_documents', 'blocked'));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "jurisdiction_coverage" cascade;`);
    this.addSql(`alter table "compliance_evaluation" drop constraint if exists "compliance_evaluation_verdict_check";`);
    this.addSql(
      `alter table "compliance_evaluation" add constraint "compliance_evaluation_verdict_check" check ("verdict" in ('clear', 'needs_documents', 'blocked'));`,
    );
  }
}
