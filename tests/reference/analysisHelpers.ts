/**
 * Small helpers shared by the reference tests: analyse through the public facade and pick out the
 * centre a table row is about, failing with a message that says what the engine returned instead.
 */
import { analyzeSmiles, analyzeSpecies } from "../../shared/src/index";
import type { CentreAnalysis, SpeciesAnalysis } from "../../shared/src/index";

/**
 * Analyses `text` (a formula or name, or SMILES when `asSmiles`) and fails the test with the
 * engine's own problem when it cannot.
 */
export function analysisOf(text: string, asSmiles = false): SpeciesAnalysis {
  const result = asSmiles ? analyzeSmiles(text) : analyzeSpecies(text);
  if (!result.ok) {
    throw new Error(`expected "${text}" to be analysed, but got ${result.problem.code}: ${result.problem.message}`);
  }
  return result.value;
}

/**
 * The centre of element `symbol` with the most bonded neighbours (the sulfur of H2SO4, not an OH
 * oxygen). Fails listing the centres the engine did find.
 */
export function centreOf(analysis: SpeciesAnalysis, symbol: string): CentreAnalysis {
  const matching = analysis.centres.filter((centre) => centre.atom === symbol);
  if (matching.length === 0) {
    const found = analysis.centres.map((centre) => `${centre.atom} ${centre.axe}`).join(", ") || "none";
    throw new Error(`${analysis.reading.text}: no ${symbol} centre; the engine found: ${found}`);
  }
  return matching.reduce((best, centre) => (centre.bondingDomains > best.bondingDomains ? centre : best));
}

/** Every centre of element `symbol`, e.g. the two OH oxygens of H2SO4. */
export function centresOf(analysis: SpeciesAnalysis, symbol: string): readonly CentreAnalysis[] {
  return analysis.centres.filter((centre) => centre.atom === symbol);
}

/** Indices of the atoms bonded to atom `index` in the Lewis structure. */
export function neighboursOf(analysis: SpeciesAnalysis, index: number): readonly number[] {
  return analysis.graph.bonds.flatMap((bond) => (bond.from === index ? [bond.to] : bond.to === index ? [bond.from] : []));
}

/** Angles in degrees agree when they differ by less than this (109.47 vs 109.5). */
export const ANGLE_TOLERANCE = 0.1;

export function sameAngle(a: number, b: number): boolean {
  return Math.abs(a - b) < ANGLE_TOLERANCE;
}
