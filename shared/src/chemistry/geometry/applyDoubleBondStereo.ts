/**
 * Honour the cis/trans arrangement the writer gave for double bonds: where the model put the two
 * marked neighbours on the wrong sides, turn everything beyond the double bond half a turn about
 * it. Double bonds inside rings are left alone (their arrangement is fixed by the ring).
 */
import type { DoubleBondStereo, MolecularGraph } from "../types";
import type { MolecularCoordinates } from "./buildCoordinates";
import { rotate, rotationAboutAxis } from "./rotation";
import { add, dot, normalize, scale, sub, type Vec3 } from "./vectors";

export function applyDoubleBondStereo(graph: MolecularGraph, coordinates: MolecularCoordinates): MolecularCoordinates {
  const stereo = graph.doubleBondStereo ?? [];
  if (stereo.length === 0) return coordinates;
  const neighbours: number[][] = graph.atoms.map(() => []);
  for (const bond of graph.bonds) {
    neighbours[bond.from].push(bond.to);
    neighbours[bond.to].push(bond.from);
  }
  let positions = coordinates.atoms.map((atom) => atom.position);
  let lonePairs = coordinates.lonePairs;
  for (const entry of stereo) {
    const side = sideBeyond(neighbours, entry);
    if (!side || relationOf(positions, entry) === entry.relation) continue;
    const [, a, b] = entry.atoms;
    const axis = normalize(sub(positions[b], positions[a]));
    const turn = rotationAboutAxis(axis, Math.PI);
    const pivot = positions[b];
    positions = positions.map((p, atom) => (side.has(atom) ? add(pivot, rotate(turn, sub(p, pivot))) : p));
    lonePairs = lonePairs.map((pair) => (side.has(pair.atom) ? { ...pair, direction: rotate(turn, pair.direction) } : pair));
  }
  return {
    atoms: coordinates.atoms.map((atom, index) => ({ symbol: atom.symbol, position: positions[index] })),
    lonePairs,
  };
}

/** "cis" when the marked neighbours sit on the same side of the double bond. */
function relationOf(positions: readonly Vec3[], entry: DoubleBondStereo): "cis" | "trans" {
  const [x, a, b, y] = entry.atoms;
  const axis = normalize(sub(positions[b], positions[a]));
  const offAxis = (from: Vec3, to: Vec3) => {
    const v = sub(to, from);
    return sub(v, scale(axis, dot(v, axis)));
  };
  return dot(offAxis(positions[a], positions[x]), offAxis(positions[b], positions[y])) > 0 ? "cis" : "trans";
}

/** Atoms reached from b without crossing a=b; undefined when the bond is in a ring. */
function sideBeyond(neighbours: readonly number[][], entry: DoubleBondStereo): Set<number> | undefined {
  const [, a, b] = entry.atoms;
  const seen = new Set<number>([b]);
  const stack = [b];
  while (stack.length > 0) {
    const atom = stack.pop()!;
    for (const next of neighbours[atom]) {
      if (atom === b && next === a) continue;
      if (next === a) return undefined;
      if (!seen.has(next)) {
        seen.add(next);
        stack.push(next);
      }
    }
  }
  return seen;
}
