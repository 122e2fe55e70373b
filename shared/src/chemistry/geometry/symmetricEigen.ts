/**
 * Eigenvalues and eigenvectors of a real symmetric 3×3 matrix by cyclic Jacobi rotations: a few
 * dozen multiplications, exact enough for inertia tensors and free of any dependency.
 */
import type { Vec3 } from "./vectors";

/** A symmetric 3×3 matrix given row by row. */
export type Matrix3 = readonly [Vec3, Vec3, Vec3];

/** Eigenvalues in ascending order, each with its unit eigenvector at the same index. */
export interface SymmetricEigenSystem {
  readonly values: readonly [number, number, number];
  readonly vectors: readonly [Vec3, Vec3, Vec3];
}

/** Diagonalises a symmetric 3×3 matrix; the eigenvectors are orthonormal. */
export function symmetricEigen(matrix: Matrix3): SymmetricEigenSystem {
  const a = matrix.map((row) => [...row]);
  // Columns of v collect the rotations, so they end up as the eigenvectors.
  const v = [
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  const scaleOfMatrix = Math.max(1e-300, ...a.flat().map(Math.abs));
  for (let sweep = 0; sweep < 50; sweep++) {
    const offDiagonal = Math.abs(a[0][1]) + Math.abs(a[0][2]) + Math.abs(a[1][2]);
    if (offDiagonal <= 1e-15 * scaleOfMatrix) break;
    for (const [p, q] of [
      [0, 1],
      [0, 2],
      [1, 2],
    ] as const) {
      if (a[p][q] === 0) continue;
      const theta = (a[q][q] - a[p][p]) / (2 * a[p][q]);
      const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
      const c = 1 / Math.sqrt(t * t + 1);
      const s = t * c;
      for (let k = 0; k < 3; k++) {
        const akp = a[k][p];
        const akq = a[k][q];
        a[k][p] = c * akp - s * akq;
        a[k][q] = s * akp + c * akq;
      }
      for (let k = 0; k < 3; k++) {
        const apk = a[p][k];
        const aqk = a[q][k];
        a[p][k] = c * apk - s * aqk;
        a[q][k] = s * apk + c * aqk;
      }
      for (let k = 0; k < 3; k++) {
        const vkp = v[k][p];
        const vkq = v[k][q];
        v[k][p] = c * vkp - s * vkq;
        v[k][q] = s * vkp + c * vkq;
      }
    }
  }
  const order = [0, 1, 2].sort((i, j) => a[i][i] - a[j][j]);
  const column = (j: number): Vec3 => [v[0][j], v[1][j], v[2][j]];
  return {
    values: [a[order[0]][order[0]], a[order[1]][order[1]], a[order[2]][order[2]]],
    vectors: [column(order[0]), column(order[1]), column(order[2])],
  };
}
