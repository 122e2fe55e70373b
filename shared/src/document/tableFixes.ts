/**
 * Which fixes "fix every table value" applies: those inside a table's value cells, and the
 * coefficient fixes of equations written in a table's equation cells (a CSV/TSV column, a JSON or
 * YAML key, a markdown table column whose header means reaction or equation). An equation carries a
 * fix only when one set of smallest whole numbers balances it, so the rule is the single quick
 * fix's; its edits are digits and spaces inside the cell, so a CSV field stays one valid field.
 */
import type { TextRange } from "../chemistry/types";
import { shiftedFix } from "./fixEdits";
import type { FindingPart } from "./findingPart";
import type { Reaction } from "./reactions/reactionTypes";
import type { DocumentKind, DocumentModel, Finding, TextFix } from "./types";

/**
 * Fixes whose range lies inside a recognised table cell or a table's equation, in document order,
 * without overlaps (two findings may want to rewrite the same cell; the first wins).
 */
export function tableValueFixes(model: DocumentModel, findings: readonly Finding[]): TextFix[] {
  const inTable = tableValuePlaces(model);
  const fixes = findings
    .map((finding) => finding.fix)
    .filter((fix): fix is TextFix => fix !== undefined && inTable(fix.range))
    .sort((a, b) => a.range.start - b.range.start);
  return [...withoutOverlaps(fixes)];
}

/**
 * The same fixes, for a document read a part at a time (`findingParts`, in document order): each
 * fix is placed against the model of the stretch around it, so a large table's rows are read only
 * where fixes are, and a caller that wants to know whether there is any stops at the first.
 */
export function* tableValueFixesInParts(
  parts: Iterable<FindingPart>,
  modelAround: (start: number, end: number) => DocumentModel,
): Generator<TextFix> {
  // Fixes fall in runs within a few rows: one stretch's model serves the fixes inside its cells.
  let inLastModel: ((range: TextRange) => boolean) | undefined;
  const inTable = (range: TextRange): boolean => {
    if (inLastModel?.(range)) return true;
    inLastModel = tableValuePlaces(modelAround(range.start, range.end));
    return inLastModel(range);
  };
  function* partFixes(): Generator<TextFix> {
    for (const { findings, offset } of parts) {
      const fixes: TextFix[] = [];
      for (const finding of findings) if (finding.fix) fixes.push(offset === 0 ? finding.fix : shiftedFix(finding.fix, offset));
      fixes.sort((a, b) => a.range.start - b.range.start);
      for (const fix of fixes) if (inTable(fix.range)) yield fix;
    }
  }
  yield* withoutOverlaps(partFixes());
}

/** Whether a range lies inside a recognised table cell or a table's equation of `model`. */
function tableValuePlaces(model: DocumentModel): (range: TextRange) => boolean {
  const cells: TextRange[] = [];
  for (const record of model.records) {
    cells.push(record.species.range);
    for (const cell of record.cells) cells.push(cell.range);
  }
  cells.sort(byStart);
  // Kept apart from the cells: each list alone holds ranges that do not overlap.
  const equations = (model.reactions ?? []).filter((reaction) => readFromTableCell(model.kind, reaction)).map((reaction) => reaction.range);
  equations.sort(byStart);
  return (range) => insideSome(range, cells) || insideSome(range, equations);
}

/** Fixes in order of their start, each dropped when it overlaps the last one kept: two findings may want to rewrite the same cell, and the first wins. */
function* withoutOverlaps(fixes: Iterable<TextFix>): Generator<TextFix> {
  let previous: TextFix | undefined;
  for (const fix of fixes) {
    if (previous && previous.range.end > fix.range.start) continue;
    previous = fix;
    yield fix;
  }
}

/**
 * A data file reads equations from its equation cells only (a cell with a note after the equation
 * is read as prose, within the cell); in markdown, prose equations are not table values.
 */
function readFromTableCell(kind: DocumentKind, reaction: Reaction): boolean {
  return reaction.notation === "table" || kind === "csv" || kind === "tsv" || kind === "json" || kind === "yaml";
}

function byStart(a: TextRange, b: TextRange): number {
  return a.start - b.start;
}

/**
 * The ranges do not overlap, so the only candidate is the last one starting at or before `range`:
 * a binary search keeps a table of thousands of rows cheap on every lightbulb request.
 */
function insideSome(range: TextRange, sortedCells: readonly TextRange[]): boolean {
  let low = 0;
  let high = sortedCells.length - 1;
  let candidate = -1;
  while (low <= high) {
    const middle = (low + high) >> 1;
    if (sortedCells[middle].start <= range.start) {
      candidate = middle;
      low = middle + 1;
    } else {
      high = middle - 1;
    }
  }
  return candidate >= 0 && range.start >= sortedCells[candidate].start && range.end <= sortedCells[candidate].end;
}
