/**
 * Which species a position in a document names, decided once for every edge (hover, the 3D view,
 * coordinate export, the command line): the narrowest mention containing the offset, where a
 * cursor just after a species still counts; failing that, text the scanner saw as a species but
 * the reader refused.
 */
import type { AnalysisResult, Problem, TextRange } from "../chemistry/types";
import { analyzeOccurrence, speciesTextOf } from "./analyzeOccurrence";
import type { DocumentModel, SpeciesOccurrence } from "./types";

/** The narrowest occurrence containing `offset` (occurrences are in document order). */
export function occurrenceAt(occurrences: readonly SpeciesOccurrence[], offset: number): SpeciesOccurrence | undefined {
  let best: SpeciesOccurrence | undefined;
  for (const occurrence of occurrences) {
    if (occurrence.range.start > offset) break;
    if (offset > occurrence.range.end) continue;
    if (!best || occurrence.range.end - occurrence.range.start < best.range.end - best.range.start) best = occurrence;
  }
  return best;
}

/** A species mention at a position: its species text, where it is, and what the core makes of it. */
export interface SpeciesAtOffset {
  /** The text as written, or the species it stands for in its row (`speciesTextOf`). */
  readonly text: string;
  readonly range: TextRange;
  /** Set for a readable mention; absent for text the reader refused. */
  readonly occurrence?: SpeciesOccurrence;
  readonly analysis: AnalysisResult;
}

/** The species at `offset` in `model`, readable or refused, or undefined where there is none. */
export function speciesAtOffset(model: DocumentModel, offset: number): SpeciesAtOffset | undefined {
  const occurrence = occurrenceAt(model.occurrences, offset);
  if (occurrence) {
    return { text: speciesTextOf(occurrence), range: occurrence.range, occurrence, analysis: analyzeOccurrenceSafely(occurrence) };
  }
  const unreadable = model.unreadable?.find((item) => item.range.start <= offset && offset <= item.range.end);
  if (!unreadable) return undefined;
  return { text: unreadable.text, range: unreadable.range, analysis: { ok: false, problem: unreadable.problem } };
}

/**
 * The analysis of an occurrence, with an internal error turned into a refusal of this one species:
 * the core promises not to throw, and if it ever does, one species fails, not the whole request.
 */
export function analyzeOccurrenceSafely(occurrence: SpeciesOccurrence): AnalysisResult {
  try {
    return analyzeOccurrence(occurrence);
  } catch (error) {
    return { ok: false, reading: occurrence.reading, problem: internalErrorProblem(error) };
  }
}

/** The refusal given in place of an unexpected internal error. */
export function internalErrorProblem(error: unknown): Problem {
  return { code: "no-valid-structure", message: `internal error: ${String(error)}` };
}
