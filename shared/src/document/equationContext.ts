/**
 * Equations written in plain text: "2H2 + O2 → 2H2O", "C + O2 -> CO2", "2 Al + Fe2O3 → Al2O3 + 2 Fe".
 * There a coefficient may be glued to a formula and a lone element symbol is a reactant; in prose
 * neither holds ("3D", "vitamin C", "grade B").
 */
import { elementBySymbol } from "../chemistry/elements";
import { hasScriptMarkup, withUnicodeScripts } from "../chemistry/reader/markupScripts";
import { isConfidentToken, shapeOf, type TokenShape } from "./proseTokenRules";

/** How far along the line an arrow is looked for. */
const LINE_REACH = 160;

/** Arrows as typed or as Unicode: ->, -->, =>, <->, <=>, →, ⟶, ⇌, ⇄, ↔, ⇒. */
const ARROW = /(?:^|[\s\w)\]])(?:-+>|=+>|<-+>|<=+>)(?=[\s\w([]|$)|[\u2192\u27f6\u21cc\u21c4\u2194\u21d2\u27f7]/;

/** True when the line around `[start, end)` holds a reaction arrow. */
export function isOnEquationLine(text: string, start: number, end: number): boolean {
  // Searched within a bounded window: a document without line breaks must not cost a pass per token.
  const windowStart = Math.max(0, start - LINE_REACH);
  const before = text.slice(windowStart, start);
  const after = text.slice(end, Math.min(text.length, end + LINE_REACH));
  const lineBreakBefore = before.lastIndexOf("\n");
  const lineBreakAfter = after.indexOf("\n");
  const line = before.slice(lineBreakBefore + 1) + text.slice(start, end) + (lineBreakAfter < 0 ? after : after.slice(0, lineBreakAfter));
  return ARROW.test(line);
}

/** An operator word of an equation: "+", "=", an arrow. */
function isOperatorWord(word: string): boolean {
  return word === "+" || word === "=" || /^(?:-+>|=+>|<-+>|<=+>|[\u2192\u27f6\u21cc\u21c4\u2194\u21d2\u27f7])$/.test(word);
}

/** The whitespace-separated word before `start` on the same line, or "". */
function wordBefore(text: string, start: number): { word: string; start: number } {
  let end = start;
  while (end > 0 && (text[end - 1] === " " || text[end - 1] === "\t")) end--;
  let wordStart = end;
  while (wordStart > 0 && !/\s/.test(text[wordStart - 1])) wordStart--;
  return { word: text.slice(wordStart, end), start: wordStart };
}

/** The whitespace-separated word after `end` on the same line, or "". */
function wordAfter(text: string, end: number): { word: string; end: number } {
  let start = end;
  while (start < text.length && (text[start] === " " || text[start] === "\t")) start++;
  let wordEnd = start;
  while (wordEnd < text.length && !/\s/.test(text[wordEnd])) wordEnd++;
  return { word: text.slice(start, wordEnd), end: wordEnd };
}

/** The shape of a word that may be a formula, without coefficient, state symbol or punctuation. */
function formulaShapeOf(word: string): { bare: string; body: string; shape: TokenShape } | undefined {
  const plain = hasScriptMarkup(word) ? withUnicodeScripts(word) : word;
  if (plain === undefined) return undefined;
  const bare = plain
    .replace(/^\d{1,2}(?=[A-Z])/, "")
    .replace(/[,.;:]$/, "")
    .replace(/\((?:aq|s|l|g)\)$/, "");
  const match = /^([A-Z][A-Za-z0-9()\u2080-\u2089]*?)((?:\^?\d?[+\-\u2212]{1,2})?)$/.exec(bare);
  if (!match) return undefined;
  const shape = shapeOf(match[1], match[2]);
  return shape && { bare, body: match[1], shape };
}

/**
 * True when the lone symbol at `[start, end)` stands as a reactant or product: next to a "+" or an
 * arrow whose other side is a formula too, on a line with an arrow or beside a formula that
 * carries a count ("2 Al + Fe2O3"). "Grade B → grade A" and "vitamin C + zinc" stay prose.
 */
export function isLoneReactant(text: string, start: number, end: number): boolean {
  if (end - start === 1 && isPlaceholderEquation(text, start, end)) return false;
  let before = wordBefore(text, start);
  // A separate coefficient: "2 Al + ...".
  if (/^\d{1,2}$/.test(before.word)) before = wordBefore(text, before.start);
  const after = wordAfter(text, end);
  const operatorBefore = isOperatorWord(before.word);
  const operatorAfter = isOperatorWord(after.word);
  if (!operatorBefore && !operatorAfter) return false;
  let across = operatorAfter ? wordAfter(text, after.end).word : wordBefore(text, before.start).word;
  if (/^\d{1,2}$/.test(across)) across = operatorAfter ? wordAfter(text, wordAfter(text, after.end).end).word : across;
  const other = formulaShapeOf(across);
  if (!other) return false;
  if (isOnEquationLine(text, start, end)) return true;
  return (other.shape.hasCount || other.shape.hasCharge) && isConfidentToken(other.bare, other.body, other.shape);
}

/**
 * True when the equation around `[start, end)` is written in letters that stand for species: one of
 * its terms holds a capital that is no element ("A + B → C", "X + Y2 → XY2", "R + O2 → RO2"). There
 * a single letter that happens to be a symbol (B, C, Y) is a placeholder too.
 */
function isPlaceholderEquation(text: string, start: number, end: number): boolean {
  const windowStart = Math.max(0, start - LINE_REACH);
  const lineStart = text.lastIndexOf("\n", start - 1) + 1;
  const lineEndAt = text.indexOf("\n", end);
  const line = text.slice(Math.max(windowStart, lineStart), Math.min(lineEndAt < 0 ? text.length : lineEndAt, end + LINE_REACH));
  const words = line.split(/[ \t]+/);
  for (let index = 0; index < words.length; index++) {
    if (!isOperatorWord(words[index])) continue;
    for (const neighbour of [termBefore(words, index), termAfter(words, index)]) {
      if (neighbour !== undefined && hasNonElementCapital(neighbour)) return true;
    }
  }
  return false;
}

/** The term before the operator at `index`, past a separate coefficient. */
function termBefore(words: readonly string[], index: number): string | undefined {
  const word = words[index - 1];
  return word !== undefined && /^\d{1,2}$/.test(word) ? words[index - 2] : word;
}

/** The term after the operator at `index`, past a separate coefficient. */
function termAfter(words: readonly string[], index: number): string | undefined {
  const word = words[index + 1];
  return word !== undefined && /^\d{1,2}$/.test(word) ? words[index + 2] : word;
}

/** "A", "XY2", "RO2": a formula-shaped term with a capital that starts no element symbol. */
function hasNonElementCapital(word: string): boolean {
  const term = formulaShapeOf(word);
  return term !== undefined && term.shape.symbols.some((symbol) => elementBySymbol(symbol) === undefined);
}

/**
 * True when digits glued to a formula at `[digitsStart, formulaStart)` are a coefficient
 * ("2H2O" in "2H2 + O2 → 2H2O"): one or two digits, not starting with 0, on an equation line.
 */
export function isGluedCoefficient(text: string, digitsStart: number, formulaStart: number): boolean {
  const length = formulaStart - digitsStart;
  if (length < 1 || length > 2 || text.charCodeAt(digitsStart) === 0x30) return false;
  return isOnEquationLine(text, digitsStart, formulaStart);
}
