/**
 * The Node.js every script runs on: the exact `node` package in package.json puts it in
 * node_modules/.bin, which npm scripts find first on their PATH. Says which one runs, and
 * refuses an older one (Node.js 20 reached end of life in April 2026).
 */
const WANT_MAJOR = 24;

export function announceRuntime(prefix: string): void {
  const major = Number(process.versions.node.split(".")[0]);
  process.stdout.write(`[${prefix}] Node.js ${process.version} (${process.execPath})\n`);
  if (major < WANT_MAJOR) {
    throw new Error(
      `Hatchway runs on Node.js ${WANT_MAJOR}; this is ${process.version}. Run it through npm (npm start, npm test), ` +
        "which puts the project's own Node.js from node_modules/.bin first.",
    );
  }
}
