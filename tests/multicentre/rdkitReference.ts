// What RDKit (WebAssembly build) says about each atom of a SMILES string: hybridization from
// SMARTS hybridization queries, formal charge, hydrogen count and degree from its JSON.
import { createRequire } from "node:module";
import { ChemElements } from "@chemistry/elements";

interface RDKitMol {
  get_json(): string;
  get_smiles(details?: string): string;
  add_hs(): string;
  get_substruct_matches(query: RDKitMol): string;
  delete(): void;
}
interface RDKitModule {
  get_mol(input: string, details?: string): RDKitMol | null;
  get_qmol(input: string): RDKitMol | null;
}

/** RDKit's hybridization names, lower-cased to match the core; "other" when no query matches. */
export type RdkitHybridization = "s" | "sp" | "sp2" | "sp3" | "sp3d" | "sp3d2" | "other";

export interface RdkitAtom {
  readonly symbol: string;
  readonly formalCharge: number;
  readonly hydrogens: number;
  /** Neighbours, hydrogens included. */
  readonly degree: number;
  readonly hybridization: RdkitHybridization;
}

// SMARTS `^n` matches RDKit's hybridization enum: ^0 S, ^1 SP, ^2 SP2, ^3 SP3, ^4 SP3D, ^5 SP3D2.
const HYBRIDIZATION_QUERIES: readonly [RdkitHybridization, string][] = [
  ["s", "[^0]"],
  ["sp", "[^1]"],
  ["sp2", "[^2]"],
  ["sp3", "[^3]"],
  ["sp3d", "[^4]"],
  ["sp3d2", "[^5]"],
];

interface Loaded {
  readonly rdkit: RDKitModule;
  readonly queries: readonly [RdkitHybridization, RDKitMol][];
}
let loaded: Loaded | undefined;

/** Load the WebAssembly module once per test file. */
export async function loadRdkit(): Promise<void> {
  if (loaded) return;
  const initRDKit = createRequire(import.meta.url)("@rdkit/rdkit");
  const rdkit: RDKitModule = await initRDKit();
  const queries = HYBRIDIZATION_QUERIES.map(([name, smarts]) => {
    const query = rdkit.get_qmol(smarts);
    if (query === null) throw new Error(`RDKit refused the query ${smarts}`);
    return [name, query] as [RdkitHybridization, RDKitMol];
  });
  loaded = { rdkit, queries };
}

/** Matched atom indices; RDKit answers "{}" rather than "[]" when nothing matches. */
function matchedAtoms(mol: RDKitMol, query: RDKitMol): number[] {
  const matches = JSON.parse(mol.get_substruct_matches(query)) as unknown;
  if (!Array.isArray(matches)) return [];
  return matches.map((match: { atoms: number[] }) => match.atoms[0]);
}

/** RDKit's view of every atom, in SMILES order; throws if RDKit rejects the SMILES. */
export function rdkitAtoms(smiles: string): RdkitAtom[] {
  if (!loaded) throw new Error("call loadRdkit() in beforeAll first");
  const mol = loaded.rdkit.get_mol(smiles);
  if (mol === null) throw new Error(`RDKit refused ${smiles}`);
  try {
    const json = JSON.parse(mol.get_json());
    const defaults = json.defaults.atom;
    const [molecule] = json.molecules;
    const degree = new Array<number>(molecule.atoms.length).fill(0);
    for (const bond of molecule.bonds ?? []) {
      degree[bond.atoms[0]] += 1;
      degree[bond.atoms[1]] += 1;
    }
    const hybridization = new Array<RdkitHybridization>(molecule.atoms.length).fill("other");
    for (const [name, query] of loaded.queries) {
      for (const index of matchedAtoms(mol, query)) hybridization[index] = name;
    }
    return molecule.atoms.map((atom: { z?: number; chg?: number; impHs?: number }, index: number) => {
      const hydrogens = atom.impHs ?? defaults.impHs;
      return {
        symbol: ChemElements.getById(atom.z ?? defaults.z)!.symbol,
        formalCharge: atom.chg ?? defaults.chg,
        hydrogens,
        degree: degree[index] + hydrogens,
        hybridization: hybridization[index],
      };
    });
  } finally {
    mol.delete();
  }
}

/** Element counts, hydrogens included, from RDKit's atoms. */
export function rdkitComposition(atoms: readonly RdkitAtom[]): Map<string, number> {
  const counts = new Map<string, number>();
  const add = (symbol: string, count: number) => counts.set(symbol, (counts.get(symbol) ?? 0) + count);
  for (const atom of atoms) {
    add(atom.symbol, 1);
    if (atom.hydrogens > 0) add("H", atom.hydrogens);
  }
  return counts;
}

/**
 * RDKit's canonical SMILES, without stereo marks and with every hydrogen written as an atom, of a
 * SMILES string or an MDL molfile; throws if RDKit rejects the input. A molfile with every H and
 * the same molecule's SMILES give the same text.
 */
export function rdkitCanonicalSmiles(input: string): string {
  if (!loaded) throw new Error("call loadRdkit() in beforeAll first");
  const read = loaded.rdkit.get_mol(input);
  if (read === null) throw new Error(`RDKit refused ${input}`);
  let withHydrogens: string;
  try {
    withHydrogens = read.add_hs();
  } finally {
    read.delete();
  }
  const mol = loaded.rdkit.get_mol(withHydrogens, JSON.stringify({ removeHs: false }));
  if (mol === null) throw new Error(`RDKit refused its own molfile for ${input}`);
  try {
    return mol.get_smiles(JSON.stringify({ doIsomericSmiles: false }));
  } finally {
    mol.delete();
  }
}
