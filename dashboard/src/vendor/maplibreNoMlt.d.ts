// Types of the MLT stand-in (maplibreNoMlt.js) for the test that checks it.
export declare const GEOMETRY_TYPE: Readonly<Record<string, number | string>>;
export declare function decodeTile(): never;
