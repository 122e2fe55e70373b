/**
 * Decides how much of a document the core reads: all of it normally, a prefix of a huge
 * document, and nothing of binary content.
 */

/**
 * Documents longer than this (UTF-16 code units, 50 Mi characters) are analysed only up to here:
 * the editor checks every row of any table a lab keeps, and stops with a clear warning only where
 * a file is more data dump than document.
 */
export const MAX_ANALYSED_LENGTH = 50 * 1024 * 1024;

/** How far back from the cap we look for a line break to cut at. */
const CUT_SEARCH_WINDOW = 64 * 1024;

/** How much of the start is checked for NUL characters, the mark of binary content. */
const BINARY_PROBE_LENGTH = 8 * 1024;

export interface AnalysedText {
  /** The prefix of the document the core reads (the whole text when nothing was cut). */
  readonly text: string;
  /** Set when the document was cut: the offset where analysis stopped. */
  readonly truncatedAt?: number;
  /** True when the content looks binary and nothing is analysed. */
  readonly binary: boolean;
}

/** Chooses the part of `text` to analyse; offsets in the prefix equal offsets in the document. */
export function analysedTextOf(text: string, maxLength = MAX_ANALYSED_LENGTH): AnalysedText {
  if (text.slice(0, BINARY_PROBE_LENGTH).includes("\u0000")) return { text: "", binary: true };
  if (text.length <= maxLength) return { text, binary: false };
  const cut = cutOffset(text, maxLength);
  return { text: text.slice(0, cut), truncatedAt: cut, binary: false };
}

/** Cuts after a line break near the cap so that no line is analysed half; never splits a surrogate pair. */
function cutOffset(text: string, maxLength: number): number {
  const lineBreak = text.lastIndexOf("\n", maxLength - 1);
  if (lineBreak >= 0 && maxLength - lineBreak <= CUT_SEARCH_WINDOW) return lineBreak + 1;
  const code = text.charCodeAt(maxLength - 1);
  return code >= 0xd800 && code <= 0xdbff ? maxLength - 1 : maxLength;
}
