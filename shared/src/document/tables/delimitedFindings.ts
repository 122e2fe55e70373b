/**
 * The findings of a CSV/TSV document, worked out once per distinct row.
 *
 * A store's export repeats the same few species thousands of times, and a row's findings depend
 * only on the cells under recognised headers. So each row is cut at its delimiters, the stretch
 * from its first to its last recognised column becomes a key, and the findings are computed for
 * the first row with that key by the ordinary reading and checks (the header and that one row as
 * a small document of their own) and moved to every later row with the same key. Rows the quick
 * cut cannot read alike (quotes, stray carriage returns) are read whole the ordinary way, and a
 * file whose rows hardly repeat is read the ordinary way altogether.
 */
import { analyzeDocument } from "../analyzeDocument";
import { checkDocument } from "../checkDocument";
import { shiftedFix } from "../fixEdits";
import { memoisedReader, type SpeciesReader } from "../speciesReader";
import type { Finding } from "../types";
import { delimitedRowExtent, sniffDelimiter } from "./csv";
import { columnUnder } from "./delimitedRecords";
import { isEquationHeader } from "./headers";

/** What a file's batches share: the findings of rows seen before. */
export interface DelimitedRowMemo {
  /** Header row and delimiter the remembered rows were read under. */
  headerKey?: string;
  readonly rows: Map<string, readonly Finding[]>;
  /** Rows looked up, and rows that had to be worked out. */
  looked: number;
  worked: number;
  /** Set once rows proved not to repeat: the rest of the file is read the ordinary way. */
  ordinary: boolean;
}

export function delimitedRowMemo(): DelimitedRowMemo {
  return { rows: new Map(), looked: 0, worked: 0, ordinary: false };
}

/** What a caller may know about the text. */
export interface DelimitedFindingOptions {
  /** The delimiter, guessed once from the start of the document; guessed from `text` otherwise. */
  readonly delimiter?: string;
  /**
   * Rows starting before this offset are read for the header only, and give no findings: a file
   * read in batches puts the start of the document in front of every batch.
   */
  readonly from?: number;
  /**
   * The header row (without its line end) when `text` holds only records: a document read in
   * parts hands each part over with the header it is read under, instead of a copy of its start.
   */
  readonly header?: string;
  readonly memo?: DelimitedRowMemo;
  readonly read?: SpeciesReader;
}

/** Distinct rows remembered; past this the memo starts afresh. */
const MEMO_LIMIT = 20_000;
/** After this many rows, a file where more than half were new is read the ordinary way. */
const TRIAL_ROWS = 2_000;

const QUOTE = '"';
const QUOTE_CODE = 0x22;
const LF = 0x0a;
const CR = 0x0d;
const NO_FINDINGS: readonly Finding[] = [];

/**
 * The same findings, in the same order, as the problems of `analyzeDocument(text, kind)` followed
 * by `checkDocument` of its model, sorted by range (ranges are offsets into `text`).
 */
export function checkDelimitedText(text: string, kind: "csv" | "tsv", options: DelimitedFindingOptions = {}): Finding[] {
  const delimiter = kind === "tsv" ? "\t" : (options.delimiter ?? sniffDelimiter(text, ","));
  const from = options.from ?? 0;
  const memo = options.memo ?? delimitedRowMemo();
  const read = options.read ?? memoisedReader();
  const ordinary = (start: number): Finding[] => ordinaryFindings(text, kind, delimiter, read, from, start, options.header);

  const header = options.header !== undefined ? { text: options.header, next: 0 } : findHeader(text, delimiter);
  if (!header || memo.ordinary) return ordinary(0);
  const headerKey = `${delimiter}${header.text}`;
  if (memo.headerKey !== headerKey) {
    memo.rows.clear();
    memo.headerKey = headerKey;
  }
  const { first, last } = recognisedColumns(header.text, delimiter);

  const findings: Finding[] = [];
  const separator = delimiter.charCodeAt(0);
  const length = text.length;
  let start = header.next;
  while (start < length) {
    // One pass over the row: where the recognised stretch starts and ends, and where the row
    // ends. A quote or a carriage return that is not part of a CRLF sends the row the ordinary way.
    let column = 0;
    let stretchStart = first === 0 ? start : -1;
    let stretchEnd = -1;
    let lineEnd = -1;
    let plain = true;
    let index = start;
    for (; index < length; index++) {
      const code = text.charCodeAt(index);
      // Above the quote only the delimiter matters; below it line ends and quotes too.
      if (code > QUOTE_CODE) {
        if (code !== separator) continue;
      } else if (code === LF) {
        if (lineEnd < 0) lineEnd = index;
        break;
      } else if (code === QUOTE_CODE) {
        plain = false;
        break;
      } else if (code === CR) {
        if (text.charCodeAt(index + 1) !== LF) {
          plain = false;
          break;
        }
        lineEnd = index;
        continue;
      } else if (code !== separator) {
        continue;
      }
      column++;
      if (column === first) stretchStart = index + 1;
      else if (column === last + 1 && stretchEnd < 0) stretchEnd = index;
    }
    if (lineEnd < 0) lineEnd = index;
    if (!plain) {
      // Quotes may hide delimiters and line breaks: read the whole record the ordinary way.
      const record = delimitedRowExtent(text, start, delimiter);
      if (start >= from) findings.push(...rowFindings(header.text, text.slice(start, record.end), start, kind, delimiter, read));
      start = record.next;
      continue;
    }
    const next = index + 1;
    if (start < from || first < 0 || stretchStart < 0) {
      start = next;
      continue;
    }
    if (stretchEnd < 0) stretchEnd = lineEnd;
    const key = text.slice(stretchStart, stretchEnd);
    memo.looked++;
    const known = memo.rows.get(key) ?? workOutRow(memo, key, key, { header: header.text, first, kind, delimiter }, read);
    if (!known) {
      // Rows are mostly new: cutting and remembering them costs more than it saves.
      memo.ordinary = true;
      memo.rows.clear();
      findings.push(...ordinary(start));
      return findings;
    }
    for (const finding of known) findings.push(moved(finding, stretchStart));
    start = next;
  }
  return findings;
}

/** What a row's findings are read under. */
export interface RowTable {
  readonly header: string;
  /** First recognised column: the padding put in front of a key. */
  readonly first: number;
  readonly kind: "csv" | "tsv";
  readonly delimiter: string;
}

/**
 * The findings of a new key (relative to its start), worked out and remembered; undefined once the
 * rows have proved not to repeat (more than half new after the trial rows), so the caller can read
 * the rest the ordinary way. `keyText` is the key's text (the key itself may be bytes as Latin-1).
 */
export function workOutRow(
  memo: DelimitedRowMemo,
  key: string,
  keyText: string,
  table: RowTable,
  read: SpeciesReader,
): readonly Finding[] | undefined {
  memo.worked++;
  if (memo.looked >= TRIAL_ROWS && memo.worked * 2 > memo.looked) return undefined;
  const padding = table.delimiter.repeat(table.first);
  const found = rowFindings(table.header, padding + keyText, -padding.length, table.kind, table.delimiter, read);
  const known = found.length === 0 ? NO_FINDINGS : found;
  if (memo.rows.size >= MEMO_LIMIT) memo.rows.clear();
  memo.rows.set(key, known);
  return known;
}

/**
 * The first and last column (0-based) whose header a check reads (equation columns included); -1
 * for both when none does.
 * A row's findings depend only on its cells from `first` to `last`.
 */
export function recognisedColumns(header: string, delimiter: string): { first: number; last: number } {
  const columns = header.split(delimiter).map((cell) => columnUnder(cell) !== undefined || isEquationHeader(cell));
  return { first: columns.indexOf(true), last: columns.lastIndexOf(true) };
}

/**
 * The first row with a visible cell: the header, as text without its line end, and the offset
 * just past its line feed. Undefined when quotes or lone carriage returns come before it.
 */
export function findHeader(text: string, delimiter: string): { text: string; next: number } | undefined {
  let start = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  while (start < text.length) {
    let lineFeed = text.indexOf("\n", start);
    if (lineFeed < 0) lineFeed = text.length;
    const line = text.slice(start, lineFeed);
    const lineEnd = line.endsWith("\r") ? line.length - 1 : line.length;
    const row = line.slice(0, lineEnd);
    // Quotes and lone carriage returns before the data rows: leave the whole text to the ordinary reading.
    if (row.includes(QUOTE) || row.includes("\r")) return undefined;
    if (row.split(delimiter).some((cell) => cell.trim() !== "")) return { text: row, next: lineFeed + 1 };
    start = lineFeed + 1;
  }
  return undefined;
}

/**
 * The findings of one row read under `header` as a document of its own, moved so that offset 0
 * of `row` is `shift` (row-relative findings for the memo when `shift` is minus a padding).
 */
export function rowFindings(
  header: string,
  row: string,
  shift: number,
  kind: "csv" | "tsv",
  delimiter: string,
  read: SpeciesReader,
): Finding[] {
  const offset = header.length + 1;
  const findings = documentFindings(`${header}\n${row}`, kind, delimiter, read);
  return findings.filter((finding) => finding.range.start >= offset).map((finding) => moved(finding, shift - offset));
}

/**
 * The ordinary reading of the text from `start` (a row start) on, findings before `from` dropped;
 * under `givenHeader` when the text holds only records.
 */
function ordinaryFindings(
  text: string,
  kind: "csv" | "tsv",
  delimiter: string,
  read: SpeciesReader,
  from: number,
  start: number,
  givenHeader?: string,
): Finding[] {
  if (givenHeader !== undefined) {
    return rowFindings(givenHeader, text.slice(start), start, kind, delimiter, read).filter((finding) => finding.range.start >= from);
  }
  if (start === 0) return documentFindings(text, kind, delimiter, read).filter((finding) => finding.range.start >= from);
  // The rows from `start` on, under the header, as a document of their own.
  const header = findHeader(text, delimiter);
  if (!header) return documentFindings(text, kind, delimiter, read).filter((finding) => finding.range.start >= Math.max(from, start));
  return rowFindings(header.text, text.slice(start), start, kind, delimiter, read);
}

function documentFindings(text: string, kind: "csv" | "tsv", delimiter: string, read: SpeciesReader): Finding[] {
  const model = analyzeDocument(text, kind, read, { delimiter });
  const findings = [...model.problems, ...checkDocument(model)];
  return findings.sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}

/** `finding` with its range (and its fixes') moved `by` characters. */
export function moved(finding: Finding, by: number): Finding {
  const range = { start: finding.range.start + by, end: finding.range.end + by };
  const shifted: Finding = finding.fix ? { ...finding, range, fix: shiftedFix(finding.fix, by) } : { ...finding, range };
  return finding.choices ? { ...shifted, choices: finding.choices.map((choice) => shiftedFix(choice, by)) } : shifted;
}
