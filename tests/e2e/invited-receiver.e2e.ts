/**
 * Issue 14, §6: a new nature centre joins from an invitation. The sender invites it by e-mail from
 * the new transfer's first step and sends it the transfer; the nature centre signs up from the
 * link in the caught e-mail, confirms its address from the second e-mail, and confirms the
 * transfer waiting for it. The organisation and people are invented for the test.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import {
  expectAccessible,
  launchBrowser,
  newPage,
  screenshot,
  signInAs,
  confirmAnsweringBlocks,
} from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const INVITEE = `animals-${Date.now().toString(36)}@heronpond.example`;
const NAME = "Heron Pond Nature Center";
let transferPath = "";

/** The path and query of the link in the newest caught e-mail to `to` whose subject matches. */
async function linkInMail(to: string, subject: RegExp): Promise<string> {
  let found = "";
  await expect
    .poll(
      async () => {
        const { messages } = (await (await fetch(inject("mailInboxUrl"))).json()) as {
          messages: { to: string[]; subject: string; text: string }[];
        };
        const mail = messages.find((m) => m.to.includes(to) && subject.test(m.subject));
        const link = mail?.text.match(/https?:\/\/\S+/)?.[0];
        found = link ? new URL(link).pathname + new URL(link).search : "";
        return found;
      },
      { timeout: 20_000 },
    )
    .not.toBe("");
  return found;
}

const localInput = (d: Date) => d.toISOString().slice(0, 16);

async function choose(page: Page, label: string, text: string) {
  const select = page.getByLabel(label, { exact: true });
  await expect.poll(() => select.locator("option", { hasText: text }).count()).toBeGreaterThan(0);
  const value = await select.locator("option", { hasText: text }).first().getAttribute("value");
  await select.selectOption(value ?? "");
}

describe("a nature centre invited to a transfer", () => {
  it("the sender invites it by e-mail and sends it a transfer", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.getByRole("link", { name: "New transfer" }).click();
    await page.getByRole("button", { name: "Not listed? Invite the receiver by e-mail" }).click();
    await page.getByLabel("Organisation name").fill(NAME);
    await page.getByLabel("Kind of organisation").selectOption("nature_centre");
    await page.getByLabel("Their e-mail").fill(INVITEE);
    await page.getByLabel("Their state").selectOption("OR");
    await page.getByRole("button", { name: "Send the invitation" }).click();
    await choose(page, "Receiving organisation", NAME);
    await page.getByLabel("Street").nth(1).fill("3 Heron Pond Road");
    await page.getByLabel("City").nth(1).fill("Salem");
    await page.getByLabel("State", { exact: true }).nth(1).selectOption("OR");
    await page.getByLabel("ZIP", { exact: true }).nth(1).fill("97301");
    await page.getByLabel("How it travels").selectOption("overnight_air");
    await page.getByLabel("Purpose").selectOption("education_exhibition");
    const depart = new Date(Date.now() + 3 * 86_400_000);
    depart.setUTCHours(15, 0, 0, 0);
    await page.getByLabel("Planned departure").fill(localInput(depart));
    await page.getByLabel("Expected arrival").fill(localInput(new Date(depart.getTime() + 20 * 3600_000)));
    await screenshot(page, "invited-1-sender-invites");
    await page.getByRole("button", { name: "Next: Boxes" }).click();
    await page.getByLabel("Length (in)").fill("15");
    await page.getByLabel("Width (in)").fill("11");
    await page.getByLabel("Height (in)").fill("9");
    await page.getByLabel("Wall thickness (in)").fill("1");
    await page.getByRole("button", { name: "Next: Animals" }).click();
    await page.getByRole("combobox", { name: "Species" }).fill("corn snake");
    await page.getByRole("option").first().waitFor();
    await page.keyboard.press("ArrowDown");
    await page.keyboard.press("Enter");
    await page.getByLabel("Origin").selectOption("captive_bred");
    await page.getByLabel("How many").fill("2");
    await page.getByRole("button", { name: "Next: Check and save" }).click();
    await page.getByRole("button", { name: "Save the draft" }).click();
    await page.waitForURL(/\/transfers\/[0-9a-f-]{36}$/);
    transferPath = new URL(page.url()).pathname;
    await page.getByRole("button", { name: "Send to the receiver" }).click();
    const ask = page.getByRole("dialog", { name: new RegExp(`^Send HW-\\d{2}-\\w{5} to ${NAME}\\?$`) });
    await ask.waitFor();
    await Promise.all([
      page.waitForResponse((r) => r.url().endsWith("/transition") && r.status() === 200),
      ask.getByRole("button", { name: "Send to the receiver" }).click(),
    ]);
    await context.close();
  });

  it("the nature centre signs up from the e-mail, confirms, and confirms the transfer waiting for it", async () => {
    const { context, page } = await newPage(browser);
    await page.goto(await linkInMail(INVITEE, /invites Heron Pond Nature Center/));
    await expect.poll(() => page.getByText("You were invited").count()).toBe(1);
    expect(await page.getByLabel("Name", { exact: true }).inputValue()).toBe(NAME);
    expect(await page.getByLabel("State").inputValue()).toBe("OR");
    await page.getByLabel("Kind").selectOption("nature_centre");
    await page.getByLabel("Street").fill("3 Heron Pond Road");
    await page.getByLabel("City").fill("Salem");
    await page.getByLabel("ZIP code").fill("97301");
    await page.getByLabel("Phone").fill("+1 503 555 0144");
    await page.getByLabel("Organisation e-mail").fill(INVITEE);
    await page.getByLabel("Your name").fill("Odile Marsh");
    await page.getByLabel("Your e-mail").fill(INVITEE);
    await page.getByLabel("Password", { exact: true }).fill("heron pond keeps newts");
    await page.getByLabel("Password again").fill("heron pond keeps newts");
    await expectAccessible(page);
    await screenshot(page, "invited-2-sign-up");
    await page.getByRole("button", { name: "Create the organisation" }).click();
    await expect.poll(() => page.getByText("Check your e-mail").count()).toBe(1);

    await page.goto(await linkInMail(INVITEE, /Confirm your e-mail address/));
    await page.getByRole("button", { name: "Confirm and open Hatchway" }).click();
    await expect.poll(() => page.getByTestId("signed-in-as").textContent()).toBe("Odile Marsh");
    await page.goto(transferPath);
    await page.getByRole("button", { name: "Confirm and clear to travel" }).click();
    // The route's rules were never reviewed (the demo's are not), and the weather may block: each
    // block is answered on its own, the rules check first.
    await confirmAnsweringBlocks(
      page,
      "Oregon's agency confirmed by phone; we collect at the airport in a heated car.",
    );
    await expect.poll(() => page.getByText("Cleared to travel", { exact: true }).count()).toBeGreaterThan(0);
    await screenshot(page, "invited-3-confirmed");
    await context.close();
  });
});
