/**
 * CSV and TSV documents: the first non-empty row is the header, every later row a record.
 */
import type { SpeciesReader } from "../speciesReader";
import { sniffDelimiter, visitDelimitedRows } from "./csv";
import { readEquationCell } from "./equationCells";
import { isEquationHeader, isFormulaHeader, meaningOfHeader, namesSpecies } from "./headers";
import { addRecord, type RecordField, type RecordSink } from "./records";
import type { ColumnMeaning, Finding } from "../types";

interface Column {
  readonly meaning: ColumnMeaning;
  readonly formulaHeader: boolean;
}

/** Header text -> column, so a file read in batches works out its header once. */
const knownHeaders = new Map<string, Column | null>();
const KNOWN_HEADERS_LIMIT = 1024;

/** The column under `header`, or undefined for a column no check reads. */
export function columnUnder(header: string): Column | undefined {
  const known = knownHeaders.get(header);
  if (known !== undefined) return known ?? undefined;
  const meaning = meaningOfHeader(header);
  const column = meaning ? { meaning, formulaHeader: isFormulaHeader(header) } : undefined;
  if (knownHeaders.size >= KNOWN_HEADERS_LIMIT) knownHeaders.clear();
  knownHeaders.set(header, column ?? null);
  return column;
}

/**
 * Reads a delimited document into `sink`; returns the problems of the text itself. A CSV's
 * delimiter is guessed from the text unless `knownDelimiter` (guessed from the same start) is given.
 */
export function readDelimitedRecords(
  text: string,
  kind: "csv" | "tsv",
  read: SpeciesReader,
  sink: RecordSink,
  knownDelimiter?: string,
): readonly Finding[] {
  const delimiter = kind === "tsv" ? "\t" : (knownDelimiter ?? sniffDelimiter(text, ","));
  let columns: (Column | undefined)[] | undefined;
  // Columns of equations ("Reaction", "Balanced equation"), when the header has any.
  let equationColumns: number[] | undefined;
  // A header without a species, name or equation column: the rest is tokenized (for its problems) but not read.
  let noSpecies = false;
  const fields: RecordField[] = [];
  // Rows are used as the tokenizer hands them on and then dropped: a large batch never holds them all.
  return visitDelimitedRows(text, delimiter, (cells) => {
    if (noSpecies) return;
    if (columns === undefined) {
      if (cells.every((cell) => cell.text.trim() === "")) return;
      columns = cells.map((cell) => columnUnder(cell.text));
      equationColumns = equationColumnsOf(cells.map((cell) => cell.text));
      noSpecies = !columns.some((column) => namesSpecies(column?.meaning)) && !equationColumns;
      return;
    }
    if (equationColumns) {
      for (const index of equationColumns) {
        const cell = cells[index];
        if (cell) readEquationCell(text, cell.range, cell.text, read, sink);
      }
    }
    // addRecord keeps the fields, not the list: one list serves every row.
    fields.length = 0;
    const count = Math.min(cells.length, columns.length);
    for (let index = 0; index < count; index++) {
      const column = columns[index];
      if (!column) continue;
      const cell = cells[index];
      fields.push({ meaning: column.meaning, formulaHeader: column.formulaHeader, text: cell.text, range: cell.range });
    }
    addRecord(fields, read, sink);
  });
}

/** The indexes of the columns whose header means equations, or undefined when there are none. */
function equationColumnsOf(headers: readonly string[]): number[] | undefined {
  const indexes: number[] = [];
  headers.forEach((header, index) => {
    if (isEquationHeader(header)) indexes.push(index);
  });
  return indexes.length > 0 ? indexes : undefined;
}
