/**
 * What the usual valences of neutral molecules allow: formulas with more hydrogens than their atoms
 * can hold (C2H7, C3H10), refused as impossible, and the groups a structural formula joins with
 * single bonds (CH3 on one bond, CH2 on two).
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

/**
 * Whether a neutral group of these atoms hangs on exactly `bonds` single bonds to the rest of a
 * molecule with every atom at its usual valence: CH3, OH and Cl on one, CH2 and O on two, CO (a
 * carbonyl) on two, CH4 and CO2 on none, but CH2 never on one or none. Undefined when an element
 * has no usual valence here.
 */
export function fitsOpenBonds(composition: readonly FormulaPart[], bonds: number): boolean | undefined {
  let terminal = 0;
  let inner = 0;
  let innerValence = 0;
  for (const { symbol, count } of composition) {
    const valence = USUAL_VALENCE[symbol];
    if (valence === undefined) return undefined;
    if (valence === 1) terminal += count;
    else {
      inner += count;
      innerValence += valence * count;
    }
  }
  if (inner === 0) return terminal === 1 && bonds === 1;
  // The inner atoms hold each other by a chain of single bonds, the terminal atoms and the bonds
  // out; what valence is left over pairs up into double bonds between inner atoms.
  const spare = innerValence - terminal - 2 * (inner - 1) - bonds;
  return spare >= 0 && spare % 2 === 0 && (spare === 0 || inner >= 2);
}
