/** One real species for every AXE class from AX2 to AX7, with its full VSEPR description. */
import type { ElectronGeometry, Hybridization, MolecularGeometry } from "../../../shared/src/index";

export interface VseprClassCase {
  readonly species: string;
  readonly centre: string;
  readonly axe: string;
  readonly stericNumber: number;
  readonly bondingDomains: number;
  readonly lonePairs: number;
  readonly electronGeometry: ElectronGeometry;
  readonly molecularGeometry: MolecularGeometry;
  /** Distinct ideal angles between bonded neighbours, ascending. */
  readonly idealAngles: readonly number[];
  readonly hybridization: Hybridization;
  /** The real molecule departs from the VSEPR shape; the engine may (not must) warn. */
  readonly realShapeDiffers?: boolean;
}

// AX3E3 and AX2E4 are left out: no well-characterised species has those classes.
export const VSEPR_CLASSES: readonly VseprClassCase[] = [
  // common practice: steric number 2, linear, sp
  {
    species: "BeCl2",
    centre: "Be",
    axe: "AX2",
    stericNumber: 2,
    bondingDomains: 2,
    lonePairs: 0,
    electronGeometry: "linear",
    molecularGeometry: "linear",
    idealAngles: [180],
    hybridization: "sp",
  },
  // common practice: steric number 3, trigonal planar electron geometry, sp2
  {
    species: "BF3",
    centre: "B",
    axe: "AX3",
    stericNumber: 3,
    bondingDomains: 3,
    lonePairs: 0,
    electronGeometry: "trigonal planar",
    molecularGeometry: "trigonal planar",
    idealAngles: [120],
    hybridization: "sp2",
  },
  {
    species: "SO2",
    centre: "S",
    axe: "AX2E1",
    stericNumber: 3,
    bondingDomains: 2,
    lonePairs: 1,
    electronGeometry: "trigonal planar",
    molecularGeometry: "bent",
    idealAngles: [120],
    hybridization: "sp2",
  },
  // common practice: steric number 4, tetrahedral electron geometry, sp3
  {
    species: "CH4",
    centre: "C",
    axe: "AX4",
    stericNumber: 4,
    bondingDomains: 4,
    lonePairs: 0,
    electronGeometry: "tetrahedral",
    molecularGeometry: "tetrahedral",
    idealAngles: [109.5],
    hybridization: "sp3",
  },
  {
    species: "NH3",
    centre: "N",
    axe: "AX3E1",
    stericNumber: 4,
    bondingDomains: 3,
    lonePairs: 1,
    electronGeometry: "tetrahedral",
    molecularGeometry: "trigonal pyramidal",
    idealAngles: [109.5],
    hybridization: "sp3",
  },
  {
    species: "H2O",
    centre: "O",
    axe: "AX2E2",
    stericNumber: 4,
    bondingDomains: 2,
    lonePairs: 2,
    electronGeometry: "tetrahedral",
    molecularGeometry: "bent",
    idealAngles: [109.5],
    hybridization: "sp3",
  },
  // common practice: steric number 5, trigonal bipyramidal electron geometry, sp3d; lone pairs equatorial
  {
    species: "PCl5",
    centre: "P",
    axe: "AX5",
    stericNumber: 5,
    bondingDomains: 5,
    lonePairs: 0,
    electronGeometry: "trigonal bipyramidal",
    molecularGeometry: "trigonal bipyramidal",
    idealAngles: [90, 120, 180],
    hybridization: "sp3d",
  },
  {
    species: "SF4",
    centre: "S",
    axe: "AX4E1",
    stericNumber: 5,
    bondingDomains: 4,
    lonePairs: 1,
    electronGeometry: "trigonal bipyramidal",
    molecularGeometry: "seesaw",
    idealAngles: [90, 120, 180],
    hybridization: "sp3d",
  },
  {
    species: "ClF3",
    centre: "Cl",
    axe: "AX3E2",
    stericNumber: 5,
    bondingDomains: 3,
    lonePairs: 2,
    electronGeometry: "trigonal bipyramidal",
    molecularGeometry: "T-shaped",
    idealAngles: [90, 180],
    hybridization: "sp3d",
  },
  {
    species: "XeF2",
    centre: "Xe",
    axe: "AX2E3",
    stericNumber: 5,
    bondingDomains: 2,
    lonePairs: 3,
    electronGeometry: "trigonal bipyramidal",
    molecularGeometry: "linear",
    idealAngles: [180],
    hybridization: "sp3d",
  },
  // common practice: steric number 6, octahedral electron geometry, sp3d2; two lone pairs trans
  {
    species: "SF6",
    centre: "S",
    axe: "AX6",
    stericNumber: 6,
    bondingDomains: 6,
    lonePairs: 0,
    electronGeometry: "octahedral",
    molecularGeometry: "octahedral",
    idealAngles: [90, 180],
    hybridization: "sp3d2",
  },
  {
    species: "BrF5",
    centre: "Br",
    axe: "AX5E1",
    stericNumber: 6,
    bondingDomains: 5,
    lonePairs: 1,
    electronGeometry: "octahedral",
    molecularGeometry: "square pyramidal",
    idealAngles: [90, 180],
    hybridization: "sp3d2",
  },
  {
    species: "XeF4",
    centre: "Xe",
    axe: "AX4E2",
    stericNumber: 6,
    bondingDomains: 4,
    lonePairs: 2,
    electronGeometry: "octahedral",
    molecularGeometry: "square planar",
    idealAngles: [90, 180],
    hybridization: "sp3d2",
  },
  // common practice: steric number 7, pentagonal bipyramidal electron geometry, sp3d3 (72° = 360/5)
  {
    species: "IF7",
    centre: "I",
    axe: "AX7",
    stericNumber: 7,
    bondingDomains: 7,
    lonePairs: 0,
    electronGeometry: "pentagonal bipyramidal",
    molecularGeometry: "pentagonal bipyramidal",
    idealAngles: [72, 90, 144, 180],
    hybridization: "sp3d3",
  },
  {
    species: "XeF6",
    centre: "Xe",
    axe: "AX6E1",
    stericNumber: 7,
    bondingDomains: 6,
    lonePairs: 1,
    electronGeometry: "pentagonal bipyramidal",
    molecularGeometry: "pentagonal pyramidal",
    idealAngles: [72, 90, 144],
    hybridization: "sp3d3",
    realShapeDiffers: true,
  },
  // common practice: XeF5- (known as its tetramethylammonium salt) is pentagonal planar
  {
    species: "XeF5-",
    centre: "Xe",
    axe: "AX5E2",
    stericNumber: 7,
    bondingDomains: 5,
    lonePairs: 2,
    electronGeometry: "pentagonal bipyramidal",
    molecularGeometry: "pentagonal planar",
    idealAngles: [72, 144],
    hybridization: "sp3d3",
  },
];
