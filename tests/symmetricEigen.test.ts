import { describe, expect, it } from "vitest";
import { symmetricEigen, type Matrix3 } from "../shared/src/chemistry/geometry/symmetricEigen";
import { dot, scale, type Vec3 } from "../shared/src/chemistry/geometry/vectors";

const times = (matrix: Matrix3, vector: Vec3): Vec3 => [dot(matrix[0], vector), dot(matrix[1], vector), dot(matrix[2], vector)];

describe("symmetricEigen", () => {
  // common practice: eigenvalues of small symmetric matrices worked by hand
  it.each([
    [
      "diagonal",
      [
        [3, 0, 0],
        [0, 1, 0],
        [0, 0, 2],
      ],
      [1, 2, 3],
    ],
    [
      "a 2×2 block",
      [
        [2, 1, 0],
        [1, 2, 0],
        [0, 0, 3],
      ],
      [1, 3, 3],
    ],
    [
      "all ones",
      [
        [1, 1, 1],
        [1, 1, 1],
        [1, 1, 1],
      ],
      [0, 0, 3],
    ],
    [
      "a tridiagonal",
      [
        [2, -1, 0],
        [-1, 2, -1],
        [0, -1, 2],
      ],
      [2 - Math.SQRT2, 2, 2 + Math.SQRT2],
    ],
  ] as const)("%s", (_name, matrix, expectedValues) => {
    const { values, vectors } = symmetricEigen(matrix as unknown as Matrix3);
    values.forEach((value, k) => expect(value).toBeCloseTo(expectedValues[k], 10));
    vectors.forEach((vector, k) => {
      const image = times(matrix as unknown as Matrix3, vector);
      const expected = scale(vector, values[k]);
      image.forEach((component, axis) => expect(component).toBeCloseTo(expected[axis], 10));
      for (let other = k + 1; other < 3; other++) expect(dot(vector, vectors[other])).toBeCloseTo(0, 10);
      expect(dot(vector, vector)).toBeCloseTo(1, 10);
    });
  });
});
