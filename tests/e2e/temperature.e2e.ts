import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { expectAccessible, launchBrowser, newPage, screenshot, signInAs } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

describe("temperature screens", () => {
  it("a member plans a trip: a steady 96 °F says do not ship; the forecast draws the chart", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Plan a trip" }).click();
    await page.getByLabel("From (ZIP code)").fill("37917");
    await page.getByLabel("To (ZIP code)").fill("97401");
    await page.getByLabel("By temperature profile").check();
    await page.getByLabel("Temperature profile", { exact: true }).selectOption({ label: "Temperate snakes" });
    const steady = page.getByLabel("Or a steady outside temperature instead of the forecast (°F)");
    await steady.fill("96");
    await page.getByRole("button", { name: "Check the trip" }).click();
    // [practice] REPTILES magazine shipping guide: above 95 °F do not ship
    await expect.poll(() => page.getByRole("status").filter({ hasText: "Do not ship" }).count()).toBe(1);
    expect(await page.getByText("A planning aid, not a guarantee", { exact: true }).count()).toBe(1);

    await steady.fill("");
    await page.getByRole("button", { name: "Check the trip" }).click();
    await expect.poll(() => page.getByText("Outside (forecast)").count()).toBeGreaterThan(0);
    // Three lines: the outside forecast, the air around the box, and inside the box (issue 13 §4).
    expect(await page.locator(".recharts-line").count()).toBe(3);
    expect(await page.getByText(/Shaded: the safe range in transit for temperate snakes/).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "temperature-plan-trip");
    await context.close();
  });

  it("an admin edits a profile, sees it marked, and puts the guideline back; the demo weather can be switched", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "admin@demo.hatchway.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Temperature profiles" }).click();
    const card = page.getByRole("region", { name: "Temperate snakes" });
    await card.getByRole("button", { name: "Edit" }).click();
    await card.getByLabel("Safe in transit from (°F)").fill("58");
    await card.getByRole("button", { name: "Save" }).click();
    await expect.poll(() => card.getByText("Edited", { exact: true }).count()).toBe(1);
    expect(await card.getByText("58 °F to 85 °F").count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "temperature-profiles");
    await card.getByRole("button", { name: "Edit" }).click();
    await card.getByRole("button", { name: "Back to the guideline default" }).click();
    await expect.poll(() => card.getByText("Guideline default", { exact: true }).count()).toBe(1);

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Plan a trip" }).click();
    const weather = page.getByRole("group", { name: "Demo weather scenario" });
    await weather.getByRole("button", { name: "Heat wave" }).click();
    await expect
      .poll(() => weather.getByRole("button", { name: "Heat wave" }).getAttribute("aria-pressed"))
      .toBe("true");
    await weather.getByRole("button", { name: "Ordinary weather" }).click();
    await expect
      .poll(() => weather.getByRole("button", { name: "Ordinary weather" }).getAttribute("aria-pressed"))
      .toBe("true");
    await context.close();
  });
});
