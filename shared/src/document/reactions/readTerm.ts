/**
 * One reactant or product from the words between two operators: an optional coefficient
 * (2, 1/2, 0.5, ½, glued as in "2H2O" or spaced), the species with its state symbol, spaced
 * charge or hydrate water, and mhchem's gas and precipitate marks, which are left out.
 */
import type { TextRange } from "../../chemistry/types";
import type { SpeciesReader } from "../speciesReader";
import type { EquationToken } from "./equationTokens";
import type { Coefficient, ReactionTerm } from "./reactionTypes";

type Word = Extract<EquationToken, { type: "word" }>;

/** Most words a term spans: "2 CuSO4 · 5 H2O (s)". */
export const MAX_TERM_WORDS = 6;

const VULGAR_FRACTIONS: ReadonlyMap<string, readonly [number, number]> = new Map([
  ["\u00bd", [1, 2]],
  ["\u2153", [1, 3]],
  ["\u2154", [2, 3]],
  ["\u00bc", [1, 4]],
  ["\u00be", [3, 4]],
]);

/** A coefficient written on its own or in front of a formula: "3", "3/2", "1.5", "½". */
const COEFFICIENT = /^(?:(\d{1,4})\/(\d{1,4})|(\d{0,4})\.(\d{1,4})|(\d{1,4})|([\u00bd\u2153\u2154\u00bc\u00be]))/;

/** An electron as mhchem and plain text write it. */
const ELECTRON = /^e(?:[-\u2212\u207b]|\^[-\u2212]|\^\{[-\u2212]\})$/;

/** Marks that follow a species without being part of it: mhchem's gas and precipitate arrows. */
const AFTER_MARKS: ReadonlySet<string> = new Set(["^", "v", "\u2191", "\u2193"]);

/** Reads a coefficient at the start of `word`; `length` is how much of the word it takes. */
function coefficientOf(word: string): { numerator: number; denominator: number; length: number } | undefined {
  const match = COEFFICIENT.exec(word);
  if (!match) return undefined;
  let numerator: number;
  let denominator: number;
  if (match[1] !== undefined) [numerator, denominator] = [Number(match[1]), Number(match[2])];
  else if (match[4] !== undefined) {
    denominator = 10 ** match[4].length;
    numerator = Number(match[3] || "0") * denominator + Number(match[4]);
  } else if (match[5] !== undefined) [numerator, denominator] = [Number(match[5]), 1];
  else [numerator, denominator] = VULGAR_FRACTIONS.get(match[6])!;
  if (numerator === 0 || denominator === 0) return undefined;
  return { numerator, denominator, length: match[0].length };
}

/** True for a formula's first character: an element's capital, a bracket, or an electron's e. */
function startsFormula(text: string): boolean {
  return /^[A-Z([]/.test(text) || ELECTRON.test(text);
}

/**
 * The term made of `words` on `side`, or undefined when they are not one species (with its
 * coefficient) that the reader reads. Names are not terms: an equation is written in formulas.
 */
export function readTerm(text: string, words: readonly Word[], side: "left" | "right", read: SpeciesReader): ReactionTerm | undefined {
  if (words.length === 0 || words.length > MAX_TERM_WORDS) return undefined;
  let first = 0;
  let last = words.length - 1;
  while (last > first && AFTER_MARKS.has(words[last].text)) last--;
  let coefficient: Coefficient = { numerator: 1, denominator: 1 };
  let speciesStart = words[0].start;
  const leading = coefficientOf(words[0].text);
  if (leading && leading.length === words[0].text.length) {
    if (last === 0) return undefined;
    coefficient = { numerator: leading.numerator, denominator: leading.denominator, written: { start: words[0].start, end: words[0].end } };
    first = 1;
    speciesStart = words[1].start;
  } else if (leading && startsFormula(words[0].text.slice(leading.length)) && !words[0].text.startsWith("0", 0)) {
    const written: TextRange = { start: words[0].start, end: words[0].start + leading.length };
    coefficient = { numerator: leading.numerator, denominator: leading.denominator, written, glued: true };
    speciesStart = written.end;
  }
  if (!wordsMakeOneSpecies(words.slice(first, last + 1).map((word) => word.text))) return undefined;
  let speciesEnd = words[last].end;
  let speciesText = text.slice(speciesStart, speciesEnd);
  // A mark glued to the formula: "CO2↑".
  if (speciesText.length > 1 && /[\u2191\u2193]$/.test(speciesText)) {
    speciesEnd -= 1;
    speciesText = speciesText.slice(0, -1);
  }
  if (!startsFormula(speciesText)) return undefined;
  const range = { start: coefficient.written?.start ?? speciesStart, end: speciesEnd };
  const speciesRange = { start: speciesStart, end: speciesEnd };
  if (ELECTRON.test(speciesText)) return { range, side, coefficient, speciesRange, speciesText, electron: true };
  const result = read(speciesText);
  if (!result.ok || result.value.notation === "name" || result.value.composition.length === 0) return undefined;
  const reading = { ...result.value, text: speciesText, range: speciesRange };
  return { range, side, coefficient, speciesRange, speciesText, reading, electron: false };
}

/** A hydrate's dot, written on its own between a salt and its water. */
const HYDRATE_DOT = /^[*\u00b7\u2022\u2219\u22c5]$/;
const SPACED_STATE = /^\((?:aq|s|l|g|cr)\)$/;
const SPACED_CHARGE = /^\^?\d{0,2}[+\-\u2212]$/;

/**
 * True when the words of a species are one species with a spaced state ("Ag+ (aq)"), a spaced
 * charge ("SO4 2-") or spaced hydrate water ("CuSO4 · 5 H2O"): never two formulas side by side.
 */
function wordsMakeOneSpecies(words: readonly string[]): boolean {
  let afterDot = false;
  for (let index = 1; index < words.length; index++) {
    const word = words[index];
    if (HYDRATE_DOT.test(word)) afterDot = true;
    else if (afterDot && (/^\d{1,2}$/.test(word) || /^\d{0,2}[A-Z(]/.test(word))) {
      if (!/^\d{1,2}$/.test(word)) afterDot = false;
    } else if (SPACED_STATE.test(word) || SPACED_CHARGE.test(word)) afterDot = false;
    else return false;
  }
  return !afterDot;
}

/** Two element symbols at least, or a formula's marks (count, charge, bracket): not "C" or "I". */
export function looksLikeFormula(term: ReactionTerm): boolean {
  if (term.electron) return true;
  const text = term.speciesText;
  if (/[\d\u2080-\u2089\u00b2\u00b3\u00b9\u2070-\u207b+\-\u2212^()[\]]/.test(text)) return true;
  return (text.match(/[A-Z]/g) ?? []).length >= 2;
}
