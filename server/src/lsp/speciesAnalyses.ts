/**
 * The analysis behind a species occurrence. The text is analysed exactly as the document
 * checks analyse it, so a hover never disagrees with a diagnostic; the core memoises by text.
 */
import { analyzeOccurrence } from "../../../shared/src/index";
import type { AnalysisResult, SpeciesOccurrence } from "./core";

/** The analysis of the species an occurrence names. */
export function analysisOf(occurrence: SpeciesOccurrence): AnalysisResult {
  try {
    return analyzeOccurrence(occurrence);
  } catch (error) {
    // The core promises not to throw; if it ever does, one species fails, not the request.
    return { ok: false, reading: occurrence.reading, problem: { code: "no-valid-structure", message: `internal error: ${String(error)}` } };
  }
}
