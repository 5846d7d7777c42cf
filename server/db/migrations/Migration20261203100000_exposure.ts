import { Migration } from "@mikro-orm/migrations";

const CONDITIONINGS = `'climate_controlled', 'unconditioned'`;

/**
 * Where the box really is (issue 13): the forecast cache keeps each hour's solar radiation; a
 * transfer keeps how its vehicle is held and the driver's planned stops; each leg keeps the
 * vehicle its courier declared. Null means nobody said (the model assumes an unconditioned vehicle).
 */
export class Migration20261203100000_exposure extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "forecast_hour" add column "radiation_wm2" double precision null;`);
    this.addSql(
      `alter table "transfer" add column "vehicle" text check ("vehicle" in (${CONDITIONINGS})) null, add column "vehicle_min_f" double precision null, add column "vehicle_max_f" double precision null, add column "planned_stops" jsonb not null default '[]';`,
    );
    this.addSql(
      `alter table "leg" add column "vehicle" text check ("vehicle" in (${CONDITIONINGS})) null, add column "vehicle_min_f" double precision null, add column "vehicle_max_f" double precision null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "leg" drop column "vehicle", drop column "vehicle_min_f", drop column "vehicle_max_f";`);
    this.addSql(
      `alter table "transfer" drop column "vehicle", drop column "vehicle_min_f", drop column "vehicle_max_f", drop column "planned_stops";`,
    );
    this.addSql(`alter table "forecast_hour" drop column "radiation_wm2";`);
  }
}
