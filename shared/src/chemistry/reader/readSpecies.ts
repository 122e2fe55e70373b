/**
 * The species reader: one species, written any way people write it, to plain data.
 *
 * Accepts formulas (SF4, Ca(OH)2, CH3COOH, CH2=CH2, CuSO4·5H2O), charges in every common spelling
 * (NH4+, SO4^2-, SO4 2-, SO4(2-), [PO4]3-, SO4--, SO₄²⁻), mhchem spans (\ce{SO4^2-}) and names
 * (water, sulfur tetrafluoride, sulfate, calcium chloride). Never throws: bad input comes back as
 * `{ ok: false, problem }` with a stable code.
 *
 * The `formula` of a reading is the written formula made canonical: ASCII digits, "≡" for a triple
 * bond, "·" for the hydrate dot, single-bond dashes and a bracket around the whole species dropped,
 * and the charge as "^+", "^2-". For a plain formula this is its composition in first-appearance
 * order ("H2SO4", "SO4^2-", "NH4^+"); a condensed formula keeps its written groups ("CH3COOH",
 * "(CH3)2CO", "Ca(OH)2").
 */
import { parseSmiles, smilesNetCharge } from "../smiles";
import { elementBySymbol } from "../elements";
import type { FormulaPart, PhysicalState, ReadResult, SpeciesReading, TextRange } from "../types";
import { isAsciiLetter, isInvisibleFormatting, isLowerLetter, isSpace } from "./characters";
import { chargeText } from "./chargeText";
import { stockCation, stockNumeralValue } from "./names/metalCations";
import { matchName, nameForFormula, normalizeName, type NameMatch } from "./names/nameLookup";
import { suggestName } from "./names/nameSuggestion";
import { hasLatexMarkup, latexToPlain } from "./latexFormula";
import { hasScriptMarkup, withUnicodeScripts } from "./markupScripts";
import { LAB_ABBREVIATIONS } from "./names/synonyms";
import { problemAt } from "./problem";
import { readableRecasings, readFormulaSpan, withRespellings } from "./readFormula";
import { radicalDotAt, radicalDotMismatch } from "./radicalDot";
import { readStateSuffix } from "./stateSymbol";

/** Longer input is not one species; the limit also bounds the work one call can do. */
export const MAX_SPECIES_INPUT = 1000;

const MHCHEM_OPEN = "\\ce{";

/** Reads one species from `text`; the reading's range excludes surrounding whitespace. */
export function readSpecies(text: string): ReadResult {
  // Documents and tables name the same species over and over; results are immutable data.
  const cached = typeof text === "string" ? readMemo.get(text) : undefined;
  if (cached) return cached;
  const result = readSpeciesUncached(text);
  if (typeof text === "string" && text.length <= MEMO_MAX_TEXT) {
    if (readMemo.size >= MEMO_LIMIT) readMemo.clear();
    readMemo.set(text, result);
  }
  return result;
}

// Bound: at most 20,000 readings of texts up to 120 characters; the memo is emptied when full.
const MEMO_LIMIT = 20_000;
const MEMO_MAX_TEXT = 120;
const readMemo = new Map<string, ReadResult>();

function readSpeciesUncached(text: string): ReadResult {
  if (typeof text !== "string") {
    return { ok: false, problem: problemAt("empty-input", "There is nothing to read.", 0, 0) };
  }
  if (text.length > MAX_SPECIES_INPUT) {
    return {
      ok: false,
      problem: problemAt(
        "input-too-long",
        `This is longer than ${MAX_SPECIES_INPUT} characters, too long for one species.`,
        0,
        text.length,
      ),
    };
  }
  for (let i = 0; i < text.length; i++) {
    if (isInvisibleFormatting(text.charCodeAt(i))) return readWithoutInvisible(text);
  }
  return readVisible(text);
}

function readVisible(text: string): ReadResult {
  let start = 0;
  let end = text.length;
  while (start < end && isSpace(text.charCodeAt(start))) start++;
  while (end > start && isSpace(text.charCodeAt(end - 1))) end--;
  if (start === end) {
    return { ok: false, problem: problemAt("empty-input", "There is nothing to read.", start, start) };
  }
  if (hasScriptMarkup(text)) {
    const scripted = readScriptMarkup(text, start, end);
    if (scripted) return scripted;
  }
  if (text.startsWith(MHCHEM_OPEN, start)) return withName(readMhchem(text, start, end));
  // "DCM", "EtOH": exact case only, and before the formula reader sees "AcOH" as actinium
  const abbreviated = end - start <= 6 ? LAB_ABBREVIATIONS.get(text.slice(start, end)) : undefined;
  if (abbreviated !== undefined) return readName(text, start, end, abbreviated);
  if (hasLatexMarkup(text)) {
    const plain = latexToPlain(text.slice(start, end));
    if (plain !== undefined && plain.length > 0 && plain !== text.slice(start, end)) return readConverted(plain, text, start, end);
  }
  const stated = text.charCodeAt(end - 1) === 0x29 ? readStateSuffix(text, start, end) : undefined;
  const nameEnd = stated ? stated.bodyEnd : end;
  const stock = readStockNumeral(text, start, nameEnd);
  if (stock !== undefined) return stock.ok && stated ? withState(stock.value, text, start, end, stated.state) : stock;
  if (looksLikeName(text, start, nameEnd)) {
    const named = readName(text, start, nameEnd);
    if (!named.ok || stated === undefined) return named;
    return withState(named.value, text, start, end, stated.state);
  }
  const dot = radicalDotAt(text, start, end);
  if (dot >= 0) return readRadical(text, start, end, dot);
  const formula = withName(readFormulaSpan(text, start, end, "formula"));
  // Inventories write names in capitals ("ACETONE", "COPPER SULFATE"): a name, when no formula
  if (!formula.ok && end - start >= 4 && isCapitalWords(text, start, end)) {
    const named = readName(text, start, end);
    if (named.ok) return named;
  }
  return formula;
}

/**
 * "Fe(III)", "Cu(II)", "Cr(VI)": an element symbol with a Stock numeral, as lab reports name an
 * element in an oxidation state, never iodine or vanadium in brackets. A metal's is its cation
 * (Fe^3+); a nonmetal's names no one species. Undefined for any other text.
 */
function readStockNumeral(text: string, start: number, end: number): ReadResult | undefined {
  const match = STOCK_NUMERAL.exec(text.slice(start, end));
  const element = match ? elementBySymbol(match[1]) : undefined;
  const oxidationState = match ? stockNumeralValue(match[2]) : 0;
  if (!match || element === undefined || oxidationState === 0) return undefined;
  const cation = stockCation(element.symbol, oxidationState);
  if (cation === undefined) {
    const message =
      `${match[0]} is ${element.name.toLowerCase()} in the +${oxidationState} oxidation state, which many species share: ` +
      "write the molecule or ion meant to see its shape.";
    return { ok: false, problem: problemAt("oxidation-state", message, start, end) };
  }
  const formula = cation.body + chargeText(cation.charge);
  const cationReading = withName(readFormulaSpan(formula, 0, formula.length, "formula"));
  if (!cationReading.ok) return undefined;
  return { ok: true, value: { ...cationReading.value, text: match[0], range: { start, end } } };
}

const STOCK_NUMERAL = /^([A-Z][a-z]?)\(([IViv]{1,4})\)$/;

/** `reading` placed over the whole of `text[start, end)`, whose state symbol it leaves out. */
function withState(reading: SpeciesReading, text: string, start: number, end: number, state: PhysicalState): ReadResult {
  return { ok: true, value: { ...reading, text: text.slice(start, end), range: { start, end }, state } };
}

/** "Cl•", "•OH", "O2•-": the species without its radical dot, placed over the whole written text. */
function readRadical(text: string, start: number, end: number, dot: number): ReadResult {
  const plain = text.slice(start, dot) + text.slice(dot + 1, end);
  const result = readSpecies(plain);
  if (!result.ok) return { ok: false, problem: problemAt(result.problem.code, result.problem.message, start, end) };
  const mismatch = radicalDotMismatch(result.value);
  if (mismatch) return { ok: false, problem: problemAt("malformed-formula", mismatch, dot, dot + 1) };
  return { ok: true, value: { ...result.value, text: text.slice(start, end), range: { start, end } } };
}

function isCapitalWords(text: string, start: number, end: number): boolean {
  for (let i = start; i < end; i++) {
    const code = text.charCodeAt(i);
    if (isLowerLetter(code) || (!isAsciiLetter(code) && !isSpace(code) && code !== 0x28 && code !== 0x29 && code !== 0x2d)) return false;
  }
  return true;
}

/**
 * `CO<sub>2</sub>`, `H{{sub|2}}O`, `H~2~O`: read as the same formula in Unicode scripts, placed over
 * the whole written text. Undefined when the text holds no script markup after all ("SO4^2-").
 */
function readScriptMarkup(text: string, start: number, end: number): ReadResult | undefined {
  const written = text.slice(start, end);
  const plain = withUnicodeScripts(written);
  if (plain === written) return undefined;
  if (plain === undefined) {
    const message = "Only counts may sit in a subscript and charges in a superscript, like CO<sub>2</sub> or SO<sub>4</sub><sup>2-</sup>.";
    return { ok: false, problem: problemAt("malformed-formula", message, start, end) };
  }
  return readConverted(plain, text, start, end);
}

/** Reads `plain`, the markup-free spelling of `text[start, end)`, and places it over the written text. */
function readConverted(plain: string, text: string, start: number, end: number): ReadResult {
  const result = readSpecies(plain);
  // A suggestion would be spelt without the writer's markup: none is offered.
  if (!result.ok) return { ok: false, problem: problemAt(result.problem.code, result.problem.message, start, end) };
  return { ok: true, value: { ...result.value, text: text.slice(start, end), range: { start, end } } };
}

/**
 * Zero-width characters pasted into a formula are ignored: the text is read without them and the
 * ranges are put back on the original, so no message ever quotes a character nobody can see.
 */
function readWithoutInvisible(text: string): ReadResult {
  let visible = "";
  const positions: number[] = [];
  for (let i = 0; i < text.length; i++) {
    if (isInvisibleFormatting(text.charCodeAt(i))) continue;
    visible += text[i];
    positions.push(i);
  }
  const mapRange = (range: TextRange): TextRange => {
    const start = range.start < positions.length ? positions[range.start] : text.length;
    const end = range.end === range.start ? start : positions[range.end - 1] + 1;
    return { start, end };
  };
  const result = readVisible(visible);
  if (!result.ok) {
    const { problem } = result;
    return { ok: false, problem: problem.range ? { ...problem, range: mapRange(problem.range) } : problem };
  }
  const range = mapRange(result.value.range);
  return { ok: true, value: { ...result.value, range, text: text.slice(range.start, range.end) } };
}

/** `\ce{...}`: the formula inside, with the range covering the whole command. */
function readMhchem(text: string, start: number, end: number): ReadResult {
  const contentStart = start + MHCHEM_OPEN.length;
  let depth = 1;
  let close = contentStart;
  for (; close < end; close++) {
    const code = text.charCodeAt(close);
    if (code === 0x7b) depth++;
    else if (code === 0x7d && --depth === 0) break;
  }
  if (close >= end) {
    return {
      ok: false,
      problem: problemAt("unbalanced-brackets", "This \\ce{ is never closed with }.", start, contentStart),
    };
  }
  if (close + 1 !== end) {
    return {
      ok: false,
      problem: problemAt("malformed-formula", "Only one species can be read; text follows the \\ce{...}.", close + 1, end),
    };
  }
  let innerStart = contentStart;
  let innerEnd = close;
  while (innerStart < innerEnd && isSpace(text.charCodeAt(innerStart))) innerStart++;
  while (innerEnd > innerStart && isSpace(text.charCodeAt(innerEnd - 1))) innerEnd--;
  if (innerStart === innerEnd) {
    return { ok: false, problem: problemAt("empty-input", "This \\ce{} holds nothing to read.", start, end) };
  }
  return readFormulaSpan(text, innerStart, innerEnd, "mhchem", start, end);
}

/**
 * Words, not a formula: letters with spaces, hyphens or a Stock numeral, and either a lower-case
 * first letter, a space or two lower-case letters in a row (no element symbol has two). Locants
 * of organic names ("propan-2-ol", "1,2-dichloroethane") count as words when a run of three
 * lower-case letters shows that this is no formula.
 */
function looksLikeName(text: string, start: number, end: number): boolean {
  let letters = 0;
  let lowerPair = false;
  let lowerRun = 0;
  let longestLowerRun = 0;
  let space = false;
  let locants = false;
  for (let i = start; i < end; i++) {
    const code = text.charCodeAt(i);
    if (isAsciiLetter(code)) {
      letters++;
      lowerRun = isLowerLetter(code) ? lowerRun + 1 : 0;
      if (lowerRun > longestLowerRun) longestLowerRun = lowerRun;
      if (lowerRun >= 2) lowerPair = true;
      continue;
    }
    lowerRun = 0;
    if (isSpace(code)) {
      space = true;
      continue;
    }
    const betweenLetters = i > start && i + 1 < end && isAsciiLetter(text.charCodeAt(i + 1));
    if ((code === 0x2d || code === 0x27 || code === 0x2c) && betweenLetters) continue;
    if (code === 0x28 || code === 0x29) continue;
    if (isDigit(code) || ((code === 0x2d || code === 0x2c) && (isDigit(text.charCodeAt(i - 1)) || isDigit(text.charCodeAt(i + 1))))) {
      locants = true;
      continue;
    }
    return false;
  }
  if (letters < 2) return false;
  if (locants) return longestLowerRun >= 3 && isLocantHyphenated(text, start, end);
  return isLowerLetter(text.charCodeAt(start)) || space || lowerPair;
}

function isDigit(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}

/** A digit joined by a hyphen to the word: "2-ol", "propan-2", "1,2-di". */
function isLocantHyphenated(text: string, start: number, end: number): boolean {
  for (let i = start + 1; i < end; i++) {
    if (text.charCodeAt(i) !== 0x2d) continue;
    if (isDigit(text.charCodeAt(i - 1)) || isDigit(text.charCodeAt(i + 1))) return true;
  }
  return false;
}

/** A name (or the name an abbreviation stands for, `spoken`) read into the species it names. */
function readName(text: string, start: number, end: number, spoken?: string): ReadResult {
  const written = text.slice(start, end);
  const normalized = spoken ?? normalizeName(written);
  const match = matchName(normalized);
  if (match === undefined) {
    const message = `"${written}" is not a name or formula lonepair knows.`;
    const problem = problemAt("unknown-name", message, start, end, suggestName(normalized));
    // "nacl": a lower-case formula typed as a word
    return { ok: false, problem: problem.suggestion ? problem : withRespellings(problem, readableRecasings(text, start, end)) };
  }
  const value = structureReading(match);
  if (value === undefined) {
    return { ok: false, problem: problemAt("unknown-name", `"${written}" names nothing lonepair can read.`, start, end) };
  }
  // a rule-built name shows its preferred spelling ("dinitrogen tetraoxide" -> "dinitrogen tetroxide")
  const name = match.listed ? undefined : nameForFormula(value.formula, value.composition, value.writtenSequence, value.charge);
  const preferred = withStockNumeralCase(name ?? match.name);
  return {
    ok: true,
    value: { ...value, text: written, range: { start, end }, name: preferred },
  };
}

/** The reading of what a name stands for: its formula read, or the composition of its SMILES. */
function structureReading(match: NameMatch): SpeciesReading | undefined {
  if (match.formula !== undefined) {
    const reading = readFormulaSpan(match.formula, 0, match.formula.length, "name");
    if (!reading.ok) return undefined;
    return match.smiles === undefined ? reading.value : { ...reading.value, smiles: match.smiles };
  }
  const parsed = parseSmiles(match.smiles);
  if (!parsed.ok) return undefined;
  const counts = new Map<string, number>();
  for (const atom of parsed.value.atoms) {
    counts.set(atom.symbol, (counts.get(atom.symbol) ?? 0) + 1);
    if (atom.hydrogens > 0) counts.set("H", (counts.get("H") ?? 0) + atom.hydrogens);
  }
  // Hill order: carbon, hydrogen, then the rest alphabetically
  const symbols = [...counts.keys()].sort((a, b) => hillRank(a) - hillRank(b) || (a < b ? -1 : a > b ? 1 : 0));
  const composition: FormulaPart[] = symbols.map((symbol) => ({ symbol, count: counts.get(symbol) as number }));
  const charge = smilesNetCharge(parsed.value);
  const formula = composition.map((part) => (part.count === 1 ? part.symbol : `${part.symbol}${part.count}`)).join("") + chargeText(charge);
  return {
    text: match.name,
    range: { start: 0, end: match.name.length },
    notation: "name",
    composition,
    writtenSequence: composition,
    charge,
    formula,
    smiles: match.smiles,
  };
}

function hillRank(symbol: string): number {
  return symbol === "C" ? 0 : symbol === "H" ? 1 : 2;
}

/** Names are matched lower-case; Stock numerals are shown upper-case: "iron(III) oxide". */
function withStockNumeralCase(name: string): string {
  const open = name.indexOf("(");
  const close = name.indexOf(")", open);
  if (open < 0 || close < 0) return name;
  return name.slice(0, open) + name.slice(open, close).toUpperCase() + name.slice(close);
}

function withName(result: ReadResult): ReadResult {
  if (!result.ok) return result;
  const reading: SpeciesReading = result.value;
  // the unlabelled species' name would misname a labelled one (D2O is not sold as "water")
  if (reading.isotopes !== undefined) return result;
  const name = nameForFormula(reading.formula, reading.composition, reading.writtenSequence, reading.charge);
  return name === undefined ? result : { ok: true, value: { ...reading, name } };
}
