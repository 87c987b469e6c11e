// Types of the loaders.gl stand-in (deckNoLoaders.js) for the test that checks it.
export declare function registerLoaders(): void;
export declare function load(url: unknown): Promise<never>;
export declare const ImageLoader: Readonly<{ name: string; extensions: string[] }>;
