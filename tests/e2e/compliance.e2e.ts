import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { expectAccessible, launchBrowser, newPage, screenshot, signInAs } from "../support/browser";
import { pdfWithPages } from "../support/scan-files";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  PDF = await pdfWithPages(1);
});
afterAll(() => browser?.close());

const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
/** A one-page PDF made by pdf-lib (the server opens every PDF scan: D21) and a 1 × 1 PNG (ISO/IEC 15948) [published]. */
let PDF: Buffer;
const PNG = Buffer.from(
  "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==",
  "base64",
);

describe("compliance screens", () => {
  it("a member records a CVI, sees it expiring, uploads scans and previews the image", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Permits" }).click();
    await page.getByRole("button", { name: "Add a document" }).click();
    await page.getByLabel("Kind").selectOption({ label: "Certificate of Veterinary Inspection (CVI)" });
    await page.getByLabel("Issued by").selectOption("TN");
    await page.getByLabel("Number").fill("DEMO-CVI-E2E-0001");
    await page.getByLabel("Valid to (last valid day)").fill(day(20));
    await page.getByLabel("Issued on").fill(day(0));
    // Species come from the catalogue: the older name finds the accepted one.
    await page.getByRole("combobox", { name: "Species covered" }).fill("Geochelone pardalis");
    await page
      .getByRole("option", { name: /Stigmochelys pardalis/ })
      .first()
      .click();
    await expect
      .poll(() =>
        page.getByRole("list", { name: "Species covered: chosen" }).getByText("Stigmochelys pardalis").count(),
      )
      .toBe(1);
    await page.getByLabel("Veterinarian", { exact: true }).fill("Dr. Demo Vet");
    await page.getByLabel("Accredited veterinarian").selectOption("true");
    await page.getByLabel("Statements, one per line").fill("Examined and found free of ticks");
    await page.getByRole("button", { name: "Add the document" }).click();

    const row = page.getByRole("row", { name: /DEMO-CVI-E2E-0001/ });
    // [published] Gregorian calendar: the last valid day 20 days ahead is within the 30-day warning
    await expect.poll(() => row.getByText(/Expires soon — 20 days left/).count()).toBe(1);
    await row.getByRole("button", { name: "0 scans" }).click();
    const input = page.getByLabel("Add a scan (PDF, JPEG or PNG, up to 10 MB)");
    await input.setInputFiles({ name: "cvi-front.png", mimeType: "image/png", buffer: PNG });
    await expect.poll(() => page.getByRole("button", { name: "Preview" }).count()).toBe(1);
    await input.setInputFiles({ name: "cvi.pdf", mimeType: "application/pdf", buffer: PDF });
    await expect.poll(() => page.getByRole("button", { name: "Get the PDF" }).count()).toBe(1);
    await page.getByRole("button", { name: "Preview" }).click();
    await expect.poll(() => page.getByRole("img", { name: "Scan cvi-front.png" }).isVisible()).toBe(true);
    await page.getByRole("button", { name: "Get the PDF" }).click();
    await expect.poll(() => page.getByRole("link", { name: "Download the PDF" }).count()).toBe(1);
    // A file that is not a PDF, JPEG or PNG is named at once, before any upload.
    await input.setInputFiles({ name: "notes.txt", mimeType: "text/plain", buffer: Buffer.from("hello") });
    await expect.poll(() => page.getByText("That file is not a PDF, JPEG or PNG.", { exact: false }).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "compliance-permits");
    await context.close();
  });

  it("“Can it travel?” blocks a Burmese python going to Hawaii and cites the sources", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Can it travel?" }).click();
    await page.getByLabel("From").selectOption("CA");
    await page.getByLabel("To").selectOption("HI");
    await page.getByRole("combobox", { name: "Species" }).fill("Burmese python");
    await page
      .getByRole("option", { name: /Python bivittatus/ })
      .first()
      .click();
    await page.getByRole("button", { name: "Check the rules" }).click();
    // [published] 18 U.S.C. 42 / 50 CFR 16.15 and HRS 150A-6: both forbid this shipment
    await expect.poll(() => page.getByRole("status").filter({ hasText: "Blocked" }).count()).toBe(1);
    const findings = page.getByRole("region", { name: "Findings for Python bivittatus" });
    expect(await findings.getByRole("link", { name: /18 U\.S\.C\. 42/ }).count()).toBe(1);
    expect(await findings.getByText(/Hawaii Revised Statutes 150A-6/).count()).toBe(1);
    expect(await page.getByText(/confirm the requirements with the state wildlife agency/).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "compliance-can-it-travel");
    await context.close();
  });

  it("an admin filters the rule library, saves a new version and sees the history", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "admin@demo.hatchway.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Rules" }).click();
    await page.getByLabel("State").selectOption("HI");
    await page.getByRole("button", { name: "Filter" }).click();
    const row = page.getByRole("row", { name: /forbids bringing any live snake/ });
    await row.getByRole("button", { name: "Versions" }).click();
    await page.getByRole("button", { name: "Edit" }).click();
    await page.getByLabel("Reviewed by").fill("E2E reviewer");
    const [saved] = await Promise.all([
      page.waitForResponse((r) => r.url().endsWith("/versions") && r.request().method() === "POST"),
      page.getByRole("button", { name: "Save as version 2" }).click(),
    ]);
    expect(saved.status()).toBe(201);
    // The form closes once the rule list and history have been fetched again.
    const versions = page.getByRole("list", { name: "Versions, newest first" });
    await expect.poll(() => versions.getByRole("listitem").count()).toBe(2);
    expect(await versions.getByRole("listitem").first().textContent()).toContain("by E2E reviewer");
    await expectAccessible(page);
    await screenshot(page, "compliance-rules");
    await context.close();
  });

  it("a transfer on a route with no reviewed rules is “Unverified”, naming the states and the agencies to ask", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    await page.getByRole("link", { name: /^HW-/ }).first().click();
    const section = page.getByRole("region", { name: "Rules and permits" });
    // source: issue 12 §1: never "clear" while a state on the route is not reviewed; the seed reviews none
    await expect.poll(() => section.getByRole("status").filter({ hasText: "Unverified" }).count()).toBe(1);
    expect(await section.getByText("Clear to travel", { exact: true }).count()).toBe(0);
    expect(await section.getByRole("link", { name: "Oregon Department of Fish and Wildlife" }).count()).toBeGreaterThan(
      0,
    );
    expect(await section.getByRole("heading", { name: "Whose rules apply on this route" }).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, "compliance-unverified");
    await context.close();
  });

  it("an admin writes a new rule with fields, retires it, and records a review of a state", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "admin@demo.hatchway.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Rules" }).click();
    await page.getByRole("button", { name: "New rule" }).click();
    const form = page.getByRole("form", { name: "New rule" });
    await form.getByLabel("Reference").fill("demo-e2e-or-small-sliders");
    await form.getByLabel("Jurisdiction").selectOption("OR");
    await form.getByLabel("Governs").selectOption("import");
    await form.getByLabel("What the rule says, in plain words").fill("Demo rule: no slider under 4 in into Oregon.");
    await form.getByRole("combobox", { name: "Taxa covered" }).fill("Trachemys scripta");
    await page
      .getByRole("option", { name: /Trachemys scripta/ })
      .first()
      .click();
    // A length in the unit the person chose (inches by default), kept in mm by the form.
    await form.getByLabel(/Applies below this length/).fill("4");
    await form.getByLabel("Effect").selectOption("prohibited");
    await form.getByLabel("Citation").fill("Written in the e2e test: demo rule, not a statement of that state's law");
    expect(await page.getByRole("textbox", { name: /JSON/ }).count()).toBe(0);
    const [created] = await Promise.all([
      page.waitForResponse((r) => r.url().endsWith("/api/compliance/rules") && r.request().method() === "POST"),
      form.getByRole("button", { name: "Add the rule" }).click(),
    ]);
    expect(created.status()).toBe(201);
    // [published] 1 in = 25.4 mm exactly: 4 in is 101.6 mm
    expect(
      ((await created.json()) as { version: { rule: { conditions: { lengthBelowMm: number } } } }).version.rule
        .conditions.lengthBelowMm,
    ).toBeCloseTo(101.6, 6);
    await screenshot(page, "compliance-rule-created");

    await page.getByLabel("State").selectOption("OR");
    await page.getByRole("button", { name: "Filter" }).click();
    await page
      .getByRole("row", { name: /no slider under 4 in/ })
      .getByRole("button", { name: "Versions" })
      .click();
    await page.getByRole("button", { name: "Retire" }).click();
    await expect.poll(() => page.getByRole("button", { name: "Put back in force" }).count()).toBe(1);

    await page.getByRole("button", { name: "Coverage by state" }).click();
    const tennessee = page.getByRole("listitem", { name: "Tennessee" });
    await tennessee.getByRole("button", { name: "Record a review" }).click();
    await tennessee.getByLabel("What was read, and what is missing").fill("E2E: read the state's rules.");
    await tennessee.getByRole("button", { name: "Record the review" }).click();
    await expect.poll(() => tennessee.getByText(/^Reviewed /).count()).toBeGreaterThan(0);
    await expectAccessible(page);
    await screenshot(page, "compliance-coverage");
    // Leave the demo as it was: withdraw the review.
    await tennessee.getByRole("button", { name: "Change the review" }).click();
    await tennessee.getByRole("button", { name: "Withdraw the review" }).click();
    await expect.poll(() => tennessee.getByText("Not reviewed").count()).toBe(1);
    await context.close();
  });
});
