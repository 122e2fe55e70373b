/**
 * Measured gas-phase bond angles at the central atom, with the VSEPR class and the ideal angle of
 * its electron geometry that the measured angle deviates from.
 */

/** Which pair of positions an angle spans, where the electron geometry has more than one kind. */
export type PositionPair = "axial-axial" | "axial-equatorial" | "equatorial-equatorial" | "apical-basal";

export interface MeasuredAngleCase {
  readonly species: string;
  readonly centre: string;
  /** The atoms spanning the angle, for messages only: "F(ax)-S-F(ax)". */
  readonly angle: string;
  readonly degrees: number;
  /** AXE class of the centre; NO2 and ClO2 count the odd electron as a domain (common practice). */
  readonly axe: string;
  /** Ideal angle of the electron geometry for this pair of positions. */
  readonly ideal: number;
  readonly positions?: PositionPair;
  /** `species` is SMILES, for molecules a formula cannot pin down (rings, chains). */
  readonly smiles?: boolean;
}

const GAS_PHASE = "CRC Handbook, Structures of Free Molecules in the Gas Phase";

/** Where every angle below comes from; printed in failure messages. */
export const MEASURED_ANGLE_SOURCE = `from memory: ${GAS_PHASE}`;

export const MEASURED_ANGLES: readonly MeasuredAngleCase[] = [
  // AX2E2, ideal 109.5: lone pairs and heavier centres squeeze the angle.
  { species: "H2O", centre: "O", angle: "H-O-H", degrees: 104.5, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "H2S", centre: "S", angle: "H-S-H", degrees: 92.1, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "H2Se", centre: "Se", angle: "H-Se-H", degrees: 90.6, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "OF2", centre: "O", angle: "F-O-F", degrees: 103.1, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "Cl2O", centre: "O", angle: "Cl-O-Cl", degrees: 110.9, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SCl2", centre: "S", angle: "Cl-S-Cl", degrees: 102.8, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "HOCl", centre: "O", angle: "H-O-Cl", degrees: 103.0, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CH3OH", centre: "O", angle: "C-O-H", degrees: 108.5, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CH3OCH3", centre: "O", angle: "C-O-C", degrees: 111.7, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "HCOOH", centre: "O", angle: "C-O-H", degrees: 106.3, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "H2O2", centre: "O", angle: "H-O-O", degrees: 94.8, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "ClO2", centre: "Cl", angle: "O-Cl-O", degrees: 117.4, axe: "AX2E2", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // AX3E1, ideal 109.5.
  { species: "NH3", centre: "N", angle: "H-N-H", degrees: 106.7, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "PH3", centre: "P", angle: "H-P-H", degrees: 93.3, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "AsH3", centre: "As", angle: "H-As-H", degrees: 92.1, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SbH3", centre: "Sb", angle: "H-Sb-H", degrees: 91.6, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "NF3", centre: "N", angle: "F-N-F", degrees: 102.2, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "NCl3", centre: "N", angle: "Cl-N-Cl", degrees: 107.1, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "PF3", centre: "P", angle: "F-P-F", degrees: 97.8, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "PCl3", centre: "P", angle: "Cl-P-Cl", degrees: 100.3, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "PBr3", centre: "P", angle: "Br-P-Br", degrees: 101.0, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "AsCl3", centre: "As", angle: "Cl-As-Cl", degrees: 98.6, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SOCl2", centre: "S", angle: "Cl-S-Cl", degrees: 96.2, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SOCl2", centre: "S", angle: "O-S-Cl", degrees: 106.3, axe: "AX3E1", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // AX2E1, ideal 120.
  { species: "SO2", centre: "S", angle: "O-S-O", degrees: 119.3, axe: "AX2E1", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SeO2", centre: "Se", angle: "O-Se-O", degrees: 113.8, axe: "AX2E1", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "O3", centre: "O", angle: "O-O-O", degrees: 116.8, axe: "AX2E1", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "NO2", centre: "N", angle: "O-N-O", degrees: 134.1, axe: "AX2E1", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "NOCl", centre: "N", angle: "O-N-Cl", degrees: 113.3, axe: "AX2E1", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "NOF", centre: "N", angle: "O-N-F", degrees: 110.1, axe: "AX2E1", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // AX3, ideal 120.
  { species: "BF3", centre: "B", angle: "F-B-F", degrees: 120, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "BCl3", centre: "B", angle: "Cl-B-Cl", degrees: 120, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SO3", centre: "S", angle: "O-S-O", degrees: 120, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "H2CO", centre: "C", angle: "H-C-H", degrees: 116.5, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "COF2", centre: "C", angle: "F-C-F", degrees: 107.7, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "c1ccccc1", smiles: true, centre: "C", angle: "C-C-C (benzene)", degrees: 120, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CH2CH2", centre: "C", angle: "H-C-H", degrees: 117.4, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "NO2F", centre: "N", angle: "O-N-O", degrees: 136, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "HNO3", centre: "N", angle: "O-N-O (terminal)", degrees: 130.3, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "COCl2", centre: "C", angle: "Cl-C-Cl", degrees: 111.8, axe: "AX3", ideal: 120 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // AX2, ideal 180.
  { species: "CO2", centre: "C", angle: "O-C-O", degrees: 180, axe: "AX2", ideal: 180 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CS2", centre: "C", angle: "S-C-S", degrees: 180, axe: "AX2", ideal: 180 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "HCN", centre: "C", angle: "H-C-N", degrees: 180, axe: "AX2", ideal: 180 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "HCCH", centre: "C", angle: "H-C-C", degrees: 180, axe: "AX2", ideal: 180 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // AX4, ideal 109.5: double bonds to O open O-X-O and close the others.
  { species: "CH3Cl", centre: "C", angle: "H-C-H", degrees: 110.5, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CH2F2", centre: "C", angle: "F-C-F", degrees: 108.3, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CH2F2", centre: "C", angle: "H-C-H", degrees: 113.7, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CHCl3", centre: "C", angle: "Cl-C-Cl", degrees: 111.3, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CCC", smiles: true, centre: "C", angle: "C-C-C (propane)", degrees: 112.4, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // common practice: a three-membered ring forces 60° whatever the electron geometry says
  { species: "C1CC1", smiles: true, centre: "C", angle: "C-C-C (cyclopropane)", degrees: 60, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "C1CCC1", smiles: true, centre: "C", angle: "C-C-C (cyclobutane)", degrees: 88, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CH4", centre: "C", angle: "H-C-H", degrees: 109.5, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SiH4", centre: "Si", angle: "H-Si-H", degrees: 109.5, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "CCl4", centre: "C", angle: "Cl-C-Cl", degrees: 109.5, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SiF4", centre: "Si", angle: "F-Si-F", degrees: 109.5, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "POCl3", centre: "P", angle: "Cl-P-Cl", degrees: 103.7, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SO2Cl2", centre: "S", angle: "Cl-S-Cl", degrees: 100.3, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SO2Cl2", centre: "S", angle: "O-S-O", degrees: 123.5, axe: "AX4", ideal: 109.5 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // Trigonal bipyramidal electron geometry: axial and equatorial positions differ.
  { species: "PCl5", centre: "P", angle: "Cl(ax)-P-Cl(eq)", degrees: 90, axe: "AX5", ideal: 90, positions: "axial-equatorial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "PCl5", centre: "P", angle: "Cl(eq)-P-Cl(eq)", degrees: 120, axe: "AX5", ideal: 120, positions: "equatorial-equatorial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "PF5", centre: "P", angle: "F(ax)-P-F(ax)", degrees: 180, axe: "AX5", ideal: 180, positions: "axial-axial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SF4", centre: "S", angle: "F(ax)-S-F(ax)", degrees: 173.1, axe: "AX4E1", ideal: 180, positions: "axial-axial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "SF4", centre: "S", angle: "F(eq)-S-F(eq)", degrees: 101.6, axe: "AX4E1", ideal: 120, positions: "equatorial-equatorial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "ClF3", centre: "Cl", angle: "F(ax)-Cl-F(eq)", degrees: 87.5, axe: "AX3E2", ideal: 90, positions: "axial-equatorial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "ClF3", centre: "Cl", angle: "F(ax)-Cl-F(ax)", degrees: 175.0, axe: "AX3E2", ideal: 180, positions: "axial-axial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "BrF3", centre: "Br", angle: "F(ax)-Br-F(eq)", degrees: 86.2, axe: "AX3E2", ideal: 90, positions: "axial-equatorial" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "XeF2", centre: "Xe", angle: "F-Xe-F", degrees: 180, axe: "AX2E3", ideal: 180 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  // Octahedral electron geometry: apical and basal positions of the square pyramid differ.
  { species: "SF6", centre: "S", angle: "F-S-F (cis)", degrees: 90, axe: "AX6", ideal: 90 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "XeF4", centre: "Xe", angle: "F-Xe-F (cis)", degrees: 90, axe: "AX4E2", ideal: 90 }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "BrF5", centre: "Br", angle: "F(ap)-Br-F(bas)", degrees: 84.8, axe: "AX5E1", ideal: 90, positions: "apical-basal" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
  { species: "IF5", centre: "I", angle: "F(ap)-I-F(bas)", degrees: 81.9, axe: "AX5E1", ideal: 90, positions: "apical-basal" }, // from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase
];
