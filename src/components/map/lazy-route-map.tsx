import { lazy, Suspense } from "react";
import { Loading } from "@/components/ui/feedback";
import type { RouteMapProps } from "./map-types";

// The map, d3-geo and the states' outlines are one chunk, fetched when a page shows a map:
// the sign-in page and the pages without a map never load them.
const RouteMap = lazy(() => import("./route-map").then((module) => ({ default: module.RouteMap })));

/** The route map, loaded on first use. */
export function LazyRouteMap(props: RouteMapProps) {
  return (
    <Suspense fallback={<Loading label="Drawing the map…" />}>
      <RouteMap {...props} />
    </Suspense>
  );
}
