/**
 * Bond orders the coordinate builder draws with. A Lewis graph holds one resonance form, so
 * SO4^2- has two S=O and two S-O, and O3 one of each; drawn as written they would make the ion
 * lopsided. Two kinds of bond are averaged instead: the bonds from one atom to its terminal
 * neighbours of one element (SO4^2-, NO3-, O3, carboxylates), and the ring bonds of benzene-like
 * rings (1.5).
 */
import type { MolecularGraph } from "../types";
import { AROMATIC_BOND_ORDER } from "./bondLength";
import { adjacencyOf, bondKey } from "./ringPerception";

/** Order to draw each bond with, keyed by `bondKey`. */
export function resonanceBondOrders(graph: MolecularGraph, aromaticBonds: ReadonlySet<string>): Map<string, number> {
  const orders = new Map(graph.bonds.map((bond) => [bondKey(bond.from, bond.to), bond.order]));
  const adjacency = adjacencyOf(graph);
  adjacency.forEach((neighbours, centre) => {
    const terminalByElement = new Map<string, number[]>();
    for (const neighbour of neighbours) {
      if (adjacency[neighbour].length !== 1) continue;
      const symbol = graph.atoms[neighbour].symbol;
      terminalByElement.set(symbol, [...(terminalByElement.get(symbol) ?? []), neighbour]);
    }
    for (const group of terminalByElement.values()) {
      const keys = group.map((neighbour) => bondKey(centre, neighbour));
      const mean = keys.reduce((sum, key) => sum + orders.get(key)!, 0) / keys.length;
      for (const key of keys) orders.set(key, mean);
    }
  });
  for (const key of aromaticBonds) orders.set(key, AROMATIC_BOND_ORDER);
  return orders;
}
