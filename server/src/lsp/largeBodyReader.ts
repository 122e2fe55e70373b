/**
 * Reads a large message body (an editor opening a 10 MB document) while its bytes arrive, so the
 * work is done by the time the last byte is in: a request sent right behind the message is not
 * held up by the parse of the whole body. Long JSON strings (the document's text) are decoded
 * slab by slab as they stream in; the rest of the body, a few hundred bytes, is parsed at the
 * end with a marker where each long string goes. The result is what `JSON.parse` of the whole
 * body gives, errors included. Long strings are document texts: each is also cut into the
 * chunks a document keeps while it arrives, and remembered (longStringChunks.ts) for the
 * document store, which then neither copies it into one string nor reads it again.
 */

import { createChunkedTextBuilder, type ChunkedTextBuilder } from "../../../shared/src/index";
import { rememberChunked } from "./longStringChunks";

const QUOTE = 0x22;
const BACKSLASH = 0x5c;

/** Sizes, adjustable for tests. */
export interface LargeBodySizes {
  /** A string longer than this many bytes is decoded in slabs. */
  readonly longString: number;
  /** Bytes decoded at a time; large slabs make strings V8 keeps outside the young generation. */
  readonly slab: number;
}

export const LARGE_BODY_SIZES: LargeBodySizes = { longString: 64 * 1024, slab: 512 * 1024 };

/** What the reader gives at the end: the parsed body, or why it is not JSON. */
export type LargeBodyResult = { readonly ok: true; readonly value: unknown } | { readonly ok: false; readonly error: Error };

export interface LargeBodyReader {
  /** The next bytes of the body, in order. The reader may keep `bytes` without copying them. */
  write(bytes: Buffer): void;
  /** Call once every byte has been written. */
  finish(): LargeBodyResult;
}

type Mode = "between" | "string" | "long";

export function createLargeBodyReader(sizes: LargeBodySizes = LARGE_BODY_SIZES): LargeBodyReader {
  // A marker no client sends: it stands for a long string in the parsed rest of the body.
  const markerPrefix = `\u0000lonepair-long-string-${Math.random().toString(36).slice(2)}-`;
  const longStrings: string[] = [];
  /** Bytes of the body outside long strings, in order. */
  const rest: Buffer[] = [];
  let mode: Mode = "between";
  /** The string being read: its bytes from the opening quote ("string") or after it ("long"). */
  let current: Buffer[] = [];
  let currentBytes = 0;
  /**
   * The long string being read, so far: slabs joined without a copy (the engine links them),
   * and its chunks for the document store.
   */
  let longValue = "";
  let chunks: ChunkedTextBuilder = createChunkedTextBuilder();
  /** Backslashes just before the next byte to read: an odd count escapes it. */
  let backslashRun = 0;
  let failure: Error | undefined;

  const keep = (bytes: Buffer): void => {
    if (mode === "between") rest.push(bytes);
    else {
      current.push(bytes);
      currentBytes += bytes.length;
    }
  };

  /** Decodes the long string's bytes up to a point that cuts no character or escape; all of them when `last`. */
  const decodeSlab = (last: boolean): void => {
    const bytes = current.length === 1 ? current[0] : Buffer.concat(current, currentBytes);
    const cut = last ? bytes.length : safeCut(bytes);
    if (cut === 0) return;
    if (!failure) {
      // One copy with its quotes around it, so the text JSON.parse reads is flat from the start.
      const quoted = Buffer.allocUnsafe(cut + 2);
      quoted[0] = QUOTE;
      bytes.copy(quoted, 1, 0, cut);
      quoted[cut + 1] = QUOTE;
      try {
        const slab = JSON.parse(quoted.toString("utf8")) as string;
        longValue += slab;
        chunks.add(slab);
      } catch (error) {
        failure = error instanceof Error ? error : new Error(String(error));
      }
    }
    current = cut < bytes.length ? [bytes.subarray(cut)] : [];
    currentBytes = bytes.length - cut;
  };

  const endString = (): void => {
    if (mode === "long") {
      decodeSlab(true);
      if (!failure) rememberChunked(longValue, chunks.finish());
      longStrings.push(longValue);
      longValue = "";
      chunks = createChunkedTextBuilder();
      rest.push(Buffer.from(JSON.stringify(`${markerPrefix}${longStrings.length - 1}`)));
    } else {
      rest.push(...current);
    }
    current = [];
    currentBytes = 0;
    mode = "between";
  };

  /** Reads the next bytes of the body. */
  const read = (bytes: Buffer): void => {
    let at = 0;
    while (at < bytes.length) {
      if (mode === "between") {
        const quote = bytes.indexOf(QUOTE, at);
        if (quote < 0) {
          keep(bytes.subarray(at));
          return;
        }
        keep(bytes.subarray(at, quote));
        // `current` is empty here: the last string's end emptied it.
        mode = "string";
        backslashRun = 0;
        keep(bytes.subarray(quote, quote + 1));
        at = quote + 1;
        continue;
      }
      const closing = closingQuote(bytes, at);
      const end = closing < 0 ? bytes.length : closing;
      keep(bytes.subarray(at, end));
      if (mode === "string" && currentBytes > sizes.longString) {
        // Long: from here on its bytes are decoded in slabs, without the opening quote.
        const opened = Buffer.concat(current, currentBytes).subarray(1);
        mode = "long";
        current = [opened];
        currentBytes = opened.length;
      }
      if (mode === "long" && currentBytes >= sizes.slab) decodeSlab(false);
      if (closing < 0) return;
      if (mode === "string") keep(bytes.subarray(closing, closing + 1));
      endString();
      at = closing + 1;
    }
  };

  /** The first unescaped quote in `bytes` from `from`, or -1; keeps count of the backslashes before the next byte. */
  const closingQuote = (bytes: Buffer, from: number): number => {
    let start = from;
    for (;;) {
      const quote = bytes.indexOf(QUOTE, start);
      const stop = quote < 0 ? bytes.length : quote;
      // Backslashes right before `stop`, counting those carried over from earlier bytes.
      let run = 0;
      while (run < stop - start && bytes[stop - 1 - run] === BACKSLASH) run += 1;
      if (run === stop - start) run += backslashRun;
      if (quote < 0) {
        backslashRun = run;
        return -1;
      }
      if (run % 2 === 0) {
        backslashRun = 0;
        return quote;
      }
      backslashRun = 0;
      start = quote + 1;
    }
  };

  return {
    write(bytes) {
      if (bytes.length > 0) read(bytes);
    },
    finish() {
      if (mode !== "between") return { ok: false, error: new SyntaxError("Unterminated string in JSON") };
      if (failure) return { ok: false, error: failure };
      try {
        const parsed: unknown = JSON.parse(Buffer.concat(rest).toString("utf8"));
        return { ok: true, value: longStrings.length === 0 ? parsed : putBack(parsed, markerPrefix, longStrings) };
      } catch (error) {
        return { ok: false, error: error instanceof Error ? error : new Error(String(error)) };
      }
    },
  };
}

/**
 * Where `bytes` may be cut so that both sides decode as they would together: before the last
 * backslash run that may start an unfinished escape (`\uXXXX` is the longest, 6 bytes), else
 * before the last character's first byte (the bytes after it may be the start of a character
 * that ends in the next chunk). 0 when there is no such place.
 */
export function safeCut(bytes: Buffer): number {
  for (let index = bytes.length - 1; index >= Math.max(0, bytes.length - 6); index--) {
    if (bytes[index] !== BACKSLASH) continue;
    let runStart = index;
    while (runStart > 0 && bytes[runStart - 1] === BACKSLASH) runStart -= 1;
    return runStart;
  }
  // Back over continuation bytes (10xxxxxx) to a character's first byte; a character has at most three.
  let cut = bytes.length - 1;
  while (cut > 0 && cut > bytes.length - 4 && (bytes[cut] & 0xc0) === 0x80) cut -= 1;
  return Math.max(0, cut);
}

/** `value` with every marker string (as a value or a key) replaced by the long string it stands for. */
function putBack(value: unknown, markerPrefix: string, longStrings: readonly string[]): unknown {
  const original = (text: string): string => {
    if (!text.startsWith(markerPrefix)) return text;
    const index = Number(text.slice(markerPrefix.length));
    return longStrings[index] ?? text;
  };
  const walk = (node: unknown): unknown => {
    if (typeof node === "string") return original(node);
    if (Array.isArray(node)) {
      for (let index = 0; index < node.length; index++) node[index] = walk(node[index]);
      return node;
    }
    if (typeof node !== "object" || node === null) return node;
    const record = node as Record<string, unknown>;
    const renamed = Object.keys(record).some((key) => key.startsWith(markerPrefix));
    if (!renamed) {
      for (const key of Object.keys(record)) record[key] = walk(record[key]);
      return record;
    }
    const rebuilt: Record<string, unknown> = {};
    for (const key of Object.keys(record)) rebuilt[original(key)] = walk(record[key]);
    return rebuilt;
  };
  return walk(value);
}
