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

const ringAtomSets = new WeakMap<MolecularGraph, Uint8Array>();

/** 1 for every atom that lies on some ring (it has a bond that is not a bridge). */
export function ringAtoms(graph: MolecularGraph): Uint8Array {
  const cached = ringAtomSets.get(graph);
  if (cached) return cached;
  const flags = new Uint8Array(graph.atoms.length);
  if (graphIndex(graph).mayHaveRings) {
    const bridges = findBridges(graph.atoms.length, graph.bonds);
    graph.bonds.forEach((bond, k) => {
      if (bridges[k] === 0) {
        flags[bond.from] = 1;
        flags[bond.to] = 1;
      }
    });
  }
  ringAtomSets.set(graph, flags);
  return flags;
}

// Kept on the graph itself under a private symbol (not enumerable, so never serialised): a
// WeakMap entry per graph costs the collector noticeably more when thousands of small species
// are analysed.
const INDEX = Symbol("graphIndex");
type Indexed = MolecularGraph & { [INDEX]?: GraphIndex };

export function graphIndex(graph: MolecularGraph): GraphIndex {
  const cached = (graph as Indexed)[INDEX];
  if (cached) return cached;
  const neighbours: Neighbour[][] = graph.atoms.map(() => []);
  const bondOrderSums = new Array<number>(graph.atoms.length).fill(0);
  for (const bond of graph.bonds) {
    neighbours[bond.from]?.push(neighbour(graph, bond.to, bond.order));
    neighbours[bond.to]?.push(neighbour(graph, bond.from, bond.order));
    bondOrderSums[bond.from] += bond.order;
    bondOrderSums[bond.to] += bond.order;
  }
  const index: GraphIndex = { neighbours, bondOrderSums, mayHaveRings: graph.bonds.length >= graph.atoms.length };
  if (Object.isExtensible(graph)) Object.defineProperty(graph, INDEX, { value: index, enumerable: false });
  return index;
}
