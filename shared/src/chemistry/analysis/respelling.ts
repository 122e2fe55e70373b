/**
 * Which re-spelling of a mistyped species to offer. The reader lists the spellings that read
 * ("co2": Co2, CO2); only one that is a species lonepair can work with is offered, so a slip of the
 * shift key never turns carbon dioxide into cobalt.
 */
import type { AnalysisResult, Problem, ProblemCode } from "../types";

/** Refusals of real species that VSEPR has no shape for: still a fair thing to have meant. */
const REAL_BUT_UNSHAPED: ReadonlySet<ProblemCode> = new Set([
  "transition-metal-centre",
  "f-block-centre",
  "ionic-solid",
  "ions-in-solution",
  "metallic-element",
  "three-centre-bonding",
  "ambiguous-connectivity",
]);

/**
 * `problem` with the best of its spellings as the suggestion, or none when no spelling is a valid
 * species: first one that analyses and has a name, then one that analyses, then a real species
 * VSEPR does not shape; cheaper re-spellings first within each rank.
 */
export function chooseRespelling(problem: Problem, analyze: (text: string) => AnalysisResult): Problem {
  const { suggestion, alternatives, ...rest } = problem;
  if (suggestion === undefined) return problem;
  let best: string | undefined;
  let bestRank = 3;
  for (const spelling of [suggestion, ...(alternatives ?? [])]) {
    const rank = rankOf(analyze(spelling));
    if (rank < bestRank) {
      best = spelling;
      bestRank = rank;
    }
    if (rank === 0) break;
  }
  return best === undefined ? rest : { ...rest, suggestion: best };
}

function rankOf(result: AnalysisResult): number {
  if (result.ok) return result.value.reading.name === undefined ? 1 : 0;
  return REAL_BUT_UNSHAPED.has(result.problem.code) ? 2 : 3;
}
