/**
 * The human report: `path:line:column: severity: message [code]`, one finding a line as
 * compilers print them (editors and terminals turn these into links), then a summary.
 */
import type { FindingSeverity } from "../../../../shared/src/index";
import { MODEL_CAUTION } from "../../../../shared/src/index";
import { cardStyle } from "../terminalStyle";
import type { CheckReporter } from "./checkReporter";
import { fixedLine, summaryLine } from "./checkSummary";

/** Severity words of the compiler convention: information and hints are notes. */
export function severityWord(severity: FindingSeverity): "error" | "warning" | "note" {
  return severity === "error" ? "error" : severity === "warning" ? "warning" : "note";
}

/** A reporter writing text to `write`, coloured when `colour` is set. */
export function textReporter(write: (text: string) => void, colour: boolean): CheckReporter {
  const style = cardStyle(colour);
  const paint = { error: style.error, warning: style.warning, note: style.muted };
  return {
    findings(found) {
      if (found.length === 0) return;
      const lines = found.map((finding) => {
        const word = severityWord(finding.severity);
        return `${finding.file}:${finding.line}:${finding.column}: ${paint[word](word)}: ${finding.message} [${finding.code}]\n`;
      });
      write(lines.join(""));
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
