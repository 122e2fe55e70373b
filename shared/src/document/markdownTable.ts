/**
 * Markdown pipe tables: cells with exact ranges, and records when the header names a species
 * column. Cells that are not species columns are scanned as prose.
 */
import type { TextRange } from "../chemistry/types";
import { scanProse } from "./scanProse";
import type { ScanSteps, SpeciesReader } from "./speciesReader";
import { readWholeEquation } from "./reactions/readEquation";
import { tableColumns } from "./tables/delimitedRecords";
import { isEquationHeader, namesSpecies } from "./tables/headers";
import { addRecord, namingCellReads, type RecordField, type RecordSink } from "./tables/records";

const DELIMITER_ROW = /^ {0,3}\|?\s*:?-+:?\s*(?:\|\s*:?-+:?\s*)*\|?\s*$/;

/** True when the line at `[start, end)` is a table's delimiter row (| --- | :-: |). */
export function isDelimiterRow(text: string, start: number, end: number): boolean {
  const line = text.slice(start, end);
  return line.includes("|") && line.includes("-") && DELIMITER_ROW.test(line);
}

/** The cells of one table line: ranges without the surrounding spaces and pipes. */
export function tableCells(text: string, start: number, end: number): TextRange[] {
  const cells: TextRange[] = [];
  let index = start;
  while (index < end && (text.charCodeAt(index) === 0x20 || text.charCodeAt(index) === 0x09)) index++;
  if (text.charCodeAt(index) === 0x7c) index++;
  let cellStart = index;
  let inCode = false;
  for (; index <= end; index++) {
    const code = index < end ? text.charCodeAt(index) : 0x7c;
    if (code === 0x60) inCode = !inCode;
    else if (code === 0x5c) index++;
    else if (code === 0x7c && (!inCode || index === end)) {
      cells.push(trimmed(text, cellStart, Math.min(index, end)));
      cellStart = index + 1;
    }
  }
  // A closing pipe leaves one empty cell behind it.
  const last = cells[cells.length - 1];
  if (cells.length > 1 && last.start === last.end && text.slice(start, end).trimEnd().endsWith("|")) cells.pop();
  return cells;
}

function trimmed(text: string, start: number, end: number): TextRange {
  while (start < end && /\s/.test(text[start])) start++;
  while (end > start && /\s/.test(text[end - 1])) end--;
  return { start, end };
}

/**
 * Reads the table whose header line is `lines[0]` (the delimiter row is `lines[1]`); `lines` are
 * the [start, end) ranges of the table's lines. Pauses between rows whenever `sink` holds at least
 * `pauseAt` items (see `ScanSteps`).
 */
export function* markdownTableSteps(
  text: string,
  lines: readonly TextRange[],
  read: SpeciesReader,
  sink: RecordSink,
  pauseAt: number,
): ScanSteps {
  const header = tableCells(text, lines[0].start, lines[0].end);
  const columns = tableColumns(header.map((cell) => text.slice(cell.start, cell.end)));
  const hasSpeciesColumn = columns.some((column) => namesSpecies(column?.meaning));
  const equationColumns = header.map((cell) => isEquationHeader(text.slice(cell.start, cell.end)));
  for (const cell of header) if (!columns[header.indexOf(cell)]) scanProse(text, cell.start, cell.end, sink, read);
  for (const line of lines.slice(2)) {
    if (sink.occurrences.length + sink.unreadable.length + sink.records.length >= pauseAt) yield line.start;
    const cells = tableCells(text, line.start, line.end);
    const fields: RecordField[] = [];
    cells.forEach((cell, index) => {
      if (equationColumns[index] && sink.reactions) {
        const reaction = readWholeEquation(text, cell.start, cell.end, "table", read);
        if (reaction) sink.reactions.push(reaction);
      }
      const column = hasSpeciesColumn ? columns[index] : undefined;
      const cellText = text.slice(cell.start, cell.end);
      const field: RecordField | undefined = column && { ...column, text: cellText, range: cell };
      // A species cell with words around the formula ("SF4 (reference)") is prose, not a value; a
      // name with a qualifier after it ("ammonia (anhydrous)") is the row's name, read as CSV reads it.
      if (!field || (namesSpecies(field.meaning) && /\s/.test(cellText) && !namingCellReads(field, read))) {
        scanProse(text, cell.start, cell.end, sink, read);
        return;
      }
      fields.push(field);
    });
    if (fields.length > 0) addRecord(fields, read, sink);
  }
}
