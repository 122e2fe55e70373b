/**
 * Plain text, with the one structure plain-text markup shares: reStructuredText literal blocks.
 * A code directive (".. code-block:: python") or a line ending in "::" ("Example::") opens an
 * indented block of code, skipped; a ".. math::" block is read as LaTeX math. Everything else,
 * the content of other directives (".. note::") included, is prose. LaTeX source kept as plain
 * text skips its verbatim environments the same way.
 */
import { verbatimBlockEnd } from "./latexCommands";
import { scanLatexMath } from "./latexMathSpan";
import { proseSteps } from "./scanProse";
import type { ScanSink, ScanSteps, SpeciesReader } from "./speciesReader";

/** Directives whose indented content is code or math, not prose (a ".. note::" holds prose). */
const CODE_DIRECTIVES: ReadonlySet<string> = new Set([
  "code-block",
  "code",
  "sourcecode",
  "literalinclude",
  "highlight",
  "doctest",
  "testcode",
  "testoutput",
  "prompt",
  "ipython",
  "math",
]);

/** Scans a whole plain-text document into `sink`. */
export function scanPlainText(text: string, read: SpeciesReader, sink: ScanSink): void {
  for (const _ of plainTextSteps(text, read, sink, Infinity));
}

/** `scanPlainText` that pauses whenever `sink` holds at least `pauseAt` items (see `ScanSteps`). */
export function* plainTextSteps(text: string, read: SpeciesReader, sink: ScanSink, pauseAt: number): ScanSteps {
  let proseStart = 0;
  let position = 0;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, Math.min(lineEnd, position + 200)).trimEnd();
    // LaTeX source: "\begin{verbatim}" ... "\end{verbatim}" is code.
    const verbatimEnd = line.includes("\\begin{") ? verbatimBlockEnd(text, position, lineEnd) : position;
    if (verbatimEnd > position) {
      yield* proseSteps(text, proseStart, position, sink, read, pauseAt);
      proseStart = verbatimEnd;
      position = verbatimEnd;
      continue;
    }
    const directive = /^\s*\.\.\s+([a-z-]+)::/.exec(line);
    const literal = directive ? CODE_DIRECTIVES.has(directive[1]) : line.endsWith("::") && !/^\s*::$/.test(line);
    if (literal && line.length < 200) {
      const blockStart = lineEnd + 1;
      const blockEnd = indentedBlockEnd(text, blockStart, indentOf(line));
      if (blockEnd > blockStart) {
        // The opening line's own text ("Run it like this::") is still prose.
        yield* proseSteps(text, proseStart, lineEnd, sink, read, pauseAt);
        if (/^\s*\.\.\s+math::/.test(line)) scanMathLines(text, blockStart, blockEnd, read, sink);
        proseStart = blockEnd;
        position = blockEnd;
        continue;
      }
    }
    position = lineEnd + 1;
  }
  yield* proseSteps(text, proseStart, text.length, sink, read, pauseAt);
}

function endOfLine(text: string, position: number): number {
  const end = text.indexOf("\n", position);
  return end < 0 ? text.length : end;
}

function indentOf(line: string): number {
  return line.length - line.trimStart().length;
}

/** Where the block indented deeper than `indent` that starts at `start` (after blank lines) ends. */
function indentedBlockEnd(text: string, start: number, indent: number): number {
  let position = start;
  let end = start;
  let sawContent = false;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, lineEnd);
    if (line.trim().length === 0) {
      position = lineEnd + 1;
      continue;
    }
    if (indentOf(line) <= indent) break;
    sawContent = true;
    end = Math.min(text.length, lineEnd + 1);
    position = lineEnd + 1;
  }
  return sawContent ? end : start;
}

/** Each line of a math block, read as LaTeX math (directive options such as ":label:" skipped). */
function scanMathLines(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): void {
  let position = start;
  while (position < end) {
    const lineEnd = Math.min(endOfLine(text, position), end);
    if (!/^\s*:[a-z-]+:/.test(text.slice(position, lineEnd))) scanLatexMath(text, position, lineEnd, read, sink);
    position = lineEnd + 1;
  }
}
