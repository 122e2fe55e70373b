/**
 * Where a JSON text's list of records and each of its elements lie, found by one quick pass over
 * the characters that tracks only strings, comments and brackets: the first step of reading a
 * large file a few records at a time (see `jsonParts.ts`). Each element and the text around the
 * list are then read by the real parser, which decides whether the text is clean JSON; this pass
 * only refuses what it can see at the list's own level (a missing or doubled comma), so that an
 * element read alone is the element read in place.
 */
import { sliceOf, type ChunkedText } from "../chunkedText";

/** The record list: its brackets and its elements' bounds (first character, just past the last). */
export interface ScannedList {
  /** The offsets of its `[` and its `]`. */
  readonly open: number;
  readonly close: number;
  readonly starts: Int32Array;
  readonly ends: Int32Array;
}

/** Deeper than this the ordinary reading decides (it knows how deep its parser may go). */
const DEEPEST = 500;

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const SLASH = 0x2f;
const STAR = 0x2a;
const LINE_FEED = 0x0a;
const CARRIAGE_RETURN = 0x0d;
const COMMA = 0x2c;
const COLON = 0x3a;
const OPEN_BRACE = 0x7b;
const CLOSE_BRACE = 0x7d;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACKET = 0x5d;

const enum Mode {
  Code,
  String,
  Escape,
  /** A slash outside a string: a comment starts, or the text is not JSON. */
  Slash,
  LineComment,
  BlockComment,
  BlockCommentStar,
}

/** A list that may be the record list, while it is being read. */
interface Candidate {
  readonly open: number;
  /** The stack's height inside it. */
  readonly depth: number;
  readonly underEquationKey: boolean;
  readonly starts: number[];
  readonly ends: number[];
  close: number;
  /** An element has started and its comma (or the closing bracket) has not come yet. */
  elementOpen: boolean;
}

/**
 * The record list of `text`, as the ordinary reading chooses it from clean JSON (the root list, or
 * the list directly under the root object with the most elements, the first of equals, not under
 * an equation key); undefined when there is none with an element, or this pass sees the text is
 * not clean JSON (the ordinary reading then reads it whole).
 */
export function scanJsonList(text: ChunkedText, isEquationKey: (key: string) => boolean): ScannedList | undefined {
  const stack: number[] = [];
  const lists: Candidate[] = [];
  let active: Candidate | undefined;
  let mode = Mode.Code;
  // Just past the last character that is not white space or a comment.
  let lastEnd = 0;
  let stringStart = 0;
  let rootDone = false;
  let rootIsObject = false;
  // In the root object: the last string (the key once a colon follows) and the key in force.
  let lastRootString: { start: number; end: number } | undefined;
  let rootKey: { start: number; end: number } | undefined;

  for (let chunkIndex = 0; chunkIndex < text.chunks.length; chunkIndex++) {
    const chunk = text.chunks[chunkIndex].text;
    const base = text.starts[chunkIndex];
    // Where the chunk's next backslash is, looked for again only once passed: strings are skipped
    // to their closing quote without a look at each character.
    let nextBackslash = -1;
    for (let index = 0; index < chunk.length; index++) {
      if (mode === Mode.String) {
        if (nextBackslash < index) nextBackslash = chunk.indexOf("\\", index) >>> 0;
        const quote = chunk.indexOf('"', index);
        const stop = Math.min(quote < 0 ? chunk.length : quote, nextBackslash);
        if (stop >= chunk.length) break;
        index = stop;
      }
      const code = chunk.charCodeAt(index);
      switch (mode) {
        case Mode.String:
          if (code === QUOTE) {
            mode = Mode.Code;
            lastEnd = base + index + 1;
            if (stack.length === 1 && rootIsObject) lastRootString = { start: stringStart, end: lastEnd };
          } else if (code === BACKSLASH) mode = Mode.Escape;
          continue;
        case Mode.Escape:
          mode = Mode.String;
          continue;
        case Mode.Slash:
          if (code === SLASH) mode = Mode.LineComment;
          else if (code === STAR) mode = Mode.BlockComment;
          else return undefined;
          continue;
        case Mode.LineComment:
          if (code === LINE_FEED || code === CARRIAGE_RETURN) mode = Mode.Code;
          continue;
        case Mode.BlockComment:
          if (code === STAR) mode = Mode.BlockCommentStar;
          continue;
        case Mode.BlockCommentStar:
          mode = code === SLASH ? Mode.Code : code === STAR ? Mode.BlockCommentStar : Mode.BlockComment;
          continue;
      }
      // Outside strings and comments.
      if (code === 0x20 || code === 0x09 || code === LINE_FEED || code === CARRIAGE_RETURN) continue;
      if (code === SLASH) {
        mode = Mode.Slash;
        continue;
      }
      const at = base + index;
      if (rootDone) return undefined;
      if (active && stack.length === active.depth) {
        // At the record list's own level: elements and the commas between them.
        if (code === COMMA) {
          if (!active.elementOpen) return undefined;
          active.ends.push(lastEnd);
          active.elementOpen = false;
          lastEnd = at + 1;
          continue;
        }
        if (code === CLOSE_BRACKET) {
          if (active.elementOpen) active.ends.push(lastEnd);
          active.close = at;
          lists.push(active);
          active = undefined;
        } else if (active.elementOpen) {
          // More of the same number or word; anything else is a second value without a comma.
          if (lastEnd !== at || code === QUOTE || code === OPEN_BRACE || code === OPEN_BRACKET) return undefined;
        } else {
          active.starts.push(at);
          active.elementOpen = true;
        }
      }
      lastEnd = at + 1;
      switch (code) {
        case QUOTE:
          mode = Mode.String;
          stringStart = at;
          break;
        case OPEN_BRACE:
        case OPEN_BRACKET: {
          if (stack.length >= DEEPEST) return undefined;
          if (stack.length === 0) rootIsObject = code === OPEN_BRACE;
          const underRoot = stack.length === 1 && rootIsObject;
          if (code === OPEN_BRACKET && (stack.length === 0 || underRoot)) {
            const key = underRoot && rootKey ? keyText(text, rootKey) : undefined;
            active = {
              open: at,
              depth: stack.length + 1,
              underEquationKey: key !== undefined && isEquationKey(key),
              starts: [],
              ends: [],
              close: -1,
              elementOpen: false,
            };
          }
          stack.push(code);
          break;
        }
        case CLOSE_BRACE:
        case CLOSE_BRACKET:
          if (stack.pop() !== (code === CLOSE_BRACE ? OPEN_BRACE : OPEN_BRACKET)) return undefined;
          if (stack.length === 0) rootDone = true;
          break;
        case COLON:
          if (stack.length === 1 && rootIsObject) rootKey = lastRootString;
          break;
        case COMMA:
          if (stack.length === 1 && rootIsObject) rootKey = undefined;
          break;
      }
      if (stack.length === 0 && code !== CLOSE_BRACE && code !== CLOSE_BRACKET) rootDone = true;
    }
  }
  if (!rootDone || stack.length > 0 || (mode !== Mode.Code && mode !== Mode.LineComment)) return undefined;
  let chosen: Candidate | undefined;
  for (const list of lists) {
    if (list.underEquationKey) continue;
    if (!rootIsObject) chosen = list;
    else if (list.starts.length > (chosen?.starts.length ?? 0)) chosen = list;
  }
  if (!chosen || chosen.starts.length === 0 || chosen.starts.length !== chosen.ends.length) return undefined;
  return { open: chosen.open, close: chosen.close, starts: Int32Array.from(chosen.starts), ends: Int32Array.from(chosen.ends) };
}

/** A key's text: its string decoded, or as written when it cannot be. */
function keyText(text: ChunkedText, key: { start: number; end: number }): string {
  const written = sliceOf(text, key.start, key.end);
  try {
    return String(JSON.parse(written));
  } catch {
    return written.slice(1, -1);
  }
}
