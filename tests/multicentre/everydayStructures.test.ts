// Structures chemists write every day as condensed or molecular formulas: each must come out as
// the structure chemists mean (checked against RDKit's reading of the SMILES chemists give for
// it), or as a refusal that says why; never as a confident wrong structure.
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, shapeOf, toMolfile, type SpeciesAnalysis } from "../../shared/src/index";
import { loadRdkit, rdkitCanonicalSmiles } from "./rdkitReference";

beforeAll(loadRdkit);

interface StructureCase {
  readonly text: string;
  /** The structure chemists mean, as SMILES. */
  readonly smiles: string;
}

function analysed(text: string): SpeciesAnalysis {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text} was refused (${result.problem.code}): ${result.problem.message}`);
  return result.value;
}

/** Our structure (every atom, bond order and formal charge) as RDKit reads it back from a molfile. */
function ourStructureAsRdkitSees(analysis: SpeciesAnalysis): string {
  const molfile = toMolfile(analysis.graph, shapeOf(analysis).coordinates, analysis.reading.text);
  if (!molfile.ok) throw new Error(`${analysis.reading.text}: no molfile (${molfile.problem.message})`);
  return rdkitCanonicalSmiles(molfile.value);
}

function expectStructure({ text, smiles }: StructureCase): SpeciesAnalysis {
  const analysis = analysed(text);
  // An independent check: RDKit canonicalises both, so equal strings mean the same atoms, the
  // same connectivity, bond orders and charges.
  expect(ourStructureAsRdkitSees(analysis), `${text} should be ${smiles}`).toBe(rdkitCanonicalSmiles(smiles));
  if (analysis.reading.charge === 0) {
    const doublyCharged = analysis.graph.atoms.filter((atom) => Math.abs(atom.formalCharge) >= 2);
    expect(doublyCharged, `${text}: a neutral molecule drawn with a doubly charged atom`).toEqual([]);
  }
  return analysis;
}

describe("groups written after C=O and S=O", () => {
  // from memory: any introductory organic chemistry text (urea, acetone, carbonic acid, dimethyl
  // carbonate, dimethyl sulfoxide and dimethyl sulfone: the groups in parentheses sit on C or S)
  it.each<StructureCase>([
    { text: "CO(NH2)2", smiles: "NC(N)=O" },
    { text: "CO(CH3)2", smiles: "CC(C)=O" },
    { text: "CO(OH)2", smiles: "OC(O)=O" },
    { text: "CO(OCH3)2", smiles: "COC(=O)OC" },
    { text: "SO(CH3)2", smiles: "CS(C)=O" },
    { text: "SO2(CH3)2", smiles: "CS(C)(=O)=O" },
    { text: "(NH2)2CO", smiles: "NC(N)=O" },
  ])("$text is $smiles", (entry) => {
    expectStructure(entry);
  });

  // common practice: urea's carbon is trigonal planar, its nitrogens bonded to carbon and planar
  // (their lone pairs conjugated with C=O)
  it("urea CO(NH2)2: C trigonal planar, both N bonded to C", () => {
    const analysis = analysed("CO(NH2)2");
    const carbon = analysis.centres.find((centre) => centre.atom === "C");
    expect(carbon?.molecularGeometry).toBe("trigonal planar");
    const carbonIndex = analysis.graph.atoms.findIndex((atom) => atom.symbol === "C");
    const onCarbon = analysis.graph.bonds
      .filter((bond) => bond.from === carbonIndex || bond.to === carbonIndex)
      .map((bond) => analysis.graph.atoms[bond.from === carbonIndex ? bond.to : bond.from].symbol)
      .sort();
    expect(onCarbon).toEqual(["N", "N", "O"]);
  });
});

describe("carboxyl, sulfonyl and phosphate ester groups", () => {
  // from memory: introductory organic chemistry texts (oxalic and malonic acids; methanesulfonic
  // acid, its anion and its chloride; trimethyl phosphate)
  it.each<StructureCase>([
    { text: "HOOCCOOH", smiles: "OC(=O)C(=O)O" },
    { text: "HO2CCO2H", smiles: "OC(=O)C(=O)O" },
    { text: "HOOCCH2COOH", smiles: "OC(=O)CC(=O)O" },
    { text: "HOOCCH2CH2COOH", smiles: "OC(=O)CCC(=O)O" },
    { text: "CH3SO3H", smiles: "CS(=O)(=O)O" },
    { text: "CH3SO3-", smiles: "CS(=O)(=O)[O-]" },
    { text: "CH3SO2Cl", smiles: "CS(=O)(=O)Cl" },
    { text: "(CH3O)3PO", smiles: "COP(=O)(OC)OC" },
  ])("$text is $smiles", (entry) => {
    expectStructure(entry);
  });
});

describe("alkyl and aryl groups written as blocks", () => {
  // from memory: introductory organic chemistry texts (ethanol, diethyl ether, aniline, benzoic
  // acid, nitrobenzene, hexane, triethylamine, ethyl acetate, toluene, bromoethane, propanol)
  it.each<StructureCase>([
    { text: "C2H5OH", smiles: "CCO" },
    { text: "(C2H5)2O", smiles: "CCOCC" },
    { text: "C6H5NH2", smiles: "Nc1ccccc1" },
    { text: "C6H5COOH", smiles: "OC(=O)c1ccccc1" },
    { text: "C6H5NO2", smiles: "O=[N+]([O-])c1ccccc1" },
    { text: "C6H5CH3", smiles: "Cc1ccccc1" },
    { text: "C6H5Cl", smiles: "Clc1ccccc1" },
    { text: "CH3(CH2)4CH3", smiles: "CCCCCC" },
    { text: "CH3(CH2)2OH", smiles: "CCCO" },
    { text: "N(C2H5)3", smiles: "CCN(CC)CC" },
    { text: "CH3COOC2H5", smiles: "CCOC(C)=O" },
    { text: "C2H5Br", smiles: "CCBr" },
    { text: "C3H7OH", smiles: "CCCO" },
  ])("$text is $smiles", (entry) => {
    expectStructure(entry);
  });

  // common practice: copies of a group in parentheses all hang on the atom before them
  it.each<StructureCase>([
    { text: "C(CH3)4", smiles: "CC(C)(C)C" },
    { text: "CH3CH(CH3)2", smiles: "CC(C)C" },
    { text: "C(NO2)4", smiles: "O=[N+]([O-])C([N+](=O)[O-])([N+](=O)[O-])[N+](=O)[O-]" },
  ])("$text keeps its copies on one atom: $smiles", (entry) => {
    expectStructure(entry);
  });
});

describe("dimeric and chain oxoanions", () => {
  // from memory: descriptive inorganic chemistry texts (thiosulfate S-SO3; disulfite O2S-SO3;
  // dithionate O3S-SO3; dithionite O2S-SO2; tetrathionate O3S-S-S-SO3; peroxodisulfate
  // O3S-O-O-SO3; diphosphate O3P-O-PO3; oxalate O2C-CO2)
  it.each<StructureCase>([
    { text: "S2O3^2-", smiles: "[O-]S([O-])(=O)=S" },
    { text: "S2O5^2-", smiles: "[O-]S(=O)S(=O)(=O)[O-]" },
    { text: "S2O6^2-", smiles: "[O-]S(=O)(=O)S(=O)(=O)[O-]" },
    { text: "S2O8^2-", smiles: "[O-]S(=O)(=O)OOS(=O)(=O)[O-]" },
    { text: "S2O4^2-", smiles: "[O-]S(=O)S(=O)[O-]" },
    { text: "S4O6^2-", smiles: "[O-]S(=O)(=O)SSS(=O)(=O)[O-]" },
    { text: "tetrathionate", smiles: "[O-]S(=O)(=O)SSS(=O)(=O)[O-]" },
    { text: "P2O7^4-", smiles: "[O-]P(=O)([O-])OP(=O)([O-])[O-]" },
    { text: "C2O4^2-", smiles: "[O-]C(=O)C(=O)[O-]" },
    { text: "oxalate", smiles: "[O-]C(=O)C(=O)[O-]" },
    { text: "H2C2O4", smiles: "OC(=O)C(=O)O" },
  ])("$text is $smiles", (entry) => {
    expectStructure(entry);
  });

  // common practice: chromium is a transition metal, outside VSEPR; the refusal says so
  it("Cr2O7^2- is refused because chromium is a transition metal", () => {
    const result = analyzeSpecies("Cr2O7^2-");
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe("transition-metal-centre");
    expect(result.problem.message).toContain("chromium");
  });
});

describe("X-A-A-X molecules", () => {
  // from memory: descriptive inorganic chemistry texts (S2Cl2, Se2Cl2 and S2Br2 are X-A-A-X chains
  // like H2O2; N2F2 and N2Cl2 are X-N=N-X; O2F2 is F-O-O-F), all formal charges zero
  it.each<StructureCase>([
    { text: "S2Cl2", smiles: "ClSSCl" },
    { text: "Se2Cl2", smiles: "Cl[Se][Se]Cl" },
    { text: "S2Br2", smiles: "BrSSBr" },
    { text: "N2F2", smiles: "FN=NF" },
    { text: "O2F2", smiles: "FOOF" },
    { text: "N2Cl2", smiles: "ClN=NCl" },
    { text: "P2H4", smiles: "PP" },
    { text: "N2H2", smiles: "N=N" },
  ])("$text is $smiles with no formal charges", (entry) => {
    const analysis = expectStructure(entry);
    expect(analysis.graph.atoms.every((atom) => atom.formalCharge === 0)).toBe(true);
  });

  // from memory: descriptive inorganic chemistry texts (cis- and trans-N2F2 are both known)
  it.each(["N2F2", "N2Cl2", "CH3N=NCH3", "CH3CH=CHCH3"])("%s says that cis and trans isomers both exist", (text) => {
    expect(analysed(text).warnings.some((warning) => warning.includes("cis and trans"))).toBe(true);
  });

  // common practice: no cis/trans isomers when one end carries two alike groups
  it.each(["CH2=CHCl", "CH2=CH2", "C6H5CH3", "S2Cl2"])("%s does not speak of cis and trans", (text) => {
    expect(analysed(text).warnings.some((warning) => warning.includes("cis and trans"))).toBe(false);
  });
});

describe("the tautomers chemists mean", () => {
  // from memory: descriptive inorganic chemistry texts (phosphorous acid is HP(O)(OH)2, diprotic;
  // hypophosphorous acid is H2P(O)OH, monoprotic)
  it.each<StructureCase & { protic: string }>([
    { text: "H3PO3", smiles: "O[PH](O)=O", protic: "diprotic" },
    { text: "H3PO2", smiles: "O[PH2]=O", protic: "monoprotic" },
  ])("$text is $smiles, $protic", (entry) => {
    const analysis = expectStructure(entry);
    expect(analysis.warnings.join(" ")).toContain(entry.protic);
  });
});

describe("cages and rings by formula", () => {
  // from memory: descriptive inorganic chemistry texts (P4 tetrahedron, Td; P4O6 and P4O10 cages,
  // Td; S8 crown ring, D4d; I2Cl6 planar Cl-bridged dimer, D2h): all nonpolar by symmetry
  it.each<StructureCase>([
    { text: "P4", smiles: "P12P3P1P23" },
    { text: "P4O6", smiles: "O1P2OP3OP1OP(O2)O3" },
    { text: "P4O10", smiles: "O=P12OP3(=O)OP(=O)(O1)OP(=O)(O2)O3" },
    { text: "S8", smiles: "S1SSSSSSS1" },
    { text: "I2Cl6", smiles: "Cl[I-]1(Cl)[Cl+][I-](Cl)(Cl)[Cl+]1" },
  ])("$text is $smiles and nonpolar", (entry) => {
    const analysis = expectStructure(entry);
    expect(analysis.polarity.polar, `${entry.text}: ${analysis.polarity.reason}`).toBe(false);
  });

  // from memory: descriptive inorganic chemistry texts (aluminium chloride is a layer lattice as a
  // solid, Cl-bridged Al2Cl6 in the melt and vapour, AlCl3 when hot)
  it("Al2Cl6 is refused with the reason: a bridged dimer whose form depends on the phase", () => {
    const result = analyzeSpecies("Al2Cl6");
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe("ambiguous-connectivity");
    expect(result.problem.message).toContain("bridged dimer");
    expect(result.problem.message).toContain("AlCl3");
  });

  // from memory: I2Cl6 is square planar about each iodine
  it("I2Cl6: each I is square planar", () => {
    const iodines = analysed("I2Cl6").centres.filter((centre) => centre.atom === "I");
    expect(iodines.map((centre) => centre.molecularGeometry)).toEqual(["square planar", "square planar"]);
  });
});

describe("doubly charged atoms in neutral molecules are never silent", () => {
  // common practice: a neutral molecule whose best drawing puts +2 or -2 on one atom is almost
  // always a wrong skeleton, and the card must say so
  it.each(["OOC", "HCOC"])("%s is drawn with a doubly charged atom and warns about it", (text) => {
    const analysis = analysed(text);
    expect(analysis.graph.atoms.some((atom) => Math.abs(atom.formalCharge) >= 2)).toBe(true);
    expect(analysis.warnings.some((warning) => warning.includes("formal charge of"))).toBe(true);
  });
});

describe("a formula shared by isomers is not named as one of them", () => {
  // from memory: introductory organic chemistry texts (HCOOCH3 is methyl formate, an isomer of
  // acetic acid; CH3NC is methyl isocyanide, an isomer of acetonitrile; CH3CH(CH3)2 is isobutane)
  it.each<StructureCase & { notNamed: string }>([
    { text: "HCOOCH3", smiles: "COC=O", notNamed: "acetic acid" },
    { text: "CH3NC", smiles: "C[N+]#[C-]", notNamed: "acetonitrile" },
    { text: "CH3CH(CH3)2", smiles: "CC(C)C", notNamed: "butane" },
  ])("$text is $smiles and not called $notNamed", (entry) => {
    const analysis = expectStructure(entry);
    expect(analysis.reading.name).not.toBe(entry.notNamed);
  });

  // common practice: the same molecule written another way keeps its name
  it.each([
    ["CO(NH2)2", "urea"],
    ["(CH3)2CO", "acetone"],
    ["CO(CH3)2", "acetone"],
    ["CH3CO2H", "acetic acid"],
    ["OCN-", "cyanate"],
  ])("%s is still called %s", (text, name) => {
    expect(analysed(text).reading.name).toBe(name);
  });

  // from memory: descriptive inorganic chemistry texts (cyanate OCN- and fulminate CNO- share
  // the formula)
  it("CNO- says that cyanate and fulminate share the formula, and names neither", () => {
    const analysis = analysed("CNO-");
    const note = analysis.warnings.find((warning) => warning.includes("fulminate"));
    expect(note, analysis.warnings.join(" | ")).toBeDefined();
    expect(note).toContain("cyanate");
    expect(analysis.reading.name).toBeUndefined();
  });

  // common practice: C2H4O2 is acetic acid or methyl formate; the refusal names both and the
  // reading is not given one of their names
  it("C2H4O2 is refused with both isomers named and no name of its own", () => {
    const result = analyzeSpecies("C2H4O2");
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.message).toContain("methyl formate");
    expect(result.problem.message).toContain("acetic acid");
    expect(result.reading?.name).toBeUndefined();
  });
});
