/**
 * Reads one formula with its charge and state from a span of the input: SF4, Ca(OH)2, CH3COOH,
 * SO4^2-, [PO4]3-, NH₄⁺, CuSO4·5H2O, HCl(aq), SO4^2-(aq), C-14.
 */
import { elementBySymbol } from "../elements";
import type { Problem, ReadResult, SpeciesNotation, SpeciesReading } from "../types";
import { isLowerLetter, isUpperLetter, signValue } from "./characters";
import { readChargeSuffix } from "./chargeSuffix";
import { chargeText } from "./chargeText";
import { readFormulaBody } from "./formulaBody";
import { isHyphenatedMassNumber } from "./isotopes";
import { problemAt } from "./problem";
import { recaseCandidates } from "./recaseSuggestion";
import { readStateSuffix } from "./stateSymbol";

/**
 * Reads `text[start, end)` (already trimmed) as a formula. `range` is where the reading sits in the
 * input, which differs from the span for mhchem, whose `\ce{...}` wrapper belongs to the reading.
 */
export function readFormulaSpan(
  text: string,
  start: number,
  end: number,
  notation: SpeciesNotation,
  rangeStart = start,
  rangeEnd = end,
): ReadResult {
  const stated = text.charCodeAt(end - 1) === 0x29 || text.charCodeAt(end - 1) === 0x7d ? readStateSuffix(text, start, end) : undefined;
  const spanEnd = end;
  if (stated !== undefined) end = stated.bodyEnd;
  const nuclide = hyphenatedNuclide(text, start, end, notation, rangeStart, rangeEnd);
  if (nuclide !== undefined) return nuclide;
  const suffix = readChargeSuffix(text, start, end);
  if (!suffix.ok) return suffix;
  const { bodyEnd, charge } = suffix.value;
  if (bodyEnd - start === 1 && text.charCodeAt(start) === 0x65) {
    return {
      ok: false,
      problem: problemAt("malformed-formula", "An electron is a particle, not a species to draw.", start, end),
    };
  }
  const body = readFormulaBody(text, start, bodyEnd);
  if (!body.ok) {
    const problem = body.problem;
    if (problem.code !== "unknown-element") return body;
    return { ok: false, problem: withRespellings(problem, readableRecasings(text, start, end, spanEnd)) };
  }
  const { composition, writtenSequence, normalizedText, isotopes, parts } = body.value;
  const value: SpeciesReading = {
    text: text.slice(rangeStart, rangeEnd),
    range: { start: rangeStart, end: rangeEnd },
    notation,
    composition,
    writtenSequence,
    charge,
    formula: normalizedText + chargeText(charge),
  };
  if (stated === undefined && isotopes === undefined && parts === undefined) return { ok: true, value };
  return {
    ok: true,
    value: { ...value, ...(parts ? { parts } : {}), ...(stated ? { state: stated.state } : {}), ...(isotopes ? { isotopes } : {}) },
  };
}

/** "C-14", "U-235": one symbol, a hyphen and a mass number name a nuclide, not a charge. */
function hyphenatedNuclide(
  text: string,
  start: number,
  end: number,
  notation: SpeciesNotation,
  rangeStart: number,
  rangeEnd: number,
): ReadResult | undefined {
  if (!isUpperLetter(text.charCodeAt(start))) return undefined;
  const symbolEnd = start + 1 < end && isLowerLetter(text.charCodeAt(start + 1)) ? start + 2 : start + 1;
  if (symbolEnd + 1 >= end || signValue(text.charCodeAt(symbolEnd)) !== -1 || text.charCodeAt(symbolEnd) === 0x207b) return undefined;
  let massNumber = 0;
  for (let i = symbolEnd + 1; i < end; i++) {
    const code = text.charCodeAt(i);
    if (code < 0x30 || code > 0x39 || i - symbolEnd > 3) return undefined;
    massNumber = massNumber * 10 + (code - 0x30);
  }
  const symbol = text.slice(start, symbolEnd);
  const element = elementBySymbol(symbol);
  if (element === undefined || !isHyphenatedMassNumber(massNumber, element)) return undefined;
  const part = { symbol: element.symbol, count: 1 };
  return {
    ok: true,
    value: {
      text: text.slice(rangeStart, rangeEnd),
      range: { start: rangeStart, end: rangeEnd },
      notation,
      composition: [part],
      writtenSequence: [part],
      charge: 0,
      formula: element.symbol,
      isotopes: [{ symbol: element.symbol, massNumber, written: text.slice(start, end) }],
    },
  };
}

/**
 * Re-cased spellings of `text[start, end)` that read cleanly, cheapest first; a state symbol up to
 * `suffixEnd` is kept as written.
 */
export function readableRecasings(text: string, start: number, end: number, suffixEnd = end): string[] {
  const suffix = text.slice(end, suffixEnd);
  return recaseCandidates(text, start, end)
    .map((candidate) => candidate + suffix)
    .filter((candidate) => readFormulaSpan(candidate, 0, candidate.length, "formula").ok);
}

/** `problem` with the first spelling as its suggestion and the rest as alternatives. */
export function withRespellings(problem: Problem, spellings: readonly string[]): Problem {
  if (spellings.length === 0) return problem;
  const [suggestion, ...alternatives] = spellings;
  return alternatives.length === 0 ? { ...problem, suggestion } : { ...problem, suggestion, alternatives };
}
