import { existsSync } from "node:fs";
import { spawnSync } from "node:child_process";

/** Debian packages the tests need, installed with apt when missing and we are root. */
const NEEDED = [
  { command: "/usr/bin/chromium", pkg: "chromium", why: "browser tests" },
  { command: "/usr/bin/pdftoppm", pkg: "poppler-utils", why: "rendering PDF pages to PNG in tests" },
];

export function ensureSystemPackages(): void {
  const missing = NEEDED.filter((n) => !existsSync(n.command));
  if (missing.length === 0) return;
  const names = missing.map((m) => m.pkg);
  if (process.getuid?.() !== 0) {
    throw new Error(
      `Missing Debian packages: ${names.join(", ")} (${missing.map((m) => m.why).join("; ")}). Install them with: sudo apt-get install -y ${names.join(" ")}`,
    );
  }
  console.log(`[setup] installing ${names.join(", ")} with apt-get (first run only)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  spawnSync("apt-get", ["update"], { stdio: "inherit", env });
  const result = spawnSync("apt-get", ["install", "-y", "--no-install-recommends", ...names], {
    stdio: "inherit",
    env,
  });
  if (result.status !== 0 || missing.some((m) => !existsSync(m.command)))
    throw new Error(`apt-get could not install ${names.join(", ")}`);
}
