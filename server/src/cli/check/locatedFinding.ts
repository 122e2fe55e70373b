/**
 * A finding placed in a file by line and column, as every report format shows it: 1-based
 * lines and columns, columns in UTF-16 code units, end exclusive.
 */
import { editsOfFix, type Finding, type FindingSeverity, type TextFix } from "../../../../shared/src/index";
import type { LineIndex } from "../documents/lineIndex";

/** Start and end of a range, 1-based; the end column is just past the last character. */
export interface LineColumnRange {
  readonly line: number;
  readonly column: number;
  readonly endLine: number;
  readonly endColumn: number;
}

/** One replacement of a fix, placed: what the range (as the file was read) becomes. */
export interface LocatedEdit extends LineColumnRange {
  readonly newText: string;
}

/**
 * A fix placed in a file: the same separate edits the editor and `check --fix` apply (one per
 * coefficient of an equation), in order and not overlapping, every range in the file as read.
 */
export interface LocatedFix {
  readonly title: string;
  readonly edits: readonly LocatedEdit[];
}

/** A finding in a file, ready for any report format. */
export interface LocatedFinding extends LineColumnRange {
  readonly file: string;
  readonly severity: FindingSeverity;
  readonly code: string;
  readonly message: string;
  readonly fix?: LocatedFix;
  /** Fixes to choose between (the name or the formula of a row): offered, never applied by `--fix`. */
  readonly choices?: readonly LocatedFix[];
}

/** The line and column range of `range` (offsets into the indexed text). */
export function lineColumnRange(lines: LineIndex, range: { start: number; end: number }): LineColumnRange {
  const start = lines.position(range.start);
  const end = lines.position(range.end);
  return { line: start.line, column: start.column, endLine: end.line, endColumn: end.column };
}

/** Places `finding` (offsets into the indexed text) in `file`. */
export function locateFinding(file: string, lines: LineIndex, finding: Finding): LocatedFinding {
  const located: LocatedFinding = {
    file,
    ...lineColumnRange(lines, finding.range),
    severity: finding.severity,
    code: finding.code,
    message: finding.message,
  };
  return withLocatedFixes(located, finding, (range) => lineColumnRange(lines, range));
}

/** `located` with the fix and the choices of `finding`, each edit placed by `place`. */
export function withLocatedFixes(
  located: LocatedFinding,
  finding: Finding,
  place: (range: { start: number; end: number }) => LineColumnRange,
): LocatedFinding {
  const fixed = finding.fix ? { ...located, fix: locatedFix(finding.fix, place) } : located;
  return finding.choices ? { ...fixed, choices: finding.choices.map((choice) => locatedFix(choice, place)) } : fixed;
}

/** `fix` with each of its edits placed by `place`: every report format carries these edits. */
export function locatedFix(fix: TextFix, place: (range: { start: number; end: number }) => LineColumnRange): LocatedFix {
  return { title: fix.title, edits: editsOfFix(fix).map((edit) => ({ ...place(edit.range), newText: edit.newText })) };
}
