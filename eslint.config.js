// Lint with the import boundaries of STYLE.md: shared/ is pure, features do not import
// each other, the client never reaches into the server.
import { readdirSync, existsSync } from "node:fs";
import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";

const NODE_BUILTINS = [
  "fs",
  "path",
  "crypto",
  "os",
  "http",
  "https",
  "net",
  "child_process",
  "stream",
  "url",
  "util",
  "zlib",
  "buffer",
  "events",
];
const features = existsSync("src/features") ? readdirSync("src/features") : [];

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", "test-output/**", ".data/**", "server/db/migrations/*.json"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" },
      ],
      "@typescript-eslint/consistent-type-imports": [
        "error",
        { fixStyle: "inline-type-imports", disallowTypeAnnotations: false },
      ],
      "no-console": "off",
      eqeqeq: ["error", "smart"],
    },
  },
  {
    files: ["**/*.{js,mjs}"],
    languageOptions: { globals: { console: "readonly", process: "readonly", URL: "readonly" } },
  },
  {
    files: ["shared/**/*.ts"],
    ignores: ["shared/**/*.test.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: ["@/*", "**/src/**", "**/server/**"], message: "shared/ imports nothing from src/ or server/." },
            { group: ["node:*", ...NODE_BUILTINS], message: "shared/ uses no Node APIs: it runs in the browser too." },
          ],
        },
      ],
      "no-restricted-globals": ["error", "window", "document", "process", "Buffer", "localStorage"],
    },
  },
  {
    // zod with our error map installed (shared/validation/zod.ts), so every message is a keeper's.
    files: ["shared/**/*.ts"],
    ignores: ["shared/**/*.test.ts", "shared/validation/zod.ts"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          paths: [
            {
              name: "zod",
              allowTypeImports: true,
              message: "Import z from shared/validation/zod, which installs the keeper's error messages.",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: {
      "react-hooks/rules-of-hooks": "error",
      "react-hooks/exhaustive-deps": "warn",
      "no-restricted-imports": [
        "error",
        {
          patterns: [{ group: ["**/server/**", "node:*"], message: "The client talks to the server over HTTP only." }],
        },
      ],
    },
  },
  ...features.map((feature) => ({
    files: [`src/features/${feature}/**/*.{ts,tsx}`],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: features.filter((f) => f !== feature).flatMap((f) => [`@/features/${f}/*`, `**/features/${f}/*`]),
              message: "Features do not import each other; compose them in src/app.",
            },
            { group: ["**/server/**", "node:*"], message: "The client talks to the server over HTTP only." },
          ],
        },
      ],
    },
  })),
  {
    files: ["server/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [{ group: ["@/*", "**/src/**"], message: "The server does not import the client." }] },
      ],
    },
  },
  {
    // Assemble once (D15): a module keeps no state that an app could set or fill. Settings,
    // adapters, gates and tasks are built in server/composition.ts and travel in the app context.
    files: ["server/**/*.{ts,mjs}"],
    ignores: ["server/**/*.test.ts", "server/adapters/weather-client.worker.mjs"],
    rules: {
      "no-restricted-syntax": [
        "error",
        {
          selector:
            "Program > VariableDeclaration[kind='let'], Program > ExportNamedDeclaration > VariableDeclaration[kind='let']",
          message:
            "No module-level mutable state in server/: build it in server/composition.ts and pass it in the app context (D15). A value computed once and the same for every app goes through computedOnce.",
        },
      ],
    },
  },
);
