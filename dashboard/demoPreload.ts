import type { Plugin } from "vite";

/** The demo files the dashboard reads at start (src/lib/demoData.ts): the combined survey file, centerline, basemap. */
const READ_AT_START = [/data-demo\/surveys\/both-surveys\.csv$/, /data-demo\/[^/]+\.geojson$/];

/**
 * Vite plugin: the built index.html preloads the demo's data files (emitted as assets, fetched by
 * src/lib/demoData.ts), so they load alongside the JavaScript instead of after it.
 */
export const demoPreload: Plugin = {
  name: "brackline-demo-preload",
  apply: "build",
  transformIndexHtml: {
    order: "post",
    handler(_html, ctx) {
      const assets = Object.values(ctx.bundle ?? {}).filter(
        (f) => f.type === "asset" && f.originalFileNames.some((n) => READ_AT_START.some((re) => re.test(n))),
      );
      return assets.map((f) => ({
        tag: "link",
        attrs: { rel: "preload", as: "fetch", crossorigin: "", href: `./${f.fileName}` },
        injectTo: "head" as const,
      }));
    },
  },
};
