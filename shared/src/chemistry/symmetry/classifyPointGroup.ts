/**
 * The usual decision chart from a set of found symmetry elements to a Schoenflies symbol, for
 * molecules that are not linear.
 */
import { dot, type Vec3 } from "../geometry/vectors";
import { type FoundAxis, type FoundSymmetryElements } from "./findSymmetryElements";

/** The Schoenflies symbol and the principal axis the decision was made about, if any. */
export interface Classification {
  readonly symbol: string;
  readonly principalAxis: FoundAxis | null;
}

/** Within about 11° of a right angle: loose enough for a slightly tilted axis at a loose tolerance. */
const NEARLY_PERPENDICULAR_COSINE = 0.2;

/**
 * Outside the cubic groups a mirror either contains the principal axis or is normal to it, so the
 * nearer of the two decides; this stays right when a loose tolerance lets an axis tilt a little.
 */
function isNormalToPlane(axis: Vec3, planeNormal: Vec3): boolean {
  return Math.abs(dot(axis, planeNormal)) > Math.SQRT1_2;
}

/**
 * Cubic and icosahedral groups first (two or more axes of order 3 or more), then the axial
 * groups about the highest-order axis, then Cs, Ci, C1.
 */
export function classifyPointGroup(elements: FoundSymmetryElements): Classification {
  const { axes, mirrorNormals, inversion } = elements;
  const countOfOrder = (order: number) => axes.filter((axis) => axis.order === order).length;

  if (axes.filter((axis) => axis.order >= 3).length >= 2) {
    const principalAxis = [...axes].sort((a, b) => b.order - a.order)[0];
    if (countOfOrder(5) >= 2) return { symbol: inversion ? "Ih" : "I", principalAxis };
    if (countOfOrder(4) >= 2) return { symbol: inversion ? "Oh" : "O", principalAxis };
    const symbol = inversion ? "Th" : mirrorNormals.length > 0 ? "Td" : "T";
    return { symbol, principalAxis };
  }

  if (axes.length === 0) {
    if (mirrorNormals.length > 0) return { symbol: "Cs", principalAxis: null };
    return { symbol: inversion ? "Ci" : "C1", principalAxis: null };
  }

  const principalAxis = choosePrincipalAxis(axes);
  const n = principalAxis.order;
  const horizontalMirror = mirrorNormals.some((normal) => isNormalToPlane(principalAxis.direction, normal));
  const verticalMirror = mirrorNormals.some((normal) => !isNormalToPlane(principalAxis.direction, normal));
  // Outside the cubic groups every other axis is a C2 at right angles to the principal one; the
  // angle check still guards against a principal axis that was missed, leaving C2s at 60°.
  const perpendicularTwofold = axes.some(
    (axis) => axis !== principalAxis && Math.abs(dot(axis.direction, principalAxis.direction)) < NEARLY_PERPENDICULAR_COSINE,
  );

  if (perpendicularTwofold) {
    if (horizontalMirror) return { symbol: `D${n}h`, principalAxis };
    return { symbol: verticalMirror ? `D${n}d` : `D${n}`, principalAxis };
  }
  if (horizontalMirror) return { symbol: `C${n}h`, principalAxis };
  if (verticalMirror) return { symbol: `C${n}v`, principalAxis };
  if (principalAxis.improperOrder === 2 * n) return { symbol: `S${2 * n}`, principalAxis };
  return { symbol: `C${n}`, principalAxis };
}

/**
 * Highest order wins; among equals (the three C2 axes of D2-type groups) the one carrying an
 * S_2n, which makes D2d come out as D2d rather than D2-something about a side axis.
 */
function choosePrincipalAxis(axes: readonly FoundAxis[]): FoundAxis {
  return [...axes].sort(
    (a, b) => b.order - a.order || Number(b.improperOrder === 2 * b.order) - Number(a.improperOrder === 2 * a.order),
  )[0];
}
