import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { expectAccessible, launchBrowser, newPage, screenshot, signInAs } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const ROLES = [
  {
    email: "admin@demo.hatchway.test",
    name: "Hatchway Admin",
    sees: ["Transfers", "People", "Organisations", "Caught mail"],
    hidden: ["Register", "My legs"],
  },
  {
    email: "sender@demo.hatchway.test",
    name: "Ruth Calder",
    sees: ["Transfers", "Register"],
    hidden: ["People", "Organisations", "Caught mail", "My legs"],
  },
  {
    email: "receiver@demo.hatchway.test",
    name: "Milo Faraday",
    sees: ["Transfers", "Register"],
    hidden: ["People", "Organisations", "My legs"],
  },
  {
    email: "courier@demo.hatchway.test",
    name: "Juno Park",
    sees: ["My legs"],
    hidden: ["Transfers", "Register", "People", "Organisations"],
  },
];

describe("signing in", () => {
  it("the sign-in page is accessible", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sign-in");
    await expect.poll(() => page.getByRole("heading", { name: "Sign in" }).isVisible()).toBe(true);
    await expectAccessible(page);
    await screenshot(page, "sign-in");
    await context.close();
  });

  it.each(ROLES)("$email sees the navigation of the role", async ({ email, name, sees, hidden }) => {
    const { context, page } = await newPage(browser);
    await signInAs(page, email);
    await expect.poll(() => page.getByTestId("signed-in-as").textContent()).toBe(name);
    const nav = page.getByRole("navigation", { name: "Main" });
    for (const label of sees) expect(await nav.getByRole("link", { name: label }).count()).toBe(1);
    for (const label of hidden) expect(await nav.getByRole("link", { name: label }).count()).toBe(0);
    await expectAccessible(page);
    await screenshot(page, `home-${email.split("@")[0]}`);
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect.poll(() => page.url()).toContain("/sign-in");
    await context.close();
  });

  it("a wrong password shows the one generic message", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test", "wrong-password-here");
    const alert = page.getByRole("alert");
    await expect.poll(() => alert.textContent()).toContain("That e-mail and password do not match an active account.");
    await screenshot(page, "sign-in-wrong-password");
    await context.close();
  });

  it("the admin screens list the demo people and organisations", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "admin@demo.hatchway.test");
    await page.getByRole("link", { name: "People" }).click();
    await expect.poll(() => page.getByRole("cell", { name: "Ruth Calder", exact: true }).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "admin-people");
    await page.getByRole("link", { name: "Organisations" }).click();
    await expect
      .poll(() => page.getByRole("cell", { name: "Willow Marsh Nature Centre", exact: true }).count())
      .toBe(1);
    await page.getByRole("button", { name: "Add organisation" }).click();
    await page.getByRole("button", { name: "Add organisation" }).click();
    // The shared message map names the field (shared/validation/messages.ts).
    await expect.poll(() => page.getByText("Name: fill this in.", { exact: true }).count()).toBeGreaterThan(0);
    await screenshot(page, "admin-organisation-form-errors");
    await context.close();
  });
});
