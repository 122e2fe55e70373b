/** Molecules given as SMILES, for checks that need a whole carbon framework. */

export interface SmilesDipoleCase {
  readonly name: string;
  readonly smiles: string;
  readonly debye: number;
}

/**
 * Known model limitation: the 3D builder relaxes cages like cubane into a distorted shape with
 * no symmetry, so the point group allows a dipole the Oh molecule cannot have.
 */
export const CAGE_DIPOLES: readonly SmilesDipoleCase[] = [
  { name: "cubane", smiles: "C12C3C4C1C5C2C3C45", debye: 0 }, // common practice: Oh, no permanent dipole
  { name: "adamantane", smiles: "C1C2CC3CC1CC(C2)C3", debye: 0 }, // common practice: Td, no permanent dipole
  { name: "bicyclo[2.2.2]octane", smiles: "C1CC2CCC1CC2", debye: 0 }, // common practice: D3h, no permanent dipole
  { name: "prismane", smiles: "C12C3C1C4C2C34", debye: 0 }, // common practice: D3h, no permanent dipole
];

export const SMILES_DIPOLES: readonly SmilesDipoleCase[] = [
  { name: "benzene", smiles: "c1ccccc1", debye: 0 }, // common practice: D6h, no permanent dipole
  { name: "ethane", smiles: "CC", debye: 0 }, // common practice: D3d, no permanent dipole
  { name: "ethylene", smiles: "C=C", debye: 0 }, // common practice: D2h, no permanent dipole
  { name: "acetylene", smiles: "C#C", debye: 0 }, // common practice: D∞h, no permanent dipole
  { name: "cyanogen", smiles: "N#CC#N", debye: 0 }, // common practice: D∞h, no permanent dipole
  { name: "allene", smiles: "C=C=C", debye: 0 }, // common practice: D2d, no permanent dipole
  { name: "2-butyne", smiles: "CC#CC", debye: 0 }, // common practice: D3h/D3d, no permanent dipole
  { name: "cyclopropane", smiles: "C1CC1", debye: 0 }, // common practice: D3h, no permanent dipole
  { name: "1,4-dichlorobenzene", smiles: "Clc1ccc(Cl)cc1", debye: 0 }, // common practice: D2h, no permanent dipole
  { name: "carbon dioxide", smiles: "O=C=O", debye: 0 }, // common practice: D∞h, no permanent dipole
  { name: "cyclohexane", smiles: "C1CCCCC1", debye: 0 }, // common practice: chair D3d, no permanent dipole
  { name: "trans-1,2-dichloroethene", smiles: "Cl/C=C/Cl", debye: 0 }, // common practice: C2h, no permanent dipole
  { name: "cis-1,2-dichloroethene", smiles: "Cl/C=C\\Cl", debye: 1.9 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "trans-difluorodiazene", smiles: "F/N=N/F", debye: 0 }, // common practice: C2h, no permanent dipole
  { name: "cis-difluorodiazene", smiles: "F/N=N\\F", debye: 0.16 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "1,2-dichlorobenzene", smiles: "Clc1ccccc1Cl", debye: 2.5 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "1,3-dichlorobenzene", smiles: "Clc1cccc(Cl)c1", debye: 1.72 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "acetonitrile", smiles: "CC#N", debye: 3.92 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "pyridine", smiles: "c1ccncc1", debye: 2.2 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "chlorobenzene", smiles: "Clc1ccccc1", debye: 1.69 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "fluorobenzene", smiles: "Fc1ccccc1", debye: 1.6 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "nitromethane", smiles: "C[N+](=O)[O-]", debye: 3.46 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "propyne", smiles: "CC#C", debye: 0.78 }, // from memory: CRC Handbook, Dipole Moments table
  // Hydrocarbons whose point group allows a dipole (C3v, Cs). Propane (0.08 D) and isobutane (0.13 D)
  // are left out: practice calls them nonpolar although their point groups allow a dipole.
  { name: "toluene", smiles: "Cc1ccccc1", debye: 0.375 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "propene", smiles: "CC=C", debye: 0.366 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "acetone", smiles: "CC(C)=O", debye: 2.88 }, // from memory: CRC Handbook, Dipole Moments table
  { name: "ethanol", smiles: "CCO", debye: 1.69 }, // from memory: CRC Handbook, Dipole Moments table
];

/** Carbon frameworks whose carbons' hybridization openchemlib can count from pi bonds. */
export const CARBON_FRAMEWORKS: readonly string[] = [
  "CC(=O)O",
  "C=CC#N",
  "c1ccccc1",
  "N#CC#N",
  "C=C=C",
  "CC#CC",
  "C1CC1",
  "OC(=O)C(=O)O",
  "CC(C)=O",
  "C=CC=C",
  "CC(=O)N",
  "c1ccncc1",
  "C#CC=CC",
  "OCC(O)CO",
  "O=C=C=C=O",
];

export interface SmilesResonanceCase {
  readonly name: string;
  readonly smiles: string;
  readonly forms: number;
}

// from memory: general chemistry and organic text conventions (equivalent Kekulé or charge-shifted
// structures); a species must count the same whichever notation it arrives in
export const SMILES_RESONANCE: readonly SmilesResonanceCase[] = [
  { name: "benzene", smiles: "c1ccccc1", forms: 2 },
  { name: "naphthalene", smiles: "c1ccc2ccccc2c1", forms: 3 },
  { name: "carbonate", smiles: "[O-]C(=O)[O-]", forms: 3 },
  { name: "acetate", smiles: "CC(=O)[O-]", forms: 2 },
  { name: "nitromethane", smiles: "C[N+](=O)[O-]", forms: 2 },
  { name: "nitrate", smiles: "[O-][N+](=O)[O-]", forms: 3 },
];
