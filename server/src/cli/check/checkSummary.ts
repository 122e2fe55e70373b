/**
 * Counts of one `check` run, for the closing line and the exit status.
 */
import type { FindingSeverity } from "../../../../shared/src/index";

export interface CheckSummary {
  filesChecked: number;
  filesWithFindings: number;
  errors: number;
  warnings: number;
  /** Information and hints. */
  notes: number;
  fixedFindings: number;
  fixedFiles: number;
  /** Files and folders that could not be read (or fixed): the run then fails with status 2. */
  unreadable: number;
}

/** A summary with every count at zero. */
export function emptySummary(): CheckSummary {
  return { filesChecked: 0, filesWithFindings: 0, errors: 0, warnings: 0, notes: 0, fixedFindings: 0, fixedFiles: 0, unreadable: 0 };
}

/** Adds one finding of `severity` to `summary`. */
export function countFinding(summary: CheckSummary, severity: FindingSeverity): void {
  if (severity === "error") summary.errors++;
  else if (severity === "warning") summary.warnings++;
  else summary.notes++;
}

/**
 * "1 error, 5 warnings and 2 notes in 4 of 5 files checked." or "No findings in 5 files
 * checked.", followed by how many could not be read when any could not.
 */
export function summaryLine(summary: CheckSummary): string {
  const checked = checkedLine(summary);
  if (summary.unreadable === 0) return checked;
  const failed = summary.unreadable === 1 ? "1 file or folder" : `${summary.unreadable} files or folders`;
  return `${checked} ${failed} could not be read or fixed: see the messages above.`;
}

function checkedLine(summary: CheckSummary): string {
  const files = `${summary.filesChecked} ${summary.filesChecked === 1 ? "file" : "files"}`;
  const parts = [plural(summary.errors, "error"), plural(summary.warnings, "warning"), plural(summary.notes, "note")].filter(
    (part) => !part.startsWith("0 "),
  );
  if (parts.length === 0) return `No findings in ${files} checked.`;
  const listed = parts.length === 1 ? parts[0] : `${parts.slice(0, -1).join(", ")} and ${parts[parts.length - 1]}`;
  return `${listed} in ${summary.filesWithFindings} of ${files} checked.`;
}

/** "Fixed 4 findings in 3 files." */
export function fixedLine(summary: CheckSummary, dryRun: boolean): string {
  const findings = plural(summary.fixedFindings, "finding");
  const files = plural(summary.fixedFiles, "file");
  return dryRun ? `Would fix ${findings} in ${files}.` : `Fixed ${findings} in ${files}.`;
}

function plural(count: number, word: string): string {
  return `${count} ${count === 1 ? word : `${word}s`}`;
}
