/**
 * The species inside an mhchem `\ce{...}` span: a single species, or the reactants and products of
 * an equation ("SF4 + 2 H2O -> SO2 + 4 HF"), without coefficients, arrows and state symbols.
 */
import type { TextRange } from "../chemistry/types";
import { occurrenceAt, unreadableAt, type ScanSink, type SpeciesReader } from "./speciesReader";

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

/**
 * The species pieces of the body `text[start, end)`, as document ranges. A piece is a
 * whitespace-separated word that is not an operator, with a leading coefficient and a trailing
 * state symbol left out.
 */
export function mhchemPieces(text: string, start: number, end: number): TextRange[] {
  const pieces: TextRange[] = [];
  const body = text.slice(start, end);
  const word = /\S+/g;
  for (let match = word.exec(body); match; match = word.exec(body)) {
    let piece = match[0];
    let pieceStart = start + match.index;
    if (OPERATOR.test(piece) || /^\d+(?:\/\d+)?$/.test(piece)) continue;
    const coefficient = COEFFICIENT.exec(piece);
    if (coefficient && /^[A-Z(\[]/.test(piece.slice(coefficient[0].length))) {
      pieceStart += coefficient[0].length;
      piece = piece.slice(coefficient[0].length);
    }
    const state = STATE.exec(piece);
    if (state) piece = piece.slice(0, piece.length - state[0].length);
    if (piece.length > 0) pieces.push({ start: pieceStart, end: pieceStart + piece.length });
  }
  return pieces;
}

/**
 * Reads every piece of the mhchem body `text[start, end)` into `sink`. Everything inside is
 * chemistry by the writer's own say-so, so a formula-shaped piece that does not read is reported.
 */
export function scanMhchemBody(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): void {
  for (const piece of mhchemPieces(text, start, end)) {
    const pieceText = text.slice(piece.start, piece.end);
    const result = read(pieceText);
    if (result.ok) sink.occurrences.push(occurrenceAt(result.value, pieceText, piece.start, "mhchem"));
    else if (/^[A-Z(\[]/.test(pieceText) && result.problem.code !== "unknown-name") {
      sink.unreadable.push(unreadableAt(pieceText, piece.start, result));
    }
  }
}
