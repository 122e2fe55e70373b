/**
 * Precision rules for formula-like tokens in running prose. Prose is full of words and codes that
 * happen to spell element symbols (I, He, In, As, No, US, NaN, IV, B2, KR-0412); a token counts
 * only when its shape makes the chemistry unmistakable.
 */

/** Single-element molecules that people write with a count: H2, Cl2, O3, S8, C60. */
const HOMONUCLEAR = new Set(["H2", "D2", "N2", "O2", "O3", "F2", "Cl2", "Br2", "I2", "P4", "S8", "C60", "C70"]);

/** Lone atoms whose symbols are not English words or everyday abbreviations. */
const LONE_ATOMS = new Set(["Xe", "Kr", "Ar", "Ne", "Rn"]);

/** All-capital species without digits that chemists write often enough to trust. */
const CAPITAL_SPECIES = new Set(["CO", "NO", "HF", "HCN", "OCS", "COS", "KI", "KF", "KOH", "KCN"]);

/** Single-letter symbols that also serve as grades, rails and labels (B+, C-, V+, U+00B7). */
const LABEL_LETTERS = new Set(["A", "B", "C", "D", "E", "G", "J", "L", "M", "P", "Q", "R", "T", "U", "V", "W", "X", "Y", "Z"]);

/** Mixed-case words and abbreviations that spell valid-looking symbol sequences but are not species. */
const NOT_SPECIES = new Set([
  "NaN",
  "HeLa",
  "HeNe",
  "BSc",
  "NiCd",
  "CoA",
  "CoV",
  "GeV",
  "TeV",
  "PhD",
  "InN",
  "SiN",
  "BaSh",
  "NiCo",
  "CaRe",
  "PuB",
  "ScI",
  "SnO",
  "InN",
  "ArXiv",
]);

/**
 * Entries of the list above that are also real compounds (tin(II) oxide, indium nitride): they
 * count only where the words around them are about chemistry (see isChemicalContext).
 */
const WORDLIKE_COMPOUNDS = new Set(["SnO", "InN"]);

/** Whether `body` is a compound whose formula also spells an ordinary word or abbreviation. */
export function isWordlikeCompound(body: string): boolean {
  return WORDLIKE_COMPOUNDS.has(body);
}

/** What the shape of a token says, before the reader has a look. */
export interface TokenShape {
  /** Element-symbol-shaped parts in order ("Cl", "F"). */
  readonly symbols: readonly string[];
  readonly hasCount: boolean;
  readonly hasCharge: boolean;
}

const SYMBOL_PATTERN = /[A-Z][a-z]?/g;
const BODY_PART = /[A-Z][a-z]?|[0-9\u2080-\u2089]+|[()[\]\u00b7]/g;
// A count written as 1 or with a leading zero, or one past 99: codes, not formulas.
const IMPLAUSIBLE_COUNT = /(?:^|[^0-9\u2080-\u2089])(?:[1\u2081](?![0-9\u2080-\u2089])|[0\u2080]|[0-9\u2080-\u2089]{3,})/;

/** The token's shape, or undefined when it is not built from symbol-like parts at all. */
export function shapeOf(body: string, charge: string): TokenShape | undefined {
  // Every character must belong to a symbol, a count, a bracket or a hydrate dot: "The" is Th + e.
  if (!/^[([]*[A-Z]/.test(body) || body.replace(BODY_PART, "") !== "") return undefined;
  const symbols = body.match(SYMBOL_PATTERN) ?? [];
  const hasCount = /[0-9\u2080-\u2089]/.test(body);
  return { symbols, hasCount, hasCharge: charge.length > 0 };
}

/** Whether a prose token of this shape is confidently a species (the reader still has to agree). */
export function isConfidentToken(token: string, body: string, shape: TokenShape): boolean {
  if (NOT_SPECIES.has(body)) return false;
  if (shape.hasCount && IMPLAUSIBLE_COUNT.test(body.replace(/^[([]+/, ""))) return false;
  const distinct = new Set(shape.symbols).size;
  if (shape.hasCharge) {
    if (distinct > 1 || shape.hasCount) return true;
    // "Ca2+" carries its charge size; a bare "B+" or "C-" is far more often a grade.
    return !LABEL_LETTERS.has(shape.symbols[0]) || /\d/.test(token);
  }
  if (shape.hasCount) return distinct > 1 || HOMONUCLEAR.has(body) || HOMONUCLEAR.has(withAsciiDigits(body));
  if (shape.symbols.length === 1) return LONE_ATOMS.has(body);
  const allCapitals = shape.symbols.every((symbol) => symbol.length === 1);
  if (allCapitals) return CAPITAL_SPECIES.has(body);
  return distinct > 1;
}

/** "O₂" -> "O2": subscript digits as ASCII. */
function withAsciiDigits(body: string): string {
  return body.replace(/[\u2080-\u2089]/g, (digit) => String.fromCharCode(digit.charCodeAt(0) - 0x2080 + 0x30));
}

/** True for digit-free all-capital tokens (CO, HF), which need a calmer context than the rest. */
export function needsCalmContext(body: string, shape: TokenShape): boolean {
  return !shape.hasCount && !shape.hasCharge && shape.symbols.every((symbol) => symbol.length === 1);
}
