/**
 * Maximum matching in a general graph by augmenting paths with blossom contraction (Edmonds).
 * Aromatic systems hold odd rings (pyrrole, azulene), so a bipartite search is not enough.
 *
 * `offsets`/`neighbours` describe the graph in compressed form: the neighbours of vertex v are
 * `neighbours[offsets[v] .. offsets[v + 1])`. Returns `mate`, with -1 for unmatched vertices.
 */
export function maximumMatching(vertexCount: number, offsets: Int32Array, neighbours: Int32Array): Int32Array {
  const mate = new Int32Array(vertexCount).fill(-1);

  // A greedy start, taking the least-connected vertices first, leaves few augmentations to find.
  for (let pass = 1; pass <= 3; pass++) {
    for (let v = 0; v < vertexCount; v++) {
      if (mate[v] !== -1) continue;
      let free = 0;
      let choice = -1;
      for (let e = offsets[v]; e < offsets[v + 1]; e++) {
        if (mate[neighbours[e]] === -1) {
          free++;
          if (choice === -1) choice = neighbours[e];
        }
      }
      if (choice !== -1 && (free <= pass || pass === 3)) {
        mate[v] = choice;
        mate[choice] = v;
      }
    }
  }

  const parent = new Int32Array(vertexCount);
  const base = new Int32Array(vertexCount);
  const inQueue = new Uint8Array(vertexCount);
  const inBlossom = new Uint8Array(vertexCount);
  const onPath = new Uint8Array(vertexCount);
  const queue = new Int32Array(vertexCount);

  const lowestCommonAncestor = (a: number, b: number): number => {
    onPath.fill(0);
    for (;;) {
      a = base[a];
      onPath[a] = 1;
      if (mate[a] === -1) break;
      a = parent[mate[a]];
    }
    for (;;) {
      b = base[b];
      if (onPath[b] === 1) return b;
      b = parent[mate[b]];
    }
  };

  const markPath = (v: number, blossomBase: number, child: number): void => {
    while (base[v] !== blossomBase) {
      inBlossom[base[v]] = 1;
      inBlossom[base[mate[v]]] = 1;
      parent[v] = child;
      child = mate[v];
      v = parent[mate[v]];
    }
  };

  const findAugmentingPath = (root: number): number => {
    parent.fill(-1);
    inQueue.fill(0);
    for (let v = 0; v < vertexCount; v++) base[v] = v;
    let head = 0;
    let tail = 0;
    queue[tail++] = root;
    inQueue[root] = 1;
    while (head < tail) {
      const v = queue[head++];
      for (let e = offsets[v]; e < offsets[v + 1]; e++) {
        const to = neighbours[e];
        if (base[v] === base[to] || mate[v] === to) continue;
        if (to === root || (mate[to] !== -1 && parent[mate[to]] !== -1)) {
          const blossomBase = lowestCommonAncestor(v, to);
          inBlossom.fill(0);
          markPath(v, blossomBase, to);
          markPath(to, blossomBase, v);
          for (let u = 0; u < vertexCount; u++) {
            if (inBlossom[base[u]] === 1) {
              base[u] = blossomBase;
              if (inQueue[u] === 0) {
                inQueue[u] = 1;
                queue[tail++] = u;
              }
            }
          }
        } else if (parent[to] === -1) {
          parent[to] = v;
          if (mate[to] === -1) return to;
          inQueue[mate[to]] = 1;
          queue[tail++] = mate[to];
        }
      }
    }
    return -1;
  };

  for (let root = 0; root < vertexCount; root++) {
    if (mate[root] !== -1 || offsets[root] === offsets[root + 1]) continue;
    let end = findAugmentingPath(root);
    while (end !== -1) {
      const previous = parent[end];
      const previousMate = mate[previous];
      mate[end] = previous;
      mate[previous] = end;
      end = previousMate;
    }
  }
  return mate;
}
