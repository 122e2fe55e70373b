/**
 * LaTeX commands in running text whose arguments are keys, file names or addresses, not words:
 * `\label{eq:NO2}`, `\ref{tab:KNO3}`, `\cite{KR2025NO2}`, `\usepackage{mhchem}`. A key often
 * spells a formula on purpose, and reporting it would put a species where the reader sees none.
 * `\texttt{...}` is there too: typewriter text is how a report sets file names, log keys and code
 * (`\texttt{SO2\_flow}`), as a code span does in markdown.
 */

const KEY_COMMAND =
  /^\\(?:label|ref|eqref|pageref|autoref|nameref|[cC]ref|cite[a-zA-Z]*|input|include|includegraphics|usepackage|RequirePackage|documentclass|bibliography|bibliographystyle|url|href|hypersetup|texttt|addbibresource|includeonly|subfile|externaldocument)\*?(?:\[[^\]\n]{0,80}\])?\{/;

/** `\hyperref[key]{text}`: the key in brackets, then words. */
const KEY_IN_BRACKETS = /^\\hyperref\[[^\]\n]{0,80}\]/;

/** The longest key looked at: a longer group is not a key, and scanning goes on inside it. */
const MAX_KEY = 200;

/** Where the key command at `at` ends (past its braced argument), or `at` when there is none. */
export function latexKeyCommandEnd(text: string, at: number, limit: number): number {
  if (text.charCodeAt(at) !== 0x5c) return at;
  const start = text.slice(at, at + 120);
  const bracketed = KEY_IN_BRACKETS.exec(start);
  if (bracketed) return Math.min(limit, at + bracketed[0].length);
  const command = KEY_COMMAND.exec(start);
  if (!command) return at;
  const open = at + command[0].length;
  const found = text.slice(open, open + MAX_KEY + 1).indexOf("}");
  const close = found < 0 ? -1 : open + found;
  if (close < 0 || close >= limit) return at;
  return close + 1;
}

/** The environments whose content is typed as it is shown: code, not prose. */
const VERBATIM = /^[ \t]*\\begin\{(verbatim|Verbatim|lstlisting|minted|comment)\*?\}/;

/**
 * When the line at `lineStart` opens a verbatim environment, where the line closing it ends (or the
 * text ends, when it is never closed); otherwise `lineStart`.
 */
export function verbatimBlockEnd(text: string, lineStart: number, lineEnd: number): number {
  const opening = VERBATIM.exec(text.slice(lineStart, Math.min(lineEnd, lineStart + 200)));
  if (!opening) return lineStart;
  const close = text.indexOf(`\\end{${opening[1]}`, lineEnd);
  if (close < 0) return text.length;
  const closeLineEnd = text.indexOf("\n", close);
  return closeLineEnd < 0 ? text.length : closeLineEnd + 1;
}

/** A line that opens a conditional that is never true: `\iffalse`, the usual way to hide a draft paragraph. */
const FALSE_CONDITIONAL = /^[ \t]*\\iffalse(?![a-zA-Z@])/;

/**
 * A comment to the line's end, or a control sequence: a word (letters, and "@" as package code
 * writes them) or one other character ("\\", "\%"). Read in order, so that an escaped "%" or a
 * "\fi" in a comment is not taken for what it is not.
 */
const TEX_TOKEN = /%[^\n]*|\\(?:([a-zA-Z@]+)|[^a-zA-Z@])/g;

/**
 * When the line at `lineStart` opens `\iffalse`, where the text TeX skips ends: just past the
 * `\fi` or `\else` that closes it (a `\else` branch is typeset), counting the conditionals nested
 * inside; the text's end when it is never closed. Otherwise `lineStart`.
 */
export function falseConditionalEnd(text: string, lineStart: number, lineEnd: number): number {
  const opening = FALSE_CONDITIONAL.exec(text.slice(lineStart, Math.min(lineEnd, lineStart + 200)));
  if (!opening) return lineStart;
  TEX_TOKEN.lastIndex = lineStart + opening[0].length;
  let depth = 0;
  for (let token = TEX_TOKEN.exec(text); token; token = TEX_TOKEN.exec(text)) {
    const word = token[1];
    if (word === undefined) continue;
    if (word === "fi") {
      if (depth === 0) return TEX_TOKEN.lastIndex;
      depth--;
    } else if (word === "else") {
      if (depth === 0) return TEX_TOKEN.lastIndex;
    } else if (isConditional(word, text, TEX_TOKEN.lastIndex)) depth++;
  }
  return text.length;
}

/**
 * Whether `\word` opens a conditional that its own `\fi` closes (`\ifx`, `\ifnum`, `\ifdefined`,
 * a `\newif` switch such as `\ifdraft`). `\iff` is the "if and only if" arrow, and a macro whose
 * name starts with "if" and takes braced arguments (`\ifthenelse{...}`, `\ifdefempty{...}`)
 * chooses between its arguments with no `\fi` (common practice).
 */
function isConditional(word: string, text: string, after: number): boolean {
  if (!word.startsWith("if") || word === "iff") return false;
  let position = after;
  while (position < text.length && (text.charCodeAt(position) === 0x20 || text.charCodeAt(position) === 0x09)) position++;
  return text.charCodeAt(position) !== 0x7b;
}
