import type { Problem } from "../types";
import { AROMATIC_BRACKET_SYMBOLS, ELEMENT_SYMBOLS } from "./elementSymbols";
import { position, smilesProblem } from "./problems";

/** What a bracket atom such as [13CH3+:2] says; `end` is the offset just after its `]`. */
export interface BracketAtom {
  readonly symbol: string;
  readonly aromatic: boolean;
  readonly isotope: number | undefined;
  readonly hydrogens: number;
  readonly charge: number;
  readonly end: number;
}

const ZERO = 48;
const NINE = 57;
const UPPER_A = 65;
const UPPER_Z = 90;
const LOWER_A = 97;
const LOWER_Z = 122;

function isDigit(code: number): boolean {
  return code >= ZERO && code <= NINE;
}

function isUpper(code: number): boolean {
  return code >= UPPER_A && code <= UPPER_Z;
}

function isLower(code: number): boolean {
  return code >= LOWER_A && code <= LOWER_Z;
}

/** Chirality classes that take a number: @TH1, @AL2, @SP3, @TB10, @OH25. */
const CHIRAL_CLASSES: ReadonlySet<string> = new Set(["TH", "AL", "SP", "TB", "OH"]);

/**
 * Reads the bracket atom whose `[` is at `start`. Stereo marks and atom classes are checked for
 * form and then dropped: the core works with constitution only.
 */
export function readBracketAtom(text: string, start: number): BracketAtom | Problem {
  const length = text.length;
  let i = start + 1;

  let isotope: number | undefined;
  if (i < length && isDigit(text.charCodeAt(i))) {
    let value = 0;
    const digitsStart = i;
    while (i < length && isDigit(text.charCodeAt(i))) value = value * 10 + text.charCodeAt(i++) - ZERO;
    if (i - digitsStart > 3) {
      return smilesProblem("malformed-formula", `Mass number at ${position(digitsStart)} has more than three digits.`, digitsStart, i);
    }
    isotope = value;
  }

  const symbolStart = i;
  if (i >= length) return unclosed(start, length);
  const first = text.charCodeAt(i);
  const second = i + 1 < length ? text.charCodeAt(i + 1) : 0;
  let symbol: string | undefined;
  let aromatic = false;
  if (isUpper(first)) {
    if (isLower(second) && ELEMENT_SYMBOLS.has(text.slice(i, i + 2))) {
      symbol = text.slice(i, i + 2);
      i += 2;
    } else if (ELEMENT_SYMBOLS.has(text[i])) {
      symbol = text[i];
      i += 1;
    }
  } else if (isLower(first)) {
    const pair = isLower(second) ? AROMATIC_BRACKET_SYMBOLS.get(text.slice(i, i + 2)) : undefined;
    if (pair !== undefined) {
      symbol = pair;
      i += 2;
    } else {
      symbol = AROMATIC_BRACKET_SYMBOLS.get(text[i]);
      if (symbol !== undefined) i += 1;
    }
    aromatic = symbol !== undefined;
  } else if (first === 42 /* * */) {
    return smilesProblem("unknown-element", `The wildcard atom * at ${position(i)} is not supported; write an element symbol.`, i, i + 1);
  }
  if (symbol === undefined) {
    if (first === 93 /* ] */) {
      return smilesProblem("malformed-formula", `Bracket atom at ${position(start)} has no element symbol.`, start, i + 1);
    }
    let end = i + 1;
    while (end < length && end < i + 3 && isLower(text.charCodeAt(end))) end++;
    if (!isUpper(first) && !isLower(first)) {
      return smilesProblem("malformed-formula", `Expected an element symbol at ${position(i)}, found "${text[i]}".`, i, i + 1);
    }
    return smilesProblem(
      "unknown-element",
      `"${text.slice(i, end)}" at ${position(i)} is not an element symbol${isLower(first) ? " that can be written aromatic" : ""}.`,
      symbolStart,
      end,
    );
  }

  if (i < length && text.charCodeAt(i) === 64 /* @ */) {
    const stereoStart = i;
    i++;
    if (i < length && text.charCodeAt(i) === 64) {
      i++;
    } else if (i + 1 < length && CHIRAL_CLASSES.has(text.slice(i, i + 2))) {
      i += 2;
      const digitsStart = i;
      while (i < length && i < digitsStart + 2 && isDigit(text.charCodeAt(i))) i++;
      if (i === digitsStart) {
        return smilesProblem("malformed-formula", `Stereo mark at ${position(stereoStart)} needs a number, as in @TH1.`, stereoStart, i);
      }
    }
  }

  let hydrogens = 0;
  if (i < length && text.charCodeAt(i) === 72 /* H */) {
    i++;
    hydrogens = 1;
    if (i < length && isDigit(text.charCodeAt(i))) {
      hydrogens = text.charCodeAt(i++) - ZERO;
      if (i < length && isDigit(text.charCodeAt(i))) hydrogens = hydrogens * 10 + text.charCodeAt(i++) - ZERO;
    }
  }

  let charge = 0;
  if (i < length) {
    const sign = text.charCodeAt(i);
    if (sign === 43 /* + */ || sign === 45 /* - */) {
      const direction = sign === 43 ? 1 : -1;
      i++;
      if (i < length && isDigit(text.charCodeAt(i))) {
        let magnitude = text.charCodeAt(i++) - ZERO;
        if (i < length && isDigit(text.charCodeAt(i))) magnitude = magnitude * 10 + text.charCodeAt(i++) - ZERO;
        charge = direction * magnitude;
      } else if (i < length && text.charCodeAt(i) === sign) {
        // "++" and "--" are the only repeated forms the grammar allows; "+++" is not SMILES.
        charge = 2 * direction;
        i++;
      } else {
        charge = direction;
      }
    }
  }

  if (i < length && text.charCodeAt(i) === 58 /* : */) {
    const classStart = i;
    i++;
    while (i < length && isDigit(text.charCodeAt(i))) i++;
    if (i === classStart + 1) {
      return smilesProblem("malformed-formula", `Atom class at ${position(classStart)} needs a number, as in :1.`, classStart, i);
    }
  }

  if (i >= length) return unclosed(start, length);
  if (text.charCodeAt(i) !== 93 /* ] */) {
    return smilesProblem(
      "malformed-formula",
      `Unexpected "${text[i]}" at ${position(i)} inside the bracket atom that starts at ${position(start)}.`,
      i,
      i + 1,
    );
  }
  return { symbol, aromatic, isotope, hydrogens, charge, end: i + 1 };
}

function unclosed(start: number, length: number): Problem {
  return smilesProblem("unbalanced-brackets", `The "[" at ${position(start)} is never closed with "]".`, start, length);
}
