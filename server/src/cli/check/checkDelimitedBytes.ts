/**
 * `check` of a CSV or TSV file, read as bytes, for the common case of a large export that repeats
 * the same few species: each row is cut at its delimiters without decoding it, the bytes from its
 * first to its last recognised column are the key, and the findings of a key are worked out once
 * by the core (see the core's delimitedFindings) and placed on every row that has it.
 *
 * Anything this quick reading does not handle alike (a quote, a lone carriage return, a row longer
 * than the read buffer, rows that hardly repeat, an unusual start of the file) hands the rest of
 * the file, from the start of that row, to the ordinary reading in batches, which gives the same
 * findings; tests compare the two.
 */
import { open } from "node:fs/promises";
import { sniffDelimiter } from "../../../../shared/src/index";
import { findHeader, recognisedColumns, workOutRow } from "../../../../shared/src/index";
import type { SpeciesReader } from "../../../../shared/src/index";
import { shownFindings, type Finding, type FindingSeverity, type NotesShownAs } from "../../../../shared/src/index";
import { SNIFF_CHARACTERS } from "../documents/documentBatches";
import type { DocumentFile } from "../../files/findDocuments";
import { countLineFeeds } from "../documents/lineIndex";
import type { DelimitedRowMemo } from "../../../../shared/src/index";
import { countFinding } from "./checkSummary";
import type { CheckOutputs } from "./checkFile";
import { withLocatedFixes, type LocatedFinding } from "./locatedFinding";

/** Where the ordinary reading takes over: a row start, with what it needs to read on from there. */
export interface ResumePoint {
  readonly byteOffset: number;
  /** 0-based line of the row. */
  readonly line: number;
  /** The start of the file up to the end of the header row's line. */
  readonly prefix: string;
  readonly delimiter: string;
}

/** What the byte reading did: findings reported, and where the ordinary reading must go on. */
export interface ByteCheckResult {
  readonly found: number;
  /** Absent when the whole file was read; "start" when the ordinary reading must read it all. */
  readonly resume?: ResumePoint | "start";
}

/** Bytes held at a time; a row longer than this goes to the ordinary reading. */
const BUFFER_BYTES = 1 << 20;
/** The start of the file read first, for the delimiter guess and the header. */
const START_BYTES = 1 << 19;

/**
 * Bytes as a Latin-1 string (one character a byte: a key that tells any two byte runs apart).
 * Buffer's own latin1Slice, which toString("latin1") calls after checking its arguments, is used
 * where it exists: it is called once a row.
 */
type Latin1Slice = (this: Buffer, start: number, end: number) => string;
const latin1Slice = (Buffer.prototype as unknown as { latin1Slice?: Latin1Slice }).latin1Slice;
const latin1 = (buffer: Buffer, start: number, end: number): string =>
  latin1Slice ? latin1Slice.call(buffer, start, end) : buffer.toString("latin1", start, end);

const LF = 0x0a;
const CR = 0x0d;
const QUOTE = 0x22;

export interface ByteCheckContext {
  readonly read: SpeciesReader;
  readonly rows: DelimitedRowMemo;
  /** Bytes of rows held at a time (tests make it small to cut rows across reads). */
  readonly bufferBytes?: number;
  /** What notes are shown as (default: as they are). */
  readonly notesAs?: NotesShownAs;
}

/** Checks `file` (CSV or TSV) as far as the byte reading goes; reports through `outputs`. */
export async function checkDelimitedBytes(file: DocumentFile, outputs: CheckOutputs, context: ByteCheckContext): Promise<ByteCheckResult> {
  const kind = file.kind === "tsv" ? "tsv" : "csv";
  const handle = await open(file.path, "r");
  try {
    const start = Buffer.allocUnsafe(START_BYTES);
    const startBytes = (await handle.read(start, 0, START_BYTES, 0)).bytesRead;
    const wholeFileRead = startBytes < START_BYTES;
    let startText: string;
    try {
      startText = new TextDecoder("utf-8", { fatal: true, ignoreBOM: true }).decode(start.subarray(0, startBytes), {
        stream: !wholeFileRead,
      });
    } catch {
      return { found: 0, resume: "start" };
    }
    if (!wholeFileRead && startText.length < SNIFF_CHARACTERS) return { found: 0, resume: "start" };
    const delimiter = kind === "tsv" ? "\t" : sniffDelimiter(startText, ",");
    const header = findHeader(startText, delimiter);
    if (!header || header.next > startText.length) return { found: 0, resume: "start" };
    const prefix = startText.slice(0, header.next);
    const { first, last } = recognisedColumns(header.text, delimiter);
    // Only quotes can give a table without recognised columns findings; the ordinary reading sees to them.
    if (first < 0) return { found: 0, resume: "start" };

    const memo = context.rows;
    if (memo.headerKey !== `${delimiter}${header.text}`) {
      memo.rows.clear();
      memo.headerKey = `${delimiter}${header.text}`;
    }
    const table: TableShape = {
      kind,
      delimiter,
      separator: delimiter.charCodeAt(0),
      first,
      last,
      header: header.text,
      file: file.displayPath,
      notesAs: context.notesAs ?? "information",
    };
    // The rows are read from just past the header's line, in a buffer of their own.
    const buffer = Buffer.allocUnsafe(context.bufferBytes ?? BUFFER_BYTES);
    let bufferStart = Buffer.byteLength(prefix, "utf8");
    let filled = 0;
    let ended = false;
    const state: ScanState = { position: 0, line: countLineFeeds(prefix), found: 0, located: [], counts: [] };
    const lenient = new TextDecoder("utf-8", { ignoreBOM: true });
    const rowTable = { header: header.text, first, kind, delimiter } as const;
    // Undefined when rows are mostly new: the ordinary reading is quicker for the rest.
    const rowsOf = (key: string, from: number, to: number): readonly Finding[] | undefined =>
      workOutRow(memo, key, lenient.decode(buffer.subarray(from, to)), rowTable, context.read);
    const decodedLength = (from: number, to: number): number => lenient.decode(buffer.subarray(from, to)).length;
    const report = async (): Promise<void> => {
      if (state.located.length > 0) {
        outputs.reporter.findings(state.located);
        for (const severity of state.counts) countFinding(outputs.summary, severity);
        state.located = [];
        state.counts = [];
      }
      outputs.progress(bufferStart + state.position);
      await outputs.drain?.();
    };
    const resumeHere = async (): Promise<ByteCheckResult> => {
      await report();
      // Keys here are bytes read as Latin-1, keys there decoded text: they must not meet.
      memo.rows.clear();
      return { found: state.found, resume: { byteOffset: bufferStart + state.position, line: state.line, prefix, delimiter } };
    };

    for (;;) {
      if (!ended) {
        // Keep the unfinished row, move it to the front and read on behind it.
        if (state.position > 0) {
          buffer.copy(buffer, 0, state.position, filled);
          bufferStart += state.position;
          filled -= state.position;
          state.position = 0;
        }
        if (filled >= buffer.length) return resumeHere();
        const { bytesRead } = await handle.read(buffer, filled, buffer.length - filled, bufferStart + filled);
        filled += bytesRead;
        if (bytesRead === 0) ended = true;
      }
      const stop = scanRows(state, table, buffer, filled, ended, memo.rows, memo, rowsOf, decodedLength);
      if (stop === Stop.Unusual) return resumeHere();
      if (stop === Stop.NotRepeating) {
        memo.ordinary = true;
        return resumeHere();
      }
      if (ended) break;
      await report();
    }
    await report();
    return { found: state.found };
  } finally {
    await handle.close();
  }
}

/** What the quick reading knows of the table. */
interface TableShape {
  readonly kind: "csv" | "tsv";
  readonly delimiter: string;
  readonly separator: number;
  /** First and last recognised column. */
  readonly first: number;
  readonly last: number;
  readonly header: string;
  readonly file: string;
  readonly notesAs: NotesShownAs;
}

/** Where the quick reading is, and what it found since the last report. */
interface ScanState {
  /** Start of the next row, in the buffer. */
  position: number;
  /** 0-based line of that row. */
  line: number;
  found: number;
  located: LocatedFinding[];
  counts: FindingSeverity[];
}

const enum Stop {
  /** Every complete row in the buffer was read. */
  NeedMore,
  /** The row at the position needs the ordinary reading. */
  Unusual,
  /** Rows hardly repeat: the ordinary reading is quicker from the position on. */
  NotRepeating,
}

/**
 * Reads the complete rows in `buffer[state.position, filled)` (the last one too when `ended`),
 * one pass over each row's bytes. A plain function with plain locals, so it is compiled well.
 */
function scanRows(
  state: ScanState,
  table: TableShape,
  buffer: Buffer,
  filled: number,
  ended: boolean,
  rows: Map<string, readonly Finding[]>,
  counter: { looked: number },
  workOut: (key: string, start: number, end: number) => readonly Finding[] | undefined,
  decodedLength: (start: number, end: number) => number,
): Stop {
  const { separator, first, last } = table;
  let position = state.position;
  let line = state.line;
  try {
    while (position < filled) {
      const rowStart = position;
      let column = 0;
      let stretchStart = first === 0 ? rowStart : -1;
      let stretchEnd = -1;
      let lineEnd = -1;
      let seen = 0;
      let index = rowStart;
      for (; index < filled; index++) {
        const byte = buffer[index];
        if (byte > QUOTE) {
          seen |= byte;
          if (byte !== separator) continue;
        } else if (byte === LF) {
          if (lineEnd < 0) lineEnd = index;
          break;
        } else if (byte === QUOTE) {
          return Stop.Unusual;
        } else if (byte === CR) {
          // Whether a line feed follows may be in the next read.
          if (index + 1 >= filled && !ended) return Stop.NeedMore;
          if (index + 1 >= filled || buffer[index + 1] !== LF) return Stop.Unusual;
          lineEnd = index;
          continue;
        } else if (byte !== separator) {
          continue;
        }
        column++;
        if (column === first) stretchStart = index + 1;
        else if (column === last + 1 && stretchEnd < 0) stretchEnd = index;
      }
      if (index >= filled && !ended) return Stop.NeedMore;
      if (lineEnd < 0) lineEnd = index;
      if (stretchStart >= 0) {
        if (stretchEnd < 0) stretchEnd = lineEnd;
        const key = latin1(buffer, stretchStart, stretchEnd);
        counter.looked++;
        const worked = rows.get(key) ?? workOut(key, stretchStart, stretchEnd);
        if (worked === undefined) return Stop.NotRepeating;
        const known = shownFindings(worked, table.notesAs);
        if (known.length > 0) {
          // Columns count UTF-16 code units: decode what precedes the stretch unless it is ASCII.
          const before = seen < 0x80 ? stretchStart - rowStart : decodedLength(rowStart, stretchStart);
          for (const finding of known) {
            state.located.push(placed(table.file, line, before, finding));
            state.counts.push(finding.severity);
          }
          state.found += known.length;
        }
      }
      line++;
      position = index + 1;
    }
    return Stop.NeedMore;
  } finally {
    state.position = position;
    state.line = line;
  }
}

/** `finding` (offsets relative to the stretch) on 0-based `line`, the stretch `before` code units in. */
function placed(file: string, line: number, before: number, finding: Finding): LocatedFinding {
  const at = (offset: number) => before + offset + 1;
  const located: LocatedFinding = {
    file,
    line: line + 1,
    column: at(finding.range.start),
    endLine: line + 1,
    endColumn: at(finding.range.end),
    severity: finding.severity,
    code: finding.code,
    message: finding.message,
  };
  return withLocatedFixes(located, finding, (range) => ({
    line: line + 1,
    column: at(range.start),
    endLine: line + 1,
    endColumn: at(range.end),
  }));
}
