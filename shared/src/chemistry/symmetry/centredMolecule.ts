/**
 * A molecule made ready for the symmetry search: element labels turned into ids, positions moved
 * to the weighted centre, principal axes of inertia, and groups of atoms that might be
 * symmetry-equivalent.
 */
import { symmetricEigen, type Matrix3 } from "../geometry/symmetricEigen";
import { scale, sub, type Vec3 } from "../geometry/vectors";
import { elementWeight, normalizeElementLabel } from "./elementWeight";
import type { CentredAtom, MatchableMolecule } from "./operations";

/** The input atom shape: an element label and a position in ångströms. */
export interface PositionedAtom {
  readonly element: string;
  readonly position: Vec3;
}

export interface CentredMolecule extends MatchableMolecule {
  /** The centre the positions were moved from, in the caller's frame. */
  readonly centre: Vec3;
  /** Principal moments ascending, each with its unit axis. */
  readonly principalMoments: readonly [number, number, number];
  readonly principalAxes: readonly [Vec3, Vec3, Vec3];
  /**
   * Atoms that look alike (same element, same distance from the centre, same sorted distances
   * to every other element). Every true set of symmetry-equivalent atoms lies inside one group;
   * a group may be coarser than that, which costs only search time.
   */
  readonly lookAlikeGroups: readonly (readonly number[])[];
}

/**
 * Centres the atoms on the atomic-number-weighted centre and works out what the search needs.
 * `tolerance` is the distance within which two positions count as the same.
 */
export function centreMolecule(input: readonly PositionedAtom[], tolerance: number): CentredMolecule {
  const labels = input.map((atom) => normalizeElementLabel(atom.element));
  const elementIds = new Map<string, number>();
  for (const label of labels) if (!elementIds.has(label)) elementIds.set(label, elementIds.size);

  const weights = labels.map(elementWeight);
  const totalWeight = weights.reduce((sum, weight) => sum + weight, 0);
  const centre: Vec3 = scale(
    input.reduce<Vec3>(
      (sum, atom, index) => [
        sum[0] + weights[index] * atom.position[0],
        sum[1] + weights[index] * atom.position[1],
        sum[2] + weights[index] * atom.position[2],
      ],
      [0, 0, 0],
    ),
    1 / totalWeight,
  );

  const atoms: CentredAtom[] = input.map((atom, index) => ({
    elementId: elementIds.get(labels[index])!,
    position: sub(atom.position, centre),
  }));
  const indicesByElement: number[][] = Array.from({ length: elementIds.size }, () => []);
  atoms.forEach((atom, index) => indicesByElement[atom.elementId].push(index));

  const { values, vectors } = symmetricEigen(inertiaTensor(atoms, weights));
  return {
    atoms,
    indicesByElement,
    centre,
    principalMoments: values,
    principalAxes: vectors,
    lookAlikeGroups: groupLookAlikes(atoms, indicesByElement, 2 * tolerance),
  };
}

function inertiaTensor(atoms: readonly CentredAtom[], weights: readonly number[]): Matrix3 {
  let xx = 0;
  let yy = 0;
  let zz = 0;
  let xy = 0;
  let xz = 0;
  let yz = 0;
  atoms.forEach(({ position: [x, y, z] }, index) => {
    const weight = weights[index];
    xx += weight * (y * y + z * z);
    yy += weight * (x * x + z * z);
    zz += weight * (x * x + y * y);
    xy -= weight * x * y;
    xz -= weight * x * z;
    yz -= weight * y * z;
  });
  return [
    [xx, xy, xz],
    [xy, yy, yz],
    [xz, yz, zz],
  ];
}

/** Distance from the centre, then sorted distances to each element in turn: equal for equivalent atoms. */
function fingerprint(atoms: readonly CentredAtom[], indicesByElement: readonly (readonly number[])[], index: number): number[] {
  const [x, y, z] = atoms[index].position;
  const values = [Math.hypot(x, y, z)];
  for (const indices of indicesByElement) {
    const distances = indices
      .filter((other) => other !== index)
      .map((other) => {
        const [ox, oy, oz] = atoms[other].position;
        return Math.hypot(ox - x, oy - y, oz - z);
      })
      .sort((a, b) => a - b);
    values.push(...distances);
  }
  return values;
}

function groupLookAlikes(atoms: readonly CentredAtom[], indicesByElement: readonly (readonly number[])[], tolerance: number): number[][] {
  const groups: number[][] = [];
  for (const indices of indicesByElement) {
    const representatives: { fingerprint: number[]; members: number[] }[] = [];
    for (const index of indices) {
      const print = fingerprint(atoms, indicesByElement, index);
      const match = representatives.find((group) => group.fingerprint.every((value, k) => Math.abs(value - print[k]) <= tolerance));
      if (match) match.members.push(index);
      else representatives.push({ fingerprint: print, members: [index] });
    }
    groups.push(...representatives.map((group) => group.members));
  }
  return groups;
}
