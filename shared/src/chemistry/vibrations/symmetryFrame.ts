/**
 * Lays a character table's standard frame onto a molecule: which of the molecule's directions is
 * z (the principal axis), x (a C2′ axis or a direction in a σv plane) and y. Where a table has two
 * classes of like elements (C2′ and C2″, σv and σd), the usual convention decides: C2′ and σv pass
 * through more atoms, and a planar C2v or D2h molecule lies in the yz plane.
 */
import { cross, dot, norm, normalize, scale, type Vec3 } from "../geometry/vectors";
import type { Matrix3 } from "../geometry/symmetricEigen";
import type { CentredMolecule } from "../symmetry/centredMolecule";
import type { FoundSymmetryElements } from "../symmetry/findSymmetryElements";
import { reflectionMatrix, rotationMatrix, symmetryPermutation } from "../symmetry/operations";

/** The standard frame's axes, in the molecule's (centred) frame; right-handed. */
export interface SymmetryFrame {
  readonly x: Vec3;
  readonly y: Vec3;
  readonly z: Vec3;
}

const NEARLY_PERPENDICULAR = 0.2;

/** Frames to try, most conventional first. */
export function candidateFrames(
  group: string,
  molecule: CentredMolecule,
  elements: FoundSymmetryElements | undefined,
  principalAxis: Vec3 | undefined,
  tolerance: number,
): SymmetryFrame[] {
  const unmoved = (matrix: Matrix3): number => {
    const permutation = symmetryPermutation(molecule, matrix, tolerance);
    return permutation ? permutation.filter((image, index) => image === index).length : -1;
  };
  if (group === "C1" || group === "Ci") return [frameFrom([0, 0, 1], [1, 0, 0])];
  if (group === "C∞v" || group === "D∞h") return [frameFrom(molecule.principalAxes[0], anyPerpendicular(molecule.principalAxes[0]))];
  if (!elements) return [];
  if (group === "Cs") {
    const normal = elements.mirrorNormals[0];
    return normal ? [frameFrom(normal, anyPerpendicular(normal))] : [];
  }
  if (/^(T|Td|Th|O|Oh)$/.test(group)) return cubicFrames(elements, group.startsWith("O") ? 4 : 2);
  if (/^(I|Ih)$/.test(group)) return icosahedralFrames(elements);
  if (group === "D2" || group === "D2h") return orthorhombicFrames(group, elements, unmoved);
  if (!principalAxis) return [];
  const z = normalize(principalAxis);
  const perpendicular = (direction: Vec3) => Math.abs(dot(direction, z)) < NEARLY_PERPENDICULAR;
  if (group.startsWith("D")) {
    const sideAxes = elements.axes.filter((axis) => perpendicular(axis.direction)).map((axis) => axis.direction);
    return byScore(
      sideAxes.map((x) => frameFrom(z, x)),
      (frame) => unmoved(rotationMatrix(frame.x, Math.PI)),
    );
  }
  if (/^C\d+v$/.test(group)) {
    const inPlane = elements.mirrorNormals.filter(perpendicular).map((normal) => cross(z, normal));
    // σv(xz) holds x; a planar C2v molecule goes in yz, so there σv(xz) is the plane with fewer atoms.
    const sign = group === "C2v" ? -1 : 1;
    return byScore(
      inPlane.map((x) => frameFrom(z, x)),
      (frame) => sign * unmoved(reflectionMatrix(frame.y)),
    );
  }
  return [frameFrom(z, anyPerpendicular(z))];
}

/** The frame with z along `z` and x along the part of `x` at right angles to it. */
function frameFrom(z: Vec3, x: Vec3): SymmetryFrame {
  const zUnit = normalize(z);
  const xUnit = normalize([x[0] - dot(x, zUnit) * zUnit[0], x[1] - dot(x, zUnit) * zUnit[1], x[2] - dot(x, zUnit) * zUnit[2]]);
  return { x: xUnit, y: cross(zUnit, xUnit), z: zUnit };
}

function anyPerpendicular(z: Vec3): Vec3 {
  const helper: Vec3 = Math.abs(z[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  return cross(z, helper);
}

/** Highest score first; ties keep the search's order. */
function byScore(frames: SymmetryFrame[], score: (frame: SymmetryFrame) => number): SymmetryFrame[] {
  const scored = frames.map((frame, index) => ({ frame, index, score: score(frame) }));
  return scored.sort((a, b) => b.score - a.score || a.index - b.index).map(({ frame }) => frame);
}

/** x, y, z along three mutually perpendicular axes of the given order (C2 for T, Td, Th; C4 for O, Oh). */
function cubicFrames(elements: FoundSymmetryElements, order: number): SymmetryFrame[] {
  const axes = elements.axes.filter((axis) => axis.order === order).map((axis) => axis.direction);
  const pair = perpendicularPair(axes);
  return pair ? [frameFrom(cross(pair[0], pair[1]), pair[0])] : [];
}

/**
 * x, y, z along three mutually perpendicular C2 axes; the C5 axis of the table lies along
 * (0, 1, φ) in one of the two ways of naming them, so both are offered.
 */
function icosahedralFrames(elements: FoundSymmetryElements): SymmetryFrame[] {
  const axes = elements.axes.filter((axis) => axis.order === 2).map((axis) => axis.direction);
  const pair = perpendicularPair(axes);
  if (!pair) return [];
  const [x, y] = pair;
  return [frameFrom(cross(x, y), x), frameFrom(scale(cross(x, y), -1), y)];
}

function perpendicularPair(axes: readonly Vec3[]): [Vec3, Vec3] | undefined {
  for (let i = 0; i < axes.length; i++) {
    for (let j = i + 1; j < axes.length; j++) {
      if (Math.abs(dot(axes[i], axes[j])) < 0.05) return [axes[i], axes[j]];
    }
  }
  return undefined;
}

/**
 * D2 and D2h: z along the C2 axis through most atoms; for D2h x is normal to the mirror holding
 * most atoms (a planar molecule lies in yz), for D2 along the next C2 by atoms.
 */
function orthorhombicFrames(group: string, elements: FoundSymmetryElements, unmoved: (matrix: Matrix3) => number): SymmetryFrame[] {
  const axes = elements.axes.map((axis) => axis.direction).filter((direction) => norm(direction) > 0);
  const frames: SymmetryFrame[] = [];
  for (const z of axes) {
    for (const x of axes) {
      if (Math.abs(dot(x, z)) < NEARLY_PERPENDICULAR) frames.push(frameFrom(z, x));
    }
  }
  const onAxis = (direction: Vec3) => unmoved(rotationMatrix(direction, Math.PI));
  return byScore(frames, (frame) => {
    const second = group === "D2h" ? unmoved(reflectionMatrix(frame.x)) : onAxis(frame.x);
    return onAxis(frame.z) * 1000 + second;
  });
}
