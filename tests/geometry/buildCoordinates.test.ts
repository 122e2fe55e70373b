// Model coordinates from Lewis structures: angles measured back from the coordinates, bond
// lengths, special cases (one atom, two atoms, rings, fragments) and bad graphs.
import { describe, expect, it } from "vitest";
import { analyzeSpecies, elementBySymbol, type MolecularGraph } from "../../shared/src/index";
import { buildCoordinates, type MolecularCoordinates } from "../../shared/src/chemistry/geometry/buildCoordinates";
import { analyzeCentre } from "../../shared/src/chemistry/vsepr/analyzeCentre";
import { angleDegrees, distance, norm, sub } from "../../shared/src/chemistry/geometry/vectors";
import { graphFromSmiles } from "./graphFromSmiles";

function analysed(text: string) {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text}: ${result.problem.message}`);
  return result.value;
}

/** Every angle between two neighbours of every centre, measured from the coordinates. */
function measuredAngles(graph: MolecularGraph, coordinates: MolecularCoordinates, radical = false) {
  const angles: { centre: number; measured: number; site: number; idealSet: readonly number[] }[] = [];
  graph.atoms.forEach((_, index) => {
    const detail = analyzeCentre(graph, index, radical);
    if (!detail) return;
    const at = coordinates.atoms[index].position;
    detail.ligands.forEach((a, i) => {
      detail.ligands.slice(i + 1).forEach((b, k) => {
        const j = i + 1 + k;
        angles.push({
          centre: index,
          measured: angleDegrees(sub(coordinates.atoms[a.atom].position, at), sub(coordinates.atoms[b.atom].position, at)),
          site: angleDegrees(detail.sites.ligandDirections[i], detail.sites.ligandDirections[j]),
          idealSet: detail.centre.idealAngles,
        });
      });
    });
  });
  return angles;
}

function expectIdealAngles(graph: MolecularGraph, coordinates: MolecularCoordinates, radical = false) {
  const angles = measuredAngles(graph, coordinates, radical);
  expect(angles.length).toBeGreaterThan(0);
  for (const angle of angles) {
    expect(Math.abs(angle.measured - angle.site)).toBeLessThan(0.5);
    // idealAngles are rounded to 0.1°; the measured angle must be one of them.
    expect(Math.min(...angle.idealSet.map((ideal) => Math.abs(ideal - angle.measured)))).toBeLessThan(0.5);
  }
}

// common practice: VSEPR ideal angles are the angles between the sites of the electron geometry,
// so a model built from those sites must measure them back exactly.
const SINGLE_AND_MULTI_CENTRE_SPECIES = [
  "SF4",
  "XeF4",
  "IF7",
  "XeF6",
  "PCl5",
  "SF6",
  "BrF5",
  "ClF3",
  "H2SO4",
  "HNO3",
  "CH3OH",
  "N2H4",
  "H2O2",
  "NH4+",
  "I3-",
  "O3",
  "H2O",
  "NH3",
  "CH4",
  "BF3",
  "CO2",
  "HCN",
  "XeF2",
  "SO4^2-",
  "NO3-",
  "CO3^2-",
  "ClO4-",
  "XeO3",
  "XeOF4",
  "POCl3",
  "SOF4",
  "CH2Cl2",
  "SO2",
  "NO2",
  "ClO2",
  "IF5",
  "ICl4-",
  "SF5Cl",
  "PF6-",
  "BrF3",
  "SO3",
  "COCl2",
];

describe("angles measured from the coordinates of analysed species", () => {
  it.each(SINGLE_AND_MULTI_CENTRE_SPECIES)("%s: every neighbour pair of every centre at its ideal angle", (text) => {
    const analysis = analysed(text);
    expectIdealAngles(analysis.graph, buildCoordinates(analysis.graph, analysis.radical), analysis.radical);
  });

  it("covers at least thirty species", () => {
    expect(SINGLE_AND_MULTI_CENTRE_SPECIES.length).toBeGreaterThanOrEqual(30);
  });
});

// Multi-centre molecules the reader does not analyse yet come from SMILES through a test helper.
describe("angles in chains and benzene-like rings", () => {
  it.each([
    ["ethane", "CC"],
    ["ethylene", "C=C"],
    ["acetylene", "C#C"],
    ["butane", "CCCC"],
    ["1,3-butadiene", "C=CC=C"],
    ["acetic acid", "CC(=O)O"],
    ["acetate", "CC(=O)[O-]"],
    ["glycine", "NCC(=O)O"],
    ["benzene", "c1ccccc1"],
    ["naphthalene", "c1ccc2ccccc2c1"],
    ["biphenyl", "c1ccc(cc1)-c1ccccc1"],
    ["phenol", "Oc1ccccc1"],
    ["toluene", "Cc1ccccc1"],
    ["cyclohexane", "C1CCCCC1"], // a chair closes with every angle tetrahedral
  ])("%s (%s)", (_name, smiles) => {
    const graph = graphFromSmiles(smiles);
    expectIdealAngles(graph, buildCoordinates(graph));
  });

  it("draws benzene as a regular hexagon with equal C-C bonds", () => {
    const graph = graphFromSmiles("c1ccccc1");
    const { atoms } = buildCoordinates(graph);
    const ring = graph.bonds.filter((b) => atoms[b.from].symbol === "C" && atoms[b.to].symbol === "C");
    const lengths = ring.map((b) => distance(atoms[b.from].position, atoms[b.to].position));
    // from memory: benzene C-C 1.39-1.40 Å, between C-C single (1.54) and C=C (1.34)
    expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThan(1e-9);
    expect(lengths[0]).toBeGreaterThan(1.34);
    expect(lengths[0]).toBeLessThan(1.45);
    // common practice: a planar ring: every atom within 1e-6 Å of one plane
    const carbons = atoms.filter((a) => a.symbol === "C").map((a) => a.position);
    const normal = crossOf(sub(carbons[1], carbons[0]), sub(carbons[2], carbons[0]));
    for (const atom of atoms) expect(Math.abs(dotOf(normal, sub(atom.position, carbons[0])) / norm(normal))).toBeLessThan(1e-6);
  });

  it("keeps strained rings closed with every bond near its model length (cyclopropane, cyclobutane, THF)", () => {
    for (const smiles of ["C1CC1", "C1CCC1", "C1CCOC1", "C1CC2CCC1CC2"]) {
      const graph = graphFromSmiles(smiles);
      const { atoms } = buildCoordinates(graph);
      for (const bond of graph.bonds) {
        const model = modelLength(atoms[bond.from].symbol, atoms[bond.to].symbol, bond.order);
        expect(Math.abs(distance(atoms[bond.from].position, atoms[bond.to].position) - model)).toBeLessThan(0.1);
      }
    }
    // from memory: cyclopropane has 60° ring angles; the model's C-C-C angles come out near 60°
    const propane = buildCoordinates(graphFromSmiles("C1CC1")).atoms;
    expect(angleDegrees(sub(propane[1].position, propane[0].position), sub(propane[2].position, propane[0].position))).toBeCloseTo(60, 0);
  });
});

const dotOf = (a: readonly number[], b: readonly number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const crossOf = (a: readonly number[], b: readonly number[]) =>
  [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]] as const;

// source: covalent radii of the element table; double ×0.87, triple ×0.78 (the documented model)
function modelLength(a: string, b: string, order: number): number {
  const factor = order === 3 ? 0.78 : order === 2 ? 0.87 : 1;
  return ((elementBySymbol(a)!.covalentRadius + elementBySymbol(b)!.covalentRadius) / 100) * factor;
}

describe("bond lengths", () => {
  it.each([
    // from memory: CRC Handbook bond lengths, Å; the model lands within 0.1 Å
    ["CH4", "C", "H", 1.09],
    ["H2O", "O", "H", 0.96],
    ["SF6", "S", "F", 1.56],
    ["CO2", "C", "O", 1.16],
    ["HCN", "C", "N", 1.16],
    ["PCl5", "P", "Cl", 2.1],
  ])("%s %s-%s near %f Å", (text, a, b, expected) => {
    const analysis = analysed(text);
    const { atoms } = buildCoordinates(analysis.graph);
    const bond = analysis.graph.bonds.find((x) => [atoms[x.from].symbol, atoms[x.to].symbol].sort().join() === [a, b].sort().join())!;
    expect(Math.abs(distance(atoms[bond.from].position, atoms[bond.to].position) - expected)).toBeLessThan(0.12);
  });

  it("uses covalent radii and the multiple-bond factors on every bond of an acyclic species", () => {
    for (const text of ["HCN", "SOF4", "HNO3", "H2SO4", "XeO3"]) {
      const analysis = analysed(text);
      const { atoms } = buildCoordinates(analysis.graph);
      for (const bond of analysis.graph.bonds) {
        const length = distance(atoms[bond.from].position, atoms[bond.to].position);
        // Resonance averaging may put a bond between its single and double lengths.
        expect(length).toBeGreaterThanOrEqual(modelLength(atoms[bond.from].symbol, atoms[bond.to].symbol, 3) - 1e-9);
        expect(length).toBeLessThanOrEqual(modelLength(atoms[bond.from].symbol, atoms[bond.to].symbol, 1) + 1e-9);
      }
    }
  });

  it("gives resonance-equivalent S-O bonds of sulfate one length", () => {
    const analysis = analysed("SO4^2-");
    const { atoms } = buildCoordinates(analysis.graph);
    const lengths = analysis.graph.bonds.map((b) => distance(atoms[b.from].position, atoms[b.to].position));
    // from memory: sulfate has four equal S-O bonds (about 1.47-1.49 Å)
    expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThan(1e-9);
  });
});

describe("special cases", () => {
  it("puts a lone atom at the origin with its lone pairs", () => {
    const analysis = analysed("Ne");
    const coordinates = buildCoordinates(analysis.graph);
    expect(coordinates.atoms).toEqual([{ symbol: "Ne", position: [0, 0, 0] }]);
    expect(coordinates.lonePairs).toHaveLength(4); // common practice: Ne has an octet of four lone pairs
  });

  it.each(["HF", "HCl", "N2", "O2", "CO", "ClF"])("lays diatomic %s along z", (text) => {
    const analysis = analysed(text);
    const { atoms } = buildCoordinates(analysis.graph, analysis.radical);
    expect(atoms[0].position).toEqual([0, 0, 0]);
    expect(atoms[1].position[0]).toBe(0);
    expect(atoms[1].position[1]).toBe(0);
    expect(atoms[1].position[2]).toBeGreaterThan(0.5);
  });

  it("gives every lone-pair domain a unit direction away from the atom's bonds", () => {
    for (const text of ["SF4", "ClF3", "XeF4", "NH3", "H2O", "I3-"]) {
      const analysis = analysed(text);
      const { atoms, lonePairs } = buildCoordinates(analysis.graph);
      const expectedCount = analysis.graph.atoms.reduce((sum, a) => sum + a.lonePairs, 0);
      expect(lonePairs).toHaveLength(expectedCount);
      for (const pair of lonePairs) {
        expect(norm(pair.direction)).toBeCloseTo(1, 9);
        for (const bond of analysis.graph.bonds.filter((b) => b.from === pair.atom || b.to === pair.atom)) {
          const other = bond.from === pair.atom ? bond.to : bond.from;
          // common practice: VSEPR domains are at least 90° apart
          expect(angleDegrees(pair.direction, sub(atoms[other].position, atoms[pair.atom].position))).toBeGreaterThan(89.5);
        }
      }
    }
  });

  it("marks the odd electron of a radical with one electron", () => {
    const analysis = analysed("NO2");
    const { lonePairs } = buildCoordinates(analysis.graph, analysis.radical);
    expect(lonePairs.filter((p) => p.electrons === 1)).toHaveLength(1); // common practice: NO2 has 17 valence electrons
  });

  it("keeps separate fragments apart", () => {
    const graph = graphFromSmiles("O.O");
    const { atoms } = buildCoordinates(graph);
    for (let i = 0; i < atoms.length; i++) {
      for (let j = i + 1; j < atoms.length; j++) expect(distance(atoms[i].position, atoms[j].position)).toBeGreaterThan(0.5);
    }
  });

  it("survives empty and malformed graphs", () => {
    expect(buildCoordinates({ atoms: [], bonds: [] })).toEqual({ atoms: [], lonePairs: [] });
    const odd = buildCoordinates({
      atoms: [
        { symbol: "C", lonePairs: 0, unpairedElectrons: 0, formalCharge: 0 },
        { symbol: "Qq", lonePairs: 0, unpairedElectrons: 0, formalCharge: 0 },
      ],
      bonds: [
        { from: 0, to: 1, order: 1 },
        { from: 0, to: 7, order: 1 },
        { from: 1, to: 1, order: 1 },
      ],
    });
    expect(odd.atoms).toHaveLength(2);
    for (const atom of odd.atoms) expect(atom.position.every(Number.isFinite)).toBe(true);
  });
});
