/**
 * `--format json`: one array of findings, written as they come.
 * Each item: { file, line, column, endLine, endColumn, severity, code, message, fix?, choices? },
 * lines and columns 1-based (columns in UTF-16 code units, end exclusive); a fix is { title, edits },
 * each edit the same position fields (in the file as read) plus newText. `choices` are fixes to
 * choose between, which `--fix` never applies.
 */
import { jsonTerminalSafe } from "../terminalText";
import type { CheckReporter } from "./checkReporter";

/** Items joined into one write: big enough to write quickly, far from the longest string. */
const ITEMS_PER_WRITE = 4096;

/**
 * A reporter writing a JSON array to `write`, a slice of items at a time. C1 controls are escaped
 * as well as JSON's own, so the report is safe to print on a terminal.
 */
export function jsonReporter(write: (text: string) => void): CheckReporter {
  let written = 0;
  return {
    findings(found) {
      for (let start = 0; start < found.length; start += ITEMS_PER_WRITE) {
        const slice = found.length <= ITEMS_PER_WRITE ? found : found.slice(start, start + ITEMS_PER_WRITE);
        const items = slice.map((finding) => `  ${JSON.stringify(finding)}`);
        write(jsonTerminalSafe(`${written === 0 ? "[\n" : ",\n"}${items.join(",\n")}`));
        written += slice.length;
      }
    },
    end() {
      write(written === 0 ? "[]\n" : "\n]\n");
    },
  };
}
