/**
 * Hand-written scanner for the body of a formula (everything before the charge): element symbols,
 * counts (also as TeX subscripts, H_2O), nested brackets, bond marks of condensed formulas, the
 * hydrate dot and isotope labels (D, T, 13CO2, ^{13}C). One pass, no regular expressions, work
 * bounded by the input length and the expansion limits below.
 */
import { elementBySymbol } from "../elements";
import type { ElementData, FormulaPart, IsotopeLabel, Problem, WrittenPart } from "../types";
import {
  bondMark,
  closingFor,
  countDigitValue,
  isCloseBracket,
  isHydrateDot,
  isLowerLetter,
  isNoBreakSpace,
  isOpenBracket,
  isSpace,
  isUpperLetter,
  signValue,
  superscriptDigitValue,
} from "./characters";
import { hydrogenLabelMass, isLeadingMassNumberOf, isMassNumberOf } from "./isotopes";
import { problemAt } from "./problem";

/** What the body of a formula is made of. */
export interface FormulaBody {
  /** Element counts in first-appearance order. */
  readonly composition: readonly FormulaPart[];
  /** Groups in written order, brackets expanded, bond marks "=" / "≡" and hydrate dots "·" kept. */
  readonly writtenSequence: readonly FormulaPart[];
  /** The body as written, with ASCII digits, "≡" for "#", "·" for any hydrate dot, no single-bond dashes. */
  readonly normalizedText: string;
  /** The dot-separated parts of a hydrate or adduct with their counts; absent without a dot. */
  readonly parts?: readonly WrittenPart[];
  /** Isotope labels in written order, each written spelling once; absent when there are none. */
  readonly isotopes?: readonly IsotopeLabel[];
}

export type FormulaBodyResult = { readonly ok: true; readonly value: FormulaBody } | { readonly ok: false; readonly problem: Problem };

/** A written count above this is a typing accident. */
const MAX_COUNT = 100_000;
/** Limits that keep nested multipliers like ((((H9)9)9)9) from blowing up memory. */
const MAX_SEQUENCE_PARTS = 10_000;
const MAX_TOTAL_ATOMS = 1_000_000;

const CARET = 0x5e;
const UNDERSCORE = 0x5f;

interface Frame {
  readonly kind: "root" | "bracket" | "hydrate";
  readonly openAt: number;
  readonly openCode: number;
  readonly multiplier: number;
  readonly parts: FormulaPart[];
  readonly counts: Map<string, number>;
  text: string;
  /** Elements or bracket groups so far; bond marks need one on each side. */
  items: number;
  /** On the root frame of a hydrate: the parts closed so far. */
  writtenParts?: WrittenPart[];
  /** Isotope labels, kept on the root frame only. */
  isotopes?: IsotopeLabel[];
}

function newFrame(kind: Frame["kind"], openAt: number, openCode: number, multiplier: number): Frame {
  return { kind, openAt, openCode, multiplier, parts: [], counts: new Map(), text: "", items: 0 };
}

class BodyError {
  constructor(readonly problem: Problem) {}
}

function fail(code: Problem["code"], message: string, start: number, end: number): never {
  throw new BodyError(problemAt(code, message, start, end));
}

/** Reads `text[start, end)` as a formula body. Never throws. */
export function readFormulaBody(text: string, start: number, end: number): FormulaBodyResult {
  try {
    return { ok: true, value: scan(text, start, end) };
  } catch (error) {
    if (error instanceof BodyError) return { ok: false, problem: error.problem };
    throw error;
  }
}

function scan(text: string, start: number, end: number): FormulaBody {
  const root = newFrame("root", start, 0, 1);
  const stack: Frame[] = [root];
  let wholeBodyBracket = false;
  let i = countDigitValue(text.charCodeAt(start)) >= 0 ? leadingMassNumber(text, start, end, root) : start;
  while (i < end) {
    const code = text.charCodeAt(i);
    const frame = stack[stack.length - 1];
    if (isUpperLetter(code) || isLowerLetter(code)) {
      i = readElement(text, i, end, frame, root);
      continue;
    }
    if (code === CARET || superscriptDigitValue(code) >= 0) {
      const labelled = isotopePrefix(text, i, end, root);
      if (labelled > i) {
        i = labelled;
        continue;
      }
    }
    if (isNoBreakSpace(code) && !spacesBeforeHydrateDot(text, i, end)) {
      // a no-break space inside a formula is a word processor's doing, not a separator
      i++;
      continue;
    }
    if (isOpenBracket(code)) {
      stack.push(newFrame("bracket", i, code, 1));
      i++;
      continue;
    }
    if (isCloseBracket(code)) {
      if (frame.kind !== "bracket") {
        fail("unbalanced-brackets", "This closing bracket has no opening bracket.", i, i + 1);
      }
      if (closingFor(frame.openCode) !== code) {
        fail("unbalanced-brackets", "This bracket closes a different kind of bracket.", frame.openAt, i + 1);
      }
      if (frame.items === 0) fail("malformed-formula", "These brackets hold nothing.", frame.openAt, i + 1);
      stack.pop();
      const parent = stack[stack.length - 1];
      const countStart = i + 1;
      const { value: count, next } = readCount(text, countStart, end);
      const open = String.fromCharCode(frame.openCode === 0x7b ? 0x28 : frame.openCode);
      const close = String.fromCharCode(closingFor(open.charCodeAt(0)));
      wholeBodyBracket = parent.kind === "root" && frame.openAt === start && next === end && count === 1 && countStart === next;
      mergeInto(parent, frame, count, frame.openAt, next);
      parent.text += `${open}${frame.text}${close}${next > countStart ? count : ""}`;
      parent.items++;
      i = next;
      continue;
    }
    const bond = bondMark(code);
    if (bond !== undefined) {
      requireBetweenGroups(text, i, end, frame, "A bond mark needs a group on each side.");
      frame.parts.push({ symbol: bond, count: 1 });
      frame.text += bond;
      i++;
      continue;
    }
    if (code === 0x2d || code === 0x2013) {
      // A dash between groups ("CH3-CH3", or "CH3–CH3" with the en dash word processors put in)
      // is a single bond: adjacency already says so. A trailing one was read as the charge.
      requireBetweenGroups(text, i, end, frame, "A dash inside a formula must join two groups.");
      i++;
      continue;
    }
    if (isHydrateDot(code) || isSpace(code)) {
      i = readHydrateSeparator(text, i, end, stack);
      continue;
    }
    if (countDigitValue(code) >= 0) {
      fail("malformed-formula", "This number follows no element or bracket.", i, i + 1);
    }
    if (code === UNDERSCORE) {
      fail("malformed-formula", 'A "_" subscript follows an element or a bracket, like H_2O.', i, i + 1);
    }
    if (code === 0x5e || signValue(code) !== 0 || superscriptDigitValue(code) >= 0) {
      fail("malformed-formula", "A charge can only come at the end, like SO4^2-.", i, i + 1);
    }
    const width = code >= 0xd800 && code <= 0xdbff && i + 1 < end ? 2 : 1;
    fail("malformed-formula", `"${text.slice(i, i + width)}" has no meaning in a formula.`, i, i + width);
  }
  const open = stack[stack.length - 1];
  if (open.kind === "bracket") {
    fail("unbalanced-brackets", "This bracket is never closed.", open.openAt, open.openAt + 1);
  }
  if (open.kind === "hydrate") closeHydrate(stack, end);
  if (root.items === 0) fail("malformed-formula", "There is no element in this formula.", start, end);
  const normalizedText = wholeBodyBracket ? root.text.slice(1, -1) : root.text;
  // Arrays of the final size: readings are memoised, and a grown array keeps its spare room.
  const composition: FormulaPart[] = new Array(root.counts.size);
  let next = 0;
  for (const [symbol, count] of root.counts) composition[next++] = { symbol, count };
  const writtenSequence = root.parts.slice();
  const body: FormulaBody = root.isotopes
    ? { composition, writtenSequence, normalizedText, isotopes: root.isotopes }
    : { composition, writtenSequence, normalizedText };
  return root.writtenParts ? { ...body, parts: root.writtenParts } : body;
}

function readElement(text: string, i: number, end: number, frame: Frame, root: Frame): number {
  const code = text.charCodeAt(i);
  const twoLetters = i + 1 < end && isLowerLetter(text.charCodeAt(i + 1));
  const symbolEnd = twoLetters ? i + 2 : i + 1;
  const written = text.slice(i, symbolEnd);
  let element = isUpperLetter(code) ? elementBySymbol(written) : undefined;
  if (element === undefined && !twoLetters && hydrogenLabelMass(code) > 0) {
    // D and T are hydrogen-2 and hydrogen-3 ("CDCl3" is C, D, Cl3: Cd needs a lower-case d)
    element = elementBySymbol("H") as ElementData;
    addIsotope(root, { symbol: "H", massNumber: hydrogenLabelMass(code), written });
  }
  if (element === undefined) {
    const why = isLowerLetter(code) ? ": element symbols start with a capital letter" : "";
    fail("unknown-element", `"${written}" is not an element symbol${why}.`, i, symbolEnd);
  }
  // The table's own string: one shared copy per element rather than one per reading.
  const symbol = element.symbol;
  const { value: count, next } = readCount(text, symbolEnd, end);
  frame.parts.push({ symbol, count });
  addCount(frame.counts, symbol, count, i, next);
  frame.text += next > symbolEnd ? `${symbol}${count}` : symbol;
  frame.items++;
  return next;
}

/** Reads ASCII or subscript digits, or a TeX subscript (_2, _{2}); 1 when there are none. */
function readCount(text: string, from: number, end: number): { value: number; next: number } {
  if (from < end && text.charCodeAt(from) === UNDERSCORE) return readSubscriptCount(text, from, end);
  let value = 0;
  let i = from;
  while (i < end) {
    const digit = countDigitValue(text.charCodeAt(i));
    if (digit < 0) break;
    value = value * 10 + digit;
    if (value > MAX_COUNT) fail("malformed-formula", "This count is too large for one species.", from, i + 1);
    i++;
  }
  if (i === from) return { value: 1, next: i };
  if (value === 0) fail("malformed-formula", "A count of zero means the group is not there.", from, i);
  return { value, next: i };
}

function addCount(counts: Map<string, number>, symbol: string, count: number, start: number, end: number): void {
  const total = (counts.get(symbol) ?? 0) + count;
  if (total > MAX_TOTAL_ATOMS) fail("malformed-formula", "This formula has too many atoms to read.", start, end);
  counts.set(symbol, total);
}

function mergeInto(parent: Frame, child: Frame, multiplier: number, start: number, end: number): void {
  if (parent.parts.length + child.parts.length * multiplier > MAX_SEQUENCE_PARTS) {
    fail("malformed-formula", "This formula is too large to expand.", start, end);
  }
  for (let copy = 0; copy < multiplier; copy++) {
    for (const part of child.parts) parent.parts.push(part);
  }
  for (const [symbol, count] of child.counts) addCount(parent.counts, symbol, count * multiplier, start, end);
}

function requireBetweenGroups(text: string, i: number, end: number, frame: Frame, message: string): void {
  const next = i + 1 < end ? text.charCodeAt(i + 1) : 0;
  if (frame.items === 0 || !(isUpperLetter(next) || isOpenBracket(next))) fail("malformed-formula", message, i, i + 1);
}

/** " · 5H2O": spaces are only allowed around the hydrate dot. Returns the index after the coefficient. */
function readHydrateSeparator(text: string, i: number, end: number, stack: Frame[]): number {
  const spaceStart = i;
  while (i < end && isSpace(text.charCodeAt(i))) i++;
  if (i >= end || !isHydrateDot(text.charCodeAt(i))) {
    fail("malformed-formula", "A formula cannot have spaces inside it.", spaceStart, Math.max(i, spaceStart + 1));
  }
  const dotAt = i;
  const frame = stack[stack.length - 1];
  if (frame.kind === "bracket") fail("malformed-formula", "A hydrate dot cannot sit inside brackets.", dotAt, dotAt + 1);
  if (frame.items === 0) fail("malformed-formula", "A hydrate dot needs a formula on each side.", dotAt, dotAt + 1);
  if (frame.kind === "hydrate") closeHydrate(stack, dotAt);
  else frame.writtenParts = [{ count: 1, formula: frame.text }];
  i++;
  while (i < end && isSpace(text.charCodeAt(i))) i++;
  let coefficient = 0;
  const coefficientStart = i;
  while (i < end && countDigitValue(text.charCodeAt(i)) >= 0) {
    coefficient = coefficient * 10 + countDigitValue(text.charCodeAt(i));
    if (coefficient > MAX_COUNT) fail("malformed-formula", "This count is too large for one species.", coefficientStart, i + 1);
    i++;
  }
  const multiplier = i > coefficientStart ? coefficient : 1;
  // "12 H2O": a space may follow the count, as mhchem writes it.
  if (i > coefficientStart) while (i < end && isSpace(text.charCodeAt(i))) i++;
  if (multiplier === 0) fail("malformed-formula", "A count of zero means the group is not there.", coefficientStart, i);
  if (i >= end) fail("malformed-formula", "A hydrate dot needs a formula on each side.", dotAt, i);
  const root = stack[0];
  root.parts.push({ symbol: "·", count: multiplier });
  root.text += multiplier > 1 ? `·${multiplier}` : "·";
  stack.push(newFrame("hydrate", dotAt, 0, multiplier));
  return i;
}

function closeHydrate(stack: Frame[], at: number): void {
  const hydrate = stack.pop() as Frame;
  const root = stack[0];
  if (hydrate.items === 0) fail("malformed-formula", "A hydrate dot needs a formula on each side.", hydrate.openAt, at);
  // The "·" part already carries the multiplier, so the molecule's groups are listed once.
  for (const part of hydrate.parts) root.parts.push(part);
  if (root.parts.length > MAX_SEQUENCE_PARTS) fail("malformed-formula", "This formula is too large to expand.", hydrate.openAt, at);
  for (const [symbol, count] of hydrate.counts) addCount(root.counts, symbol, count * hydrate.multiplier, hydrate.openAt, at);
  root.text += hydrate.text;
  root.items++;
  root.writtenParts?.push({ count: hydrate.multiplier, formula: hydrate.text });
}

/** "_2" or "_{2}": a count written as a TeX subscript outside mhchem. */
function readSubscriptCount(text: string, from: number, end: number): { value: number; next: number } {
  const braced = text.charCodeAt(from + 1) === 0x7b;
  const digitsStart = from + (braced ? 2 : 1);
  let i = digitsStart;
  let value = 0;
  while (i < end && asciiDigit(text.charCodeAt(i)) >= 0) {
    value = value * 10 + asciiDigit(text.charCodeAt(i));
    if (value > MAX_COUNT) fail("malformed-formula", "This count is too large for one species.", from, i + 1);
    i++;
  }
  if (i === digitsStart || (braced && text.charCodeAt(i) !== 0x7d)) {
    fail("malformed-formula", 'A "_" subscript needs a number, like H_2O or H_{2}O.', from, Math.min(end, Math.max(i, from + 1)));
  }
  if (value === 0) fail("malformed-formula", "A count of zero means the group is not there.", from, i);
  return { value, next: braced ? i + 1 : i };
}

function asciiDigit(code: number): number {
  return code >= 0x30 && code <= 0x39 ? code - 0x30 : -1;
}

/** True when the spaces from `i` lead to a hydrate dot, which the hydrate reading owns. */
function spacesBeforeHydrateDot(text: string, i: number, end: number): boolean {
  while (i < end && isSpace(text.charCodeAt(i))) i++;
  return i < end && isHydrateDot(text.charCodeAt(i));
}

function addIsotope(root: Frame, label: IsotopeLabel): void {
  const labels = (root.isotopes ??= []);
  if (!labels.some((known) => known.written === label.written)) labels.push(label);
}

/** The element whose symbol starts at `i` (two letters when a lower-case letter follows). */
function symbolAt(text: string, i: number, end: number): { element: ElementData | undefined; symbolEnd: number } {
  const twoLetters = i + 1 < end && isLowerLetter(text.charCodeAt(i + 1));
  const symbolEnd = twoLetters ? i + 2 : i + 1;
  if (!isUpperLetter(text.charCodeAt(i))) return { element: undefined, symbolEnd };
  const written = text.slice(i, symbolEnd);
  const element = elementBySymbol(written) ?? (!twoLetters && hydrogenLabelMass(text.charCodeAt(i)) > 0 ? elementBySymbol("H") : undefined);
  return { element, symbolEnd };
}

/**
 * A number at the very start: a mass number ("13CO2") when it fits the element that follows,
 * otherwise a count of molecules from an equation, which is refused. Returns where reading goes on.
 */
function leadingMassNumber(text: string, start: number, end: number, root: Frame): number {
  let digitsEnd = start;
  let value = 0;
  while (digitsEnd < end && countDigitValue(text.charCodeAt(digitsEnd)) >= 0 && digitsEnd - start < 4) {
    value = value * 10 + countDigitValue(text.charCodeAt(digitsEnd));
    digitsEnd++;
  }
  const { element, symbolEnd } = digitsEnd < end ? symbolAt(text, digitsEnd, end) : { element: undefined, symbolEnd: digitsEnd };
  const ascii = asciiDigit(text.charCodeAt(start)) >= 0;
  if (element && ascii && countDigitValue(text.charCodeAt(digitsEnd)) < 0 && isLeadingMassNumberOf(value, digitsEnd - start, element)) {
    addIsotope(root, { symbol: element.symbol, massNumber: value, written: text.slice(start, symbolEnd) });
    return digitsEnd;
  }
  while (digitsEnd < end && countDigitValue(text.charCodeAt(digitsEnd)) >= 0) digitsEnd++;
  return fail(
    "malformed-formula",
    "A number in front counts molecules in an equation; write the species alone (an isotope is written ^13C or D).",
    start,
    digitsEnd,
  );
}

/**
 * "^{13}C", "^13C", "¹³C" or mhchem's "^{227}_{90}Th": a mass number (and atomic number) before a
 * symbol. Returns the index of the symbol, or `i` when this is no isotope label.
 */
function isotopePrefix(text: string, i: number, end: number, root: Frame): number {
  let at = i;
  let mass = 0;
  let digits = 0;
  if (text.charCodeAt(at) === CARET) {
    at++;
    const braced = text.charCodeAt(at) === 0x7b;
    if (braced) at++;
    while (at < end && asciiDigit(text.charCodeAt(at)) >= 0 && digits < 4) {
      mass = mass * 10 + asciiDigit(text.charCodeAt(at++));
      digits++;
    }
    if (braced) {
      if (text.charCodeAt(at) !== 0x7d) return i;
      at++;
    }
  } else {
    while (at < end && superscriptDigitValue(text.charCodeAt(at)) >= 0 && digits < 4) {
      mass = mass * 10 + superscriptDigitValue(text.charCodeAt(at++));
      digits++;
    }
  }
  if (digits === 0) return i;
  let atomicNumber = 0;
  if (text.charCodeAt(at) === UNDERSCORE) {
    const subscript = readSubscriptCount(text, at, end);
    atomicNumber = subscript.value;
    at = subscript.next;
  }
  const { element, symbolEnd } = at < end ? symbolAt(text, at, end) : { element: undefined, symbolEnd: at };
  if (element === undefined) return i;
  const written = text.slice(i, symbolEnd);
  if (atomicNumber !== 0 && atomicNumber !== element.atomicNumber) {
    fail(
      "malformed-formula",
      `The atomic number ${atomicNumber} written in ${written} does not match ${element.name} (${element.atomicNumber}).`,
      i,
      symbolEnd,
    );
  }
  if (!isMassNumberOf(mass, element)) {
    fail("malformed-formula", `${mass} is not a mass number of ${element.name} (atomic number ${element.atomicNumber}).`, i, symbolEnd);
  }
  // "^2D" would label twice; the element read next is the plain symbol
  if (element.symbol === "H" && text.charCodeAt(at) !== 0x48) return i;
  addIsotope(root, { symbol: element.symbol, massNumber: mass, written });
  return at;
}
