/**
 * Memoised species analysis: the same formula written a thousand times in a table is
 * analysed once. Bounded so that a document full of distinct formulas cannot grow it forever.
 */
import { analyzeSpecies, type AnalysisResult, type SpeciesOccurrence } from "./core";

const CAPACITY = 4096;
const memo = new Map<string, AnalysisResult>();

/** The analysis of the species an occurrence names. */
export function analysisOf(occurrence: SpeciesOccurrence): AnalysisResult {
  const key = occurrence.text.trim();
  const known = memo.get(key);
  if (known) return known;
  const result = analyzeSpecies(key);
  if (memo.size >= CAPACITY) memo.delete(memo.keys().next().value as string);
  memo.set(key, result);
  return result;
}
