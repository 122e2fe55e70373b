/**
 * The smallest gap between balls drawn on the screen: for every pair, the distance between their
 * centres less their grown radii. The starting view asks this of some three hundred turned views,
 * so for large models the pairs are found through a grid of square cells instead of comparing
 * every atom with every other: only balls in the same or neighbouring cells can be closest, unless
 * every ball is far from every other, and then the cells are made larger until they show it.
 * `smallestScreenGapOfEveryPair` is the plain version it is tested against.
 */

/** Balls on the screen: centres `xs[i]`, `ys[i]`, drawing radii `radii[i]`, all grown by `growth`. */
export interface ScreenBalls {
  readonly xs: ArrayLike<number>;
  readonly ys: ArrayLike<number>;
  readonly radii: ArrayLike<number>;
  readonly growth: number;
}

/** Below this many balls, comparing every pair is as quick as building a grid. */
const GRID_FROM_BALLS = 48;

/**
 * The smallest gap between two balls, Infinity for fewer than two. Stops early once a gap is no
 * more than `toBeat` (that view has already lost) and returns it: the answer is then some gap at
 * or below `toBeat`, not necessarily the smallest.
 */
export function smallestScreenGap(balls: ScreenBalls, toBeat = -Infinity): number {
  const count = balls.xs.length;
  if (count < GRID_FROM_BALLS) return smallestScreenGapOfEveryPair(balls, toBeat);
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  let largestRadius = 0;
  for (let index = 0; index < count; index++) {
    minX = Math.min(minX, balls.xs[index]);
    maxX = Math.max(maxX, balls.xs[index]);
    minY = Math.min(minY, balls.ys[index]);
    maxY = Math.max(maxY, balls.ys[index]);
    largestRadius = Math.max(largestRadius, balls.radii[index]);
  }
  const extent = Math.max(maxX - minX, maxY - minY);
  // No pair's grown radii together reach further than this.
  const reach = 2 * balls.growth * largestRadius;
  if (!Number.isFinite(extent) || !Number.isFinite(reach)) return smallestScreenGapOfEveryPair(balls, toBeat);
  let cellSize = Math.max(2 * reach, 1e-6) + 0.5;
  for (;;) {
    const smallest = smallestInNeighbouringCells(balls, cellSize, minX, maxX, minY, toBeat);
    if (smallest <= toBeat) return smallest;
    // Balls in cells that are not neighbours are more than `cellSize` apart, so their gap is more
    // than `cellSize - reach`: a gap no larger than that is the smallest of all.
    if (smallest <= cellSize - reach || cellSize > extent) return smallest;
    cellSize *= 2;
  }
}

/** The plain version: every pair compared, in order, with the same early stop. */
export function smallestScreenGapOfEveryPair(balls: ScreenBalls, toBeat = -Infinity): number {
  const { xs, ys, radii, growth } = balls;
  let smallest = Infinity;
  for (let first = 0; first < xs.length; first++) {
    for (let second = first + 1; second < xs.length; second++) {
      smallest = Math.min(smallest, gapBetween(xs, ys, radii, growth, first, second));
      if (smallest <= toBeat) return smallest;
    }
  }
  return smallest;
}

function gapBetween(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  radii: ArrayLike<number>,
  growth: number,
  first: number,
  second: number,
): number {
  const apart = Math.hypot(xs[first] - xs[second], ys[first] - ys[second]);
  return apart - growth * (radii[first] + radii[second]);
}

/** The cells after a cell that are its neighbours, so each neighbouring pair of cells is visited once. */
const FORWARD_NEIGHBOURS: readonly (readonly [number, number])[] = [
  [1, 0],
  [-1, 1],
  [0, 1],
  [1, 1],
];

/** The smallest gap between balls in the same or neighbouring cells of side `cellSize`. */
function smallestInNeighbouringCells(
  balls: ScreenBalls,
  cellSize: number,
  minX: number,
  maxX: number,
  minY: number,
  toBeat: number,
): number {
  const { xs, ys, radii, growth } = balls;
  // A spare column either side, so a neighbour's column never wraps into another row.
  const columns = Math.floor((maxX - minX) / cellSize) + 3;
  const cellOf = (column: number, row: number): number => row * columns + column;
  const cells = new Map<number, number[]>();
  for (let index = 0; index < xs.length; index++) {
    const key = cellOf(Math.floor((xs[index] - minX) / cellSize) + 1, Math.floor((ys[index] - minY) / cellSize) + 1);
    const members = cells.get(key);
    if (members) members.push(index);
    else cells.set(key, [index]);
  }
  let smallest = Infinity;
  for (const [key, members] of cells) {
    for (let first = 0; first < members.length; first++) {
      for (let second = first + 1; second < members.length; second++) {
        smallest = Math.min(smallest, gapBetween(xs, ys, radii, growth, members[first], members[second]));
        if (smallest <= toBeat) return smallest;
      }
    }
    const column = key % columns;
    const row = (key - column) / columns;
    for (const [across, down] of FORWARD_NEIGHBOURS) {
      const others = cells.get(cellOf(column + across, row + down));
      if (!others) continue;
      for (const one of members) {
        for (const other of others) {
          smallest = Math.min(smallest, gapBetween(xs, ys, radii, growth, one, other));
          if (smallest <= toBeat) return smallest;
        }
      }
    }
  }
  return smallest;
}
