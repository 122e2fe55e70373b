/**
 * Reads a document file as one or more batches of text. Markdown, plain text, JSON and YAML are
 * read whole. CSV and TSV are streamed: bytes are decoded piece by piece, cut into batches at
 * record ends (never inside a quoted field), and each batch carries the start of the document
 * (header row and the lines the delimiter is guessed from) so that it reads exactly as it would
 * inside the whole file. Memory stays near one batch whatever the size of the file.
 */
import { open, readFile } from "node:fs/promises";
import { sniffDelimiter } from "../../../../shared/src/index";
import type { DocumentKind } from "../../../../shared/src/index";
import type { TextEncoding } from "../../files/findDocuments";
import { lineIndexOf, type LineIndex } from "./lineIndex";
import { recordBoundaryScanner, type RecordBoundaryScanner } from "./recordBoundaries";

/** One piece of a document, starting at a line start. */
export interface DocumentBatch {
  /** The batch's own text: a slice of the document. */
  readonly text: string;
  /**
   * UTF-16 offset of `text` in the document; after a resume (see `ResumeAt`) the offset from the
   * resume point, counted from 1 so that it is never taken for the start of the document.
   */
  readonly offset: number;
  /** Byte offset of `text` in the file (exact while the file is valid UTF-8). */
  readonly byteOffset: number;
  /** Lines of `text`, numbered as in the document. */
  readonly lines: LineIndex;
  /**
   * The start of the document, read in front of `text` so a table batch knows its header; its
   * findings belong to the first batch and are dropped here. Empty for the first batch.
   */
  readonly prefix: string;
  /** True for the batch that ends the document. */
  readonly last: boolean;
  /** A CSV's delimiter, guessed once from the start of the document (the core guesses the same). */
  readonly delimiter?: string;
}

/** How a file is being read. */
export interface DocumentReading {
  readonly batches: AsyncIterable<DocumentBatch>;
  /** False once bytes that are not UTF-8 were met: the text then differs from the file. */
  exactUtf8(): boolean;
}

/**
 * Batches of at least this many characters, ending at the first record end past it (one record
 * may make a batch longer). Small enough that a batch's records die young in the garbage
 * collector's eyes, large enough that the prefix read again with each batch costs little.
 */
export const DEFAULT_BATCH_CHARACTERS = 1 << 16;

/**
 * Bytes read from disk at a time. Kept under a megabyte: Node hands longer decoded text over as an
 * external string, and slicing and joining such a string is many times slower than a plain one.
 */
const CHUNK_BYTES = 1 << 19;

/** The core guesses the delimiter from at most this many characters and lines of the start. */
export const SNIFF_CHARACTERS = 65_536;
const SNIFF_LINES = 20;

/**
 * Where to start reading a CSV/TSV other than at its beginning: a record start, the line it is
 * on, the start of the document up to the end of its header row, and the delimiter.
 */
export interface ResumeAt {
  readonly byteOffset: number;
  /** 0-based line of the record at `byteOffset`. */
  readonly line: number;
  readonly prefix: string;
  readonly delimiter: string;
}

/** Reads `path` as a document of `kind` (a CSV or TSV from `resume` on, when given). */
export function readDocument(
  path: string,
  kind: DocumentKind,
  batchCharacters = DEFAULT_BATCH_CHARACTERS,
  resume?: ResumeAt,
  encoding: TextEncoding = "utf-8",
): DocumentReading {
  const decoding = encoding === "utf-8" ? utf8Decoding() : utf16Decoding(encoding);
  const batches =
    kind === "csv" || kind === "tsv" ? delimitedBatches(path, kind, decoding, batchCharacters, resume) : wholeDocument(path, decoding);
  return { batches, exactUtf8: () => decoding.exact };
}

interface Utf8Decoding {
  /** True while the text is exactly the file's bytes read as UTF-8. */
  exact: boolean;
  decode(bytes?: Uint8Array): string;
  /** Bytes the text takes in the file. */
  byteLength(text: string): number;
}

/** UTF-16 text: never exact in the UTF-8 sense (fixes are written as UTF-8 only). */
function utf16Decoding(encoding: "utf-16le" | "utf-16be"): Utf8Decoding {
  const decoder = new TextDecoder(encoding, { ignoreBOM: true });
  return {
    exact: false,
    decode: (bytes) => (bytes ? decoder.decode(bytes, { stream: true }) : decoder.decode()),
    byteLength: (text) => 2 * text.length,
  };
}

/**
 * Strict UTF-8 while the bytes allow it (so a fixed file can be written back byte for byte),
 * then lenient, with U+FFFD for what is not UTF-8. A byte-order mark is kept as text.
 */
function utf8Decoding(): Utf8Decoding {
  let decoder = new TextDecoder("utf-8", { fatal: true, ignoreBOM: true });
  const run = (bytes?: Uint8Array): string => (bytes ? decoder.decode(bytes, { stream: true }) : decoder.decode());
  const decoding: Utf8Decoding = {
    exact: true,
    byteLength: (text) => Buffer.byteLength(text, "utf8"),
    decode(bytes) {
      try {
        return run(bytes);
      } catch {
        decoding.exact = false;
        decoder = new TextDecoder("utf-8", { ignoreBOM: true });
        return run(bytes);
      }
    },
  };
  return decoding;
}

async function* wholeDocument(path: string, decoding: Utf8Decoding): AsyncGenerator<DocumentBatch> {
  const bytes = await readFile(path);
  const text = decoding.decode(bytes) + decoding.decode();
  yield { text, offset: 0, byteOffset: 0, lines: lineIndexOf(text), prefix: "", last: true };
}

async function* delimitedBatches(
  path: string,
  kind: "csv" | "tsv",
  decoding: Utf8Decoding,
  batchCharacters: number,
  resume?: ResumeAt,
): AsyncGenerator<DocumentBatch> {
  const handle = await open(path, "r");
  try {
    const buffer = Buffer.allocUnsafe(CHUNK_BYTES);
    let pending = "";
    let ended = false;
    let scanner: RecordBoundaryScanner | undefined;
    let delimiter: string | undefined;
    // The first batch must reach past the lines the delimiter is guessed from; they become the prefix.
    let prefixLength = -1;
    let prefix = "";
    let offset = 0;
    let byteOffset = 0;
    let line = 0;
    let position: number | null = null;
    if (resume) {
      // The start of the document is known already: it only goes in front of every batch.
      delimiter = resume.delimiter;
      scanner = recordBoundaryScanner(delimiter, 0);
      prefix = resume.prefix;
      prefixLength = 0;
      offset = 1;
      byteOffset = resume.byteOffset;
      line = resume.line;
      position = resume.byteOffset;
    }

    const cut = (length: number, last: boolean): DocumentBatch => {
      const text = length === pending.length ? pending : pending.slice(0, length);
      pending = length === pending.length ? "" : pending.slice(length);
      const lines = lineIndexOf(text, line, offset === 0);
      const batch: DocumentBatch = { text, offset, byteOffset, lines, prefix, last, delimiter };
      if (offset === 0) prefix = text.slice(0, prefixLength);
      offset += text.length;
      byteOffset += decoding.byteLength(text);
      line += lines.lineBreaks;
      scanner?.drop(length);
      return batch;
    };

    while (!ended) {
      const { bytesRead } = await handle.read(buffer, 0, CHUNK_BYTES, position);
      if (position !== null) position += bytesRead;
      if (bytesRead === 0) {
        pending += decoding.decode();
        ended = true;
      } else {
        pending += decoding.decode(buffer.subarray(0, bytesRead));
      }
      if (!scanner) {
        if (!ended && pending.length < SNIFF_CHARACTERS) continue;
        delimiter = kind === "tsv" ? "\t" : sniffDelimiter(pending, ",");
        scanner = recordBoundaryScanner(delimiter, pending.charCodeAt(0) === 0xfeff ? 1 : 0);
      }
      if (prefixLength < 0) {
        const windowEnd = sniffWindowEnd(pending);
        const boundary = scanner.scan(pending, windowEnd);
        if (boundary >= windowEnd) prefixLength = boundary;
        else if (ended) prefixLength = pending.length;
        else continue;
      }
      // As many batches as the text read so far holds, each ending at the first record end past
      // `batchCharacters` (the first one past the prefix too): one chunk from disk may give several.
      for (;;) {
        const target = offset === 0 ? Math.max(batchCharacters, prefixLength) : batchCharacters;
        if (pending.length < target) break;
        const boundary = scanner.scan(pending, target);
        if (boundary < target) break;
        yield cut(boundary, false);
      }
      if (ended) break;
    }
    yield cut(pending.length, true);
  } finally {
    await handle.close();
  }
}

/**
 * Where the core's delimiter guess stops reading: after the 20th non-empty line or at 65,536
 * characters, whichever comes first (lines split on LF alone, as the guess does).
 */
function sniffWindowEnd(text: string): number {
  const limit = Math.min(text.length, SNIFF_CHARACTERS);
  let start = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  let counted = 0;
  while (start < limit) {
    const end = text.indexOf("\n", start);
    if (end < 0 || end >= limit) return limit;
    if (text.slice(start, end).replace(/\r$/, "").trim().length > 0) counted++;
    start = end + 1;
    if (counted >= SNIFF_LINES) return start;
  }
  return limit;
}
