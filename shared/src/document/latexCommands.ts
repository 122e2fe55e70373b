/**
 * LaTeX commands in running text whose arguments are keys, file names or addresses, not words:
 * `\label{eq:NO2}`, `\ref{tab:KNO3}`, `\cite{KR2025NO2}`, `\usepackage{mhchem}`. A key often
 * spells a formula on purpose, and reporting it would put a species where the reader sees none.
 */

const KEY_COMMAND =
  /^\\(?:label|ref|eqref|pageref|autoref|nameref|[cC]ref|cite[a-zA-Z]*|input|include|includegraphics|usepackage|RequirePackage|documentclass|bibliography|bibliographystyle|url|href|hypersetup)\*?(?:\[[^\]\n]{0,80}\])?\{/;

/** The longest key looked at: a longer group is not a key, and scanning goes on inside it. */
const MAX_KEY = 200;

/** Where the key command at `at` ends (past its braced argument), or `at` when there is none. */
export function latexKeyCommandEnd(text: string, at: number, limit: number): number {
  if (text.charCodeAt(at) !== 0x5c) return at;
  const command = KEY_COMMAND.exec(text.slice(at, at + 120));
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
