import { formatInstant, formatTimeSpan } from "@shared/dates";
import type { TemperatureReport } from "@shared/temperature/report";
import type { RouteStopDto } from "@shared/temperature/route";
import { EXPOSURE_WORDS, ROUTE_STOP_WORDS } from "@shared/words";
import { LazyRouteMap } from "@/components/map/lazy-route-map";
import type { RouteMapProps } from "@/components/map/map-types";

function stopWhen(stop: RouteStopDto): string {
  if (stop.from === stop.to) return formatInstant(stop.from);
  if (stop.kind === "origin") return `until ${formatInstant(stop.to)}`;
  return formatTimeSpan(stop.from, stop.to);
}

/**
 * The map's input from a temperature report: the route's line and stops, and each modelled hour
 * at its position with the air around the box (the report's `route.hours` go with `hours`).
 */
export function tripMapProps(
  report: Pick<TemperatureReport, "route" | "hours" | "profile">,
  title: string,
): RouteMapProps {
  const route = report.route;
  return {
    title,
    line: route.line,
    stops: route.stops.map((stop) => ({
      lat: stop.lat,
      lon: stop.lon,
      name: ROUTE_STOP_WORDS[stop.kind],
      place: stop.place,
      when: stopWhen(stop),
    })),
    hours: report.hours.flatMap((hour, i) => {
      const position = route.hours[i];
      if (!position || position.at !== hour.at) return [];
      return [
        {
          lat: position.lat,
          lon: position.lon,
          atMs: Date.parse(hour.at),
          place: hour.place,
          aroundF: hour.aroundBoxF ?? null,
          exposure: EXPOSURE_WORDS[hour.exposure],
        },
      ];
    }),
    safeF: report.profile.safeTransitF,
  };
}

/** "A map of the way": the trip on a map of the states, with its table. Nothing when there is no route. */
export function TripMap({ report, title = "the trip" }: { report: TemperatureReport; title?: string }) {
  if (!report.route || report.route.stops.length < 2) return null;
  return (
    <div className="flex min-w-0 flex-col gap-2">
      <h3 className="font-semibold">Map of the way</h3>
      <LazyRouteMap {...tripMapProps(report, title)} />
    </div>
  );
}
