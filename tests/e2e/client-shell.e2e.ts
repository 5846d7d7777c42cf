/**
 * The client as a phone gets it: what the sign-in page and the courier's leg page fetch, how
 * the server sends the built files, page titles, focus rings, and a header that fits a phone and
 * a desktop for every role. Sizes and times on a throttled phone are measured by
 * `npm run bench:client`, never here; this file guards what must hold on every build.
 */
import { gzipSync } from "node:zlib";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Browser, Page, Response } from "playwright-core";
import { DESKTOP, launchBrowser, newPage, PHONE, screenshot, signInAs } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

/** Strings that survive minification and mark a library: its CSS class, a method or an option name. */
const HEAVY = {
  charts: "recharts-wrapper", // recharts
  table: "getCoreRowModel", // @tanstack/react-table
  forms: "shouldUnregister", // react-hook-form
  schemas: "ZodError", // zod
  map: "Topology", // us-atlas's states (TopoJSON), with d3-geo in the map's chunk
};

/** The JavaScript a page fetched, with each file's text. */
function collectScripts(page: Page): Promise<{ url: string; text: string }[]>[] {
  const pending: Promise<{ url: string; text: string }[]>[] = [];
  page.on("response", (response: Response) => {
    if (/\.m?js$/.test(new URL(response.url()).pathname))
      pending.push(response.text().then((text) => [{ url: response.url(), text }]));
  });
  return pending;
}
const settle = async (pending: Promise<{ url: string; text: string }[]>[]) => (await Promise.all(pending)).flat();

describe("what each page fetches", () => {
  it("the sign-in page fetches only what it shows: no charts, tables, form library or schemas", async () => {
    const { context, page } = await newPage(browser, PHONE);
    const pending = collectScripts(page);
    await page.goto("/sign-in");
    await page.getByRole("button", { name: "Sign in" }).waitFor();
    await page.waitForLoadState("networkidle");
    const scripts = await settle(pending);
    for (const marker of Object.values(HEAVY)) expect(scripts.filter((s) => s.text.includes(marker))).toEqual([]);
    // The budget: at most 150 kB of gzipped JavaScript before the form is usable.
    const gzipped = scripts.reduce((sum, s) => sum + gzipSync(s.text, { level: 9 }).length, 0);
    expect(gzipped).toBeLessThanOrEqual(150_000);
    expect(await page.title()).toBe("Sign in · Hatchway");
    await context.close();
  });

  it("the courier's leg page brings the form library, not the charts or the transfers table", async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signInAs(page, "courier@demo.hatchway.test");
    await page.waitForURL((u) => u.pathname === "/");
    const list = await page.evaluate(async () => (await fetch("/api/transfers?limit=50")).json());
    let legUrl = "";
    for (const { id } of list.transfers as { id: string }[]) {
      const { transfer } = await page.evaluate(async (tid) => (await fetch(`/api/transfers/${tid}`)).json(), id);
      if (transfer.abilities.handOff !== null) legUrl = `/legs/${id}`;
    }
    expect(legUrl).not.toBe("");
    // A fresh page, as when a box label's code is scanned.
    const scan = await context.newPage();
    const pending = collectScripts(scan);
    await scan.goto(legUrl);
    await scan.getByRole("button", { name: "Review before confirming" }).waitFor();
    const scripts = await settle(pending);
    expect(scripts.some((s) => s.text.includes(HEAVY.forms))).toBe(true);
    expect(scripts.filter((s) => s.text.includes(HEAVY.charts) || s.text.includes(HEAVY.table))).toEqual([]);
    expect(await scan.title()).toMatch(/^Leg of HW-\d{2}-\w{5} · Hatchway$/);
    await context.close();
  });
});

describe("how the server sends the built client", () => {
  // Content-Encoding and Vary: RFC 9110 §8.4 and §12.5.5; "immutable": RFC 8246 [published].
  it("compressed, cached for a year when hashed, revalidated when not, and without source maps", async () => {
    const base = inject("baseUrl");
    const page = await fetch(`${base}/sign-in`);
    expect(page.headers.get("cache-control")).toBe("no-cache");
    const html = await page.text();
    const entry = /<script type="module" crossorigin src="(\/assets\/[^"]+\.js)"/.exec(html)?.[1];
    expect(entry).toBeDefined();

    const script = await fetch(`${base}${entry}`, { headers: { "Accept-Encoding": "br, gzip" } });
    expect(script.headers.get("content-encoding")).toBe("br");
    expect(script.headers.get("vary")).toMatch(/Accept-Encoding/i);
    expect(script.headers.get("cache-control")).toBe("public, max-age=31536000, immutable");
    const code = await script.text(); // fetch decodes brotli itself
    expect(code).not.toMatch(/sourceMappingURL/);

    const gzip = await fetch(`${base}${entry}`, { headers: { "Accept-Encoding": "gzip" } });
    expect(gzip.headers.get("content-encoding")).toBe("gzip");
    expect(await gzip.text()).toBe(code);

    expect((await fetch(`${base}${entry}.map`)).status).toBe(404);
    expect((await fetch(`${base}/assets/no-such-file-0000.js`)).status).toBe(404);
  });
});

describe("pages, focus and header", () => {
  it("each page names itself in the browser tab", async () => {
    const { context, page } = await newPage(browser);
    await signInAs(page, "sender@demo.hatchway.test");
    await expect.poll(() => page.title()).toBe("Transfers · Hatchway");
    await page
      .getByRole("link", { name: /^HW-\d{2}-\w{5}$/ })
      .first()
      .click();
    await expect.poll(() => page.title()).toMatch(/^Transfer HW-\d{2}-\w{5} · Hatchway$/);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Permits" }).click();
    await expect.poll(() => page.title()).toBe("Permits and certificates · Hatchway");
    await page.goto("/no-such-page");
    await expect.poll(() => page.title()).toBe("Page not found · Hatchway");
    await context.close();
  });

  it("a field reached with the keyboard shows a green focus ring", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sign-in");
    const email = page.getByLabel("E-mail");
    await email.waitFor();
    await page.keyboard.press("Tab");
    await expect.poll(() => email.evaluate((el) => el === document.activeElement)).toBe(true);
    // The theme's fern ring, #6f9a76: 3.1:1 against the card, above WCAG 2.2's 3:1 for focus indicators.
    expect(await email.evaluate((el) => getComputedStyle(el).boxShadow)).toContain("rgb(111, 154, 118)");
    await screenshot(page, "focus-ring-sign-in");
    await context.close();
  });

  const ROLES = ["sender", "receiver", "courier", "admin"] as const;
  it.each(ROLES)("the header of %s fits a phone and a desktop", async (role) => {
    for (const [size, device] of [
      ["phone", PHONE],
      ["desktop", DESKTOP],
    ] as const) {
      const { context, page } = await newPage(browser, device);
      await signInAs(page, `${role}@demo.hatchway.test`);
      await page.waitForURL((u) => u.pathname === "/");
      await page.getByRole("heading", { level: 1 }).waitFor();
      const width = device.viewport.width;
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      const header = (await page.locator("body > div header").first().boundingBox())!;
      const brand = (await page.getByRole("link", { name: "Hatchway", exact: true }).boundingBox())!;
      if (size === "phone") {
        // One bar: name, units and a Menu button that folds out the sections and the account.
        expect(header.height).toBeLessThanOrEqual(80);
        const menu = page.getByRole("button", { name: "Menu" });
        const box = (await menu.boundingBox())!;
        expect(Math.abs(box.y + box.height / 2 - (brand.y + brand.height / 2))).toBeLessThan(12);
        await menu.click();
        expect(await menu.getAttribute("aria-expanded")).toBe("true");
        await page.getByRole("button", { name: "Sign out" }).waitFor();
        await screenshot(page, `header-${role}-phone-menu`);
      } else {
        // Two rows at most: the account sits on the name's row, the sections on the next one.
        expect(header.height).toBeLessThanOrEqual(130);
        const signOut = (await page.getByRole("button", { name: "Sign out" }).boundingBox())!;
        expect(Math.abs(signOut.y + signOut.height / 2 - (brand.y + brand.height / 2))).toBeLessThan(12);
        const links = page.getByRole("navigation", { name: "Main" }).getByRole("link");
        const tops = new Set(
          await links.evaluateAll((all) => all.map((a) => Math.round(a.getBoundingClientRect().top))),
        );
        expect(tops.size).toBe(1);
      }
      await screenshot(page, `header-${role}-${size}`);
      await context.close();
    }
  });
});
