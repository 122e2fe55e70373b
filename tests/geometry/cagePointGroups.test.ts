// Ring systems and cages: the point group of the model coordinates against the textbook point
// group and against openchemlib's force-field conformer, and the angles a cage without small
// rings can keep.
import { beforeAll, describe, expect, it } from "vitest";
import { ConformerGenerator, ForceFieldMMFF94, Molecule, Resources } from "openchemlib";
import { buildCoordinates } from "../../shared/src/chemistry/geometry/buildCoordinates";
import { findPointGroup, type PositionedAtom } from "../../shared/src/chemistry/symmetry/pointGroup";
import { angleDegrees, sub } from "../../shared/src/chemistry/geometry/vectors";
import { graphFromSmiles } from "./graphFromSmiles";

function pointGroup(atoms: readonly PositionedAtom[], tolerance?: number): string {
  const result = findPointGroup(atoms, tolerance);
  if (!result.ok) throw new Error(result.problem.message);
  return result.value.symbol;
}

function modelAtoms(smiles: string): PositionedAtom[] {
  return buildCoordinates(graphFromSmiles(smiles)).atoms.map((atom) => ({ element: atom.symbol, position: atom.position }));
}

// from memory: character tables and worked examples of a standard inorganic chemistry text
// (cubane Oh, adamantane and hexamethylenetetramine Td, bicyclo[2.2.2]octane and prismane D3h,
// the 1,4-dioxane chair C2h, norbornane C2v, spiropentane D2d)
const CAGES: readonly (readonly [name: string, smiles: string, group: string])[] = [
  ["cubane", "C12C3C4C1C5C2C3C45", "Oh"],
  ["adamantane", "C1C2CC3CC1CC(C2)C3", "Td"],
  ["hexamethylenetetramine", "C1N2CN3CN1CN(C2)C3", "Td"],
  ["bicyclo[2.2.2]octane", "C1CC2CCC1CC2", "D3h"],
  ["bicyclo[1.1.1]pentane", "C1C2CC1C2", "D3h"],
  ["prismane", "C12C3C1C4C2C34", "D3h"],
  ["spiropentane", "C1CC12CC2", "D2d"],
  ["norbornane", "C1CC2CCC1C2", "C2v"],
  ["1,4-dioxane (chair)", "C1COCCO1", "C2h"],
  ["cyclopropane", "C1CC1", "D3h"],
];

describe("point groups of ring systems and cages", () => {
  it.each(CAGES)("%s (%s) is %s", (name, smiles, expected) => {
    const found = pointGroup(modelAtoms(smiles));
    expect(found, `${name}: the model coordinates should keep the ${expected} symmetry of the molecule`).toBe(expected);
  });
});

describe("the same cages from openchemlib's force-field conformers", () => {
  beforeAll(() => {
    Resources.registerFromNodejs();
  });

  /** Conformer from openchemlib, minimised with its MMFF94s+ force field. */
  function openchemlibAtoms(smiles: string): PositionedAtom[] {
    const molecule = Molecule.fromSmiles(smiles);
    molecule.addImplicitHydrogens();
    const conformer = new ConformerGenerator(42).getOneConformerAsMolecule(molecule);
    if (!conformer) throw new Error(`openchemlib made no conformer for ${smiles}`);
    new ForceFieldMMFF94(conformer, ForceFieldMMFF94.MMFF94SPLUS, {}).minimise({ maxIts: 5000, gradTol: 1e-7, funcTol: 1e-12 });
    return Array.from({ length: conformer.getAllAtoms() }, (_, atom) => ({
      element: conformer.getAtomLabel(atom),
      position: [conformer.getAtomX(atom), conformer.getAtomY(atom), conformer.getAtomZ(atom)] as const,
    }));
  }

  // source: openchemlib (ConformerGenerator, then its MMFF94s+ minimiser); a force-field minimum
  // is symmetric only to the minimiser's tolerance, so its group is read at 0.05 Å. Left out:
  // bicyclo[1.1.1]pentane, whose openchemlib conformer puts two hydrogens on top of each other.
  it.each(CAGES.filter(([name]) => name !== "bicyclo[1.1.1]pentane"))("%s (%s)", (name, smiles) => {
    const reference = pointGroup(openchemlibAtoms(smiles), 0.05);
    expect(pointGroup(modelAtoms(smiles)), `${name}: openchemlib's conformer is ${reference}`).toBe(reference);
  });
});

/** Every angle at every atom with two or more neighbours, measured from the model. */
function anglesOf(smiles: string): { centre: string; pair: string; angle: number }[] {
  const graph = graphFromSmiles(smiles);
  const { atoms } = buildCoordinates(graph);
  const neighbours = atoms.map((_, atom) =>
    graph.bonds.filter((b) => b.from === atom || b.to === atom).map((b) => (b.from === atom ? b.to : b.from)),
  );
  return atoms.flatMap((atom, centre) =>
    neighbours[centre].flatMap((a, i) =>
      neighbours[centre].slice(i + 1).map((b) => ({
        centre: atom.symbol,
        pair: `${atoms[a].symbol}${atoms[b].symbol}`,
        angle: angleDegrees(sub(atoms[a].position, atom.position), sub(atoms[b].position, atom.position)),
      })),
    ),
  );
}

describe("angles in cages", () => {
  // common practice: adamantane, hexamethylenetetramine and bicyclo[2.2.2]octane are strain-free,
  // so every angle can be tetrahedral (109.47°)
  it.each([
    ["adamantane", "C1C2CC3CC1CC(C2)C3"],
    ["hexamethylenetetramine", "C1N2CN3CN1CN(C2)C3"],
    ["bicyclo[2.2.2]octane", "C1CC2CCC1CC2"],
  ])("%s keeps every angle tetrahedral", (_name, smiles) => {
    for (const { angle } of anglesOf(smiles)) expect(Math.abs(angle - 109.47)).toBeLessThan(0.5);
  });

  it("builds cubane as a cube with each C-H bond along a body diagonal", () => {
    const angles = anglesOf("C12C3C4C1C5C2C3C45");
    // common practice: the angles of a cube are 90°; a body diagonal makes 125.26° with each edge
    // that leaves its corner outwards (cos = -1/√3)
    for (const { pair, angle } of angles) expect(Math.abs(angle - (pair === "CC" ? 90 : 125.26))).toBeLessThan(0.5);
  });
});
