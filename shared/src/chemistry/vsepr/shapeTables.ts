/**
 * VSEPR's tables: electron geometry from the steric number, molecular geometry from the steric
 * number and the number of lone-pair domains, hybridization from the steric number.
 */
import type { ElectronGeometry, Hybridization, MolecularGeometry } from "../types";

export const ELECTRON_GEOMETRY_BY_STERIC_NUMBER: Readonly<Record<number, ElectronGeometry>> = {
  2: "linear",
  3: "trigonal planar",
  4: "tetrahedral",
  5: "trigonal bipyramidal",
  6: "octahedral",
  7: "pentagonal bipyramidal",
};

/** Molecular geometry by steric number, then by lone-pair domains (index = lone pairs). */
const MOLECULAR_GEOMETRY: Readonly<Record<number, readonly MolecularGeometry[]>> = {
  2: ["linear"],
  3: ["trigonal planar", "bent"],
  4: ["tetrahedral", "trigonal pyramidal", "bent"],
  5: ["trigonal bipyramidal", "seesaw", "T-shaped", "linear"],
  6: ["octahedral", "square pyramidal", "square planar", "T-shaped", "linear"],
  7: ["pentagonal bipyramidal", "pentagonal pyramidal", "pentagonal planar"],
};

export const HYBRIDIZATION_BY_STERIC_NUMBER: Readonly<Record<number, Hybridization>> = {
  2: "sp",
  3: "sp2",
  4: "sp3",
  5: "sp3d",
  6: "sp3d2",
  7: "sp3d3",
};

/** The molecular geometry, or undefined for combinations no centre with two neighbours has. */
export function molecularGeometryFor(stericNumber: number, loneDomains: number): MolecularGeometry | undefined {
  return MOLECULAR_GEOMETRY[stericNumber]?.[loneDomains];
}

/** AXE notation: AX4E1 for SF4, AX4 for CH4. */
export function axeNotation(bondingDomains: number, loneDomains: number): string {
  return loneDomains > 0 ? `AX${bondingDomains}E${loneDomains}` : `AX${bondingDomains}`;
}
