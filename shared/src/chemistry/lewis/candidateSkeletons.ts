/**
 * The skeletons worth trying for a species written as a molecular formula: one central atom with
 * every other heavy atom bonded to it, and hydrogens either on the centre or on outer O, N or S
 * atoms (the oxyacid pattern: H2SO4, HNO3, HOCl, NH2OH). Which skeleton wins is decided later by
 * formal charges, not here: Cl2O, N2O, O3, N3- and I3- all defeat "least electronegative is central".
 */
import type { FormulaPart } from "../types";
import { atomTraits } from "./electronBookkeeping";
import type { Skeleton } from "./chooseLewisStructure";

export interface CandidateSkeleton extends Skeleton {
  readonly centre: number;
  /** Set on the X-A-A-X chain, the one skeleton that is not a star. */
  readonly pair?: boolean;
}

/** How many hydrogens an outer atom of each element may carry in these skeletons. */
const HYDROGEN_HOST_CAPACITY: Readonly<Record<string, number>> = { O: 1, S: 1, N: 2 };

/** Atom symbols in the order the writer gave them, one entry per atom. */
export function expandComposition(composition: readonly FormulaPart[]): string[] {
  const symbols: string[] = [];
  for (const part of composition) for (let k = 0; k < part.count; k++) symbols.push(part.symbol);
  return symbols;
}

/** Every star-shaped skeleton (plus hydrogens on outer O, N, S) for the atoms given. */
export function candidateSkeletons(symbols: readonly string[]): CandidateSkeleton[] {
  const heavy: number[] = [];
  const hydrogens: number[] = [];
  for (let index = 0; index < symbols.length; index++) (symbols[index] === "H" ? hydrogens : heavy).push(index);
  const candidates: CandidateSkeleton[] = [];
  const triedElements = new Set<string>();

  for (const centre of heavy) {
    const symbol = symbols[centre];
    if (triedElements.has(symbol)) continue;
    triedElements.add(symbol);
    // Fluorine is never central; a lone heavy atom has no choice.
    if (symbol === "F" && heavy.length > 1) continue;
    // Other halogens are central only over more electronegative atoms (ClF3, ClO2), never over
    // a less electronegative one that could take their place (NO2Cl is N-centred).
    if (atomTraits(symbol).isHalogen && heavy.some((atom) => isBetterCentreThanHalogen(symbols[atom], symbol))) continue;
    const outer = heavy.filter((atom) => atom !== centre);
    // Hosts written next to a hydrogen come first, so a tie keeps the writer's order: HOCN puts
    // the H on O, HNCO on N.
    const firstHydrogen = hydrogens.length > 0 ? hydrogens[0] : -1;
    const hosts = outer
      .filter((atom) => (HYDROGEN_HOST_CAPACITY[symbols[atom]] ?? 0) > 0)
      .sort(
        (a, b) =>
          Math.abs(a - firstHydrogen) - Math.abs(b - firstHydrogen) ||
          // Hosts are O, S or N, whose plain character order is their alphabetical order.
          (symbols[a] < symbols[b] ? -1 : symbols[a] > symbols[b] ? 1 : 0) ||
          a - b,
      );
    for (const hostCounts of hydrogenPlacements(hosts, symbols, hydrogens.length)) {
      const bonds: [number, number][] = outer.map((atom) => [centre, atom]);
      let nextHydrogen = 0;
      hosts.forEach((host, k) => {
        for (let n = 0; n < hostCounts[k]; n++) bonds.push([host, hydrogens[nextHydrogen++]]);
      });
      while (nextHydrogen < hydrogens.length) bonds.push([centre, hydrogens[nextHydrogen++]]);
      candidates.push({ symbols, bonds, centre });
    }
  }
  const pair = pairSkeleton(symbols);
  if (pair) candidates.push(pair);
  return candidates;
}

/**
 * X-A-A-X (S2Cl2, N2F2, O2F2): two atoms of one element bonded to each other, the other atoms,
 * all of them one-bond atoms (H, halogens), shared out evenly between the two.
 */
function pairSkeleton(symbols: readonly string[]): CandidateSkeleton | undefined {
  const pair: number[] = [];
  const ends: number[] = [];
  for (let index = 0; index < symbols.length; index++) {
    const traits = atomTraits(symbols[index]);
    if (traits.isHydrogen || traits.isHalogen) ends.push(index);
    else pair.push(index);
  }
  if (pair.length !== 2 || symbols[pair[0]] !== symbols[pair[1]] || ends.length === 0 || ends.length % 2 !== 0) return undefined;
  const bonds: [number, number][] = [[pair[0], pair[1]]];
  ends.forEach((end, k) => bonds.push([pair[k < ends.length / 2 ? 0 : 1], end]));
  return { symbols, bonds, centre: pair[0], pair: true };
}

/**
 * Ways to put up to `hydrogenCount` hydrogens on the host atoms; hosts of the same element are
 * interchangeable, so counts never increase along a run of the same element.
 */
function hydrogenPlacements(hosts: readonly number[], symbols: readonly string[], hydrogenCount: number): number[][] {
  const placements: number[][] = [];
  const counts = new Array<number>(hosts.length).fill(0);
  const visit = (position: number, used: number) => {
    if (position === hosts.length) {
      placements.push([...counts]);
      return;
    }
    const symbol = symbols[hosts[position]];
    let limit = Math.min(HYDROGEN_HOST_CAPACITY[symbol] ?? 0, hydrogenCount - used);
    if (position > 0 && symbols[hosts[position - 1]] === symbol) {
      limit = Math.min(limit, counts[position - 1]);
    }
    for (let n = limit; n >= 0; n--) {
      counts[position] = n;
      visit(position + 1, used + n);
    }
    counts[position] = 0;
  };
  if (hydrogenCount === 0 || hosts.length === 0) return [counts];
  visit(0, 0);
  return placements;
}

function isBetterCentreThanHalogen(candidate: string, halogen: string): boolean {
  const traits = atomTraits(candidate);
  if (traits.isHydrogen || traits.isHalogen || traits.element.category === "noble-gas") return false;
  return traits.electronegativity < atomTraits(halogen).electronegativity;
}

/** Atoms that normally need two or more bonds (C, N, O, S, ...): the ones that make chains. */
export function countChainFormingAtoms(symbols: readonly string[]): number {
  return symbols.filter(isChainFormingAtom).length;
}

/** An atom that normally needs two or more bonds: not hydrogen, a halogen or a noble gas. */
export function isChainFormingAtom(symbol: string): boolean {
  const traits = atomTraits(symbol);
  return !traits.isHydrogen && !traits.isHalogen && traits.element.category !== "noble-gas";
}
