import type { EntityManager } from "@mikro-orm/postgresql";
import { boxContentsG, profileForBox, type AnimalLine } from "@shared/temperature/box-profile";
import { placeFromPosition, placeFromZip, townNear, type TransitPlace } from "@shared/temperature/places";
import { haversineKm } from "@shared/temperature/geo";
import { DEFAULT_DRIVING_OPTIONS } from "@shared/temperature/timeline";
import { RunStopSchema, type Run } from "../../db/entities/run.entity";
import type { AnimalClass } from "@shared/temperature/profiles";
import type { TemperatureReport } from "@shared/temperature/report";
import { AnimalSchema, ContainerSchema, LegSchema, type Transfer } from "../../db/entities/transfer.entity";
import { assessBoxes, unassessable, type BoxToAssess } from "./assess-boxes";
import type { WeatherSource } from "./forecasts";
import { exposureOf } from "./exposure-plan";
import { loadProfiles, type ProfileTable } from "./profiles";
import { pickupAt } from "./readings";
import { tripExposureFields } from "./trip-plan";

const CLASS_OF_TAXON: Readonly<Record<string, AnimalClass>> = { Reptilia: "reptile", Amphibia: "amphibian" };

/** The class (reptile, amphibian) of each taxon, read up the taxon tree. */
export async function animalClasses(
  em: EntityManager,
  taxonIds: readonly string[],
): Promise<Map<string, AnimalClass | null>> {
  if (taxonIds.length === 0) return new Map();
  const rows = await em.execute<{ id: string; class_name: string | null }[]>(
    `WITH RECURSIVE up AS (
       SELECT t.id AS start_id, t.id, t.parent_id, t.rank, t.scientific_name, 0 AS depth FROM taxon t WHERE t.id IN (?)
       UNION ALL
       SELECT up.start_id, p.id, p.parent_id, p.rank, p.scientific_name, up.depth + 1 FROM up JOIN taxon p ON p.id = up.parent_id WHERE up.depth < 10
     )
     SELECT start_id AS id, max(scientific_name) FILTER (WHERE rank = 'class') AS class_name FROM up GROUP BY start_id`,
    [[...new Set(taxonIds)]],
  );
  return new Map(rows.map((r) => [r.id, r.class_name ? (CLASS_OF_TAXON[r.class_name] ?? null) : null]));
}

/**
 * A transfer on a courier's run (issue 16) is in the run's van from its pickup to its drop-off,
 * which the run wrote as the transfer's planned departure and arrival. The van goes by the other
 * stops in between, so the model lays the box along the straight road from origin to destination
 * at the pace that takes exactly that long, without rests of its own (the run's rests are inside
 * the span), in the run's van: climate-controlled with its set range, or unconditioned. The air
 * along a detour is taken from the straight road's points: a simplification D38 names.
 */
function followRun(
  run: Run,
  transfer: Transfer,
  origin: TransitPlace,
  destination: TransitPlace,
): ReturnType<typeof exposureOf> {
  const spanH = Math.max(
    (transfer.expectedArrivalAt.getTime() - transfer.plannedDepartureAt.getTime()) / 3_600_000,
    1 / 60,
  );
  const roadKm = haversineKm(origin, destination) * DEFAULT_DRIVING_OPTIONS.circuityFactor;
  return {
    driving: { nameNear: townNear, averageSpeedKmh: Math.max(roadKm / spanH, 0.1), stops: [] },
    exposure: {
      vehicle: run.climateControlled ? "climate_controlled" : "unconditioned",
      vehicleRangeF:
        run.climateControlled && run.vehicleMinF != null && run.vehicleMaxF != null
          ? { min: run.vehicleMinF, max: run.vehicleMaxF }
          : null,
      stopParking: [],
    },
  };
}

/** Where a transfer starts or ends, from its stored position or, failing that, its ZIP code. */
function placeOf(t: Transfer, side: "origin" | "destination"): TransitPlace | undefined {
  const [lat, lon, zip, city, state] =
    side === "origin"
      ? [t.originLat, t.originLon, t.originZip, t.originCity, t.originState]
      : [t.destinationLat, t.destinationLon, t.destinationZip, t.destinationCity, t.destinationState];
  if (lat != null && lon != null) return placeFromPosition(lat, lon, `${city}, ${state}`);
  return placeFromZip(zip.slice(0, 5));
}

/** The boxes that hold animals, each with its profile (see profileForBox) and its contents. */
export async function boxesOf(em: EntityManager, transfer: Transfer, profiles: ProfileTable): Promise<BoxToAssess[]> {
  const [containers, animals] = await Promise.all([
    em.find(ContainerSchema, { transfer }, { orderBy: { position: "asc" } }),
    em.find(AnimalSchema, { transfer }, { populate: ["taxon"] }),
  ]);
  const classes = await animalClasses(
    em,
    animals.map((a) => a.taxon.id),
  );
  const lineOf = (a: (typeof animals)[number]): AnimalLine => ({
    count: a.count,
    weightG: a.weightG ?? null,
    profileGroup: a.taxon.getEntity().profileGroup ?? null,
    animalClass: classes.get(a.taxon.id) ?? null,
  });
  const everyLine = animals.map(lineOf);
  return containers.flatMap((c) => {
    const lines = animals.filter((a) => a.container?.id === c.id).map(lineOf);
    if (lines.length === 0) return [];
    return [
      {
        containerId: c.id,
        label: c.label,
        profile: profileForBox(lines, everyLine, profiles),
        box: {
          wall: c.wallMaterial,
          wallThicknessMm: c.wallThicknessMm,
          lengthMm: c.lengthMm,
          widthMm: c.widthMm,
          heightMm: c.heightMm,
          contentsG: boxContentsG(lines),
          pack: c.pack,
        },
      },
    ];
  });
}

/**
 * The temperature verdict of a stored transfer: its route and planned departure (or, once the box
 * is picked up, the actual pickup: the model then follows the trip as it started, with the planned
 * stops as far after it as they were after the planned departure), how the box travels (the
 * transfer's vehicle and stops, each leg's declared vehicle), each box that holds animals under
 * its animals' profile, forecasts through the cache. A place that cannot be located or a source
 * that cannot answer gives "forecast unavailable".
 */
export async function assessTransferTemperature({
  em,
  source,
  transfer,
  nowMs,
}: {
  em: EntityManager;
  source: WeatherSource | null;
  transfer: Transfer;
  nowMs: number;
}): Promise<TemperatureReport> {
  const profiles = await loadProfiles(em);
  const [boxes, legs, pickedUp, onRun] = await Promise.all([
    boxesOf(em, transfer, profiles),
    em.find(LegSchema, { transfer }, { orderBy: { sequence: "asc" } }),
    pickupAt(em, transfer.id),
    em.findOne(RunStopSchema, { transfer, kind: "pickup" }, { populate: ["run"] }),
  ]);
  const origin = placeOf(transfer, "origin");
  const destination = placeOf(transfer, "destination");
  const fallback = profileForBox([], [], profiles);
  const plannedMs = transfer.plannedDepartureAt.getTime();
  const planned = exposureOf(tripExposureFields(transfer, legs), plannedMs);
  const { driving, exposure } =
    onRun && origin && destination ? followRun(onRun.run.getEntity(), transfer, origin, destination) : planned;
  const trip = { mode: transfer.mode, departAt: pickedUp?.getTime() ?? plannedMs };
  if (!origin || !destination) {
    return unassessable(
      trip,
      boxes,
      fallback,
      {
        id: "place-unknown",
        title: `The ${origin ? "destination" : "origin"} ZIP code could not be located, so there is no forecast for it.`,
      },
      exposure,
    );
  }
  try {
    const report = await assessBoxes(
      { ...trip, origin, destination, options: { driving } },
      boxes,
      { kind: "forecast", source, nowMs },
      fallback,
      transfer.expectedArrivalAt.getTime(),
      exposure,
    );
    const timed = onRun
      ? {
          ...report,
          sources: [
            ...report.sources,
            {
              id: "following-run",
              title: `Timed by the courier's run: in its ${onRun.run.getEntity().climateControlled ? "climate-controlled" : "unconditioned"} van from the pickup (${transfer.plannedDepartureAt.toISOString()}) to the drop-off (${transfer.expectedArrivalAt.toISOString()}).`,
            },
          ],
        }
      : report;
    if (!pickedUp) return timed;
    return {
      ...timed,
      sources: [
        ...timed.sources,
        {
          id: "following-pickup",
          title: `Following the trip from the recorded pickup (${pickedUp.toISOString()}) rather than the planned departure.`,
        },
      ],
    };
  } catch (err) {
    if (!(err instanceof RangeError)) throw err;
    return unassessable(
      trip,
      boxes,
      fallback,
      { id: "route-unplanned", title: `The trip could not be laid out hour by hour: ${err.message}.` },
      exposure,
    );
  }
}
