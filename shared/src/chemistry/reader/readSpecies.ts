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
import type { ReadResult, SpeciesReading } from "../types";
import { isAsciiLetter, isLowerLetter, isSpace } from "./characters";
import { matchName, nameForFormula, normalizeName } from "./names/nameLookup";
import { suggestName } from "./names/nameSuggestion";
import { problemAt } from "./problem";
import { readFormulaSpan } from "./readFormula";
import { recaseSuggestion } from "./recaseSuggestion";

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
  let start = 0;
  let end = text.length;
  while (start < end && isSpace(text.charCodeAt(start))) start++;
  while (end > start && isSpace(text.charCodeAt(end - 1))) end--;
  if (start === end) {
    return { ok: false, problem: problemAt("empty-input", "There is nothing to read.", start, start) };
  }
  if (text.startsWith(MHCHEM_OPEN, start)) return withName(readMhchem(text, start, end));
  if (looksLikeName(text, start, end)) return readName(text, start, end);
  return withName(readFormulaSpan(text, start, end, "formula"));
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
 * first letter, a space or two lower-case letters in a row (no element symbol has two).
 */
function looksLikeName(text: string, start: number, end: number): boolean {
  let letters = 0;
  let lowerPair = false;
  let space = false;
  for (let i = start; i < end; i++) {
    const code = text.charCodeAt(i);
    if (isAsciiLetter(code)) {
      letters++;
      if (i > start && isLowerLetter(code) && isLowerLetter(text.charCodeAt(i - 1))) lowerPair = true;
      continue;
    }
    if (isSpace(code)) {
      space = true;
      continue;
    }
    const betweenLetters = i > start && i + 1 < end && isAsciiLetter(text.charCodeAt(i + 1));
    if ((code === 0x2d || code === 0x27 || code === 0x2c) && betweenLetters) continue;
    if (code === 0x28 || code === 0x29) continue;
    return false;
  }
  if (letters < 2) return false;
  return isLowerLetter(text.charCodeAt(start)) || space || lowerPair;
}

function readName(text: string, start: number, end: number): ReadResult {
  const written = text.slice(start, end);
  const normalized = normalizeName(written);
  const match = matchName(normalized);
  if (match === undefined) {
    const suggestion = suggestName(normalized) ?? formulaSpelling(text, start, end);
    const message = `"${written}" is not a name or formula lonepair knows.`;
    return { ok: false, problem: problemAt("unknown-name", message, start, end, suggestion) };
  }
  const reading = readFormulaSpan(match.formula, 0, match.formula.length, "name");
  if (!reading.ok) {
    return { ok: false, problem: problemAt("unknown-name", `"${written}" names nothing lonepair can read.`, start, end) };
  }
  const value = reading.value;
  const name = nameForFormula(value.formula, value.composition, value.writtenSequence, value.charge);
  // a rule-built name shows its preferred spelling ("dinitrogen tetraoxide" -> "dinitrogen tetroxide")
  const preferred = withStockNumeralCase(match.listed ? match.name : (name ?? match.name));
  return {
    ok: true,
    value: { ...value, text: written, range: { start, end }, name: preferred },
  };
}

/** Names are matched lower-case; Stock numerals are shown upper-case: "iron(III) oxide". */
function withStockNumeralCase(name: string): string {
  const open = name.indexOf("(");
  const close = name.indexOf(")", open);
  if (open < 0 || close < 0) return name;
  return name.slice(0, open) + name.slice(open, close).toUpperCase() + name.slice(close);
}

/** "nacl" -> "NaCl": a lower-case formula typed as a word. */
function formulaSpelling(text: string, start: number, end: number): string | undefined {
  const recased = recaseSuggestion(text, start, end);
  if (recased === undefined) return undefined;
  return readFormulaSpan(recased, 0, recased.length, "formula").ok ? recased : undefined;
}

function withName(result: ReadResult): ReadResult {
  if (!result.ok) return result;
  const reading: SpeciesReading = result.value;
  const name = nameForFormula(reading.formula, reading.composition, reading.writtenSequence, reading.charge);
  return name === undefined ? result : { ok: true, value: { ...reading, name } };
}
