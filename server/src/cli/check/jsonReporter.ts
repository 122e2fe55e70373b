/**
 * `--format json`: one array of findings, written as they come.
 * Each item: { file, line, column, endLine, endColumn, severity, code, message, fix? }, lines and
 * columns 1-based (columns in UTF-16 code units, end exclusive); a fix has the same position
 * fields plus newText and title.
 */
import type { CheckReporter } from "./checkReporter";

/** A reporter writing a JSON array to `write`. */
export function jsonReporter(write: (text: string) => void): CheckReporter {
  let written = 0;
  return {
    findings(found) {
      if (found.length === 0) return;
      const items = found.map((finding) => `  ${JSON.stringify(finding)}`);
      write(`${written === 0 ? "[\n" : ",\n"}${items.join(",\n")}`);
      written += found.length;
    },
    end() {
      write(written === 0 ? "[]\n" : "\n]\n");
    },
  };
}
