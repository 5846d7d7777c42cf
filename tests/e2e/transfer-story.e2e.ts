/**
 * The whole story in the browser: the sender drafts a transfer, the receiver confirms it,
 * the courier records the pickup and the delivery on a phone-sized screen, and the receiver
 * checks the animals in with one dead on arrival. Screenshots go to test-output/screenshots.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import {
  expectAccessible,
  launchBrowser,
  newPage,
  PHONE,
  screenshot,
  signInAs,
  confirmAnsweringBlocks,
} from "../support/browser";

let browser: Browser;
let transferUrl = "";
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const localInput = (d: Date) => d.toISOString().slice(0, 16);

/** Chooses the option of a labelled select whose text contains `text`. */
async function choose(page: Page, label: string, text: string) {
  const select = page.getByLabel(label, { exact: true });
  const value = await select.locator("option", { hasText: text }).first().getAttribute("value");
  await select.selectOption(value ?? "");
}

async function open(page: Page, path: string) {
  await page.goto(path);
  await page.waitForLoadState("networkidle");
}

describe("one transfer from draft to check-in", () => {
  it("the sender drafts it, assigns a courier and sends it to the receiver", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.getByRole("link", { name: "New transfer" }).click();
    await choose(page, "Receiving organisation", "Willow Marsh Nature Centre");
    await page.getByLabel("How it travels").selectOption("overnight_air");
    await page.getByLabel("Purpose").selectOption("education_exhibition");
    const depart = new Date(Date.now() + 3 * 86_400_000);
    depart.setUTCHours(15, 0, 0, 0);
    await page.getByLabel("Planned departure").fill(localInput(depart));
    await page.getByLabel("Expected arrival").fill(localInput(new Date(depart.getTime() + 20 * 3600_000)));
    await page.getByRole("button", { name: "Next: Boxes" }).click();
    await page.getByLabel("Length (in)").fill("15");
    await page.getByLabel("Width (in)").fill("11");
    await page.getByLabel("Height (in)").fill("9");
    await page.getByLabel("Wall thickness (in)").fill("1");
    await page.getByLabel("Seal number (optional)").fill("E2E-0001");
    await page.getByRole("button", { name: "Next: Animals" }).click();
    await page.getByRole("combobox", { name: "Species" }).fill("corn snake");
    await page.getByRole("option").first().waitFor();
    await page.keyboard.press("ArrowDown");
    await page.keyboard.press("Enter");
    await page.getByLabel("Origin").selectOption("captive_bred");
    await page.getByLabel("How many").fill("3");
    await screenshot(page, "story-1-sender-animals");
    await page.getByRole("button", { name: "Next: Check and save" }).click();
    await expect.poll(() => page.getByText("Every animal is in a box, and no box mixes species.").count()).toBe(1);
    await screenshot(page, "story-1b-sender-review");
    await page.getByRole("button", { name: "Save the draft" }).click();
    await page.waitForURL(/\/transfers\/[0-9a-f-]{36}$/);
    transferUrl = new URL(page.url()).pathname;

    await page.getByRole("button", { name: "Assign couriers" }).click();
    await choose(page, "Courier", "Juno Park");
    await Promise.all([
      page.waitForResponse((r) => r.url().endsWith("/legs") && r.status() === 200),
      page.getByRole("button", { name: "Save couriers" }).click(),
    ]);
    // Sending asks first, in a dialog that says what will happen.
    await page.getByRole("button", { name: "Send to the receiver" }).click();
    const ask = page.getByRole("dialog", { name: /^Send HW-\d{2}-\w{5} to Willow Marsh Nature Centre\?$/ });
    await ask.waitFor();
    await Promise.all([
      page.waitForResponse((r) => r.url().endsWith("/transition") && r.status() === 200),
      ask.getByRole("button", { name: "Send to the receiver" }).click(),
    ]);
    await expect.poll(() => page.getByText("Waiting for the receiver", { exact: true }).count()).toBeGreaterThan(0);
    await expectAccessible(page);
    await screenshot(page, "story-2-sender-sent");
    await context.close();
  });

  it("the receiver confirms it", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "receiver@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await open(page, transferUrl);
    await page.getByRole("button", { name: "Confirm and clear to travel" }).click();
    // No state on the demo route has reviewed rules (the verdict is "Unverified"), and the weather
    // fake's December forecast may block: the receiver then answers each block with a reason.
    await confirmAnsweringBlocks(
      page,
      "Both wildlife agencies confirmed by phone; heated van door to door.",
      (answered) => screenshot(page, `story-3${answered ? "b" : "a"}-receiver-block`),
    );
    await expect.poll(() => page.getByText("Cleared to travel", { exact: true }).count()).toBeGreaterThan(0);
    await screenshot(page, "story-3-receiver-confirmed");
    await context.close();
  });

  it("the courier records the pickup and the delivery on a phone", async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signInAs(page, "courier@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    const legsUrl = transferUrl.replace("/transfers/", "/legs/");
    for (const kind of ["pickup", "delivery"]) {
      await open(page, legsUrl);
      await page.getByRole("button", { name: /One more: Boxes/ }).click();
      // The courier types the seal number they read; the number on record is shown beside it.
      await page
        .getByLabel(/Seal number you read on/)
        .first()
        .fill("E2E-0001");
      await page.getByRole("checkbox", { name: "The seal is there and unbroken" }).first().check();
      await page.getByLabel(/Temperature in or at the box/).fill(kind === "pickup" ? "72" : "69");
      await page.getByLabel("Place").fill(kind === "pickup" ? "Sender's loading bay" : "Nature centre receiving room");
      if (kind === "pickup") await screenshot(page, "story-4-courier-pickup-form");
      await page.getByRole("button", { name: "Review before confirming" }).click();
      const confirm = page.getByRole("button", { name: `Confirm the ${kind}` });
      await confirm.waitFor({ timeout: 10_000 }).catch(async (error: unknown) => {
        await screenshot(page, `story-failed-${kind}-review`);
        throw error;
      });
      // Three days before the departure, and minutes apart across the country: the review asks why.
      const early = page.getByLabel("Why so early?");
      if (await early.count()) await early.fill("Collected early to ride in our heated depot.");
      const fast = page.getByLabel("How did the boxes get here so fast?");
      if (await fast.count()) await fast.fill("A test of the whole story, recorded minutes apart.");
      await page.getByRole("checkbox", { name: /I have counted the boxes/ }).check();
      await confirm.click();
      await expect
        .poll(() =>
          page
            .getByRole("status")
            // The notice of this step (the review's own text says "recorded … before" too).
            .filter({
              hasText: kind === "pickup" ? "Pickup from the sender recorded." : "Delivery to the receiver recorded.",
            })
            .count(),
        )
        .toBeGreaterThan(0);
    }
    await expectAccessible(page);
    await screenshot(page, "story-5-courier-delivered");
    await context.close();
  });

  it("the receiver checks the animals in with one dead on arrival", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "receiver@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    // The courier recorded the delivery alone: the receiver confirms having the boxes first.
    await open(page, transferUrl);
    await page.getByRole("button", { name: "I have the boxes" }).click();
    await expect.poll(() => page.getByText("Arrived — check-in due", { exact: true }).count()).toBeGreaterThan(0);
    await open(page, `${transferUrl}/check-in`);
    await page.getByRole("button", { name: "One more: Arrived well" }).click();
    await page.getByRole("button", { name: "One more: Arrived well" }).click();
    await page.getByRole("button", { name: "One more: Dead on arrival" }).click();
    await page.getByLabel("Your name, as a signature").fill("Milo Faraday");
    await page.getByRole("checkbox", { name: /I opened every container/ }).check();
    await screenshot(page, "story-6-receiver-check-in");
    await page.getByRole("button", { name: "Sign the check-in" }).click();
    await expect.poll(() => page.getByText("What arrived differs from the manifest").count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "story-7-receiver-discrepancy");
    await open(page, transferUrl);
    await expect.poll(() => page.getByText("Checked in").count()).toBeGreaterThan(0);
    // The loss is on the transfer for everyone to see, not only on the check-in page.
    await expect.poll(() => page.locator("#arrival").textContent()).toContain("1 dead on arrival");
    const log = await page.evaluate(async (url) => (await fetch(`/api${url}/custody`)).json(), transferUrl);
    expect(log.intact).toBe(true);
    expect(log.entries.filter((e: { kind: string }) => e.kind === "handoff")).toHaveLength(2);
    await context.close();
  });
});
