/**
 * Halo-complex anions: one central atom holding only halide ions (BF4-, PF6-, SiF6 2-, AuCl4-,
 * PtCl6 2-, ICl2-). Their charge is the central atom's oxidation state less one for each halide.
 * Their "acids" (HBF4, H2PtCl6) are not molecules: no hydrogen-halogen bond survives beside such
 * an anion, and the acid is a solvated H+ beside the anion.
 */
import { elementBySymbol } from "../elements";
import type { FormulaPart } from "../types";
import { metalIonCharges } from "./metalIonCharges";

const HALIDES = new Set(["F", "Cl", "Br", "I"]);

/** The fewest and most halides a complex read from a bare formula may hold (K2PtCl6, Na3AlF6). */
const FEWEST_HALIDES = 4;
const MOST_HALIDES = 6;

// Period 2 beyond boron makes no halo-complex anion (CF4 and NF3 are molecules); noble gases but
// xenon make none at all.
const NOT_CENTRES = new Set(["C", "N", "O", "F", "He", "Ne", "Ar", "Kr", "Rn"]);

/**
 * The oxidation states the central atom may have in a halo complex, highest first: a p-block
 * element's group state and, from group 15 on or below period 3, those two, four... below it
 * (iodine +7, +5, +3, +1; tin +4, +2; boron, aluminium and silicon only +3, +3 and +4); a d-block
 * metal's usual ion charges. Empty for an element that is no such centre.
 */
export function haloCentreOxidationStates(symbol: string): readonly number[] {
  const element = elementBySymbol(symbol);
  if (element === undefined || NOT_CENTRES.has(symbol)) return [];
  // Zinc, cadmium and mercury hold halides as their 2+ ions do (ZnCl4 2-, HgI4 2-).
  if (element.category === "transition-metal" || element.group === 12) return [...metalIonCharges(symbol)].sort((a, b) => b - a);
  // common practice: p-block oxidation states step by two from the group's highest
  if (element.category !== "main-group" && element.category !== "noble-gas") return [];
  if (element.group < 13) return [];
  const highest = element.group - 10;
  if (element.group < 15 && element.period <= 3) return [highest];
  const states: number[] = [];
  for (let state = highest; state >= 1; state -= 2) states.push(state);
  return states;
}

/** The charges a centre with `halides` halide ions may carry as an anion, the least negative first. */
export function haloComplexCharges(centre: string, halides: number): readonly number[] {
  return haloCentreOxidationStates(centre)
    .map((state) => state - halides)
    .filter((charge) => charge < 0);
}

/** A central atom and its halide, where the composition is one of each kind (BF4: B and F). */
export interface HaloComplexParts {
  readonly centre: string;
  readonly halide: string;
  readonly halides: number;
}

/** The centre and halide of a composition made of one such centre and one kind of halide; else undefined. */
export function haloComplexParts(composition: readonly FormulaPart[]): HaloComplexParts | undefined {
  if (composition.length !== 2) return undefined;
  const halide = composition.find((part) => HALIDES.has(part.symbol) && part.count >= 2);
  const centre = composition.find((part) => part !== halide && part.count === 1);
  if (halide === undefined || centre === undefined || haloCentreOxidationStates(centre.symbol).length === 0) return undefined;
  return { centre: centre.symbol, halide: halide.symbol, halides: halide.count };
}

/**
 * The charges of a halo complex written as a bare formula in a salt (PtCl6 of K2PtCl6), where it
 * holds four to six halides, or two or more about a halogen (the polyhalide ICl2 of KICl2); empty
 * otherwise.
 */
export function bareHaloComplexCharges(composition: readonly FormulaPart[]): readonly number[] {
  const parts = haloComplexParts(composition);
  if (parts === undefined || parts.halides > MOST_HALIDES) return [];
  if (parts.halides < (HALIDES.has(parts.centre) ? 2 : FEWEST_HALIDES)) return [];
  return haloComplexCharges(parts.centre, parts.halides);
}
