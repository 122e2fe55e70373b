/**
 * The species inside an mhchem `\ce{...}` span: a single species, or the reactants and products of
 * an equation ("SF4 + 2 H2O -> SO2 + 4 HF"), without coefficients, arrows and state symbols.
 */
import type { TextRange } from "../chemistry/types";
import { readWholeEquation } from "./reactions/readEquation";
import { occurrenceAt, unreadableAt, type ScanSink, type SpeciesReader } from "./speciesReader";

/**
 * Whether an mhchem `\ce{` or a chemformula `\ch{` opens at `index` (both four characters long):
 * for formulas, charges, coefficients, "+" and arrows the two packages take the same notation,
 * so a `\ch{...}` is read as a `\ce{...}`.
 */
export function mhchemOpensAt(text: string, index: number): boolean {
  if (text.charCodeAt(index) !== 0x5c || text.charCodeAt(index + 1) !== 0x63 || text.charCodeAt(index + 3) !== 0x7b) return false;
  const letter = text.charCodeAt(index + 2);
  return letter === 0x65 || letter === 0x68;
}

/** Where the next `\ce{` or `\ch{` at or after `from` opens, or -1. */
export function nextMhchemOpening(text: string, from: number): number {
  const ce = text.indexOf("\\ce{", from);
  const ch = text.indexOf("\\ch{", from);
  return ce < 0 ? ch : ch < 0 ? ce : Math.min(ce, ch);
}

/** Where the last `\ce{` or `\ch{` that opens before `before` opens, or -1. */
export function lastMhchemOpening(text: string, before: number): number {
  return Math.max(text.lastIndexOf("\\ce{", before), text.lastIndexOf("\\ch{", before));
}

/** Whether `text` holds a `\ce{` or `\ch{` anywhere. */
export function holdsMhchem(text: string): boolean {
  return text.includes("\\ce{") || text.includes("\\ch{");
}

/** Longest `\ce{...}` body looked at; longer spans are not notes but pasted data. */
const MAX_SPAN = 400;

/** Where a `\ce{` opened at `open` ends (just past its closing brace), or -1 when it does not close. */
export function mhchemSpanEnd(text: string, open: number, limit: number): number {
  let depth = 0;
  const stop = Math.min(limit, open + MAX_SPAN);
  for (let index = open + 3; index < stop; index++) {
    const code = text.charCodeAt(index);
    if (code === 0x7b) depth++;
    else if (code === 0x7d) {
      depth--;
      if (depth === 0) return index + 1;
    } else if (code === 0x0a && text.charCodeAt(index + 1) === 0x0a) return -1;
  }
  return -1;
}

const OPERATOR = /^(?:\+|-|=|->|<-|<=>|<->|<=>>|<<=>|<-->|\^|v|&|\\\\|\$.*\$|->\[.*\]|\(\+\)|\*|\.|·)$/;
const COEFFICIENT = /^(?:\d+(?:\/\d+)?|\d*\.\d+)/;
const STATE = /\((?:g|l|s|aq|cr)\)$/;
/** A state symbol right after a piece, glued or after one space. */
const STATE_AFTER = /^ ?\((?:g|l|s|aq|cr)\)(?![^\s}])/;

/** An mhchem arrow that may carry text above and below it: "->[H2O]", "<=>[k_1][k_{-1}]". */
const LABELLED_ARROW = /(?:<=>>|<<=>|<=>|<-->|<->|->|<-|<=>)(?=\[)/y;

/** A piece of an mhchem body, and whether it sits in an arrow's label (text, not only species). */
export interface MhchemPiece extends TextRange {
  readonly inLabel: boolean;
}

/**
 * The species pieces of the body `text[start, end)`, as document ranges. A piece is a
 * whitespace-separated word that is not an operator, with a leading coefficient and a trailing
 * state symbol left out. Text in braces ("{heat}") and math in dollars are not species; the
 * labels of an arrow ("->[H2O]") are read too.
 */
export function mhchemPieces(text: string, start: number, end: number, inLabel = false): MhchemPiece[] {
  const pieces: MhchemPiece[] = [];
  let index = start;
  while (index < end) {
    const code = text.charCodeAt(index);
    // Any white space ends a word, a no-break space or byte order mark too: the word after it
    // starts past it, so the scan always moves on.
    if (code === 0x20 || code === 0x0a || code === 0x09 || code === 0x0d || /\s/.test(text[index])) {
      index++;
      continue;
    }
    if (code === 0x7b) {
      index = closingIndex(text, index, end, 0x7b, 0x7d) + 1;
      continue;
    }
    if (code === 0x24) {
      const close = text.indexOf("$", index + 1);
      index = close < 0 || close >= end ? end : close + 1;
      continue;
    }
    LABELLED_ARROW.lastIndex = index;
    const arrow = LABELLED_ARROW.exec(text);
    if (arrow && LABELLED_ARROW.lastIndex <= end) {
      index = LABELLED_ARROW.lastIndex;
      while (index < end && text.charCodeAt(index) === 0x5b) {
        const close = closingIndex(text, index, end, 0x5b, 0x5d);
        pieces.push(...mhchemPieces(text, index + 1, Math.min(close, end), true));
        index = close + 1;
      }
      continue;
    }
    let wordEnd = index;
    while (wordEnd < end && !/\s/.test(text[wordEnd])) wordEnd++;
    const piece = pieceOf(text, index, wordEnd, inLabel);
    if (piece) pieces.push(piece);
    index = wordEnd;
  }
  return pieces;
}

/** The bracket closing the one at `open` (depth counted), or `end` when it does not close. */
function closingIndex(text: string, open: number, end: number, opener: number, closer: number): number {
  let depth = 0;
  for (let index = open; index < end; index++) {
    const code = text.charCodeAt(index);
    if (code === opener) depth++;
    else if (code === closer && --depth === 0) return index;
  }
  return end;
}

/** The species part of the word `text[start, end)`, or undefined for an operator or a number. */
function pieceOf(text: string, start: number, end: number, inLabel: boolean): MhchemPiece | undefined {
  let piece = text.slice(start, end);
  let pieceStart = start;
  // A label is often a short note: "H2O, heat".
  if (inLabel) piece = piece.replace(/[,;]+$/, "");
  if (OPERATOR.test(piece) || /^\d+(?:\/\d+)?$/.test(piece)) return undefined;
  const coefficient = COEFFICIENT.exec(piece);
  if (coefficient && /^[A-Z([]/.test(piece.slice(coefficient[0].length))) {
    pieceStart += coefficient[0].length;
    piece = piece.slice(coefficient[0].length);
  }
  const state = STATE.exec(piece);
  if (state) piece = piece.slice(0, piece.length - state[0].length);
  return piece.length > 0 ? { start: pieceStart, end: pieceStart + piece.length, inLabel } : undefined;
}

/** What lies between a salt and its water in "CuSO4 * 5 H2O" or "CuSO4 · 5H2O". */
const HYDRATE_GAP = /^[ \t]*[*\u00b7\u2022\u2219\u22c5][ \t]*(?:\d+[ \t]*)?$/;

/**
 * Reads every piece of the mhchem body `text[start, end)` into `sink`. Everything inside is
 * chemistry by the writer's own say-so, so a formula-shaped piece that does not read is reported.
 */
export function scanMhchemBody(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): void {
  if (sink.reactions) {
    const reaction = readWholeEquation(text, start, end, "mhchem", read);
    if (reaction) sink.reactions.push(reaction);
  }
  const pieces = mhchemPieces(text, start, end);
  // "\ce{A ->[H2O] B}": a lone capital that is no element makes the equation a scheme, whose
  // lone capitals (B too) stand for any species.
  const schematic = pieces.some((piece) => piece.end - piece.start === 1 && !read(text[piece.start]).ok);
  for (let index = 0; index < pieces.length; index++) {
    let piece = pieces[index];
    // "\ce{KCr(SO4)2 * 12 H2O}": a hydrate written with spaced dots is one species.
    const water = pieces[index + 1];
    if (water && HYDRATE_GAP.test(text.slice(piece.end, water.start))) {
      const whole = read(text.slice(piece.start, water.end));
      if (whole.ok && whole.value.parts) {
        piece = { ...piece, end: water.end };
        index++;
      }
    }
    const pieceText = text.slice(piece.start, piece.end);
    if (pieceText.length === 1 && (schematic || !read(pieceText).ok)) continue;
    const result = read(pieceText);
    // "Fe^3+(aq)", "Ag+ (aq)": the state symbol belongs to the mention when the whole reads.
    const state = STATE_AFTER.exec(text.slice(piece.end, Math.min(end, piece.end + 6)));
    const stated = result.ok && state ? text.slice(piece.start, piece.end + state[0].length) : undefined;
    const statedResult = stated === undefined ? undefined : read(stated);
    if (stated !== undefined && statedResult?.ok) sink.occurrences.push(occurrenceAt(statedResult.value, stated, piece.start, "mhchem"));
    else if (result.ok) sink.occurrences.push(occurrenceAt(result.value, pieceText, piece.start, "mhchem"));
    // A label may be any note ("Pt gauze"); only what is written as a species outside one is a mistake.
    else if (!piece.inLabel && /^[A-Z([]/.test(pieceText) && result.problem.code !== "unknown-name") {
      sink.unreadable.push(unreadableAt(pieceText, piece.start, result));
    }
  }
}
