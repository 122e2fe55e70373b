/**
 * How many equivalent Lewis structures a written structure has: the ways to place its double
 * bonds again so that every atom that needs one still has one (Kekulé structures of benzene,
 * naphthalene) and a negative end can trade its charge for the double bond (carbonate, acetate,
 * the nitro group). Counted by a backtracking search over perfect matchings, with a cap.
 */
import type { GraphAtom, GraphBond } from "../types";

const MAX_STEPS = 20_000;
const MAX_COUNT = 1_000;
const NONE = 0;
const REQUIRED = 1;
const OPTIONAL = 2;

/**
 * `found`, when given, hears each structure as it is counted: the order of every bond in it,
 * parallel to `bonds`.
 */
export function countEquivalentStructures(
  atoms: readonly GraphAtom[],
  bonds: readonly GraphBond[],
  found?: (orders: readonly number[]) => void,
): number {
  const atomCount = atoms.length;
  let written = 0;
  for (let k = 0; k < bonds.length; k++) {
    const order = bonds[k].order;
    if (order === 3) return 1; // triple bonds are left where they are written
    if (order === 2) written++;
  }
  if (written === 0) return 1;
  const doubleCount = new Int32Array(atomCount);
  const degree = new Int32Array(atomCount);
  for (let k = 0; k < bonds.length; k++) {
    const bond = bonds[k];
    degree[bond.from]++;
    degree[bond.to]++;
    if (bond.order === 2) {
      doubleCount[bond.from]++;
      doubleCount[bond.to]++;
    }
  }

  // Atoms with one double bond must keep one; a singly bonded negative O, S or N with a lone
  // pair may take one in place of its charge, as may the double-bonded end of such a pair.
  const role = new Uint8Array(atomCount); // NONE, REQUIRED or OPTIONAL
  let optionalWritten = 0;
  const required: number[] = [];
  for (let index = 0; index < atomCount; index++) {
    if (doubleCount[index] > 1) continue;
    const atom = atoms[index];
    const terminalHetero = atom.symbol === "O" || atom.symbol === "S" || atom.symbol === "N";
    if (terminalHetero && degree[index] === 1 && (atom.formalCharge === -1 || doubleCount[index] === 1)) {
      role[index] = OPTIONAL;
      // An optional end may only swap with atoms of its own element and charge family: keep
      // the count to structures equivalent to the written one (same number of charged atoms).
      if (doubleCount[index] === 1) optionalWritten++;
    } else if (doubleCount[index] === 1) {
      role[index] = REQUIRED;
      required.push(index);
    }
  }

  const neighbours: number[][] = new Array(atomCount);
  for (let k = 0; k < bonds.length; k++) {
    const bond = bonds[k];
    if (bond.order > 2) continue;
    const a = bond.from;
    const b = bond.to;
    if (role[a] === NONE || role[b] === NONE) continue;
    if (role[a] === OPTIONAL && role[b] === OPTIONAL) continue;
    (neighbours[a] ??= []).push(b);
    (neighbours[b] ??= []).push(a);
  }

  // A depth-first search with its own stack (one frame per matched pair): a long conjugated
  // chain or ring needs thousands of levels, more than the call stack holds.
  const matched = new Uint8Array(atomCount);
  const frameAtom: number[] = [];
  const framePosition: number[] = [];
  const frameOptional: number[] = [];
  const frameNext: number[] = [];
  const frameChosen: number[] = [];
  let count = 0;
  let steps = 0;
  /** Starts the search from `position`: counts a finished structure or opens a frame. */
  /** Bond orders of the current matching: double between paired atoms, single elsewhere among traders. */
  const ordersOfMatching = (): number[] => {
    const partner = new Int32Array(atomCount).fill(-1);
    for (let frame = 0; frame < frameAtom.length; frame++) {
      partner[frameAtom[frame]] = frameChosen[frame];
      partner[frameChosen[frame]] = frameAtom[frame];
    }
    return bonds.map((bond) => {
      const trades =
        bond.order <= 2 &&
        role[bond.from] !== NONE &&
        role[bond.to] !== NONE &&
        !(role[bond.from] === OPTIONAL && role[bond.to] === OPTIONAL);
      if (!trades) return bond.order;
      return partner[bond.from] === bond.to ? 2 : 1;
    });
  };
  const enter = (position: number, optionalUsed: number): void => {
    if (count >= MAX_COUNT || ++steps > MAX_STEPS) return;
    while (position < required.length && matched[required[position]]) position++;
    if (position === required.length) {
      if (optionalUsed === optionalWritten) {
        count++;
        if (found) found(ordersOfMatching());
      }
      return;
    }
    const atom = required[position];
    if (neighbours[atom] === undefined) return;
    matched[atom] = 1;
    frameAtom.push(atom);
    framePosition.push(position);
    frameOptional.push(optionalUsed);
    frameNext.push(0);
    frameChosen.push(-1);
  };
  enter(0, 0);
  while (frameAtom.length > 0) {
    const top = frameAtom.length - 1;
    const atom = frameAtom[top];
    if (frameChosen[top] >= 0) {
      matched[frameChosen[top]] = 0;
      frameChosen[top] = -1;
    }
    const around = neighbours[atom];
    let other = -1;
    while (frameNext[top] < around.length) {
      const candidate = around[frameNext[top]++];
      if (!matched[candidate]) {
        other = candidate;
        break;
      }
    }
    if (other < 0) {
      matched[atom] = 0;
      frameAtom.pop();
      framePosition.pop();
      frameOptional.pop();
      frameNext.pop();
      frameChosen.pop();
      continue;
    }
    matched[other] = 1;
    frameChosen[top] = other;
    enter(framePosition[top] + 1, frameOptional[top] + (role[other] === OPTIONAL ? 1 : 0));
  }
  return Math.max(1, count);
}
