/**
 * A text that is equal for two structures with the same connectivity (heavy atoms, which are
 * bonded to which, and how many hydrogens each carries), whatever the atom order. Bond orders
 * and charges are left out, so resonance forms of one molecule agree; isomers differ.
 */
import type { MolecularGraph } from "../types";

export function connectivitySignature(graph: MolecularGraph): string {
  const { atoms, bonds } = graph;
  const heavy: number[] = [];
  const hydrogens = new Array<number>(atoms.length).fill(0);
  const neighbours: number[][] = atoms.map(() => []);
  for (const bond of bonds) {
    const fromHydrogen = atoms[bond.from].symbol === "H";
    const toHydrogen = atoms[bond.to].symbol === "H";
    if (fromHydrogen && !toHydrogen) hydrogens[bond.to]++;
    else if (toHydrogen && !fromHydrogen) hydrogens[bond.from]++;
    else if (!fromHydrogen && !toHydrogen) {
      neighbours[bond.from].push(bond.to);
      neighbours[bond.to].push(bond.from);
    }
  }
  atoms.forEach((atom, index) => {
    if (atom.symbol !== "H") heavy.push(index);
  });
  if (heavy.length === 0) return atoms.map((atom) => atom.symbol).join("");
  // Each round labels an atom by its own label and its neighbours' (Weisfeiler-Lehman style);
  // as many rounds as atoms reach across the whole molecule.
  let labels = atoms.map((atom, index) => `${atom.symbol}${hydrogens[index]}`);
  for (let round = 0; round < Math.min(heavy.length, 8); round++) {
    const next = labels.slice();
    for (const atom of heavy) {
      const around = neighbours[atom].map((other) => labels[other]).sort();
      next[atom] = `${labels[atom]}(${around.join(",")})`;
    }
    // Keep labels short with a hash that means the same in every molecule.
    for (const atom of heavy) next[atom] = `${atoms[atom].symbol}${hashText(next[atom])}`;
    labels = next;
  }
  return heavy
    .map((atom) => labels[atom])
    .sort()
    .join(" ");
}

/** FNV-1a, 32 bits, as hex. */
function hashText(text: string): string {
  let hash = 0x811c9dc5;
  for (let k = 0; k < text.length; k++) {
    hash ^= text.charCodeAt(k);
    hash = Math.imul(hash, 0x01000193);
  }
  return (hash >>> 0).toString(16);
}
