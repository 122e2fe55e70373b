/**
 * The 3D view's data model, built from the core's analysis and model coordinates: what the page
 * will draw for well-known VSEPR species.
 */
import { describe, expect, it } from "vitest";
import { analyzeSpecies, analyzeTyped, shapeViewModelOf, type SpeciesAnalysis } from "../../shared/src/index";
import { buildCoordinates } from "../../shared/src/chemistry/geometry/buildCoordinates";
import { angleDegrees, norm, sub, type Vec3 } from "../../shared/src/chemistry/geometry/vectors";
import { shapeViewModel, type ShapeViewModel } from "../../shared/src/report/shapeViewModel";

function analysed(text: string): SpeciesAnalysis {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text} was not analysed: ${result.problem.message}`);
  return result.value;
}

function viewOf(text: string): ShapeViewModel {
  const analysis = analysed(text);
  return shapeViewModel(analysis, buildCoordinates(analysis.graph, analysis.radical));
}

interface ShapeCase {
  readonly species: string;
  readonly atoms: number;
  readonly centreLonePairs: number;
  readonly axe: string;
  readonly electronGeometry: string;
  readonly molecularGeometry: string;
  readonly hybridization: string;
  /** Distinct ideal bond angles at the centre, as the view labels them. */
  readonly labelledAngles: readonly number[];
}

// common practice: VSEPR classes, geometry names, hybridization and ideal angles as every
// general-chemistry table gives them for these four species.
const CASES: readonly ShapeCase[] = [
  {
    species: "SF4",
    atoms: 5,
    centreLonePairs: 1,
    axe: "AX4E1",
    electronGeometry: "trigonal bipyramidal",
    molecularGeometry: "seesaw",
    hybridization: "sp3d",
    labelledAngles: [90, 120, 180],
  },
  {
    species: "XeF4",
    atoms: 5,
    centreLonePairs: 2,
    axe: "AX4E2",
    electronGeometry: "octahedral",
    molecularGeometry: "square planar",
    hybridization: "sp3d2",
    labelledAngles: [90, 180],
  },
  {
    species: "H2O",
    atoms: 3,
    centreLonePairs: 2,
    axe: "AX2E2",
    electronGeometry: "tetrahedral",
    molecularGeometry: "bent",
    hybridization: "sp3",
    labelledAngles: [109.5],
  },
  {
    species: "CH4",
    atoms: 5,
    centreLonePairs: 0,
    axe: "AX4",
    electronGeometry: "tetrahedral",
    molecularGeometry: "tetrahedral",
    hybridization: "sp3",
    labelledAngles: [109.5],
  },
];

describe("shape view model", () => {
  it.each(CASES)("$species: atoms, lone pairs, legend and labelled angles", (expected) => {
    const view = viewOf(expected.species);
    expect(view.atoms).toHaveLength(expected.atoms);
    expect(view.lonePairs).toHaveLength(expected.centreLonePairs);
    expect(view.lonePairs.every((lonePair) => lonePair.electrons === 2)).toBe(true);
    expect(view.centres).toHaveLength(1);
    const [centre] = view.centres;
    expect(centre).toMatchObject({
      axe: expected.axe,
      electronGeometry: expected.electronGeometry,
      molecularGeometry: expected.molecularGeometry,
      hybridization: expected.hybridization,
      lonePairs: expected.centreLonePairs,
    });
    expect(view.atoms.filter((atom) => atom.isCentre).map((atom) => atom.index)).toEqual([centre.atom]);
    expect(view.bonds).toHaveLength(expected.atoms - 1);
    // Model coordinates are idealised, so the labels sit within a degree of the ideal angles.
    expect(view.angles.map((angle) => angle.degrees)).toHaveLength(expected.labelledAngles.length);
    view.angles.forEach((angle, index) => expect(angle.degrees).toBeCloseTo(expected.labelledAngles[index], 0));
  });

  it("SF4: the lone pair sits in the equatorial plane, at right angles to the axial F-S-F line", () => {
    // common practice: in AX4E1 the lone pair takes an equatorial site (fewest 90° repulsions).
    const view = viewOf("SF4");
    const sulfur = view.atoms.find((atom) => atom.symbol === "S")!;
    const fluorines = view.atoms.filter((atom) => atom.symbol === "F");
    const axial = fluorines.filter((a) =>
      fluorines.some((b) => b !== a && angleDegrees(sub(a.position, sulfur.position), sub(b.position, sulfur.position)) > 175),
    );
    expect(axial).toHaveLength(2);
    expect(angleDegrees(view.lonePairs[0].direction, sub(axial[0].position, sulfur.position))).toBeCloseTo(90, 0);
  });

  it("XeF4: the two lone pairs point opposite ways, across the square of fluorines", () => {
    // common practice: AX4E2 puts its lone pairs trans, leaving the atoms square planar.
    const view = viewOf("XeF4");
    expect(angleDegrees(view.lonePairs[0].direction, view.lonePairs[1].direction)).toBeCloseTo(180, 0);
    const xenon = view.atoms.find((atom) => atom.symbol === "Xe")!;
    for (const fluorine of view.atoms.filter((atom) => atom.symbol === "F")) {
      expect(angleDegrees(view.lonePairs[0].direction, sub(fluorine.position, xenon.position))).toBeCloseTo(90, 0);
    }
  });

  it.each(["SF4", "XeF4", "H2O", "CH4"])("%s: ghost sites, lobes and angle arcs stay inside the extent the page scales to", (species) => {
    const view = viewOf(species);
    const points: Vec3[] = [
      ...view.atoms.map((atom) => atom.position),
      ...view.lonePairs.map((lonePair) => lonePair.sitePosition),
      ...view.angles.flatMap((angle) => [...angle.arc, angle.labelPosition]),
    ];
    for (const point of points) expect(norm(point)).toBeLessThanOrEqual(view.extent + 1e-9);
    for (const angle of view.angles) {
      const centre = view.atoms[angle.centre].position;
      // Each arc runs from one bond's direction to the other's.
      const first = sub(angle.arc[0], centre);
      const last = sub(angle.arc[angle.arc.length - 1], centre);
      expect(angleDegrees(first, last)).toBeCloseTo(angle.degrees, 0);
    }
  });

  it("is plain JSON: a round trip through JSON changes nothing", () => {
    const view = viewOf("SF4");
    expect(JSON.parse(JSON.stringify(view))).toEqual(view);
  });

  it("keeps the written text as data and carries the model caution", () => {
    const view = viewOf("\\ce{SF4}");
    expect(view.title).toBe("\\ce{SF4}");
    expect(view.formula).toBe("SF4");
    expect(view.caution).toMatch(/model prediction, not measured data/i);
  });

  it("gives an odd electron on a centre its own entry, never counted as a lone pair", () => {
    // common practice: the methyl radical CH3 has 7 valence electrons, the odd one on carbon.
    // The model draws CH3 flat (no domain for the odd electron), so a direction is added here.
    const analysis = analysed("CH3");
    const coordinates = buildCoordinates(analysis.graph, analysis.radical);
    const withOddElectron = {
      ...coordinates,
      lonePairs: [
        ...coordinates.lonePairs,
        { atom: 0, direction: [0, 0, 1] as Vec3, electrons: 1 as const },
        { atom: 0, direction: [0, 0, -1] as Vec3, electrons: 1 as const },
      ],
    };
    const view = shapeViewModel(analysis, withOddElectron);
    expect(view.lonePairs.map((lonePair) => lonePair.electrons)).toEqual([1]);
    expect(view.centres[0].lonePairs).toBe(0);
  });

  it("copes with coordinates that do not match the structure", () => {
    const analysis = analysed("SF4");
    const coordinates = buildCoordinates(analysis.graph);
    const short = {
      atoms: coordinates.atoms.slice(0, 2),
      lonePairs: [...coordinates.lonePairs, { atom: 99, direction: [0, 0, 1] as Vec3 }],
    };
    const view = shapeViewModel(analysis, short);
    expect(view.atoms).toHaveLength(2);
    expect(view.bonds.every((bond) => bond.from < 2 && bond.to < 2)).toBe(true);
  });

  it.each(["ClF3", "SF4", "XeF4", "CH4", "SF6", "IF7", "XeF2", "smiles:CC(=O)O", "smiles:c1ccccc1", "smiles:OO"])(
    "%s: the starting view is a proper rotation (orthonormal rows, no mirror image)",
    (species) => {
      const result = analyzeTyped(species);
      if (!result.ok) throw new Error(result.problem.message);
      const rotation = shapeViewModelOf(result.value)!.viewRotation;
      // common practice: a rotation matrix has orthonormal rows and determinant +1
      const rows: Vec3[] = [0, 3, 6].map((at) => [rotation[at], rotation[at + 1], rotation[at + 2]] as Vec3);
      for (const [i, a] of rows.entries()) {
        for (const [j, b] of rows.entries()) expect(a[0] * b[0] + a[1] * b[1] + a[2] * b[2]).toBeCloseTo(i === j ? 1 : 0, 4);
      }
      // A mirror image would swap the hands of a chiral molecule: right × up must be towards the viewer.
      const [right, up, towards] = rows;
      const crossed = [right[1] * up[2] - right[2] * up[1], right[2] * up[0] - right[0] * up[2], right[0] * up[1] - right[1] * up[0]];
      crossed.forEach((value, k) => expect(value).toBeCloseTo(towards[k], 4));
    },
  );
});
