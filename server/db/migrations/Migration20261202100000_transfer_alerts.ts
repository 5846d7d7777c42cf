import { Migration } from "@mikro-orm/migrations";

const ALERT_KINDS = `'seal_mismatch', 'seal_broken', 'count_mismatch', 'early_pickup', 'implausible_speed', 'unexpected_party', 'temperature_out_of_range'`;

/**
 * Alerts on a transfer: raised by the server, never deleted; the only change the database allows
 * is the one acknowledgement (who, when, note), written once.
 */
export class Migration20261202100000_transfer_alerts extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "transfer_alert" ("id" uuid not null, "transfer_id" uuid not null, "kind" text check ("kind" in (${ALERT_KINDS})) not null, "at" timestamptz not null, "message" text not null, "data" jsonb not null default '{}', "custody_seq" int null, "acknowledged_at" timestamptz null, "acknowledged_by_id" uuid null, "acknowledged_by_name" varchar(200) null, "acknowledgement_note" text null, constraint "transfer_alert_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "transfer_alert_transfer_id_at_index" on "transfer_alert" ("transfer_id", "at");`);
    this.addSql(
      `alter table "transfer_alert" add constraint "transfer_alert_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update restrict on delete restrict;`,
    );
    this.addSql(`
      create function transfer_alert_guard() returns trigger language plpgsql as $$
      begin
        if tg_op = 'UPDATE' then
          if old.acknowledged_at is null and new.acknowledged_at is not null
             and new.acknowledgement_note is not null
             and (new.id, new.transfer_id, new.kind, new.at, new.message, new.data, new.custody_seq)
                 is not distinct from (old.id, old.transfer_id, old.kind, old.at, old.message, old.data, old.custody_seq) then
            return new;
          end if;
        end if;
        raise exception 'transfer_alert is append-only: an alert is acknowledged once and never changed or removed';
      end $$;`);
    this.addSql(
      `create trigger transfer_alert_no_change before update or delete on "transfer_alert" for each row execute function transfer_alert_guard();`,
    );
    this.addSql(
      `create trigger transfer_alert_no_truncate before truncate on "transfer_alert" for each statement execute function transfer_alert_guard();`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "transfer_alert" cascade;`);
    this.addSql(`drop function if exists transfer_alert_guard();`);
  }
}
