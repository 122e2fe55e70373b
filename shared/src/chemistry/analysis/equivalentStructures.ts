/**
 * How many equivalent Lewis structures a written structure has: the ways to place its double
 * bonds again so that every atom that needs one still has one (Kekulé structures of benzene,
 * naphthalene) and a negative end can trade its charge for the double bond (carbonate, acetate,
 * the nitro group). Counted by a backtracking search over perfect matchings, with a cap.
 */
import type { GraphAtom, GraphBond } from "../types";

const MAX_STEPS = 20_000;
const MAX_COUNT = 1_000;

export function countEquivalentStructures(atoms: readonly GraphAtom[], bonds: readonly GraphBond[]): number {
  const atomCount = atoms.length;
  const doubleCount = new Array<number>(atomCount).fill(0);
  for (const bond of bonds) {
    if (bond.order === 3) return 1; // triple bonds are left where they are written
    if (bond.order === 2) {
      doubleCount[bond.from]++;
      doubleCount[bond.to]++;
    }
  }
  const written = bonds.filter((bond) => bond.order === 2).length;
  if (written === 0) return 1;

  // Atoms with one double bond must keep one; a singly bonded negative O, S or N with a lone
  // pair may take one in place of its charge, as may the double-bonded end of such a pair.
  const role = atoms.map((atom, index): "required" | "optional" | "none" => {
    if (doubleCount[index] > 1) return "none";
    const terminalHetero = atom.symbol === "O" || atom.symbol === "S" || atom.symbol === "N";
    const degree = bonds.reduce((n, b) => n + (b.from === index || b.to === index ? 1 : 0), 0);
    if (terminalHetero && degree === 1 && (atom.formalCharge === -1 || doubleCount[index] === 1)) return "optional";
    return doubleCount[index] === 1 ? "required" : "none";
  });

  const neighbours: number[][] = Array.from({ length: atomCount }, () => []);
  for (const bond of bonds) {
    if (bond.order > 2) continue;
    const a = bond.from;
    const b = bond.to;
    if (role[a] === "none" || role[b] === "none") continue;
    if (role[a] === "optional" && role[b] === "optional") continue;
    neighbours[a].push(b);
    neighbours[b].push(a);
  }
  // An optional end may only swap with atoms of its own element and charge family: keep the
  // count to structures equivalent to the written one (same number of charged atoms).
  const optionalWritten = atoms.filter((_, i) => role[i] === "optional" && doubleCount[i] === 1).length;

  const required = atoms.map((_, i) => i).filter((i) => role[i] === "required");
  const matched = new Array<boolean>(atomCount).fill(false);
  let count = 0;
  let steps = 0;
  const visit = (position: number, optionalUsed: number) => {
    if (count >= MAX_COUNT || ++steps > MAX_STEPS) return;
    while (position < required.length && matched[required[position]]) position++;
    if (position === required.length) {
      if (optionalUsed === optionalWritten) count++;
      return;
    }
    const atom = required[position];
    matched[atom] = true;
    for (const other of neighbours[atom]) {
      if (matched[other]) continue;
      matched[other] = true;
      visit(position + 1, optionalUsed + (role[other] === "optional" ? 1 : 0));
      matched[other] = false;
    }
    matched[atom] = false;
  };
  visit(0, 0);
  return Math.max(1, count);
}
