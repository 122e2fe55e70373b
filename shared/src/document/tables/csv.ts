/**
 * A CSV/TSV tokenizer that keeps the exact range of every value: quoted fields with "" escapes,
 * delimiters and line breaks inside quotes, a byte-order mark, CRLF, LF or CR line ends and rows
 * of different lengths. One pass, linear in the text; problems are data, never exceptions.
 */
import type { TextRange } from "../../chemistry/types";
import type { Finding } from "../types";

/** One field: its value (quotes removed, "" unescaped) and where the value is written. */
export interface DelimitedCell {
  readonly text: string;
  /** The value's characters: inside the quotes for a quoted field. */
  readonly range: TextRange;
  readonly quoted: boolean;
}

export interface DelimitedRow {
  readonly cells: readonly DelimitedCell[];
  /** From the first character of the row to the end of its last field. */
  readonly range: TextRange;
}

export interface DelimitedTable {
  readonly rows: readonly DelimitedRow[];
  readonly problems: readonly Finding[];
}

const QUOTE = 0x22;
const LF = 0x0a;
const CR = 0x0d;
const BOM = 0xfeff;

/** Splits `text` into rows and fields separated by `delimiter` (one character). */
export function readDelimited(text: string, delimiter: string): DelimitedTable {
  const rows: DelimitedRow[] = [];
  const problems = visitDelimitedRows(text, delimiter, (cells, range) => {
    rows.push({ cells, range });
  });
  return { rows, problems };
}

/**
 * Receives each row as soon as it is read. `cells` belongs to the row: the tokenizer does not
 * reuse it. Rows arrive in document order.
 */
export type DelimitedRowVisitor = (cells: DelimitedCell[], range: TextRange) => void;

/**
 * Tokenizes `text` like `readDelimited`, handing each row to `visit` instead of collecting them,
 * so a large table's rows can be dropped as soon as they are used; returns the problems.
 */
export function visitDelimitedRows(text: string, delimiter: string, visit: DelimitedRowVisitor): Finding[] {
  const separator = delimiter.charCodeAt(0);
  const problems: Finding[] = [];
  const length = text.length;
  let index = text.charCodeAt(0) === BOM ? 1 : 0;
  let cells: DelimitedCell[] = [];
  let rowStart = index;

  while (index < length) {
    let cell: DelimitedCell;
    if (text.charCodeAt(index) === QUOTE) {
      const field = quotedField(text, index, separator, problems);
      cell = field.cell;
      index = field.next;
    } else {
      const start = index;
      while (index < length) {
        const code = text.charCodeAt(index);
        if (code === separator || code === LF || code === CR) break;
        index++;
      }
      cell = { text: text.slice(start, index), range: { start, end: index }, quoted: false };
    }
    cells.push(cell);
    if (index >= length) break;
    const code = text.charCodeAt(index);
    if (code === separator) {
      index++;
      // A delimiter at the very end still opens one last, empty field.
      if (index >= length) cells.push({ text: "", range: { start: index, end: index }, quoted: false });
      continue;
    }
    // A line end closes the row.
    visit(cells, { start: rowStart, end: cell.range.end + (cell.quoted ? 1 : 0) });
    index += code === CR && text.charCodeAt(index + 1) === LF ? 2 : 1;
    cells = [];
    rowStart = index;
  }
  if (cells.length > 0) {
    const last = cells[cells.length - 1];
    visit(cells, { start: rowStart, end: last.range.end + (last.quoted ? 1 : 0) });
  }
  return problems;
}

/**
 * Where the row starting at `start` ends, read by the same rules as `visitDelimitedRows`: `end`
 * just past its last field (before the line break), `next` just past the line break (or the
 * text's end). A quoted field may hold delimiters and line breaks, or run to the end of the text.
 */
export function delimitedRowExtent(text: string, start: number, delimiter: string): { end: number; next: number } {
  const separator = delimiter.charCodeAt(0);
  const length = text.length;
  const ignored: Finding[] = [];
  let index = start;
  while (index < length) {
    if (text.charCodeAt(index) === QUOTE) {
      index = quotedField(text, index, separator, ignored).next;
    } else {
      while (index < length) {
        const code = text.charCodeAt(index);
        if (code === separator || code === LF || code === CR) break;
        index++;
      }
    }
    if (index >= length) break;
    const code = text.charCodeAt(index);
    if (code === separator) {
      index++;
      continue;
    }
    return { end: index, next: index + (code === CR && text.charCodeAt(index + 1) === LF ? 2 : 1) };
  }
  return { end: length, next: length };
}

/** A field that opens with a quote; returns it and the index just past its closing quote. */
function quotedField(text: string, open: number, separator: number, problems: Finding[]): { cell: DelimitedCell; next: number } {
  const length = text.length;
  const start = open + 1;
  let index = start;
  let pieces: string[] | undefined;
  let pieceStart = start;
  while (index < length) {
    const close = text.indexOf('"', index);
    if (close < 0) break;
    if (text.charCodeAt(close + 1) === QUOTE) {
      // An escaped quote: keep one.
      (pieces ??= []).push(text.slice(pieceStart, close + 1));
      index = close + 2;
      pieceStart = index;
      continue;
    }
    const value = pieces ? pieces.join("") + text.slice(pieceStart, close) : text.slice(start, close);
    const next = close + 1;
    const after = text.charCodeAt(next);
    if (next < length && after !== separator && after !== LF && after !== CR) {
      // Text after the closing quote: keep it in the value so nothing is lost, and say so.
      let end = next;
      while (end < length) {
        const code = text.charCodeAt(end);
        if (code === separator || code === LF || code === CR) break;
        end++;
      }
      problems.push(problem({ start: close, end }, "Unexpected text after the closing quote of a field."));
      return { cell: { text: value + text.slice(next, end), range: { start, end }, quoted: true }, next: end };
    }
    return { cell: { text: value, range: { start, end: close }, quoted: true }, next };
  }
  problems.push(problem({ start: open, end: open + 1 }, "This quote is never closed; the field runs to the end of the file."));
  const value = (pieces ? pieces.join("") : "") + text.slice(pieceStart, length);
  return { cell: { text: value, range: { start, end: length }, quoted: true }, next: length };
}

function problem(range: TextRange, message: string): Finding {
  return { range, severity: "warning", code: "csv-quote", message };
}

const CANDIDATES = [",", "\t", ";", "|"] as const;
const SNIFF_LINES = 20;

/**
 * The delimiter a delimited text most likely uses: the candidate that appears, outside quotes,
 * the same non-zero number of times on most of the first lines. Falls back to `fallback`.
 */
export function sniffDelimiter(text: string, fallback = ","): string {
  // The first lines decide; a huge one-line file must not be counted through four times.
  const lines = firstLines(text.slice(0, 65_536), SNIFF_LINES);
  let best = fallback;
  let bestScore = 0;
  for (const candidate of CANDIDATES) {
    const counts = lines.map((line) => countOutsideQuotes(line, candidate));
    const first = counts[0] ?? 0;
    if (first === 0) continue;
    const agreeing = counts.filter((count) => count === first).length;
    const score = agreeing * 10 + first;
    if (score > bestScore) {
      best = candidate;
      bestScore = score;
    }
  }
  return best;
}

function firstLines(text: string, count: number): string[] {
  const lines: string[] = [];
  let start = text.charCodeAt(0) === BOM ? 1 : 0;
  while (lines.length < count && start < text.length) {
    let end = text.indexOf("\n", start);
    if (end < 0) end = text.length;
    const line = text.slice(start, end).replace(/\r$/, "");
    if (line.trim().length > 0) lines.push(line);
    start = end + 1;
  }
  return lines;
}

function countOutsideQuotes(line: string, delimiter: string): number {
  let count = 0;
  let quoted = false;
  for (const character of line) {
    if (character === '"') quoted = !quoted;
    else if (!quoted && character === delimiter) count++;
  }
  return count;
}
