import { describe, expect, it, vi } from "vitest";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router";
import type { RunDto, RunStopDto } from "@shared/schemas/run";
import { RunStops } from "./run-stops";

const stop = (kind: RunStopDto["kind"], transferId: string, at: string): RunStopDto => ({
  kind,
  transferId,
  at,
  leaveAt: at,
  place: {
    label: "Invented place",
    street: "1 Depot Lane",
    city: "Knoxville",
    state: "TN",
    zip: "37917",
    lat: 35.99,
    lon: -83.92,
    timeZone: "America/New_York",
  },
  legKm: 10,
  transferNumber: `HW-26-${transferId}`,
  boxCount: 2,
  party: { organizationName: "Invented Keepers", contactName: "Ada", phone: "+1 555 0100" },
});

const run = (edit: boolean): RunDto => ({
  id: "00000000-0000-4000-8000-0000000000aa",
  courierOrganization: { id: "o", name: "Invented Couriers" },
  departAt: "2026-12-14T13:00:00Z",
  climateControlled: false,
  vehicleRangeF: null,
  drivers: [],
  stops: [
    stop("pickup", "AAAAA", "2026-12-14T13:00:00Z"),
    stop("pickup", "BBBBB", "2026-12-14T15:00:00Z"),
    stop("dropoff", "AAAAA", "2026-12-14T18:00:00Z"),
    stop("dropoff", "BBBBB", "2026-12-14T20:00:00Z"),
  ],
  drivingH: 6,
  roadKm: 500,
  finishAt: "2026-12-14T20:30:00Z",
  rests: [],
  guidance: "Rests are planning guidance.",
  version: 3,
  abilities: { edit },
});

describe("RunStops", () => {
  it("asks before a move that re-times arrivals, then sends the whole new order with the version seen", async () => {
    const onChange = vi.fn(async () => undefined);
    render(
      <MemoryRouter>
        <RunStops run={run(true)} busy={false} onChange={onChange} />
      </MemoryRouter>,
    );
    // The first stop cannot go up (a drop-off before its own pickup is refused too: run-order.test.ts).
    expect(screen.getByRole("button", { name: "Move the pick up of HW-26-AAAAA up" })).toBeDisabled();
    expect(screen.getByRole("button", { name: "Move the pick up of HW-26-BBBBB down" })).toBeEnabled();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Move the drop off of HW-26-AAAAA down" }));
    const dialog = screen.getByRole("dialog", { name: "Move the drop off of HW-26-AAAAA down?" });
    expect(dialog).toHaveTextContent(/more than 2 hours, Hatchway e-mails the sender and the receiver/);
    expect(onChange).not.toHaveBeenCalled();
    await user.click(within(dialog).getByRole("button", { name: "Change the run" }));
    expect(onChange).toHaveBeenCalledWith({
      version: 3,
      stops: [
        { kind: "pickup", transferId: "AAAAA" },
        { kind: "pickup", transferId: "BBBBB" },
        { kind: "dropoff", transferId: "BBBBB" },
        { kind: "dropoff", transferId: "AAAAA" },
      ],
    });
  });

  it("shows a courier the stops without the controls", () => {
    render(
      <MemoryRouter>
        <RunStops run={run(false)} busy={false} onChange={vi.fn()} />
      </MemoryRouter>,
    );
    expect(screen.getAllByRole("listitem")).toHaveLength(4);
    expect(screen.queryByRole("button", { name: /Move|Take/ })).not.toBeInTheDocument();
  });
});
