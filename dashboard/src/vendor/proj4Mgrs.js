// proj4's "mgrs" import in the dashboard build (see proj4Unused.js).
import { mgrs } from "./proj4Unused.js";

export const { forward, inverse, toPoint } = mgrs;
export default mgrs;
