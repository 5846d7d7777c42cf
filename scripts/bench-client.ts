/**
 * `npm run bench:client`: builds the client, starts the real server with the demo data, and
 * loads two pages in Debian's Chromium on a throttled phone profile with a cold cache:
 *
 * - the sign-in page: the JavaScript fetched before the form is usable (target ≤ 150 KB gzipped);
 * - the courier's leg page (what a box label's QR code opens): time until the handoff form is
 *   usable (target ≤ 4 s).
 *
 * "Usable" is the moment the page's submit button is in the document (the client renders on the
 * page, so React has attached its handlers by then), taken inside the page by a MutationObserver.
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { brotliCompressSync, constants as zlibConstants, gzipSync } from "node:zlib";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { benchSignIn, startBenchServer } from "./lib/bench-server";
import { PROJECT_ROOT } from "./lib/postgres";
import { announceRuntime } from "./lib/runtime";
import { launchChromium } from "../tests/support/chromium";

const RUNS = Number(process.env.BENCH_RUNS ?? 3);
const DIST = path.join(PROJECT_ROOT, "test-output", "dist-bench");

/**
 * Lighthouse's mobile profile ("slow 4G" on a mid-range phone): 1.6 Mbps down, 750 kbps up,
 * 150 ms round trip, 4× CPU slowdown [published: Lighthouse docs, throttling.md].
 */
const PHONE_PROFILE = {
  downloadBytesPerS: 1_600_000 / 8,
  uploadBytesPerS: 750_000 / 8,
  latencyMs: 150,
  cpuSlowdown: 4,
};

const TARGET_SIGN_IN_GZIP_KB = 150;
const TARGET_LEG_PAGE_S = 4;

type Usable = { selector: string; text: string };
type ScriptEntry = { url: string; encodedBytes: number };
type Load = { usableMs: number; scripts: ScriptEntry[] };

/**
 * Runs in the page before its own scripts: notes when a matching, enabled element first appears.
 * A string, not a function: tsx wraps named functions in a helper the page does not have.
 */
function watchForUsable({ selector, text }: Usable): string {
  return `(() => {
    const selector = ${JSON.stringify(selector)};
    const text = ${JSON.stringify(text)};
    const observer = new MutationObserver(() => {
      for (const element of document.querySelectorAll(selector)) {
        if (element.textContent.includes(text) && !element.disabled) {
          window.__usableAt = performance.now();
          observer.disconnect();
          return;
        }
      }
    });
    observer.observe(document, { subtree: true, childList: true, attributes: true });
  })();`;
}

/** A fresh page with a cold, disabled cache on the phone profile. */
async function throttledPage(context: BrowserContext, usable: Usable): Promise<Page> {
  const page = await context.newPage();
  await page.addInitScript(watchForUsable(usable));
  const cdp = await context.newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.clearBrowserCache");
  await cdp.send("Network.setCacheDisabled", { cacheDisabled: true });
  await cdp.send("Network.emulateNetworkConditions", {
    offline: false,
    latency: PHONE_PROFILE.latencyMs,
    downloadThroughput: PHONE_PROFILE.downloadBytesPerS,
    uploadThroughput: PHONE_PROFILE.uploadBytesPerS,
  });
  await cdp.send("Emulation.setCPUThrottlingRate", { rate: PHONE_PROFILE.cpuSlowdown });
  return page;
}

async function loadUntilUsable(context: BrowserContext, url: string, usable: Usable): Promise<Load> {
  const page = await throttledPage(context, usable);
  await page.goto(url, { waitUntil: "commit" });
  await page.waitForFunction(() => (window as unknown as { __usableAt?: number }).__usableAt !== undefined, null, {
    timeout: 60_000,
    polling: 100,
  });
  const load = await page.evaluate(() => {
    const usableMs = (window as unknown as { __usableAt: number }).__usableAt;
    const scripts = (performance.getEntriesByType("resource") as PerformanceResourceTiming[])
      .filter((entry) => /\.m?js(\?|$)/.test(new URL(entry.name).pathname) && entry.startTime <= usableMs)
      .map((entry) => ({ url: entry.name, encodedBytes: entry.encodedBodySize }));
    return { usableMs, scripts };
  });
  await page.close();
  return load;
}

/** The built file behind a URL under /assets (the bytes the server sends, before any compression). */
function builtFile(url: string): Buffer {
  return readFileSync(path.join(DIST, decodeURIComponent(new URL(url).pathname)));
}

function sizes(scripts: ScriptEntry[]) {
  let raw = 0;
  let gzip = 0;
  let brotli = 0;
  let sent = 0;
  for (const s of scripts) {
    const body = builtFile(s.url);
    raw += body.length;
    gzip += gzipSync(body, { level: 9 }).length;
    brotli += brotliCompressSync(body, { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 11 } }).length;
    sent += s.encodedBytes;
  }
  return { files: scripts.length, raw, gzip, brotli, sent };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
// Kilobytes of 1,000 bytes, as Vite reports them (the 368 KB came from there).
const kb = (bytes: number) => `${(bytes / 1000).toFixed(1)} kB`;

/** A transfer whose next handoff is the demo courier's, so the leg page shows its form. */
async function courierLeg(baseUrl: string, cookie: string): Promise<string> {
  const headers = { Cookie: cookie };
  const list = (await (await fetch(`${baseUrl}/api/transfers?limit=50`, { headers })).json()) as {
    transfers: { id: string }[];
  };
  for (const { id } of list.transfers) {
    const { transfer } = (await (await fetch(`${baseUrl}/api/transfers/${id}`, { headers })).json()) as {
      transfer: { abilities: { handOff: number | null } };
    };
    if (transfer.abilities.handOff !== null) return id;
  }
  throw new Error("the demo data has no leg with a handoff for the courier to record");
}

async function measureSignIn(browser: Browser, baseUrl: string) {
  const loads: Load[] = [];
  for (let run = 0; run < RUNS; run++) {
    const context = await browser.newContext({ baseURL: baseUrl, viewport: { width: 390, height: 844 } });
    loads.push(await loadUntilUsable(context, "/sign-in", { selector: "button[type=submit]", text: "Sign in" }));
    await context.close();
  }
  return { loads, sizes: sizes(loads[0]!.scripts) };
}

async function measureLegPage(browser: Browser, baseUrl: string) {
  const cookie = await benchSignIn(baseUrl, "courier@demo.hatchway.test");
  const [name, value] = [cookie.slice(0, cookie.indexOf("=")), cookie.slice(cookie.indexOf("=") + 1)];
  const transferId = await courierLeg(baseUrl, cookie);
  const loads: Load[] = [];
  for (let run = 0; run < RUNS; run++) {
    const context = await browser.newContext({ baseURL: baseUrl, viewport: { width: 390, height: 844 } });
    await context.addCookies([{ name, value, url: baseUrl }]);
    loads.push(
      await loadUntilUsable(context, `/legs/${transferId}`, {
        selector: "button[type=submit]",
        text: "Review before confirming",
      }),
    );
    await context.close();
  }
  return { loads, sizes: sizes(loads[0]!.scripts) };
}

async function main() {
  announceRuntime("bench");
  process.stdout.write("[bench] building the client…\n");
  const build = spawnSync(
    path.join(PROJECT_ROOT, "node_modules/.bin/vite"),
    ["build", "--logLevel", "error", "--outDir", DIST, "--emptyOutDir"],
    { cwd: PROJECT_ROOT, stdio: "inherit", env: { ...process.env, NODE_ENV: "production" } },
  );
  if (build.status !== 0) throw new Error("the client build failed");

  const server = await startBenchServer({
    port: Number(process.env.PORT ?? 3901),
    env: { CLIENT_DIST: DIST },
  });
  const browser = await launchChromium();
  try {
    const signIn = await measureSignIn(browser, server.baseUrl);
    const leg = await measureLegPage(browser, server.baseUrl);
    const profile = `${PHONE_PROFILE.downloadBytesPerS / 125_000} Mbps down, ${PHONE_PROFILE.latencyMs} ms RTT, ${PHONE_PROFILE.cpuSlowdown}× CPU slowdown, cache disabled`;
    console.log(`\nChromium ${browser.version()}, ${profile}; ${RUNS} cold loads each, median shown\n`);

    const s = signIn.sizes;
    const signInMs = median(signIn.loads.map((l) => l.usableMs));
    console.log(
      `sign-in page: JavaScript before the form is usable: ${s.files} files, ${kb(s.raw)} raw, ` +
        `${kb(s.gzip)} gzipped (gzip -9), ${kb(s.brotli)} brotli, ${kb(s.sent)} as sent by the server`,
    );
    console.log(
      `  target ≤ ${TARGET_SIGN_IN_GZIP_KB} kB gzipped: ${s.gzip / 1000 <= TARGET_SIGN_IN_GZIP_KB ? "met" : "MISSED"}` +
        `  (usable after ${(signInMs / 1000).toFixed(2)} s; runs ${signIn.loads.map((l) => (l.usableMs / 1000).toFixed(2)).join(", ")} s)`,
    );

    const l = leg.sizes;
    const legMs = median(leg.loads.map((x) => x.usableMs));
    console.log(
      `courier's leg page (/legs/:id): handoff form usable after ${(legMs / 1000).toFixed(2)} s` +
        ` (runs ${leg.loads.map((x) => (x.usableMs / 1000).toFixed(2)).join(", ")} s); JavaScript before it: ` +
        `${l.files} files, ${kb(l.raw)} raw, ${kb(l.gzip)} gzipped, ${kb(l.sent)} as sent`,
    );
    console.log(`  target ≤ ${TARGET_LEG_PAGE_S} s: ${legMs / 1000 <= TARGET_LEG_PAGE_S ? "met" : "MISSED"}`);
  } finally {
    await browser.close();
    await server.stop();
  }
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
