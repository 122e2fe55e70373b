/**
 * CSV and TSV documents: the first non-empty row is the header, every later row a record.
 */
import type { SpeciesReader } from "../speciesReader";
import { readDelimited, sniffDelimiter } from "./csv";
import { isFormulaHeader, meaningOfHeader } from "./headers";
import { addRecord, type RecordField, type RecordSink } from "./records";
import type { ColumnMeaning, Finding } from "../types";

interface Column {
  readonly meaning: ColumnMeaning;
  readonly formulaHeader: boolean;
}

/** Reads a delimited document into `sink`; returns the problems of the text itself. */
export function readDelimitedRecords(
  text: string,
  kind: "csv" | "tsv",
  read: SpeciesReader,
  sink: RecordSink,
): readonly Finding[] {
  const delimiter = kind === "tsv" ? "\t" : sniffDelimiter(text, ",");
  const table = readDelimited(text, delimiter);
  let columns: (Column | undefined)[] | undefined;
  for (const row of table.rows) {
    if (columns === undefined) {
      if (row.cells.every((cell) => cell.text.trim() === "")) continue;
      columns = row.cells.map((cell) => {
        const meaning = meaningOfHeader(cell.text);
        return meaning ? { meaning, formulaHeader: isFormulaHeader(cell.text) } : undefined;
      });
      if (!columns.some((column) => column?.meaning === "species" || column?.meaning === "name")) break;
      continue;
    }
    const fields: RecordField[] = [];
    row.cells.forEach((cell, index) => {
      const column = columns![index];
      if (column) fields.push({ ...column, text: cell.text, range: cell.range });
    });
    addRecord(fields, read, sink);
  }
  return table.problems;
}
