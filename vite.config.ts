/// <reference types="vitest/config" />
import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

// The API server the dev server proxies to (see server/devstack/dev.ts).
const apiPort = Number(process.env.PORT ?? 4300);
const apiTarget = `http://127.0.0.1:${apiPort}`;

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { tsconfigPaths: true },
  build: {
    outDir: "dist/client",
    emptyOutDir: true,
    sourcemap: true,
    // scripts/pupil-size.ts reads it to measure the pupil page's first load.
    manifest: true,
  },
  server: {
    host: "127.0.0.1",
    port: Number(process.env.VITE_PORT ?? 5173),
    strictPort: true,
    // Keep the browser's Host header: sign-in must start and end on the address people use.
    proxy: {
      "/api": { target: apiTarget, changeOrigin: false },
      "/auth": { target: apiTarget, changeOrigin: false },
      "/socket.io": { target: apiTarget, changeOrigin: false, ws: true },
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: [
            "src/**/*.test.{ts,tsx}",
            "server/**/*.test.ts",
            "sim/**/*.test.ts",
            "tests/architecture/**/*.test.ts",
          ],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          globalSetup: ["tests/support/global-setup.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts", "tests/startup/**/*.test.ts"],
          globalSetup: ["tests/support/global-setup.ts"],
          testTimeout: 120_000,
          hookTimeout: 240_000,
        },
      },
    ],
  },
});
