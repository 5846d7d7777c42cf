import { Migration } from "@mikro-orm/migrations";

/**
 * A courier service's runs (issue 16): one van, its drivers and set range, leaving at a time, and
 * its stops in order (pickups and drop-offs of the transfers assigned to the service), each with
 * its planned arrival and departure. A transfer is on at most one run (a partial unique index on
 * its pickup). Plain tables: the app role gets row privileges through the default privileges of
 * Migration20261202130000_least_privilege (D18).
 */
export class Migration20261206100000_runs extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "run" (
      "id" uuid not null primary key,
      "courier_organization_id" uuid not null references "organization" ("id") on update cascade,
      "depart_at" timestamptz not null,
      "climate_controlled" boolean not null,
      "vehicle_min_f" double precision null,
      "vehicle_max_f" double precision null,
      "driver_ids" uuid[] not null default '{}',
      "driving_h" double precision not null default 0,
      "road_km" double precision not null default 0,
      "finish_at" timestamptz not null,
      "rests" jsonb not null default '[]',
      "version" int not null default 1,
      "created_by_id" uuid not null references "app_user" ("id") on update cascade,
      "created_at" timestamptz not null default now(),
      "updated_at" timestamptz not null default now(),
      constraint "run_range_check" check (
        ("vehicle_min_f" is null and "vehicle_max_f" is null) or ("vehicle_min_f" <= "vehicle_max_f")
      )
    );`);
    this.addSql(`create index "run_courier_organization_id_index" on "run" ("courier_organization_id", "depart_at");`);
    this.addSql(`create table "run_stop" (
      "id" uuid not null primary key,
      "run_id" uuid not null references "run" ("id") on update cascade on delete cascade,
      "position" int not null,
      "kind" text not null check ("kind" in ('pickup', 'dropoff')),
      "transfer_id" uuid not null references "transfer" ("id") on update cascade,
      "leg_id" uuid null references "leg" ("id") on update cascade on delete set null,
      "arrive_at" timestamptz not null,
      "leave_at" timestamptz not null,
      "leg_km" double precision not null default 0,
      "place" jsonb not null,
      constraint "run_stop_position_unique" unique ("run_id", "position") deferrable initially deferred
    );`);
    this.addSql(`create index "run_stop_run_id_index" on "run_stop" ("run_id");`);
    this.addSql(`create unique index "run_stop_transfer_kind_unique" on "run_stop" ("transfer_id", "kind");`);
  }
}
