import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const alias = {
  "@shared": fileURLToPath(new URL("./shared", import.meta.url)),
  "@": fileURLToPath(new URL("./src", import.meta.url)),
};

/** Tests that need the real PostgreSQL (and the fakes) started by the global setup. */
const integration = ["server/routes/**/*.test.ts", "server/**/*.db.test.ts", "tests/api/**/*.test.ts"];

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          environment: "node",
          include: ["shared/**/*.test.ts", "server/**/*.test.ts", "fakes/**/*.test.ts", "scripts/**/*.test.ts"],
          exclude: integration,
          // Rendering a PDF page to pixels takes a second alone and several on a busy 2-core machine.
          testTimeout: 20_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          environment: "node",
          include: integration,
          globalSetup: ["tests/support/global-setup.ts"],
          setupFiles: ["tests/support/db-setup.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "dom",
          environment: "jsdom",
          include: ["src/**/*.test.tsx", "src/**/*.test.ts"],
          setupFiles: ["tests/support/dom-setup.ts"],
          // A whole form typed through user-event takes a few seconds on a busy 2-core machine.
          testTimeout: 20_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          environment: "node",
          include: ["tests/e2e/**/*.e2e.ts"],
          globalSetup: ["tests/support/e2e-setup.ts"],
          fileParallelism: false,
          // A browser step on a loaded CI machine can take seconds; 1 s (the default) made polls flaky.
          expect: { poll: { timeout: 10_000, interval: 100 } },
          testTimeout: 90_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
