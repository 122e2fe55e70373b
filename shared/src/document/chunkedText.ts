/**
 * A document's text as a list of chunks that each end at a line feed (all but the last), so that
 * an edit copies only the chunks it touches: the other chunks, and the strings in them, are
 * shared by the old and the new version. Offsets are UTF-16 indices; lines break at LF, CRLF and
 * a lone CR, as editors count them.
 */

/**
 * A chunk is cut at the first line feed after this many characters: an edit copies about this
 * much, and a document has its length over this many chunks.
 */
export const CHUNK_TARGET = 16 * 1024;

const LF = 0x0a;
const CR = 0x0d;

/** One piece of the text and its line breaks. */
export interface TextChunk {
  readonly text: string;
  /** How many line breaks `text` holds (a CRLF counts once). */
  readonly lineBreaks: number;
  /** Offsets in `text` just past each line break, worked out when a position is first asked for. */
  lineStarts(): Int32Array;
}

/** One version of a document's text. Never changed: an edit makes a new version. */
export interface ChunkedText {
  readonly chunks: readonly TextChunk[];
  /** `starts[index]` is the document offset of chunk `index`; one more entry holds the length. */
  readonly starts: readonly number[];
  /** `firstLines[index]` is the line chunk `index` starts on; one more entry holds the line count. */
  readonly firstLines: readonly number[];
  readonly length: number;
  /** Lines as an editor counts them: line breaks plus one. */
  readonly lineCount: number;
  /** The chunk size this text is cut at (`CHUNK_TARGET` unless a test asks for smaller). */
  readonly chunkTarget: number;
}

/** A zero-based line and UTF-16 character, as the editor's protocol counts them. */
export interface LineAndCharacter {
  readonly line: number;
  readonly character: number;
}

/** The chunked form of `text`. */
export function chunkedTextOf(text: string, chunkTarget = CHUNK_TARGET): ChunkedText {
  return assemble(chunksOf(text, chunkTarget), chunkTarget);
}

/** Builds a chunked text from pieces given one at a time, as they arrive. */
export interface ChunkedTextBuilder {
  /** The next piece of the text. */
  add(piece: string): void;
  /** The text so far, chunked; call once. */
  finish(): ChunkedText;
}

/**
 * A builder that cuts the text made of the pieces it is given exactly as `chunkedTextOf` cuts
 * their concatenation, without building that concatenation: a chunk is a slice of one piece, or
 * joins the end of one piece to the start of the next.
 */
export function createChunkedTextBuilder(chunkTarget = CHUNK_TARGET): ChunkedTextBuilder {
  const chunks: TextChunk[] = [];
  // The start of the chunk being cut, taken from earlier pieces; it holds no line feed at or
  // after index chunkTarget - 1, where a cut would have been made.
  let carry = "";
  return {
    add(piece) {
      let at = 0;
      while (at < piece.length) {
        const lineFeed = piece.indexOf("\n", at + Math.max(0, chunkTarget - 1 - carry.length));
        if (lineFeed < 0) {
          carry += piece.slice(at);
          return;
        }
        chunks.push(chunkOf(carry + piece.slice(at, lineFeed + 1)));
        carry = "";
        at = lineFeed + 1;
      }
    },
    finish() {
      if (carry.length > 0) chunks.push(chunkOf(carry));
      carry = "";
      return assemble(chunks, chunkTarget);
    },
  };
}

/** `text` with the characters from `start` to `end` replaced by `insert` (offsets are clamped). */
export function editChunkedText(text: ChunkedText, start: number, end: number, insert: string): ChunkedText {
  const from = clamp(start, 0, text.length);
  const to = clamp(end, from, text.length);
  if (text.chunks.length === 0) return chunkedTextOf(insert, text.chunkTarget);
  const first = chunkIndexAt(text, from);
  let last = chunkIndexAt(text, to);
  // An edit that ends where a chunk starts still joins that chunk, so no chunk is left ending
  // without its line feed.
  if (last < first) last = first;
  let merged = text.chunks[first].text.slice(0, from - text.starts[first]) + insert + text.chunks[last].text.slice(to - text.starts[last]);
  // A chunk an edit leaves much shorter than the target joins the one after it.
  while ((merged.length < text.chunkTarget / 4 || !endsWithLineFeed(merged)) && last + 1 < text.chunks.length) {
    last += 1;
    merged += text.chunks[last].text;
  }
  const replacement = chunksOf(merged, text.chunkTarget);
  return assemble([...text.chunks.slice(0, first), ...replacement, ...text.chunks.slice(last + 1)], text.chunkTarget);
}

/** The whole text as one string (built on each call: callers that can, read chunk by chunk). */
export function wholeText(text: ChunkedText): string {
  if (text.chunks.length === 1) return text.chunks[0].text;
  return text.chunks.map((chunk) => chunk.text).join("");
}

/** The characters from `start` to `end`, copying only the chunks they lie in. */
export function sliceOf(text: ChunkedText, start: number, end: number): string {
  const from = clamp(start, 0, text.length);
  const to = clamp(end, from, text.length);
  if (from === to) return "";
  const first = chunkIndexAt(text, from);
  const pieces: string[] = [];
  for (let index = first; index < text.chunks.length && text.starts[index] < to; index++) {
    const chunkStart = text.starts[index];
    pieces.push(text.chunks[index].text.slice(Math.max(0, from - chunkStart), to - chunkStart));
  }
  return pieces.length === 1 ? pieces[0] : pieces.join("");
}

/** The index of the chunk holding offset `offset` (the last chunk for the text's end). */
export function chunkIndexAt(text: ChunkedText, offset: number): number {
  let low = 0;
  let high = text.chunks.length - 1;
  while (low < high) {
    const middle = (low + high + 1) >> 1;
    if (text.starts[middle] <= offset) low = middle;
    else high = middle - 1;
  }
  return low;
}

/** The line and character of `offset`, clamped to the text, as the editor's protocol counts them. */
export function positionOf(text: ChunkedText, offset: number): LineAndCharacter {
  const at = clamp(Math.floor(offset), 0, text.length);
  if (text.chunks.length === 0) return { line: 0, character: 0 };
  const index = chunkIndexAt(text, at);
  const chunk = text.chunks[index];
  const lineStarts = chunk.lineStarts();
  const local = at - text.starts[index];
  // The number of line starts at or before `local`.
  let low = 0;
  let high = lineStarts.length;
  while (low < high) {
    const middle = (low + high) >> 1;
    if (lineStarts[middle] <= local) low = middle + 1;
    else high = middle;
  }
  const lineStart = low === 0 ? 0 : lineStarts[low - 1];
  return { line: text.firstLines[index] + low, character: beforeLineBreak(chunk.text, local, lineStart) - lineStart };
}

/** The offset of a line and character, clamped as editors do (never inside a line break). */
export function offsetOf(text: ChunkedText, position: LineAndCharacter): number {
  if (position.line < 0 || text.chunks.length === 0) return 0;
  if (position.line >= text.lineCount) return text.length;
  const index = chunkIndexOfLine(text, position.line);
  const chunk = text.chunks[index];
  const lineInChunk = position.line - text.firstLines[index];
  const lineStarts = chunk.lineStarts();
  const lineStart = lineInChunk === 0 ? 0 : lineStarts[lineInChunk - 1];
  if (position.character <= 0) return text.starts[index] + lineStart;
  const nextLineStart = lineInChunk < lineStarts.length ? lineStarts[lineInChunk] : chunk.text.length;
  const local = Math.min(lineStart + Math.floor(position.character), nextLineStart);
  return text.starts[index] + beforeLineBreak(chunk.text, local, lineStart);
}

/** The last chunk starting on or before `line` (chunks after the first all start a line). */
function chunkIndexOfLine(text: ChunkedText, line: number): number {
  let low = 0;
  let high = text.chunks.length - 1;
  while (low < high) {
    const middle = (low + high + 1) >> 1;
    if (text.firstLines[middle] <= line) low = middle;
    else high = middle - 1;
  }
  return low;
}

/** Moves `local` back off any line-break characters, but not before `lineStart`. */
function beforeLineBreak(text: string, local: number, lineStart: number): number {
  let at = local;
  while (at > lineStart && isLineBreak(text.charCodeAt(at - 1))) at--;
  return at;
}

function chunksOf(text: string, target: number): TextChunk[] {
  const chunks: TextChunk[] = [];
  let start = 0;
  while (start < text.length) {
    const lineFeed = text.length - start > target ? text.indexOf("\n", start + target - 1) : -1;
    const end = lineFeed < 0 ? text.length : lineFeed + 1;
    const piece = start === 0 && end === text.length ? text : text.slice(start, end);
    chunks.push(chunkOf(piece));
    start = end;
  }
  return chunks;
}

function chunkOf(text: string): TextChunk {
  let starts: Int32Array | undefined;
  return { text, lineBreaks: countLineBreaks(text), lineStarts: () => (starts ??= lineStartsOf(text)) };
}

function countLineBreaks(text: string): number {
  if (!hasLongLines(text)) return lineStartsByLoop(text, undefined);
  // Over lines of some length indexOf runs far faster than a loop over the characters.
  let count = 0;
  for (let at = text.indexOf("\n"); at >= 0; at = text.indexOf("\n", at + 1)) count++;
  for (let at = text.indexOf("\r"); at >= 0; at = text.indexOf("\r", at + 1)) if (text.charCodeAt(at + 1) !== LF) count++;
  return count;
}

function lineStartsOf(text: string): Int32Array {
  const starts = new Int32Array(countLineBreaks(text));
  if (!hasLongLines(text) || text.indexOf("\r") >= 0) {
    lineStartsByLoop(text, starts);
    return starts;
  }
  let next = 0;
  for (let at = text.indexOf("\n"); at >= 0; at = text.indexOf("\n", at + 1)) starts[next++] = at + 1;
  return starts;
}

/** Whether the first lines average more than a few characters (a run of blank lines does not). */
function hasLongLines(text: string): boolean {
  const sample = Math.min(text.length, 1024);
  let breaks = 0;
  for (let at = text.indexOf("\n"); at >= 0 && at < sample; at = text.indexOf("\n", at + 1)) breaks++;
  return breaks * 16 < sample;
}

/** Counts line breaks one character at a time, writing the offset after each into `starts` when given. */
function lineStartsByLoop(text: string, starts: Int32Array | undefined): number {
  let count = 0;
  for (let index = 0; index < text.length; index++) {
    const code = text.charCodeAt(index);
    if (code <= CR && (code === LF || (code === CR && text.charCodeAt(index + 1) !== LF))) {
      if (starts) starts[count] = index + 1;
      count++;
    }
  }
  return count;
}

function assemble(chunks: readonly TextChunk[], chunkTarget: number): ChunkedText {
  const starts: number[] = [0];
  const firstLines: number[] = [0];
  for (const chunk of chunks) {
    starts.push(starts[starts.length - 1] + chunk.text.length);
    firstLines.push(firstLines[firstLines.length - 1] + chunk.lineBreaks);
  }
  const length = starts[starts.length - 1];
  return { chunks, starts, firstLines, length, lineCount: firstLines[firstLines.length - 1] + 1, chunkTarget };
}

function endsWithLineFeed(text: string): boolean {
  return text.charCodeAt(text.length - 1) === LF;
}

function isLineBreak(code: number): boolean {
  return code === LF || code === CR;
}

function clamp(value: number, low: number, high: number): number {
  return Math.max(low, Math.min(high, value));
}
