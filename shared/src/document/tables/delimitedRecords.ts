/**
 * CSV and TSV documents: the first non-empty row is the header, every later row a record.
 */
import type { SpeciesReader } from "../speciesReader";
import { sniffDelimiter, visitDelimitedRows } from "./csv";
import { readEquationCell } from "./equationCells";
import { isEquationHeader, isFormulaHeader, languageOfHeader, meaningOfHeader, namesSpecies } from "./headers";
import { addRecord, type RecordField, type RecordSink } from "./records";
import type { ColumnMeaning, Finding, TableLanguage } from "../types";

/** What a table's column holds, worked out from its header once for every kind of table. */
export interface Column {
  readonly meaning: ColumnMeaning;
  readonly formulaHeader: boolean;
  /** The header's language when not English ("Molekülgeometrie"). */
  readonly language?: TableLanguage;
}

/** Header text -> column, so a file read in batches works out its header once. */
const knownHeaders = new Map<string, Column | null>();
const KNOWN_HEADERS_LIMIT = 1024;

/** The column under `header`, or undefined for a column no check reads. */
export function columnUnder(header: string): Column | undefined {
  const known = knownHeaders.get(header);
  if (known !== undefined) return known ?? undefined;
  const meaning = meaningOfHeader(header);
  const language = meaning && languageOfHeader(header);
  const column = meaning ? { meaning, formulaHeader: isFormulaHeader(header), ...(language ? { language } : {}) } : undefined;
  if (knownHeaders.size >= KNOWN_HEADERS_LIMIT) knownHeaders.clear();
  knownHeaders.set(header, column ?? null);
  return column;
}

/**
 * The columns under a table's header row. A table headed in one other language is read in it
 * throughout: a header both languages share ("Name", "polar?", "Gas") takes the table's language
 * for its cells' words; a subject column that is not a formula ("Gas", "Ion") holds names in that
 * language, which lonepair mostly does not know, so it is read as a name column; and in German,
 * "Charge" is the batch (lot) number, not a charge.
 */
export function tableColumns(headers: readonly string[]): (Column | undefined)[] {
  const columns = headers.map(columnUnder);
  const languages = new Set(columns.map((column) => column?.language).filter((language) => language !== undefined));
  if (languages.size !== 1) return columns;
  const [language] = languages;
  return columns.map((column, index) => {
    if (!column || column.language) return column;
    if (column.meaning === "charge" && language === "de" && /^\s*charge\s*$/i.test(headers[index])) return undefined;
    return { ...column, meaning: column.meaning === "species" && !column.formulaHeader ? "name" : column.meaning, language };
  });
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
      columns = tableColumns(cells.map((cell) => cell.text));
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
      fields.push({
        meaning: column.meaning,
        formulaHeader: column.formulaHeader,
        language: column.language,
        text: cell.text,
        range: cell.range,
      });
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
