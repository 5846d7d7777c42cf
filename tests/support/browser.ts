/** Debian's Chromium driven by playwright-core: never a downloaded browser. */
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import AxeBuilder from "@axe-core/playwright";
import { expect, inject } from "vitest";
import { OUTPUT_DIR } from "./constants";
import { launchChromium } from "./chromium";

export const SCREENSHOT_DIR = path.join(OUTPUT_DIR, "screenshots");

export function launchBrowser(): Promise<Browser> {
  return launchChromium();
}

export const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };
export const DESKTOP = { viewport: { width: 1280, height: 860 } };

export async function newPage(
  browser: Browser,
  device: typeof PHONE | typeof DESKTOP = DESKTOP,
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ ...device, baseURL: inject("baseUrl") });
  const page = await context.newPage();
  return { context, page };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

export async function signInAs(page: Page, email: string, password = "hatchway-demo"): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

/** axe-core in the page: no serious or critical violation. */
export async function expectAccessible(page: Page): Promise<void> {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(bad.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`)).toEqual([]);
}

/**
 * After "Confirm and clear to travel": answers each block the page shows with the reason (the
 * unverified rules first, then the temperature if it blocks), each in its own dialog, until the
 * transfer is cleared. `onBlock` runs when a block shows (a screenshot, say).
 */
export async function confirmAnsweringBlocks(
  page: Page,
  reason: string,
  onBlock: (answered: number) => Promise<void> = async () => undefined,
): Promise<void> {
  for (let answered = 0; answered < 2; answered++) {
    const status = await Promise.race([
      page
        .getByText("Cleared to travel", { exact: true })
        .first()
        .waitFor()
        .then(() => "cleared"),
      page
        .getByRole("button", { name: "Confirm anyway, with this reason" })
        .waitFor()
        .then(() => "blocked"),
    ]);
    if (status === "cleared") return;
    await onBlock(answered);
    await page
      .getByRole("textbox", { name: /Why it is safe to confirm anyway|What the agencies told you/ })
      .fill(reason);
    await page.getByRole("button", { name: "Confirm anyway, with this reason" }).click();
    await page
      .getByRole("dialog", {
        name: /^Confirm (past the temperature block|although the rules of the route are not verified)\?$/,
      })
      .getByRole("button", { name: "Confirm anyway" })
      .click();
    await page
      .getByRole("dialog")
      .waitFor({ state: "detached" })
      .catch(() => undefined);
    await page.waitForLoadState("networkidle");
  }
}
