/**
 * The blocks of text markup that are not prose: code and listings, comments, and math, as each
 * markup language marks them off line by line. The cut into units (`plainTextUnits`) asks at
 * each line whether a block opens there; whatever it is not told is a block is prose.
 *
 * - Plain text: reStructuredText literal blocks and LaTeX verbatim environments, as they turn up
 *   in notes kept as .txt.
 * - LaTeX: verbatim-like environments (`verbatim`, `lstlisting`, `minted`, `comment`), and text
 *   hidden by `\iffalse ... \fi` (a line that opens it, to its `\fi` or `\else`).
 * - AsciiDoc: listing (`----`), literal (`....`), comment (`////`) and passthrough (`++++`)
 *   blocks; a `[source]`, `[listing]`, `[literal]` or `[asciimath]` paragraph; a `[stem]` or
 *   `[latexmath]` block or paragraph, read as math; a literal paragraph (its first
 *   line indented); block macros (`image::...[]`, `include::...[]`).
 * - reStructuredText: literal blocks (`::` and its indented block), doctest blocks (a paragraph
 *   that starts with ">>> "), code directives, comments
 *   (`..` and its indented block, and a `.. comment::` "directive"), hyperlink targets and
 *   substitution definitions, and the option lines of every directive (`:class:`, `:name:`,
 *   `:file:`: keys and paths, not words); the heading of a directive that names a file, a key or
 *   a condition. The content of other directives is prose: a `.. note::`, and the conditional
 *   text of `.. only::` and `.. ifconfig::`, which is still text the writer wrote.
 *
 * Comments and verbatim spans inside a line (`% ...` and `\verb|...|` in LaTeX, `// ...` in
 * AsciiDoc) are blanked in a paragraph's text instead (`readableProse`), so that offsets hold;
 * so are AsciiDoc's ids, attribute names and link targets, and reStructuredText's substitution
 * references.
 */
import { falseConditionalEnd, verbatimBlockEnd } from "./latexCommands";
import type { TextMarkup } from "./types";

/** A block that is not prose, with offsets from the text's start; `end` is just past its last line break. */
export interface MarkupBlock {
  readonly kind: "code" | "math";
  readonly start: number;
  readonly end: number;
}

/** The line being looked at by the cut: its start, end (at the line feed) and text (trimmed at its end, at most 200 characters). */
export interface MarkupLine {
  readonly start: number;
  readonly end: number;
  readonly text: string;
  /** Whether a paragraph is open: the line is not the first after a blank line or a block. */
  readonly inParagraph: boolean;
}

/**
 * The block that opens on `line` of `text`, if any. A block may start after the line (a line
 * ending in "::" is prose, the block after it is not); the cut ends the paragraph there.
 */
export function markupBlockAt(text: string, line: MarkupLine, markup: TextMarkup): MarkupBlock | undefined {
  switch (markup) {
    case "plaintext":
      return verbatimBlock(text, line) ?? literalBlock(text, line, false);
    case "latex":
      return verbatimBlock(text, line) ?? falseConditionalBlock(text, line);
    case "asciidoc":
      return asciidocBlock(text, line);
    case "restructuredtext":
      return rstExplicitBlock(text, line) ?? literalBlock(text, line, true) ?? doctestBlock(text, line);
  }
}

// ---------------------------------------------------------------------------------------------
// LaTeX

function verbatimBlock(text: string, line: MarkupLine): MarkupBlock | undefined {
  if (!line.text.includes("\\begin{")) return undefined;
  const end = verbatimBlockEnd(text, line.start, line.end);
  return end > line.start ? { kind: "code", start: line.start, end } : undefined;
}

/**
 * `\iffalse` to its `\fi`: TeX skips it, so it is a comment. The block ends with the line of its
 * `\fi` (or `\else`), or just after it when the line goes on ("\fi\ SF6 is then ...").
 */
function falseConditionalBlock(text: string, line: MarkupLine): MarkupBlock | undefined {
  if (!line.text.includes("\\iffalse")) return undefined;
  const close = falseConditionalEnd(text, line.start, line.end);
  if (close <= line.start) return undefined;
  const closeLineEnd = endOfLine(text, close);
  const restOfLine = text.slice(close, Math.min(closeLineEnd, close + 200));
  const end = restOfLine.trim().length === 0 && closeLineEnd - close <= 200 ? Math.min(text.length, closeLineEnd + 1) : close;
  return { kind: "code", start: line.start, end };
}

// ---------------------------------------------------------------------------------------------
// reStructuredText

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

/**
 * Directives whose content is markup for another program or a list of files, skipped in a
 * reStructuredText document; and "comment", which is no directive at all (docutils reports it as
 * unknown and prints nothing of it), but what writers type when they mean a comment.
 */
const RAW_DIRECTIVES: ReadonlySet<string> = new Set(["raw", "graphviz", "digraph", "toctree", "comment"]);

/**
 * Directives whose heading names a file, a key or a condition, not words (a figure's caption
 * below is prose, and so is the conditional text of `only` and `ifconfig`).
 */
const PATH_DIRECTIVES: ReadonlySet<string> = new Set([
  "image",
  "figure",
  "include",
  "contents",
  "sectnum",
  "index",
  "bibliography",
  "only",
  "ifconfig",
]);

/**
 * A literal block: a line ending in "::" (or a code directive) and the block indented deeper
 * after it. The opening line's own text ("Run it like this::") is still prose. A lone "::" opens
 * one only in reStructuredText itself (in other plain text it is too often something else).
 */
function literalBlock(text: string, line: MarkupLine, loneMarker: boolean): MarkupBlock | undefined {
  if (line.text.length >= 200) return undefined;
  const directive = /^\s*\.\.\s+([a-z-]+)::/.exec(line.text);
  const literal = directive ? CODE_DIRECTIVES.has(directive[1]) : line.text.endsWith("::") && (loneMarker || !/^\s*::$/.test(line.text));
  if (!literal) return undefined;
  const next = Math.min(text.length, line.end + 1);
  const blockEnd = indentedBlockEnd(text, next, indentOf(line.text));
  if (blockEnd <= next) return undefined;
  return { kind: /^\s*\.\.\s+math::/.test(line.text) ? "math" : "code", start: next, end: blockEnd };
}

/**
 * Explicit markup that is not prose, at a paragraph's start: a comment (".." and anything but a
 * directive, footnote or citation), a hyperlink target (".. _name:") or a substitution
 * definition, with the block indented under it; a raw directive with its content; the heading and
 * option lines of a directive that names a file; the option lines of any other directive (its
 * heading, a title, is prose).
 */
function rstExplicitBlock(text: string, line: MarkupLine): MarkupBlock | undefined {
  if (line.inParagraph || line.text.length >= 200) return undefined;
  const explicit = /^(\s*)\.\.(?:\s+(.*))?$/.exec(line.text);
  if (!explicit) return undefined;
  const rest = explicit[2] ?? "";
  const next = Math.min(text.length, line.end + 1);
  const indent = explicit[1].length;
  // A footnote or citation is prose.
  if (rest.startsWith("[")) return undefined;
  const directive = /^(?:\|[^|]+\|\s+)?([A-Za-z][\w-]*(?::[\w-]+)?)::(?:\s|$)/.exec(rest);
  if (directive && !rest.startsWith("|")) {
    const name = directive[1].toLowerCase();
    if (PATH_DIRECTIVES.has(name) || name.includes(":") || name.startsWith("auto"))
      return { kind: "code", start: line.start, end: optionLinesEnd(text, next, indent) };
    // A code directive's block is `literalBlock`'s (its options are read there).
    if (CODE_DIRECTIVES.has(name)) return undefined;
    // An admonition's heading and content are prose; its options (":class: CH5-banner") are not.
    if (!RAW_DIRECTIVES.has(name)) {
      const optionsEnd = optionLinesEnd(text, next, indent);
      return optionsEnd > next ? { kind: "code", start: next, end: optionsEnd } : undefined;
    }
  }
  // An empty comment ("..", then a blank line) holds nothing: an indented block after it is a quotation.
  if (rest.length === 0 && text.slice(next, endOfLine(text, next)).trim().length === 0)
    return { kind: "code", start: line.start, end: next };
  // A comment, a target, a substitution definition or a raw directive: the whole indented block.
  return { kind: "code", start: line.start, end: Math.max(next, indentedBlockEnd(text, next, indent)) };
}

/** A doctest block: a paragraph whose first line starts with ">>> ", a Python session, to its blank line. */
function doctestBlock(text: string, line: MarkupLine): MarkupBlock | undefined {
  if (line.inParagraph || !/^\s*>>>(?:\s|$)/.test(line.text)) return undefined;
  return { kind: "code", start: line.start, end: paragraphEnd(text, line.start) };
}

/**
 * Past the option lines (":name: value", indented) that follow a directive's heading at `start`.
 * A name is followed by white space: content that opens with a role (":math:`...`") is no option.
 */
function optionLinesEnd(text: string, start: number, indent: number): number {
  let position = start;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const line = text.slice(position, lineEnd);
    if (indentOf(line) <= indent || !/^\s*:[\w-]+:(?:\s|$)/.test(line)) break;
    position = Math.min(text.length, lineEnd + 1);
  }
  return position;
}

// ---------------------------------------------------------------------------------------------
// AsciiDoc

/** A delimiter line of a block that is not prose: listing, literal, comment, passthrough. */
const ASCIIDOC_DELIMITER = /^(-{4,}|\.{4,}|\/{4,}|\+{4,})$/;
/** A block style that makes the next block code (AsciiMath is a notation we do not read). */
const ASCIIDOC_CODE_STYLE = /^\[\s*(?:source|listing|literal|asciimath)\s*(?:[,#.%][^\]]*)?\]$/;
/** A block style that makes the next block LaTeX math, where mhchem's `\ce{...}` works as in text. */
const ASCIIDOC_MATH_STYLE = /^\[\s*(?:stem|latexmath)\s*(?:[,#.%][^\]]*)?\]$/;
/** A list item, which may be indented: `* NF3`, `. purge`, `1. purge`, `a. purge`, `- NF3`. */
const ASCIIDOC_LIST_ITEM = /^[ \t]*(?:\*{1,5}|\.{1,5}|-|\d+\.|[a-zA-Z]\.)[ \t]+\S/;
/** A block macro such as `image::diagram.png[]` or `include::chapter.adoc[]`. */
const ASCIIDOC_BLOCK_MACRO = /^[a-z][a-z0-9_-]*::\S*\[.*\]$/;

function asciidocBlock(text: string, line: MarkupLine): MarkupBlock | undefined {
  if (line.text.length >= 200) return undefined;
  const next = Math.min(text.length, line.end + 1);
  if (ASCIIDOC_DELIMITER.test(line.text)) return { kind: "code", start: line.start, end: delimitedBlockEnd(text, next, line.text) };
  if (ASCIIDOC_BLOCK_MACRO.test(line.text)) return { kind: "code", start: line.start, end: next };
  const math = ASCIIDOC_MATH_STYLE.test(line.text);
  if (math || ASCIIDOC_CODE_STYLE.test(line.text)) {
    // The style line with the block after it: a delimited block, or else a paragraph.
    const following = text.slice(next, Math.min(endOfLine(text, next), next + 200)).trimEnd();
    if (following.length === 0) return undefined;
    const end = ASCIIDOC_DELIMITER.test(following)
      ? delimitedBlockEnd(text, Math.min(text.length, endOfLine(text, next) + 1), following)
      : paragraphEnd(text, next);
    return { kind: math ? "math" : "code", start: line.start, end };
  }
  // A literal paragraph: its first line indented (an indented list item is still a list item).
  if (!line.inParagraph && /^[ \t]+\S/.test(line.text) && !ASCIIDOC_LIST_ITEM.test(line.text))
    return { kind: "code", start: line.start, end: paragraphEnd(text, line.start) };
  return undefined;
}

/** Past the line that closes the block opened by `delimiter` (the same line again), or the text's end. */
function delimitedBlockEnd(text: string, start: number, delimiter: string): number {
  let position = start;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const next = Math.min(text.length, lineEnd + 1);
    if (lineEnd - position < 200 + delimiter.length && text.slice(position, lineEnd).trimEnd() === delimiter) return next;
    position = next;
  }
  return text.length;
}

/** Past the last line of the paragraph holding `start` (up to a blank line or the text's end). */
function paragraphEnd(text: string, start: number): number {
  let position = start;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    if (text.slice(position, lineEnd).trim().length === 0) return position;
    position = Math.min(text.length, lineEnd + 1);
  }
  return text.length;
}

// ---------------------------------------------------------------------------------------------
// Inside a paragraph

/**
 * A paragraph's text as the prose reader should see it: comments and verbatim spans of the
 * markup replaced by spaces (line breaks kept), so that every offset still holds.
 */
export function readableProse(source: string, markup: TextMarkup): string {
  switch (markup) {
    case "latex":
      return source.includes("%") || source.includes("\\verb") || source.includes("inline") || source.includes("\\iffalse")
        ? source.replace(LATEX_HIDDEN, (hidden: string, escapes: string | undefined) => {
            if (ADDRESS.test(hidden)) return hidden;
            const kept = escapes?.length ?? 0;
            return hidden.slice(0, kept) + blank(hidden.slice(kept));
          })
        : source;
    case "asciidoc":
      return /\/\/|\[|\{|<<|:/.test(source) ? source.replace(ASCIIDOC_NOT_WORDS, asciidocNotWords) : source;
    case "restructuredtext":
      return source.includes("|") ? source.replace(RST_SUBSTITUTION_REFERENCE, blank) : source;
    default:
      return source;
  }
}

/**
 * A LaTeX comment (a "%" after an even number of backslashes, to the line's end), `\verb|...|`
 * (any delimiter), `\lstinline|...|` or `\lstinline{...}`, and `\mintinline{lang}{...}`. The
 * first group keeps the backslashes before a "%" ("\\" is a line break, then the comment).
 * `\iffalse ... \fi` (or `\else`) within one line is hidden too (a block of them is `falseConditionalBlock`'s),
 * unless it is what a switch is set to (`\let\ifdraft\iffalse`). An address in `\url{...}` or
 * `\href{...}` is matched only to be kept: a "%" in it ("a%20b") is part of the address, not a
 * comment (common practice: the URL commands read their argument as typed).
 */
const LATEX_HIDDEN =
  /(?<!\\)((?:\\\\)*)%.*$|(?<!\\let\s*\\[a-zA-Z@]+\s*=?\s*)\\iffalse(?![a-zA-Z@])[^\n]*?\\(?:fi|else)(?![a-zA-Z@])|\\(?:url|nolinkurl|href(?:\[[^\]\n]*\])?)\{[^}\n]*\}|\\(?:verb\*?|lstinline(?:\[[^\]\n]*\])?)(?:\{[^}\n]*\}|([^\sa-zA-Z{*])[^\n]*?\2)|\\mintinline(?:\[[^\]\n]*\])?\{[^}\n]*\}(?:\{[^}\n]*\}|([^\sa-zA-Z{])[^\n]*?\3)/gm;

/**
 * What an AsciiDoc paragraph holds that is not words, though it is typed among them (from memory:
 * AsciiDoc language documentation): a `//` comment line; a block attribute line (`[role=CH5]`,
 * `[[SO2-table]]`, `[#NF3-row]`), which styles the block and is not shown; an inline anchor
 * (`[[SO2-table]]`); a cross reference's target (`<<SO2-table,the SO2 table>>`: the text after the
 * comma is shown, so it stays); an attribute reference (`{hf-note}`: its value is read where it is
 * set) and an attribute entry's name (`:hf-note: see the HF kit`: the value is words); the target of
 * a link, cross reference or image macro (`link:logs/NO2.pdf[the log]`); keyboard, button and
 * passthrough macros (`kbd:[Ctrl+S]`, `pass:[...]`).
 */
const ASCIIDOC_NOT_WORDS =
  /^\/\/(?!\/).*$|^\[\[[^\]\n]{1,200}\]\]$|^\[[^[\]\n]{1,200}\]$|\[\[[\w:.-]{1,100}(?:,[^\]\n]{0,100})?\]\]|<<[^>,\n]{1,100}(?:,|>>)|(?<=<<[^>,\n]{1,100},[^>\n]{0,200})>>|(?<![\w\\}^_])\{[A-Za-z0-9_][\w-]{0,60}\}|^:!?[\w-]{1,60}!?:|\b(?:link|xref|image|mailto):[^\s[]{1,300}(?=\[)|\b(?:kbd|btn|pass)(?::[a-z,]{0,20})?:\[[^\]\n]{0,200}\]/gm;

function asciidocNotWords(hidden: string): string {
  return blank(hidden);
}

/**
 * A reStructuredText substitution reference (`|SO2|`, `|kr-logo|_`): a name that a definition
 * elsewhere replaces, not the text itself. Bars
 * with a space inside (`| NF3 |`, a grid table's cell or a line block) are not one.
 */
const RST_SUBSTITUTION_REFERENCE = /(?<![^\s'"([{<\-/:])\|(?=\S)[^|\n]{0,100}?(?<=\S)\|(?:__?)?(?![^\s'")\]}>\-/:.,;!?\\])/g;

/** The start of an address command, kept whole by `readableProse`. */
const ADDRESS = /^\\(?:url|nolinkurl|href)(?![a-zA-Z])/;

function blank(hidden: string): string {
  return hidden.replace(/[^\n]/g, " ");
}

// ---------------------------------------------------------------------------------------------
// Lines

export function endOfLine(text: string, position: number): number {
  const end = text.indexOf("\n", position);
  return end < 0 ? text.length : end;
}

export function indentOf(line: string): number {
  return line.length - line.trimStart().length;
}

/** Where the block indented deeper than `indent` that starts at `start` (after blank lines) ends. */
export function indentedBlockEnd(text: string, start: number, indent: number): number {
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
