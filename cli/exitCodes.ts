/** Exit codes of the `brackline` command (documented in the README). */
export const EXIT_OK = 0;
/** The input was unusable: a file, row, column and value are named on stderr. */
export const EXIT_BAD_INPUT = 2;
/** The command line itself was wrong (unknown command or option). */
export const EXIT_USAGE = 64;
/** Something went wrong inside Brackline: please report it. */
export const EXIT_INTERNAL = 70;

/** Error for unusable input; the message names file, row, column and value. */
export class InputError extends Error {
  override name = "InputError";
}

/** Error for a wrong command line. */
export class UsageError extends Error {
  override name = "UsageError";
}
