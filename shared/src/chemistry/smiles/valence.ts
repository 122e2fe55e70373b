/**
 * Valence rules for SMILES: the implicit hydrogens of organic-subset atoms, and the bond count
 * an aromatic atom reaches once its ring is drawn with alternating single and double bonds.
 */

/** Normal valences of the organic subset, lowest first. */
const ORGANIC_VALENCES: Readonly<Record<string, readonly number[]>> = {
  B: [3],
  C: [4],
  N: [3, 5],
  O: [2],
  P: [3, 5],
  S: [2, 4, 6],
  F: [1],
  Cl: [1],
  Br: [1],
  I: [1],
};

/** Valence electrons of the elements that may be written as aromatic atoms. */
const AROMATIC_VALENCE_ELECTRONS: Readonly<Record<string, number>> = {
  B: 3,
  C: 4,
  N: 5,
  O: 6,
  P: 5,
  S: 6,
  As: 5,
  Se: 6,
  Te: 6,
};

/**
 * Implicit hydrogens on an organic-subset atom written without brackets.
 * `bondOrderSum` counts each aromatic bond as 1. An aliphatic atom takes the lowest normal
 * valence that is at least the sum; an aromatic atom also owes one bond to its ring's
 * double-bond pattern, and takes hydrogens only up to its lowest valence (so the nitrogen of
 * Cn1cccc1 carries none).
 */
export function implicitHydrogens(symbol: string, aromatic: boolean, bondOrderSum: number): number {
  const valences = ORGANIC_VALENCES[symbol];
  if (valences === undefined) return 0;
  if (aromatic) {
    const free = valences[0] - bondOrderSum - 1;
    return free > 0 ? free : 0;
  }
  for (const valence of valences) {
    if (valence >= bondOrderSum) return valence - bondOrderSum;
  }
  return 0;
}

/** True for the symbols that may be written without brackets (B C N O P S F Cl Br I). */
export function isOrganicSubset(symbol: string): boolean {
  return ORGANIC_VALENCES[symbol] !== undefined;
}

/**
 * The bond count (hydrogens included) an aromatic atom reaches in a Kekulé structure:
 * the lowest valence of the element after its charge, so N+ behaves like C (4) and C- like N (3).
 * Returns 0 for elements that cannot be aromatic.
 */
export function aromaticTargetValence(symbol: string, charge: number): number {
  const valenceElectrons = AROMATIC_VALENCE_ELECTRONS[symbol];
  if (valenceElectrons === undefined) return 0;
  const electrons = valenceElectrons - charge;
  if (electrons < 0 || electrons > 8) return 0;
  return electrons <= 4 ? electrons : 8 - electrons;
}
