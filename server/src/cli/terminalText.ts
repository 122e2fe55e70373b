/**
 * Text from documents and file names made safe for a terminal. A cell or a file name can hold
 * ESC, CSI or other control characters that a terminal would obey (move the cursor, retitle
 * the window, hide the rest of a line), and a newline in a name would break "one finding per
 * line". Every such character is printed as a visible escape instead.
 */
// C0 controls, DEL, C1 controls, line and paragraph separators, and the bidirectional
// embeddings, overrides and isolates that can make a line read differently from its bytes.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;
const NAMED: Readonly<Record<string, string>> = { "\n": "\\n", "\r": "\\r", "\t": "\\t" };

/** `text` with every character a terminal would act on written as an escape (`\x1b`, `\n`, `\u202e`). */
export function terminalSafe(text: string): string {
  UNSAFE.lastIndex = 0;
  if (!UNSAFE.test(text)) return text;
  return text.replace(UNSAFE, (character) => {
    const named = NAMED[character];
    if (named) return named;
    const code = character.charCodeAt(0);
    return code < 0x100 ? `\\x${code.toString(16).padStart(2, "0")}` : `\\u${code.toString(16).padStart(4, "0")}`;
  });
}

/**
 * JSON text with C1 controls and DEL escaped too: `JSON.stringify` escapes only C0, and some
 * terminals act on C1 (U+009B is CSI) when a JSON report is printed on them. Still valid JSON.
 */
export function jsonTerminalSafe(json: string): string {
  return /[\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/.test(json)
    ? json.replace(
        /[\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g,
        (character) => `\\u${character.charCodeAt(0).toString(16).padStart(4, "0")}`,
      )
    : json;
}

/** `text` made terminal safe line by line: its line ends (LF or CRLF) stay as they are. */
export function terminalSafeLines(text: string): string {
  return text
    .split(/(\r?\n)/)
    .map((part, index) => (index % 2 === 1 ? part : terminalSafe(part)))
    .join("");
}
