/**
 * Reads one formula with its charge from a span of the input: SF4, Ca(OH)2, CH3COOH, SO4^2-,
 * [PO4]3-, NH₄⁺, CuSO4·5H2O.
 */
import type { ReadResult, SpeciesNotation } from "../types";
import { readChargeSuffix } from "./chargeSuffix";
import { chargeText } from "./chargeText";
import { readFormulaBody } from "./formulaBody";
import { problemAt } from "./problem";
import { recaseSuggestion } from "./recaseSuggestion";

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
    const suggestion = problem.code === "unknown-element" ? checkedRecase(text, start, end) : undefined;
    return { ok: false, problem: suggestion === undefined ? problem : { ...problem, suggestion } };
  }
  const { composition, writtenSequence, normalizedText, parts } = body.value;
  return {
    ok: true,
    value: {
      text: text.slice(rangeStart, rangeEnd),
      range: { start: rangeStart, end: rangeEnd },
      notation,
      composition,
      writtenSequence,
      charge,
      formula: normalizedText + chargeText(charge),
      ...(parts ? { parts } : {}),
    },
  };
}

/** A re-cased spelling, offered only when it reads cleanly. */
function checkedRecase(text: string, start: number, end: number): string | undefined {
  const suggestion = recaseSuggestion(text, start, end);
  if (suggestion === undefined) return undefined;
  const check = readFormulaSpan(suggestion, 0, suggestion.length, "formula");
  return check.ok ? suggestion : undefined;
}
