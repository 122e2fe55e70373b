/**
 * The point group of a molecule from its 3D coordinates, found by searching the coordinates for
 * symmetry elements (rotation axes, mirror planes, inversion, improper axes) and walking the usual
 * decision chart. Fast enough for a few hundred atoms.
 */
import { norm, type Vec3 } from "../geometry/vectors";
import { centreMolecule, type CentredMolecule, type PositionedAtom } from "./centredMolecule";
import { classifyPointGroup } from "./classifyPointGroup";
import { findSymmetryElements, type FoundSymmetryElements } from "./findSymmetryElements";
import { INVERSION, mapsOntoItself } from "./operations";

export type { PositionedAtom } from "./centredMolecule";

/**
 * Default tolerance in ångströms: a symmetry operation must bring every atom within this distance
 * of an atom of the same element. Tight enough that a real distortion of a few hundredths of an
 * ångström shows; coordinates from experiment may need 0.05-0.1.
 */
export const DEFAULT_SYMMETRY_TOLERANCE = 0.01;

/** Most atoms one call accepts, to keep an editor responsive. */
export const MAX_SYMMETRY_ATOMS = 1000;

/** How many symmetry elements of one kind and order were found. */
export interface SymmetryElementCount {
  /** n of C_n or S_n; `Infinity` for the axis of a linear molecule or a lone atom. */
  readonly order: number;
  /** `Infinity` for the C2 axes of D∞h and the axes of a lone atom. */
  readonly count: number;
}

/** A summary of the symmetry elements found. */
export interface SymmetryElementSummary {
  /**
   * Rotation axes by order, highest first. Each axis counts once, under its highest order: the
   * C4 axes of an octahedron count as C4, not again as C2 (so Oh gives 3 C4, 4 C3, 6 C2).
   */
  readonly rotationAxes: readonly SymmetryElementCount[];
  /**
   * Improper axes S_n with n ≥ 3 by order, highest first, each axis once under its highest n
   * (S1 is a mirror plane and S2 the inversion centre; they are reported on their own).
   */
  readonly improperAxes: readonly SymmetryElementCount[];
  /** Mirror planes; `Infinity` for a linear molecule (every plane through the axis). */
  readonly mirrorPlanes: number;
  readonly inversionCentre: boolean;
  /** Unit direction of the principal axis in the input frame, or null when there is none. */
  readonly principalAxis: Vec3 | null;
}

export interface PointGroup {
  /** Schoenflies symbol: "C2v", "D3h", "Td", "Oh", "Ih", "D∞h", "C∞v", "Cs", "Ci", "C1", "S4", "Kh", ... */
  readonly symbol: string;
  readonly elements: SymmetryElementSummary;
  /** The atomic-number-weighted centre the elements pass through, in the input frame. */
  readonly centre: Vec3;
}

export type PointGroupProblemCode = "no-atoms" | "too-many-atoms" | "invalid-coordinates" | "invalid-tolerance" | "overlapping-atoms";

export type PointGroupResult =
  | { readonly ok: true; readonly value: PointGroup }
  | { readonly ok: false; readonly problem: { readonly code: PointGroupProblemCode; readonly message: string } };

/**
 * Finds the point group of a set of atoms. Positions are in ångströms in any frame; the answer
 * does not depend on where the molecule sits or how it is turned. `tolerance` (ångströms) is how
 * far an atom may land from its symmetry partner. Atoms are matched by element label, case
 * aside, so "D" differs from "H" and isotopic substitution lowers the symmetry.
 */
export function findPointGroup(atoms: readonly PositionedAtom[], tolerance: number = DEFAULT_SYMMETRY_TOLERANCE): PointGroupResult {
  return searchPointGroup(atoms, tolerance).result;
}

/**
 * The point group with what the search found on the way, for callers that go on to use the
 * symmetry elements themselves (the vibrational analysis) instead of searching again.
 */
export interface PointGroupSearch {
  readonly result: PointGroupResult;
  /** The centred molecule; absent when the input was refused. */
  readonly molecule?: CentredMolecule;
  /** The symmetry elements found; absent for a lone atom and a linear molecule, which need no search. */
  readonly elements?: FoundSymmetryElements;
}

/** {@link findPointGroup}, keeping the centred molecule and the symmetry elements. */
export function searchPointGroup(atoms: readonly PositionedAtom[], tolerance: number = DEFAULT_SYMMETRY_TOLERANCE): PointGroupSearch {
  const problem = inputProblem(atoms, tolerance);
  if (problem) return { result: { ok: false, problem } };

  const molecule = centreMolecule(atoms, tolerance);
  if (atoms.length === 1) return { result: { ok: true, value: loneAtom(molecule) }, molecule };
  if (isLinear(molecule, tolerance)) return { result: { ok: true, value: linear(molecule, tolerance) }, molecule };

  const elements = findSymmetryElements(molecule, tolerance);
  const { symbol, principalAxis } = classifyPointGroup(elements);
  return {
    result: {
      ok: true,
      value: {
        symbol,
        elements: summarise(elements, principalAxis?.direction ?? null),
        centre: molecule.centre,
      },
    },
    molecule,
    elements,
  };
}

function inputProblem(atoms: readonly PositionedAtom[], tolerance: number): { code: PointGroupProblemCode; message: string } | undefined {
  if (!(tolerance > 0) || !Number.isFinite(tolerance)) {
    return { code: "invalid-tolerance", message: `The symmetry tolerance must be a positive number of ångströms, not ${tolerance}.` };
  }
  if (!Array.isArray(atoms) || atoms.length === 0) {
    return { code: "no-atoms", message: "There are no atoms to find the symmetry of." };
  }
  if (atoms.length > MAX_SYMMETRY_ATOMS) {
    return {
      code: "too-many-atoms",
      message: `${atoms.length} atoms is more than the ${MAX_SYMMETRY_ATOMS} the symmetry search takes at once.`,
    };
  }
  const badIndex = atoms.findIndex(
    (atom) =>
      typeof atom?.element !== "string" ||
      atom.element.trim() === "" ||
      !Array.isArray(atom.position) ||
      atom.position.length !== 3 ||
      !(atom.position as readonly unknown[]).every((value) => typeof value === "number" && Number.isFinite(value)),
  );
  if (badIndex >= 0) {
    return {
      code: "invalid-coordinates",
      message: `Atom ${badIndex + 1} needs an element label and three finite coordinates.`,
    };
  }
  for (let i = 0; i < atoms.length; i++) {
    for (let j = i + 1; j < atoms.length; j++) {
      const [ax, ay, az] = atoms[i].position;
      const [bx, by, bz] = atoms[j].position;
      if (Math.hypot(ax - bx, ay - by, az - bz) <= 2 * tolerance) {
        return {
          code: "overlapping-atoms",
          message: `Atoms ${i + 1} and ${j + 1} sit on top of each other, so their symmetry cannot be told apart.`,
        };
      }
    }
  }
  return undefined;
}

/** Linear when every atom lies within the tolerance of the axis of least inertia. */
function isLinear(molecule: CentredMolecule, tolerance: number): boolean {
  const axis = molecule.principalAxes[0];
  return molecule.atoms.every(({ position }) => {
    const along = position[0] * axis[0] + position[1] * axis[1] + position[2] * axis[2];
    return norm(position) ** 2 - along * along <= tolerance * tolerance;
  });
}

function linear(molecule: CentredMolecule, tolerance: number): PointGroup {
  const centrosymmetric = mapsOntoItself(molecule, INVERSION, tolerance);
  const infinite = Number.POSITIVE_INFINITY;
  return {
    symbol: centrosymmetric ? "D∞h" : "C∞v",
    elements: {
      rotationAxes: centrosymmetric
        ? [
            { order: infinite, count: 1 },
            { order: 2, count: infinite },
          ]
        : [{ order: infinite, count: 1 }],
      improperAxes: centrosymmetric ? [{ order: infinite, count: 1 }] : [],
      mirrorPlanes: infinite,
      inversionCentre: centrosymmetric,
      principalAxis: molecule.principalAxes[0],
    },
    centre: molecule.centre,
  };
}

function loneAtom(molecule: CentredMolecule): PointGroup {
  const infinite = Number.POSITIVE_INFINITY;
  return {
    symbol: "Kh",
    elements: {
      rotationAxes: [{ order: infinite, count: infinite }],
      improperAxes: [{ order: infinite, count: infinite }],
      mirrorPlanes: infinite,
      inversionCentre: true,
      principalAxis: null,
    },
    centre: molecule.centre,
  };
}

function summarise(elements: FoundSymmetryElements, principalAxis: Vec3 | null): SymmetryElementSummary {
  return {
    rotationAxes: countByOrder(elements.axes.map((axis) => axis.order)),
    improperAxes: countByOrder(elements.axes.map((axis) => axis.improperOrder).filter((order) => order >= 3)),
    mirrorPlanes: elements.mirrorNormals.length,
    inversionCentre: elements.inversion,
    principalAxis,
  };
}

function countByOrder(orders: readonly number[]): SymmetryElementCount[] {
  const counts = new Map<number, number>();
  for (const order of orders) counts.set(order, (counts.get(order) ?? 0) + 1);
  return [...counts.entries()].sort((a, b) => b[0] - a[0]).map(([order, count]) => ({ order, count }));
}
