import { maximumMatching } from "./maximumMatching";
import { position, smilesProblem } from "./problems";
import type { SmilesAtom, SmilesBond, SmilesResult } from "./types";
import { aromaticTargetValence } from "./valence";

/**
 * Rewrites aromatic bonds as alternating single and double bonds (a Kekulé structure).
 *
 * An aromatic atom needs a double bond when its bonds and hydrogens fall one short of its
 * valence: ring carbons and pyridine-type nitrogens do; [nH], furan o, thiophene s, n bearing a
 * substituent and carbons with an exocyclic double bond do not. The double bonds are a perfect
 * matching of the atoms that need one, found per ring system by augmenting paths.
 *
 * The result has no aromatic atoms or bonds left; hydrogens and charges are unchanged. A failed
 * result is passed through; when no Kekulé structure exists (c1cccc1, pyrrole written without
 * its [nH]) the problem `no-valid-structure` points at an atom left without a double bond.
 */
export function kekulize(result: SmilesResult): SmilesResult {
  if (!result.ok) return result;
  const { atoms, bonds } = result.value;
  if (!atoms.some((atom) => atom.aromatic) && !bonds.some((bond) => bond.aromatic)) return result;

  const atomCount = atoms.length;
  const bondOrderSums = new Int32Array(atomCount);
  for (const bond of bonds) {
    bondOrderSums[bond.from] += bond.order;
    bondOrderSums[bond.to] += bond.order;
  }
  const needsDouble = new Uint8Array(atomCount);
  for (let a = 0; a < atomCount; a++) {
    const atom = atoms[a];
    if (atom.aromatic && bondOrderSums[a] + atom.hydrogens < aromaticTargetValence(atom.symbol, atom.charge)) {
      needsDouble[a] = 1;
    }
  }

  // Graph of the aromatic bonds that may become double, in compressed adjacency form.
  const offsets = new Int32Array(atomCount + 1);
  const candidate = (bond: SmilesBond): boolean => bond.aromatic && needsDouble[bond.from] === 1 && needsDouble[bond.to] === 1;
  for (const bond of bonds) {
    if (!candidate(bond)) continue;
    offsets[bond.from + 1]++;
    offsets[bond.to + 1]++;
  }
  for (let a = 0; a < atomCount; a++) offsets[a + 1] += offsets[a];
  const neighbours = new Int32Array(offsets[atomCount]);
  const fill = offsets.slice(0, atomCount);
  for (const bond of bonds) {
    if (!candidate(bond)) continue;
    neighbours[fill[bond.from]++] = bond.to;
    neighbours[fill[bond.to]++] = bond.from;
  }

  const mate = matchEachRingSystem(atomCount, needsDouble, offsets, neighbours);
  for (let a = 0; a < atomCount; a++) {
    if (needsDouble[a] === 1 && mate[a] === -1) {
      const { start, end } = atoms[a].range;
      return {
        ok: false,
        problem: smilesProblem(
          "no-valid-structure",
          `No alternating single/double bond pattern fits the aromatic ring at ${position(start)}: the atom there is left without a double bond (a pyrrole-type nitrogen needs its H, as in [nH]).`,
          start,
          end,
        ),
      };
    }
  }

  const keptAtoms: SmilesAtom[] = atoms.map((atom) => (atom.aromatic ? { ...atom, aromatic: false } : atom));
  const keptBonds: SmilesBond[] = bonds.map((bond) => {
    if (!bond.aromatic) return bond;
    const order = mate[bond.from] === bond.to ? 2 : 1;
    return bond.direction
      ? { from: bond.from, to: bond.to, order, aromatic: false, direction: bond.direction }
      : { from: bond.from, to: bond.to, order, aromatic: false };
  });
  return { ok: true, value: { atoms: keptAtoms, bonds: keptBonds } };
}

/**
 * Runs the matching on each connected ring system separately, so one large molecule with many
 * small rings costs the sum of its small searches rather than one large one.
 */
function matchEachRingSystem(atomCount: number, needsDouble: Uint8Array, offsets: Int32Array, neighbours: Int32Array): Int32Array {
  const mate = new Int32Array(atomCount).fill(-1);
  const localIndex = new Int32Array(atomCount).fill(-1);
  const members: number[] = [];
  for (let seed = 0; seed < atomCount; seed++) {
    if (needsDouble[seed] === 0 || localIndex[seed] !== -1) continue;
    members.length = 0;
    members.push(seed);
    localIndex[seed] = 0;
    for (let head = 0; head < members.length; head++) {
      const atom = members[head];
      for (let e = offsets[atom]; e < offsets[atom + 1]; e++) {
        const neighbour = neighbours[e];
        if (localIndex[neighbour] === -1) {
          localIndex[neighbour] = members.length;
          members.push(neighbour);
        }
      }
    }
    // A lone atom has no partner; the caller reports it.
    if (members.length === 1) continue;
    const localOffsets = new Int32Array(members.length + 1);
    for (let m = 0; m < members.length; m++) {
      localOffsets[m + 1] = localOffsets[m] + offsets[members[m] + 1] - offsets[members[m]];
    }
    const localNeighbours = new Int32Array(localOffsets[members.length]);
    let k = 0;
    for (const atom of members) {
      for (let e = offsets[atom]; e < offsets[atom + 1]; e++) localNeighbours[k++] = localIndex[neighbours[e]];
    }
    const localMate = maximumMatching(members.length, localOffsets, localNeighbours);
    for (let m = 0; m < members.length; m++) {
      if (localMate[m] !== -1) mate[members[m]] = members[localMate[m]];
    }
  }
  return mate;
}
