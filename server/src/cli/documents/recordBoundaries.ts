/**
 * Finds where records end in delimited text that arrives in pieces, by the same rules as the
 * core's tokenizer: a quote opens a quoted field only at the start of a field, "" inside quotes
 * is an escaped quote, and line breaks inside quotes belong to the field. State is carried from
 * one piece to the next, so every character is looked at once.
 */

const QUOTE = 0x22;
const LF = 0x0a;
const CR = 0x0d;

const enum FieldState {
  Start,
  Unquoted,
  Quoted,
  QuoteInQuoted,
}

/** A scanner over one growing text. */
export interface RecordBoundaryScanner {
  /**
   * Scans `text` (the whole pending text; what was scanned before is not looked at again) and
   * returns the offset just past the last record end seen so far, or -1. With `stopAt`, stops
   * at the first record end at or after that offset and returns it.
   */
  scan(text: string, stopAt?: number): number;
  /** Forgets the first `count` characters (they were handed on); keeps the state. */
  drop(count: number): void;
}

/** A scanner for `delimiter`; `skipFirst` skips a byte-order mark at the very start. */
export function recordBoundaryScanner(delimiter: string, skipFirst = 0): RecordBoundaryScanner {
  const separator = delimiter.charCodeAt(0);
  let state: FieldState = FieldState.Start;
  let scanned = skipFirst;
  let lastBoundary = -1;
  return {
    scan(text, stopAt = Number.POSITIVE_INFINITY) {
      let index = scanned;
      const length = text.length;
      while (index < length) {
        const code = text.charCodeAt(index);
        if (state === FieldState.Quoted) {
          // Jump to the next quote: quoted fields can be long.
          const close = text.indexOf('"', index);
          if (close < 0) {
            index = length;
            break;
          }
          index = close + 1;
          state = FieldState.QuoteInQuoted;
          continue;
        }
        if (state === FieldState.QuoteInQuoted && code === QUOTE) {
          state = FieldState.Quoted;
          index++;
          continue;
        }
        if (state === FieldState.Start && code === QUOTE) {
          state = FieldState.Quoted;
          index++;
          continue;
        }
        if (code === separator) {
          state = FieldState.Start;
          index++;
          continue;
        }
        if (code === LF) {
          state = FieldState.Start;
          index++;
          lastBoundary = index;
          if (index >= stopAt) break;
          continue;
        }
        if (code === CR) {
          // Whether a LF follows decides where the record ends; wait for the next piece.
          if (index + 1 >= length) break;
          state = FieldState.Start;
          index += text.charCodeAt(index + 1) === LF ? 2 : 1;
          lastBoundary = index;
          if (index >= stopAt) break;
          continue;
        }
        state = FieldState.Unquoted;
        index++;
      }
      scanned = index;
      return lastBoundary;
    },
    drop(count) {
      scanned -= count;
      lastBoundary = lastBoundary >= count ? lastBoundary - count : -1;
    },
  };
}
