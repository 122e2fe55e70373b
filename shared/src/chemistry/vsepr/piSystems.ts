/**
 * Whether one lone pair of an atom joins a pi system and so takes no site of its own: lone-pair
 * atoms inside aromatic rings (pyrrole N, furan O, thiophene S), and three-bonded N next to a
 * carbon with a multiple bond or an aromatic carbon (amides, anilines), or next to a boron with
 * only six electrons, whose empty p orbital takes the pair into a B-N pi bond (aminoboranes,
 * H2N-BH2 planar like ethene). The O of an ester or acid keeps its bent, sp3-like angle.
 */
import { graphIndex } from "../graphIndex";
import type { MolecularGraph } from "../types";

export function lonePairJoinsPiSystem(graph: MolecularGraph, index: number): boolean {
  const atom = graph.atoms[index];
  if (atom.lonePairs === 0 || !(atom.symbol === "N" || atom.symbol === "O" || atom.symbol === "S")) return false;
  const { neighbours, bondOrderSums } = graphIndex(graph);
  const own = neighbours[index];
  if (own.length < 2) return false;
  if (own.some((n) => n.order > 1)) return false; // its own multiple bond already makes it sp2 or sp
  if (atom.aromatic) return true;
  if (atom.symbol !== "N" || own.length !== 3) return false;
  return own.some(({ atom: other }) => {
    const neighbour = graph.atoms[other];
    // three bonds' worth and no lone pair: a sextet with an empty p orbital
    if (neighbour.symbol === "B") return neighbour.lonePairs === 0 && bondOrderSums[other] === 3;
    if (neighbour.symbol !== "C") return false;
    return neighbour.aromatic === true || bondOrderSums[other] > neighbours[other].length;
  });
}
