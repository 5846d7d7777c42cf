import { fileURLToPath } from "node:url";
import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { compression, defineAlgorithm } from "vite-plugin-compression2";
import { VitePWA } from "vite-plugin-pwa";
import { OFFLINE_API_CACHE, OFFLINE_API_MAX_AGE_S, OFFLINE_NETWORK_TIMEOUT_S } from "./src/config/offline-cache";

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
    // The courier's pages open without signal (DEVELOPERS.md D40): Workbox precaches the built
    // shell and keeps the courier's GET answers for a while. The page registers the worker itself,
    // after it has loaded (src/lib/service-worker.ts), so nothing here weighs on the sign-in page.
    VitePWA({
      strategies: "generateSW",
      registerType: "autoUpdate",
      injectRegister: false,
      filename: "sw.js",
      manifestFilename: "manifest.webmanifest",
      includeAssets: ["icon.svg"],
      manifest: {
        name: "Hatchway",
        short_name: "Hatchway",
        description: "The shared record for moving live animals between keepers: the courier's legs and handoffs.",
        id: "/",
        start_url: "/",
        scope: "/",
        display: "standalone",
        // Warm paper behind the page, deep fern green for the bar (tailwind.config.ts).
        background_color: "#f7f1e3",
        theme_color: "#2f5d3a",
        icons: [
          { src: "/icon.svg", sizes: "any", type: "image/svg+xml", purpose: "any" },
          { src: "/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
          { src: "/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
          { src: "/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
        ],
      },
      workbox: {
        // The app's own files only; the .br/.gz copies beside them are the server's business.
        // Roboto Slab in the Latin subsets only: the others are never drawn on our pages.
        globPatterns: ["index.html", "assets/**/*.{js,css}", "assets/**/*-latin-*.woff2", "*.{svg,png}"],
        // One file: no second script for the CSP to allow or for a cache to keep stale.
        inlineWorkboxRuntime: true,
        navigateFallback: "/index.html",
        // The API's paths (PDFs opened in a tab included) are never answered with the page.
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        clientsClaim: true,
        skipWaiting: true,
        // Hashed names already tell versions apart.
        dontCacheBustURLsMatching: /^assets\//,
        maximumFileSizeToCacheInBytes: 3_000_000,
        sourcemap: false,
        runtimeCaching: [
          {
            // What the courier's pages read: their legs and each leg's transfer (contacts inside),
            // its manifest and labels, runs, and who is signed in. GET only: no answer to a POST is
            // kept. The network first; its copy after a few seconds without an answer.
            urlPattern: ({ url, request }) =>
              request.method === "GET" &&
              url.origin === self.location.origin &&
              (url.pathname === "/api/auth/me" || /^\/api\/(transfers|runs)(\/|$)/.test(url.pathname)),
            handler: "NetworkFirst",
            options: {
              cacheName: OFFLINE_API_CACHE,
              networkTimeoutSeconds: OFFLINE_NETWORK_TIMEOUT_S,
              // A refusal or an error is never kept in place of the last good answer.
              cacheableResponse: { statuses: [200] },
              expiration: { maxEntries: 300, maxAgeSeconds: OFFLINE_API_MAX_AGE_S, purgeOnQuotaError: true },
            },
          },
        ],
      },
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
