/**
 * Markdown structure around the prose scanner: front matter (keys skipped, values scanned), fenced
 * code (skipped, except ```chem and ```mhchem fences, read as mhchem), HTML comments (skipped),
 * pipe tables (records when a column names species), and everything else scanned as prose.
 */
import type { TextRange } from "../chemistry/types";
import { isDelimiterRow, scanMarkdownTable } from "./markdownTable";
import { scanMhchemBody } from "./mhchemSpan";
import { scanProse } from "./scanProse";
import type { SpeciesReader } from "./speciesReader";
import type { RecordSink } from "./tables/records";

const CHEMISTRY_FENCES = new Set(["chem", "mhchem", "ce"]);

/** Scans a whole markdown document into `sink`. */
export function scanMarkdown(text: string, read: SpeciesReader, sink: RecordSink): void {
  const comments = commentRanges(text);
  let commentIndex = 0;
  let position = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  position = frontMatter(text, position, read, sink);
  let paragraphStart = -1;
  let paragraphEnd = -1;
  const flush = (): void => {
    if (paragraphStart >= 0) scanProse(text, paragraphStart, paragraphEnd, sink, read);
    paragraphStart = -1;
  };

  while (position < text.length) {
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
      position = fencedBlock(text, next, fence[1], CHEMISTRY_FENCES.has(fence[2].toLowerCase()), read, sink);
      continue;
    }
    if (line.includes("|") && next < text.length && isDelimiterRow(text, next, endOfLine(text, next))) {
      flush();
      position = table(text, position, read, sink);
      continue;
    }
    if (/^ {0,3}#{1,6}(?:\s|$)/.test(line)) {
      flush();
      scanProse(text, position, lineEnd, sink, read);
      position = next;
      continue;
    }
    if (paragraphStart < 0) paragraphStart = position;
    paragraphEnd = lineEnd;
    position = next;
  }
  flush();
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

/** YAML front matter at the very top: scan values, skip keys. Returns where the body starts. */
function frontMatter(text: string, start: number, read: SpeciesReader, sink: RecordSink): number {
  const firstEnd = endOfLine(text, start);
  if (text.slice(start, firstEnd).trimEnd() !== "---") return start;
  let position = firstEnd + 1;
  const values: TextRange[] = [];
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, lineEnd);
    if (/^(?:---|\.\.\.)\s*$/.test(line)) {
      for (const value of values) scanProse(text, value.start, value.end, sink, read);
      return lineEnd + 1;
    }
    // "key: value", "- value", "  - key: value"; comments and keys stay unscanned.
    const entry = /^(\s*(?:-\s+)?)(?:([^:#\s][^:#]*):(?=\s|$))?\s*/.exec(line)!;
    const valueStart = position + entry[0].length;
    const hash = line.search(/\s#/);
    const valueEnd = hash >= 0 && position + hash >= valueStart ? position + hash : lineEnd;
    if (!line.trimStart().startsWith("#") && valueEnd > valueStart) values.push({ start: valueStart, end: valueEnd });
    position = lineEnd + 1;
  }
  // No closing line: this was not front matter after all.
  return start;
}

/** Skips (or, for chemistry fences, reads) a fenced block; returns the position after it. */
function fencedBlock(text: string, start: number, fence: string, chemistry: boolean, read: SpeciesReader, sink: RecordSink): number {
  const marker = fence[0];
  let position = start;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, Math.min(lineEnd, position + 200));
    const closing = /^ {0,3}(`{3,}|~{3,})\s*$/.exec(line);
    if (closing && closing[1][0] === marker && closing[1].length >= fence.length) return lineEnd + 1;
    if (chemistry) scanMhchemBody(text, position, lineEnd, read, sink);
    position = lineEnd + 1;
  }
  return text.length;
}

/** A pipe table starting at `start`; returns the position after its last line. */
function table(text: string, start: number, read: SpeciesReader, sink: RecordSink): number {
  const lines: TextRange[] = [];
  let position = start;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, lineEnd);
    if (lines.length >= 2 && (line.trim().length === 0 || !line.includes("|"))) break;
    lines.push({ start: position, end: lineEnd });
    position = lineEnd + 1;
  }
  scanMarkdownTable(text, lines, read, sink);
  return Math.min(position, text.length);
}
