import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import { ELEMENTS } from "../shared/src/chemistry/elements";
import { readSpecies } from "../shared/src/chemistry/reader/readSpecies";
import type { FormulaPart, ProblemCode, SpeciesReading } from "../shared/src/chemistry/types";

/** "H2 S1 O4": composition in first-appearance order, counts always written. */
function partsText(parts: readonly FormulaPart[]): string {
  return parts.map((part) => `${part.symbol}${part.count}`).join(" ");
}

function read(input: string): SpeciesReading {
  const result = readSpecies(input);
  if (!result.ok) throw new Error(`expected a reading for ${JSON.stringify(input)}, got ${result.problem.code}`);
  return result.value;
}

describe("plain and condensed formulas", () => {
  // from memory: CRC Handbook of Chemistry and Physics, physical constants of inorganic and organic compounds
  it.each([
    ["SF4", "S1 F4", "SF4"],
    ["XeOF4", "Xe1 O1 F4", "XeOF4"],
    ["H2SO4", "H2 S1 O4", "H2SO4"],
    ["HNO3", "H1 N1 O3", "HNO3"],
    ["Ca(OH)2", "Ca1 O2 H2", "Ca(OH)2"],
    ["CuSO4·5H2O", "Cu1 S1 O9 H10", "CuSO4·5H2O"],
    ["CuSO4.5H2O", "Cu1 S1 O9 H10", "CuSO4·5H2O"],
    ["CuSO4 · 5H2O", "Cu1 S1 O9 H10", "CuSO4·5H2O"],
    ["CH3CH2OH", "C2 H6 O1", "CH3CH2OH"],
    ["CH3COOH", "C2 H4 O2", "CH3COOH"],
    ["(CH3)2CO", "C3 H6 O1", "(CH3)2CO"],
    ["CH2=CH2", "C2 H4", "CH2=CH2"],
    ["HC≡CH", "H2 C2", "HC≡CH"],
    ["HC#CH", "H2 C2", "HC≡CH"],
    ["CH3CN", "C2 H3 N1", "CH3CN"],
    ["C(CH3)4", "C5 H12", "C(CH3)4"],
    ["NH2CH2COOH", "N1 H5 C2 O2", "NH2CH2COOH"],
    ["H2NNH2", "H4 N2", "H2NNH2"],
    ["HOOH", "H2 O2", "HOOH"],
    ["CH3-CH3", "C2 H6", "CH3CH3"],
    // Word processors turn a typed dash into an en dash; between groups it is still a bond.
    ["CH3–CH3", "C2 H6", "CH3CH3"],
    ["H–C≡N", "H1 C1 N1", "HC≡N"],
    ["H₂SO₄", "H2 S1 O4", "H2SO4"],
    ["Al2(SO4)3", "Al2 S3 O12", "Al2(SO4)3"],
    ["K4[Fe(CN)6]", "K4 Fe1 C6 N6", "K4[Fe(CN)6]"],
  ])("%s has composition %s and formula %s", (input, composition, formula) => {
    const reading = read(input);
    expect(partsText(reading.composition)).toBe(composition);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(0);
    expect(reading.notation).toBe("formula");
    expect(reading.range).toEqual({ start: 0, end: input.length });
  });

  // common practice: condensed formulas list groups left to right; brackets repeat their groups
  it.each([
    ["(CH3)2CO", "C1 H3 C1 H3 C1 O1"],
    ["CH3COOH", "C1 H3 C1 O1 O1 H1"],
    ["CH2=CH2", "C1 H2 =1 C1 H2"],
    ["HC≡CH", "H1 C1 ≡1 C1 H1"],
    ["CH3C≡N", "C1 H3 C1 ≡1 N1"],
    ["C(CH3)4", "C1 C1 H3 C1 H3 C1 H3 C1 H3"],
    ["Ca(OH)2", "Ca1 O1 H1 O1 H1"],
    ["CuSO4·5H2O", "Cu1 S1 O4 ·5 H2 O1"],
  ])("%s is written as %s", (input, sequence) => {
    expect(partsText(read(input).writtenSequence)).toBe(sequence);
  });

  it.each([
    ["  SF4  ", 2, 5],
    ["\tXeF2\n", 1, 5],
    [" \\ce{NH4+} ", 1, 10],
  ])("range of %j excludes surrounding whitespace", (input, start, end) => {
    const reading = read(input);
    expect(reading.range).toEqual({ start, end });
    expect(reading.text).toBe(input.slice(start, end));
  });
});

describe("charges", () => {
  // from memory: standard tables of common polyatomic ions (charges of sulfate, ammonium, phosphate)
  it.each([
    ["NH4+", "NH4^+", 1, "formula", 4],
    ["NH4^+", "NH4^+", 1, "formula", 5],
    ["SO4^2-", "SO4^2-", -2, "formula", 6],
    ["SO4 2-", "SO4^2-", -2, "formula", 6],
    ["SO4(2-)", "SO4^2-", -2, "formula", 7],
    ["SO4^{2-}", "SO4^2-", -2, "formula", 8],
    ["SO4^-2", "SO4^2-", -2, "formula", 6],
    ["[PO4]3-", "PO4^3-", -3, "formula", 7],
    ["SO4--", "SO4^2-", -2, "formula", 5],
    ["SO₄²⁻", "SO4^2-", -2, "formula", 5],
    ["NH₄⁺", "NH4^+", 1, "formula", 4],
    ["SO4²−", "SO4^2-", -2, "formula", 5],
    ["O2^-", "O2^-", -1, "formula", 4],
    ["CH3-", "CH3^-", -1, "formula", 4],
    ["C12+", "C12^+", 1, "formula", 4],
    ["Fe2+", "Fe^2+", 2, "formula", 4],
    ["N3-", "N3^-", -1, "formula", 3],
    ["I3-", "I3^-", -1, "formula", 3],
    ["O2-", "O2^-", -1, "formula", 3],
    ["Cu(NH3)4^2+", "Cu(NH3)4^2+", 2, "formula", 11],
    ["[Cu(NH3)4]2+", "Cu(NH3)4^2+", 2, "formula", 12],
    ["\\ce{SO4^2-}", "SO4^2-", -2, "mhchem", 11],
    ["\\ce{NH4+}", "NH4^+", 1, "mhchem", 9],
    ["\\ce{SO4 2-}", "SO4^2-", -2, "mhchem", 11],
  ])("%s reads as %s with charge %d (%s)", (input, formula, charge, notation, end) => {
    const reading = read(input);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(charge);
    expect(reading.notation).toBe(notation);
    expect(reading.range).toEqual({ start: 0, end });
  });
});

describe("names", () => {
  it.each([
    // common practice: everyday names of simple molecules
    ["water", "H2 O1", 0],
    ["ammonia", "N1 H3", 0],
    ["methane", "C1 H4", 0],
    ["ozone", "O3", 0],
    ["carbon dioxide", "C1 O2", 0],
    ["hydrogen sulfide", "H2 S1", 0],
    ["nitrous oxide", "N2 O1", 0],
    ["nitric oxide", "N1 O1", 0],
    ["phosphine", "P1 H3", 0],
    ["silane", "Si1 H4", 0],
    ["borane", "B1 H3", 0],
    ["hydrazine", "H4 N2", 0],
    ["hydrogen peroxide", "H2 O2", 0],
    ["formaldehyde", "H2 C1 O1", 0],
    ["acetic acid", "C2 H4 O2", 0],
    ["ethanol", "C2 H6 O1", 0],
    ["benzene", "C6 H6", 0],
    // from memory: IUPAC nomenclature of binary covalent compounds (Greek multiplying prefixes)
    ["sulfur tetrafluoride", "S1 F4", 0],
    ["xenon difluoride", "Xe1 F2", 0],
    ["dichlorine monoxide", "Cl2 O1", 0],
    ["dinitrogen tetroxide", "N2 O4", 0],
    ["dinitrogen tetraoxide", "N2 O4", 0],
    ["phosphorus pentachloride", "P1 Cl5", 0],
    ["iodine heptafluoride", "I1 F7", 0],
    ["boron trifluoride", "B1 F3", 0],
    ["carbon tetrachloride", "C1 Cl4", 0],
    ["nitrogen trifluoride", "N1 F3", 0],
    ["diphosphorus pentoxide", "P2 O5", 0],
    ["tetraphosphorus decoxide", "P4 O10", 0],
    ["sulfur hexafluoride", "S1 F6", 0],
    ["carbon monoxide", "C1 O1", 0],
    ["disulfur dichloride", "S2 Cl2", 0],
    ["xenon trioxide", "Xe1 O3", 0],
    ["krypton difluoride", "Kr1 F2", 0],
    ["silicon tetrahydride", "Si1 H4", 0],
    ["hydrogen selenide", "H2 Se1", 0],
    // from memory: standard tables of common polyatomic ions
    ["sulfate", "S1 O4", -2],
    ["sulfite", "S1 O3", -2],
    ["nitrate", "N1 O3", -1],
    ["nitrite", "N1 O2", -1],
    ["perchlorate", "Cl1 O4", -1],
    ["chlorate", "Cl1 O3", -1],
    ["chlorite", "Cl1 O2", -1],
    ["hypochlorite", "Cl1 O1", -1],
    ["phosphate", "P1 O4", -3],
    ["carbonate", "C1 O3", -2],
    ["bicarbonate", "H1 C1 O3", -1],
    ["hydrogen carbonate", "H1 C1 O3", -1],
    ["ammonium", "N1 H4", 1],
    ["hydronium", "H3 O1", 1],
    ["hydroxide", "O1 H1", -1],
    ["cyanide", "C1 N1", -1],
    ["azide", "N3", -1],
    ["triiodide", "I3", -1],
    ["tetrafluoroborate", "B1 F4", -1],
    ["hexafluorophosphate", "P1 F6", -1],
    ["thiocyanate", "S1 C1 N1", -1],
    ["permanganate", "Mn1 O4", -1],
    ["chloride", "Cl1", -1],
    ["oxide ion", "O1", -2],
    ["sodium ion", "Na1", 1],
    ["iron(III) ion", "Fe1", 3],
    // from memory: salts named from their ions, charges balanced (general chemistry nomenclature)
    ["sodium chloride", "Na1 Cl1", 0],
    ["calcium chloride", "Ca1 Cl2", 0],
    ["aluminium oxide", "Al2 O3", 0],
    ["magnesium nitride", "Mg3 N2", 0],
    ["iron(III) oxide", "Fe2 O3", 0],
    ["ammonium nitrate", "N2 H4 O3", 0],
    ["ammonium sulfate", "N2 H8 S1 O4", 0],
    ["calcium hydroxide", "Ca1 O2 H2", 0],
    ["sodium sulfate", "Na2 S1 O4", 0],
  ])("%s has composition %s and charge %d", (input, composition, charge) => {
    const reading = read(input);
    expect(reading.notation).toBe("name");
    expect(partsText(reading.composition)).toBe(composition);
    expect(reading.charge).toBe(charge);
    expect(reading.range).toEqual({ start: 0, end: input.length });
  });

  // common practice: names are matched without regard to case or spacing
  it.each([
    ["Water", "water"],
    ["  SULFUR   Tetrafluoride ", "sulfur tetrafluoride"],
    ["Dinitrogen Tetraoxide", "dinitrogen tetroxide"],
    ["Iron (III) Oxide", "iron(III) oxide"],
    ["sulfate ion", "sulfate"],
  ])("%j reads with the name %s", (input, name) => {
    const reading = read(input);
    expect(reading.name).toBe(name);
    expect(reading.text).toBe(input.trim());
  });

  // from memory: IUPAC nomenclature of binary covalent compounds; common names as above
  it.each([
    ["SF4", "sulfur tetrafluoride"],
    ["XeF4", "xenon tetrafluoride"],
    ["N2O4", "dinitrogen tetroxide"],
    ["Cl2O", "dichlorine monoxide"],
    ["P4O10", "tetraphosphorus decoxide"],
    ["CO", "carbon monoxide"],
    ["HCl", "hydrogen chloride"],
    ["H2O", "water"],
    ["NH3", "ammonia"],
    ["H2O2", "hydrogen peroxide"],
    ["CH3CH2OH", "ethanol"],
    ["CH2O", "formaldehyde"],
    ["SO4^2-", "sulfate"],
    ["NH4+", "ammonium"],
    ["NaCl", "sodium chloride"],
  ])("formula %s carries the name %s", (input, name) => {
    expect(read(input).name).toBe(name);
  });

  // common practice: C2H6O is both ethanol and dimethyl ether, so a bare composition names neither
  it.each([["C2H6O"], ["C2H5OH"], ["Fe(OH)3"], ["CH5"]])("%s has no name (unknown or ambiguous)", (input) => {
    expect(read(input).name).toBeUndefined();
  });
});

describe("an element symbol with a Stock numeral", () => {
  // common practice: lab reports name an element in an oxidation state as "Fe(III)"; alone, a
  // metal's is its cation (from memory: IUPAC Red Book, Stock numbers; mercury(I) is Hg2^2+ as in
  // Greenwood and Earnshaw), never iodine or vanadium in brackets
  it.each([
    ["Fe(III)", "Fe^3+", 3, "Fe1"],
    ["Cu(II)", "Cu^2+", 2, "Cu1"],
    ["Cr(VI)", "Cr^6+", 6, "Cr1"],
    ["Mn(VII)", "Mn^7+", 7, "Mn1"],
    ["Os(VIII)", "Os^8+", 8, "Os1"],
    ["Sn(IV)", "Sn^4+", 4, "Sn1"],
    ["Al(III)", "Al^3+", 3, "Al1"],
    ["Tl(I)", "Tl^+", 1, "Tl1"],
    ["Fe(iii)", "Fe^3+", 3, "Fe1"],
    ["Hg(I)", "Hg2^2+", 2, "Hg2"],
    ["Fe(III)(aq)", "Fe^3+", 3, "Fe1"],
  ])("%s reads as %s", (input, formula, charge, composition) => {
    const reading = read(input);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(charge);
    expect(partsText(reading.composition)).toBe(composition);
    expect(reading.text).toBe(input);
    expect(reading.range).toEqual({ start: 0, end: input.length });
  });

  // from memory: IUPAC Red Book; a nonmetal's oxidation state is shared by many species (S(VI) in SO3, SF6, H2SO4)
  it.each(["S(VI)", "As(V)", "Xe(II)", "I(III)"])("%s is an oxidation state, not one species", (input) => {
    const result = readSpecies(input);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe("oxidation-state");
  });

  // common practice: names of an element with a numeral alone go the same way
  it.each([
    ["iron(III)", "Fe^3+"],
    ["mercury(I)", "Hg2^2+"],
    ["mercury(I) ion", "Hg2^2+"],
  ])("the name %s reads as %s", (input, formula) => {
    expect(read(input).formula).toBe(formula);
  });

  it.each(["sulfur(VI)", "Fe(Iii)"])("%s does not read", (input) => {
    expect(readSpecies(input).ok).toBe(false);
  });
});

describe("problems", () => {
  const longInput = "H".repeat(1001);
  it.each<[string, ProblemCode, number, number, string | undefined]>([
    ["", "empty-input", 0, 0, undefined],
    ["   ", "empty-input", 3, 3, undefined],
    ["\\ce{ }", "empty-input", 0, 6, undefined],
    ["Sf4", "unknown-element", 0, 2, "SF4"],
    ["sf4", "unknown-element", 0, 2, "SF4"],
    ["CL", "unknown-element", 1, 2, "Cl"],
    ["Xx2", "unknown-element", 0, 2, undefined],
    ["XeOf4", "unknown-element", 2, 4, "XeOF4"],
    ["Ca(OH", "unbalanced-brackets", 2, 3, undefined],
    ["Ca(OH]2", "unbalanced-brackets", 2, 6, undefined],
    ["\\ce{SO4", "unbalanced-brackets", 0, 4, undefined],
    ["H2O)", "unbalanced-brackets", 3, 4, undefined],
    ["2H2O", "malformed-formula", 0, 1, undefined],
    ["SO4^^", "malformed-formula", 3, 4, undefined],
    ["SO4^2--", "malformed-formula", 3, 7, undefined],
    ["SO42-", "malformed-formula", 2, 5, "SO4^2-"],
    ["H0", "malformed-formula", 1, 2, undefined],
    ["()", "malformed-formula", 0, 2, undefined],
    ["e-", "malformed-formula", 0, 2, undefined],
    ["\\ce{e-}", "malformed-formula", 4, 6, undefined],
    ["2-", "malformed-formula", 0, 2, undefined],
    ["H2 O", "malformed-formula", 2, 3, undefined],
    ["CH2=", "malformed-formula", 3, 4, undefined],
    ["\\ce{H2O} extra", "malformed-formula", 8, 14, undefined],
    ["amonia", "unknown-name", 0, 6, "ammonia"],
    ["sulfer tetrafluoride", "unknown-name", 0, 20, "sulfur tetrafluoride"],
    ["water vapour soup", "unknown-name", 0, 17, undefined],
    ["nacl", "unknown-name", 0, 4, "NaCl"],
    [longInput, "input-too-long", 0, 1001, undefined],
  ])("%j gives %s over %d..%d", (input, code, start, end, suggestion) => {
    const result = readSpecies(input);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe(code);
    expect(result.problem.range).toEqual({ start, end });
    expect(result.problem.suggestion).toBe(suggestion);
    expect(result.problem.message.length).toBeGreaterThan(0);
  });
});

describe("names against RDKit compositions", () => {
  let compositionOfSmiles: (smiles: string) => { parts: Map<string, number>; charge: number };

  beforeAll(async () => {
    const initRDKit = createRequire(import.meta.url)("@rdkit/rdkit");
    const RDKit = await initRDKit();
    const symbolOf = new Map(ELEMENTS.map((element) => [element.atomicNumber, element.symbol]));
    compositionOfSmiles = (smiles) => {
      const mol = RDKit.get_mol(smiles);
      const json = JSON.parse(mol.get_json());
      mol.delete();
      const defaults = json.defaults.atom;
      const parts = new Map<string, number>();
      let charge = 0;
      for (const atom of json.molecules[0].atoms) {
        const symbol = symbolOf.get(atom.z ?? defaults.z) as string;
        parts.set(symbol, (parts.get(symbol) ?? 0) + 1);
        const hydrogens = atom.impHs ?? defaults.impHs;
        if (hydrogens > 0) parts.set("H", (parts.get("H") ?? 0) + hydrogens);
        charge += atom.chg ?? defaults.chg;
      }
      return { parts, charge };
    };
  });

  // source: RDKit (WebAssembly build)
  it.each([
    ["water", "O"],
    ["ammonia", "N"],
    ["ethanol", "CCO"],
    ["acetic acid", "CC(=O)O"],
    ["acetone", "CC(C)=O"],
    ["benzene", "c1ccccc1"],
    ["formaldehyde", "C=O"],
    ["hydrazine", "NN"],
    ["hydrogen peroxide", "OO"],
    ["glycine", "NCC(=O)O"],
    ["urea", "NC(N)=O"],
    ["acetonitrile", "CC#N"],
    ["dimethyl sulfoxide", "CS(C)=O"],
    ["sulfur tetrafluoride", "FS(F)(F)F"],
    ["xenon difluoride", "F[Xe]F"],
    ["dinitrogen tetroxide", "O=N(=O)N(=O)=O"],
    ["phosphorus pentachloride", "ClP(Cl)(Cl)(Cl)Cl"],
    ["carbon tetrachloride", "ClC(Cl)(Cl)Cl"],
    ["sulfate", "[O-]S(=O)(=O)[O-]"],
    ["ammonium", "[NH4+]"],
    ["acetate", "CC(=O)[O-]"],
    ["thiocyanate", "[S-]C#N"],
    ["phosgene", "ClC(Cl)=O"],
  ])("%s matches the composition of %s", (name, smiles) => {
    const reading = read(name);
    const expected = compositionOfSmiles(smiles);
    expect(new Map(reading.composition.map((part) => [part.symbol, part.count]))).toEqual(expected.parts);
    expect(reading.charge).toBe(expected.charge);
  });
});
