import { describe, expect, it } from "vitest";
import { idealDirections } from "../shared/src/chemistry/geometry/idealDirections";
import { angleDegrees, type Vec3 } from "../shared/src/chemistry/geometry/vectors";
import { findPointGroup, type PointGroup } from "../shared/src/chemistry/symmetry/pointGroup";
import {
  allene,
  benzeneLike,
  bent,
  boricAcid,
  chain,
  crownRing,
  cubane,
  cyclohexaneChair,
  diborane,
  dodecahydroDodecaborate,
  ethaneLike,
  ethyleneLike,
  hexanitroComplex,
  onSites,
  orthocarbonicAcidS4,
  twistedPair,
  vseprCentre,
  type Atom,
  type Ligand,
} from "./support/moleculeBuilders";
import { applyMatrix, jiggled, randomlyPlaced, randomRotation, seededRandom } from "./support/randomFrames";

// Bond lengths in ångströms, rounded; the point group does not depend on their exact values.
const H: Ligand = ["H", 1.09];
const F: Ligand = ["F", 1.6];
const Cl: Ligand = ["Cl", 2.0];
const Br: Ligand = ["Br", 1.93];
const O: Ligand = ["O", 1.45];
const CH: Ligand = ["H", 1.087];
const CF: Ligand = ["F", 1.35];
const CCl: Ligand = ["Cl", 1.73];

function randomAsymmetricCluster(seed: number): Atom[] {
  const random = seededRandom(seed);
  const elements = ["C", "H", "O", "N"];
  return Array.from({ length: 9 }, (_, k) => ({
    element: elements[k % elements.length],
    position: [random() * 4, random() * 4, random() * 4] as Vec3,
  }));
}

function symbolOf(atoms: readonly Atom[], tolerance?: number): string {
  const result = findPointGroup(atoms, tolerance);
  if (!result.ok) throw new Error(result.problem.message);
  return result.value.symbol;
}

function groupOf(atoms: readonly Atom[]): PointGroup {
  const result = findPointGroup(atoms);
  if (!result.ok) throw new Error(result.problem.message);
  return result.value;
}

// Every expected group below: from memory: point-group assignments in the character-table
// conventions of standard inorganic chemistry texts, for the idealised geometry built here.
const SPECIES: readonly (readonly [string, () => Atom[], string])[] = [
  ["H2O (bent, 104.5°)", () => bent("O", ["H", 0.958], ["H", 0.958], 104.5), "C2v"],
  ["NH3 (trigonal pyramidal)", () => vseprCentre("N", "tetrahedral", 1, [H, H, H]), "C3v"],
  ["CH4", () => vseprCentre("C", "tetrahedral", 0, [H, H, H, H]), "Td"],
  [
    "NH4+",
    () =>
      vseprCentre("N", "tetrahedral", 0, [
        ["H", 1.03],
        ["H", 1.03],
        ["H", 1.03],
        ["H", 1.03],
      ]),
    "Td",
  ],
  ["SO4^2-", () => vseprCentre("S", "tetrahedral", 0, [O, O, O, O]), "Td"],
  ["CH3Cl", () => vseprCentre("C", "tetrahedral", 0, [CCl, H, H, H]), "C3v"],
  ["CH2Cl2", () => vseprCentre("C", "tetrahedral", 0, [CCl, CCl, H, H]), "C2v"],
  ["CHCl3", () => vseprCentre("C", "tetrahedral", 0, [H, CCl, CCl, CCl]), "C3v"],
  ["CHFClBr", () => vseprCentre("C", "tetrahedral", 0, [H, CF, CCl, Br]), "C1"],
  [
    "NH2Cl",
    () =>
      vseprCentre("N", "tetrahedral", 1, [
        ["H", 1.01],
        ["H", 1.01],
        ["Cl", 1.75],
      ]),
    "Cs",
  ],
  ["POCl3", () => vseprCentre("P", "tetrahedral", 0, [O, Cl, Cl, Cl]), "C3v"],
  ["SOCl2 (pyramidal)", () => vseprCentre("S", "tetrahedral", 1, [O, Cl, Cl]), "Cs"],
  ["HOCl (bent)", () => bent("O", ["H", 0.97], ["Cl", 1.69], 102.5), "Cs"],
  ["O3 (bent, 116.8°)", () => bent("O", ["O", 1.278], ["O", 1.278], 116.8), "C2v"],
  [
    "BF3",
    () =>
      vseprCentre("B", "trigonal planar", 0, [
        ["F", 1.31],
        ["F", 1.31],
        ["F", 1.31],
      ]),
    "D3h",
  ],
  ["SO3", () => vseprCentre("S", "trigonal planar", 0, [O, O, O]), "D3h"],
  ["PCl5", () => vseprCentre("P", "trigonal bipyramidal", 0, [Cl, Cl, Cl, Cl, Cl]), "D3h"],
  ["PCl3F2 (axial F)", () => vseprCentre("P", "trigonal bipyramidal", 0, [F, F, Cl, Cl, Cl]), "D3h"],
  ["SF4 (seesaw)", () => vseprCentre("S", "trigonal bipyramidal", 1, [F, F, F, F]), "C2v"],
  ["ClF3 (T-shaped)", () => vseprCentre("Cl", "trigonal bipyramidal", 2, [F, F, F]), "C2v"],
  ["XeF2 (linear)", () => vseprCentre("Xe", "trigonal bipyramidal", 3, [F, F]), "D∞h"],
  ["SF6", () => vseprCentre("S", "octahedral", 0, [F, F, F, F, F, F]), "Oh"],
  ["SF5Cl", () => vseprCentre("S", "octahedral", 0, [Cl, F, F, F, F, F]), "C4v"],
  ["cis-SF4Cl2", () => onSites("S", "octahedral", { 0: Cl, 2: Cl, 1: F, 3: F, 4: F, 5: F }), "C2v"],
  ["trans-SF4Cl2", () => onSites("S", "octahedral", { 0: Cl, 1: Cl, 2: F, 3: F, 4: F, 5: F }), "D4h"],
  ["fac-MoCl3F3", () => onSites("Mo", "octahedral", { 0: Cl, 2: Cl, 4: Cl, 1: F, 3: F, 5: F }), "C3v"],
  ["mer-MoCl3F3", () => onSites("Mo", "octahedral", { 0: Cl, 1: Cl, 2: Cl, 3: F, 4: F, 5: F }), "C2v"],
  ["BrF5 (square pyramidal)", () => vseprCentre("Br", "octahedral", 1, [F, F, F, F, F]), "C4v"],
  [
    "IF5 (square pyramidal)",
    () =>
      vseprCentre("I", "octahedral", 1, [
        ["F", 1.87],
        ["F", 1.84],
        ["F", 1.84],
        ["F", 1.84],
        ["F", 1.84],
      ]),
    "C4v",
  ],
  ["XeOF4 (square pyramidal)", () => vseprCentre("Xe", "octahedral", 1, [["O", 1.71], F, F, F, F]), "C4v"],
  ["XeF4 (square planar)", () => vseprCentre("Xe", "octahedral", 2, [F, F, F, F]), "D4h"],
  ["IF7", () => vseprCentre("I", "pentagonal bipyramidal", 0, [F, F, F, F, F, F, F]), "D5h"],
  ["XeF5- (pentagonal planar)", () => vseprCentre("Xe", "pentagonal bipyramidal", 2, [F, F, F, F, F]), "D5h"],
  ["XeOF5- (pentagonal pyramidal)", () => vseprCentre("Xe", "pentagonal bipyramidal", 1, [["O", 1.76], F, F, F, F, F]), "C5v"],
  ["CO2", () => chain(["O", "C", "O"], [1.16, 1.16]), "D∞h"],
  ["I3-", () => chain(["I", "I", "I"], [2.92, 2.92]), "D∞h"],
  ["HCN", () => chain(["H", "C", "N"], [1.065, 1.153]), "C∞v"],
  ["N2O", () => chain(["N", "N", "O"], [1.128, 1.184]), "C∞v"],
  ["C2H4", () => ethyleneLike([CH, CH], [CH, CH]), "D2h"],
  ["C2H4 twisted by 30°", () => ethyleneLike([CH, CH], [CH, CH], 30), "D2"],
  ["trans-ClHC=CHCl", () => ethyleneLike([CCl, CH], [CH, CCl]), "C2h"],
  ["cis-ClHC=CHCl", () => ethyleneLike([CCl, CH], [CCl, CH]), "C2v"],
  ["H2C=CCl2", () => ethyleneLike([CH, CH], [CCl, CCl]), "C2v"],
  ["ethane, staggered", () => ethaneLike("C", "C", [H, H, H], [H, H, H], 60), "D3d"],
  ["ethane, eclipsed", () => ethaneLike("C", "C", [H, H, H], [H, H, H], 0), "D3h"],
  ["ethane, twisted by 20°", () => ethaneLike("C", "C", [H, H, H], [H, H, H], 20), "D3"],
  ["CH3CF3, staggered", () => ethaneLike("C", "C", [H, H, H], [CF, CF, CF], 60), "C3v"],
  ["CH3CF3, twisted by 20°", () => ethaneLike("C", "C", [H, H, H], [CF, CF, CF], 20), "C3"],
  ["meso-CHFCl-CHFCl, anti", () => ethaneLike("C", "C", [H, CF, CCl], [H, CF, CCl], 60).map(invertBack), "Ci"],
  ["H2O2 (dihedral 111.5°)", () => twistedPair("O", 1.475, ["H", 0.95], 94.8, 111.5), "C2"],
  ["trans-N2F2", () => twistedPair("N", 1.23, ["F", 1.41], 105.5, 180), "C2h"],
  ["cis-N2F2", () => twistedPair("N", 1.23, ["F", 1.41], 105.5, 0), "C2v"],
  ["allene", allene, "D2d"],
  ["B2H6", diborane, "D2h"],
  ["benzene", () => benzeneLike([CH, CH, CH, CH, CH, CH]), "D6h"],
  ["1,3,5-trichlorobenzene", () => benzeneLike([CCl, CH, CCl, CH, CCl, CH]), "D3h"],
  ["1,2,4,5-tetrachlorobenzene", () => benzeneLike([CCl, CCl, CH, CCl, CCl, CH]), "D2h"],
  ["chlorobenzene", () => benzeneLike([CCl, CH, CH, CH, CH, CH]), "C2v"],
  ["cyclohexane, chair", cyclohexaneChair, "D3d"],
  ["S8 crown", () => crownRing("S", 8, 1.7, 0.36), "D4d"],
  ["B(OH)3 (planar)", boricAcid, "C3h"],
  ["C(OH)4, S4 conformer", orthocarbonicAcidS4, "S4"],
  ["cubane", cubane, "Oh"],
  ["B12H12^2-", dodecahydroDodecaborate, "Ih"],
  ["idealised Co(NO2)6^3-", hexanitroComplex, "Th"],
  ["a random cluster of nine atoms", () => randomAsymmetricCluster(7), "C1"],
];

/**
 * For the meso ethane: the back carbon's substituents are the inverses of the front ones when
 * staggered, so relabel them by inverting the front set through the C-C midpoint.
 */
function invertBack(atom: Atom, index: number, atoms: readonly Atom[]): Atom {
  if (index < 5) return atom;
  const front = atoms[index - 3];
  return { element: front.element, position: [-front.position[0], -front.position[1], -front.position[2]] };
}

describe("findPointGroup on idealised species", () => {
  it.each(SPECIES)("%s", (_name, build, expected) => {
    expect(symbolOf(build())).toBe(expected);
  });

  it("covers at least 40 species", () => {
    expect(SPECIES.length).toBeGreaterThanOrEqual(40);
  });
});

describe("the answer does not depend on the frame", () => {
  // common practice: a point group is a property of the shape, not of where it sits
  it.each(SPECIES)("%s, randomly turned and moved", (_name, build, expected) => {
    const random = seededRandom(20240611 + expected.length * 97 + _name.length);
    for (let trial = 0; trial < 3; trial++) {
      expect(symbolOf(randomlyPlaced(build(), random))).toBe(expected);
    }
  });
});

describe("noise below the tolerance", () => {
  // common practice: coordinates a few thousandths of an ångström off ideal keep their symmetry
  // within a 0.01 Å tolerance
  it.each(SPECIES)("%s with ±0.001 Å noise, turned and moved", (_name, build, expected) => {
    const random = seededRandom(99 + _name.length * 31);
    expect(symbolOf(jiggled(randomlyPlaced(build(), random), random, 0.001))).toBe(expected);
  });

  // common practice: a looser tolerance absorbs larger scatter, as for coordinates from experiment
  it.each(SPECIES)("%s with ±0.01 Å noise at a 0.1 Å tolerance", (_name, build, expected) => {
    const random = seededRandom(4321 + _name.length * 17);
    expect(symbolOf(jiggled(randomlyPlaced(build(), random), random, 0.01), 0.1)).toBe(expected);
  });
});

describe("tolerance decides whether a distortion counts", () => {
  // from memory: stretching one C-H of methane leaves a C3v molecule
  const stretchedMethane = (): Atom[] => vseprCentre("C", "tetrahedral", 0, [["H", 1.14], H, H, H]);

  it("a 0.05 Å stretch lowers Td to C3v at the default tolerance", () => {
    expect(symbolOf(stretchedMethane())).toBe("C3v");
  });

  it("the same stretch is ignored at a 0.1 Å tolerance", () => {
    expect(symbolOf(stretchedMethane(), 0.1)).toBe("Td");
  });

  // common practice: isotopic substitution lowers the symmetry of the labelled framework
  it("CH3D is C3v because D is matched as its own label", () => {
    expect(symbolOf(vseprCentre("C", "tetrahedral", 0, [["D", 1.09], H, H, H]))).toBe("C3v");
  });

  it("element labels match whatever their case", () => {
    const atoms = vseprCentre("C", "tetrahedral", 0, [CCl, CCl, H, H]);
    const relabelled = atoms.map((atom, index) => (index === 1 ? { ...atom, element: "CL" } : atom));
    expect(symbolOf(relabelled)).toBe("C2v");
  });
});

describe("symmetry elements found", () => {
  // from memory: character tables (classes of operations) of Oh, Td, Ih, D6h, D4h, D3h, D3d, D2d, C2v
  it.each([
    ["SF6", () => vseprCentre("S", "octahedral", 0, [F, F, F, F, F, F]), { 4: 3, 3: 4, 2: 6 }, 9, true, { 6: 4, 4: 3 }],
    ["CH4", () => vseprCentre("C", "tetrahedral", 0, [H, H, H, H]), { 3: 4, 2: 3 }, 6, false, { 4: 3 }],
    ["B12H12^2-", dodecahydroDodecaborate, { 5: 6, 3: 10, 2: 15 }, 15, true, { 10: 6, 6: 10 }],
    ["benzene", () => benzeneLike([CH, CH, CH, CH, CH, CH]), { 6: 1, 2: 6 }, 7, true, { 6: 1 }],
    ["XeF4", () => vseprCentre("Xe", "octahedral", 2, [F, F, F, F]), { 4: 1, 2: 4 }, 5, true, { 4: 1 }],
    ["PCl5", () => vseprCentre("P", "trigonal bipyramidal", 0, [Cl, Cl, Cl, Cl, Cl]), { 3: 1, 2: 3 }, 4, false, { 3: 1 }],
    ["ethane, staggered", () => ethaneLike("C", "C", [H, H, H], [H, H, H], 60), { 3: 1, 2: 3 }, 3, true, { 6: 1 }],
    ["allene", allene, { 2: 3 }, 2, false, { 4: 1 }],
    ["H2O", () => bent("O", ["H", 0.958], ["H", 0.958], 104.5), { 2: 1 }, 2, false, {}],
  ] as const)("%s", (_name, build, rotationAxes, mirrorPlanes, inversionCentre, improperAxes) => {
    const { elements } = groupOf(randomlyPlaced(build(), seededRandom(5)));
    const asRecord = (counts: readonly { order: number; count: number }[]) =>
      Object.fromEntries(counts.map(({ order, count }) => [order, count]));
    expect(asRecord(elements.rotationAxes)).toEqual(rotationAxes);
    expect(elements.mirrorPlanes).toBe(mirrorPlanes);
    expect(elements.inversionCentre).toBe(inversionCentre);
    expect(asRecord(elements.improperAxes)).toEqual(improperAxes);
  });

  it("reports the principal axis in the caller's frame", () => {
    // common practice: the C3 axis of NH3 runs through N and the centre of the H3 triangle
    const random = seededRandom(11);
    const rotation = randomRotation(random);
    const ammonia = vseprCentre("N", "tetrahedral", 1, [H, H, H]).map(({ element, position }) => ({
      element,
      position: applyMatrix(rotation, position),
    }));
    const { elements } = groupOf(ammonia);
    const expectedAxis = applyMatrix(rotation, idealDirections("tetrahedral")[0]);
    const angle = angleDegrees(elements.principalAxis!, expectedAxis);
    expect(Math.min(angle, 180 - angle)).toBeLessThan(0.5);
  });

  it("a linear molecule reports an axis of infinite order", () => {
    // from memory: D∞h has C∞, infinitely many C2 and σv, σh and i
    const { elements } = groupOf(chain(["O", "C", "O"], [1.16, 1.16]));
    expect(elements.rotationAxes).toEqual([
      { order: Infinity, count: 1 },
      { order: 2, count: Infinity },
    ]);
    expect(elements.inversionCentre).toBe(true);
  });

  it("a lone atom is spherical", () => {
    // from memory: a free atom has the full rotation-reflection group, Kh
    expect(symbolOf([{ element: "Ar", position: [1, 2, 3] }])).toBe("Kh");
  });
});

describe("bad input comes back as a problem, never a throw", () => {
  it.each([
    ["no atoms", [], 0.01, "no-atoms"],
    [
      "a NaN coordinate",
      [
        { element: "C", position: [0, Number.NaN, 0] },
        { element: "O", position: [1.2, 0, 0] },
      ],
      0.01,
      "invalid-coordinates",
    ],
    ["a missing coordinate", [{ element: "C", position: [0, 0] }], 0.01, "invalid-coordinates"],
    ["an empty element label", [{ element: " ", position: [0, 0, 0] }], 0.01, "invalid-coordinates"],
    [
      "two atoms in one place",
      [
        { element: "H", position: [0, 0, 0] },
        { element: "H", position: [0, 0, 0.001] },
      ],
      0.01,
      "overlapping-atoms",
    ],
    ["a zero tolerance", [{ element: "H", position: [0, 0, 0] }], 0, "invalid-tolerance"],
    ["a negative tolerance", [{ element: "H", position: [0, 0, 0] }], -1, "invalid-tolerance"],
  ] as const)("%s", (_name, atoms, tolerance, code) => {
    const result = findPointGroup(atoms as unknown as Atom[], tolerance);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe(code);
  });
});
