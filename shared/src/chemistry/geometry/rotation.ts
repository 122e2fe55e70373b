/**
 * Proper rotations as 3×3 matrices (rows), for turning a centre's local VSEPR frame into the
 * molecule's frame.
 */
import { add, cross, dot, norm, normalize, scale, sub, type Vec3 } from "./vectors";

/** A rotation matrix given row by row; applying it is `matrix · vector`. */
export type Rotation = readonly [Vec3, Vec3, Vec3];

/** The rotation that changes nothing. */
export const IDENTITY_ROTATION: Rotation = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

/** rotation · vector. */
export function rotate(rotation: Rotation, vector: Vec3): Vec3 {
  return [dot(rotation[0], vector), dot(rotation[1], vector), dot(rotation[2], vector)];
}

/** The rotation `first` followed by `second` (second · first). */
export function composeRotations(second: Rotation, first: Rotation): Rotation {
  const column = (k: number): Vec3 => [first[0][k], first[1][k], first[2][k]];
  const columns = [column(0), column(1), column(2)].map((c) => rotate(second, c));
  return [
    [columns[0][0], columns[1][0], columns[2][0]],
    [columns[0][1], columns[1][1], columns[2][1]],
    [columns[0][2], columns[1][2], columns[2][2]],
  ];
}

/** Right-handed rotation by `radians` about the unit vector `axis` (Rodrigues' formula). */
export function rotationAboutAxis(axis: Vec3, radians: number): Rotation {
  const [x, y, z] = normalize(axis);
  const c = Math.cos(radians);
  const s = Math.sin(radians);
  const t = 1 - c;
  return [
    [t * x * x + c, t * x * y - s * z, t * x * z + s * y],
    [t * x * y + s * z, t * y * y + c, t * y * z - s * x],
    [t * x * z - s * y, t * y * z + s * x, t * z * z + c],
  ];
}

/** Any unit vector perpendicular to `vector` (which must not be zero). */
export function perpendicularTo(vector: Vec3): Vec3 {
  const [x, y, z] = vector.map(Math.abs);
  // Cross with the coordinate axis least parallel to the vector, so the result is well conditioned.
  const helper: Vec3 = x <= y && x <= z ? [1, 0, 0] : y <= z ? [0, 1, 0] : [0, 0, 1];
  return normalize(cross(vector, helper));
}

/**
 * The smallest rotation taking the direction `from` onto the direction `to`. Opposite
 * directions are turned half a turn about an axis perpendicular to both.
 */
export function rotationAligning(from: Vec3, to: Vec3): Rotation {
  const a = normalize(from);
  const b = normalize(to);
  const axis = cross(a, b);
  const sine = norm(axis);
  const cosine = dot(a, b);
  if (sine < 1e-12) return cosine > 0 ? IDENTITY_ROTATION : rotationAboutAxis(perpendicularTo(a), Math.PI);
  return rotationAboutAxis(axis, Math.atan2(sine, cosine));
}

/**
 * The rotation taking `localFirst` onto `worldFirst` exactly and turning `localSecond` as close
 * to `worldSecond` as the first constraint allows. Undefined when either pair is (anti)parallel,
 * since the turn about the first direction is then not fixed.
 */
export function rotationFromTwoDirections(localFirst: Vec3, localSecond: Vec3, worldFirst: Vec3, worldSecond: Vec3): Rotation | undefined {
  const align = rotationAligning(localFirst, worldFirst);
  const axis = normalize(worldFirst);
  const moved = rotate(align, localSecond);
  const movedPerpendicular = sub(moved, scale(axis, dot(moved, axis)));
  const targetPerpendicular = sub(worldSecond, scale(axis, dot(worldSecond, axis)));
  if (norm(movedPerpendicular) < 1e-9 || norm(targetPerpendicular) < 1e-9) return undefined;
  const turn = signedAngleAbout(axis, movedPerpendicular, targetPerpendicular);
  return composeRotations(rotationAboutAxis(axis, turn), align);
}

/** Angle in radians, -π..π, that turns `from` onto `to` about `axis` (both taken perpendicular to it). */
export function signedAngleAbout(axis: Vec3, from: Vec3, to: Vec3): number {
  return Math.atan2(dot(axis, cross(from, to)), dot(from, to));
}

/** `point` moved by `offset` along the unit direction. */
export function along(point: Vec3, direction: Vec3, length: number): Vec3 {
  return add(point, scale(direction, length));
}
