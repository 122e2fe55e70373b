/**
 * When a spelling the reader suggests becomes a fix. A fix claims that the new text is right, and
 * `check --fix` applies every fix unasked, so a suggestion is offered only when:
 * - the written token is a formula, not a word or a name: it carries a count, a charge or a
 *   bracket, and no run of three lower-case letters ("Limonene" is never re-cased "LiMoNeNe");
 * - it is not written with a group abbreviation or isotope symbol (PhCH3, CDCl3, tBuOH), which
 *   are right as written even where lonepair cannot read them;
 * - the replacement is a species that analyses without an error.
 * The editor's quick fixes, `check --fix` and the prose scanner all ask here.
 */
import { analyzeSpecies } from "../chemistry/analyze";
import type { AnalysisResult } from "../chemistry/types";
import { severityOf } from "./findingSeverity";
import { groupAbbreviationIn } from "./groupAbbreviations";

/** Analyses one species text; the document checks pass their own (memoised) one. */
export type AnalyzeText = (text: string) => AnalysisResult;

/** True when replacing the mention `written` with `suggestion` is safe to offer as a fix. */
export function isSafeSpellingFix(written: string, suggestion: string, analyze: AnalyzeText = analyzeSpecies): boolean {
  if (suggestion === written || suggestion.trim().length === 0) return false;
  if (!isWrittenAsFormula(written) || groupAbbreviationIn(written) !== undefined) return false;
  let result: AnalysisResult;
  try {
    result = analyze(suggestion);
  } catch {
    return false;
  }
  return result.ok || severityOf(result.problem.code) !== "error";
}

/**
 * A formula's marks (digits, subscripts, charge signs, carets, brackets) and no lower-case run
 * longer than an element symbol allows, nor any space: names and words never pass.
 */
export function isWrittenAsFormula(written: string): boolean {
  let marked = false;
  let lowerRun = 0;
  for (let index = 0; index < written.length; index++) {
    const code = written.charCodeAt(index);
    if (code >= 0x61 && code <= 0x7a) {
      if (++lowerRun >= 3) return false;
      continue;
    }
    lowerRun = 0;
    if (code <= 0x20 || code === 0xa0) return false;
    if (isFormulaMark(code)) marked = true;
  }
  return marked;
}

function isFormulaMark(code: number): boolean {
  return (
    (code >= 0x30 && code <= 0x39) || // digits
    (code >= 0x2080 && code <= 0x2089) || // subscript digits
    code === 0xb2 ||
    code === 0xb3 ||
    code === 0xb9 ||
    (code >= 0x2070 && code <= 0x207b) || // superscripts
    code === 0x2b ||
    code === 0x2d ||
    code === 0x2212 ||
    code === 0x5e || // + - − ^
    code === 0x28 ||
    code === 0x29 ||
    code === 0x5b ||
    code === 0x5d // ( ) [ ]
  );
}
