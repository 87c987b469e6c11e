import { fileURLToPath } from "node:url";
import { defineConfig } from "vite";
import { svelte } from "@sveltejs/vite-plugin-svelte";

const dashboardDir = fileURLToPath(new URL(".", import.meta.url));
const repoDir = fileURLToPath(new URL("..", import.meta.url));

// The dashboard is a static, offline bundle: no CDN, no remote tiles or fonts.
// Demo data are imported from data-demo/ at build time (see src/lib/demoData.ts).
export default defineConfig({
  root: dashboardDir,
  base: "./",
  plugins: [svelte({ configFile: false })],
  worker: { format: "es" },
  server: { fs: { allow: [repoDir] } },
  build: {
    outDir: "dist",
    emptyOutDir: true,
    target: "es2022",
    // maplibre-gl and deck.gl are large by nature; the whole app stays offline.
    chunkSizeWarningLimit: 2500,
  },
});
