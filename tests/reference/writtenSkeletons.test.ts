import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import { ChemElements } from "@chemistry/elements";
import { analyzeSpecies } from "../../shared/src/index";

interface RdkitMol {
  get_json(): string;
  delete(): void;
}
interface RdkitModule {
  get_mol(input: string): RdkitMol | null;
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

/** The connectivity of a reference structure as RDKit reads and sanitises it. */
function rdkitConnectivity(smiles: string): string {
  const mol = rdkit.get_mol(smiles);
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
];

describe("the skeleton a written formula stands for", () => {
  it.each(WRITTEN)("%s is %s", (written, smiles, source) => {
    // source: the reference structure (named in the table) read by RDKit (WebAssembly build)
    expect(engineConnectivity(written), `${written} against ${smiles} (${source})`).toBe(rdkitConnectivity(smiles));
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
