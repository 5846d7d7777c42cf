import { Migration } from "@mikro-orm/migrations";

const PROFILE_GROUPS = `'temperate_aquatic_turtle', 'tropical_tortoise', 'temperate_tortoise', 'desert_reptile', 'temperate_snake', 'tropical_snake', 'tropical_lizard', 'temperate_lizard', 'salamander', 'frog_toad', 'tropical_frog', 'crocodilian'`;
const VERDICTS = `'ship', 'pack', 'hold', 'do_not_ship', 'forecast_unavailable'`;
const ADVICE_CODES = `'ship_as_planned', 'add_heat_pack', 'add_cold_pack', 'remove_pack', 'hold_at_staffed_facility', 'postpone', 'retry_when_forecast_available'`;

/** Temperature safety: the forecast cache, the editable profiles, stored checks and advice-change alerts. */
export class Migration20261201310000_temperature extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "forecast_hour" ("lat_e2" int not null, "lon_e2" int not null, "hour" timestamptz not null, "temp_f" double precision not null, "fetched_at" timestamptz not null, constraint "forecast_hour_pkey" primary key ("lat_e2", "lon_e2", "hour"));`,
    );

    this.addSql(
      `create table "temperature_profile" ("profile_group" text check ("profile_group" in (${PROFILE_GROUPS})) not null, "data" jsonb not null, "updated_by_id" uuid null, "updated_at" timestamptz not null, constraint "temperature_profile_pkey" primary key ("profile_group"));`,
    );
    this.addSql(
      `alter table "temperature_profile" add constraint "temperature_profile_updated_by_id_foreign" foreign key ("updated_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `create table "temperature_check" ("id" uuid not null, "transfer_id" uuid not null, "transfer_version" int not null, "mark" text check ("mark" in ('24h', '4h', 'manual', 'gate')) not null, "checked_at" timestamptz not null, "verdict" text check ("verdict" in (${VERDICTS})) not null, "advice_code" text check ("advice_code" in (${ADVICE_CODES})) not null, "result" jsonb not null, constraint "temperature_check_pkey" primary key ("id"));`,
    );
    this.addSql(
      `create index "temperature_check_transfer_id_checked_at_index" on "temperature_check" ("transfer_id", "checked_at");`,
    );
    this.addSql(
      `alter table "temperature_check" add constraint "temperature_check_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `create table "temperature_alert" ("id" uuid not null, "transfer_id" uuid not null, "previous_check_id" uuid not null, "check_id" uuid not null, "previous_advice_code" text check ("previous_advice_code" in (${ADVICE_CODES})) not null, "advice_code" text check ("advice_code" in (${ADVICE_CODES})) not null, "created_at" timestamptz not null, constraint "temperature_alert_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "temperature_alert_transfer_id_index" on "temperature_alert" ("transfer_id");`);
    this.addSql(
      `alter table "temperature_alert" add constraint "temperature_alert_transfer_id_foreign" foreign key ("transfer_id") references "transfer" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "temperature_alert" add constraint "temperature_alert_previous_check_id_foreign" foreign key ("previous_check_id") references "temperature_check" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "temperature_alert" add constraint "temperature_alert_check_id_foreign" foreign key ("check_id") references "temperature_check" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "temperature_alert" cascade;`);
    this.addSql(`drop table if exists "temperature_check" cascade;`);
    this.addSql(`drop table if exists "temperature_profile" cascade;`);
    this.addSql(`drop table if exists "forecast_hour" cascade;`);
  }
}
