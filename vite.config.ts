import { fileURLToPath } from "node:url";
import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { compression, defineAlgorithm } from "vite-plugin-compression2";

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
        codeSplitting: {
          // The form library and the schema library in one chunk, fetched by the screens with a
          // form: one request instead of several on a phone link. A group takes only the modules it
          // names (these import React, which stays in the entry's chunks), so nothing here can pull
          // React, or our own code, away from the sign-in page.
          includeDependenciesRecursively: false,
          groups: [{ name: "forms", test: /node_modules[\\/](react-hook-form|@hookform[\\/]resolvers|zod)[\\/]/ }],
        },
      },
    },
    // No data: URIs for assets: the CSP allows fonts and images from our own origin only.
    assetsInlineLimit: 0,
  },
});
