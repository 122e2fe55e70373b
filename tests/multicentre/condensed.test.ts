// Condensed structural formulas (CH3COOH, (CH3)2CO, CH2=CH2, HC≡CH, ...): every centre as a chemist
// would describe it by hand, and the same centres as the SMILES of the same molecule gives.
import { describe, expect, it } from "vitest";
import { analyzeSmiles, analyzeSpecies, type AnalysisResult, type SpeciesAnalysis } from "../../shared/src/index";

// One centre as "atom AXE molecular-geometry hybridization".
// common practice: the VSEPR and hybridization assignments of introductory organic chemistry —
// four single bonds sp3, one double bond sp2, a triple bond or two double bonds sp; an OH or
// ether O two bonds and two lone pairs; an amine N three bonds and one lone pair; an amide or
// urea N planar (its lone pair conjugated with C=O); an ammonium N four bonds.
const C_SP3 = "C AX4 tetrahedral sp3";
const C_SP2 = "C AX3 trigonal planar sp2";
const C_SP = "C AX2 linear sp";
const O_SP3 = "O AX2E2 bent sp3";
const N_AMINE = "N AX3E1 trigonal pyramidal sp3";
const N_AMIDE = "N AX3 trigonal planar sp2";
const N_AMMONIUM = "N AX4 tetrahedral sp3";
const N_AZO = "N AX2E1 bent sp2";
const S_SP3 = "S AX2E2 bent sp3";

const times = (count: number, centre: string): string[] => Array.from({ length: count }, () => centre);

const CASES: readonly { name: string; condensed: string; smiles: string; centres: readonly string[] }[] = [
  { name: "ethanol", condensed: "CH3CH2OH", smiles: "CCO", centres: [C_SP3, C_SP3, O_SP3] },
  { name: "dimethyl ether", condensed: "CH3OCH3", smiles: "COC", centres: [C_SP3, O_SP3, C_SP3] },
  { name: "acetaldehyde", condensed: "CH3CHO", smiles: "CC=O", centres: [C_SP3, C_SP2] },
  { name: "acetone", condensed: "CH3COCH3", smiles: "CC(C)=O", centres: [C_SP3, C_SP2, C_SP3] },
  { name: "acetone, grouped", condensed: "(CH3)2CO", smiles: "CC(=O)C", centres: [C_SP3, C_SP3, C_SP2] },
  { name: "acetic acid", condensed: "CH3COOH", smiles: "CC(=O)O", centres: [C_SP3, C_SP2, O_SP3] },
  { name: "acetonitrile", condensed: "CH3CN", smiles: "CC#N", centres: [C_SP3, C_SP] },
  { name: "neopentane", condensed: "C(CH3)4", smiles: "CC(C)(C)C", centres: times(5, C_SP3) },
  { name: "glycine", condensed: "NH2CH2COOH", smiles: "NCC(=O)O", centres: [N_AMINE, C_SP3, C_SP2, O_SP3] },
  { name: "hydrazine", condensed: "H2NNH2", smiles: "NN", centres: [N_AMINE, N_AMINE] },
  { name: "hydrogen peroxide", condensed: "HOOH", smiles: "OO", centres: [O_SP3, O_SP3] },
  { name: "ethene", condensed: "CH2=CH2", smiles: "C=C", centres: [C_SP2, C_SP2] },
  { name: "ethyne, triple bond written", condensed: "HC≡CH", smiles: "C#C", centres: [C_SP, C_SP] },
  { name: "ethyne, triple bond implied", condensed: "HCCH", smiles: "C#C", centres: [C_SP, C_SP] },
  { name: "methylamine", condensed: "CH3NH2", smiles: "CN", centres: [C_SP3, N_AMINE] },
  { name: "methylammonium", condensed: "CH3NH3+", smiles: "C[NH3+]", centres: [C_SP3, N_AMMONIUM] },
  { name: "acetate", condensed: "CH3COO-", smiles: "CC(=O)[O-]", centres: [C_SP3, C_SP2] },
  { name: "isopropanol", condensed: "CH3CH(OH)CH3", smiles: "CC(O)C", centres: [C_SP3, C_SP3, C_SP3, O_SP3] },
  { name: "isopropanol, grouped", condensed: "(CH3)2CHOH", smiles: "CC(C)O", centres: [C_SP3, C_SP3, C_SP3, O_SP3] },
  { name: "tert-butanol", condensed: "(CH3)3COH", smiles: "CC(C)(C)O", centres: [...times(4, C_SP3), O_SP3] },
  { name: "trifluoroacetic acid", condensed: "CF3COOH", smiles: "OC(=O)C(F)(F)F", centres: [C_SP3, C_SP2, O_SP3] },
  { name: "trichloroethanol", condensed: "CCl3CH2OH", smiles: "OCC(Cl)(Cl)Cl", centres: [C_SP3, C_SP3, O_SP3] },
  { name: "propene", condensed: "CH2=CHCH3", smiles: "C=CC", centres: [C_SP2, C_SP2, C_SP3] },
  { name: "1,3-butadiene", condensed: "CH2=CHCH=CH2", smiles: "C=CC=C", centres: times(4, C_SP2) },
  { name: "acrylonitrile", condensed: "CH2=CHCN", smiles: "C=CC#N", centres: [C_SP2, C_SP2, C_SP] },
  { name: "formic acid", condensed: "HCOOH", smiles: "OC=O", centres: [C_SP2, O_SP3] },
  { name: "methyl acetate", condensed: "CH3COOCH3", smiles: "COC(C)=O", centres: [C_SP3, C_SP2, O_SP3, C_SP3] },
  { name: "dimethylamine", condensed: "(CH3)2NH", smiles: "CNC", centres: [C_SP3, C_SP3, N_AMINE] },
  { name: "urea", condensed: "NH2CONH2", smiles: "NC(N)=O", centres: [N_AMIDE, C_SP2, N_AMIDE] },
  { name: "acetamide", condensed: "CH3CONH2", smiles: "CC(N)=O", centres: [C_SP3, C_SP2, N_AMIDE] },
  { name: "formamide", condensed: "HCONH2", smiles: "NC=O", centres: [C_SP2, N_AMIDE] },
  { name: "ethylene glycol", condensed: "HOCH2CH2OH", smiles: "OCCO", centres: [O_SP3, C_SP3, C_SP3, O_SP3] },
  { name: "propane", condensed: "CH3CH2CH3", smiles: "CCC", centres: times(3, C_SP3) },
  { name: "methanol", condensed: "CH3OH", smiles: "CO", centres: [C_SP3, O_SP3] },
  { name: "formaldehyde", condensed: "HCHO", smiles: "C=O", centres: [C_SP2] },
  { name: "trimethylamine", condensed: "(CH3)3N", smiles: "CN(C)C", centres: [N_AMINE, ...times(3, C_SP3)] },
  { name: "ethylamine", condensed: "CH3CH2NH2", smiles: "CCN", centres: [C_SP3, C_SP3, N_AMINE] },
  { name: "methanethiol", condensed: "CH3SH", smiles: "CS", centres: [C_SP3, S_SP3] },
  { name: "dimethyl sulfide", condensed: "CH3SCH3", smiles: "CSC", centres: [C_SP3, S_SP3, C_SP3] },
  { name: "propyne", condensed: "CH3C≡CH", smiles: "CC#C", centres: [C_SP3, C_SP, C_SP] },
  { name: "dichloromethane", condensed: "CH2Cl2", smiles: "ClCCl", centres: [C_SP3] },
  { name: "hydrogen cyanide", condensed: "HCN", smiles: "C#N", centres: [C_SP] },
  { name: "allene", condensed: "CH2=C=CH2", smiles: "C=C=C", centres: [C_SP2, C_SP, C_SP2] },
  { name: "azomethane", condensed: "CH3N=NCH3", smiles: "CN=NC", centres: [C_SP3, N_AZO, N_AZO, C_SP3] },
  { name: "hydroxylamine", condensed: "NH2OH", smiles: "NO", centres: [N_AMINE, O_SP3] },
  { name: "diethyl ether", condensed: "CH3CH2OCH2CH3", smiles: "CCOCC", centres: [...times(4, C_SP3), O_SP3] },
  { name: "acetyl chloride", condensed: "CH3COCl", smiles: "CC(Cl)=O", centres: [C_SP3, C_SP2] },
  { name: "formate", condensed: "HCOO-", smiles: "[O-]C=O", centres: [C_SP2] },
  { name: "propanoic acid", condensed: "CH3CH2COOH", smiles: "CCC(=O)O", centres: [C_SP3, C_SP3, C_SP2, O_SP3] },
  // common practice: NO2 written after a carbon group is a nitro group, N bonded to C and both O,
  // planar (AX3) like an amide N
  { name: "nitroethane", condensed: "CH3CH2NO2", smiles: "CC[N+](=O)[O-]", centres: [C_SP3, C_SP3, N_AMIDE] },
  { name: "2-methyl-2-nitropropane", condensed: "(CH3)3CNO2", smiles: "CC(C)(C)[N+](=O)[O-]", centres: [...times(4, C_SP3), N_AMIDE] },
  {
    name: "tetranitromethane",
    condensed: "C(NO2)4",
    smiles: "C([N+](=O)[O-])([N+](=O)[O-])([N+](=O)[O-])[N+](=O)[O-]",
    centres: [C_SP3, ...times(4, N_AMIDE)],
  },
];

function analysed(result: AnalysisResult, text: string): SpeciesAnalysis {
  if (!result.ok) throw new Error(`${text}: ${result.problem.code} ${result.problem.message}`);
  return result.value;
}

/** The centres as an order-free multiset: sorted "atom AXE geometry hybridization" strings. */
function centreMultiset(analysis: SpeciesAnalysis): string[] {
  return analysis.centres.map((centre) => `${centre.atom} ${centre.axe} ${centre.molecularGeometry} ${centre.hybridization}`).sort();
}

function compositionOf(analysis: SpeciesAnalysis): Map<string, number> {
  return new Map(analysis.reading.composition.map((part) => [part.symbol, part.count]));
}

describe("condensed structural formulas", () => {
  it("covers at least 30 molecules", () => {
    expect(new Set(CASES.map((entry) => entry.condensed)).size).toBeGreaterThanOrEqual(30);
  });

  it.each(CASES)("$name $condensed: centres as drawn by hand", ({ condensed, centres }) => {
    const analysis = analysed(analyzeSpecies(condensed), condensed);
    expect(analysis.reading.notation).toBe("formula");
    expect(centreMultiset(analysis)).toEqual([...centres].sort());
  });

  it.each(CASES)("$name $condensed: same centres, atoms and charge as the SMILES $smiles", ({ condensed, smiles }) => {
    const fromCondensed = analysed(analyzeSpecies(condensed), condensed);
    const fromSmiles = analysed(analyzeSmiles(smiles), smiles);
    expect(centreMultiset(fromCondensed)).toEqual(centreMultiset(fromSmiles));
    expect(compositionOf(fromCondensed)).toEqual(compositionOf(fromSmiles));
    expect(fromCondensed.reading.charge).toBe(fromSmiles.reading.charge);
    expect(fromCondensed.valenceElectrons).toBe(fromSmiles.valenceElectrons);
  });

  // common practice: CH3NO2 written this way is nitromethane, CH3-NO2 (planar nitro N, AX3), not
  // carbamic acid H2N-C(=O)-OH
  it("nitromethane CH3NO2: sp3 methyl carbon and a planar nitro N, as C[N+](=O)[O-]", () => {
    const analysis = analysed(analyzeSpecies("CH3NO2"), "CH3NO2");
    expect(centreMultiset(analysis)).toEqual([C_SP3, N_AMIDE].sort());
    expect(centreMultiset(analysis)).toEqual(centreMultiset(analysed(analyzeSmiles("C[N+](=O)[O-]"), "C[N+](=O)[O-]")));
    // common practice: formal charges +1 on the nitro N and -1 on one O
    const charges = analysis.graph.atoms.filter((atom) => atom.formalCharge !== 0).map((atom) => `${atom.symbol}${atom.formalCharge}`);
    expect(charges.sort()).toEqual(["N1", "O-1"]);
  });

  // common practice: in the oxoacids HNO2 and HNO3 the hydrogen sits on an oxygen (H-O-N=O,
  // H-O-NO2); a leading N with O2 is not a nitro group on hydrogen
  it.each(["HNO2", "HNO3"])("%s keeps its hydrogen on oxygen", (text) => {
    const { graph } = analysed(analyzeSpecies(text), text);
    const hydrogenNeighbours = graph.bonds
      .filter((bond) => graph.atoms[bond.from].symbol === "H" || graph.atoms[bond.to].symbol === "H")
      .map((bond) => graph.atoms[graph.atoms[bond.from].symbol === "H" ? bond.to : bond.from].symbol);
    expect(hydrogenNeighbours, `${text}: H should be bonded to O`).toEqual(["O"]);
  });
});

describe("molecular formulas with more than one structure", () => {
  // common practice: C2H6O is ethanol or dimethyl ether; C3H8O is propan-1-ol, propan-2-ol or
  // ethyl methyl ether; C4H10 is butane or isobutane
  it.each(["C2H6O", "C3H8O", "C4H10"])("%s is ambiguous-connectivity, not a guess", (formula) => {
    const result = analyzeSpecies(formula);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe("ambiguous-connectivity");
    expect(result.problem.message.length).toBeGreaterThan(0);
  });
});
