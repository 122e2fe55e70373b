/**
 * Neighbour lists and bond-order sums of a molecular graph, built once per graph and shared by
 * every per-atom question (a centre's ligands, its ring, its pi neighbours), so analysing a
 * large molecule stays linear in its size.
 */
import { atomTraits } from "./lewis/electronBookkeeping";
import { findBridges } from "./smiles/bridges";
import type { MolecularGraph } from "./types";

/** A bonded neighbour, shaped so the VSEPR code can use it as a ligand without copying. */
export interface Neighbour {
  readonly atom: number;
  readonly order: number;
  readonly bondOrder: number;
  readonly symbol: string;
  readonly electronegativity: number;
}

export interface GraphIndex {
  readonly neighbours: readonly (readonly Neighbour[])[];
  readonly bondOrderSums: readonly number[];
  /** False for trees and forests: no ring anywhere, so ring searches can be skipped. */
  readonly mayHaveRings: boolean;
}

function neighbour(graph: MolecularGraph, atom: number, order: number): Neighbour {
  const symbol = graph.atoms[atom]?.symbol ?? "";
  const electronegativity = symbol ? atomTraits(symbol).electronegativity : 0;
  return { atom, order, bondOrder: order, symbol, electronegativity };
}

/** 1 for every atom that lies on some ring (it has a bond that is not a bridge). */
export function ringAtoms(graph: MolecularGraph): Uint8Array {
  const index = graphIndex(graph) as IndexEntry;
  if (index.ringFlags) return index.ringFlags;
  const flags = new Uint8Array(graph.atoms.length);
  if (index.mayHaveRings) {
    const bridges = findBridges(graph.atoms.length, graph.bonds);
    graph.bonds.forEach((bond, k) => {
      if (bridges[k] === 0) {
        flags[bond.from] = 1;
        flags[bond.to] = 1;
      }
    });
  }
  index.ringFlags = flags;
  return flags;
}

interface IndexEntry extends GraphIndex {
  ringFlags: Uint8Array | undefined;
}

// The index is wanted while one species is being analysed (and again while its 3D model is
// built), so the last few are kept here rather than on the graph: held by the graph, every
// memoised analysis would carry two neighbour records per bond for the rest of its life, which
// the collector has to copy and trace again and again.
const RECENT = 4;
const recentGraphs: (MolecularGraph | undefined)[] = new Array(RECENT).fill(undefined);
const recentIndexes: (IndexEntry | undefined)[] = new Array(RECENT).fill(undefined);
let nextSlot = 0;

export function graphIndex(graph: MolecularGraph): GraphIndex {
  for (let slot = 0; slot < RECENT; slot++) {
    if (recentGraphs[slot] === graph) return recentIndexes[slot]!;
  }
  const atomCount = graph.atoms.length;
  const neighbours: Neighbour[][] = new Array(atomCount);
  for (let atom = 0; atom < atomCount; atom++) neighbours[atom] = [];
  const bondOrderSums = new Array<number>(atomCount).fill(0);
  for (const bond of graph.bonds) {
    neighbours[bond.from]?.push(neighbour(graph, bond.to, bond.order));
    neighbours[bond.to]?.push(neighbour(graph, bond.from, bond.order));
    bondOrderSums[bond.from] += bond.order;
    bondOrderSums[bond.to] += bond.order;
  }
  const index: IndexEntry = {
    neighbours,
    bondOrderSums,
    mayHaveRings: graph.bonds.length >= atomCount,
    ringFlags: undefined,
  };
  recentGraphs[nextSlot] = graph;
  recentIndexes[nextSlot] = index;
  nextSlot = (nextSlot + 1) % RECENT;
  return index;
}
