// Installs the npm dependencies with `npm ci` when node_modules is missing or older than the
// lock file. Plain Node, no dependencies: it runs before anything is installed.
import { createHash } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { spawnSync } from "node:child_process";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");
const lock = path.join(root, "package-lock.json");
const stamp = path.join(root, "node_modules", ".hatchway-lock-sha256");
const want = createHash("sha256").update(readFileSync(lock)).digest("hex");
const have = existsSync(stamp) ? readFileSync(stamp, "utf8").trim() : "";

if (want !== have || !existsSync(path.join(root, "node_modules", ".bin", "tsx"))) {
  console.log("[setup] installing npm dependencies with npm ci …");
  const result = spawnSync("npm", ["ci", "--no-audit", "--no-fund"], { cwd: root, stdio: "inherit" });
  if (result.status !== 0) {
    console.error("[setup] npm ci failed; see the output above.");
    process.exit(result.status ?? 1);
  }
  writeFileSync(stamp, want + "\n");
}
