import { afterEach, describe, expect, it, vi } from "vitest";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { noticesForMove } from "@shared/register/state-notices";
import type { StateNoticeDto } from "@shared/schemas/register";
import type { TransferDto } from "@shared/schemas/transfer";
import { StateNoticesSection } from "./state-notices-section";

const TRANSFER_ID = "00000000-0000-4000-8000-0000000000bb";

// A move from Pennsylvania into Maryland: the receiver's import report within 72 h (COMAR 15.11.01.09) [published, SOURCES.md].
const [todo] = noticesForMove({
  fromState: "PA",
  toState: "MD",
  departedAt: "2026-11-30T14:00:00.000Z",
  arrivedAt: "2026-12-01T09:00:00.000Z",
});

function renderSection() {
  let notice: StateNoticeDto = { ...todo!, done: null };
  const posted: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init?: RequestInit) => {
      const json = (body: unknown, status = 200) =>
        new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } });
      if (url.endsWith("/csrf")) return json({ csrfToken: "token" });
      if (init?.method === "POST") {
        const body = JSON.parse(String(init.body)) as { note: string | null; reference: string | null };
        posted.push(body);
        notice = { ...notice, done: { byName: "Demo Receiver", at: "2026-12-01T15:30:00.000Z", ...body } };
        return json({ notice }, 201);
      }
      return json({ arrived: true, notices: [notice] });
    }),
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const transfer = { id: TRANSFER_ID, status: "checked_in", viewerRole: "receiver" } as TransferDto;
  render(
    <QueryClientProvider client={client}>
      <StateNoticesSection transfer={transfer} />
    </QueryClientProvider>,
  );
  return { posted };
}

afterEach(() => vi.unstubAllGlobals());

describe("StateNoticesSection", () => {
  it("shows a notice to do with its citation, and once marked done, who marked it and the reference", async () => {
    const { posted } = renderSection();
    expect(await screen.findByText(/COMAR 15\.11\.01\.09/)).toBeInTheDocument();
    expect(screen.getByText(/Confirm with the state wildlife agency/)).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText("Reference number (optional)"), "MD-DNR-0042");
    await userEvent.click(screen.getByRole("button", { name: "Mark as done" }));
    expect(await screen.findByText(/Marked done by Demo Receiver/)).toHaveTextContent(/Reference MD-DNR-0042/);
    expect(posted).toEqual([{ note: null, reference: "MD-DNR-0042" }]);
    expect(screen.queryByRole("button", { name: "Mark as done" })).not.toBeInTheDocument();
  });
});
