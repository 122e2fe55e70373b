/**
 * The human report: `path:line:column: severity: message [code]`, one finding a line as
 * compilers print them (editors and terminals turn these into links), then a summary.
 */
import type { FindingSeverity } from "../../../../shared/src/index";
import { MODEL_CAUTION } from "../../../../shared/src/index";
import { cardStyle } from "../terminalStyle";
import { terminalSafe } from "../terminalText";
import type { CheckReporter } from "./checkReporter";
import { fixedLine, summaryLine } from "./checkSummary";

/** Severity words of the compiler convention: information and hints are notes. */
export function severityWord(severity: FindingSeverity): "error" | "warning" | "note" {
  return severity === "error" ? "error" : severity === "warning" ? "warning" : "note";
}

/** Lines joined into one write: big enough to write quickly, far from the longest string. */
const LINES_PER_WRITE = 4096;

/**
 * A reporter writing text to `write`, coloured when `colour` is set. File names, messages (which
 * quote cells) and codes are made terminal safe, so every finding stays on one line and no text
 * from a document reaches the terminal as a control sequence.
 */
export function textReporter(write: (text: string) => void, colour: boolean): CheckReporter {
  const style = cardStyle(colour);
  const paint = { error: style.error, warning: style.warning, note: style.muted };
  let lastFile = "";
  let lastFileShown = "";
  return {
    findings(found) {
      let lines = "";
      for (let index = 0; index < found.length; index++) {
        const finding = found[index];
        if (finding.file !== lastFile) {
          lastFile = finding.file;
          lastFileShown = terminalSafe(finding.file);
        }
        const word = severityWord(finding.severity);
        lines += `${lastFileShown}:${finding.line}:${finding.column}: ${paint[word](word)}: ${terminalSafe(finding.message)} [${terminalSafe(finding.code)}]\n`;
        if ((index + 1) % LINES_PER_WRITE === 0) {
          write(lines);
          lines = "";
        }
      }
      if (lines.length > 0) write(lines);
    },
    end(summary, fixing) {
      const lines = [];
      if (fixing) lines.push(fixedLine(summary, false));
      lines.push(summaryLine(summary));
      if (summary.errors + summary.warnings + summary.notes > 0) lines.push(style.muted(`Caution: ${MODEL_CAUTION}`));
      write(`${lines.join("\n")}\n`);
    },
  };
}
