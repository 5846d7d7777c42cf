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
