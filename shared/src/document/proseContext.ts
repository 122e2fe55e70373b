/**
 * Looks around a candidate token: codes glued to digits (KR-0412, run_SF6), file names, and the
 * shouting or address contexts ("NO SMOKING", "Golden, CO") where all-capital tokens are words.
 */
import { isConfidentToken } from "./proseTokenRules";

function isDigit(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}

function isAlphanumeric(code: number): boolean {
  return isDigit(code) || (code >= 0x41 && code <= 0x5a) || (code >= 0x61 && code <= 0x7a);
}

/** True when the token at `[start, end)` is glued into an identifier, code or file name. */
export function isPartOfCode(text: string, start: number, end: number): boolean {
  const after = text.charCodeAt(end);
  const afterNext = text.charCodeAt(end + 1);
  const before = text.charCodeAt(start - 1);
  const beforePrevious = text.charCodeAt(start - 2);
  // "-" and "_" joining digits: lot codes and sample ids such as KR-0412 or CO-07.
  if ((after === 0x2d || after === 0x5f) && isDigit(afterNext)) return true;
  if ((before === 0x2d || before === 0x5f) && isDigit(beforePrevious)) return true;
  // Identifiers: run_SF6, SF6_flow.
  if (after === 0x5f && isAlphanumeric(afterNext)) return true;
  if (before === 0x5f && isAlphanumeric(beforePrevious)) return true;
  // File names and dotted paths: SF6.csv, data.NF3.
  if (after === 0x2e && isAlphanumeric(afterNext)) return true;
  if (before === 0x2e && isAlphanumeric(beforePrevious)) return true;
  // Method/basis pairs: HF/6-31G.
  if (after === 0x2f && isDigit(afterNext)) return true;
  // Tags and variables: #SF6, $NO, @HF.
  return before === 0x23 || before === 0x24 || before === 0x40;
}

const LOOK_AROUND = 40;

/**
 * The letters-only word just before `start`, skipping spaces and punctuation; none when its
 * letters run on into a count (the "SO" of "SO2 + 4 HF" or "SO~2~ + 4 HF" is a formula, not a
 * shouted word).
 */
function wordBefore(text: string, start: number): string {
  const from = Math.max(0, start - LOOK_AROUND);
  const match = /([A-Za-z]+)([^A-Za-z\n]*)$/.exec(text.slice(from, start));
  return match && !/^[0-9~_^{<\\]/.test(match[2]) ? match[1] : "";
}

/** The letters-only word just after `end`, skipping spaces and punctuation; none when it runs on into a count. */
function wordAfter(text: string, end: number): string {
  const match = /^[^A-Za-z\n]*([A-Za-z]+)(?![A-Za-z0-9~_^{<\\])/.exec(text.slice(end, end + LOOK_AROUND));
  return match ? match[1] : "";
}

function isShouted(word: string): boolean {
  return (
    word.length >= 2 &&
    /^[A-Z]+$/.test(word) &&
    !isConfidentToken(word, word, {
      symbols: word.match(/[A-Z][a-z]?/g) ?? [],
      hasCount: false,
      hasCharge: false,
    })
  );
}

/**
 * True when a digit-free all-capital token sits among shouted words ("DO NOT USE NO") or after a
 * town name as a state code ("Golden, CO 80401").
 */
export function isWordContext(text: string, start: number, end: number): boolean {
  if (isShouted(wordBefore(text, start)) || isShouted(wordAfter(text, end))) return true;
  const before = text.slice(Math.max(0, start - LOOK_AROUND), start);
  return /[A-Z][a-z]+,[ \t]*$/.test(before) && /^(?:[ \t]+\d{5}|[ \t]*(?:[.;)\r\n]|$))/.test(text.slice(end, end + 8));
}

/** How far around a word-like formula the chemistry it needs may sit, on the same line. */
const CHEMICAL_LOOK_AROUND = 80;

/** Words for binary compounds and their anions: "tin(II) oxide (SnO)", "indium nitride". */
const COMPOUND_WORD =
  /(?:^|[^A-Za-z])(?:oxide|nitride|sulfide|sulphide|selenide|telluride|chloride|fluoride|bromide|iodide|phosphide|arsenide|carbide|hydroxide)s?(?![A-Za-z])/i;
/** A Stock numeral glued to a word: "tin(II)", "iron(III)". */
const STOCK_NUMERAL = /[a-z]\((?:I|II|III|IV|V|VI|VII|VIII)\)/;
/** Formula-shaped tokens with a count: "SnO2", "SnCl2·2H2O", "In2O3". */
const COUNTED_FORMULA = /(?<![A-Za-z0-9])[A-Z][A-Za-z0-9()[\]]*\d[A-Za-z0-9()[\]]*/g;

/**
 * True when the line around a word-like formula (SnO, InN) is about chemistry: a compound word
 * (oxide, nitride...), a Stock numeral, or another counted formula of the same first element
 * (SnO beside SnO2). "SnO" in a sentence with none of these stays a word.
 */
export function isChemicalContext(text: string, start: number, end: number, firstSymbol: string): boolean {
  const lineStart = Math.max(text.lastIndexOf("\n", start - 1) + 1, start - CHEMICAL_LOOK_AROUND);
  const newline = text.indexOf("\n", end);
  const lineEnd = Math.min(newline < 0 ? text.length : newline, end + CHEMICAL_LOOK_AROUND);
  const around = text.slice(lineStart, start) + " " + text.slice(end, lineEnd);
  if (COMPOUND_WORD.test(around) || STOCK_NUMERAL.test(around)) return true;
  for (const match of around.matchAll(COUNTED_FORMULA)) {
    const token = match[0];
    const after = token.charCodeAt(firstSymbol.length);
    if (token.startsWith(firstSymbol) && !(after >= 0x61 && after <= 0x7a)) return true;
  }
  return false;
}
