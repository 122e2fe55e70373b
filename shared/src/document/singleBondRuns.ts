/**
 * Structural formulas written with single-bond dashes alone ("CH3-CH3", "Cl-CH2-CH2-Cl",
 * "H3C-CH2-OH"). Prose also joins with a dash the atoms of an angle ("F-S-F", "H–O–H") and two
 * species of a mixture ("NF3-SF6", "N2-O2"); only a run whose every group is a piece held open by
 * exactly the dashes beside it is one molecule.
 */
import { fitsOpenBonds } from "../chemistry/analysis/saturation";
import type { SpeciesReader } from "./speciesReader";

/** Whether the groups written between single-bond dashes, in order, make one molecule. */
export function isSingleBondedMolecule(groups: readonly string[], read: SpeciesReader): boolean {
  if (groups.every((group) => LONE_ATOM.test(group))) return false;
  let carbonOrHydrogen = false;
  for (let index = 0; index < groups.length; index++) {
    const result = read(groups[index]);
    if (!result.ok || result.value.charge !== 0) return false;
    const bonds = index === 0 || index === groups.length - 1 ? 1 : 2;
    if (!fitsOpenBonds(result.value.composition, bonds)) return false;
    carbonOrHydrogen ||= result.value.composition.some((part) => part.symbol === "C" || part.symbol === "H");
  }
  // "NO-NO2": oxides such as NO, NO2 and ClO2 are molecules of their own though their valences
  // look open; the pieces of a drawn skeleton carry its carbon or hydrogen.
  return carbonOrHydrogen;
}

const LONE_ATOM = /^[A-Z][a-z]?$/;
