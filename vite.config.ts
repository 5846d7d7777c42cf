import { fileURLToPath } from "node:url";
import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { compression, defineAlgorithm } from "vite-plugin-compression2";

/** Client modules the entry itself imports: they stay in the entry's chunk, out of the groups below. */
const ENTRY_MODULES = [
  "src/lib/api-client.ts",
  "src/lib/transfer-queries.ts",
  "src/lib/query-string.ts",
  "src/components/ui/feedback.tsx",
];
const inEntry = (id: string) => ENTRY_MODULES.some((entry) => id.replaceAll("\\", "/").endsWith(entry));

const apiTarget = process.env.HATCHWAY_API_URL ?? "http://127.0.0.1:3000";

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // Precompressed copies (.br and .gz) beside each text asset, served by express-static-gzip
    // with Content-Encoding: the server spends no CPU compressing per request (DEVELOPERS.md D13).
    compression({
      algorithms: [defineAlgorithm("brotliCompress"), defineAlgorithm("gzip", { level: 9 })],
      include: /\.(html|css|js|json|svg)$/,
      threshold: 1024,
    }),
  ],
  resolve: {
    alias: {
      "@shared": fileURLToPath(new URL("./shared", import.meta.url)),
      "@": fileURLToPath(new URL("./src", import.meta.url)),
    },
  },
  server: {
    host: "127.0.0.1",
    port: 5173,
    proxy: { "/api": { target: apiTarget, changeOrigin: false } },
  },
  build: {
    outDir: "dist",
    // Maps for our own debugging, never linked from the code; the server answers 404 for *.map.
    sourcemap: "hidden",
    chunkSizeWarningLimit: 2000,
    rolldownOptions: {
      output: {
        // Module bodies run in import order whichever chunk they land in (needed once groups stop
        // pulling in their imports, or a chunk may call React before React's chunk has run).
        strictExecutionOrder: true,
        codeSplitting: {
          // A group takes the modules it names, not their imports (React stays in the entry).
          includeDependenciesRecursively: false,
          // Fewer, larger chunks behind the sign-in page: on a phone link every request costs a
          // round trip. The entry (React, the router, the query client) stays as it is.
          groups: [
            {
              name: "forms",
              test: /node_modules[\\/](react-hook-form|@hookform|zod)[\\/]/,
              priority: 20,
            },
            { name: "kit", test: (id) => /[\\/]src[\\/](components|lib)[\\/]/.test(id) && !inEntry(id), priority: 10 },
          ],
        },
      },
    },
    // No data: URIs for assets: the CSP allows fonts and images from our own origin only.
    assetsInlineLimit: 0,
  },
});
