/**
 * Text safe to print on a terminal: control characters and terminal escape sequences (ANSI CSI/OSC,
 * C0 and C1 controls) from file names and cells are removed, so a crafted file cannot move the cursor,
 * retitle the window or hide output. Newlines, tabs and CRLF line ends are kept.
 *
 * @see ECMA-48 (1991) Control Functions for Coded Character Sets, 5th ed., §5 (C0/C1 sets, CSI and OSC).
 */

// ESC [ ... final byte (CSI), ESC ] ... BEL or ESC \ (OSC), other ESC + one char, C1 controls, C0 except
// \t and \n, and a CR not followed by LF (CRLF line ends of CSV output are kept).
const ESCAPES =
  // eslint-disable-next-line no-control-regex
  /\u001b\[[0-?]*[ -/]*[@-~]|\u001b\][^\u0007\u001b]*(?:\u0007|\u001b\\)?|\u001b[@-_]?|[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]|\r(?!\n)/g;

/**
 * Removes control characters and escape sequences from text meant for a terminal.
 *
 * @param text any text (file names, cell values, messages)
 * @returns the text without them; tabs and newlines kept
 */
export function stripControl(text: string): string {
  return text.replace(ESCAPES, "");
}
