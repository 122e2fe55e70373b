/**
 * Rings of a molecular graph, as far as the coordinate builder needs them: the smallest ring
 * through each ring bond, and which rings are benzene-like (every ring atom trigonal planar with
 * one double bond inside the ring system), whose bonds are drawn with one averaged length.
 *
 * Bounded work: bonds on no ring are found first in linear time, ring systems (atoms joined by
 * ring bonds) are measured, and the smallest rings are searched only inside ring systems no
 * larger than {@link MAX_RING_SYSTEM_ATOMS}, each search staying inside its own system. A larger
 * ring system is reported, not searched: the coordinate builder then declines the model.
 */
import { findBridges } from "../smiles/bridges";
import type { MolecularGraph } from "../types";
import type { AtomSites } from "./atomSites";

/**
 * Most atoms in one ring system that the 3D model closes. Fullerene C60, steroids, porphyrins and
 * every drug-sized ring system fit; closing a larger one would cost seconds and show little.
 */
export const MAX_RING_SYSTEM_ATOMS = 64;

export interface RingPerception {
  /** Smallest ring through each ring bond, keyed by {@link bondKey}; atoms in ring order from the lower index. */
  readonly smallestRingByBond: ReadonlyMap<string, readonly number[]>;
  /** Bonds of benzene-like rings, keyed by {@link bondKey}. */
  readonly aromaticBonds: ReadonlySet<string>;
  /** Atoms in the largest ring system; above {@link MAX_RING_SYSTEM_ATOMS} its rings were not searched. */
  readonly largestRingSystem: number;
}

/** Order-free key of the bond between two atoms. */
export function bondKey(first: number, second: number): string {
  return first < second ? `${first}-${second}` : `${second}-${first}`;
}

/** Neighbour lists of every atom. */
export function adjacencyOf(graph: MolecularGraph): number[][] {
  const adjacency = graph.atoms.map(() => [] as number[]);
  for (const { from, to } of graph.bonds) {
    if (from === to || !adjacency[from] || !adjacency[to]) continue;
    adjacency[from].push(to);
    adjacency[to].push(from);
  }
  return adjacency;
}

/** Finds ring bonds and benzene-like rings. */
export function perceiveRings(graph: MolecularGraph, sites: readonly AtomSites[]): RingPerception {
  const adjacency = adjacencyOf(graph);
  const bridge = findBridges(graph.atoms.length, graph.bonds);
  const largestRingSystem = largestRingSystemSize(graph, bridge);
  const smallestRingByBond = new Map<string, readonly number[]>();
  if (largestRingSystem > MAX_RING_SYSTEM_ATOMS) return { smallestRingByBond, aromaticBonds: new Set(), largestRingSystem };
  // Searches follow ring bonds only, so each stays inside one small ring system.
  const ringAdjacency = graph.atoms.map(() => [] as number[]);
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] === 1 || from === to) return;
    ringAdjacency[from].push(to);
    ringAdjacency[to].push(from);
  });
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] === 1 || from === to) return;
    const ring = shortestPathAvoidingBond(ringAdjacency, from, to);
    if (ring) smallestRingByBond.set(bondKey(from, to), from < to ? ring : [...ring].reverse());
  });

  const orderOf = new Map(graph.bonds.map((bond) => [bondKey(bond.from, bond.to), bond.order]));
  const ringAtoms = new Set([...smallestRingByBond.values()].flat());
  // Each atom's double bond must stay inside the ring system, or the ring is a quinone-like one.
  const hasRingDoubleBond = (atom: number) =>
    adjacency[atom].filter((other) => ringAtoms.has(other) && orderOf.get(bondKey(atom, other)) === 2).length === 1 &&
    adjacency[atom].every((other) => orderOf.get(bondKey(atom, other))! <= 2);

  const aromaticBonds = new Set<string>();
  for (const ring of smallestRingByBond.values()) {
    const conjugated = ring.every((atom) => sites[atom].trigonalPlanar && hasRingDoubleBond(atom));
    if (!conjugated) continue;
    ring.forEach((atom, k) => aromaticBonds.add(bondKey(atom, ring[(k + 1) % ring.length])));
  }
  return { smallestRingByBond, aromaticBonds, largestRingSystem };
}

/** Atoms in the largest set joined by ring bonds (bonds that are not bridges); 0 without rings. */
function largestRingSystemSize(graph: MolecularGraph, bridge: Uint8Array): number {
  const root = Int32Array.from(graph.atoms, (_, atom) => atom);
  const find = (atom: number): number => {
    while (root[atom] !== atom) atom = root[atom] = root[root[atom]];
    return atom;
  };
  let anyRing = false;
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] === 1 || from === to) return;
    anyRing = true;
    root[find(from)] = find(to);
  });
  if (!anyRing) return 0;
  const systemOf = new Map<number, number>();
  let largest = 0;
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] === 1) return;
    for (const atom of [from, to]) systemOf.set(atom, find(atom));
  });
  const counts = new Map<number, number>();
  for (const system of systemOf.values()) {
    const count = (counts.get(system) ?? 0) + 1;
    counts.set(system, count);
    largest = Math.max(largest, count);
  }
  return largest;
}

/**
 * The ring neighbours around the bond `parent`–`child` on its smallest ring: the parent's other
 * ring neighbour and the child's other ring neighbour. Undefined for a bond on no ring.
 */
export function ringNeighboursAcross(
  rings: RingPerception,
  parent: number,
  child: number,
): { readonly beforeParent: number; readonly afterChild: number } | undefined {
  const ring = rings.smallestRingByBond.get(bondKey(parent, child));
  if (!ring) return undefined;
  // The ring runs from one end of the bond round to the other, so the two ends sit at its ends.
  const fromParent = ring[0] === parent ? ring : [...ring].reverse();
  return { beforeParent: fromParent[1], afterChild: fromParent[fromParent.length - 2] };
}

/** Breadth-first path from `start` to `goal` that does not use their direct bond; undefined for a bridge. */
function shortestPathAvoidingBond(adjacency: readonly number[][], start: number, goal: number): number[] | undefined {
  const previous = new Map<number, number>([[start, -1]]);
  const queue = [start];
  for (let head = 0; head < queue.length; head++) {
    const atom = queue[head];
    for (const next of adjacency[atom]) {
      if (atom === start && next === goal) continue;
      if (previous.has(next)) continue;
      previous.set(next, atom);
      if (next === goal) {
        const path = [goal];
        for (let at = atom; at !== -1; at = previous.get(at)!) path.push(at);
        return path.reverse();
      }
      queue.push(next);
    }
  }
  return undefined;
}
