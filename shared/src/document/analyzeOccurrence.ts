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
  return occurrence.reading.notation === "smiles" ? analyzeSmiles(occurrence.reading.text) : analyze(occurrence.text);
}
