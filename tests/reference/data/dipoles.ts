/** Measured dipole moments of free molecules, in debye; zero where symmetry forbids a dipole. */

export interface DipoleCase {
  readonly species: string;
  readonly debye: number;
}

export const DIPOLE_MOMENTS: readonly DipoleCase[] = [
  // Polar: lone pairs or unlike ligands leave a net dipole.
  { species: "H2O", debye: 1.85 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "NH3", debye: 1.47 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "SO2", debye: 1.63 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "O3", debye: 0.53 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "NF3", debye: 0.235 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "PF3", debye: 1.03 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "SF4", debye: 0.632 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "ClF3", debye: 0.6 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "BrF5", debye: 1.51 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "IF5", debye: 2.18 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "H2S", debye: 0.97 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "PH3", debye: 0.574 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "AsH3", debye: 0.217 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "PCl3", debye: 0.56 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "SCl2", debye: 0.36 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "Cl2O", debye: 0.78 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "OF2", debye: 0.297 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "ClO2", debye: 1.79 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH3Cl", debye: 1.89 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH2Cl2", debye: 1.6 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CHCl3", debye: 1.04 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH3F", debye: 1.86 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "N2O", debye: 0.161 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "HCN", debye: 2.98 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "H2CO", debye: 2.33 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "SOCl2", debye: 1.45 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "COCl2", debye: 1.17 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "POCl3", debye: 2.54 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "SO2Cl2", debye: 1.81 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "NO2", debye: 0.316 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "HF", debye: 1.83 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "HCl", debye: 1.11 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "HBr", debye: 0.827 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CO", debye: 0.11 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "OCS", debye: 0.715 }, // from memory: CRC Handbook, Dipole Moments table (linear yet polar)
  { species: "ClCN", debye: 2.83 }, // from memory: CRC Handbook, Dipole Moments table (linear yet polar)
  { species: "CH2F2", debye: 1.97 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CHF3", debye: 1.65 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH3Br", debye: 1.82 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "BrF3", debye: 1.19 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "ClF", debye: 0.89 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "ICl", debye: 1.24 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "NO", debye: 0.159 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "NOCl", debye: 1.9 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "COF2", debye: 0.95 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "H2O2", debye: 1.57 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH3OH", debye: 1.7 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH3OCH3", debye: 1.3 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "(CH3)2CO", debye: 2.88 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH3CN", debye: 3.92 }, // from memory: CRC Handbook, Dipole Moments table
  { species: "CH2CHCl", debye: 1.45 }, // from memory: CRC Handbook, Dipole Moments table
  // Nonpolar: the point group has no direction a permanent dipole could point along.
  { species: "CO2", debye: 0 }, // common practice: linear D∞h, no permanent dipole
  { species: "CS2", debye: 0 }, // common practice: linear D∞h, no permanent dipole
  { species: "BeCl2", debye: 0 }, // common practice: linear D∞h in the gas phase, no permanent dipole
  { species: "XeF2", debye: 0 }, // common practice: linear D∞h, no permanent dipole
  { species: "CH4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "CCl4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "CF4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "SiF4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "SiCl4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "BF3", debye: 0 }, // common practice: trigonal planar D3h, no permanent dipole
  { species: "BCl3", debye: 0 }, // common practice: trigonal planar D3h, no permanent dipole
  { species: "SO3", debye: 0 }, // common practice: trigonal planar D3h, no permanent dipole
  { species: "PCl5", debye: 0 }, // common practice: trigonal bipyramidal D3h, no permanent dipole
  { species: "PCl3F2", debye: 0 }, // common practice: both F take the axial sites (D3h), no permanent dipole
  { species: "PF5", debye: 0 }, // common practice: trigonal bipyramidal D3h, no permanent dipole
  { species: "SF6", debye: 0 }, // common practice: octahedral Oh, no permanent dipole
  { species: "SeF6", debye: 0 }, // common practice: octahedral Oh, no permanent dipole
  { species: "IF7", debye: 0 }, // common practice: pentagonal bipyramidal D5h, no permanent dipole
  { species: "KrF2", debye: 0 }, // common practice: linear D∞h, no permanent dipole
  { species: "BH3", debye: 0 }, // common practice: trigonal planar D3h, no permanent dipole
  { species: "GeH4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "XeO4", debye: 0 }, // common practice: tetrahedral Td, no permanent dipole
  { species: "XeF4", debye: 0 }, // common practice: square planar D4h, no permanent dipole
  { species: "CH3", debye: 0 }, // from memory: spectroscopic structure of the methyl radical, planar D3h, no permanent dipole
  { species: "HCCH", debye: 0 }, // common practice: acetylene is linear D∞h, no permanent dipole
  { species: "CH2CH2", debye: 0 }, // common practice: ethylene is planar D2h, no permanent dipole
  { species: "N2", debye: 0 }, // common practice: homonuclear diatomic, no permanent dipole
  { species: "Cl2", debye: 0 }, // common practice: homonuclear diatomic, no permanent dipole
];
