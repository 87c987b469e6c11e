import * as z from "zod/mini";
import en from "zod/v4/locales/en.js";

/**
 * The validation library for the workspace and mapping schemas: zod's tree-shakeable functional
 * build (zod/mini: `z.optional(x)`, `x.check(z.refine(...))`), so the dashboard ships only the
 * validators these schemas use. zod/mini loads no messages by itself; the English ones are set here
 * so every issue reads as before ("Invalid input: expected number, received string").
 */
z.config(en());

export { z };
