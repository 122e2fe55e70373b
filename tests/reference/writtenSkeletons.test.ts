import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import { ChemElements } from "@chemistry/elements";
import { analyzeSpecies } from "../../shared/src/index";

interface RdkitMol {
  get_json(): string;
  delete(): void;
}
interface RdkitModule {
  get_mol(input: string, details?: string): RdkitMol | null;
}

const require = createRequire(import.meta.url);
let rdkit: RdkitModule;

beforeAll(async () => {
  const initRdkit = require("@rdkit/rdkit");
  rdkit = await initRdkit();
});

/**
 * Which atoms are bonded, whatever the bond orders and charges (so resonance forms agree and
 * connectivity isomers differ): each heavy atom with its hydrogens and its heavy neighbours,
 * each neighbour with its own hydrogens and neighbour count.
 */
function connectivityKey(
  symbols: readonly string[],
  bonds: readonly (readonly [number, number])[],
  extraHydrogens: readonly number[],
): string {
  const hydrogens = extraHydrogens.slice();
  const neighbours: number[][] = symbols.map(() => []);
  for (const [a, b] of bonds) {
    if (symbols[a] === "H" && symbols[b] !== "H") hydrogens[b]++;
    else if (symbols[b] === "H" && symbols[a] !== "H") hydrogens[a]++;
    else {
      neighbours[a].push(b);
      neighbours[b].push(a);
    }
  }
  const near = (atom: number): string => `${symbols[atom]}H${hydrogens[atom]}x${neighbours[atom].length}`;
  return symbols
    .map((symbol, atom) => (symbol === "H" ? "" : `${near(atom)}(${neighbours[atom].map(near).sort().join(",")})`))
    .filter((key) => key !== "")
    .sort()
    .join(" ");
}

/**
 * The connectivity of a reference structure as RDKit reads and sanitises it. RDKit's valence
 * table has no three- or five-bonded neutral halogen (ClF3, BrF5), so a hydrogen-free SMILES
 * written all in brackets may be read as written, without the valence check.
 */
function rdkitConnectivity(smiles: string): string {
  const asWritten = /^(\[[A-Z][a-z]?\]|[()])+$/.test(smiles) && !smiles.includes("[H]");
  const mol = rdkit.get_mol(smiles) ?? (asWritten ? rdkit.get_mol(smiles, JSON.stringify({ sanitize: false })) : null);
  if (mol === null) throw new Error(`RDKit refused the reference SMILES ${smiles}`);
  try {
    const json = JSON.parse(mol.get_json());
    const defaults = json.defaults;
    const molecule = json.molecules[0];
    const symbols: string[] = molecule.atoms.map((atom: { z?: number }) => ChemElements.getById(atom.z ?? defaults.atom.z)!.symbol);
    const implicit: number[] = molecule.atoms.map((atom: { impHs?: number }) => atom.impHs ?? defaults.atom.impHs);
    const bonds = (molecule.bonds ?? []).map((bond: { atoms: [number, number] }) => bond.atoms);
    return connectivityKey(symbols, bonds, implicit);
  } finally {
    mol.delete();
  }
}

function engineConnectivity(written: string): string {
  const result = analyzeSpecies(written);
  if (!result.ok) throw new Error(`${written} was not analysed: ${result.problem.message}`);
  const { atoms, bonds } = result.value.graph;
  return connectivityKey(
    atoms.map((atom) => atom.symbol),
    bonds.map((bond) => [bond.from, bond.to] as const),
    atoms.map(() => 0),
  );
}

// Each formula as a chemist writes it, and the structure it stands for.
const WRITTEN: readonly (readonly [written: string, smiles: string, source: string])[] = [
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (CHNO isomers: fulminic acid
  // H-C≡N-O, isocyanic acid H-N=C=O, cyanic acid H-O-C≡N; fulminate and cyanate ions)
  ["HCNO", "C#[N+][O-]", "Greenwood & Earnshaw"],
  ["HNCO", "N=C=O", "Greenwood & Earnshaw"],
  ["HOCN", "OC#N", "Greenwood & Earnshaw"],
  ["OCN-", "[O-]C#N", "Greenwood & Earnshaw"],
  ["NCO-", "[O-]C#N", "Greenwood & Earnshaw"],
  ["HSCN", "SC#N", "Greenwood & Earnshaw"],
  ["HNCS", "N=C=S", "Greenwood & Earnshaw"],
  ["SCN-", "[S-]C#N", "Greenwood & Earnshaw"],
  ["HCN", "C#N", "Greenwood & Earnshaw"],
  ["HNC", "[NH+]#[C-]", "Greenwood & Earnshaw"],
  ["ClCN", "ClC#N", "Greenwood & Earnshaw"],
  ["BrCN", "BrC#N", "Greenwood & Earnshaw"],
  ["OCS", "O=C=S", "Greenwood & Earnshaw"],
  ["COS", "O=C=S", "Greenwood & Earnshaw"],
  // from memory: Clayden, Organic Chemistry (diazomethane, azides, nitriles and isonitriles,
  // nitro compounds and nitrite esters, carboxylic acids)
  ["CH2N2", "C=[N+]=[N-]", "Clayden"],
  ["CH3N3", "CN=[N+]=[N-]", "Clayden"],
  ["C2H5N3", "CCN=[N+]=[N-]", "Clayden"],
  ["C6H5N3", "[N-]=[N+]=Nc1ccccc1", "Clayden"],
  ["CH3CN", "CC#N", "Clayden"],
  ["CH3NC", "C[N+]#[C-]", "Clayden"],
  ["CH3NO2", "C[N+](=O)[O-]", "Clayden"],
  ["CH3ONO", "CON=O", "Clayden"],
  ["HCOOH", "OC=O", "Clayden"],
  ["HCO2H", "OC=O", "Clayden"],
  ["CH3COOH", "CC(=O)O", "Clayden"],
  ["CH3CO2H", "CC(=O)O", "Clayden"],
  ["CH3SCN", "CSC#N", "Clayden"],
  ["CH3NCS", "CN=C=S", "Clayden"],
  ["HCONH2", "NC=O", "Clayden"],
  ["CH3OH", "CO", "Clayden"],
  ["CHBrClF", "FC(Cl)Br", "Clayden"],
  ["CH2ClCH2Cl", "ClCCCl", "Clayden"],
  ["CH3CHClCH3", "CC(C)Cl", "Clayden"],
  ["CH2BrCHBrCH2Br", "BrCC(Br)CBr", "Clayden"],
  // from memory: Housecroft & Sharpe, Inorganic Chemistry (nitrogen, oxygen, sulfur and
  // halogen compounds: hydrides, oxoacids, oxides, oxohalides, thiazyl halides)
  ["HN3", "N=[N+]=[N-]", "Housecroft & Sharpe"],
  ["N3-", "[N-]=[N+]=[N-]", "Housecroft & Sharpe"],
  ["N2O", "[N-]=[N+]=O", "Housecroft & Sharpe"],
  ["NNO", "[N-]=[N+]=O", "Housecroft & Sharpe"],
  ["HOCl", "OCl", "Housecroft & Sharpe"],
  ["HClO", "OCl", "Housecroft & Sharpe"],
  ["HOBr", "OBr", "Housecroft & Sharpe"],
  ["NOCl", "ClN=O", "Housecroft & Sharpe"],
  ["ClNO", "ClN=O", "Housecroft & Sharpe"],
  ["ONCl", "ClN=O", "Housecroft & Sharpe"],
  ["FNO", "FN=O", "Housecroft & Sharpe"],
  ["NOF", "FN=O", "Housecroft & Sharpe"],
  ["ClNO2", "Cl[N+](=O)[O-]", "Housecroft & Sharpe"],
  ["NO2Cl", "Cl[N+](=O)[O-]", "Housecroft & Sharpe"],
  ["SOCl2", "O=S(Cl)Cl", "Housecroft & Sharpe"],
  ["SO2Cl2", "O=S(=O)(Cl)Cl", "Housecroft & Sharpe"],
  ["POCl3", "O=P(Cl)(Cl)Cl", "Housecroft & Sharpe"],
  ["N2H4", "NN", "Housecroft & Sharpe"],
  ["NH2NH2", "NN", "Housecroft & Sharpe"],
  ["NH2OH", "NO", "Housecroft & Sharpe"],
  ["H2NCN", "NC#N", "Housecroft & Sharpe"],
  ["NH2CN", "NC#N", "Housecroft & Sharpe"],
  ["HNO", "N=O", "Housecroft & Sharpe"],
  ["HNO2", "ON=O", "Housecroft & Sharpe"],
  ["HONO", "ON=O", "Housecroft & Sharpe"],
  ["HNO3", "O[N+](=O)[O-]", "Housecroft & Sharpe"],
  ["H2SO4", "OS(=O)(=O)O", "Housecroft & Sharpe"],
  ["H3PO4", "OP(=O)(O)O", "Housecroft & Sharpe"],
  ["NSF", "N#SF", "Housecroft & Sharpe"],
  ["SNF3", "N#S(F)(F)F", "Housecroft & Sharpe"],
  ["S2Cl2", "ClSSCl", "Housecroft & Sharpe"],
  ["Cl2O", "ClOCl", "Housecroft & Sharpe"],
  ["O2F2", "FOOF", "Housecroft & Sharpe"],
  ["FOOF", "FOOF", "Housecroft & Sharpe"],
  ["H2O2", "OO", "Housecroft & Sharpe"],
  ["HOOH", "OO", "Housecroft & Sharpe"],
  ["N2F2", "FN=NF", "Housecroft & Sharpe"],
  ["N2O3", "O=N[N+](=O)[O-]", "Housecroft & Sharpe"],
  ["N2O4", "[O-][N+](=O)[N+]([O-])=O", "Housecroft & Sharpe"],
  ["N2O5", "[O-][N+](=O)O[N+]([O-])=O", "Housecroft & Sharpe"],
  ["P4", "P12P3P1P23", "Housecroft & Sharpe"],
  ["S8", "S1SSSSSSS1", "Housecroft & Sharpe"],
  // from memory: Greenwood & Earnshaw (halogen oxides, oxohalides, interhalogens and polyhalide
  // ions: Cl, Br and I central among O and F, F never central; HOCl and the chlorine oxoacids
  // have H on O; Cl2O2 is mainly the peroxide ClOOCl)
  ["OClO", "[O]Cl=O", "Greenwood & Earnshaw"],
  ["O=Cl=O", "[O]Cl=O", "Greenwood & Earnshaw"],
  ["ClO2", "[O]Cl=O", "Greenwood & Earnshaw"],
  ["OBrO", "[O]Br=O", "Greenwood & Earnshaw"],
  ["FClO2", "F[Cl+2]([O-])[O-]", "Greenwood & Earnshaw"],
  ["ClO2F", "F[Cl+2]([O-])[O-]", "Greenwood & Earnshaw"],
  ["ClO3F", "F[Cl+3]([O-])([O-])[O-]", "Greenwood & Earnshaw"],
  ["FClF2", "[F][Cl]([F])[F]", "Greenwood & Earnshaw"],
  ["ClF3", "[F][Cl]([F])[F]", "Greenwood & Earnshaw"],
  ["III-", "I[I-]I", "Greenwood & Earnshaw"],
  ["I3-", "I[I-]I", "Greenwood & Earnshaw"],
  ["ICl2-", "Cl[I-]Cl", "Greenwood & Earnshaw"],
  ["ClICl-", "Cl[I-]Cl", "Greenwood & Earnshaw"],
  ["FBrF4", "[F][Br]([F])([F])([F])[F]", "Greenwood & Earnshaw"],
  ["BrF5", "[F][Br]([F])([F])([F])[F]", "Greenwood & Earnshaw"],
  ["HClO2", "O[Cl+][O-]", "Greenwood & Earnshaw"],
  ["HOClO", "O[Cl+][O-]", "Greenwood & Earnshaw"],
  ["HClO3", "O[Cl+2]([O-])[O-]", "Greenwood & Earnshaw"],
  ["HClO4", "O[Cl+3]([O-])([O-])[O-]", "Greenwood & Earnshaw"],
  ["OCl2", "ClOCl", "Greenwood & Earnshaw"],
  ["ClOOCl", "ClOOCl", "Greenwood & Earnshaw"],
  ["Cl2O2", "ClOOCl", "Greenwood & Earnshaw"],
  // from memory: Herzberg, Electronic Spectra of Polyatomic Molecules (HCO is H-C=O); the
  // oxoborane HBO is H-B-O, isoelectronic with HCN
  ["HCO", "[CH]=O", "Herzberg"],
  ["HBO", "[BH]=O", "Herzberg"],
  // from memory: Greenwood & Earnshaw (metaboric acid monomer H-O-B=O)
  ["HBO2", "OB=O", "Greenwood & Earnshaw"],
  ["HOBO", "OB=O", "Greenwood & Earnshaw"],
];

describe("the skeleton a written formula stands for", () => {
  it.each(WRITTEN)("%s is %s", (written, smiles, source) => {
    // source: the reference structure (named in the table) read by RDKit (WebAssembly build)
    expect(engineConnectivity(written), `${written} against ${smiles} (${source})`).toBe(rdkitConnectivity(smiles));
  });
});

/** Each centre as `atom AXE geometry`, in the order the analysis lists them. */
function centresOf(written: string): string[] {
  const result = analyzeSpecies(written);
  if (!result.ok) throw new Error(`${written} was not analysed: ${result.problem.message}`);
  return result.value.centres.map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry}`).sort();
}

// Every centre of the species (heavy atoms with two or more neighbours), whichever way it is written.
const CENTRES: readonly (readonly [written: string, centres: readonly string[], source: string])[] = [
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (chlorine and bromine dioxides
  // bent, the odd electron beside two lone pairs on the halogen)
  ["OClO", ["Cl AX2E2 bent"], "Greenwood & Earnshaw"],
  ["O=Cl=O", ["Cl AX2E2 bent"], "Greenwood & Earnshaw"],
  ["OBrO", ["Br AX2E2 bent"], "Greenwood & Earnshaw"],
  // from memory: Greenwood & Earnshaw (chloryl fluoride pyramidal, perchloryl fluoride a C3v tetrahedron)
  ["FClO2", ["Cl AX3E1 trigonal pyramidal"], "Greenwood & Earnshaw"],
  ["ClO2F", ["Cl AX3E1 trigonal pyramidal"], "Greenwood & Earnshaw"],
  ["ClO3F", ["Cl AX4 tetrahedral"], "Greenwood & Earnshaw"],
  // from memory: Greenwood & Earnshaw (ClF3 T-shaped, BrF5 square pyramidal, I3- and ICl2- linear)
  ["FClF2", ["Cl AX3E2 T-shaped"], "Greenwood & Earnshaw"],
  ["III-", ["I AX2E3 linear"], "Greenwood & Earnshaw"],
  ["ICl2-", ["I AX2E3 linear"], "Greenwood & Earnshaw"],
  ["ClICl-", ["I AX2E3 linear"], "Greenwood & Earnshaw"],
  ["FBrF4", ["Br AX5E1 square pyramidal"], "Greenwood & Earnshaw"],
  // from memory: Housecroft & Sharpe, Inorganic Chemistry (hypochlorous acid H-O-Cl; the chlorine
  // oxoacids with Cl central and each H on an O; Cl2O bent at O; ClNO and FNO bent at N)
  ["HOCl", ["O AX2E2 bent"], "Housecroft & Sharpe"],
  ["HClO", ["O AX2E2 bent"], "Housecroft & Sharpe"],
  ["HClO2", ["Cl AX2E2 bent", "O AX2E2 bent"], "Housecroft & Sharpe"],
  ["HClO3", ["Cl AX3E1 trigonal pyramidal", "O AX2E2 bent"], "Housecroft & Sharpe"],
  ["HClO4", ["Cl AX4 tetrahedral", "O AX2E2 bent"], "Housecroft & Sharpe"],
  ["OCl2", ["O AX2E2 bent"], "Housecroft & Sharpe"],
  ["Cl2O", ["O AX2E2 bent"], "Housecroft & Sharpe"],
  ["ClNO", ["N AX2E1 bent"], "Housecroft & Sharpe"],
  ["NOCl", ["N AX2E1 bent"], "Housecroft & Sharpe"],
  ["FNO", ["N AX2E1 bent"], "Housecroft & Sharpe"],
  // from memory: Herzberg, Electronic Spectra of Polyatomic Molecules (HCO bent near 125°, BH2
  // bent near 130°, the methyl radical planar; HBO linear)
  ["HCO", ["C AX2E1 bent"], "Herzberg"],
  ["BH2", ["B AX2E1 bent"], "Herzberg"],
  ["CH3", ["C AX3 trigonal planar"], "Herzberg"],
  ["HBO", ["B AX2 linear"], "Herzberg"],
  // from memory: Greenwood & Earnshaw (HOBO: O-B-O linear, B-O-H bent)
  ["HBO2", ["B AX2 linear", "O AX2E2 bent"], "Greenwood & Earnshaw"],
  // from memory: Anslyn & Dougherty, Modern Physical Organic Chemistry (radical geometry: the
  // methyl radical is planar; fluorine and chlorine on the radical carbon make it pyramidal,
  // CF3 most; CH2F stays close to planar; the silyl radical is pyramidal)
  ["CF3", ["C AX3E1 trigonal pyramidal"], "Anslyn & Dougherty"],
  ["CCl3", ["C AX3E1 trigonal pyramidal"], "Anslyn & Dougherty"],
  ["CHF2", ["C AX3E1 trigonal pyramidal"], "Anslyn & Dougherty"],
  ["CH2F", ["C AX3 trigonal planar"], "Anslyn & Dougherty"],
  ["SiH3", ["Si AX3E1 trigonal pyramidal"], "Anslyn & Dougherty"],
  // from memory: Anslyn & Dougherty (the tert-butyl radical is close to planar; beside a C=C the
  // odd electron spreads over the allyl pi system, which is planar)
  ["C(CH3)3", ["C AX3 trigonal planar", "C AX4 tetrahedral", "C AX4 tetrahedral", "C AX4 tetrahedral"], "Anslyn & Dougherty"],
  ["CF2CF=CF2", ["C AX3 trigonal planar", "C AX3 trigonal planar", "C AX3 trigonal planar"], "Anslyn & Dougherty"],
  // from memory: Herzberg (the ammonia radical cation NH3+ is planar, like the methyl radical)
  ["NH3+", ["N AX3 trigonal planar"], "Herzberg"],
];

describe("centres of halogen compounds, oxoacids and small radicals", () => {
  it.each(CENTRES)("%s has centres %j", (written, centres, source) => {
    expect(centresOf(written), `${written} (${source})`).toEqual([...centres].sort());
  });

  // from memory: Herzberg (HBO is H-B≡O, isoelectronic with HCN); Housecroft & Sharpe
  // (metaborate O=B=O⁻ linear, isoelectronic with CO2)
  it.each([
    ["HBO", [1, 3]],
    ["BO2-", [2, 2]],
  ] as const)("%s gives boron a full octet (bond orders %j)", (written, orders) => {
    const result = analyzeSpecies(written);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.electronDeficient).toBe(false);
    const boron = result.value.graph.atoms.findIndex((atom) => atom.symbol === "B");
    const boronBonds = result.value.graph.bonds.filter((bond) => bond.from === boron || bond.to === boron);
    expect(boronBonds.map((bond) => bond.order).sort()).toEqual([...orders]);
  });

  // from memory: Greenwood & Earnshaw (OClO and ClO2 are one molecule, however it is written)
  it("OClO, O=Cl=O and ClO2 draw the same structure with no formal charges", () => {
    for (const written of ["OClO", "O=Cl=O", "ClO2"]) {
      const result = analyzeSpecies(written);
      expect(result.ok).toBe(true);
      if (!result.ok) continue;
      expect(result.value.graph.atoms.map((atom) => atom.formalCharge)).toEqual([0, 0, 0]);
      expect(result.value.graph.bonds.map((bond) => bond.order).sort()).toEqual([1, 2]);
    }
  });

  // common practice: the card says how the odd electron was counted where the count decides the shape
  it.each([
    ["HCO", "counted as a domain"],
    ["CH3", "not counted as a domain"],
    ["CF3", "more electronegative than it"],
    ["CCl3", "the atom is pyramidal"],
  ])("%s explains its odd electron (%s)", (written, phrase) => {
    const result = analyzeSpecies(written);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.warnings.join(" ")).toContain(phrase);
  });
});

describe("shapes and notes of formulas read in written order", () => {
  // from memory: Greenwood & Earnshaw (fulminic acid is linear H-C≡N⁺-O⁻, its N sp like the C)
  it("HCNO is fulminic acid: its N is linear and no other isomer is offered", () => {
    const result = analyzeSpecies("HCNO");
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.centres.map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry}`)).toEqual(["C AX2 linear", "N AX2 linear"]);
    expect(result.value.warnings).toEqual([]);
  });

  // common practice: a formula that does not settle which isomer is meant still says so
  it.each([
    ["CNO-", "fulminate"],
    ["CHNO", "cyanic acid"],
  ])("%s still names the isomers it could be", (written, isomer) => {
    const result = analyzeSpecies(written);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.warnings.join(" ")).toContain(isomer);
  });

  // from memory: Greenwood & Earnshaw (HNC, hydrogen isocyanide, is an isomer of hydrogen cyanide)
  it("HNC is not given hydrogen cyanide's name", () => {
    const result = analyzeSpecies("HNC");
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.reading.name).not.toBe("hydrogen cyanide");
  });

  // from memory: Housecroft & Sharpe (diborane's B-H-B bridges are three-centre two-electron bonds;
  // Al2Cl6 is a Cl-bridged dimer only in some phases)
  it.each([
    ["B2H6", "three-centre-bonding"],
    ["Al2Cl6", "ambiguous-connectivity"],
  ])("%s is not drawn with two-centre bonds (%s)", (written, code) => {
    const result = analyzeSpecies(written);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe(code);
  });
});
