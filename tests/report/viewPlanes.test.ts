/**
 * The view plane of a large model, chosen by a sweep round the axis, scores as well as the one the
 * plain check of every plane against every atom chooses, on random geometries: a blob, a flat
 * zig-zag chain, a helix and atoms gathered on a few planes through the axis.
 */
import { describe, expect, it } from "vitest";
import { dot, normalize, type Vec3 } from "../../shared/src/chemistry/geometry/vectors";
import { bestPlaneNormalOfEveryPair, bestPlaneNormalThrough } from "../../shared/src/report/viewPlanes";
import { seededRandom } from "../support/seededRandom";

const ON_PLANE = 0.12;

type Layout = (random: () => number, count: number) => Vec3[];

// common practice: shapes large models take (a globule, an extended chain, a helix, layers)
const LAYOUTS: Record<string, Layout> = {
  blob: (random, count) => Array.from({ length: count }, (): Vec3 => [random() * 20 - 10, random() * 20 - 10, random() * 20 - 10]),
  "flat zig-zag chain": (random, count) =>
    Array.from({ length: count }, (_, index): Vec3 => [index * 1.26 - count * 0.63, (index % 2) * 0.89 + random() * 0.02, random() * 0.02]),
  helix: (random, count) =>
    Array.from({ length: count }, (_, index): Vec3 => [
      3 * Math.cos(index * 1.7),
      3 * Math.sin(index * 1.7),
      index * 0.15 - count * 0.075 + random() * 0.01,
    ]),
  "a few planes through the axis": (random, count) =>
    Array.from({ length: count }, (_, index): Vec3 => {
      const angle = [0, 0.6, 1.9][index % 3] + (random() - 0.5) * 0.01;
      const radius = random() * 8;
      return [radius * Math.cos(angle), radius * Math.sin(angle), random() * 10 - 5];
    }),
};

/** The plain score of a plane: a thousand for each atom it holds, then the spread seen face-on. */
function score(normal: Vec3, positions: readonly Vec3[]): number {
  const held = positions.filter((position) => Math.abs(dot(position, normal)) < ON_PLANE).length;
  return held * 1000 + positions.reduce((sum, position) => sum + dot(position, position) - dot(position, normal) ** 2, 0);
}

describe("view plane through an axis", () => {
  const cases = Object.keys(LAYOUTS).flatMap((name) => [250, 900].map((count) => [name, count] as const));

  it.each(cases)("%s of %i atoms: the sweep's plane scores as the plain choice does", (name, count) => {
    const random = seededRandom(count + name.length);
    for (let trial = 0; trial < 6; trial++) {
      const positions = LAYOUTS[name](random, count);
      // The z axis, then random axes.
      const axis: Vec3 = trial === 0 ? [0, 0, 1] : normalize([random() - 0.5, random() - 0.5, random() - 0.5]);
      const plain = bestPlaneNormalOfEveryPair(axis, positions, ON_PLANE);
      const swept = bestPlaneNormalThrough(axis, positions, ON_PLANE);
      // Same atoms held; spreads equal but for rounding and the choice's 1e-6 tie margin.
      expect(score(swept, positions), `${name} trial ${trial}`).toBeCloseTo(score(plain, positions), 3);
      expect(Math.abs(dot(swept, axis))).toBeLessThan(1e-9);
    }
  });

  it("holds the atoms near the axis on every plane, as the plain check does", () => {
    // common practice: a long rod of atoms on the axis with a few atoms off it
    const random = seededRandom(5);
    const positions: Vec3[] = [
      ...Array.from({ length: 300 }, (_, index): Vec3 => [random() * 0.05, random() * 0.05, index * 0.5]),
      [4, 0, 1],
      [0, 4, 2],
      [3, 3, 3],
    ];
    const axis: Vec3 = [0, 0, 1];
    const swept = bestPlaneNormalThrough(axis, positions, ON_PLANE);
    expect(score(swept, positions)).toBeCloseTo(score(bestPlaneNormalOfEveryPair(axis, positions, ON_PLANE), positions), 3);
  });
});
