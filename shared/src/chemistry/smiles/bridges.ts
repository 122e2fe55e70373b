/** Minimal view of a bond for graph walks: the indices of its two atoms. */
export interface BondEnds {
  readonly from: number;
  readonly to: number;
}

/**
 * Marks the bonds that lie on no ring (bridges of the graph), in time linear in atoms plus bonds.
 * Returns one flag per bond, 1 for a bridge. The depth-first walk keeps its own stack so that long
 * chains cannot overflow the call stack.
 */
// Scratch space reused between calls: allocating typed arrays per molecule costs more than the
// walk itself for drug-sized inputs. Safe because the walk never calls out while using them.
let scratch = new Int32Array(0);

function scratchFor(atomCount: number, bondCount: number): Int32Array {
  // Seven arrays per atom (one of them one longer) and four per bond, as taken below.
  const needed = 7 * atomCount + 1 + 4 * bondCount;
  if (scratch.length < needed) scratch = new Int32Array(Math.max(needed, 2 * scratch.length));
  return scratch;
}

/**
 * Marks the bonds that lie on no ring (bridges of the graph), in time linear in atoms plus bonds.
 * Returns one flag per bond, 1 for a bridge. The depth-first walk keeps its own stack so that long
 * chains cannot overflow the call stack.
 */
export function findBridges(atomCount: number, bonds: readonly BondEnds[]): Uint8Array {
  const bondCount = bonds.length;
  const buffer = scratchFor(atomCount, bondCount);
  let used = 0;
  const take = (size: number): Int32Array => buffer.subarray(used, (used += size));
  const offsets = take(atomCount + 1).fill(0);
  const fill = take(atomCount);
  const discovered = take(atomCount).fill(0); // 0 = not yet visited
  const low = take(atomCount);
  const parentBond = take(atomCount);
  const nextEdge = take(atomCount);
  const stack = take(atomCount);
  const neighbours = take(2 * bondCount);
  const viaBond = take(2 * bondCount);

  for (let b = 0; b < bondCount; b++) {
    offsets[bonds[b].from + 1]++;
    offsets[bonds[b].to + 1]++;
  }
  for (let a = 0; a < atomCount; a++) {
    offsets[a + 1] += offsets[a];
    fill[a] = offsets[a];
  }
  for (let b = 0; b < bondCount; b++) {
    const { from, to } = bonds[b];
    neighbours[fill[from]] = to;
    viaBond[fill[from]++] = b;
    neighbours[fill[to]] = from;
    viaBond[fill[to]++] = b;
  }

  const bridge = new Uint8Array(bondCount);
  let time = 0;
  for (let root = 0; root < atomCount; root++) {
    if (discovered[root] !== 0) continue;
    let depth = 0;
    stack[depth++] = root;
    parentBond[root] = -1;
    discovered[root] = low[root] = ++time;
    nextEdge[root] = offsets[root];
    while (depth > 0) {
      const atom = stack[depth - 1];
      if (nextEdge[atom] < offsets[atom + 1]) {
        const edge = nextEdge[atom]++;
        const neighbour = neighbours[edge];
        if (viaBond[edge] === parentBond[atom]) continue;
        if (discovered[neighbour] === 0) {
          parentBond[neighbour] = viaBond[edge];
          discovered[neighbour] = low[neighbour] = ++time;
          nextEdge[neighbour] = offsets[neighbour];
          stack[depth++] = neighbour;
        } else if (discovered[neighbour] < low[atom]) {
          low[atom] = discovered[neighbour];
        }
      } else {
        depth--;
        if (depth > 0) {
          const parent = stack[depth - 1];
          if (low[atom] < low[parent]) low[parent] = low[atom];
          if (low[atom] > discovered[parent]) bridge[parentBond[atom]] = 1;
        }
      }
    }
  }
  return bridge;
}
