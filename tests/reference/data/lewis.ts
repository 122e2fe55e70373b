/** Lewis-structure facts that general chemistry and inorganic texts agree on. */
import type { MolecularGeometry } from "../../../shared/src/index";

export interface ElectronCountCase {
  readonly species: string;
  readonly valenceElectrons: number;
}

// common practice: sum of group valence electrons, plus one per negative charge, minus one per positive
export const VALENCE_ELECTRON_COUNTS: readonly ElectronCountCase[] = [
  { species: "SO4^2-", valenceElectrons: 32 },
  { species: "NH4+", valenceElectrons: 8 },
  { species: "PO4^3-", valenceElectrons: 32 },
  { species: "CO3^2-", valenceElectrons: 24 },
  { species: "NO3-", valenceElectrons: 24 },
  { species: "I3-", valenceElectrons: 22 },
  { species: "N3-", valenceElectrons: 16 },
  { species: "ClO4-", valenceElectrons: 32 },
  { species: "XeOF4", valenceElectrons: 42 },
  { species: "H2SO4", valenceElectrons: 32 },
  { species: "HNO3", valenceElectrons: 24 },
  { species: "H3O+", valenceElectrons: 8 },
  { species: "CN-", valenceElectrons: 10 },
  { species: "OH-", valenceElectrons: 8 },
  { species: "BF4-", valenceElectrons: 32 },
  { species: "ICl4-", valenceElectrons: 36 },
  { species: "SF4", valenceElectrons: 34 },
  { species: "XeF4", valenceElectrons: 36 },
  { species: "O3", valenceElectrons: 18 },
  { species: "NO2", valenceElectrons: 17 },
  { species: "ClO2", valenceElectrons: 19 },
  { species: "NO", valenceElectrons: 11 },
  { species: "NO2+", valenceElectrons: 16 },
  { species: "SO3^2-", valenceElectrons: 26 },
];

export interface ResonanceCase {
  readonly species: string;
  readonly forms: number;
}

// from memory: general chemistry text conventions (equivalent octet structures differing only in
// where the double bond sits)
export const RESONANCE_FORMS: readonly ResonanceCase[] = [
  { species: "NO3-", forms: 3 },
  { species: "CO3^2-", forms: 3 },
  { species: "O3", forms: 2 },
  { species: "NO2-", forms: 2 },
  { species: "HCOO-", forms: 2 },
  { species: "CH3COO-", forms: 2 },
  { species: "CH3CO2-", forms: 2 },
  { species: "HCO3-", forms: 2 },
];

export interface FormalChargeCase {
  readonly species: string;
  /** Element of the atom with the most bonds. */
  readonly hub: string;
  readonly hubFormalCharge: number;
}

// from memory: general chemistry text conventions
export const HUB_FORMAL_CHARGES: readonly FormalChargeCase[] = [
  { species: "O3", hub: "O", hubFormalCharge: 1 },
  { species: "N2O", hub: "N", hubFormalCharge: 1 },
  { species: "NO3-", hub: "N", hubFormalCharge: 1 },
  { species: "NH4+", hub: "N", hubFormalCharge: 1 },
  { species: "H3O+", hub: "O", hubFormalCharge: 1 },
  { species: "BF4-", hub: "B", hubFormalCharge: -1 },
  { species: "NO2+", hub: "N", hubFormalCharge: 1 },
  { species: "CO2", hub: "C", hubFormalCharge: 0 },
  { species: "N3-", hub: "N", hubFormalCharge: 1 },
];

export interface SkeletonCase {
  readonly species: string;
  /** Element of the atom with the most bonds. */
  readonly hub: string;
  /** Elements bonded to it, sorted. */
  readonly neighbours: readonly string[];
}

// common practice: the skeleton with the smallest formal charges wins; H and F are always terminal
export const SKELETONS: readonly SkeletonCase[] = [
  { species: "Cl2O", hub: "O", neighbours: ["Cl", "Cl"] },
  { species: "N2O", hub: "N", neighbours: ["N", "O"] },
  { species: "O3", hub: "O", neighbours: ["O", "O"] },
  { species: "N3-", hub: "N", neighbours: ["N", "N"] },
  { species: "I3-", hub: "I", neighbours: ["I", "I"] },
  { species: "HOCl", hub: "O", neighbours: ["Cl", "H"] },
  { species: "HCN", hub: "C", neighbours: ["H", "N"] },
  { species: "OF2", hub: "O", neighbours: ["F", "F"] },
  { species: "NOCl", hub: "N", neighbours: ["Cl", "O"] },
  { species: "SOCl2", hub: "S", neighbours: ["Cl", "Cl", "O"] },
  { species: "POCl3", hub: "P", neighbours: ["Cl", "Cl", "Cl", "O"] },
  { species: "XeOF4", hub: "Xe", neighbours: ["F", "F", "F", "F", "O"] },
  // from memory: thiazyl fluoride is N≡S-F, bent at sulfur, whatever order the formula is written in
  { species: "NSF", hub: "S", neighbours: ["F", "N"] },
  { species: "FSN", hub: "S", neighbours: ["F", "N"] },
  // from memory: thiazyl trifluoride is N≡SF3, tetrahedral at sulfur
  { species: "NSF3", hub: "S", neighbours: ["F", "F", "F", "N"] },
  // from memory: inorganic text conventions: nitryl chloride and nitryl fluoride are planar with N central
  { species: "NO2Cl", hub: "N", neighbours: ["Cl", "O", "O"] },
  { species: "NO2F", hub: "N", neighbours: ["F", "O", "O"] },
];

// from memory: general chemistry text conventions (incomplete octet, no multiple bonds drawn)
export const ELECTRON_DEFICIENT: readonly string[] = ["BF3", "BeCl2", "BCl3", "BH3", "AlCl3"];
// common practice: every atom has an octet (H a duet)
export const FULL_OCTETS: readonly string[] = ["NH3", "CH4", "BF4-", "CO2", "H2O", "NH4+"];

// common practice: an odd number of valence electrons leaves one unpaired
export const RADICALS: readonly string[] = ["NO2", "ClO2", "NO"];
// common practice: even electron counts pair up in a Lewis structure
export const NOT_RADICALS: readonly string[] = ["O3", "SO2", "NO2-", "NO+", "NO2+", "CO"];

// from memory: inorganic text conventions (more than eight electrons only from period 3 on)
export const EXPANDED_OCTET: readonly string[] = ["SF6", "PCl5", "XeF4", "SF4", "ClF3", "XeF2", "I3-", "PCl6-", "BrF5", "ICl4-", "IF7"];
export const NO_EXPANDED_OCTET: readonly string[] = [
  "CO2",
  "NO3-",
  "N2O",
  "O3",
  "CH4",
  "NH4+",
  "BF4-",
  "CO3^2-",
  "HNO3",
  "NO2",
  "H2O",
  "N3-",
  "BF3",
  "HCN",
];

export interface IonShapeCase {
  readonly species: string;
  readonly centre: string;
  readonly axe: string;
  readonly molecularGeometry: MolecularGeometry;
}

// from memory: general chemistry and inorganic text conventions
export const ION_SHAPES: readonly IonShapeCase[] = [
  { species: "NH4+", centre: "N", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "H3O+", centre: "O", axe: "AX3E1", molecularGeometry: "trigonal pyramidal" },
  { species: "ICl4-", centre: "I", axe: "AX4E2", molecularGeometry: "square planar" },
  { species: "I3-", centre: "I", axe: "AX2E3", molecularGeometry: "linear" },
  { species: "ICl2-", centre: "I", axe: "AX2E3", molecularGeometry: "linear" },
  { species: "ClF2+", centre: "Cl", axe: "AX2E2", molecularGeometry: "bent" },
  { species: "SF5-", centre: "S", axe: "AX5E1", molecularGeometry: "square pyramidal" },
  { species: "PCl4+", centre: "P", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "PCl6-", centre: "P", axe: "AX6", molecularGeometry: "octahedral" },
  { species: "BrF4-", centre: "Br", axe: "AX4E2", molecularGeometry: "square planar" },
  { species: "XeF5+", centre: "Xe", axe: "AX5E1", molecularGeometry: "square pyramidal" },
  { species: "IF4+", centre: "I", axe: "AX4E1", molecularGeometry: "seesaw" },
  { species: "XeF3+", centre: "Xe", axe: "AX3E2", molecularGeometry: "T-shaped" },
  { species: "BF4-", centre: "B", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "PF6-", centre: "P", axe: "AX6", molecularGeometry: "octahedral" },
  { species: "SiF6^2-", centre: "Si", axe: "AX6", molecularGeometry: "octahedral" },
  { species: "NO2+", centre: "N", axe: "AX2", molecularGeometry: "linear" },
  { species: "NO2-", centre: "N", axe: "AX2E1", molecularGeometry: "bent" },
  { species: "ClO3-", centre: "Cl", axe: "AX3E1", molecularGeometry: "trigonal pyramidal" },
  { species: "SO3^2-", centre: "S", axe: "AX3E1", molecularGeometry: "trigonal pyramidal" },
  { species: "ClO4-", centre: "Cl", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "CO3^2-", centre: "C", axe: "AX3", molecularGeometry: "trigonal planar" },
  { species: "N3-", centre: "N", axe: "AX2", molecularGeometry: "linear" },
];

// from memory: inorganic text conventions for interhalogens, noble-gas compounds and small hydrides
export const MOLECULE_SHAPES: readonly IonShapeCase[] = [
  { species: "KrF2", centre: "Kr", axe: "AX2E3", molecularGeometry: "linear" },
  { species: "ICl3", centre: "I", axe: "AX3E2", molecularGeometry: "T-shaped" },
  { species: "XeO3", centre: "Xe", axe: "AX3E1", molecularGeometry: "trigonal pyramidal" },
  { species: "XeO4", centre: "Xe", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "XeOF4", centre: "Xe", axe: "AX5E1", molecularGeometry: "square pyramidal" },
  { species: "ClF5", centre: "Cl", axe: "AX5E1", molecularGeometry: "square pyramidal" },
  { species: "IF5", centre: "I", axe: "AX5E1", molecularGeometry: "square pyramidal" },
  { species: "BrF3", centre: "Br", axe: "AX3E2", molecularGeometry: "T-shaped" },
  { species: "SeF4", centre: "Se", axe: "AX4E1", molecularGeometry: "seesaw" },
  { species: "TeCl4", centre: "Te", axe: "AX4E1", molecularGeometry: "seesaw" },
  { species: "BeH2", centre: "Be", axe: "AX2", molecularGeometry: "linear" },
  { species: "Br3-", centre: "Br", axe: "AX2E3", molecularGeometry: "linear" },
  { species: "Cl3+", centre: "Cl", axe: "AX2E2", molecularGeometry: "bent" },
  { species: "H2F+", centre: "F", axe: "AX2E2", molecularGeometry: "bent" },
  { species: "S2O3^2-", centre: "S", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "POCl3", centre: "P", axe: "AX4", molecularGeometry: "tetrahedral" },
  { species: "SOCl2", centre: "S", axe: "AX3E1", molecularGeometry: "trigonal pyramidal" },
  { species: "COCl2", centre: "C", axe: "AX3", molecularGeometry: "trigonal planar" },
  { species: "NOCl", centre: "N", axe: "AX2E1", molecularGeometry: "bent" },
  { species: "HCN", centre: "C", axe: "AX2", molecularGeometry: "linear" },
  { species: "N2O", centre: "N", axe: "AX2", molecularGeometry: "linear" },
];

export interface CentreShape {
  readonly atom: string;
  /** How many centres of this element have this shape. */
  readonly count: number;
  readonly axe: string;
  readonly molecularGeometry: MolecularGeometry;
}

export interface MultiCentreCase {
  readonly species: string;
  readonly centres: readonly CentreShape[];
}

// common practice: in oxoacids the acidic H sits on O, which is then a bent AX2E2 centre
export const MULTI_CENTRE: readonly MultiCentreCase[] = [
  {
    species: "H2SO4",
    centres: [
      { atom: "S", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "O", count: 2, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "HNO3",
    centres: [
      { atom: "N", count: 1, axe: "AX3", molecularGeometry: "trigonal planar" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "H3PO4",
    centres: [
      { atom: "P", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "O", count: 3, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "HClO4",
    centres: [
      { atom: "Cl", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "CH3OH",
    centres: [
      { atom: "C", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  // common practice: AXE counts every lone pair on the atom, so a hydroxyl O next to C=O stays AX2E2
  // (its measured C-O-H angle, about 106°, sits near 109.5°, not 120°)
  {
    species: "HCOOH",
    centres: [
      { atom: "C", count: 1, axe: "AX3", molecularGeometry: "trigonal planar" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "CH3COOH",
    centres: [
      { atom: "C", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "C", count: 1, axe: "AX3", molecularGeometry: "trigonal planar" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  // common practice: CO2H after a carbon is the carboxyl group, the usual way to write acetic acid
  {
    species: "CH3CO2H",
    centres: [
      { atom: "C", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "C", count: 1, axe: "AX3", molecularGeometry: "trigonal planar" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "CH3CH2OH",
    centres: [
      { atom: "C", count: 2, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "CH3OCH3",
    centres: [
      { atom: "C", count: 2, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
    ],
  },
  {
    species: "(CH3)2CO",
    centres: [
      { atom: "C", count: 2, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "C", count: 1, axe: "AX3", molecularGeometry: "trigonal planar" },
    ],
  },
  {
    species: "CH3CHO",
    centres: [
      { atom: "C", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "C", count: 1, axe: "AX3", molecularGeometry: "trigonal planar" },
    ],
  },
  {
    species: "CH3CN",
    centres: [
      { atom: "C", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "C", count: 1, axe: "AX2", molecularGeometry: "linear" },
    ],
  },
  {
    species: "HCCH",
    centres: [{ atom: "C", count: 2, axe: "AX2", molecularGeometry: "linear" }],
  },
  {
    species: "CH3NH2",
    centres: [
      { atom: "C", count: 1, axe: "AX4", molecularGeometry: "tetrahedral" },
      { atom: "N", count: 1, axe: "AX3E1", molecularGeometry: "trigonal pyramidal" },
    ],
  },
  // common practice: a condensed formula is read in written order; HOCN is cyanic acid, H-O-C≡N
  {
    species: "HOCN",
    centres: [
      { atom: "O", count: 1, axe: "AX2E2", molecularGeometry: "bent" },
      { atom: "C", count: 1, axe: "AX2", molecularGeometry: "linear" },
    ],
  },
  {
    species: "HNCO",
    centres: [
      { atom: "N", count: 1, axe: "AX2E1", molecularGeometry: "bent" },
      { atom: "C", count: 1, axe: "AX2", molecularGeometry: "linear" },
    ],
  },
  {
    species: "H2O2",
    centres: [{ atom: "O", count: 2, axe: "AX2E2", molecularGeometry: "bent" }],
  },
  {
    species: "N2H4",
    centres: [{ atom: "N", count: 2, axe: "AX3E1", molecularGeometry: "trigonal pyramidal" }],
  },
];

export interface NameCase {
  readonly name: string;
  readonly formula: string;
  /** Element of the centre to compare. */
  readonly centre: string;
}

// common practice: IUPAC stoichiometric names and the accepted common names of ions and molecules
export const NAMES: readonly NameCase[] = [
  { name: "sulfur tetrafluoride", formula: "SF4", centre: "S" },
  { name: "dichlorine monoxide", formula: "Cl2O", centre: "O" },
  { name: "triiodide", formula: "I3-", centre: "I" },
  { name: "perchlorate", formula: "ClO4-", centre: "Cl" },
  { name: "xenon tetrafluoride", formula: "XeF4", centre: "Xe" },
  { name: "phosphorus pentachloride", formula: "PCl5", centre: "P" },
  { name: "nitrate", formula: "NO3-", centre: "N" },
  { name: "sulfate", formula: "SO4^2-", centre: "S" },
  { name: "ammonium", formula: "NH4+", centre: "N" },
  { name: "ammonia", formula: "NH3", centre: "N" },
  { name: "water", formula: "H2O", centre: "O" },
  { name: "carbon dioxide", formula: "CO2", centre: "C" },
  { name: "nitrogen trifluoride", formula: "NF3", centre: "N" },
  { name: "sulfur hexafluoride", formula: "SF6", centre: "S" },
  { name: "sulphur tetrafluoride", formula: "SF4", centre: "S" },
  { name: "Sulfur Tetrafluoride", formula: "SF4", centre: "S" },
  { name: "xenon difluoride", formula: "XeF2", centre: "Xe" },
  { name: "chlorine trifluoride", formula: "ClF3", centre: "Cl" },
  { name: "bromine pentafluoride", formula: "BrF5", centre: "Br" },
  { name: "boron trifluoride", formula: "BF3", centre: "B" },
  { name: "phosphorus trichloride", formula: "PCl3", centre: "P" },
  { name: "nitrogen dioxide", formula: "NO2", centre: "N" },
  { name: "chlorine dioxide", formula: "ClO2", centre: "Cl" },
  { name: "dinitrogen monoxide", formula: "N2O", centre: "N" },
  { name: "ozone", formula: "O3", centre: "O" },
  { name: "methane", formula: "CH4", centre: "C" },
  { name: "carbonate", formula: "CO3^2-", centre: "C" },
  { name: "phosphate", formula: "PO4^3-", centre: "P" },
  { name: "nitrite", formula: "NO2-", centre: "N" },
  { name: "chlorate", formula: "ClO3-", centre: "Cl" },
  { name: "sulfite", formula: "SO3^2-", centre: "S" },
  { name: "azide", formula: "N3-", centre: "N" },
  { name: "hydronium", formula: "H3O+", centre: "O" },
  { name: "sulfur(VI) fluoride", formula: "SF6", centre: "S" },
  { name: "thionyl chloride", formula: "SOCl2", centre: "S" },
  { name: "sulfuryl chloride", formula: "SO2Cl2", centre: "S" },
  { name: "nitrosyl chloride", formula: "NOCl", centre: "N" },
  // from memory: inorganic text conventions; both are common in gas-handling notes
  { name: "phosphoryl chloride", formula: "POCl3", centre: "P" },
  { name: "nitryl chloride", formula: "NO2Cl", centre: "N" },
];

export interface NotationCase {
  readonly written: string;
  readonly plain: string;
  readonly centre: string;
}

// common practice: how chemists write the same species in prose, mhchem and Unicode
export const NOTATIONS: readonly NotationCase[] = [
  { written: "\\ce{SF4}", plain: "SF4", centre: "S" },
  { written: "\\ce{NO3-}", plain: "NO3-", centre: "N" },
  { written: "\\ce{SO4^2-}", plain: "SO4^2-", centre: "S" },
  { written: "SF₄", plain: "SF4", centre: "S" },
  { written: "SO₄²⁻", plain: "SO4^2-", centre: "S" },
  { written: "NH₄⁺", plain: "NH4+", centre: "N" },
  { written: "SO4 2-", plain: "SO4^2-", centre: "S" },
  { written: "SO4(2-)", plain: "SO4^2-", centre: "S" },
  { written: "SO4^{2-}", plain: "SO4^2-", centre: "S" },
  { written: "SO4--", plain: "SO4^2-", centre: "S" },
  { written: "[PO4]3-", plain: "PO4^3-", centre: "P" },
  { written: "NH4^+", plain: "NH4+", centre: "N" },
];
