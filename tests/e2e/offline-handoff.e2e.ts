/**
 * Issue 16 in the browser: the courier opens the leg, the phone loses signal (Chromium's offline
 * emulation), the pickup is confirmed and kept on the phone, the page is reloaded without signal
 * (the service worker opens it), signal returns and the pickup goes by itself: one custody entry.
 * [practice] couriers hand boxes over in car parks and on rural roads without signal.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { DESKTOP, expectAccessible, launchBrowser, newPage, PHONE, screenshot, signInAs } from "../support/browser";
import { TINY_JPEG } from "../support/images";

let browser: Browser;
let transferId = "";
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

/** A JSON request from the signed-in page, with the CSRF token, as the app's client sends it. */
async function call<T>(page: Page, method: string, path: string, body?: unknown): Promise<T> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const { csrfToken } = await (await fetch("/api/auth/csrf")).json();
      const res = await fetch(path, {
        method,
        headers: { "Content-Type": "application/json", "X-CSRF-Token": csrfToken },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      const json = await res.json();
      if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${JSON.stringify(json)}`);
      return json;
    },
    { method, path, body },
  ) as Promise<T>;
}

/** The URLs the service worker keeps for the page (its runtime cache of API answers). */
const keptUrls = (page: Page) =>
  page.evaluate(async () => {
    const cache = await caches.open("hatchway-api");
    return (await cache.keys()).map((request) => new URL(request.url).pathname + new URL(request.url).search);
  });

const handoffEntries = async (page: Page, id = transferId) => {
  const log = await call<{ entries: { kind: string; payload: { handoffIndex?: number } }[] }>(
    page,
    "GET",
    `/api/transfers/${id}/custody`,
  );
  return log.entries.filter((entry) => entry.kind === "handoff");
};

/** The pickup as a courier fills it on the phone: the seal read, the place, a photo, the review. */
async function confirmPickup(page: Page): Promise<void> {
  await page.getByRole("button", { name: /One more: Boxes/ }).click();
  await page.getByLabel("Seal number you read on A").fill("SEAL-0160");
  await page.getByRole("checkbox", { name: "The seal is there and unbroken" }).check();
  await page.getByLabel("Place").fill("Rest area car park, mile 112");
  await page.locator('input[type="file"]').first().setInputFiles({
    name: "boxes.jpg",
    mimeType: "image/jpeg",
    buffer: TINY_JPEG,
  });
  await page.getByRole("button", { name: "Review before confirming" }).click();
  const early = page.getByLabel("Why so early?");
  await page.getByRole("button", { name: "Confirm the pickup" }).waitFor();
  if (await early.count()) await early.fill("Collected early to ride in our heated van.");
  await page.getByRole("checkbox", { name: /I have counted the boxes/ }).check();
  await page.getByRole("button", { name: "Confirm the pickup" }).click();
}

/** The worker controls the page and keeps the leg: the way a courier opens it before driving off. */
async function openLegWithTheWorker(page: Page, id: string): Promise<void> {
  await expect
    .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 })
    .toBe(true);
  await page.goto(`/legs/${id}`);
  await page.getByRole("button", { name: "Review before confirming" }).waitFor();
  await expect.poll(async () => (await keptUrls(page)).includes(`/api/transfers/${id}`)).toBe(true);
}

/** A transfer cleared to travel whose one leg the demo courier (Juno Park) carries. */
async function clearedTransferForTheDemoCourier(): Promise<string> {
  const { context, page } = await newPage(browser);
  await signInAs(page, "sender@demo.hatchway.test");
  await page.waitForURL((u) => u.pathname === "/");
  const { organizations } = await call<{ organizations: { id: string; name: string }[] }>(
    page,
    "GET",
    "/api/directory/organizations",
  );
  const { taxa } = await call<{ taxa: { id: string; scientificName: string }[] }>(
    page,
    "GET",
    `/api/taxa?q=${encodeURIComponent("Pantherophis guttatus")}`,
  );
  const { couriers } = await call<{ couriers: { id: string; displayName: string }[] }>(
    page,
    "GET",
    "/api/directory/couriers",
  );
  const depart = new Date(Date.now() + 6 * 3600_000);
  const { transfer } = await call<{ transfer: { id: string } }>(page, "POST", "/api/transfers", {
    receiverOrganizationId: organizations.find((o) => o.name === "Willow Marsh Nature Centre")!.id,
    receiverContactId: null,
    origin: { street: "418 Quarry Hollow Road", city: "Knoxville", state: "TN", zip: "37917" },
    destination: { street: "92 Boardwalk Lane", city: "Eugene", state: "OR", zip: "97401" },
    mode: "ground_courier",
    plannedDepartureAt: depart.toISOString(),
    expectedArrivalAt: new Date(depart.getTime() + 40 * 3600_000).toISOString(),
    purpose: "education_exhibition",
    sale: false,
    salePriceUsd: null,
    handlingNotes: "Keep upright.",
    privateNotes: null,
    containers: [
      {
        key: "A",
        label: "A",
        lengthMm: 400,
        widthMm: 300,
        heightMm: 250,
        wallMaterial: "eps",
        wallThicknessMm: 25,
        pack: "none",
        sealNumber: "SEAL-0160",
      },
    ],
    animals: [
      {
        taxonId: taxa.find((t) => t.scientificName === "Pantherophis guttatus")!.id,
        count: 1,
        sex: "female",
        identifier: null,
        identifierKind: null,
        origin: "captive_bred",
        lengthMm: null,
        lengthKind: null,
        weightG: null,
        hatchDate: null,
        notes: null,
        containerKey: "A",
      },
    ],
  });
  const createdId = transfer.id;
  await call(page, "PUT", `/api/transfers/${createdId}/legs`, {
    legs: [{ courierId: couriers.find((c) => c.displayName === "Juno Park")!.id }],
  });
  await call(page, "POST", `/api/transfers/${createdId}/transition`, { to: "awaiting_receiver" });
  await context.close();

  const receiverSide = await newPage(browser);
  await signInAs(receiverSide.page, "receiver@demo.hatchway.test");
  await receiverSide.page.waitForURL((u) => u.pathname === "/");
  await call(receiverSide.page, "POST", `/api/transfers/${createdId}/transition`, {
    to: "ready",
    override: true,
    reason: "Heated van door to door; checked the forecast ourselves.",
  });
  await receiverSide.context.close();
  return createdId;
}

describe("the installable app", () => {
  // A worker script is re-checked on every load (no long cache); the manifest names the app
  // and its icons [published: W3C Web Application Manifest; Service Workers §update].
  it("serves the worker and the manifest fresh, from our own origin, under the CSP", async () => {
    const base = inject("baseUrl");
    const worker = await fetch(`${base}/sw.js`);
    expect(worker.status).toBe(200);
    expect(worker.headers.get("content-type")).toMatch(/javascript/);
    expect(worker.headers.get("cache-control")).toBe("no-cache");
    expect(worker.headers.get("content-security-policy")).toContain("script-src 'self'");
    const source = await worker.text();
    expect(source).toContain("hatchway-api");
    // One script: Workbox's runtime is inside, no importScripts of another file.
    expect(source).not.toContain("importScripts(");
    // The precompressed copies are the server's business, never precached as files of their own.
    expect(source).not.toMatch(/\.(br|gz)"/);

    const manifestResponse = await fetch(`${base}/manifest.webmanifest`);
    expect(manifestResponse.headers.get("content-type")).toMatch(/manifest\+json/);
    const manifest = (await manifestResponse.json()) as {
      name: string;
      display: string;
      theme_color: string;
      icons: { src: string; type: string }[];
    };
    expect(manifest).toMatchObject({ name: "Hatchway", display: "standalone", theme_color: "#2f5d3a" });
    for (const icon of manifest.icons) {
      const response = await fetch(`${base}${icon.src}`);
      expect(response.status).toBe(200);
      expect(response.headers.get("content-type")).toContain(icon.type);
    }
  });
});

describe("a handoff without signal", () => {
  it("the sender and the receiver clear a transfer the demo courier carries", async () => {
    transferId = await clearedTransferForTheDemoCourier();
  });

  it("the courier confirms the pickup offline; it waits on the phone, survives a reload and is recorded once", async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signInAs(page, "courier@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    // The first visit installs the worker; once it controls the page, what the page shows is kept.
    await expect
      .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 })
      .toBe(true);
    await expect.poll(async () => (await keptUrls(page)).some((url) => url.startsWith("/api/transfers?"))).toBe(true);
    await page
      .getByRole("link", { name: /^Open / })
      .first()
      .waitFor();
    await page.goto(`/legs/${transferId}`);
    await page.getByRole("button", { name: "Review before confirming" }).waitFor();
    await expect.poll(async () => (await keptUrls(page)).includes(`/api/transfers/${transferId}`)).toBe(true);
    await expect.poll(async () => (await keptUrls(page)).includes("/api/auth/me")).toBe(true);
    const before = (await handoffEntries(page)).length;
    expect(before).toBe(0);

    await context.setOffline(true);
    await confirmPickup(page);

    const waiting = page.getByRole("status").filter({ hasText: /saved on this phone, not yet sent/i });
    await expect.poll(() => waiting.count()).toBe(1);
    await expect.poll(() => page.getByText("Saved on this phone, not yet sent", { exact: true }).count()).toBe(1);
    await screenshot(page, "offline-1-phone-kept");
    await page.setViewportSize(DESKTOP.viewport);
    await screenshot(page, "offline-2-desktop-kept");
    await page.setViewportSize(PHONE.viewport);

    // Closing the tab or restarting the phone loses nothing: the page opens again without signal.
    await page.reload();
    await expect.poll(() => waiting.count(), { timeout: 20_000 }).toBe(1);
    await expect.poll(() => page.getByRole("heading", { name: "Handoffs" }).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "offline-3-phone-reloaded-offline");

    // The legs list, also without signal, says it too.
    await page.getByRole("link", { name: "Hatchway" }).click();
    await expect
      .poll(() => page.getByText(/1 handoff: saved on this phone, not yet sent/).count(), { timeout: 20_000 })
      .toBe(1);
    await screenshot(page, "offline-4-phone-legs-list");
    await page.goto(`/legs/${transferId}`);
    await expect.poll(() => waiting.count(), { timeout: 20_000 }).toBe(1);

    // Signal again: it goes by itself, once.
    await context.setOffline(false);
    await expect
      .poll(() => page.getByTestId("toast").filter({ hasText: "sent: it is on the record now" }).count(), {
        timeout: 30_000,
      })
      .toBe(1);
    await expect.poll(() => waiting.count()).toBe(0);
    await expect.poll(() => page.getByText(/Juno Park · recorded/).count()).toBe(1);
    await screenshot(page, "offline-5-phone-sent");

    const entries = await handoffEntries(page);
    expect(entries).toHaveLength(1);
    expect(entries[0]!.payload.handoffIndex).toBe(0);
    // The photo kept on the phone went with it.
    const { transfer } = await call<{ transfer: { photos: unknown[] } }>(page, "GET", `/api/transfers/${transferId}`);
    expect(transfer.photos).toHaveLength(1);

    // Another reload online sends nothing again.
    await page.reload();
    await page.getByRole("heading", { name: "Handoffs" }).waitFor();
    await page.waitForLoadState("networkidle");
    expect(await handoffEntries(page)).toHaveLength(1);
    await context.close();
  });

  it("a pickup the server refuses when it arrives (the transfer was cancelled) is said plainly and kept until discarded", async () => {
    const cancelledId = await clearedTransferForTheDemoCourier();
    const { context, page } = await newPage(browser, PHONE);
    await signInAs(page, "courier@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await openLegWithTheWorker(page, cancelledId);

    await context.setOffline(true);
    await confirmPickup(page);
    await expect
      .poll(() =>
        page
          .getByRole("status")
          .filter({ hasText: /saved on this phone, not yet sent/i })
          .count(),
      )
      .toBe(1);

    // Meanwhile, with signal, the sender cancels the transfer.
    const sender = await newPage(browser);
    await signInAs(sender.page, "sender@demo.hatchway.test");
    await sender.page.waitForURL((u) => u.pathname === "/");
    await call(sender.page, "POST", `/api/transfers/${cancelledId}/transition`, {
      to: "cancelled",
      reason: "The receiver's permit is on hold.",
    });
    await sender.context.close();

    await context.setOffline(false);
    const refused = page.getByRole("alert").filter({ hasText: "Refused by Hatchway: not recorded" });
    await expect.poll(() => refused.count(), { timeout: 30_000 }).toBe(1);
    // The server's own words are on the phone, quoted.
    await expect.poll(async () => (await refused.textContent())?.match(/“.+”/)?.[0].length ?? 0).toBeGreaterThan(4);
    await expectAccessible(page);
    await screenshot(page, "offline-6-phone-refused");

    // Kept across a reload until the courier discards it.
    await page.reload();
    await expect.poll(() => refused.count(), { timeout: 20_000 }).toBe(1);
    await page.getByRole("button", { name: "Discard it" }).click();
    await page.getByRole("dialog").getByRole("button", { name: "Discard it" }).click();
    await expect.poll(() => refused.count()).toBe(0);
    expect(await handoffEntries(page, cancelledId)).toHaveLength(0);
    await context.close();
  });

  it("signing out empties what the phone kept for the courier", async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signInAs(page, "courier@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await expect
      .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 })
      .toBe(true);
    await expect.poll(async () => (await keptUrls(page)).includes("/api/auth/me")).toBe(true);
    await page.getByRole("button", { name: "Menu" }).click();
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL((u) => u.pathname === "/sign-in");
    expect(await keptUrls(page)).toEqual([]);
    await context.close();
  });
});
