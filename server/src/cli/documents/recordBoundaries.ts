/**
 * Finds where records end in delimited text that arrives in pieces, by the same rules as the
 * core's tokenizer: a quote opens a quoted field only at the start of a field, "" inside quotes
 * is an escaped quote, and line breaks inside quotes belong to the field. State is carried from
 * one piece to the next, so every character is looked at once.
 */

const QUOTE = 0x22;
const LF = 0x0a;

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
      // Where the next line feed, carriage return and quote are, looked up with indexOf (fast on
      // long text) and looked up again only once passed; -1 when there is none further on.
      let nextLf = -2;
      let nextCr = -2;
      let nextQuote = -2;
      while (index < length) {
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
        if (state === FieldState.QuoteInQuoted) {
          if (text.charCodeAt(index) === QUOTE) {
            state = FieldState.Quoted;
            index++;
            continue;
          }
          // Text after a closing quote is part of the field, but no field start.
          state = FieldState.Unquoted;
        }
        // Outside quotes only line ends and quotes matter; delimiters only say whether a quote
        // opens a field, which the character before the quote tells.
        if (nextLf !== -1 && nextLf < index) nextLf = text.indexOf("\n", index);
        if (nextCr !== -1 && nextCr < index) nextCr = text.indexOf("\r", index);
        if (nextQuote !== -1 && nextQuote < index) nextQuote = text.indexOf('"', index);
        const next = nearest(nearest(nextLf, nextCr), nextQuote);
        if (next < 0) {
          state = stateBefore(text, length, index, state, separator);
          index = length;
          break;
        }
        const code = text.charCodeAt(next);
        if (code === QUOTE) {
          const fieldStart = stateBefore(text, next, index, state, separator) === FieldState.Start;
          state = fieldStart ? FieldState.Quoted : FieldState.Unquoted;
          index = next + 1;
          continue;
        }
        if (code === LF) {
          state = FieldState.Start;
          index = next + 1;
          lastBoundary = index;
          if (index >= stopAt) break;
          continue;
        }
        // A carriage return: whether a LF follows decides where the record ends; wait for the next piece.
        if (next + 1 >= length) {
          state = stateBefore(text, next, index, state, separator);
          index = next;
          break;
        }
        state = FieldState.Start;
        index = next + (text.charCodeAt(next + 1) === LF ? 2 : 1);
        lastBoundary = index;
        if (index >= stopAt) break;
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

/** The smaller of two positions, where -1 means none. */
function nearest(a: number, b: number): number {
  if (a < 0) return b;
  if (b < 0) return a;
  return a < b ? a : b;
}

/**
 * The state just before `position`, when the text from `from` (where the state was `state`) up to
 * it holds no line end or quote: a field starts there only right after a delimiter.
 */
function stateBefore(text: string, position: number, from: number, state: FieldState, separator: number): FieldState {
  if (position === from) return state;
  return text.charCodeAt(position - 1) === separator ? FieldState.Start : FieldState.Unquoted;
}
