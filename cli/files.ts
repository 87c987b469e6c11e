/** Reading input files and writing output files for the CLI, with user mistakes as InputError (exit 2). */
import { readFileSync, statSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";
import { InputError } from "./exitCodes.ts";

const reason = (error: unknown): string => (error as NodeJS.ErrnoException).code ?? (error as Error).message;

/** The bytes of a file; a missing file or a directory is an InputError naming the path and its role. */
export function readBytes(path: string, what: string): Uint8Array {
  let isFile: boolean;
  try {
    isFile = statSync(path).isFile();
  } catch (error) {
    throw new InputError(`${path}: cannot read ${what} (${reason(error)})`);
  }
  if (!isFile) throw new InputError(`${path}: ${what} is not a file`);
  try {
    return new Uint8Array(readFileSync(path));
  } catch (error) {
    throw new InputError(`${path}: cannot read ${what} (${reason(error)})`);
  }
}

/** Checks that `--out` can be written (before any work): not a directory, and its directory exists. */
export function checkOut(path: string): void {
  let st;
  try {
    st = statSync(path, { throwIfNoEntry: false });
  } catch (error) {
    throw new InputError(`--out ${path}: cannot write there (${reason(error)})`);
  }
  if (st?.isDirectory()) throw new InputError(`--out ${path}: is a directory; give a file name`);
  const dir = dirname(path);
  if (!statSync(dir, { throwIfNoEntry: false })?.isDirectory())
    throw new InputError(`--out ${path}: the directory ${dir} does not exist`);
}

/** Writes `--out`; a directory, or a file in a missing directory, is an InputError. */
export function writeOut(path: string, text: string): void {
  checkOut(path);
  try {
    writeFileSync(path, text);
  } catch (error) {
    throw new InputError(`--out ${path}: cannot write (${reason(error)})`);
  }
}
