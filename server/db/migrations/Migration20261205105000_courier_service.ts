import { Migration } from "@mikro-orm/migrations";

/**
 * A sender asks a courier service to carry a transfer (issue 14, §3); the service's manager then
 * assigns its couriers to the legs.
 */
export class Migration20261205105000_courier_service extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "transfer" add column "courier_service_id" uuid null;`);
    this.addSql(
      `alter table "transfer" add constraint "transfer_courier_service_id_foreign" foreign key ("courier_service_id") references "organization" ("id") on update cascade on delete set null;`,
    );
    this.addSql(`create index "transfer_courier_service_id_index" on "transfer" ("courier_service_id");`);
  }
}
