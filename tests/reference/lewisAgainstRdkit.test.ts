import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import { ChemElements } from "@chemistry/elements";
import type { SpeciesAnalysis } from "../../shared/src/index";
import { analysisOf, neighboursOf } from "./analysisHelpers";
import { REFERENCE_LEWIS } from "./data/referenceLewisSmiles";

interface RdkitMol {
  get_json(): string;
  delete(): void;
}
interface RdkitModule {
  get_mol(input: string, details?: string): RdkitMol | null;
}
interface RdkitAtomJson {
  readonly z?: number;
  readonly chg?: number;
  readonly impHs?: number;
}
interface RdkitBondJson {
  readonly bo?: number;
  readonly atoms: readonly [number, number];
}

/** Heavy atoms as "N+1 H0" and heavy-heavy bonds as "N=O:2", sorted, so resonance forms compare equal. */
interface LewisSummary {
  readonly atoms: readonly string[];
  readonly bonds: readonly string[];
}

const require = createRequire(import.meta.url);
let rdkit: RdkitModule;

beforeAll(async () => {
  const initRdkit = require("@rdkit/rdkit");
  rdkit = await initRdkit();
});

function atomKey(symbol: string, formalCharge: number, hydrogens: number): string {
  const charge = formalCharge > 0 ? `+${formalCharge}` : formalCharge < 0 ? `${formalCharge}` : "";
  return `${symbol}${charge} H${hydrogens}`;
}

function bondKey(a: string, b: string, order: number): string {
  const [first, second] = [a, b].sort();
  return `${first}-${second}:${order}`;
}

/** The reference structure as RDKit reads and sanitises it (sanitising rejects impossible valences). */
function rdkitSummary(smiles: string): LewisSummary {
  const mol = rdkit.get_mol(smiles);
  if (mol === null) throw new Error(`RDKit refused the reference SMILES ${smiles}`);
  try {
    const json = JSON.parse(mol.get_json());
    const defaults = json.defaults;
    const molecule = json.molecules[0];
    const symbols: string[] = molecule.atoms.map((atom: RdkitAtomJson) => ChemElements.getById(atom.z ?? defaults.atom.z)!.symbol);
    const atoms = molecule.atoms.map((atom: RdkitAtomJson, i: number) =>
      atomKey(symbols[i], atom.chg ?? defaults.atom.chg, atom.impHs ?? defaults.atom.impHs),
    );
    const bonds = (molecule.bonds ?? []).map((bond: RdkitBondJson) =>
      bondKey(symbols[bond.atoms[0]], symbols[bond.atoms[1]], bond.bo ?? defaults.bond.bo),
    );
    return { atoms: atoms.sort(), bonds: bonds.sort() };
  } finally {
    mol.delete();
  }
}

/** The engine's chosen Lewis structure, summarised the same way (hydrogens folded into their atom). */
function engineSummary(analysis: SpeciesAnalysis): LewisSummary {
  const { atoms, bonds } = analysis.graph;
  const heavy = atoms.map((atom, i) => ({ atom, i })).filter(({ atom }) => atom.symbol !== "H");
  const summaryAtoms = heavy.map(({ atom, i }) => {
    const hydrogens = neighboursOf(analysis, i).filter((n) => atoms[n].symbol === "H").length;
    return atomKey(atom.symbol, atom.formalCharge, hydrogens);
  });
  const summaryBonds = bonds
    .filter((bond) => atoms[bond.from].symbol !== "H" && atoms[bond.to].symbol !== "H")
    .map((bond) => bondKey(atoms[bond.from].symbol, atoms[bond.to].symbol, bond.order));
  return { atoms: summaryAtoms.sort(), bonds: summaryBonds.sort() };
}

describe("Lewis structures against reference structures read by RDKit", () => {
  it.each(REFERENCE_LEWIS)("$species is $smiles", ({ species, smiles }) => {
    // source: RDKit (WebAssembly build) reads and sanitises each reference structure
    const reference = rdkitSummary(smiles);
    expect(engineSummary(analysisOf(species)), `${species} against ${smiles}`).toEqual(reference);
  });
});
