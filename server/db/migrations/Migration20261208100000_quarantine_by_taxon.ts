import { Migration } from "@mikro-orm/migrations";

/**
 * Quarantine lengths an organisation sets for a genus or a species, beside its own length
 * (issue 15 §4: "boas longer" [practice]): `[{name, days}]`, names as the catalogue spells them.
 */
export class Migration20261208100000_quarantine_by_taxon extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "organization" add column "quarantine_overrides" jsonb not null default '[]';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "organization" drop column "quarantine_overrides";`);
  }
}
