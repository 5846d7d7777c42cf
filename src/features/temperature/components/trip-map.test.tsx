import { afterEach, describe, expect, it } from "vitest";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { ambientFromOverride } from "@shared/temperature/ambient";
import { assessTransit } from "@shared/temperature/assess";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import type { TemperatureReport } from "@shared/temperature/report";
import { tripRoute } from "@shared/temperature/route";
import { buildTransitTimeline } from "@shared/temperature/timeline";
import { writeUnitSystem } from "@/lib/units-preference";
import { TripMap } from "./trip-map";

const profile = DEFAULT_PROFILES.temperate_snake;

/** A ground courier from Knoxville to Nashville, the outside air warming from 50 °F to 92 °F, by the real model. */
function report(): TemperatureReport {
  const departAt = "2027-06-08T12:00:00Z";
  const timeline = buildTransitTimeline({
    mode: "ground_courier",
    origin: { label: "Knoxville, TN", lat: 35.998, lon: -83.915, timeZone: "America/New_York" },
    destination: { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" },
    departAt,
  });
  const result = assessTransit({
    timeline,
    ambientByHour: ambientFromOverride(timeline, [
      { at: departAt, tempF: 50 },
      { at: "2027-06-08T16:00:00Z", tempF: 92 },
    ]),
    box: {
      wall: "eps",
      wallThicknessMm: 38,
      lengthMm: 400,
      widthMm: 300,
      heightMm: 300,
      contentsG: 2000,
      pack: "none",
    },
    profile,
    ambientSource: "override",
  });
  const summary = { group: profile.group, label: profile.label, safeTransitF: profile.safeTransitF };
  return { ...result, profile: summary, warnings: timeline.warnings, boxes: [], route: tripRoute(timeline) };
}

afterEach(() => localStorage.clear());

describe("TripMap", () => {
  it("draws the trip as a picture with a summary, stops a keyboard reaches, and the same facts as a table", async () => {
    const trip = report();
    render(<TripMap report={trip} />);
    // The map is its own chunk: the first render waits for it.
    const picture = await screen.findByRole(
      "img",
      { name: /^Map of the trip from Knoxville, TN to Nashville, TN/ },
      { timeout: 15_000 },
    );
    // Counted here from the report itself, against the profile's safe range (REPTILES magazine guideline) [published, secondary]
    const around = trip.hours.map((h) => h.aroundBoxF!);
    const warmer = around.filter((f) => f > profile.safeTransitF.max).length;
    const colder = around.filter((f) => f < profile.safeTransitF.min).length;
    expect(warmer + colder).toBeGreaterThan(0);
    expect(picture).toHaveAccessibleName(expect.stringContaining(`${trip.hours.length} dots mark where the box is`));
    expect(picture).toHaveAccessibleName(
      expect.stringContaining(
        `${colder} ${colder === 1 ? "hour" : "hours"} colder, ${warmer} ${warmer === 1 ? "hour" : "hours"} warmer`,
      ),
    );
    // one mark per modelled hour, each with its value in words
    expect(picture.querySelectorAll("path > title")).toHaveLength(trip.hours.length);

    const start = screen.getByRole("button", { name: /^Stop 1, Start: Knoxville, TN/ });
    const stops = trip.route.stops;
    expect(
      screen.getByRole("button", { name: new RegExp(`^Stop ${stops.length}, Arrival: Nashville, TN`) }),
    ).toBeInTheDocument();
    const user = userEvent.setup();
    await user.tab();
    expect(start).toHaveFocus();

    await user.click(screen.getByRole("button", { name: "Show as table" }));
    const stopRows = within(screen.getByRole("table", { name: "Stops of the trip" })).getAllByRole("row");
    expect(stopRows).toHaveLength(stops.length + 1);
    const hourTable = screen.getByRole("table", { name: "Where the box is, hour by hour" });
    const hourRows = within(hourTable).getAllByRole("row").slice(1);
    expect(hourRows).toHaveLength(trip.hours.length);
    expect(
      hourRows.filter(
        (row) => row.textContent?.includes("Warmer than safe") || row.textContent?.includes("Far warmer than safe"),
      ),
    ).toHaveLength(warmer);
    expect(hourRows[0]).toHaveTextContent(`${trip.hours[0]!.aroundBoxF} °F`);
  });

  it("gives the legend in the person's units", async () => {
    writeUnitSystem("metric");
    render(<TripMap report={report()} />);
    await screen.findByRole("img", { name: /^Map of the trip/ }, { timeout: 15_000 });
    // 55–85 °F is 12.8–29.4 °C (NIST SP 811 conversion) [published]
    expect(screen.getByText(/In the safe range: 12\.8 °C to 29\.4 °C/)).toBeInTheDocument();
    writeUnitSystem("imperial");
  });

  it("draws nothing when the trip could not be laid out", () => {
    const empty = { ...report(), route: { line: [], stops: [], hours: [] } };
    const { container } = render(<TripMap report={empty} />);
    expect(container).toBeEmptyDOMElement();
  });
});
