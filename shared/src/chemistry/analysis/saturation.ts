/**
 * Formulas with more hydrogens than their atoms can hold (C2H7, C3H10). Asking for a structural
 * formula would be asking for something that cannot exist, so they are refused as impossible.
 */
import type { FormulaPart, Problem } from "../types";

/** Bonds each atom forms in a neutral molecule of these elements; no other element is judged. */
const USUAL_VALENCE: Readonly<Record<string, number>> = { C: 4, Si: 4, N: 3, O: 2, H: 1, F: 1, Cl: 1, Br: 1, I: 1 };

/**
 * The refusal for a neutral formula whose hydrogen and halogen atoms outnumber what its carbon,
 * nitrogen and oxygen atoms can bind (a negative count of rings plus double bonds), or undefined.
 */
export function oversaturationProblem(formula: string, composition: readonly FormulaPart[], charge: number): Problem | undefined {
  if (charge !== 0) return undefined;
  let terminal = 0;
  let capacity = 2;
  for (const { symbol, count } of composition) {
    const valence = USUAL_VALENCE[symbol];
    if (valence === undefined) return undefined;
    if (valence === 1) terminal += count;
    else capacity += (valence - 2) * count;
  }
  if (terminal <= capacity) return undefined;
  return {
    code: "hydrogen-overbonded",
    message:
      `${formula} cannot exist: its atoms can hold at most ${capacity} hydrogen or halogen atoms between them ` +
      `(carbon forms four bonds, nitrogen three, oxygen two), and it has ${terminal}. Too many hydrogens; check the counts.`,
  };
}
