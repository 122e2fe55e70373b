// Whole molecules read from SMILES: every heavy-atom centre's hybridization, the molecular
// formula and each atom's formal charge, checked against RDKit on the same SMILES.
// source: RDKit (WebAssembly build) — hybridization from SMARTS [^0]..[^5] queries, atoms from its JSON
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSmiles, type SpeciesAnalysis } from "../../shared/src/index";
import { loadRdkit, rdkitAtoms, rdkitComposition, type RdkitAtom } from "./rdkitReference";

beforeAll(loadRdkit);

const MOLECULES: readonly { group: string; smiles: string }[] = [
  // inorganic hydrides and simple ions
  ...["O", "N", "S", "[OH3+]", "[NH4+]", "[NH2-]", "[BH4-]", "[PH4+]", "[SiH4]", "NN", "OO", "NO"].map((smiles) => ({
    group: "hydride or ion",
    smiles,
  })),
  // main-group inorganic molecules, expanded octets included
  ...[
    "ClP(Cl)Cl",
    "ClP(Cl)(Cl)(Cl)Cl",
    "FS(F)(F)F",
    "FS(F)(F)(F)(F)F",
    "F[Xe]F",
    "F[Xe](F)(F)F",
    "FI(F)(F)(F)F",
    "F[Xe](F)(F)(F)(F)F",
    "O=S=O",
    "O=S(=O)=O",
    "OS(=O)(=O)O",
    "OP(O)(O)=O",
    "ClP(Cl)(Cl)=O",
    "ClS(Cl)=O",
    "ClS(Cl)(=O)=O",
    "FB(F)F",
    "OB(O)O",
    "F[Si](F)(F)F",
    "Cl[Si](Cl)(Cl)Cl",
    "FN(F)F",
    "FOF",
    "ClOCl",
    "OCl",
    "O[N+](=O)[O-]",
    "[N-]=[N+]=O",
    "[O-][O+]=O",
    "S=C=S",
    "O=C=S",
    "O=[Xe](=O)=O",
  ].map((smiles) => ({ group: "inorganic", smiles })),
  // polyatomic ions
  ...[
    "F[B-](F)(F)F",
    "F[P-](F)(F)(F)(F)F",
    "F[Si-2](F)(F)(F)(F)F",
    "Cl[Al-](Cl)(Cl)Cl",
    "Cl[I-]Cl",
    "I[I-]I",
    "[O-][N+]([O-])=O",
    "[O-]C([O-])=O",
    "[O-]S([O-])(=O)=O",
    "[O-]Cl(=O)(=O)=O",
    "O=[N+]=O",
    "[O-]N=O",
  ].map((smiles) => ({ group: "ion", smiles })),
  // hydrocarbons, allenes, alkynes
  ...["CC", "C=C", "C#C", "C=C=C", "CC=C=CC", "C1CC1", "C#CC#C", "C=CC=C"].map((smiles) => ({ group: "hydrocarbon", smiles })),
  // oxygen and nitrogen functions: alcohols, ethers, carbonyls, acids, esters, amides, nitriles
  ...[
    "CCO",
    "COC",
    "CC=O",
    "CC(C)=O",
    "CC(=O)O",
    "CC(=O)[O-]",
    "CC(=O)OCC",
    "C1CCOC1=O",
    "CC(=O)OC(C)=O",
    "CC(N)=O",
    "CNC(C)=O",
    "CN(C)C=O",
    "O=C1CCCN1",
    "NC(N)=O",
    "NC(N)=[NH2+]",
    "CC#N",
    "N#CCC#N",
    "C=CC#N",
    "C=CC=O",
    "C=CN",
    "N[C@@H](C)C(=O)O",
    "[NH3+]CC([O-])=O",
    "CC(=O)Cl",
    "ClC(Cl)=O",
    "CSC(C)=O",
    "CC(=S)N",
    "CN=C=O",
    "CN=NC",
    "CC=NO",
    "CON=O",
    "COC=C",
    "CC=NN",
    "C[N-]C(C)=O",
    "CN=C(C)N",
    "CC(=O)NO",
  ].map((smiles) => ({ group: "functional group", smiles })),
  // aromatic and heteroaromatic rings
  ...[
    "c1ccccc1",
    "Cc1ccccc1",
    "Oc1ccccc1",
    "[O-]c1ccccc1",
    "Nc1ccccc1",
    "N#Cc1ccccc1",
    "CSc1ccccc1",
    "c1ccncc1",
    "c1cc[nH]c1",
    "c1ccoc1",
    "c1ccsc1",
    "c1cnc[nH]1",
    "c1cn[nH]c1",
    "c1cscn1",
    "c1cocn1",
    "c1cncnc1",
    "c1ccc2[nH]ccc2c1",
    "c1ccc2ncccc2c1",
    "c1ccc2ccccc2c1",
    "Cn1cnc2c1c(=O)n(C)c(=O)n2C",
    "C[n+]1ccccc1",
    "O=c1cc[nH]cc1",
    "[O-][n+]1ccccc1",
  ].map((smiles) => ({ group: "aromatic", smiles })),
  // carbocations and carbanions
  ...["[CH3+]", "[CH3-]", "C[C+](C)C", "CC(C)[CH2+]", "C=C[CH2+]", "C=C[CH2-]", "[CH2-]C=O"].map((smiles) => ({
    group: "carbocation or carbanion",
    smiles,
  })),
  // sulfur, phosphorus and silicon organics; onium ions; 1,3-dipoles
  ...[
    "CS(C)=O",
    "CS(C)(=O)=O",
    "CS(=O)(=O)Nc1ccccc1",
    "COP(=O)(OC)OC",
    "C[N+](C)(C)C",
    "C[N+](=O)[O-]",
    "C=[N+]=[N-]",
    "CC[N+]#[C-]",
    "[N-]=[N+]=NC",
    "C[Si](C)(C)C",
    "CP(C)C",
    "C[S+](C)C",
    "C[O-]",
    "CC(C)(C)[Si](C)(C)O",
    "[O-][Cl+3]([O-])([O-])[O-]",
  ].map((smiles) => ({ group: "S, P, Si and onium", smiles })),
];

/**
 * Where the core and RDKit disagree, every case spelled out; any other disagreement fails.
 * `rightSide` is our judgement of which answer a chemist would give.
 */
const CONJUGATED_O = "RDKit puts one lone pair of an O next to a pi system into it (sp2); the core keeps two-bonded O as AX2E2, sp3";
const CARBANION = "a carbanion next to a pi system is delocalised and planar; the core counts only aromatic ring atoms and three-bonded N";

const EXPECTED_DIFFERENCES: readonly {
  smiles: string;
  atomIndex: number;
  core: string;
  rdkit: string;
  rightSide: "core" | "rdkit" | "either";
  reason: string;
}[] = [
  {
    smiles: "F[Xe](F)(F)(F)(F)F",
    atomIndex: 1,
    core: "sp3d3",
    rdkit: "other",
    rightSide: "core",
    reason: "seven domains (AX6E1): RDKit's hybridization types stop at SP3D2, so it answers OTHER",
  },
  // Conjugated two-bonded O: the bent shape is the same either way; only the label differs.
  { smiles: "CC(=O)O", atomIndex: 3, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  { smiles: "CC(=O)OCC", atomIndex: 3, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  { smiles: "C1CCOC1=O", atomIndex: 3, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  { smiles: "CC(=O)OC(C)=O", atomIndex: 3, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  { smiles: "N[C@@H](C)C(=O)O", atomIndex: 5, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  { smiles: "COC=C", atomIndex: 1, core: "sp3", rdkit: "sp2", rightSide: "either", reason: CONJUGATED_O },
  { smiles: "Oc1ccccc1", atomIndex: 0, core: "sp3", rdkit: "sp2", rightSide: "either", reason: CONJUGATED_O },
  { smiles: "CON=O", atomIndex: 1, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  { smiles: "CC=NO", atomIndex: 3, core: "sp3", rdkit: "sp2", rightSide: "either", reason: CONJUGATED_O },
  { smiles: "O[N+](=O)[O-]", atomIndex: 0, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CONJUGATED_O },
  {
    smiles: "CC=NN",
    atomIndex: 3,
    core: "sp3",
    rdkit: "sp2",
    rightSide: "rdkit",
    reason: "hydrazone NH2 next to C=N: the core flattens three-bonded N only when it is bonded to a pi carbon",
  },
  {
    smiles: "C[N-]C(C)=O",
    atomIndex: 1,
    core: "sp3",
    rdkit: "sp2",
    rightSide: "rdkit",
    reason: "amidate N (two bonds, two lone pairs) is conjugated with C=O; the core flattens three-bonded N only",
  },
  { smiles: "C=C[CH2-]", atomIndex: 2, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CARBANION },
  { smiles: "[CH2-]C=O", atomIndex: 0, core: "sp3", rdkit: "sp2", rightSide: "rdkit", reason: CARBANION },
];

/**
 * RDKit rewrites some expanded-octet SMILES when it reads them (its sanitisation turns
 * Cl(=O)(=O)(=O)[O-] into [Cl+3] with four [O-]); the core keeps the charges as written.
 */
const FORMAL_CHARGE_DIFFERENCES: ReadonlyMap<string, string> = new Map([
  ["[O-]Cl(=O)(=O)=O", "RDKit normalises perchlorate to [Cl+3]([O-])([O-])([O-])[O-]"],
]);

function analysed(smiles: string): SpeciesAnalysis {
  const result = analyzeSmiles(smiles);
  if (!result.ok) throw new Error(`${smiles}: ${result.problem.code} ${result.problem.message}`);
  return result.value;
}

function heavyAtomCentres(analysis: SpeciesAnalysis, heavyAtomCount: number) {
  return analysis.centres.filter((centre) => centre.index < heavyAtomCount);
}

describe("SMILES analysis against RDKit", () => {
  it("covers at least 60 distinct molecules", () => {
    expect(new Set(MOLECULES.map((molecule) => molecule.smiles)).size).toBeGreaterThanOrEqual(60);
  });

  it.each(MOLECULES)("$group $smiles: hybridization of every heavy-atom centre", ({ smiles }) => {
    const reference = rdkitAtoms(smiles);
    const differences = heavyAtomCentres(analysed(smiles), reference.length)
      .filter((centre) => centre.hybridization !== reference[centre.index].hybridization)
      .map((centre) => ({ atomIndex: centre.index, core: centre.hybridization, rdkit: reference[centre.index].hybridization }));
    const expected = EXPECTED_DIFFERENCES.filter((difference) => difference.smiles === smiles).map(({ atomIndex, core, rdkit }) => ({
      atomIndex,
      core,
      rdkit,
    }));
    expect(differences).toEqual(expected);
  });

  it.each(MOLECULES)("$group $smiles: centres are the heavy atoms with two or more neighbours", ({ smiles }) => {
    const reference = rdkitAtoms(smiles);
    const centreIndices = heavyAtomCentres(analysed(smiles), reference.length).map((centre) => centre.index);
    const expected = reference.flatMap((atom, index) => (atom.degree >= 2 ? [index] : []));
    expect(centreIndices).toEqual(expected);
    const centreAtoms = heavyAtomCentres(analysed(smiles), reference.length).map((centre) => centre.atom);
    expect(centreAtoms).toEqual(expected.map((index) => reference[index].symbol));
  });

  it.each(MOLECULES)("$group $smiles: molecular formula, net charge and per-atom formal charges", ({ smiles }) => {
    const reference: RdkitAtom[] = rdkitAtoms(smiles);
    const analysis = analysed(smiles);
    const composition = new Map(analysis.reading.composition.map((part) => [part.symbol, part.count]));
    expect(composition).toEqual(rdkitComposition(reference));
    expect(analysis.reading.charge).toBe(reference.reduce((sum, atom) => sum + atom.formalCharge, 0));
    const atoms = analysis.graph.atoms;
    const sameCharges = expect(atoms.slice(0, reference.length).map((atom) => [atom.symbol, atom.formalCharge]));
    if (FORMAL_CHARGE_DIFFERENCES.has(smiles)) {
      sameCharges.not.toEqual(reference.map((atom) => [atom.symbol, atom.formalCharge]));
    } else {
      sameCharges.toEqual(reference.map((atom) => [atom.symbol, atom.formalCharge]));
    }
    // Hydrogens come after the heavy atoms, uncharged, one per hydrogen RDKit counts.
    const hydrogens = atoms.slice(reference.length);
    expect(hydrogens.length).toBe(reference.reduce((sum, atom) => sum + atom.hydrogens, 0));
    expect(hydrogens.every((atom) => atom.symbol === "H" && atom.formalCharge === 0)).toBe(true);
  });

  it.each(EXPECTED_DIFFERENCES)("listed difference is in the table: $smiles atom $atomIndex", ({ smiles }) => {
    expect(MOLECULES.some((molecule) => molecule.smiles === smiles)).toBe(true);
  });
});
