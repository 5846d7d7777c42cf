import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { DESKTOP, expectAccessible, launchBrowser, newPage, PHONE, screenshot, signInAs } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

async function chooseSpecies(page: Page, typed: string, name: RegExp) {
  await page.getByRole("combobox", { name: "Species" }).fill(typed);
  await page.getByRole("option", { name }).first().click();
}

// A keeper's register (issue 15 §5), walked as a keeper would on a desktop and on a 390 px phone.
// Quarantine of new arrivals: 60 days by default, 30–90 common [practice, SOURCES.md].
describe("the keeper's register", () => {
  for (const [device, size] of [
    ["desktop", DESKTOP],
    ["phone", PHONE],
  ] as const) {
    it(`adds a clutch, finds it in quarantine, records and splits, imports and reports (${device})`, async () => {
      const { context, page } = await newPage(browser, size);
      await signInAs(page, "sender@demo.hatchway.test");
      await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
      await page.goto("/register/add");
      await chooseSpecies(page, "ball python", /Python regius/);
      await page.getByLabel("Number of animals").fill("6");
      await page.getByLabel("Acquired on").fill(day(-3));
      await page.getByLabel("From (person or organisation)").fill(`Demo Hatchery (${device})`);
      await page.getByLabel("New arrival: start quarantine on the day acquired").check();
      await page.getByRole("button", { name: "Add to the register" }).click();
      // The animal's page: what is known, its quarantine, the event form and the timeline.
      await expect.poll(() => page.getByRole("heading", { name: "Python regius" }).count()).toBe(1);
      await expect.poll(() => page.getByText("57 days left of quarantine").count()).toBeGreaterThan(0);
      const entryUrl = page.url();

      // The table filtered by species and "in quarantine".
      await page.goto("/register");
      await chooseSpecies(page, "ball python", /Python regius/);
      await page.getByLabel("Quarantine").selectOption("yes");
      await expect.poll(() => new URL(page.url()).searchParams.get("quarantine")).toBe("yes");
      // The search box finds the source (the "From" column is left out on a phone).
      await page.getByLabel("Search").fill(`Demo Hatchery (${device})`);
      await expect.poll(() => new URL(page.url()).searchParams.get("q")).toBe(`Demo Hatchery (${device})`);
      const row = page.getByRole("row").filter({ hasText: "6 of 6" });
      await expect.poll(() => row.count()).toBe(1);
      await expect.poll(() => row.getByText("6 of 6").count()).toBe(1);
      await screenshot(page, `register-table-${device}`);
      await expectAccessible(page);

      // Record a weighing, then split 2 of the 6 off (sold on as a pair, say).
      await row.getByRole("link", { name: /Python regius/ }).click();
      await page.waitForURL(entryUrl);
      await page.getByLabel("What happened", { exact: true }).selectOption("measured");
      await page.getByLabel("Weight (g)").fill("72");
      await page.getByRole("button", { name: "Record it" }).click();
      await expect.poll(() => page.getByText(/Weight \d/).count()).toBeGreaterThan(0);
      await page.getByLabel("How many").fill("2");
      await page.getByRole("button", { name: "Split them off" }).click();
      await expect.poll(() => page.url() !== entryUrl).toBe(true);
      await expect.poll(() => page.getByText("2 of 2", { exact: true }).count()).toBe(1);
      await expect.poll(() => page.getByRole("link", { name: "the group it came from" }).count()).toBe(1);
      await screenshot(page, `register-split-${device}`);
      await page.getByRole("link", { name: "the group it came from" }).click();
      await expect.poll(() => page.getByText("4 of 6", { exact: true }).count()).toBe(1);
      await screenshot(page, `register-entry-${device}`);
      await expectAccessible(page);

      // The import: a bad row is named and nothing goes in; the corrected file goes in.
      await page.goto("/register/import");
      const headings = "scientificName,count,sex,identifier,origin,hatchDate,acquiredOn,source.name";
      const file = (rows: string[]) => ({
        name: "register.csv",
        mimeType: "text/csv",
        buffer: Buffer.from([headings, ...rows].join("\n")),
      });
      await page
        .getByLabel("CSV file")
        .setInputFiles(
          file([
            `Crotalus horridus,1,female,DEMO-${device}-1,captive_bred,2024-05-01,${day(-30)},Demo Serpentarium`,
            `Nosuchus imaginarius,1,male,,captive_bred,,${day(-30)},Demo Dragons`,
          ]),
        );
      await page.getByRole("button", { name: "Check and import" }).click();
      await expect.poll(() => page.getByText("Nothing was imported").count()).toBe(1);
      await expect.poll(() => page.getByRole("table", { name: "Rows to correct" }).getByRole("row").count()).toBe(2);
      await screenshot(page, `register-import-rows-${device}`);
      await page
        .getByLabel("CSV file")
        .setInputFiles(
          file([`Crotalus horridus,1,female,DEMO-${device}-1,captive_bred,2024-05-01,${day(-30)},Demo Serpentarium`]),
        );
      await page.getByRole("button", { name: "Check and import" }).click();
      await expect.poll(() => page.getByText("1 entries imported").count()).toBe(1);

      // The yearly report: a preview for a permit, then the CSV download.
      await page.goto("/register/report");
      const permit = page.getByLabel("Permit");
      await page.getByLabel("From").fill("2020-01-01");
      await page.getByLabel("To", { exact: true }).fill(day(0));
      // A permit with nothing in the period says so; the first that covers animals shows their counts.
      const permits = await permit
        .locator("option")
        .evaluateAll((options) => options.map((option) => (option as HTMLOptionElement).value).filter(Boolean));
      let shown = false;
      for (const id of permits) {
        await permit.selectOption(id);
        await expect
          .poll(
            async () =>
              (await page.getByRole("table", { name: "Animals per species" }).count()) +
              (await page.getByText("Nothing to report for this period").count()),
          )
          .toBe(1);
        if (await page.getByRole("table", { name: "Animals per species" }).count()) {
          shown = true;
          break;
        }
      }
      expect(shown).toBe(true);
      await screenshot(page, `register-report-${device}`);
      await expectAccessible(page);
      const [download] = await Promise.all([
        page.waitForEvent("download"),
        page.getByRole("link", { name: "Download CSV" }).click(),
      ]);
      expect(download.suggestedFilename()).toMatch(/^yearly-report-.*\.csv$/);
      await context.close();
    });
  }
});
