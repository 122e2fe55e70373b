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
export function findBridges(atomCount: number, bonds: readonly BondEnds[]): Uint8Array {
  const bondCount = bonds.length;
  const offsets = new Int32Array(atomCount + 1);
  for (let b = 0; b < bondCount; b++) {
    offsets[bonds[b].from + 1]++;
    offsets[bonds[b].to + 1]++;
  }
  for (let a = 0; a < atomCount; a++) offsets[a + 1] += offsets[a];
  const neighbours = new Int32Array(2 * bondCount);
  const viaBond = new Int32Array(2 * bondCount);
  const fill = offsets.slice(0, atomCount);
  for (let b = 0; b < bondCount; b++) {
    const { from, to } = bonds[b];
    neighbours[fill[from]] = to;
    viaBond[fill[from]++] = b;
    neighbours[fill[to]] = from;
    viaBond[fill[to]++] = b;
  }

  const bridge = new Uint8Array(bondCount);
  const discovered = new Int32Array(atomCount); // 0 = not yet visited
  const low = new Int32Array(atomCount);
  const parentBond = new Int32Array(atomCount);
  const nextEdge = new Int32Array(atomCount);
  const stack = new Int32Array(atomCount);
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
