/**
 * Small 3D vector helpers as plain functions over readonly tuples. Lengths are in ångströms
 * wherever positions are meant, but nothing here cares about units.
 */

/** A point or direction in 3D space: x, y, z. */
export type Vec3 = readonly [number, number, number];

/** The zero vector. */
export const ORIGIN: Vec3 = Object.freeze([0, 0, 0]) as Vec3;

/** Sum a + b. */
export function add(a: Vec3, b: Vec3): Vec3 {
  return [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
}

/** Difference a - b. */
export function sub(a: Vec3, b: Vec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/** Vector scaled by a number. */
export function scale(a: Vec3, factor: number): Vec3 {
  return [a[0] * factor, a[1] * factor, a[2] * factor];
}

/** Dot product. */
export function dot(a: Vec3, b: Vec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** Cross product a × b (right-handed). */
export function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Euclidean length. */
export function norm(a: Vec3): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/** Distance between two points. */
export function distance(a: Vec3, b: Vec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

/**
 * Unit vector along `a`. The zero vector (or one with a non-finite length) has no direction,
 * so it comes back unchanged rather than as NaNs.
 */
export function normalize(a: Vec3): Vec3 {
  const length = norm(a);
  if (length === 0 || !Number.isFinite(length)) return a;
  return scale(a, 1 / length);
}

/**
 * Angle between two vectors in degrees, 0-180. NaN when either vector is zero, because the
 * angle is then undefined.
 */
export function angleDegrees(a: Vec3, b: Vec3): number {
  const lengths = norm(a) * norm(b);
  if (lengths === 0) return Number.NaN;
  // Clamp: rounding can push the cosine just past ±1 for (anti)parallel vectors.
  const cosine = Math.min(1, Math.max(-1, dot(a, b) / lengths));
  return (Math.acos(cosine) * 180) / Math.PI;
}
