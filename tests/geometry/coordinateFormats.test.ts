// XYZ and MDL molfile output read back: our own XYZ parser, OpenChemLib and RDKit.
import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, type MolecularGraph } from "../../shared/src/index";
import { buildCoordinates, type MolecularCoordinates } from "../../shared/src/chemistry/geometry/buildCoordinates";
import { toMolfile } from "../../shared/src/chemistry/formats/molfile";
import { toXyz } from "../../shared/src/chemistry/formats/xyz";
import { graphFromSmiles } from "./graphFromSmiles";

/** The few calls of RDKit's JavaScript build that these tests use. */
interface RDKitMolecule {
  is_valid(): boolean;
  get_json(): string;
  get_molblock(): string;
  delete(): void;
}
interface RDKitModule {
  get_mol(input: string, options?: string): RDKitMolecule | null;
}

const require = createRequire(import.meta.url);
const OCL = require("openchemlib");
let RDKit: RDKitModule;

beforeAll(async () => {
  const initRDKit = require("@rdkit/rdkit");
  RDKit = await initRDKit();
});

interface Case {
  readonly label: string;
  readonly graph: MolecularGraph;
  readonly coordinates: MolecularCoordinates;
}

function fromSpecies(text: string): Case {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(result.problem.message);
  return { label: text, graph: result.value.graph, coordinates: buildCoordinates(result.value.graph, result.value.radical) };
}

function fromSmiles(smiles: string): Case {
  const graph = graphFromSmiles(smiles);
  return { label: smiles, graph, coordinates: buildCoordinates(graph) };
}

const CASES: readonly Case[] = [
  ...[
    "SF4",
    "XeF4",
    "IF7",
    "PCl5",
    "ClF3",
    "BrF5",
    "H2SO4",
    "HNO3",
    "CH3OH",
    "N2H4",
    "NH4+",
    "I3-",
    "O3",
    "SO4^2-",
    "NO2",
    "HCN",
    "CO2",
    "H2O",
  ].map(fromSpecies),
  ...["c1ccccc1", "CC(=O)[O-]", "C[N+](C)(C)C", "C1CCCCC1"].map(fromSmiles),
];

const molfileOf = (c: Case) => {
  const result = toMolfile(c.graph, c.coordinates, c.label);
  if (!result.ok) throw new Error(result.problem.message);
  return result.value;
};

/** Bonds as sorted "El1-El2" pairs with 1-based indices, each written low index first. */
function bondSet(pairs: readonly (readonly [number, number, number])[], symbols: readonly string[]): string[] {
  return pairs
    .map(([a, b, order]) => {
      const [low, high] = a < b ? [a, b] : [b, a];
      return `${symbols[low]}${low + 1}-${symbols[high]}${high + 1}:${order}`;
    })
    .sort();
}

const ourBonds = (c: Case) =>
  bondSet(
    c.graph.bonds.map((b) => [b.from, b.to, b.order] as const),
    c.graph.atoms.map((a) => a.symbol),
  );

/** Atom coordinates from a V2000 molfile's atom block. */
function molfilePositions(text: string): number[][] {
  const lines = text.split("\n");
  const count = Number(lines[3].slice(0, 3));
  return lines.slice(4, 4 + count).map((line) => [0, 10, 20].map((start) => Number(line.slice(start, start + 10))));
}

function expectSamePositions(actual: readonly (readonly number[])[], expected: MolecularCoordinates, tolerance: number) {
  expect(actual).toHaveLength(expected.atoms.length);
  actual.forEach((position, index) => {
    position.forEach((value, axis) => expect(Math.abs(value - expected.atoms[index].position[axis])).toBeLessThan(tolerance));
  });
}

describe("XYZ", () => {
  it.each(CASES.map((c) => [c.label, c]))("%s reads back to the same atoms and positions", (_label, c) => {
    const text = toXyz(c.coordinates, `${c.label} model geometry`);
    const lines = text.trimEnd().split("\n");
    // common practice: XYZ is the atom count, a comment line, then one `El x y z` line per atom
    expect(Number(lines[0])).toBe(c.coordinates.atoms.length);
    expect(lines[1]).toBe(`${c.label} model geometry`);
    const rows = lines.slice(2).map((line) => line.trim().split(/\s+/));
    expect(rows.map((row) => row[0])).toEqual(c.coordinates.atoms.map((a) => a.symbol));
    for (const row of rows) for (const value of row.slice(1)) expect(value).toMatch(/^-?\d+\.\d{6}$/);
    expectSamePositions(
      rows.map((row) => row.slice(1).map(Number)),
      c.coordinates,
      1e-6,
    );
  });

  it("keeps the comment on one line", () => {
    const text = toXyz(fromSpecies("H2O").coordinates, "water\nsecond line");
    expect(text.split("\n")[1]).toBe("water second line");
    expect(text.split("\n")).toHaveLength(3 + 3);
  });
});

describe("MDL molfile read by OpenChemLib", () => {
  it.each(CASES.map((c) => [c.label, c]))("%s: atoms, bonds, charges and coordinates", (_label, c) => {
    const text = molfileOf(c);
    const molecule = OCL.Molecule.fromMolfile(text);
    molecule.ensureHelperArrays(OCL.Molecule.cHelperRings);
    // source: OpenChemLib
    const count = molecule.getAllAtoms();
    expect(count).toBe(c.graph.atoms.length);
    // OpenChemLib moves hydrogens to the end, so its atoms are matched to ours by element and
    // position. It keeps y and z negated (a screen convention), hence the signs.
    const positions = Array.from({ length: count }, (_, i) => [molecule.getAtomX(i), -molecule.getAtomY(i), -molecule.getAtomZ(i)]);
    const ours = Array.from({ length: count }, (_, i) =>
      c.coordinates.atoms.findIndex(
        (atom) => atom.symbol === molecule.getAtomLabel(i) && atom.position.every((v, axis) => Math.abs(v - positions[i][axis]) < 1e-3),
      ),
    );
    expect(new Set(ours).size).toBe(count);
    expect(ours.every((index) => index >= 0)).toBe(true);
    expect(Array.from({ length: count }, (_, i) => molecule.getAtomCharge(i))).toEqual(ours.map((j) => c.graph.atoms[j].formalCharge));
    // Bonds through the matching; aromatic bonds compared without their Kekulé order, which
    // OpenChemLib may choose afresh.
    const symbols = c.graph.atoms.map((a) => a.symbol);
    const theirs: (readonly [number, number, number])[] = [];
    const aromaticPairs = new Set<string>();
    for (let b = 0; b < molecule.getAllBonds(); b++) {
      const [a, z] = [ours[molecule.getBondAtom(0, b)], ours[molecule.getBondAtom(1, b)]];
      if (molecule.isAromaticBond(b)) aromaticPairs.add([a, z].sort().join());
      theirs.push([a, z, molecule.isAromaticBond(b) ? 0 : molecule.getBondOrder(b)]);
    }
    const mine = c.graph.bonds.map((b) => [b.from, b.to, aromaticPairs.has([b.from, b.to].sort().join()) ? 0 : b.order] as const);
    expect(bondSet(theirs, symbols)).toEqual(bondSet(mine, symbols));
  });
});

// source: RDKit's default allowed valences (Cl, Br, I: 1; F on them makes 3, 5, 7)
const REFUSED_BY_RDKIT_VALENCE = new Set(["IF7", "ClF3", "BrF5"]);

describe("MDL molfile read by RDKit", () => {
  it.each(CASES.map((c) => [c.label, c]))("%s: atoms, bonds, charges and coordinates", (_label, c) => {
    const text = molfileOf(c);
    // RDKit's valence rules refuse the hypervalent halogen fluorides when sanitising; every
    // other species must pass them.
    const sanitized = RDKit.get_mol(text, JSON.stringify({ removeHs: false }));
    expect(sanitized !== null && sanitized.is_valid()).toBe(!REFUSED_BY_RDKIT_VALENCE.has(c.label));
    sanitized?.delete();
    // The connection table as written (unsanitised, so aromatic rings keep our Kekulé orders).
    const molecule = RDKit.get_mol(text, JSON.stringify({ removeHs: false, sanitize: false }));
    expect(molecule && molecule.is_valid()).toBe(true);
    try {
      // source: RDKit
      const json = JSON.parse(molecule!.get_json());
      const defaults = json.defaults;
      const atoms: { z?: number; chg?: number }[] = json.molecules[0].atoms;
      const symbols = c.graph.atoms.map((a) => a.symbol);
      expect(atoms).toHaveLength(c.graph.atoms.length);
      expect(atoms.map((a) => a.chg ?? defaults.atom.chg)).toEqual(c.graph.atoms.map((a) => a.formalCharge));
      const rdBonds = (json.molecules[0].bonds as { atoms: [number, number]; bo?: number }[]).map(
        (b) => [b.atoms[0], b.atoms[1], b.bo ?? defaults.bond.bo] as const,
      );
      expect(bondSet(rdBonds, symbols)).toEqual(ourBonds(c));
      expectSamePositions(molfilePositions(molecule!.get_molblock()), c.coordinates, 1e-3);
    } finally {
      molecule!.delete();
    }
  });
});

describe("molfile layout", () => {
  it("writes the V2000 counts line, the old charge field, M  CHG and M  RAD", () => {
    const sulfate = molfileOf(fromSpecies("SO4^2-")).split("\n");
    // common practice: MDL CTfile V2000 layout
    expect(sulfate[3]).toBe("  5  4  0  0  0  0  0  0  0  0999 V2000");
    const chargedOxygens = sulfate.slice(4, 9).filter((line) => line.slice(36, 39) === "  5"); // 5 = -1
    expect(chargedOxygens).toHaveLength(2);
    expect(sulfate).toContain("M  CHG  2   2  -1   3  -1");
    expect(sulfate[sulfate.length - 2]).toBe("M  END");
    const nitrogenDioxide = molfileOf(fromSpecies("NO2"));
    expect(nitrogenDioxide).toMatch(/^M {2}RAD {2}1 {3}\d {3}2$/m); // 2 = doublet
  });

  it("refuses mismatched coordinates and oversized structures without throwing", () => {
    const water = fromSpecies("H2O");
    expect(toMolfile(water.graph, { atoms: water.coordinates.atoms.slice(1) }, "x")).toMatchObject({
      ok: false,
      problem: { code: "coordinates-mismatch" },
    });
    const big = {
      atoms: Array.from({ length: 1000 }, () => ({ symbol: "He", lonePairs: 1, unpairedElectrons: 0, formalCharge: 0 })),
      bonds: [],
    };
    const bigCoordinates = { atoms: big.atoms.map((_, i) => ({ symbol: "He", position: [i, 0, 0] as const })) };
    expect(toMolfile(big, bigCoordinates, "x")).toMatchObject({ ok: false, problem: { code: "too-many-atoms" } });
  });
});
