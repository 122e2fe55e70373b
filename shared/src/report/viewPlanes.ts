/**
 * Of the planes that contain an axis, the one holding the most atoms (ties: the one the atoms
 * spread across most when seen face-on): the starting view looks along its normal. Every atom off
 * the axis proposes the plane through it. Comparing each proposal with every atom takes time that
 * grows with the square of the atoms, so for large models the atoms each plane holds are counted in
 * one sweep round the axis instead: an atom is held by the planes whose angle about the axis lies
 * within a small arc of its own. `bestPlaneNormalOfEveryPair` is the plain version it is tested
 * against.
 */
import { cross, dot, norm, normalize, scale, sub, type Vec3 } from "../chemistry/geometry/vectors";

/** Above this many atoms the sweep counts the atoms each plane holds. */
const SWEEP_FROM_ATOMS = 200;

/** The normal of the best plane through `axis` (a unit vector); atoms within `onPlane` Å of a plane are on it. */
export function bestPlaneNormalThrough(axis: Vec3, positions: readonly Vec3[], onPlane: number): Vec3 {
  return positions.length > SWEEP_FROM_ATOMS
    ? bestPlaneBySweep(axis, positions, onPlane)
    : bestPlaneNormalOfEveryPair(axis, positions, onPlane);
}

/** The plain version: every proposed plane checked against every atom. */
export function bestPlaneNormalOfEveryPair(axis: Vec3, positions: readonly Vec3[], onPlane: number): Vec3 {
  const candidates = proposedNormals(axis, positions, onPlane);
  let best = candidates[0];
  let bestScore = -Infinity;
  for (const normal of candidates) {
    const held = positions.filter((position) => Math.abs(dot(position, normal)) < onPlane).length;
    const spread = positions.reduce((sum, position) => sum + dot(position, position) - dot(position, normal) ** 2, 0);
    const score = held * 1000 + spread;
    if (score > bestScore + 1e-6) {
      best = normal;
      bestScore = score;
    }
  }
  return best;
}

/** The normal of the plane through `axis` and each atom off it, in the atoms' order. */
function proposedNormals(axis: Vec3, positions: readonly Vec3[], onPlane: number): Vec3[] {
  const candidates: Vec3[] = [];
  for (const position of positions) {
    const across = sub(position, scale(axis, dot(position, axis)));
    if (norm(across) > onPlane) candidates.push(normalize(cross(axis, across)));
  }
  if (candidates.length === 0) candidates.push(perpendicularTo(axis));
  return candidates;
}

/**
 * The sweep: with angles about the axis taken modulo a half turn, an atom at distance ρ from the
 * axis lies within `onPlane` of the plane at angle φ when φ is within asin(onPlane / ρ) of the angle
 * of its own plane; atoms nearer the axis than `onPlane` lie on every plane. Counting the arcs that
 * cover each plane's angle is two binary searches in the sorted arc ends. The spread seen face-on
 * is the sum of squared distances less nᵀMn, M the sum of the positions' outer products.
 */
function bestPlaneBySweep(axis: Vec3, positions: readonly Vec3[], onPlane: number): Vec3 {
  const first = perpendicularTo(axis);
  const second = cross(axis, first);
  const candidates: { readonly normal: Vec3; readonly angle: number }[] = [];
  const starts: number[] = [];
  const ends: number[] = [];
  let onEveryPlane = 0;
  const moments = [0, 0, 0, 0, 0, 0];
  let squares = 0;
  const angleOf = (vector: Vec3): number => {
    const angle = Math.atan2(dot(vector, second), dot(vector, first));
    return angle < 0 ? angle + Math.PI : angle >= Math.PI ? angle - Math.PI : angle;
  };
  for (const position of positions) {
    const [x, y, z] = position;
    moments[0] += x * x;
    moments[1] += x * y;
    moments[2] += x * z;
    moments[3] += y * y;
    moments[4] += y * z;
    moments[5] += z * z;
    squares += dot(position, position);
    const across = sub(position, scale(axis, dot(position, axis)));
    const distance = norm(across);
    if (distance <= onPlane) {
      onEveryPlane += 1;
      continue;
    }
    const normal = normalize(cross(axis, across));
    const angle = angleOf(normal);
    candidates.push({ normal, angle });
    const halfWidth = Math.asin(onPlane / distance);
    const start = angle - halfWidth;
    const end = angle + halfWidth;
    // An arc that runs past either end of the half turn continues from the other end.
    if (start < 0) {
      starts.push(0, start + Math.PI);
      ends.push(end, Math.PI);
    } else if (end > Math.PI) {
      starts.push(start, 0);
      ends.push(Math.PI, end - Math.PI);
    } else {
      starts.push(start);
      ends.push(end);
    }
  }
  if (candidates.length === 0) return perpendicularTo(axis);
  const sortedStarts = Float64Array.from(starts).sort();
  const sortedEnds = Float64Array.from(ends).sort();
  let best = candidates[0].normal;
  let bestScore = -Infinity;
  for (const { normal, angle } of candidates) {
    // Arcs open before the angle, less those already closed at it.
    const held = onEveryPlane + countBelow(sortedStarts, angle) - countAtOrBelow(sortedEnds, angle);
    const [x, y, z] = normal;
    const along =
      x * x * moments[0] + y * y * moments[3] + z * z * moments[5] + 2 * (x * y * moments[1] + x * z * moments[2] + y * z * moments[4]);
    const score = held * 1000 + squares - along;
    if (score > bestScore + 1e-6) {
      best = normal;
      bestScore = score;
    }
  }
  return best;
}

/** How many of the sorted `values` are below `limit`. */
function countBelow(values: Float64Array, limit: number): number {
  let low = 0;
  let high = values.length;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if (values[middle] < limit) low = middle + 1;
    else high = middle;
  }
  return low;
}

/** How many of the sorted `values` are at or below `limit`. */
function countAtOrBelow(values: Float64Array, limit: number): number {
  let low = 0;
  let high = values.length;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if (values[middle] <= limit) low = middle + 1;
    else high = middle;
  }
  return low;
}

function perpendicularTo(vector: Vec3): Vec3 {
  const helper: Vec3 = Math.abs(vector[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  return normalize(cross(vector, helper));
}
