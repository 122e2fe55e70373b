/**
 * A lone neutral metal atom as written ("Al", "Na", "Zn" in "4 Al + 3 O2 -> 2 Al2O3") stands for the
 * element itself: a metallic solid (or liquid, for mercury), not a free atom, so it is neither a
 * radical nor a shape. The same holds for "Fe" or "Cu" in "2 Al + Fe2O3 -> Al2O3 + 2 Fe". Free
 * atoms of nonmetals ("Cl", "N") stay atoms.
 */
import { elementBySymbol, FIRST_SUPERHEAVY } from "../elements";
import { NONMETALS } from "../reader/nonmetals";
import type { Problem, SpeciesReading } from "../types";

/** The note for a reading that is one neutral metal atom, or undefined for anything else. */
export function metallicElementProblem(reading: SpeciesReading): Problem | undefined {
  const { composition, charge } = reading;
  if (charge !== 0 || composition.length !== 1 || composition[0].count !== 1) return undefined;
  const symbol = composition[0].symbol;
  const element = elementBySymbol(symbol);
  // Superheavy elements are known a few atoms at a time: no metallic lattice to speak of.
  if (!element || NONMETALS.has(symbol) || element.atomicNumber >= FIRST_SUPERHEAVY) return undefined;
  return {
    code: "metallic-element",
    message:
      `${symbol} as written is the element ${element.name}, a metal: its atoms share their valence electrons ` +
      "in a metallic lattice rather than forming molecules, so it has no VSEPR shape and no unpaired electron to speak of.",
  };
}
