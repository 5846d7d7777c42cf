/**
 * Forms that keep what you type, and steps that ask before they act: the new-transfer form across
 * reload, Back and leaving; the dialogs before sending, confirming past a temperature block,
 * cancelling and changing a role; the notices that confirm them; the sign-in form that checks
 * itself. The organisations and people are the invented demo scenario.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { expectAccessible, launchBrowser, newPage, PHONE, screenshot, signInAs } from "../support/browser";

let browser: Browser;
let transferUrl = "";
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const localInput = (d: Date) => d.toISOString().slice(0, 16);

async function choose(page: Page, label: string, text: string) {
  const select = page.getByLabel(label, { exact: true });
  const value = await select.locator("option", { hasText: text }).first().getAttribute("value");
  await select.selectOption(value ?? "");
}

/** A JSON request from the signed-in page, with the session's CSRF token, as the client sends it. */
function apiFromPage(page: Page, method: string, path: string, body?: unknown) {
  return page.evaluate(
    async ({ method, path, body }) => {
      const { csrfToken } = (await (await fetch("/api/auth/csrf")).json()) as { csrfToken: string };
      const res = await fetch(path, {
        method,
        headers: { "Content-Type": "application/json", "X-CSRF-Token": csrfToken },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: res.status, body: (await res.json().catch(() => null)) as Record<string, unknown> | null };
    },
    { method, path, body },
  );
}

/** The notice that confirms a step: inside the live region screen readers announce. */
const notice = (page: Page, text: string | RegExp) => page.getByRole("status").filter({ hasText: text });

describe("the new-transfer form keeps what you type", () => {
  it("across a reload, the browser's Back and Forward, and leaving for another page", async () => {
    const { context, page } = await newPage(browser);
    const writes: string[] = [];
    page.on("request", (r) => {
      if (r.url().includes("/api/transfers") && r.method() !== "GET") writes.push(`${r.method()} ${r.url()}`);
    });
    await signInAs(page, "sender@demo.hatchway.test");
    await page.getByRole("link", { name: "New transfer" }).click();
    await choose(page, "Receiving organisation", "Willow Marsh Nature Centre");
    await page.getByLabel("How it travels").selectOption("overnight_air");
    await page.getByLabel("Handling notes").fill("Keep the boxes level; no stacking.");

    // Nothing is on the server yet, and a reload keeps every field.
    await page.reload();
    await expect.poll(() => page.getByLabel("How it travels").inputValue()).toBe("overnight_air");
    expect(await page.getByLabel("Handling notes").inputValue()).toBe("Keep the boxes level; no stacking.");
    expect(await page.getByRole("option", { name: "Willow Marsh Nature Centre", selected: true }).count()).toBe(1);
    expect(await page.getByText("Picked up where you left off").count()).toBe(1);
    expect(writes).toEqual([]);

    // Choosing the route and parties saves the draft on the server.
    await page.getByLabel("Purpose").selectOption("education_exhibition");
    const depart = new Date(Date.now() + 4 * 86_400_000);
    depart.setUTCHours(15, 0, 0, 0);
    await page.getByLabel("Planned departure").fill(localInput(depart));
    await page.getByLabel("Expected arrival").fill(localInput(new Date(depart.getTime() + 20 * 3600_000)));
    await page.getByRole("button", { name: "Next: Boxes" }).click();
    await page.getByRole("heading", { name: "Step 2 of 4: Boxes" }).waitFor();
    await expect.poll(() => notice(page, /Draft HW-\d{2}-\w{5} saved/).count()).toBe(1);
    expect(writes).toEqual([expect.stringMatching(/^POST .*\/api\/transfers$/)]);
    await page.getByLabel("Length (in)").fill("15");

    // The browser's Back goes one step back, Forward returns, and nothing typed is lost.
    await page.goBack();
    await page.getByRole("heading", { name: "Step 1 of 4: Route and parties" }).waitFor();
    expect(await page.getByLabel("Handling notes").inputValue()).toBe("Keep the boxes level; no stacking.");
    await page.goForward();
    await page.getByRole("heading", { name: "Step 2 of 4: Boxes" }).waitFor();
    expect(await page.getByLabel("Length (in)").inputValue()).toBe("15");

    // Leaving with work not on the server asks first; staying changes nothing.
    const nav = page.getByRole("navigation", { name: "Main" });
    await nav.getByRole("link", { name: "Register" }).click();
    const leave = page.getByRole("dialog", { name: "Leave the new transfer?" });
    await leave.waitFor();
    expect(await leave.textContent()).toMatch(/The draft HW-\d{2}-\w{5} is saved up to the last step you finished/);
    await expectAccessible(page);
    await screenshot(page, "new-transfer-leave-dialog");
    await leave.getByRole("button", { name: "Stay on the form" }).click();
    await expect.poll(() => leave.isVisible()).toBe(false);
    expect(new URL(page.url()).pathname).toBe("/transfers/new");
    await nav.getByRole("link", { name: "Register" }).click();
    await leave.getByRole("button", { name: "Leave" }).click();
    await page.waitForURL((u) => u.pathname === "/register");

    // Back on the form, then a reload: the step and the box are still there.
    await page.goBack();
    await page.getByRole("heading", { name: "Step 2 of 4: Boxes" }).waitFor();
    expect(await page.getByLabel("Length (in)").inputValue()).toBe("15");
    await page.reload();
    await page.getByRole("heading", { name: "Step 2 of 4: Boxes" }).waitFor();
    expect(await page.getByLabel("Length (in)").inputValue()).toBe("15");

    // Finishing the form saves the same draft (no second transfer) and opens its page.
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
    await page.reload();
    await page.getByRole("heading", { name: "Step 3 of 4: Animals" }).waitFor();
    expect(await page.getByLabel("How many").inputValue()).toBe("2");
    expect(await page.getByRole("combobox", { name: "Species" }).inputValue()).not.toBe("");
    await page.getByRole("button", { name: "Next: Check and save" }).click();
    await page.getByRole("button", { name: "Save the draft" }).click();
    await page.waitForURL(/\/transfers\/[0-9a-f-]{36}$/);
    transferUrl = new URL(page.url()).pathname;
    const id = transferUrl.split("/").pop()!;
    expect(writes.filter((w) => w.startsWith("POST"))).toHaveLength(1);
    expect(writes.slice(1).every((w) => w === `PATCH ${new URL(page.url()).origin}/api/transfers/${id}`)).toBe(true);
    const saved = (await apiFromPage(page, "GET", `/api/transfers/${id}`)).body as {
      transfer: { handlingNotes: string; containers: { lengthMm: number }[]; animals: { count: number }[] };
    };
    expect(saved.transfer.handlingNotes).toBe("Keep the boxes level; no stacking.");
    expect(saved.transfer.containers).toHaveLength(1);
    expect(saved.transfer.containers[0]!.lengthMm).toBeCloseTo(381, 0); // 15 in = 381 mm (NIST SP 811 [published])
    expect(saved.transfer.animals.map((a) => a.count)).toEqual([2]);

    // A new form starts empty: the browser's copy went with the saved draft.
    await page.goto("/transfers/new");
    await page.getByRole("heading", { name: "Step 1 of 4: Route and parties" }).waitFor();
    expect(await page.getByLabel("Handling notes").inputValue()).toBe("");
    expect(await page.getByText("Picked up where you left off").count()).toBe(0);
    await context.close();
  });
});

describe("steps that ask before they act", () => {
  it("sending to the receiver says what will happen, and a notice confirms it", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await page.goto(transferUrl);
    const transitions: string[] = [];
    page.on("request", (r) => r.url().endsWith("/transition") && transitions.push(r.method()));
    await page.getByRole("button", { name: "Send to the receiver" }).click();
    const ask = page.getByRole("dialog", { name: /^Send HW-\d{2}-\w{5} to Willow Marsh Nature Centre\?$/ });
    await ask.waitFor();
    expect(await ask.textContent()).toContain("gets an e-mail asking them to check the transfer and confirm it");
    await expectAccessible(page);
    await screenshot(page, "dialog-send-to-receiver");
    await ask.getByRole("button", { name: "Not yet" }).click();
    await expect.poll(() => ask.isVisible()).toBe(false);
    expect(transitions).toEqual([]);

    await page.getByRole("button", { name: "Send to the receiver" }).click();
    await ask.getByRole("button", { name: "Send to the receiver" }).click();
    await expect.poll(() => notice(page, "Sent to Willow Marsh Nature Centre").count()).toBe(1);
    expect(transitions).toEqual(["POST"]);
    await expect.poll(() => page.getByText("Waiting for the receiver", { exact: true }).count()).toBeGreaterThan(0);
    await screenshot(page, "notice-sent-to-receiver");
    await context.close();
  });

  it("confirming past a temperature block asks a second time and says what the override does", async () => {
    const admin = await newPage(browser);
    await signInAs(admin.page, "admin@demo.hatchway.test");
    await admin.page.waitForURL((u) => u.pathname === "/");
    // The demo weather fake answers nothing: the check cannot say the box is safe, so it blocks.
    expect((await apiFromPage(admin.page, "POST", "/api/dev/weather-scenario", { scenario: "outage" })).status).toBe(
      200,
    );
    try {
      const { context, page } = await newPage(browser, PHONE);
      await signInAs(page, "receiver@demo.hatchway.test");
      await page.waitForURL((u) => u.pathname === "/");
      await page.goto(transferUrl);
      await page.getByRole("button", { name: "Confirm and clear to travel" }).click();
      // The demo route's rules were never reviewed: the rules check speaks first, and its answer
      // does not answer the temperature block, which is asked about on its own.
      await page.getByLabel("What the agencies told you").fill("Both agencies confirmed by phone.");
      await page.getByRole("button", { name: "Confirm anyway, with this reason" }).click();
      await page
        .getByRole("dialog", { name: "Confirm although the rules of the route are not verified?" })
        .getByRole("button", { name: "Confirm anyway" })
        .click();

      await page.getByLabel("Why it is safe to confirm anyway").fill("We collect at the depot in a heated van.");
      await page.getByRole("button", { name: "Confirm anyway, with this reason" }).click();
      const ask = page.getByRole("dialog", { name: "Confirm past the temperature block?" });
      await ask.waitFor();
      expect(await ask.textContent()).toContain("go into the custody log");
      expect(await ask.textContent()).toContain("We collect at the depot in a heated van.");
      await screenshot(page, "dialog-temperature-override-phone");
      await ask.getByRole("button", { name: "Go back" }).click();
      expect(await page.getByText("Cleared to travel", { exact: true }).count()).toBe(0);

      await page.getByRole("button", { name: "Confirm anyway, with this reason" }).click();
      await ask.getByRole("button", { name: "Confirm anyway" }).click();
      await expect.poll(() => notice(page, /is cleared to travel/).count()).toBe(1);
      await expect.poll(() => page.getByText("Cleared to travel", { exact: true }).count()).toBeGreaterThan(0);
      const log = await page.evaluate(async (url) => (await fetch(`/api${url}/custody`)).json(), transferUrl);
      const overrides = log.entries.filter((e: { kind: string }) => e.kind === "override") as {
        payload: { gate: string; reason: string };
      }[];
      expect(overrides.map((e) => e.payload.gate)).toEqual(["compliance", "temperature"]);
      // Each answer in its own words, in both entries.
      expect(overrides[1]!.payload.reason).toBe(
        "Rules of the route: Both agencies confirmed by phone. Temperature: We collect at the depot in a heated van.",
      );
      await context.close();
    } finally {
      await apiFromPage(admin.page, "POST", "/api/dev/weather-scenario", { scenario: "normal" });
      await admin.context.close();
    }
  });

  it("cancelling says it cannot be undone, asks why, and confirms with a notice", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await page.goto(transferUrl);
    await page.getByRole("button", { name: "Cancel the transfer" }).click();
    const ask = page.getByRole("dialog", { name: /^Cancel HW-\d{2}-\w{5}\?$/ });
    await ask.waitFor();
    expect(await ask.textContent()).toContain("This cannot be undone");
    await ask.getByRole("button", { name: "Cancel the transfer" }).click();
    await expect.poll(() => ask.getByText("Say why, so the other party knows what to do.").count()).toBe(1);
    await ask.getByLabel("Why is it cancelled?").fill("The receiver's enclosure is not ready this month.");
    await screenshot(page, "dialog-cancel");
    await ask.getByRole("button", { name: "Cancel the transfer" }).click();
    await expect.poll(() => notice(page, /is cancelled/).count()).toBe(1);
    await expect.poll(() => page.getByRole("button", { name: "Cancel the transfer" }).count()).toBe(0);
    await context.close();
  });

  it("changing a person's role says what the new role may do, and a notice confirms it", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "admin@demo.hatchway.test");
    await page.getByRole("link", { name: "People" }).click();
    const role = page.getByLabel("Role of Theo Brannock");
    await role.waitFor();
    const before = await role.inputValue();
    const patches: string[] = [];
    page.on("request", (r) => r.method() === "PATCH" && r.url().includes("/api/users/") && patches.push(r.url()));

    await role.selectOption("admin");
    const ask = page.getByRole("dialog", { name: /^Change Theo Brannock.s role to / });
    await ask.waitFor();
    expect(await ask.textContent()).toContain("Administrators read every transfer");
    await screenshot(page, "dialog-role-change");
    await ask.getByRole("button", { name: /^Keep Theo Brannock/ }).click();
    await expect.poll(() => ask.isVisible()).toBe(false);
    expect(patches).toEqual([]);
    expect(await role.inputValue()).toBe(before);

    await role.selectOption("admin");
    await ask.getByRole("button", { name: "Change the role" }).click();
    await expect.poll(() => notice(page, /Theo Brannock.s role is now/).count()).toBe(1);
    await expect.poll(() => role.inputValue()).toBe("admin");
    expect(patches).toHaveLength(1);

    // Put the demo back as it was.
    await role.selectOption(before);
    await ask.getByRole("button", { name: "Change the role" }).click();
    await expect.poll(() => role.inputValue()).toBe(before);
    await context.close();
  });
});

describe("signing in", () => {
  it("an empty sign-in form is checked in the browser and no request leaves", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sign-in");
    await page.getByRole("button", { name: "Sign in" }).waitFor();
    const sent: string[] = [];
    page.on("request", (r) => r.url().includes("/api/") && sent.push(`${r.method()} ${r.url()}`));
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.getByText("Enter your e-mail address").count()).toBe(1);
    expect(await page.getByText("Enter your password").count()).toBe(1);
    expect(await page.getByLabel("E-mail").evaluate((el) => el === document.activeElement)).toBe(true);
    await page.getByLabel("E-mail").fill("sender@demo.hatchway.test");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.getByText("Enter your e-mail address").count()).toBe(0);
    expect(await page.getByText("Enter your password").count()).toBe(1);
    await screenshot(page, "sign-in-empty");
    expect(sent).toEqual([]);
    await context.close();
  });
});
