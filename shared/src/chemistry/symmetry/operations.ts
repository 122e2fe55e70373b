/**
 * Symmetry operations as 3×3 matrices about the origin, and the test of whether one of them maps
 * a molecule onto itself.
 */
import type { Matrix3 } from "../geometry/symmetricEigen";
import { rotationAboutAxis } from "../geometry/rotation";
import type { Vec3 } from "../geometry/vectors";

/** An atom after centring: an integer id per element (same element, same id) and a position. */
export interface CentredAtom {
  readonly elementId: number;
  readonly position: Vec3;
}

/** Atoms grouped for matching: the indices of the atoms of each element id. */
export interface MatchableMolecule {
  readonly atoms: readonly CentredAtom[];
  readonly indicesByElement: readonly (readonly number[])[];
}

/** Proper rotation by `angle` radians about a unit `axis` (right-hand rule). */
export function rotationMatrix(axis: Vec3, angle: number): Matrix3 {
  return rotationAboutAxis(axis, angle);
}

/** Reflection through the plane through the origin with unit normal `normal`. */
export function reflectionMatrix(normal: Vec3): Matrix3 {
  const [x, y, z] = normal;
  return [
    [1 - 2 * x * x, -2 * x * y, -2 * x * z],
    [-2 * x * y, 1 - 2 * y * y, -2 * y * z],
    [-2 * x * z, -2 * y * z, 1 - 2 * z * z],
  ];
}

/** Improper rotation S_n: rotation by 2π/n about `axis`, then reflection through the plane normal to it. */
export function improperRotationMatrix(axis: Vec3, order: number): Matrix3 {
  return multiply(reflectionMatrix(axis), rotationMatrix(axis, (2 * Math.PI) / order));
}

/** Inversion through the origin. */
export const INVERSION: Matrix3 = [
  [-1, 0, 0],
  [0, -1, 0],
  [0, 0, -1],
];

function multiply(a: Matrix3, b: Matrix3): Matrix3 {
  const entry = (i: number, j: number) => a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j];
  return [
    [entry(0, 0), entry(0, 1), entry(0, 2)],
    [entry(1, 0), entry(1, 1), entry(1, 2)],
    [entry(2, 0), entry(2, 1), entry(2, 2)],
  ];
}

/**
 * Where the operation sends each atom: `result[i]` is the index of the atom of the same element
 * that atom i lands on within `tolerance`, or null when some atom lands on none. Atoms are
 * assumed to be further apart than twice the tolerance, so the nearest match is the only one.
 */
export function symmetryPermutation(molecule: MatchableMolecule, operation: Matrix3, tolerance: number): readonly number[] | null {
  const toleranceSquared = tolerance * tolerance;
  const [r0, r1, r2] = operation;
  const permutation = new Array<number>(molecule.atoms.length);
  for (let atomIndex = 0; atomIndex < molecule.atoms.length; atomIndex++) {
    const atom = molecule.atoms[atomIndex];
    const [x, y, z] = atom.position;
    const ix = r0[0] * x + r0[1] * y + r0[2] * z;
    const iy = r1[0] * x + r1[1] * y + r1[2] * z;
    const iz = r2[0] * x + r2[1] * y + r2[2] * z;
    let image = -1;
    for (const index of molecule.indicesByElement[atom.elementId]) {
      const [px, py, pz] = molecule.atoms[index].position;
      const dx = px - ix;
      const dy = py - iy;
      const dz = pz - iz;
      if (dx * dx + dy * dy + dz * dz <= toleranceSquared) {
        image = index;
        break;
      }
    }
    if (image < 0) return null;
    permutation[atomIndex] = image;
  }
  return permutation;
}

/** True when the operation sends every atom to within `tolerance` of an atom of the same element. */
export function mapsOntoItself(molecule: MatchableMolecule, operation: Matrix3, tolerance: number): boolean {
  return symmetryPermutation(molecule, operation, tolerance) !== null;
}
