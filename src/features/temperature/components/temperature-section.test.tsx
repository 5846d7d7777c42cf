import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { render, screen } from "@testing-library/react";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { MemoryRouter } from "react-router";
import { ambientFromOverride } from "@shared/temperature/ambient";
import { assessTransit } from "@shared/temperature/assess";
import type { BoxSpec } from "@shared/temperature/box-model";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import type { TransferStatus } from "@shared/constants";
import type { TransferTemperatureDto } from "@shared/temperature/report";
import { tripRoute } from "@shared/temperature/route";
import { buildTransitTimeline } from "@shared/temperature/timeline";
import { TemperatureSection } from "./temperature-section";

const TRANSFER_ID = "00000000-0000-4000-8000-0000000000bb";
const box: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 38,
  lengthMm: 400,
  widthMm: 300,
  heightMm: 300,
  contentsG: 2000,
  pack: "none",
};
const profile = DEFAULT_PROFILES.temperate_snake;

/** The server's answer for a short hand delivery in Tennessee with the outside held at `tempF`, computed by the real assessment. */
function reportAt(tempF: number): TransferTemperatureDto {
  const departAt = "2027-03-09T15:00:00Z";
  const timeline = buildTransitTimeline({
    mode: "hand_delivery",
    origin: { label: "Knoxville, TN", lat: 35.998, lon: -83.915, timeZone: "America/New_York" },
    destination: { label: "Maryville, TN", lat: 35.688, lon: -84.077, timeZone: "America/New_York" },
    departAt,
  });
  const result = assessTransit({
    timeline,
    ambientByHour: ambientFromOverride(timeline, [{ at: departAt, tempF }]),
    box,
    profile,
    ambientSource: "override",
  });
  const summary = { group: profile.group, label: profile.label, safeTransitF: profile.safeTransitF };
  return {
    ...result,
    profile: summary,
    warnings: timeline.warnings,
    boxes: [
      {
        containerId: "c1",
        label: "Box A",
        plannedPack: "none",
        contentsG: 2000,
        profile: summary,
        verdict: result.verdict,
        advice: result.advice,
        insideF: result.insideF,
        hoursOutsideRange: result.hoursOutsideRange,
      },
    ],
    route: tripRoute(timeline),
    transferVersion: 3,
    alert: null,
    checks: [],
    readings: [],
    plan: {
      applies: true,
      vehicle: null,
      vehicleRangeF: null,
      stops: [],
      legs: [],
      canEdit: false,
      followingPickupAt: null,
    },
  };
}

function renderSection(report: TransferTemperatureDto, status: TransferStatus = "awaiting_receiver") {
  vi.stubGlobal(
    "fetch",
    vi.fn(
      async () =>
        new Response(JSON.stringify(report), { status: 200, headers: { "Content-Type": "application/json" } }),
    ),
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <TemperatureSection transferId={TRANSFER_ID} status={status} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

beforeEach(() => {
  // jsdom has no layout; the chart's container only needs the observer to exist
  vi.stubGlobal(
    "ResizeObserver",
    class {
      observe() {}
      unobserve() {}
      disconnect() {}
    },
  );
  localStorage.clear();
});
afterEach(() => vi.unstubAllGlobals());

describe("TemperatureSection", () => {
  it("above 95 °F: do not ship, the block on clearing explained, and the cautions", async () => {
    // [practice] REPTILES magazine shipping guide: above 95 °F do not ship
    renderSection(reportAt(96));
    expect(await screen.findByText("Do not ship", { selector: "p" })).toBeInTheDocument();
    expect(screen.getAllByText(/Postpone: no packing keeps the box in the safe range/).length).toBeGreaterThan(0);
    expect(screen.getByText(/can only confirm the transfer by overriding/)).toBeInTheDocument();
    // PRODUCT.md and SOURCES.md: a planning aid, not a guarantee; heat packs never touch an animal's container
    expect(screen.getByText("A planning aid, not a guarantee")).toBeInTheDocument();
    expect(screen.getByText(/Heat packs never touch/)).toBeInTheDocument();
  });

  it("once cleared, a blocking verdict asks for action instead of explaining the confirmation", async () => {
    renderSection(reportAt(96), "ready");
    expect(await screen.findByText(/Cleared to travel, but the check says “do not ship”/)).toBeInTheDocument();
    expect(screen.queryByText(/can only confirm the transfer by overriding/)).not.toBeInTheDocument();
  });

  it("on the road, no notice about clearing at all", async () => {
    renderSection(reportAt(96), "in_transit");
    expect(await screen.findByText("Do not ship", { selector: "p" })).toBeInTheDocument();
    expect(screen.queryByText(/Cleared to travel, but|This blocks/)).not.toBeInTheDocument();
  });

  it("at 38 °F: a 40-hour heat pack, and nothing blocks", async () => {
    // [practice] same guide: 38–59 °F calls for a heat pack rated 40 h or more
    renderSection(reportAt(38));
    expect(await screen.findByText("Ship with the packing advised", { selector: "p" })).toBeInTheDocument();
    expect(screen.getByText("Heat pack, 40 hours.")).toBeInTheDocument();
    expect(screen.queryByText(/can only confirm the transfer by overriding/)).not.toBeInTheDocument();
    // °F until the person asks for °C: the outside is held at 38 °F
    expect(screen.getByText("38 °F to 38 °F")).toBeInTheDocument();
  });

  it("says beside the verdict that nobody described the vehicle, and shows where the box is under the chart", async () => {
    // issue 13: an assumption is said beside the verdict, with what a climate-controlled vehicle would give
    renderSection(reportAt(75));
    expect(await screen.findByText("How the vehicle is held was not given")).toBeInTheDocument();
    expect(screen.getByText(/If it were climate-controlled \(65–80 °F\), the verdict would be/)).toBeInTheDocument();
    const key = screen.getByRole("list", { name: "Where the box is, by colour" });
    expect(key).toHaveTextContent("Outdoors");
    expect(key).toHaveTextContent("Unconditioned vehicle, moving");
    // PRODUCT.md cautions and issue 13: never leave animals in a parked vehicle
    expect(screen.getByText(/Never leave animals in a parked vehicle: a closed car/)).toBeInTheDocument();
  });

  it("lists the box readings beside the model, marks one outside the safe range, and never adjusts the verdict", async () => {
    const report = reportAt(75);
    report.readings = [
      {
        at: "2027-03-09T15:10:00Z",
        place: "Knoxville depot",
        tempF: 72,
        modelF: 71.5,
        source: "pickup",
        differenceF: 0.5,
        outsideSafeRange: false,
      },
      {
        at: "2027-03-09T16:00:00Z",
        place: "Front porch",
        tempF: 97,
        modelF: 74,
        source: "delivery",
        differenceF: 23,
        outsideSafeRange: true,
      },
    ];
    renderSection(report);
    expect(await screen.findByText("Box temperatures read on the way, against the model")).toBeInTheDocument();
    expect(screen.getByText("Front porch")).toBeInTheDocument();
    expect(screen.getByText(/97 °F — outside the safe range/)).toBeInTheDocument();
    expect(screen.getByText("+23.0 °F")).toBeInTheDocument();
    expect(screen.getByText(/Readings never change the verdict/)).toBeInTheDocument();
  });

  it("lets the sender say how the box travels: the vehicle and the stops", async () => {
    const report = reportAt(75);
    report.plan = { ...report.plan, canEdit: true };
    renderSection(report);
    expect(await screen.findByText("How the box travels")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Add a stop" })).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Save how the box travels" })).toBeInTheDocument();
    expect(screen.getByLabelText("How the vehicle is heated or cooled")).toBeInTheDocument();
  });
});
