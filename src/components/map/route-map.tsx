import { useEffect, useId, useRef, useState } from "react";
import { airBand } from "@shared/temperature/air-band";
import { formatInstant } from "@shared/dates";
import { formatTemp } from "@shared/units";
import { AIR_BAND_WORDS } from "@shared/words";
import { useUnitSystem } from "@/lib/units-preference";
import { ATLAS_SIZE, fitView, project, spreadStacked, stateOutlines, type ViewBox } from "./map-geometry";
import { MapLegend } from "./map-legend";
import { AIR_BAND_MARKS, markPath } from "./map-marks";
import { mapSummary } from "./map-summary";
import type { MapStop, RouteMapProps } from "./map-types";
import { RouteMapTables } from "./route-map-tables";

// The notebook's palette (tailwind.config.ts): paper for the land, rule for borders, slate for the route.
const LAND = { fill: "#f6efdf", stroke: "#b7aa8f", water: "#e3ebef", route: "#3d5566", ink: "#1f2a30" };

const placed = <T extends { lat: number; lon: number }>(items: readonly T[]) =>
  items.flatMap((item) => {
    const xy = project(item);
    return xy ? [{ item, xy }] : [];
  });

/** Where a point of the view sits in the box, as percentages (the SVG keeps the view's aspect). */
const share = (xy: [number, number], view: ViewBox) => ({
  left: `${((xy[0] - view.x) / view.width) * 100}%`,
  top: `${((xy[1] - view.y) / view.height) * 100}%`,
});

/** The drawn width of an element in CSS pixels, followed as it changes (600 until measured). */
function useDrawnWidth() {
  const element = useRef<HTMLDivElement>(null);
  const [widthPx, setWidthPx] = useState(600);
  useEffect(() => {
    const target = element.current;
    if (!target || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry && entry.contentRect.width > 0) setWidthPx(entry.contentRect.width);
    });
    observer.observe(target);
    return () => observer.disconnect();
  }, []);
  return { element, widthPx };
}

const stopLabel = (stop: MapStop, index: number) => `Stop ${index + 1}, ${stop.name}: ${stop.place}, ${stop.when}`;

/**
 * A map of the states with the route, its numbered stops and where the box is each hour,
 * coloured and shaped by the air around the box against the safe range. The picture has a text
 * summary; the stops are buttons a keyboard reaches; "Show as table" gives the same facts in rows.
 */
export function RouteMap(props: RouteMapProps) {
  const { line, stops, hours = [], safeF = null } = props;
  const [system] = useUnitSystem();
  const [tableShown, setTableShown] = useState(false);
  const [selected, setSelected] = useState<number | null>(null);
  const { element, widthPx } = useDrawnWidth();
  const summaryId = useId();
  const tableId = useId();
  const lineXY = placed(line).map((p) => p.xy);
  const stopsXY = placed(stops.map((stop, index) => ({ ...stop, index })));
  const onMap = placed(hours);
  const places = [...lineXY, ...stopsXY.map((s) => s.xy), ...onMap.map((h) => h.xy)];
  // Hours spent at one place are laid out below it, so each stays visible; the view takes them in.
  const spread = spreadStacked(
    onMap.map((h) => h.xy),
    (12 * fitView(places).width) / widthPx,
  );
  const hoursXY = onMap.map((h, i) => ({ item: h.item, xy: spread[i]! }));
  const view = fitView([...places, ...spread]);
  // SVG units per CSS pixel: marks and labels keep their size on a phone and a wide screen.
  const unit = view.width / widthPx;
  const ends = [stopsXY[0], stopsXY.length > 1 ? stopsXY.at(-1) : undefined].flatMap((s) => (s ? [s] : []));
  const chosen = selected === null ? null : stops[selected];
  return (
    // contain: inline-size: the table below never widens the page (a 390 px phone scrolls it instead).
    <figure className="flex min-w-0 max-w-full flex-col gap-3 [contain:inline-size]">
      <div
        ref={element}
        className="relative w-full overflow-hidden rounded-md border border-rule"
        style={{ aspectRatio: `${ATLAS_SIZE.width} / ${ATLAS_SIZE.height}`, background: LAND.water }}
      >
        <svg
          viewBox={`${view.x} ${view.y} ${view.width} ${view.height}`}
          role="img"
          aria-labelledby={summaryId}
          className="absolute inset-0 h-full w-full"
        >
          <g fill={LAND.fill} stroke={LAND.stroke} strokeLinejoin="round">
            {stateOutlines.map((state) => (
              <path key={state.name} d={state.d} vectorEffect="non-scaling-stroke" strokeWidth={1} />
            ))}
          </g>
          {lineXY.length > 1 ? (
            <polyline
              points={lineXY.map(([x, y]) => `${x},${y}`).join(" ")}
              fill="none"
              stroke={LAND.route}
              strokeWidth={3}
              strokeLinecap="round"
              strokeLinejoin="round"
              vectorEffect="non-scaling-stroke"
            />
          ) : null}
          {safeF
            ? hoursXY.map(({ item: hour, xy }) => {
                const band = airBand(hour.aroundF, safeF);
                return (
                  <path
                    key={hour.atMs}
                    d={markPath(band, xy[0], xy[1], 4.5 * unit)}
                    fill={AIR_BAND_MARKS[band].fill}
                    stroke={LAND.ink}
                    strokeWidth={1}
                    vectorEffect="non-scaling-stroke"
                  >
                    <title>{`${formatInstant(hour.atMs)}, ${hour.place}: ${hour.exposure.toLowerCase()}, air around the box ${formatTemp(hour.aroundF, system)} (${AIR_BAND_WORDS[band].toLowerCase()})`}</title>
                  </path>
                );
              })
            : null}
          {ends.map(({ item: stop, xy }) => (
            <text
              key={stop.index}
              textAnchor={xy[0] > view.x + view.width * 0.6 ? "end" : "start"}
              x={xy[0] + (xy[0] > view.x + view.width * 0.6 ? -14 : 14) * unit}
              y={xy[1] - 12 * unit}
              fontSize={13 * unit}
              fill={LAND.ink}
              stroke="#ffffff"
              strokeWidth={3 * unit}
              paintOrder="stroke"
              fontWeight={600}
            >
              {stop.shortPlace ?? stop.place}
            </text>
          ))}
        </svg>
        {stopsXY.map(({ item: stop, xy }) => (
          <button
            key={stop.index}
            type="button"
            aria-label={stopLabel(stop, stop.index)}
            title={stopLabel(stop, stop.index)}
            aria-pressed={selected === stop.index}
            onClick={() => setSelected(stop.index)}
            onFocus={() => setSelected(stop.index)}
            className="absolute flex h-7 w-7 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-paper-card bg-ink text-xs font-bold text-paper-card shadow focus:outline-none focus-visible:ring-4 focus-visible:ring-fern-ring aria-pressed:bg-fern"
            style={share(xy, view)}
          >
            {stop.index + 1}
          </button>
        ))}
      </div>
      <figcaption id={summaryId} className="text-sm text-ink-soft">
        {mapSummary(props, system)}
      </figcaption>
      {chosen ? (
        <p className="text-sm">
          <strong>
            {selected! + 1}. {chosen.name}:
          </strong>{" "}
          {chosen.place}, {chosen.when}
        </p>
      ) : null}
      {safeF && hours.length > 0 ? <MapLegend safeF={safeF} system={system} /> : null}
      <div>
        <button
          type="button"
          aria-expanded={tableShown}
          aria-controls={tableId}
          onClick={() => setTableShown((shown) => !shown)}
          className="inline-flex min-h-11 items-center text-sm text-fern underline"
        >
          {tableShown ? "Hide the table" : "Show as table"}
        </button>
        <div id={tableId} hidden={!tableShown}>
          {tableShown ? <RouteMapTables {...props} system={system} /> : null}
        </div>
      </div>
    </figure>
  );
}
