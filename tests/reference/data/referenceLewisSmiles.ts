/**
 * Textbook octet Lewis structures written as SMILES (charges where formal charges sit), for species
 * whose best structure is not in dispute. Resonance partners give the same atoms and bonds, so the
 * comparison is by multisets and holds for any one of them.
 */

export interface ReferenceLewisCase {
  readonly species: string;
  readonly smiles: string;
}

// from memory: general chemistry text conventions; each SMILES is sanitised by RDKit in the test
export const REFERENCE_LEWIS: readonly ReferenceLewisCase[] = [
  { species: "CO", smiles: "[C-]#[O+]" },
  { species: "CO2", smiles: "O=C=O" },
  { species: "HCN", smiles: "C#N" },
  { species: "CN-", smiles: "[C-]#N" },
  { species: "O3", smiles: "[O-][O+]=O" },
  { species: "NO3-", smiles: "[O-][N+](=O)[O-]" },
  { species: "CO3^2-", smiles: "[O-]C([O-])=O" },
  { species: "NO2-", smiles: "[O-]N=O" },
  { species: "NO2+", smiles: "O=[N+]=O" },
  { species: "N3-", smiles: "[N-]=[N+]=[N-]" },
  { species: "NH4+", smiles: "[NH4+]" },
  { species: "H3O+", smiles: "[OH3+]" },
  { species: "OH-", smiles: "[OH-]" },
  { species: "BF4-", smiles: "F[B-](F)(F)F" },
  { species: "BF3", smiles: "FB(F)F" },
  { species: "BeCl2", smiles: "Cl[Be]Cl" },
  { species: "HNO3", smiles: "O[N+](=O)[O-]" },
  { species: "H2CO", smiles: "C=O" },
  { species: "COCl2", smiles: "ClC(Cl)=O" },
  { species: "HOCl", smiles: "OCl" },
  { species: "NOCl", smiles: "O=NCl" },
  { species: "OF2", smiles: "FOF" },
  { species: "NF3", smiles: "FN(F)F" },
  { species: "CH3OH", smiles: "CO" },
  { species: "H2O2", smiles: "OO" },
  { species: "N2H4", smiles: "NN" },
  { species: "NH2OH", smiles: "NO" },
  { species: "HCOOH", smiles: "OC=O" },
  { species: "CH2Cl2", smiles: "ClCCl" },
  // from memory: Greenwood & Earnshaw (gaseous metaboric acid is H-O-B=O, boron three-bonded like
  // boric acid's, no charges); the SMILES is checked by RDKit like the others
  { species: "HBO2", smiles: "OB=O" },
  { species: "HOBO", smiles: "OB=O" },
  { species: "CH3OBO", smiles: "COB=O" },
];
