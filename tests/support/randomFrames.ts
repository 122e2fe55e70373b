/** Seeded random rigid motions and noise for coordinate tests, so failures can be replayed. */
import type { Vec3 } from "../../shared/src/chemistry/geometry/vectors";
import type { Atom } from "./moleculeBuilders";

export { seededRandom } from "./seededRandom";

/** A uniformly random rotation matrix (from a random unit quaternion). */
export function randomRotation(random: () => number): readonly [Vec3, Vec3, Vec3] {
  const [u1, u2, u3] = [random(), random(), random()];
  const w = Math.sqrt(1 - u1) * Math.sin(2 * Math.PI * u2);
  const x = Math.sqrt(1 - u1) * Math.cos(2 * Math.PI * u2);
  const y = Math.sqrt(u1) * Math.sin(2 * Math.PI * u3);
  const z = Math.sqrt(u1) * Math.cos(2 * Math.PI * u3);
  return [
    [1 - 2 * (y * y + z * z), 2 * (x * y - z * w), 2 * (x * z + y * w)],
    [2 * (x * y + z * w), 1 - 2 * (x * x + z * z), 2 * (y * z - x * w)],
    [2 * (x * z - y * w), 2 * (y * z + x * w), 1 - 2 * (x * x + y * y)],
  ];
}

export function applyMatrix(matrix: readonly [Vec3, Vec3, Vec3], [x, y, z]: Vec3): Vec3 {
  return [
    matrix[0][0] * x + matrix[0][1] * y + matrix[0][2] * z,
    matrix[1][0] * x + matrix[1][1] * y + matrix[1][2] * z,
    matrix[2][0] * x + matrix[2][1] * y + matrix[2][2] * z,
  ];
}

/** Turns the molecule by a random rotation and moves it by up to ±`shift` Å on each axis. */
export function randomlyPlaced(atoms: readonly Atom[], random: () => number, shift = 10): Atom[] {
  const rotation = randomRotation(random);
  const offset: Vec3 = [(2 * random() - 1) * shift, (2 * random() - 1) * shift, (2 * random() - 1) * shift];
  return atoms.map(({ element, position }) => {
    const [x, y, z] = applyMatrix(rotation, position);
    return { element, position: [x + offset[0], y + offset[1], z + offset[2]] };
  });
}

/** Adds uniform noise of at most `amplitude` Å to every coordinate. */
export function jiggled(atoms: readonly Atom[], random: () => number, amplitude: number): Atom[] {
  return atoms.map(({ element, position }) => ({
    element,
    position: position.map((value) => value + (2 * random() - 1) * amplitude) as unknown as Vec3,
  }));
}
