/**
 * Hand-written scanner for the body of a formula (everything before the charge): element symbols,
 * counts, nested brackets, bond marks of condensed formulas and the hydrate dot. One pass, no
 * regular expressions, work bounded by the input length and the expansion limits below.
 */
import { elementBySymbol } from "../elements";
import type { FormulaPart, Problem, WrittenPart } from "../types";
import {
  bondMark,
  closingFor,
  countDigitValue,
  isCloseBracket,
  isHydrateDot,
  isLowerLetter,
  isOpenBracket,
  isSpace,
  isUpperLetter,
  signValue,
  superscriptDigitValue,
} from "./characters";
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
}

export type FormulaBodyResult =
  | { readonly ok: true; readonly value: FormulaBody }
  | { readonly ok: false; readonly problem: Problem };

/** A written count above this is a typing accident. */
const MAX_COUNT = 100_000;
/** Limits that keep nested multipliers like ((((H9)9)9)9) from blowing up memory. */
const MAX_SEQUENCE_PARTS = 10_000;
const MAX_TOTAL_ATOMS = 1_000_000;

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
  if (countDigitValue(text.charCodeAt(start)) >= 0) {
    let digitsEnd = start;
    while (digitsEnd < end && countDigitValue(text.charCodeAt(digitsEnd)) >= 0) digitsEnd++;
    fail(
      "malformed-formula",
      "A number in front counts molecules in an equation; write the species alone.",
      start,
      digitsEnd,
    );
  }
  const root = newFrame("root", start, 0, 1);
  const stack: Frame[] = [root];
  let wholeBodyBracket = false;
  let i = start;
  while (i < end) {
    const code = text.charCodeAt(i);
    const frame = stack[stack.length - 1];
    if (isUpperLetter(code) || isLowerLetter(code)) {
      i = readElement(text, i, end, frame);
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
    if (code === 0x2d) {
      // A dash between groups ("CH3-CH3") is a single bond: adjacency already says so.
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
  const body: FormulaBody = { composition, writtenSequence: root.parts.slice(), normalizedText };
  return root.writtenParts ? { ...body, parts: root.writtenParts } : body;
}

function readElement(text: string, i: number, end: number, frame: Frame): number {
  const code = text.charCodeAt(i);
  const twoLetters = i + 1 < end && isLowerLetter(text.charCodeAt(i + 1));
  const symbolEnd = twoLetters ? i + 2 : i + 1;
  const written = text.slice(i, symbolEnd);
  const element = isUpperLetter(code) ? elementBySymbol(written) : undefined;
  if (element === undefined) fail("unknown-element", `"${written}" is not an element symbol.`, i, symbolEnd);
  // The table's own string: one shared copy per element rather than one per reading.
  const symbol = element.symbol;
  const { value: count, next } = readCount(text, symbolEnd, end);
  frame.parts.push({ symbol, count });
  addCount(frame.counts, symbol, count, i, next);
  frame.text += next > symbolEnd ? `${symbol}${count}` : symbol;
  frame.items++;
  return next;
}

/** Reads ASCII or subscript digits; 1 when there are none. */
function readCount(text: string, from: number, end: number): { value: number; next: number } {
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
