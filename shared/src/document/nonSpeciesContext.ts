/**
 * Formula-shaped tokens that are something else in their sentence: functional-group fragments
 * (R–OH, Ar–NH₂, –COOCH₃, "the NO₂ group", "2H, OCH₂" in an NMR list), sample and run ids in a
 * series (N1, N2), and alloy designations (Ti6Al4V).
 */
import { fitsOpenBonds } from "../chemistry/analysis/saturation";
import { elementBySymbol } from "../chemistry/elements";
import type { FormulaPart } from "../chemistry/types";
import { NONMETALS } from "../chemistry/reader/nonmetals";

/** Dashes that write a bond to a substituent: hyphen, en dash, em dash, figure dash, minus. */
function isBondDash(code: number): boolean {
  return code === 0x2d || code === 0x2013 || code === 0x2014 || code === 0x2012 || code === 0x2212;
}

function isUpper(code: number): boolean {
  return code >= 0x41 && code <= 0x5a;
}

function isSpace(code: number): boolean {
  return code === 0x20 || code === 0x09 || code === 0x0a || code === 0x0d || code === 0xa0 || Number.isNaN(code);
}

/** Words after a formula that make it a group of a larger molecule. */
const GROUP_WORDS = /^[\s)]*(?:groups?|substituents?|moiety|moieties|side[- ]chains?)\b/i;

/** Words before a formula, in "a nitro group (NO₂)" or "group NO₂". */
const GROUP_BEFORE = /\b(?:groups?|substituents?|moiety)\s*\(\s*$|\b(?:group|substituent)\s+$/i;

/**
 * Words that name a piece of a larger molecule only sometimes: "the OCH₃ fragment" and "CH₂ units"
 * are groups, but "SF₄ fragments" from a discharge or a mass spectrum are molecules of their own.
 */
const PIECE_WORDS = /^[\s)]*(?:fragments?|residues?|units?)\b/i;
// Not "unit (": "the destruct unit (MnO2 catalyst)" names a part of an apparatus.
const PIECE_BEFORE = /\b(?:fragments?|residues?)\s*\(\s*$/i;

/** Words after a formula that say the writer knows it is a piece or a radical: "CH₃ radicals". */
const OPEN_SHELL_WORDS = /^[\s)]*(?:fragments?|residues?|units?|radicals?)\b/i;

/**
 * True when the writer calls the formula at `[start, end)` a fragment, residue, unit or radical:
 * an open valence or an odd electron there is what they mean, no mistake to report.
 */
export function isCalledAPiece(text: string, start: number, end: number): boolean {
  return OPEN_SHELL_WORDS.test(text.slice(end, end + 16)) || PIECE_BEFORE.test(text.slice(Math.max(0, start - 30), start));
}

/** The "nH, " of an NMR assignment list: "(q, 2H, OCH₂)". */
const NMR_PROTONS = /\b\d{1,2}H,\s*$/;

/** Placeholders written before a bond dash: R, R', R₁, Ar. */
const PLACEHOLDER_BEFORE = /(?:^|[^A-Za-z])(?:R[\u2032'\u2081\u2082\d]?|Ar)$/;

/**
 * True when the formula at `[start, end)` is written as part of a larger molecule: after a bond
 * dash that opens a word or follows R or Ar ("–COOCH₃", "R–OH", "Ar–NH₂"), as Ar before a bond
 * dash to another group ("Ar–OH"), named a group, listed in an NMR assignment, or called a
 * fragment, residue or unit when it is open as written (`charged`: the token carries a charge).
 */
export function isGroupFragment(text: string, start: number, end: number, body: string, charged: boolean): boolean {
  const before = text.charCodeAt(start - 1);
  if (isBondDash(before)) {
    const beforeDash = text.slice(Math.max(0, start - 6), start - 1);
    if (isSpace(text.charCodeAt(start - 2)) || text.charCodeAt(start - 2) === 0x28 || PLACEHOLDER_BEFORE.test(beforeDash)) return true;
  }
  if (body === "Ar" && isBondDash(text.charCodeAt(end)) && isUpper(text.charCodeAt(end + 1))) return true;
  const after = text.slice(end, end + 16);
  if (GROUP_WORDS.test(after)) return true;
  const lookBack = text.slice(Math.max(0, start - 30), start);
  if (GROUP_BEFORE.test(lookBack) || NMR_PROTONS.test(lookBack)) return true;
  return (PIECE_WORDS.test(after) || PIECE_BEFORE.test(lookBack)) && !charged && isCutFromBond(body);
}

/**
 * Whether an uncharged formula is open where it was cut from a molecule, as a group is: an odd
 * number of electrons (CH₃, OCH₃, C₆H₅, COOH, NO₂), or atoms that cannot all reach their usual
 * valence on their own (CH₂, NH, CF₂), while a molecule that holds together on its own is closed
 * (SF₄, CO₂, H₂O). A formula that cannot be counted is taken for a group, as before.
 */
function isCutFromBond(body: string): boolean {
  const composition = compositionOf(body);
  if (composition === undefined) return true;
  let electrons = 0;
  for (const part of composition) electrons += elementBySymbol(part.symbol)!.atomicNumber * part.count;
  return electrons % 2 === 1 || fitsOpenBonds(composition, 0) === false;
}

/** The atoms of the neutral formula `body` (symbols, counts, brackets), or undefined when it does not read so. */
function compositionOf(body: string): FormulaPart[] | undefined {
  const counts: Map<string, number>[] = [new Map()];
  const parts =
    body.replace(/[\u2080-\u2089]/g, (digit) => String(digit.charCodeAt(0) - 0x2080)).match(/[A-Z][a-z]?|\d+|[([]|[)\]]|./g) ?? [];
  let last = new Map<string, number>();
  for (const part of parts) {
    const current = counts[counts.length - 1];
    if (/^\d+$/.test(part)) {
      for (const [symbol, count] of last) current.set(symbol, (current.get(symbol) ?? 0) + count * (Number(part) - 1));
      last = new Map();
    } else if (part === "(" || part === "[") {
      counts.push(new Map());
      last = new Map();
    } else if (part === ")" || part === "]") {
      if (counts.length < 2) return undefined;
      last = counts.pop()!;
      const outer = counts[counts.length - 1];
      for (const [symbol, count] of last) outer.set(symbol, (outer.get(symbol) ?? 0) + count);
    } else {
      if (!elementBySymbol(part)) return undefined;
      current.set(part, (current.get(part) ?? 0) + 1);
      last = new Map([[part, 1]]);
    }
  }
  if (counts.length !== 1) return undefined;
  return [...counts[0]].map(([symbol, count]) => ({ symbol, count }));
}

/** A series of ids is looked for in blocks of this many characters around a token. */
const SERIES_BLOCK = 1024;

/** What was found out about id series, per symbol and block, for one scan of one text. */
export type SeriesMemo = Map<string, boolean>;

/**
 * True when a one-element token with a count ("N2", "O2") sits where the same letter numbered 1
 * also stands alone ("Runs N1, N2"): a series of sample or run ids, as no formula is written X1.
 * Looked for in the token's block and the blocks either side, each block searched once per scan.
 */
export function isSeriesId(text: string, start: number, symbols: readonly string[], memo: SeriesMemo): boolean {
  if (symbols.length !== 1) return false;
  const symbol = symbols[0];
  const block = Math.floor(start / SERIES_BLOCK);
  for (let near = block - 1; near <= block + 1; near++) {
    if (near >= 0 && blockHasFirstId(text, symbol, near, memo)) return true;
  }
  return false;
}

function blockHasFirstId(text: string, symbol: string, block: number, memo: SeriesMemo): boolean {
  const key = `${symbol} ${block}`;
  const known = memo.get(key);
  if (known !== undefined) return known;
  const from = block * SERIES_BLOCK;
  const window = text.slice(Math.max(0, from - 1), Math.min(text.length, from + SERIES_BLOCK + 2));
  const first = `${symbol}1`;
  let found = false;
  for (let at = window.indexOf(first); at >= 0 && !found; at = window.indexOf(first, at + 1)) {
    const previous = window.charCodeAt(at - 1);
    const next = window.charCodeAt(at + first.length);
    found = !isWordCode(previous) && !isWordCode(next) && next !== 0x2b && next !== 0x2d;
  }
  memo.set(key, found);
  return found;
}

function isWordCode(code: number): boolean {
  return (code >= 0x30 && code <= 0x39) || (code >= 0x41 && code <= 0x5a) || (code >= 0x61 && code <= 0x7a);
}

/** True for an alloy designation: three or more different metals and no nonmetal (Ti6Al4V). */
export function isAlloyDesignation(symbols: readonly string[]): boolean {
  const distinct = new Set(symbols);
  if (distinct.size < 3) return false;
  for (const symbol of distinct) if (NONMETALS.has(symbol)) return false;
  return true;
}
