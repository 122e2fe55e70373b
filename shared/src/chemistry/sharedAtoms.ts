/**
 * Graph atoms are plain read-only values with no index of their own, so every atom alike in
 * element, lone pairs, odd electron, charge and aromatic flag is one shared object: a large
 * molecule's many CH2 carbons and hydrogens, or the outer fluorines of a small one, then cost
 * nothing to keep with its memoised analysis.
 */
import type { GraphAtom } from "./types";

// Bound: the key packs values that `fits` keeps in range (127 elements, 16 lone-pair counts, 31
// charges, radical or not, aromatic or not), so at most about 250,000 atoms; far fewer occur.
const atomsAlike = new Map<number, GraphAtom>();

/** The one shared atom with these values (a fresh one when they are out of the usual range). */
export function sharedAtom(
  atomicNumber: number,
  symbol: string,
  lonePairs: number,
  unpairedElectrons: number,
  formalCharge: number,
  aromatic: boolean,
): GraphAtom {
  const fits = atomicNumber > 0 && atomicNumber < 128 && lonePairs >= 0 && lonePairs < 16 && formalCharge >= -15 && formalCharge <= 15;
  if (!fits) return makeAtom(symbol, lonePairs, unpairedElectrons, formalCharge, aromatic);
  const key = (((atomicNumber * 16 + lonePairs) * 2 + unpairedElectrons) * 32 + formalCharge + 15) * 2 + (aromatic ? 1 : 0);
  let atom = atomsAlike.get(key);
  if (atom === undefined) {
    atom = makeAtom(symbol, lonePairs, unpairedElectrons, formalCharge, aromatic);
    atomsAlike.set(key, atom);
  }
  return atom;
}

function makeAtom(symbol: string, lonePairs: number, unpairedElectrons: number, formalCharge: number, aromatic: boolean): GraphAtom {
  // Two literal shapes rather than a spread: aromatic is present only when written so.
  return aromatic
    ? { symbol, lonePairs, unpairedElectrons, formalCharge, aromatic: true }
    : { symbol, lonePairs, unpairedElectrons, formalCharge };
}
