/**
 * `npm test`: type-check, lint, then every vitest project (unit, dom, integration against
 * the real PostgreSQL, browser end-to-end in Debian's Chromium). The last line is
 * "N passed, N failed": the tests, plus each type-check project and the lint as one check each.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import { PROJECT_ROOT, ensurePostgresInstalled } from "./lib/postgres";
import { ensureSystemPackages } from "./lib/system-packages";
import { announceRuntime } from "./lib/runtime";

const bin = (name: string) => path.join(PROJECT_ROOT, "node_modules", ".bin", name);
const out = path.join(PROJECT_ROOT, "test-output");
mkdirSync(out, { recursive: true });

let passed = 0;
let failed = 0;

function check(name: string, cmd: string, args: string[]): void {
  process.stdout.write(`\n[test] ${name}\n`);
  const result = spawnSync(cmd, args, { cwd: PROJECT_ROOT, stdio: "inherit" });
  if (result.status === 0) {
    passed++;
    process.stdout.write(`[test] ${name}: ok\n`);
  } else {
    failed++;
    process.stdout.write(`[test] ${name}: FAILED\n`);
  }
}

try {
  announceRuntime("test");
  ensurePostgresInstalled();
  ensureSystemPackages();
} catch (err) {
  console.error(`[test] ${(err as Error).message}`);
  failed++;
}

for (const project of ["shared", "app", "node"])
  check(`type-check (${project})`, bin("tsc"), ["-p", `tsconfig.${project}.json`]);

check("lint", bin("eslint"), ["--max-warnings", "0", "."]);
check("format (prettier --check)", bin("prettier"), ["--check", "--log-level", "warn", "."]);

const report = path.join(out, "vitest.json");
rmSync(report, { force: true });
process.stdout.write("\n[test] vitest: unit, dom, integration, e2e\n");
const extra = process.argv.slice(2);
const vitest = spawnSync(
  bin("vitest"),
  ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${report}`, ...extra],
  {
    cwd: PROJECT_ROOT,
    stdio: "inherit",
  },
);

if (existsSync(report)) {
  const json = JSON.parse(readFileSync(report, "utf8")) as {
    numPassedTests: number;
    numFailedTests: number;
    numTotalTestSuites: number;
    testResults: { status: string; message?: string; name: string; assertionResults: unknown[] }[];
  };
  passed += json.numPassedTests;
  failed += json.numFailedTests;
  // A file that failed to load has no tests to count: count the file.
  const brokenFiles = json.testResults.filter((r) => r.status === "failed" && r.assertionResults.length === 0);
  for (const f of brokenFiles)
    process.stdout.write(`[test] could not run ${path.relative(PROJECT_ROOT, f.name)}: ${f.message ?? ""}\n`);
  failed += brokenFiles.length;
  if (vitest.status !== 0 && json.numFailedTests === 0 && brokenFiles.length === 0) failed++;
} else {
  process.stdout.write("[test] vitest did not produce a report\n");
  failed++;
}

process.stdout.write(`\n${passed} passed, ${failed} failed\n`);
process.exit(failed === 0 ? 0 : 1);
