/**
 * Isotope labels in formulas: D and T for hydrogen-2 and -3, and mass numbers written before a
 * symbol (^{13}C, ¹³C, 13CO2, mhchem's ^{227}_{90}Th, U-235). A label changes no Lewis structure,
 * so the labelled atom counts as its element.
 */
import type { ElementData } from "../types";

/** D (deuterium) and T (tritium): hydrogen-2 and hydrogen-3. */
export function hydrogenLabelMass(code: number): number {
  if (code === 0x44) return 2;
  if (code === 0x54) return 3;
  return 0;
}

/**
 * True when `massNumber` can be a mass number of `element` when it is written as a superscript or
 * after a hyphen: at least the atomic number (no nucleus has fewer nucleons than protons), and not
 * far past the heaviest nuclides known (about three nucleons per proton for the lightest elements).
 */
export function isMassNumberOf(massNumber: number, element: ElementData): boolean {
  return massNumber >= element.atomicNumber && massNumber <= 3 * element.atomicNumber + 10;
}

/**
 * True when a bare number in front of a formula ("13CO2") is better read as a mass number than as
 * a count of molecules ("10CO2" in an equation): two or more digits, and near the nuclides of the
 * element, whose mass numbers cluster around the line of beta stability.
 */
export function isLeadingMassNumberOf(massNumber: number, digits: number, element: ElementData): boolean {
  if (digits < 2 || massNumber < element.atomicNumber) return false;
  const stable = stableMassNumber(element.atomicNumber);
  return massNumber >= stable - 2 - 0.05 * stable && massNumber <= stable + 2 + 0.08 * stable;
}

/**
 * Mass number on the line of beta stability for `atomicNumber`, from the semi-empirical mass
 * formula's Z = A / (1.98 + 0.0155 A^(2/3)), solved for A by a few fixed-point steps.
 */
function stableMassNumber(atomicNumber: number): number {
  let mass = 2 * atomicNumber;
  for (let step = 0; step < 6; step++) mass = atomicNumber * (1.98 + 0.0155 * Math.cbrt(mass * mass));
  return mass;
}

/**
 * True when "X-N" after a lone symbol names a nuclide rather than a charge written sign first:
 * "C-14" and "U-235" are nuclides, "O-2" and "N-3" are oxide and nitride.
 */
export function isHyphenatedMassNumber(massNumber: number, element: ElementData): boolean {
  return massNumber >= Math.max(2, 2 * element.atomicNumber - 2) && isMassNumberOf(massNumber, element);
}
