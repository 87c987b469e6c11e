import { defineConfig } from "vitest/config";

// Browser end-to-end tests: the built dashboard (dashboard/dist) served by
// scripts/serve.js and driven in Debian's headless Chromium. Run with
// `npm run test:e2e` (which builds first). One file at a time: software WebGL
// is slow and each file starts its own browser.
export default defineConfig({
  test: {
    include: ["tests/e2e/**/*.e2e.test.ts"],
    environment: "node",
    testTimeout: 120_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    maxWorkers: 1,
    env: { TZ: "UTC" },
  },
});
