/**
 * UTF-16 offsets to 1-based lines and columns, the way editors and compilers count them:
 * LF, CRLF and a lone CR each end a line; columns count UTF-16 code units.
 */

/** 1-based line and column of one offset. */
export interface LineColumn {
  readonly line: number;
  readonly column: number;
}

/** Positions within one piece of text that starts at a line start of its document. */
export interface LineIndex {
  /** Number of line breaks in the text. */
  readonly lineBreaks: number;
  /** Offset (into the text) where each line starts. */
  readonly lineStarts: readonly number[];
  /** The position of `offset` (an index into the text), with `firstLine` added to the line. */
  position(offset: number): LineColumn;
}

const LF = 0x0a;
const CR = 0x0d;
const BOM = 0xfeff;

/**
 * Indexes `text`. `firstLine` is the 0-based line of its first character in the document;
 * `atDocumentStart` says a leading byte-order mark is not a column (editors do not show it).
 * Line starts are worked out when first needed: most batches of a large file have no finding.
 */
export function lineIndexOf(text: string, firstLine = 0, atDocumentStart = true): LineIndex {
  let lineStarts: number[] | undefined;
  const starts = (): number[] => (lineStarts ??= lineStartsOf(text));
  // Without carriage returns, line feeds alone end lines and indexOf counts them fast.
  const lineBreaks = text.indexOf("\r") < 0 ? countLineFeeds(text) : starts().length - 1;
  const bomWidth = atDocumentStart && text.charCodeAt(0) === BOM ? 1 : 0;
  return {
    lineBreaks,
    get lineStarts() {
      return starts();
    },
    position(offset) {
      const known = starts();
      const line = lineOf(known, offset);
      const skip = line === 0 ? bomWidth : 0;
      return { line: firstLine + line + 1, column: Math.max(offset - known[line] - skip, 0) + 1 };
    },
  };
}

/** Line feeds in `text`. */
export function countLineFeeds(text: string): number {
  let count = 0;
  for (let index = text.indexOf("\n"); index >= 0; index = text.indexOf("\n", index + 1)) count++;
  return count;
}

function lineStartsOf(text: string): number[] {
  const lineStarts = [0];
  for (let index = 0; index < text.length; index++) {
    const code = text.charCodeAt(index);
    if (code === LF) lineStarts.push(index + 1);
    else if (code === CR) {
      if (text.charCodeAt(index + 1) === LF) index++;
      lineStarts.push(index + 1);
    }
  }
  return lineStarts;
}

/** The last line whose start is at or before `offset` (binary search). */
function lineOf(lineStarts: readonly number[], offset: number): number {
  let low = 0;
  let high = lineStarts.length - 1;
  while (low < high) {
    const middle = (low + high + 1) >> 1;
    if (lineStarts[middle] <= offset) low = middle;
    else high = middle - 1;
  }
  return low;
}
