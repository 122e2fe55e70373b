/**
 * Markdown structure around the prose scanner: front matter (keys skipped, values scanned), fenced
 * code (skipped, except ```chem and ```mhchem fences, read as mhchem), HTML comments (skipped),
 * pipe tables (records when a column names species), and everything else scanned as prose.
 */
import type { TextRange } from "../chemistry/types";
import { isDelimiterRow, markdownTableSteps } from "./markdownTable";
import { scanMhchemBody } from "./mhchemSpan";
import { proseSteps, scanProse } from "./scanProse";
import type { ScanSteps, SpeciesReader } from "./speciesReader";
import type { RecordSink } from "./tables/records";

const CHEMISTRY_FENCES = new Set(["chem", "mhchem", "ce"]);

/** A top-level piece of a markdown document, scanned on its own (see `scanMarkdownBlock`). */
export type MarkdownBlock =
  | { readonly kind: "prose"; readonly start: number; readonly end: number }
  | { readonly kind: "frontMatter"; readonly start: number; readonly end: number; readonly values: readonly TextRange[] }
  | {
      readonly kind: "fence";
      readonly start: number;
      readonly end: number;
      readonly bodyStart: number;
      readonly bodyEnd: number;
      readonly chemistry: boolean;
    }
  | { readonly kind: "table"; readonly start: number; readonly end: number; readonly lines: readonly TextRange[] };

/** Scans a whole markdown document into `sink`. */
export function scanMarkdown(text: string, read: SpeciesReader, sink: RecordSink): void {
  for (const block of markdownBlocks(text)) scanMarkdownBlock(text, block, read, sink);
}

/**
 * `scanMarkdown` that pauses whenever `sink` holds at least `pauseAt` items, at a point where
 * nothing found later starts before the offset it yields (see `ScanSteps`).
 */
export function* markdownSteps(text: string, read: SpeciesReader, sink: RecordSink, pauseAt: number): ScanSteps {
  for (const block of markdownBlocks(text)) {
    if (sink.occurrences.length + sink.unreadable.length + sink.records.length >= pauseAt) yield block.start;
    yield* markdownBlockSteps(text, block, read, sink, pauseAt);
  }
}

/**
 * The blocks of a markdown document in order: front matter, paragraphs and headings (prose),
 * fenced blocks and pipe tables. Cheap: nothing is read as chemistry here. What a block yields
 * depends on its own text and the rest of the lines it starts and ends on.
 */
export function markdownBlocks(text: string, options: MarkdownBlockOptions = {}): MarkdownBlock[] {
  return [...markdownBlockStream(text, options)];
}

/** Where a split of markdown text starts. */
export interface MarkdownBlockOptions {
  /**
   * False when `text` is a stretch of a document that starts where a block of the whole
   * document starts: no byte order mark or front matter is looked for (default true).
   */
  readonly atDocumentStart?: boolean;
}

/**
 * `markdownBlocks` one block at a time. Split from a block's start, the text after it yields the
 * blocks a split of the whole document yields there: the split keeps no state across a block start.
 */
export function* markdownBlockStream(text: string, options: MarkdownBlockOptions = {}): Generator<MarkdownBlock, void, void> {
  const atDocumentStart = options.atDocumentStart ?? true;
  const comments = commentRanges(text);
  let commentIndex = 0;
  let position = atDocumentStart && text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const front = atDocumentStart ? frontMatter(text, position) : undefined;
  if (front) {
    yield front;
    position = front.end;
  }
  let paragraphStart = -1;
  let paragraphEnd = -1;
  const blocks: MarkdownBlock[] = [];
  const flush = (): void => {
    if (paragraphStart >= 0) blocks.push({ kind: "prose", start: paragraphStart, end: paragraphEnd });
    paragraphStart = -1;
  };

  while (position < text.length) {
    if (blocks.length > 0) yield* blocks.splice(0, blocks.length);
    while (commentIndex < comments.length && comments[commentIndex].end <= position) commentIndex++;
    const comment = comments[commentIndex];
    if (comment && comment.start <= position) {
      flush();
      position = comment.end;
      continue;
    }
    const lineEnd = endOfLine(text, position);
    const next = lineEnd + 1;
    const line = text.slice(position, Math.min(lineEnd, position + 200));
    if (line.trim().length === 0) {
      flush();
      position = next;
      continue;
    }
    const fence = /^ {0,3}(`{3,}|~{3,})\s*([^\s`]*)/.exec(line);
    if (fence) {
      flush();
      const block = fencedBlock(text, position, next, fence[1], CHEMISTRY_FENCES.has(fence[2].toLowerCase()));
      blocks.push(block);
      position = block.end;
      continue;
    }
    if (line.includes("|") && next < text.length && isDelimiterRow(text, next, endOfLine(text, next))) {
      flush();
      const block = table(text, position);
      blocks.push(block);
      position = block.end;
      continue;
    }
    if (/^ {0,3}#{1,6}(?:\s|$)/.test(line)) {
      flush();
      blocks.push({ kind: "prose", start: position, end: lineEnd });
      position = next;
      continue;
    }
    if (paragraphStart < 0) paragraphStart = position;
    paragraphEnd = lineEnd;
    position = next;
  }
  flush();
  yield* blocks;
}

/** Scans one block of `text` (found by `markdownBlocks`) into `sink`, with offsets into `text`. */
export function scanMarkdownBlock(text: string, block: MarkdownBlock, read: SpeciesReader, sink: RecordSink): void {
  for (const _ of markdownBlockSteps(text, block, read, sink, Infinity));
}

/** `scanMarkdownBlock` that pauses whenever `sink` holds at least `pauseAt` items (see `ScanSteps`). */
function* markdownBlockSteps(text: string, block: MarkdownBlock, read: SpeciesReader, sink: RecordSink, pauseAt: number): ScanSteps {
  switch (block.kind) {
    case "prose":
      yield* proseSteps(text, block.start, block.end, sink, read, pauseAt);
      return;
    case "frontMatter":
      for (const value of block.values) scanProse(text, value.start, value.end, sink, read);
      return;
    case "fence": {
      if (!block.chemistry) return;
      let position = block.bodyStart;
      while (position < block.bodyEnd) {
        if (sink.occurrences.length + sink.unreadable.length >= pauseAt) yield position;
        const lineEnd = endOfLine(text, position);
        scanMhchemBody(text, position, lineEnd, read, sink);
        position = lineEnd + 1;
      }
      return;
    }
    case "table":
      yield* markdownTableSteps(text, block.lines, read, sink, pauseAt);
  }
}

function endOfLine(text: string, position: number): number {
  const end = text.indexOf("\n", position);
  return end < 0 ? text.length : end;
}

/** Every `<!-- ... -->`, found in one pass; an unclosed comment runs to the end. */
function commentRanges(text: string): TextRange[] {
  const ranges: TextRange[] = [];
  let open = text.indexOf("<!--");
  while (open >= 0) {
    const close = text.indexOf("-->", open + 4);
    if (close < 0) {
      ranges.push({ start: open, end: text.length });
      break;
    }
    ranges.push({ start: open, end: close + 3 });
    open = text.indexOf("<!--", close + 3);
  }
  return ranges;
}

/** YAML front matter at the very top, with the ranges of its values (keys are skipped). */
function frontMatter(text: string, start: number): MarkdownBlock | undefined {
  const firstEnd = endOfLine(text, start);
  if (text.slice(start, firstEnd).trimEnd() !== "---") return undefined;
  let position = firstEnd + 1;
  const values: TextRange[] = [];
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, lineEnd);
    if (/^(?:---|\.\.\.)\s*$/.test(line)) return { kind: "frontMatter", start, end: lineEnd + 1, values };
    // "key: value", "- value", "  - key: value"; comments and keys stay unscanned.
    const entry = /^(\s*(?:-\s+)?)(?:([^:#\s][^:#]*):(?=\s|$))?\s*/.exec(line)!;
    const valueStart = position + entry[0].length;
    const hash = line.search(/\s#/);
    const valueEnd = hash >= 0 && position + hash >= valueStart ? position + hash : lineEnd;
    if (!line.trimStart().startsWith("#") && valueEnd > valueStart) values.push({ start: valueStart, end: valueEnd });
    position = lineEnd + 1;
  }
  // No closing line: this was not front matter after all.
  return undefined;
}

/** A fenced block whose opening line starts at `start`; its body starts at `bodyStart`. */
function fencedBlock(text: string, start: number, bodyStart: number, fence: string, chemistry: boolean): MarkdownBlock {
  const marker = fence[0];
  let position = bodyStart;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, Math.min(lineEnd, position + 200));
    const closing = /^ {0,3}(`{3,}|~{3,})\s*$/.exec(line);
    if (closing && closing[1][0] === marker && closing[1].length >= fence.length)
      return { kind: "fence", start, end: lineEnd + 1, bodyStart, bodyEnd: position, chemistry };
    position = lineEnd + 1;
  }
  return { kind: "fence", start, end: text.length, bodyStart, bodyEnd: text.length, chemistry };
}

/** A pipe table starting at `start`, line by line. */
function table(text: string, start: number): MarkdownBlock {
  const lines: TextRange[] = [];
  let position = start;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, lineEnd);
    if (lines.length >= 2 && (line.trim().length === 0 || !line.includes("|"))) break;
    lines.push({ start: position, end: lineEnd });
    position = lineEnd + 1;
  }
  return { kind: "table", start, end: Math.min(position, text.length), lines };
}
