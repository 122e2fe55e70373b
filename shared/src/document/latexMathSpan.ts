/**
 * Species typed as LaTeX math outside mhchem: `$H_2O$`, `$\mathrm{Fe(CN)_{6}^{3-}}$`,
 * `\(SO_4^{2-}\)`, `$2H_2 + O_2 \rightarrow 2H_2O$`. Math is mostly not chemistry ($x_i$, $E = mc^2$,
 * $K_a$), so a piece counts only when its plain spelling passes the same rules as a prose token.
 */
import { latexToPlain } from "../chemistry/reader/latexFormula";
import { mhchemSpanEnd, nextMhchemOpening, scanMhchemBody } from "./mhchemSpan";
import { isConfidentToken, shapeOf } from "./proseTokenRules";
import { occurrenceAt, type ScanSink, type SpeciesReader } from "./speciesReader";

/** Longest math span looked at; longer ones are derivations, not species. */
const MAX_MATH = 300;

/** The math span opened at `open`: where its content lies and where scanning goes on, or undefined. */
export interface MathSpan {
  readonly contentStart: number;
  readonly contentEnd: number;
  readonly end: number;
}

const DELIMITERS: readonly (readonly [string, string])[] = [
  ["$$", "$$"],
  ["$", "$"],
  ["\\(", "\\)"],
  ["\\[", "\\]"],
];

/** The math span opened at `open` (a "$", "$$", "\(" or "\["), closed before `limit`. */
export function latexMathSpan(text: string, open: number, limit: number): MathSpan | undefined {
  for (const [opening, closing] of DELIMITERS) {
    if (!text.startsWith(opening, open)) continue;
    const contentStart = open + opening.length;
    const first = text.charCodeAt(contentStart);
    // "$ x $" is not math, by the usual rule for inline dollars; nor is "$5 and $10" (space before the close).
    if (opening === "$" && (isSpace(first) || Number.isNaN(first))) return undefined;
    const stop = Math.min(limit, contentStart + MAX_MATH);
    let close = text.indexOf(closing, contentStart);
    while (opening === "$" && close >= 0 && close < stop && (isSpace(text.charCodeAt(close - 1)) || text.charCodeAt(close - 1) === 0x5c)) {
      close = text.indexOf(closing, close + 1);
    }
    if (close < 0 || close + closing.length > stop || close === contentStart) return undefined;
    if (text.slice(contentStart, close).includes("\n\n")) return undefined;
    return { contentStart, contentEnd: close, end: close + closing.length };
  }
  return undefined;
}

function isSpace(code: number): boolean {
  return code === 0x20 || code === 0x0a || code === 0x09 || code === 0x0d;
}

/** Words of math that join species rather than name them. */
const OPERATORS =
  /^(?:[+=,;:.]|\\(?:rightarrow|longrightarrow|to|leftarrow|leftrightarrow|rightleftharpoons|longleftrightarrow|rightleftarrows|quad|qquad|,|;)|<?-+>|<=+>|<-+)$/;

/** Reads each species of the math content `text[start, end)` into `sink`. */
export function scanLatexMath(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): void {
  for (const word of mathWords(text, start, end)) {
    if (readMhchemSpans(text, word.start, word.end, read, sink)) continue;
    let wordStart = word.start;
    let wordEnd = word.end;
    while (wordEnd > wordStart && /[,;.]/.test(text[wordEnd - 1])) wordEnd--;
    // A coefficient glued to the species: "2H_2O", "2\,H_2".
    while (wordStart < wordEnd && /[0-9]/.test(text[wordStart])) wordStart++;
    if (wordStart > word.start && text.startsWith("\\,", wordStart)) wordStart += 2;
    if (wordStart > word.start && !/[A-Z\\([]/.test(text[wordStart] ?? "")) continue;
    // "\mathrm{Fe(CN)_{6}^{3-}}": the species is what the face command wraps.
    const face = /^\\(?:mathrm|text|textrm|rm|mathit|mathsf)\{/.exec(text.slice(wordStart, wordEnd));
    if (face && text.charCodeAt(wordEnd - 1) === 0x7d && balanced(text, wordStart + face[0].length, wordEnd - 1)) {
      wordStart += face[0].length;
      wordEnd--;
      // "\mathrm{CO_2 + H_2O \rightarrow H_2CO_3}": a whole equation set upright.
      if (/\s/.test(text.slice(wordStart, wordEnd))) {
        scanLatexMath(text, wordStart, wordEnd, read, sink);
        continue;
      }
    }
    if (readMathPiece(text, wordStart, wordEnd, read, sink)) continue;
    const quantities = quantityArguments(text, wordStart, wordEnd);
    if (quantities.length > 0) for (const [from, to] of quantities) readMathPiece(text, ...withoutFace(text, from, to), read, sink);
    else readFaceGroups(text, wordStart, wordEnd, read, sink);
  }
}

/**
 * The `\ce{...}` spans in the math word `text[start, end)`, read as mhchem; false when it has none.
 * mhchem works in math as in text (a `.. math::` block, a `:math:` role, an AsciiDoc stem block).
 */
function readMhchemSpans(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): boolean {
  let found = false;
  for (let open = nextMhchemOpening(text, start); open >= 0 && open < end; open = nextMhchemOpening(text, open + 1)) {
    const spanEnd = mhchemSpanEnd(text, open, end);
    if (spanEnd < 0) continue;
    scanMhchemBody(text, open + 4, spanEnd - 1, read, sink);
    found = true;
    open = spanEnd - 1;
  }
  return found;
}

/**
 * "n(^{13}CO_2)/n(^{12}CO_2)", "c(H_2O)": the species in the brackets of a quantity symbol (amount,
 * concentration, mass, volume, molar mass, mole fraction), as [start, end) pairs.
 */
function quantityArguments(text: string, start: number, end: number): [number, number][] {
  const found: [number, number][] = [];
  const quantity = /(?:^|[^A-Za-z\\])[nmcVMx]\(/g;
  const word = text.slice(start, end);
  for (let match = quantity.exec(word); match; match = quantity.exec(word)) {
    const open = start + match.index + match[0].length;
    let depth = 1;
    let close = open;
    while (close < end && depth > 0) {
      const code = text.charCodeAt(close);
      if (code === 0x28) depth++;
      else if (code === 0x29) depth--;
      if (depth > 0) close++;
    }
    if (depth === 0 && close > open) found.push([open, close]);
  }
  return found;
}

/** `text[start, end)` without a face command around all of it: "\mathrm{NO_2^-}" -> "NO_2^-". */
function withoutFace(text: string, start: number, end: number): [number, number] {
  const face = /^\\(?:mathrm|text|textrm|rm|mathit|mathsf)\{/.exec(text.slice(start, Math.min(end, start + 10)));
  if (!face || text.charCodeAt(end - 1) !== 0x7d || !balanced(text, start + face[0].length, end - 1)) return [start, end];
  return [start + face[0].length, end - 1];
}

/** Reads `text[start, end)` as one species when it is one; true when it was read. */
function readMathPiece(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): boolean {
  const written = text.slice(start, end);
  if (written.length === 0 || OPERATORS.test(written)) return false;
  const plain = latexToPlain(written);
  if (plain === undefined || plain.length === 0) return false;
  // "^{13}CO_2" has the shape of CO2: mass numbers label atoms, they add none.
  const unlabelled = plain.replace(MASS_NUMBERS, "").replace(STATE, "");
  const caret = unlabelled.indexOf("^");
  const body = caret < 0 ? unlabelled : unlabelled.slice(0, caret);
  const shape = shapeOf(body, caret < 0 ? "" : unlabelled.slice(caret));
  if (!shape) return false;
  // Labelling an atom of a molecule ("C^{16}O^{18}O") says it is chemistry; a lone "^{18}O" is an atom.
  const labelled = unlabelled !== plain && shape.symbols.length > 1;
  if (!labelled && !isConfidentToken(unlabelled, body, shape)) return false;
  const result = read(written);
  if (result.ok) sink.occurrences.push(occurrenceAt(result.value, written, start, "formula"));
  return result.ok;
}

/** A state symbol ending the formula: "H_2O(l)", "NaCl_{(aq)}". */
const STATE = /\((?:aq|s|l|g)\)$/;

/** Mass numbers before an element symbol, as `latexToPlain` writes them ("^{13}C"). */
const MASS_NUMBERS = /\^\{[0-9]{1,3}\}(?=[A-Z])/g;

/**
 * "\frac{[\mathrm{H_3O^+}][\mathrm{A^-}]}{...}": each upright group inside a larger expression;
 * a group holding several words ("\mathrm{CO_2 + H_2O \rightarrow H_2CO_3}") is math of its own.
 */
function readFaceGroups(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): void {
  const face = /\\(?:mathrm|text|textrm)\{/g;
  const word = text.slice(start, end);
  for (let match = face.exec(word); match; match = face.exec(word)) {
    const open = start + match.index + match[0].length;
    let depth = 1;
    let close = open;
    while (close < end && depth > 0) {
      const code = text.charCodeAt(close);
      if (code === 0x7b) depth++;
      else if (code === 0x7d) depth--;
      if (depth > 0) close++;
    }
    if (depth > 0) continue;
    if (/\s/.test(text.slice(open, close))) scanLatexMath(text, open, close, read, sink);
    else readMathPiece(text, open, close, read, sink);
  }
}

/** Whitespace-separated words of `text[start, end)`, a braced group kept whole. */
function mathWords(text: string, start: number, end: number): { start: number; end: number }[] {
  const words: { start: number; end: number }[] = [];
  let index = start;
  while (index < end) {
    while (index < end && isSpace(text.charCodeAt(index))) index++;
    if (index >= end) break;
    const wordStart = index;
    let depth = 0;
    while (index < end && (depth > 0 || !isSpace(text.charCodeAt(index)))) {
      const code = text.charCodeAt(index);
      if (code === 0x7b) depth++;
      else if (code === 0x7d) depth--;
      index++;
    }
    words.push({ start: wordStart, end: index });
  }
  return words;
}

/** True when the braces of `text[start, end)` pair up. */
function balanced(text: string, start: number, end: number): boolean {
  let depth = 0;
  for (let index = start; index < end; index++) {
    const code = text.charCodeAt(index);
    if (code === 0x7b) depth++;
    else if (code === 0x7d && --depth < 0) return false;
  }
  return depth === 0;
}
