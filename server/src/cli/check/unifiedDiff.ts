/**
 * Unified-diff hunks for fixes, built straight from the replaced ranges (no line matching is
 * needed: every changed line is known). Lines keep their own line ends, as `diff -u` prints them,
 * so the patch applies to CRLF files too.
 */
import type { TextFix } from "../../../../shared/src/index";
import type { LineIndex } from "../documents/lineIndex";

const CONTEXT_LINES = 3;

/** Hunks of one piece of text, and the running line shift for the pieces after it. */
export interface DiffHunks {
  readonly text: string;
  /** Lines added minus lines removed so far in the file. */
  readonly lineShift: number;
}

interface ChangedSpan {
  firstLine: number;
  lastLine: number;
  fixes: TextFix[];
}

/**
 * Hunks for `fixes` (in order, not overlapping, offsets into `text`). `lines` indexes `text`
 * with document line numbers; `lineShift` carries over from earlier pieces of the same file.
 */
export function diffHunks(text: string, lines: LineIndex, fixes: readonly TextFix[], lineShift = 0): DiffHunks {
  if (fixes.length === 0) return { text: "", lineShift };
  const starts = lines.lineStarts;
  const lineCount = text.length === 0 ? 0 : starts[starts.length - 1] === text.length ? starts.length - 1 : starts.length;
  const firstLineNumber = lines.position(0).line;
  const lineOf = (offset: number): number => Math.min(lines.position(offset).line - firstLineNumber, lineCount - 1);
  const lineStart = (line: number): number => starts[line];
  const lineEnd = (line: number): number => (line + 1 < starts.length ? starts[line + 1] : text.length);

  // Fixes on the same or touching lines change one span of lines together.
  const spans: ChangedSpan[] = [];
  for (const fix of fixes) {
    const firstLine = lineOf(fix.range.start);
    const lastLine = lineOf(fix.range.end);
    const previous = spans[spans.length - 1];
    if (previous && firstLine <= previous.lastLine) {
      previous.lastLine = Math.max(previous.lastLine, lastLine);
      previous.fixes.push(fix);
    } else {
      spans.push({ firstLine, lastLine, fixes: [fix] });
    }
  }

  const output: string[] = [];
  let shift = lineShift;
  let index = 0;
  while (index < spans.length) {
    // Spans closer than twice the context share a hunk.
    let last = index;
    while (last + 1 < spans.length && spans[last + 1].firstLine - spans[last].lastLine - 1 <= 2 * CONTEXT_LINES) last++;
    const from = Math.max(0, spans[index].firstLine - CONTEXT_LINES);
    const to = Math.min(lineCount - 1, spans[last].lastLine + CONTEXT_LINES);
    const body: string[] = [];
    let oldCount = 0;
    let newCount = 0;
    let line = from;
    for (let spanIndex = index; spanIndex <= last; spanIndex++) {
      const span = spans[spanIndex];
      for (; line < span.firstLine; line++, oldCount++, newCount++) body.push(diffLine(" ", text.slice(lineStart(line), lineEnd(line))));
      const oldText = text.slice(lineStart(span.firstLine), lineEnd(span.lastLine));
      const newText = replaced(oldText, lineStart(span.firstLine), span.fixes);
      for (const oldLine of splitLines(oldText)) {
        body.push(diffLine("-", oldLine));
        oldCount++;
      }
      for (const newLine of splitLines(newText)) {
        body.push(diffLine("+", newLine));
        newCount++;
      }
      line = span.lastLine + 1;
    }
    for (; line <= to; line++, oldCount++, newCount++) body.push(diffLine(" ", text.slice(lineStart(line), lineEnd(line))));
    const oldStart = firstLineNumber + from;
    output.push(`@@ -${oldStart},${oldCount} +${oldStart + shift},${newCount} @@\n`, ...body);
    shift += newCount - oldCount;
    index = last + 1;
  }
  return { text: output.join(""), lineShift: shift };
}

/** The file header that opens a file's hunks. */
export function diffHeader(displayPath: string): string {
  return `--- a/${displayPath}\n+++ b/${displayPath}\n`;
}

function replaced(oldText: string, base: number, fixes: readonly TextFix[]): string {
  const pieces: string[] = [];
  let copied = 0;
  for (const fix of fixes) {
    pieces.push(oldText.slice(copied, fix.range.start - base), fix.newText);
    copied = fix.range.end - base;
  }
  pieces.push(oldText.slice(copied));
  return pieces.join("");
}

/** Lines with their own line ends (LF, CRLF or CR); no empty line after a final line end. */
function splitLines(text: string): string[] {
  const found = text.match(/[^\r\n]*(?:\r\n|\r|\n)|[^\r\n]+$/g);
  return found ?? [];
}

function diffLine(marker: string, line: string): string {
  if (line.endsWith("\n")) return marker + line;
  // A lone CR still needs a LF for the diff to stay line-based.
  if (line.endsWith("\r")) return `${marker}${line}\n`;
  return `${marker}${line}\n\\ No newline at end of file\n`;
}
