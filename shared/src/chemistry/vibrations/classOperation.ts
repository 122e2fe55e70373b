/**
 * The symmetry operation that stands for one class of a character table, as an axis, an angle
 * and whether a reflection follows, in the table's standard frame (z along the principal axis).
 * Its matrix, trace and name all follow from these three facts.
 */
import type { Matrix3 } from "../geometry/symmetricEigen";
import { rotationAboutAxis } from "../geometry/rotation";
import { normalize, type Vec3 } from "../geometry/vectors";
import { reflectionMatrix } from "../symmetry/operations";

/** A rotation by `turn` of a full turn about `axis`, followed by the reflection through the plane normal to it when not `proper`. */
export interface ClassOperation {
  /** False for mirror planes, the inversion centre and improper rotations S_n. */
  readonly proper: boolean;
  /** Rotation angle as a fraction of a full turn, in [0, 1): 0 for E and σ, 1/2 for C2 and i. */
  readonly turn: number;
  /** Unit rotation axis (for a mirror, the plane's normal) in the standard frame. */
  readonly axis: Vec3;
}

export const Z_AXIS: Vec3 = [0, 0, 1];
export const X_AXIS: Vec3 = [1, 0, 0];

export const IDENTITY_OPERATION: ClassOperation = { proper: true, turn: 0, axis: Z_AXIS };
export const INVERSION_OPERATION: ClassOperation = { proper: false, turn: 0.5, axis: Z_AXIS };
export const HORIZONTAL_MIRROR: ClassOperation = { proper: false, turn: 0, axis: Z_AXIS };

/** A proper or improper rotation; the axis is normalised and the turn brought into [0, 1). */
export function operation(proper: boolean, turn: number, axis: Vec3): ClassOperation {
  return { proper, turn: wrapTurn(turn), axis: normalize(axis) };
}

/** Largest n of an operation C_n^k or S_n^k the tables name. */
const MAX_TURN_DENOMINATOR = 60;

/** Brings a turn into [0, 1) and onto the nearest k/n, since matrices read back carry rounding. */
function wrapTurn(turn: number): number {
  const wrapped = turn - Math.floor(turn);
  for (let denominator = 1; denominator <= MAX_TURN_DENOMINATOR; denominator++) {
    const numerator = Math.round(wrapped * denominator);
    if (Math.abs(numerator / denominator - wrapped) < 1e-6) return numerator === denominator ? 0 : numerator / denominator;
  }
  return wrapped;
}

/** The 3×3 matrix of the operation (rows), acting on column vectors. */
export function operationMatrix(op: ClassOperation): Matrix3 {
  const rotation = rotationAboutAxis(op.axis, 2 * Math.PI * op.turn);
  if (op.proper) return rotation;
  return multiplyMatrices(reflectionMatrix(op.axis), rotation);
}

/** The trace of the operation's matrix: the character of x, y, z together. */
export function operationTrace(op: ClassOperation): number {
  return (op.proper ? 1 : -1) + 2 * Math.cos(2 * Math.PI * op.turn);
}

/** The product a·b (b first), worked out as matrices and read back as an axis, angle and kind. */
export function composeOperations(a: ClassOperation, b: ClassOperation): ClassOperation {
  return operationFromMatrix(multiplyMatrices(operationMatrix(a), operationMatrix(b)));
}

export function multiplyMatrices(a: Matrix3, b: Matrix3): Matrix3 {
  const entry = (i: number, j: number) => a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j];
  return [
    [entry(0, 0), entry(0, 1), entry(0, 2)],
    [entry(1, 0), entry(1, 1), entry(1, 2)],
    [entry(2, 0), entry(2, 1), entry(2, 2)],
  ];
}

/**
 * Reads an orthogonal matrix back as an operation. An improper matrix is −R for a proper R, and
 * −R(φ) about a is the improper rotation by φ + ½ turn about a.
 */
export function operationFromMatrix(matrix: Matrix3): ClassOperation {
  const det = determinant(matrix);
  const proper = det > 0;
  const rotation: Matrix3 = proper ? matrix : [negate(matrix[0]), negate(matrix[1]), negate(matrix[2])];
  const trace = rotation[0][0] + rotation[1][1] + rotation[2][2];
  const angle = Math.acos(Math.max(-1, Math.min(1, (trace - 1) / 2)));
  const axis = rotationAxis(rotation, angle);
  const turn = angle / (2 * Math.PI) + (proper ? 0 : 0.5);
  // One sign for every axis (z first, then x, then y), so that names do not depend on it:
  // a turn t about −a is the turn 1 − t about a, for rotations and improper rotations alike.
  return pointsForward(axis) ? operation(proper, turn, axis) : operation(proper, 1 - turn, negate(axis));
}

function pointsForward([x, y, z]: Vec3): boolean {
  const length = Math.hypot(x, y, z);
  const small = 1e-9 * length;
  if (Math.abs(z) > small) return z > 0;
  if (Math.abs(x) > small) return x > 0;
  return y >= 0;
}

function negate(row: Vec3): Vec3 {
  return [-row[0], -row[1], -row[2]];
}

function determinant(m: Matrix3): number {
  return (
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0])
  );
}

/** The axis of a proper rotation, signed so that the rotation is right-handed by `angle` (0 ≤ angle ≤ π). */
function rotationAxis(rotation: Matrix3, angle: number): Vec3 {
  const antisymmetric: Vec3 = [rotation[2][1] - rotation[1][2], rotation[0][2] - rotation[2][0], rotation[1][0] - rotation[0][1]];
  const length = Math.hypot(...antisymmetric);
  if (length > 1e-6) return antisymmetric;
  if (angle < 0.5) return Z_AXIS;
  // A half turn: R = 2aaᵀ − 1, so the largest column of R + 1 points along a.
  const columns = [0, 1, 2].map((j): Vec3 => [
    rotation[0][j] + (j === 0 ? 1 : 0),
    rotation[1][j] + (j === 1 ? 1 : 0),
    rotation[2][j] + (j === 2 ? 1 : 0),
  ]);
  return columns.reduce((best, column) => (Math.hypot(...column) > Math.hypot(...best) ? column : best));
}

const SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

function superscript(value: number): string {
  return value === 1
    ? ""
    : String(value)
        .split("")
        .map((digit) => SUPERSCRIPTS[Number(digit)])
        .join("");
}

/** The turn as a fraction p/q in lowest terms, for tables up to a few dozen operations per axis. */
function turnFraction(turn: number): { readonly numerator: number; readonly denominator: number } {
  for (let denominator = 1; denominator <= MAX_TURN_DENOMINATOR; denominator++) {
    const numerator = Math.round(turn * denominator);
    if (Math.abs(numerator / denominator - turn) < 1e-9) return { numerator, denominator };
  }
  return { numerator: 1, denominator: 1 };
}

/**
 * The usual Schoenflies name of an operation: E, C3, C3², i, σ, S4, S6⁵. A class that holds an
 * operation and its inverse is named by the lower power, as tables print it.
 */
export function operationName(op: ClassOperation, withInverse: boolean): string {
  const { numerator, denominator } = turnFraction(op.turn);
  if (op.proper) {
    if (numerator === 0) return "E";
    const power = withInverse ? Math.min(numerator, denominator - numerator) : numerator;
    return `C${denominator}${superscript(power)}`;
  }
  if (numerator === 0) return "σ";
  if (denominator === 2) return "i";
  // S_q^p with p odd is σh·C_q^p; an even p is the same operation as S_q^(p+q).
  const candidates = withInverse
    ? [numerator, denominator - numerator, numerator + denominator, 2 * denominator - numerator]
    : [numerator, numerator + denominator];
  const power = Math.min(...candidates.filter((value) => value % 2 === 1));
  return `S${denominator}${superscript(power)}`;
}
