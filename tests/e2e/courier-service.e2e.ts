/**
 * Issue 14, §3: the sender asks a courier service to carry a transfer from the transfer page, one
 * listed in the directory, and can take the request back. The demo's courier service and its
 * draft transfer are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import path from "node:path";
import { expectAccessible, launchBrowser, newPage, PHONE, SCREENSHOT_DIR, signInAs } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

describe("the sender chooses a courier service", () => {
  it("picks a listed service on a draft, sees it kept, and takes the request back", async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    const draft = await page.evaluate(async () => {
      const res = await fetch("/api/transfers?status=draft");
      const body = (await res.json()) as { transfers: { id: string }[] };
      return body.transfers[0]?.id ?? "";
    });
    expect(draft).not.toBe("");
    await page.goto(`/transfers/${draft}#legs`);
    const section = page.locator("#legs");
    await section.getByRole("button", { name: "Choose a courier service" }).click();
    const select = section.getByLabel("Services you can ask", { exact: true });
    const option = select.locator("option", { hasText: "Nightjar Ground Couriers" });
    await expect.poll(() => option.count()).toBeGreaterThan(0);
    await select.selectOption((await option.first().getAttribute("value")) ?? "");
    await expectAccessible(page);
    await section.screenshot({ path: path.join(SCREENSHOT_DIR, "courier-service-choose-phone.png") });
    await section.getByRole("button", { name: "Ask them to carry it" }).click();
    await page.getByText("Asked Nightjar Ground Couriers to carry it").waitFor();

    await page.reload();
    await expect.poll(() => section.getByText("Nightjar Ground Couriers").count()).toBeGreaterThan(0);
    await section.screenshot({ path: path.join(SCREENSHOT_DIR, "courier-service-chosen-phone.png") });

    await section.getByRole("button", { name: "Change the courier service" }).click();
    await section.getByRole("button", { name: "Take the request back" }).click();
    await section.getByText("No courier service asked.", { exact: false }).waitFor();
    await context.close();
  });
});
