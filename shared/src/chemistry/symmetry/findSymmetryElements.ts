/**
 * The search itself: every candidate direction is tested as a rotation axis (of each order the
 * atom layout allows) and as a mirror normal; inversion and improper rotations are tested
 * directly. What survives is the molecule's set of symmetry elements.
 */
import { cross, dot, norm, type Vec3 } from "../geometry/vectors";
import type { CentredMolecule } from "./centredMolecule";
import { candidateAxes, candidateMirrorNormals } from "./candidateDirections";
import {
  improperRotationMatrix,
  INVERSION,
  mapsOntoItself,
  reflectionMatrix,
  rotationMatrix,
  symmetryPermutation,
  type MatchableMolecule,
} from "./operations";

/** A proper rotation axis with its highest order, and the highest S_n (n ≥ 3) about it, or 0. */
export interface FoundAxis {
  readonly direction: Vec3;
  readonly order: number;
  readonly improperOrder: number;
}

export interface FoundSymmetryElements {
  readonly axes: readonly FoundAxis[];
  readonly mirrorNormals: readonly Vec3[];
  readonly inversion: boolean;
}

// Distinct symmetry axes of any finite point group are at least ~7° apart for orders up to 12,
// so directions within ~3° are one axis seen twice.
const SAME_DIRECTION_SINE = 0.05;

function sameDirection(a: Vec3, b: Vec3): boolean {
  return norm(cross(a, b)) < SAME_DIRECTION_SINE;
}

/** Finds every rotation axis, mirror plane, improper axis and the inversion centre, if any. */
export function findSymmetryElements(molecule: CentredMolecule, tolerance: number): FoundSymmetryElements {
  // Each element is kept with the permutation of atoms it causes: at a loose tolerance a slightly
  // tilted copy of an axis can pass too, and the permutation, not the angle, tells it is a copy.
  const axes: (FoundAxis & { readonly permutation: readonly number[] })[] = [];
  for (const { direction } of candidateAxes(molecule, tolerance)) {
    if (axes.some((axis) => sameDirection(axis.direction, direction))) continue;
    const rotation = highestRotation(molecule, direction, tolerance);
    if (!rotation) continue;
    const copyOf = axes.findIndex((axis) => sameRotationAxis(axis, rotation));
    const found = { direction, ...rotation, improperOrder: highestImproperOrder(molecule, direction, rotation.order, tolerance) };
    if (copyOf < 0) axes.push(found);
    else if (axes[copyOf].order < found.order) axes[copyOf] = found;
  }

  const mirrors: { readonly normal: Vec3; readonly permutation: readonly number[] }[] = [];
  for (const { direction } of candidateMirrorNormals(molecule, tolerance)) {
    if (mirrors.some(({ normal }) => sameDirection(normal, direction))) continue;
    const permutation = symmetryPermutation(molecule, reflectionMatrix(direction), tolerance);
    if (permutation && !mirrors.some((mirror) => samePermutation(mirror.permutation, permutation))) {
      mirrors.push({ normal: direction, permutation });
    }
  }

  return {
    axes: axes.map(({ direction, order, improperOrder }) => ({ direction, order, improperOrder })),
    mirrorNormals: mirrors.map(({ normal }) => normal),
    inversion: mapsOntoItself(molecule, INVERSION, tolerance),
  };
}

interface Rotation {
  readonly order: number;
  /** Where one step of the rotation (by 2π/order) sends each atom. */
  readonly permutation: readonly number[];
}

/**
 * The highest-order rotation C_n about `axis` that maps the molecule onto itself, if any. Only
 * divisors of the sizes of the rings of look-alike atoms round the axis are tried, since C_n
 * moves every off-axis atom through a ring of exactly n.
 */
function highestRotation(molecule: MatchableMolecule, axis: Vec3, tolerance: number): Rotation | undefined {
  if (!firstAtomsHaveRingPartners(molecule, axis, 2 * tolerance)) return undefined;
  const ringSizeDivisor = ringSizeCommonDivisor(molecule, axis, 2 * tolerance);
  for (let order = ringSizeDivisor; order >= 2; order--) {
    if (ringSizeDivisor % order !== 0) continue;
    const permutation = symmetryPermutation(molecule, rotationMatrix(axis, (2 * Math.PI) / order), tolerance);
    if (permutation) return { order, permutation };
  }
  return undefined;
}

/**
 * Two rotations lie on one axis when a power of the higher-order one moves the atoms exactly as
 * the lower-order one does (either way round). For a molecule that is not linear, a rotation is
 * fixed by how it moves the atoms.
 */
function sameRotationAxis(a: Rotation, b: Rotation): boolean {
  const [high, low] = a.order >= b.order ? [a, b] : [b, a];
  if (high.order % low.order !== 0) return false;
  const power = permutationPower(high.permutation, high.order / low.order);
  return samePermutation(power, low.permutation) || samePermutation(power, inversePermutation(low.permutation));
}

function permutationPower(permutation: readonly number[], exponent: number): number[] {
  let result = permutation.map((_, index) => index);
  for (let step = 0; step < exponent; step++) result = result.map((index) => permutation[index]);
  return result;
}

function inversePermutation(permutation: readonly number[]): number[] {
  const inverse = new Array<number>(permutation.length);
  permutation.forEach((image, index) => (inverse[image] = index));
  return inverse;
}

function samePermutation(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((image, index) => image === b[index]);
}

/**
 * Quick rejection before the full ring count: a few off-axis atoms must each have another atom of
 * their element at the same height and distance from the axis. Most candidates fail here.
 */
function firstAtomsHaveRingPartners(molecule: MatchableMolecule, axis: Vec3, ringTolerance: number): boolean {
  const atoms = molecule.atoms;
  let checked = 0;
  for (let i = 0; i < atoms.length && checked < 3; i++) {
    const height = dot(atoms[i].position, axis);
    const radius = Math.sqrt(Math.max(0, dot(atoms[i].position, atoms[i].position) - height * height));
    if (radius <= ringTolerance) continue;
    checked++;
    const hasPartner = molecule.indicesByElement[atoms[i].elementId].some((j) => {
      if (j === i) return false;
      const otherHeight = dot(atoms[j].position, axis);
      const otherRadius = Math.sqrt(Math.max(0, dot(atoms[j].position, atoms[j].position) - otherHeight * otherHeight));
      return Math.abs(otherHeight - height) <= ringTolerance && Math.abs(otherRadius - radius) <= ringTolerance;
    });
    if (!hasPartner) return false;
  }
  return true;
}

/**
 * Greatest common divisor of the sizes of the rings round `axis`: atoms of one element at the same
 * height along the axis and the same distance from it. Rings are chained (single linkage, first by
 * height, then by distance), so noise can merge two whole rings, which keeps every true order a
 * divisor, but never splits one. Returns 1 early once no order above 1 is left, and 1 when every
 * atom is on the axis (a linear molecule, handled before the search).
 */
function ringSizeCommonDivisor(molecule: MatchableMolecule, axis: Vec3, ringTolerance: number): number {
  const atoms = molecule.atoms;
  const heights = atoms.map((atom) => dot(atom.position, axis));
  const radii = atoms.map((atom, index) => Math.sqrt(Math.max(0, dot(atom.position, atom.position) - heights[index] ** 2)));
  // Atoms this close to the axis may sit on it; the rotation test itself decides.
  const offAxis = atoms.map((_, index) => index).filter((index) => radii[index] > ringTolerance);
  offAxis.sort((a, b) => atoms[a].elementId - atoms[b].elementId || heights[a] - heights[b]);

  let divisor = 0;
  let start = 0;
  for (let end = 1; end <= offAxis.length; end++) {
    const previous = offAxis[end - 1];
    const next = offAxis[end];
    const sameLayer =
      end < offAxis.length && atoms[next].elementId === atoms[previous].elementId && heights[next] - heights[previous] <= ringTolerance;
    if (sameLayer) continue;
    const layer = offAxis.slice(start, end).sort((a, b) => radii[a] - radii[b]);
    let ringStart = 0;
    for (let k = 1; k <= layer.length; k++) {
      if (k < layer.length && radii[layer[k]] - radii[layer[k - 1]] <= ringTolerance) continue;
      divisor = greatestCommonDivisor(divisor, k - ringStart);
      if (divisor === 1) return 1;
      ringStart = k;
    }
    start = end;
  }
  return divisor === 0 ? 1 : divisor;
}

/** S_2n about a C_n axis, else S_n for n ≥ 3 (which needs a mirror normal to the axis), else 0. */
function highestImproperOrder(molecule: MatchableMolecule, axis: Vec3, order: number, tolerance: number): number {
  if (mapsOntoItself(molecule, improperRotationMatrix(axis, 2 * order), tolerance)) return 2 * order;
  if (order >= 3 && mapsOntoItself(molecule, improperRotationMatrix(axis, order), tolerance)) return order;
  return 0;
}

function greatestCommonDivisor(a: number, b: number): number {
  while (b !== 0) [a, b] = [b, a % b];
  return a;
}
