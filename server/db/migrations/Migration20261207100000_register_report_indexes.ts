import { Migration } from "@mikro-orm/migrations";

/**
 * The yearly report reads only standing events (none replaced by a correction) of the entries a
 * permit covers (issue 15 §6). Corrections are few: a partial index on the event they replace
 * lets the report skip the replaced ones without reading every event. The entries linked to a
 * permit are found through a GIN index on `permit_ids` (also the register's permit filter).
 */
export class Migration20261207100000_register_report_indexes extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create index "register_event_corrects_event_id_index" on "register_event" ("corrects_event_id") where "corrects_event_id" is not null;`,
    );
    this.addSql(`create index "register_entry_permit_ids_index" on "register_entry" using gin ("permit_ids");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "register_event_corrects_event_id_index";`);
    this.addSql(`drop index if exists "register_entry_permit_ids_index";`);
  }
}
