/**
 * Given a skeleton (which atoms are bonded) and a charge, find the Lewis structure a chemist would
 * draw: every bond order and lone pair, chosen by the usual checks in this order:
 *   1. atoms that must complete an octet (duet for H) do so where possible;
 *   2. formal charges as small as possible (sum of |charge|, then sum of squares);
 *   3. no expanded octet unless it lowers formal charges (only from period 3 on);
 *   4. negative formal charge on the more electronegative atoms.
 * Structures that tie on every check are equivalent resonance forms of each other.
 */
import type { GraphAtom, GraphBond, MolecularGraph } from "../types";
import { atomTraits, type AtomTraits } from "./electronBookkeeping";
import { sortSmall } from "../sortSmall";

/** Which atoms are joined by at least a single bond. */
export interface Skeleton {
  readonly symbols: readonly string[];
  readonly bonds: readonly (readonly [number, number])[];
}

/** Lower is better, compared field by field in this order. */
export interface LewisScore {
  readonly shellDeficit: number;
  readonly sumAbsFormalCharge: number;
  readonly sumSquareFormalCharge: number;
  readonly expandedAtoms: number;
  readonly chargeTimesElectronegativity: number;
}

export interface LewisStructure {
  readonly graph: MolecularGraph;
  readonly score: LewisScore;
  readonly resonanceForms: number;
  readonly valenceElectrons: number;
}

export type LewisFailure =
  | "charge-exceeds-electrons"
  | "too-few-electrons-to-bond"
  | "hydrogen-overbonded"
  | "shell-overflow"
  | "too-many-domains"
  | "no-structure";

export type LewisOutcome =
  | { readonly ok: true; readonly structure: LewisStructure }
  | { readonly ok: false; readonly failure: LewisFailure; readonly atom?: number };

/**
 * Most electron domains an atom of each period carries: four in period 2, six in periods 3 and
 * 4 (SF6, BrF5), seven only for the large atoms from period 5 on (IF7, XeF6). SF7 does not exist.
 */
function maxDomains(period: number): number {
  return period <= 2 ? 4 : period <= 4 ? 6 : 7;
}
/** Beyond this many bonds that could be multiple, the exhaustive search would be too slow. */
const MAX_FLEXIBLE_BONDS = 12;

export function compareScores(a: LewisScore, b: LewisScore): number {
  return (
    a.shellDeficit - b.shellDeficit ||
    a.sumAbsFormalCharge - b.sumAbsFormalCharge ||
    a.sumSquareFormalCharge - b.sumSquareFormalCharge ||
    a.expandedAtoms - b.expandedAtoms ||
    a.chargeTimesElectronegativity - b.chargeTimesElectronegativity
  );
}

/** Sum of squared bond orders: lower when multiple bonds are shared out rather than piled on one bond. */
function bondOrderSpread(orders: readonly number[]): number {
  let sum = 0;
  for (const order of orders) sum += order * order;
  return sum;
}

/** Total valence electrons of the atoms, less the charge. */
export function countValenceElectrons(symbols: readonly string[], charge: number): number {
  let total = -charge;
  for (const symbol of symbols) total += atomTraits(symbol).valenceElectrons;
  return total;
}

function atomIndices(count: number): number[] {
  const indices = new Array<number>(count);
  for (let k = 0; k < count; k++) indices[k] = k;
  return indices;
}

export function chooseLewisStructure(skeleton: Skeleton, charge: number): LewisOutcome {
  const atomCount = skeleton.symbols.length;
  const traits: AtomTraits[] = skeleton.symbols.map(atomTraits);
  const electrons = countValenceElectrons(skeleton.symbols, charge);
  if (electrons < 0) return { ok: false, failure: "charge-exceeds-electrons" };

  const degree = new Array<number>(atomCount).fill(0);
  for (const [from, to] of skeleton.bonds) {
    degree[from]++;
    degree[to]++;
  }
  for (let atom = 0; atom < atomCount; atom++) {
    const t = traits[atom];
    if (t.isHydrogen && degree[atom] > 1) return { ok: false, failure: "hydrogen-overbonded", atom };
    if (2 * degree[atom] > t.shellCapacity) return { ok: false, failure: "shell-overflow", atom };
    if (degree[atom] > maxDomains(t.element.period)) return { ok: false, failure: "too-many-domains", atom };
  }
  const spare = electrons - 2 * skeleton.bonds.length;
  if (spare < 0) return { ok: false, failure: "too-few-electrons-to-bond" };

  // Multiple bonds never involve H or F, nor a halogen on the outside of the molecule.
  const flexibleBonds: number[] = [];
  skeleton.bonds.forEach(([from, to], index) => {
    const blocks = (atom: number) =>
      traits[atom].isHydrogen ||
      // A period-2 atom with four neighbours has no room left for a multiple bond.
      (traits[atom].shellCapacity === 8 && degree[atom] >= 4) ||
      traits[atom].element.symbol === "F" ||
      (traits[atom].isHalogen && degree[atom] === 1);
    if (!blocks(from) && !blocks(to)) flexibleBonds.push(index);
  });
  if (flexibleBonds.length > MAX_FLEXIBLE_BONDS) return { ok: false, failure: "no-structure" };

  // Lone pairs fill outer atoms first (most electronegative first), then inner atoms.
  const fillOrder = sortSmall(
    atomIndices(atomCount),
    (a, b) =>
      Number(degree[a] > 1) - Number(degree[b] > 1) ||
      traits[b].electronegativity - traits[a].electronegativity ||
      a - b,
  );
  // Electrons left over after every shell is full go to inner atoms that can expand, least
  // electronegative first (the central atom of SF4 or I3-).
  const expansionOrder = sortSmall(
    atomIndices(atomCount).filter((atom) => traits[atom].shellCapacity > 8),
    (a, b) =>
      Number(degree[a] <= 1) - Number(degree[b] <= 1) ||
      traits[a].electronegativity - traits[b].electronegativity ||
      a - b,
  );

  const bondOrders = new Array<number>(skeleton.bonds.length).fill(1);
  const bondOrderSum = [...degree];
  const lonePairs = new Array<number>(atomCount).fill(0);
  let best: { score: LewisScore; orders: number[]; lonePairs: number[]; unpaired: number } | undefined;
  let resonanceForms = 0;
  let electronsLeftOver = false;
  const isRadical = electrons % 2 === 1;

  const shellOf = (atom: number, unpairedAtom: number) =>
    2 * bondOrderSum[atom] + 2 * lonePairs[atom] + (atom === unpairedAtom ? 1 : 0);

  const evaluate = (remaining: number, unpairedAtom: number) => {
    lonePairs.fill(0);
    let left = remaining;
    for (const atom of fillOrder) {
      if (left < 2) break;
      const need = traits[atom].fullShell - shellOf(atom, unpairedAtom);
      if (need <= 1) continue;
      const pairs = Math.min(need >> 1, left >> 1);
      lonePairs[atom] += pairs;
      left -= 2 * pairs;
    }
    for (const atom of expansionOrder) {
      if (left < 2) break;
      const roomInShell = (traits[atom].shellCapacity - shellOf(atom, unpairedAtom)) >> 1;
      const roomForDomains =
        maxDomains(traits[atom].element.period) - degree[atom] - lonePairs[atom] - (atom === unpairedAtom ? 1 : 0);
      const pairs = Math.min(roomInShell, roomForDomains, left >> 1);
      if (pairs <= 0) continue;
      lonePairs[atom] += pairs;
      left -= 2 * pairs;
    }
    if (left !== 0) {
      electronsLeftOver = true;
      return;
    }

    let shellDeficit = 0;
    let sumAbs = 0;
    let sumSquare = 0;
    let expanded = 0;
    let weighted = 0;
    for (let atom = 0; atom < atomCount; atom++) {
      const t = traits[atom];
      const shell = shellOf(atom, unpairedAtom);
      if (shell > t.shellCapacity) return;
      if (shell > 8) {
        if (degree[atom] <= 1) return; // outer atoms never expand
        expanded++;
      }
      if (degree[atom] > 1) {
        const domains = degree[atom] + lonePairs[atom] + (atom === unpairedAtom ? 1 : 0);
        if (domains > maxDomains(t.element.period)) return;
      }
      // B, Be and Al may stay short of an octet as centres (BF3), never as outer atoms.
      if ((t.mustCompleteShell || degree[atom] <= 1) && shell < t.fullShell) shellDeficit += t.fullShell - shell;
      const formal =
        t.valenceElectrons - 2 * lonePairs[atom] - (atom === unpairedAtom ? 1 : 0) - bondOrderSum[atom];
      sumAbs += Math.abs(formal);
      sumSquare += formal * formal;
      weighted += formal * t.electronegativity;
    }
    if (isRadical && shellDeficit > 0) shellDeficit -= 1; // an odd count leaves one atom short by one
    const chargeTimesElectronegativity = Math.round(weighted * 1000) / 1000;
    // Compared field by field (as compareScores does) before any score is made: most leaves of
    // the search lose, and need no objects at all.
    let comparison = -1;
    if (best) {
      const b = best.score;
      comparison =
        shellDeficit - b.shellDeficit ||
        sumAbs - b.sumAbsFormalCharge ||
        sumSquare - b.sumSquareFormalCharge ||
        expanded - b.expandedAtoms ||
        chargeTimesElectronegativity - b.chargeTimesElectronegativity;
    }
    if (comparison > 0) return;
    if (comparison === 0) {
      resonanceForms++;
      // Equally good forms are all counted; the one drawn spreads its bonds most evenly (H-N=N=N
      // rather than H-N-N#N), as chemists draw the major form.
      if (!(bondOrderSpread(bondOrders) < bondOrderSpread(best!.orders))) return;
    } else {
      resonanceForms = 1;
    }
    const score: LewisScore = {
      shellDeficit,
      sumAbsFormalCharge: sumAbs,
      sumSquareFormalCharge: sumSquare,
      expandedAtoms: expanded,
      chargeTimesElectronegativity,
    };
    best = { score, orders: [...bondOrders], lonePairs: [...lonePairs], unpaired: unpairedAtom };
  };

  const evaluateLeaf = (extraOrders: number) => {
    const remaining = spare - 2 * extraOrders;
    if (remaining % 2 === 0) {
      evaluate(remaining, -1);
      return;
    }
    for (let atom = 0; atom < atomCount; atom++) {
      if (traits[atom].isHydrogen && atomCount > 1) continue;
      evaluate(remaining - 1, atom);
    }
  };

  const search = (position: number, extraOrders: number) => {
    if (position === flexibleBonds.length) {
      evaluateLeaf(extraOrders);
      return;
    }
    const bond = flexibleBonds[position];
    const [from, to] = skeleton.bonds[bond];
    for (let extra = 0; extra <= 2; extra++) {
      if (2 * (extraOrders + extra) > spare) break;
      if (extra > 0) {
        const fitsFrom = 2 * (bondOrderSum[from] + extra) <= traits[from].shellCapacity;
        const fitsTo = 2 * (bondOrderSum[to] + extra) <= traits[to].shellCapacity;
        // Outer atoms keep to an octet: a triple bond is the most they can carry.
        const outerFits =
          (degree[from] > 1 || bondOrderSum[from] + extra <= 3) &&
          (degree[to] > 1 || bondOrderSum[to] + extra <= 3);
        if (!fitsFrom || !fitsTo || !outerFits) break;
      }
      bondOrders[bond] = 1 + extra;
      bondOrderSum[from] += extra;
      bondOrderSum[to] += extra;
      search(position + 1, extraOrders + extra);
      bondOrderSum[from] -= extra;
      bondOrderSum[to] -= extra;
      bondOrders[bond] = 1;
    }
  };

  search(0, 0);
  if (!best) {
    if (!electronsLeftOver) return { ok: false, failure: "no-structure" };
    // Electrons had nowhere to go: the most connected atom would need more than its shell holds.
    const crowded = [...degree.keys()].sort((a, b) => degree[b] - degree[a] || a - b)[0];
    return { ok: false, failure: "shell-overflow", atom: crowded };
  }

  const chosen = best;
  const orderSums = [...degree];
  skeleton.bonds.forEach(([from, to], index) => {
    orderSums[from] += chosen.orders[index] - 1;
    orderSums[to] += chosen.orders[index] - 1;
  });
  const atoms: GraphAtom[] = skeleton.symbols.map((symbol, atom) => {
    const unpaired = atom === chosen.unpaired ? 1 : 0;
    return {
      symbol,
      lonePairs: chosen.lonePairs[atom],
      unpairedElectrons: unpaired,
      formalCharge: traits[atom].valenceElectrons - 2 * chosen.lonePairs[atom] - unpaired - orderSums[atom],
    };
  });
  const bonds: GraphBond[] = skeleton.bonds.map(([from, to], index) => ({
    from,
    to,
    order: chosen.orders[index],
  }));
  return {
    ok: true,
    structure: {
      graph: { atoms, bonds },
      score: chosen.score,
      resonanceForms,
      valenceElectrons: electrons,
    },
  };
}
