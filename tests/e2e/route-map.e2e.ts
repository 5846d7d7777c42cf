import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Locator, Page } from "playwright-core";
import { DESKTOP, PHONE, SCREENSHOT_DIR, expectAccessible, launchBrowser, newPage, signInAs } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

async function shoot(part: Locator, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await part.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`) });
}

/** The map of `title`, its stops and its table: what every page with a map must show. */
async function expectMapWithTable(page: Page, title: string): Promise<Locator> {
  const picture = page.getByRole("img", { name: new RegExp(`^Map of ${title} from `) });
  await picture.waitFor();
  // Issue 16 §2: one mark per modelled hour and the stops numbered, the first one a keyboard reaches.
  expect(await picture.locator("path > title").count()).toBeGreaterThan(0);
  const figure = page.locator("figure").filter({ has: picture });
  expect(await figure.getByRole("button", { name: /^Stop 1, Start: / }).count()).toBe(1);
  await figure.getByRole("button", { name: "Show as table" }).click();
  expect(await figure.getByRole("table", { name: `Stops of ${title}` }).count()).toBe(1);
  expect(
    await figure.getByRole("table", { name: "Where the box is, hour by hour" }).getByRole("row").count(),
  ).toBeGreaterThan(1);
  return figure;
}

describe("a map of the way", () => {
  it("on a transfer page, at a desktop and on a phone", async () => {
    for (const [size, device] of [
      ["desktop", DESKTOP],
      ["phone", PHONE],
    ] as const) {
      const { context, page } = await newPage(browser, device);
      await signInAs(page, "sender@demo.hatchway.test");
      await page.waitForURL((u) => u.pathname === "/");
      await page.getByRole("link", { name: /^HW-/ }).first().click();
      const section = page.getByRole("region", { name: "Temperature on the way" });
      const picture = page.getByRole("img", { name: /^Map of the trip from / });
      await section.getByRole("img", { name: /^Map of the trip from / }).waitFor({ timeout: 20_000 });
      await shoot(section.locator("figure").filter({ has: picture }), `route-map-transfer-${size}`);
      const figure = await expectMapWithTable(page, "the trip");
      // Nothing wider than the phone's screen.
      const box = (await figure.boundingBox())!;
      expect(box.x + box.width).toBeLessThanOrEqual(device.viewport.width);
      if (size === "desktop") await expectAccessible(page);
      await context.close();
    }
  });

  it("on the what-if page, at a desktop and on a phone", async () => {
    for (const [size, device] of [
      ["desktop", DESKTOP],
      ["phone", PHONE],
    ] as const) {
      const { context, page } = await newPage(browser, device);
      await signInAs(page, "sender@demo.hatchway.test");
      await page.waitForURL((u) => u.pathname === "/");
      await page.goto("/plan-trip");
      await page.getByLabel("From (ZIP code)").fill("37917");
      await page.getByLabel("To (ZIP code)").fill("97401");
      await page.getByLabel("By temperature profile").check();
      await page.getByLabel("Temperature profile", { exact: true }).selectOption({ label: "Temperate snakes" });
      await page.getByRole("button", { name: "Check the trip" }).click();
      const picture = page.getByRole("img", { name: /^Map of the planned trip from / });
      await picture.waitFor({ timeout: 20_000 });
      await shoot(page.locator("figure").filter({ has: picture }), `route-map-plan-trip-${size}`);
      const figure = await expectMapWithTable(page, "the planned trip");
      const box = (await figure.boundingBox())!;
      expect(box.x + box.width).toBeLessThanOrEqual(device.viewport.width);
      if (size === "desktop") await expectAccessible(page);
      await context.close();
    }
  });

  it("on a courier service's run: its manager finds it in the list, with the stops, the rests as guidance and the sheet", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "dispatch@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Runs" }).click();
    // "Plan a run" opens the form over the service's transfers (the demo's one road transfer is already on a run).
    await page.getByRole("link", { name: "Plan a run" }).click();
    await page.getByRole("group", { name: "Transfers on the run" }).waitFor();
    expect(await page.getByLabel("Leaves").count()).toBe(1);
    await page.goBack();
    // The demo's invented run (seeded through the real services).
    await page
      .getByRole("link", { name: /^Open the run leaving / })
      .first()
      .click();
    await page.waitForURL((u) => /^\/runs\/[0-9a-f-]{36}$/.test(u.pathname));
    const stops = page.getByRole("region", { name: "Stops in order" });
    await stops.getByText(/^1\. Pick up/).waitFor();
    expect(await stops.getByText(/^2\. Drop off/).count()).toBe(1);
    // 49 CFR 395.3 as planning guidance; the rule binds vehicles over 10,000 lb (49 CFR 390.5) [published]
    expect(await page.getByText(/10,000 lb/).count()).toBeGreaterThan(0);
    expect(await page.getByRole("link", { name: "Run sheet (PDF)" }).getAttribute("href")).toMatch(/\/sheet\.pdf$/);
    const picture = page.getByRole("img", { name: /^Map of the run from / });
    await picture.waitFor({ timeout: 20_000 });
    await page.locator("figure").filter({ has: picture }).getByRole("button", { name: "Show as table" }).click();
    expect(await page.getByRole("table", { name: "Stops of the run" }).getByRole("row").count()).toBeGreaterThan(2);
    await expectAccessible(page);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, "run-page-desktop.png"), fullPage: true });
    await page.setViewportSize(PHONE.viewport);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, "run-page-phone.png"), fullPage: true });
    await context.close();
  });
});
