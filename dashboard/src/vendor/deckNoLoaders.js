// Stand-in for @loaders.gl/core and @loaders.gl/images inside deck.gl's core, swapped in by
// dashboard/deckTrim.ts. deck.gl calls loaders.gl only to fetch a layer prop given as a URL string
// (`data: "https://..."`, an image URL) and registers its JSON and image loaders for that at start;
// every layer of the dashboard gets its data as arrays computed in the page (src/map/layers.ts), and
// the dashboard is offline. registerLoaders is a no-op; load rejects, which deck.gl reports through
// the layer's onError.
export function registerLoaders() {}

export function load(url) {
  return Promise.reject(
    new Error(`Loading layer data from a URL (${String(url)}) is not part of the dashboard build; layers take arrays.`),
  );
}

export const ImageLoader = Object.freeze({ name: "Images (not part of the dashboard build)", extensions: [] });
