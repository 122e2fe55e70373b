/**
 * Finds the charge written at the end of a formula, in every spelling people use: NH4+, NH4^+,
 * SO4^2-, SO4 2-, SO4(2-), SO4^{2-}, [PO4]3-, SO4--, SO₄²⁻, Fe2+, and sign first as handbook
 * tables and databases print it: SO4-2, Ca+2, Fe(CN)6-3.
 */
import { elementBySymbol } from "../elements";
import type { Problem } from "../types";
import { asciiDigitValue, chargeDigitValue, isSpace, isUpperLetter, isLowerLetter, signValue, superscriptDigitValue } from "./characters";
import { chargeText } from "./chargeText";
import { NONMETALS } from "./nonmetals";
import { problemAt } from "./problem";

/** Where the formula body ends and what charge follows it. */
export interface ChargeSuffix {
  readonly bodyEnd: number;
  readonly charge: number;
}

export type ChargeSuffixResult = { readonly ok: true; readonly value: ChargeSuffix } | { readonly ok: false; readonly problem: Problem };

/** Charges beyond this are typing accidents, not ions. */
const MAX_CHARGE = 20;

const CARET = 0x5e;

/**
 * Reads the charge at the end of `text[start, end)`. Without a charge the body is the whole span and
 * the charge is 0. Digits glued to the body before a sign ("SO42-") are ambiguous and reported.
 */
export function readChargeSuffix(text: string, start: number, end: number): ChargeSuffixResult {
  const last = text.charCodeAt(end - 1);
  if (last === 0x29) return bracketedCharge(text, start, end, 0x28);
  if (last === 0x7d) return bracketedCharge(text, start, end, 0x7b);
  if (signValue(last) !== 0) return signEndedCharge(text, start, end);
  if (chargeDigitValue(last) >= 0) return signFirstCharge(text, start, end);
  return noCharge(end);
}

function noCharge(end: number): ChargeSuffixResult {
  return { ok: true, value: { bodyEnd: end, charge: 0 } };
}

function charged(bodyEnd: number, charge: number): ChargeSuffixResult {
  return { ok: true, value: { bodyEnd, charge } };
}

function malformed(message: string, start: number, end: number, suggestion?: string): ChargeSuffixResult {
  return { ok: false, problem: problemAt("malformed-formula", message, start, end, suggestion) };
}

/**
 * Value of a bare charge like "2-", "+", "--", "-2", "²⁻"; undefined when the span is not one.
 * Mixed signs, or repeated signs with a number ("2--"), are not charges.
 */
export function chargeCoreValue(text: string, from: number, to: number): number | undefined {
  if (from >= to) return undefined;
  let i = from;
  const leadingSign = signValue(text.charCodeAt(i));
  if (leadingSign !== 0 && i + 1 < to && digitValue(text.charCodeAt(i + 1)) >= 0) {
    // sign first: "-2"
    const magnitude = readMagnitude(text, i + 1, to);
    return magnitude === undefined ? undefined : leadingSign * magnitude;
  }
  let magnitude = 0;
  let digits = 0;
  while (i < to && digitValue(text.charCodeAt(i)) >= 0) {
    magnitude = magnitude * 10 + digitValue(text.charCodeAt(i));
    digits++;
    i++;
  }
  if (i >= to || digits > 2) return undefined;
  const sign = signValue(text.charCodeAt(i));
  if (sign === 0) return undefined;
  let signs = 0;
  while (i < to && signValue(text.charCodeAt(i)) === sign) {
    signs++;
    i++;
  }
  if (i !== to || (digits > 0 && signs > 1)) return undefined;
  const size = digits > 0 ? magnitude : signs;
  if (size === 0 || size > MAX_CHARGE) return undefined;
  return sign * size;
}

function readMagnitude(text: string, from: number, to: number): number | undefined {
  if (to - from > 2) return undefined;
  let magnitude = 0;
  for (let i = from; i < to; i++) {
    const digit = digitValue(text.charCodeAt(i));
    if (digit < 0) return undefined;
    magnitude = magnitude * 10 + digit;
  }
  return magnitude === 0 || magnitude > MAX_CHARGE ? undefined : magnitude;
}

function digitValue(code: number): number {
  return Math.max(asciiDigitValue(code), superscriptDigitValue(code));
}

/** "(2-)" or "^{2-}" at the end. */
function bracketedCharge(text: string, start: number, end: number, open: number): ChargeSuffixResult {
  let openAt = end - 2;
  while (openAt >= start) {
    const code = text.charCodeAt(openAt);
    if (digitValue(code) < 0 && signValue(code) === 0) break;
    openAt--;
  }
  const caret = open === 0x7b && openAt > start && text.charCodeAt(openAt - 1) === CARET;
  const value = openAt >= start && text.charCodeAt(openAt) === open ? chargeCoreValue(text, openAt + 1, end - 1) : undefined;
  if (value === undefined) {
    if (caret) return malformed("The charge in ^{...} is not a number and a sign, like ^{2-}.", openAt - 1, end);
    return noCharge(end);
  }
  let bodyEnd = caret ? openAt - 1 : openAt;
  while (bodyEnd > start && isSpace(text.charCodeAt(bodyEnd - 1))) bodyEnd--;
  if (bodyEnd === start) return malformed("A charge needs a species before it.", start, end);
  return charged(bodyEnd, value);
}

/** "^-2", "^+3", or without the caret "SO4-2", "Ca+2", "Fe(CN)6-3": sign first, then the number. */
function signFirstCharge(text: string, start: number, end: number): ChargeSuffixResult {
  let i = end - 1;
  while (i >= start && chargeDigitValue(text.charCodeAt(i)) >= 0) i--;
  if (i < start || signValue(text.charCodeAt(i)) === 0) return noCharge(end);
  if (i - 1 >= start && text.charCodeAt(i - 1) === CARET) {
    const value = chargeCoreValue(text, i, end);
    if (value === undefined) return malformed("This charge is not a number and a sign, like ^2-.", i - 1, end);
    return charged(i - 1, value);
  }
  let bodyEnd = i;
  while (bodyEnd > start && isSpace(text.charCodeAt(bodyEnd - 1))) bodyEnd--;
  if (bodyEnd === start) return malformed("A charge needs a species before it.", start, end);
  // Tables print one digit after the sign; more would be a count or a mass number, not a charge.
  if (end - i !== 2) {
    return malformed("A charge written sign first has one digit, like SO4-2 or Ca+2.", i, end);
  }
  const magnitude = chargeDigitValue(text.charCodeAt(end - 1));
  if (magnitude === 0) return malformed("A charge of zero is no charge; leave it out.", i, end);
  return charged(bodyEnd, signValue(text.charCodeAt(i)) * magnitude);
}

/** Everything that ends in + or -. */
function signEndedCharge(text: string, start: number, end: number): ChargeSuffixResult {
  let signStart = end - 1;
  while (signStart - 1 >= start && signValue(text.charCodeAt(signStart - 1)) !== 0) signStart--;
  const before = signStart - 1;
  if (before < start) return malformed("A charge needs a species before it.", start, end);
  const code = text.charCodeAt(before);

  if (superscriptDigitValue(code) >= 0) {
    let digitStart = before;
    while (digitStart - 1 >= start && superscriptDigitValue(text.charCodeAt(digitStart - 1)) >= 0) digitStart--;
    return finishCharge(text, start, digitStart, end);
  }
  if (code === CARET || isSpace(code)) return finishCharge(text, start, signStart, end);
  if (asciiDigitValue(code) < 0) return finishCharge(text, start, signStart, end);

  let digitStart = before;
  while (digitStart - 1 >= start && asciiDigitValue(text.charCodeAt(digitStart - 1)) >= 0) digitStart--;
  if (digitStart === start) return malformed("A charge needs a species before it.", start, end);
  const previous = text.charCodeAt(digitStart - 1);
  // "SO4^2-", "SO4 2-" and "[PO4]3-": the digits can only be the charge.
  if (previous === CARET || isSpace(previous) || previous === 0x5d) return finishCharge(text, start, digitStart, end);
  const digitCount = signStart - digitStart;
  const signCount = end - signStart;
  // "Fe2+", "Cu2+": a lone metal with one digit and one sign is a monatomic ion.
  if (digitCount === 1 && signCount === 1 && isLoneMetal(text, start, digitStart)) {
    return finishCharge(text, start, digitStart, end);
  }
  const lastDigit = text.charCodeAt(signStart - 1);
  // "C12+" stays a count: splitting it would leave a written count of 1, which nobody writes
  const leadingCount = Number(text.slice(digitStart, signStart - 1));
  if (digitCount >= 2 && signCount === 1 && lastDigit !== 0x30 && leadingCount > 1) {
    const body = text.slice(start, signStart - 1);
    const suggestion = `${body}${chargeText(signValue(text.charCodeAt(signStart)) * (lastDigit - 0x30))}`;
    return malformed(
      `"${text.slice(digitStart, end)}" could be a count or a charge; write the charge with ^ or a space, like ${suggestion}.`,
      digitStart,
      end,
      suggestion,
    );
  }
  // "NH4+", "CH3-": the digits are a count and the signs are the charge.
  return finishCharge(text, start, signStart, end);
}

function finishCharge(text: string, start: number, chargeStart: number, end: number): ChargeSuffixResult {
  let coreStart = chargeStart;
  let bodyEnd = chargeStart;
  if (coreStart > start && text.charCodeAt(coreStart - 1) === CARET) bodyEnd = coreStart - 1;
  if (text.charCodeAt(coreStart) === CARET) coreStart++;
  const value = chargeCoreValue(text, coreStart, end);
  if (value === undefined) {
    return malformed("This charge is not a number and a sign, like 2- or +.", bodyEnd, end);
  }
  while (bodyEnd > start && isSpace(text.charCodeAt(bodyEnd - 1))) bodyEnd--;
  if (bodyEnd === start) return malformed("A charge needs a species before it.", start, end);
  return charged(bodyEnd, value);
}

/**
 * True when `text[start, end)` is one metal symbol. Only metals: "Fe2+" is iron(2+), but "N3-" and
 * "I3-" are azide and triiodide, as digits after a nonmetal are counts.
 */
function isLoneMetal(text: string, start: number, end: number): boolean {
  const length = end - start;
  if (length < 1 || length > 2 || !isUpperLetter(text.charCodeAt(start))) return false;
  if (length === 2 && !isLowerLetter(text.charCodeAt(start + 1))) return false;
  const symbol = text.slice(start, end);
  return elementBySymbol(symbol) !== undefined && !NONMETALS.has(symbol);
}
