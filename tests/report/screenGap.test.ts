/**
 * The smallest gap between balls on the screen, found through a grid of cells, agrees with the
 * plain comparison of every pair on random geometries: crowded, sparse, strung along a line,
 * clustered far apart, with radii from none to large, with and without an early stop.
 */
import { describe, expect, it } from "vitest";
import { smallestScreenGap, smallestScreenGapOfEveryPair, type ScreenBalls } from "../../shared/src/report/screenGap";
import { seededRandom } from "../support/seededRandom";

type Layout = (random: () => number, count: number) => { x: number; y: number }[];

// common practice: the layouts a projected model takes (a blob, a long chain, far-apart pieces)
const LAYOUTS: Record<string, Layout> = {
  "crowded square": (random, count) => Array.from({ length: count }, () => ({ x: random() * 3, y: random() * 3 })),
  "sparse square": (random, count) => Array.from({ length: count }, () => ({ x: random() * 400, y: random() * 400 })),
  "zig-zag chain": (random, count) =>
    Array.from({ length: count }, (_, index) => ({ x: index * 1.26 + random() * 0.05, y: (index % 2) * 0.89 + random() * 0.05 })),
  "diagonal line": (random, count) => Array.from({ length: count }, (_, index) => ({ x: index * 0.7, y: index * 0.7 + random() })),
  "two far clusters": (random, count) =>
    Array.from({ length: count }, (_, index) => ({ x: (index % 2) * 1000 + random() * 5, y: random() * 5 - (index % 2) * 300 })),
  "negative and huge": (random, count) => Array.from({ length: count }, () => ({ x: -1e5 + random() * 50, y: 1e5 - random() * 50 })),
};

function balls(layout: Layout, seed: number, count: number, largestRadius: number): ScreenBalls {
  const random = seededRandom(seed);
  const points = layout(random, count);
  return {
    xs: Float64Array.from(points, (point) => point.x),
    ys: Float64Array.from(points, (point) => point.y),
    radii: points.map(() => random() * largestRadius),
    growth: 1.12,
  };
}

describe("smallest gap on the screen", () => {
  const cases = Object.keys(LAYOUTS).flatMap((name) =>
    [40, 120, 700].flatMap((count) => [0, 0.35, 3].map((radius) => [name, count, radius] as const)),
  );

  it.each(cases)("%s, %i balls, radii up to %f Å: the grid finds the plain answer", (name, count, radius) => {
    for (let seed = 1; seed <= 4; seed++) {
      const input = balls(LAYOUTS[name], seed * 31 + count, count, radius);
      expect(smallestScreenGap(input), `seed ${seed}`).toBe(smallestScreenGapOfEveryPair(input));
    }
  });

  it.each(Object.keys(LAYOUTS))("%s: an early stop gives up exactly when the plain version does", (name) => {
    const random = seededRandom(77);
    for (let trial = 0; trial < 40; trial++) {
      const input = balls(LAYOUTS[name], 1000 + trial, 150 + Math.floor(random() * 300), random() * 0.6);
      const exact = smallestScreenGapOfEveryPair(input);
      // Thresholds below, at and above the true smallest gap.
      for (const toBeat of [exact - 1, exact - 1e-9, exact, exact + 1e-9, exact + 0.5]) {
        const plain = smallestScreenGapOfEveryPair(input, toBeat);
        const grid = smallestScreenGap(input, toBeat);
        if (plain <= toBeat) expect(grid).toBeLessThanOrEqual(toBeat);
        else expect(grid).toBe(plain);
      }
    }
  });

  it("answers Infinity with fewer than two balls, as the plain version does", () => {
    for (const count of [0, 1]) {
      const input = { xs: new Float64Array(count), ys: new Float64Array(count), radii: Array<number>(count).fill(0.3), growth: 1.12 };
      expect(smallestScreenGap(input)).toBe(Infinity);
      expect(smallestScreenGapOfEveryPair(input)).toBe(Infinity);
    }
  });

  it("finds the closest pair of large balls even when they sit two cells apart", () => {
    // A row of small balls 10 Å apart, and far above it two large balls 15 Å apart: grown, the
    // large pair's gap (15 - 1.12 × 6 = 8.28 Å) is the smallest, though their centres are further
    // apart than any small pair's.
    const xs = [...Array.from({ length: 60 }, (_, index) => index * 10), 13, 28];
    const ys = [...Array<number>(60).fill(0), 1000, 1000];
    const radii = [...Array<number>(60).fill(0.05), 3, 3];
    const input = { xs, ys, radii, growth: 1.12 };
    expect(smallestScreenGap(input)).toBe(smallestScreenGapOfEveryPair(input));
    expect(smallestScreenGap(input)).toBeCloseTo(15 - 1.12 * 6, 12);
  });

  it("finds two balls that touch among many far apart", () => {
    const count = 500;
    const xs = Float64Array.from({ length: count }, (_, index) => index * 10);
    const ys = new Float64Array(count);
    // The last two overlap by 0.1 Å once grown.
    xs[count - 1] = xs[count - 2] + 0.5;
    const input = { xs, ys, radii: Array<number>(count).fill(0.25), growth: 1.2 };
    expect(smallestScreenGap(input)).toBeCloseTo(-0.1, 12);
  });
});
