/**
 * The analysis behind one occurrence: SMILES through the SMILES reader (they carry connectivity a
 * formula would lose), everything else through the species reader. Hovers and checks both use
 * this, so they never disagree.
 */
import { analyzeSmiles, analyzeSpecies } from "../chemistry/analyze";
import type { AnalysisResult } from "../chemistry/types";
import type { SpeciesOccurrence } from "./types";

export function analyzeOccurrence(
  occurrence: SpeciesOccurrence,
  analyze: (text: string) => AnalysisResult = analyzeSpecies,
): AnalysisResult {
  return occurrence.reading.notation === "smiles" ? analyzeSmiles(occurrence.reading.text) : analyze(speciesTextOf(occurrence));
}

/**
 * The text that stands for the occurrence's species: what it is analysed from and what memos of
 * analyses and cards are keyed by. The same written text may be two species ("NH4" beside a
 * charge column, "NH4" in prose), so the written text alone is no key.
 */
export function speciesTextOf(occurrence: SpeciesOccurrence): string {
  return occurrence.speciesText ?? occurrence.text;
}
