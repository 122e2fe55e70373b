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
import { sharedAtom } from "../sharedAtoms";
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
  "charge-exceeds-electrons" | "too-few-electrons-to-bond" | "hydrogen-overbonded" | "shell-overflow" | "too-many-domains" | "no-structure";

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

/** Total valence electrons of the atoms, less the charge. */
export function countValenceElectrons(symbols: readonly string[], charge: number): number {
  let total = -charge;
  for (const symbol of symbols) total += atomTraits(symbol).valenceElectrons;
  return total;
}

/** A Lewis search with scratch arrays of its own, reused from call to call. */
export interface LewisSearch {
  /** The best Lewis structure of `skeleton` with net `charge`, or why there is none. */
  choose(skeleton: Skeleton, charge: number): LewisOutcome;
  /**
   * Every structure of `skeleton` that ties with the best on every check (its equivalent
   * resonance forms), in the order the search meets them, at most `limit`; empty when there is
   * no structure.
   */
  tiedStructures(skeleton: Skeleton, charge: number, limit: number): readonly MolecularGraph[];
}

/** One tying leaf of the search, copied out of the scratch arrays. */
interface TiedLeaf {
  readonly orders: Int32Array;
  readonly lonePairs: Int32Array;
  readonly unpairedAtom: number;
}

/**
 * Creates a search and its scratch state. The state is this search's alone: two searches never
 * share arrays, and a search asked again while it runs (which the analysis never does) answers
 * with a fresh search rather than overwrite its own arrays.
 */
export function createLewisSearch(): LewisSearch {
  // The search works in one set of arrays reused from call to call (it never runs inside itself):
  // a species is analysed with a handful of small searches, and fresh arrays, closures and copies
  // of every better leaf cost more than the search itself. Per-atom traits are copied into plain
  // number arrays once per call.
  let atomCapacity = 0;
  let bondCapacity = 0;
  let degree = new Int32Array(0);
  let bondOrderSum = new Int32Array(0);
  let lonePairs = new Int32Array(0);
  let bestLonePairs = new Int32Array(0);
  let fillOrder = new Int32Array(0);
  let expansionOrder = new Int32Array(0);
  let valenceOf = new Int32Array(0);
  let shellCapacityOf = new Int32Array(0);
  let fullShellOf = new Int32Array(0);
  let maxDomainsOf = new Int32Array(0);
  let mustCompleteOf = new Uint8Array(0);
  let electronegativityOf = new Float64Array(0);
  let bondOrders = new Int32Array(0);
  let bestOrders = new Int32Array(0);
  let bondFrom = new Int32Array(0);
  let bondTo = new Int32Array(0);
  let flexibleBonds = new Int32Array(0);

  function reserve(atoms: number, bonds: number): void {
    if (atoms > atomCapacity) {
      atomCapacity = Math.max(atoms, 2 * atomCapacity, 16);
      degree = new Int32Array(atomCapacity);
      bondOrderSum = new Int32Array(atomCapacity);
      lonePairs = new Int32Array(atomCapacity);
      bestLonePairs = new Int32Array(atomCapacity);
      fillOrder = new Int32Array(atomCapacity);
      expansionOrder = new Int32Array(atomCapacity);
      valenceOf = new Int32Array(atomCapacity);
      shellCapacityOf = new Int32Array(atomCapacity);
      fullShellOf = new Int32Array(atomCapacity);
      maxDomainsOf = new Int32Array(atomCapacity);
      mustCompleteOf = new Uint8Array(atomCapacity);
      electronegativityOf = new Float64Array(atomCapacity);
    }
    if (bonds > bondCapacity) {
      bondCapacity = Math.max(bonds, 2 * bondCapacity, 16);
      bondOrders = new Int32Array(bondCapacity);
      bestOrders = new Int32Array(bondCapacity);
      bondFrom = new Int32Array(bondCapacity);
      bondTo = new Int32Array(bondCapacity);
      flexibleBonds = new Int32Array(bondCapacity);
    }
  }

  // The current search: its size, and the best leaf so far (field by field, as compareScores).
  let atomCount = 0;
  let bondCount = 0;
  let flexibleCount = 0;
  let spare = 0;
  let expansionCount = 0;
  let skipHydrogenUnpaired = false;
  let isRadical = false;
  let electronsLeftOver = false;
  let hasBest = false;
  let bestShellDeficit = 0;
  let bestSumAbs = 0;
  let bestSumSquare = 0;
  let bestExpanded = 0;
  let bestWeighted = 0;
  let bestSpread = 0;
  let bestUnpaired = -1;
  let resonanceForms = 0;
  // Set only while tiedStructures runs: the ordinary search copies nothing.
  let tiedLeaves: TiedLeaf[] | undefined;
  let tiedLimit = 0;

  function runSearch(skeleton: Skeleton, charge: number): LewisOutcome {
    const symbols = skeleton.symbols;
    const bonds = skeleton.bonds;
    atomCount = symbols.length;
    bondCount = bonds.length;
    reserve(atomCount, bondCount);
    const traits: AtomTraits[] = new Array(atomCount);
    let electrons = -charge;
    for (let atom = 0; atom < atomCount; atom++) {
      const t = atomTraits(symbols[atom]);
      traits[atom] = t;
      electrons += t.valenceElectrons;
      valenceOf[atom] = t.valenceElectrons;
      shellCapacityOf[atom] = t.shellCapacity;
      fullShellOf[atom] = t.fullShell;
      maxDomainsOf[atom] = maxDomains(t.element.period);
      mustCompleteOf[atom] = t.mustCompleteShell ? 1 : 0;
      electronegativityOf[atom] = t.electronegativity;
      degree[atom] = 0;
    }
    if (electrons < 0) return { ok: false, failure: "charge-exceeds-electrons" };

    for (let bond = 0; bond < bondCount; bond++) {
      const [from, to] = bonds[bond];
      bondFrom[bond] = from;
      bondTo[bond] = to;
      degree[from]++;
      degree[to]++;
    }
    for (let atom = 0; atom < atomCount; atom++) {
      const t = traits[atom];
      if (t.isHydrogen && degree[atom] > 1) return { ok: false, failure: "hydrogen-overbonded", atom };
      if (2 * degree[atom] > t.shellCapacity) return { ok: false, failure: "shell-overflow", atom };
      if (degree[atom] > maxDomainsOf[atom]) return { ok: false, failure: "too-many-domains", atom };
    }
    spare = electrons - 2 * bondCount;
    if (spare < 0) return { ok: false, failure: "too-few-electrons-to-bond" };

    // Multiple bonds never involve H or F, nor a halogen on the outside of the molecule.
    flexibleCount = 0;
    for (let bond = 0; bond < bondCount; bond++) {
      if (!blocksMultipleBond(traits, bondFrom[bond]) && !blocksMultipleBond(traits, bondTo[bond])) {
        flexibleBonds[flexibleCount++] = bond;
      }
    }
    if (flexibleCount > MAX_FLEXIBLE_BONDS) return { ok: false, failure: "no-structure" };
    // Boron with three neighbours may keep six electrons (BF3, B(OH)3): its one empty p orbital
    // is all it lacks. With two neighbours it would lack more than a spare orbital, and where a
    // neighbour can share a further pair it does: HBO is H-B≡O, BO2- is O=B=O⁻, as HCN and CO2.
    // An OH, OR or NR2 group on it feeds the empty orbital as in boric acid, drawn without a
    // charged double bond: metaboric acid is H-O-B=O with no formal charges.
    for (let position = 0; position < flexibleCount; position++) {
      const bond = flexibleBonds[position];
      for (const atom of [bondFrom[bond], bondTo[bond]]) {
        const t = traits[atom];
        if (degree[atom] === 2 && t.element.group === 13 && t.element.period === 2 && !hasDonorGroup(atom, symbols)) {
          mustCompleteOf[atom] = 1;
        }
      }
    }

    // Lone pairs fill outer atoms first (most electronegative first), then inner atoms.
    for (let atom = 0; atom < atomCount; atom++) fillOrder[atom] = atom;
    sortSmall(fillOrder, compareFillOrder, atomCount);
    // Electrons left over after every shell is full go to inner atoms that can expand, least
    // electronegative first (the central atom of SF4 or I3-).
    expansionCount = 0;
    for (let atom = 0; atom < atomCount; atom++) {
      if (shellCapacityOf[atom] > 8) expansionOrder[expansionCount++] = atom;
    }
    sortSmall(expansionOrder, compareExpansionOrder, expansionCount);

    for (let bond = 0; bond < bondCount; bond++) bondOrders[bond] = 1;
    for (let atom = 0; atom < atomCount; atom++) {
      bondOrderSum[atom] = degree[atom];
      lonePairs[atom] = 0;
    }
    hasBest = false;
    resonanceForms = 0;
    electronsLeftOver = false;
    isRadical = electrons % 2 === 1;
    skipHydrogenUnpaired = atomCount > 1;

    search(0, 0, traits);
    if (!hasBest) {
      if (!electronsLeftOver) return { ok: false, failure: "no-structure" };
      // Electrons had nowhere to go: the most connected atom would need more than its shell holds.
      let crowded = 0;
      for (let atom = 1; atom < atomCount; atom++) if (degree[atom] > degree[crowded]) crowded = atom;
      return { ok: false, failure: "shell-overflow", atom: crowded };
    }

    const graph = graphOf(symbols, traits, bestOrders, bestLonePairs, bestUnpaired);
    const score: LewisScore = {
      shellDeficit: bestShellDeficit,
      sumAbsFormalCharge: bestSumAbs,
      sumSquareFormalCharge: bestSumSquare,
      expandedAtoms: bestExpanded,
      chargeTimesElectronegativity: bestWeighted,
    };
    return {
      ok: true,
      structure: {
        graph,
        score,
        resonanceForms,
        valenceElectrons: electrons,
      },
    };
  }

  /** The graph of one leaf: bond orders, lone pairs and the odd electron's atom (-1 for none). */
  function graphOf(
    symbols: readonly string[],
    traits: readonly AtomTraits[],
    orders: Int32Array,
    pairs: Int32Array,
    unpairedAtom: number,
  ): MolecularGraph {
    const orderSums = new Array<number>(atomCount);
    for (let atom = 0; atom < atomCount; atom++) orderSums[atom] = degree[atom];
    const graphBonds: GraphBond[] = new Array(bondCount);
    for (let bond = 0; bond < bondCount; bond++) {
      const from = bondFrom[bond];
      const to = bondTo[bond];
      const order = orders[bond];
      orderSums[from] += order - 1;
      orderSums[to] += order - 1;
      graphBonds[bond] = { from, to, order };
    }
    const atoms: GraphAtom[] = new Array(atomCount);
    for (let atom = 0; atom < atomCount; atom++) {
      const unpaired = atom === unpairedAtom ? 1 : 0;
      atoms[atom] = sharedAtom(
        traits[atom].element.atomicNumber,
        symbols[atom],
        pairs[atom],
        unpaired,
        valenceOf[atom] - 2 * pairs[atom] - unpaired - orderSums[atom],
        false,
      );
    }
    return { atoms, bonds: graphBonds };
  }

  /** Whether an O or N bonded to `atom` has a neighbour of its own (B-OH, B-OR, B-NR2). */
  function hasDonorGroup(atom: number, symbols: readonly string[]): boolean {
    for (let bond = 0; bond < bondCount; bond++) {
      const other = bondFrom[bond] === atom ? bondTo[bond] : bondTo[bond] === atom ? bondFrom[bond] : -1;
      if (other >= 0 && (symbols[other] === "O" || symbols[other] === "N") && degree[other] >= 2) return true;
    }
    return false;
  }

  function blocksMultipleBond(traits: readonly AtomTraits[], atom: number): boolean {
    const t = traits[atom];
    return (
      t.isHydrogen ||
      // A period-2 atom with four neighbours has no room left for a multiple bond.
      (t.shellCapacity === 8 && degree[atom] >= 4) ||
      t.element.symbol === "F" ||
      (t.isHalogen && degree[atom] === 1)
    );
  }

  /** Fill order: outer atoms before inner ones, then the more electronegative first, then by index. */
  const compareFillOrder = (a: number, b: number): number => (fillsAfter(a, b) ? 1 : 0);
  const compareExpansionOrder = (a: number, b: number): number => (expandsAfter(a, b) ? 1 : 0);

  function fillsAfter(a: number, b: number): boolean {
    const byRole = Number(degree[a] > 1) - Number(degree[b] > 1);
    if (byRole !== 0) return byRole > 0;
    const byElectronegativity = electronegativityOf[b] - electronegativityOf[a];
    if (byElectronegativity !== 0) return byElectronegativity > 0;
    return a > b;
  }

  /** Expansion order: inner atoms before outer ones, then the less electronegative first, then by index. */
  function expandsAfter(a: number, b: number): boolean {
    const byRole = Number(degree[a] <= 1) - Number(degree[b] <= 1);
    if (byRole !== 0) return byRole > 0;
    const byElectronegativity = electronegativityOf[a] - electronegativityOf[b];
    if (byElectronegativity !== 0) return byElectronegativity > 0;
    return a > b;
  }

  function search(position: number, extraOrders: number, traits: readonly AtomTraits[]): void {
    if (position === flexibleCount) {
      evaluateLeaf(extraOrders, traits);
      return;
    }
    const bond = flexibleBonds[position];
    const from = bondFrom[bond];
    const to = bondTo[bond];
    for (let extra = 0; extra <= 2; extra++) {
      if (2 * (extraOrders + extra) > spare) break;
      if (extra > 0) {
        const fitsFrom = 2 * (bondOrderSum[from] + extra) <= shellCapacityOf[from];
        const fitsTo = 2 * (bondOrderSum[to] + extra) <= shellCapacityOf[to];
        // Outer atoms keep to an octet: a triple bond is the most they can carry.
        const outerFits = (degree[from] > 1 || bondOrderSum[from] + extra <= 3) && (degree[to] > 1 || bondOrderSum[to] + extra <= 3);
        if (!fitsFrom || !fitsTo || !outerFits) break;
      }
      bondOrders[bond] = 1 + extra;
      bondOrderSum[from] += extra;
      bondOrderSum[to] += extra;
      search(position + 1, extraOrders + extra, traits);
      bondOrderSum[from] -= extra;
      bondOrderSum[to] -= extra;
      bondOrders[bond] = 1;
    }
  }

  function evaluateLeaf(extraOrders: number, traits: readonly AtomTraits[]): void {
    const remaining = spare - 2 * extraOrders;
    if (remaining % 2 === 0) {
      evaluate(remaining, -1);
      return;
    }
    for (let atom = 0; atom < atomCount; atom++) {
      if (traits[atom].isHydrogen && skipHydrogenUnpaired) continue;
      evaluate(remaining - 1, atom);
    }
  }

  function shellOf(atom: number, unpairedAtom: number): number {
    return 2 * bondOrderSum[atom] + 2 * lonePairs[atom] + (atom === unpairedAtom ? 1 : 0);
  }

  function evaluate(remaining: number, unpairedAtom: number): void {
    for (let atom = 0; atom < atomCount; atom++) lonePairs[atom] = 0;
    let left = remaining;
    for (let k = 0; k < atomCount; k++) {
      if (left < 2) break;
      const atom = fillOrder[k];
      const need = fullShellOf[atom] - shellOf(atom, unpairedAtom);
      if (need <= 1) continue;
      const pairs = Math.min(need >> 1, left >> 1);
      lonePairs[atom] += pairs;
      left -= 2 * pairs;
    }
    for (let k = 0; k < expansionCount; k++) {
      if (left < 2) break;
      const atom = expansionOrder[k];
      const roomInShell = (shellCapacityOf[atom] - shellOf(atom, unpairedAtom)) >> 1;
      const roomForDomains = maxDomainsOf[atom] - degree[atom] - lonePairs[atom] - (atom === unpairedAtom ? 1 : 0);
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
      const shell = shellOf(atom, unpairedAtom);
      if (shell > shellCapacityOf[atom]) return;
      if (shell > 8) {
        if (degree[atom] <= 1) return; // outer atoms never expand
        expanded++;
      }
      if (degree[atom] > 1) {
        const domains = degree[atom] + lonePairs[atom] + (atom === unpairedAtom ? 1 : 0);
        if (domains > maxDomainsOf[atom]) return;
      }
      // B, Be and Al may stay short of an octet as centres (BF3), never as outer atoms.
      const fullShell = fullShellOf[atom];
      if ((mustCompleteOf[atom] === 1 || degree[atom] <= 1) && shell < fullShell) shellDeficit += fullShell - shell;
      const formal = valenceOf[atom] - 2 * lonePairs[atom] - (atom === unpairedAtom ? 1 : 0) - bondOrderSum[atom];
      sumAbs += Math.abs(formal);
      sumSquare += formal * formal;
      weighted += formal * electronegativityOf[atom];
    }
    if (isRadical && shellDeficit > 0) shellDeficit -= 1; // an odd count leaves one atom short by one
    const chargeTimesElectronegativity = Math.round(weighted * 1000) / 1000;
    // Compared field by field (as compareScores does): most leaves of the search lose.
    let comparison = -1;
    if (hasBest) {
      comparison =
        shellDeficit - bestShellDeficit ||
        sumAbs - bestSumAbs ||
        sumSquare - bestSumSquare ||
        expanded - bestExpanded ||
        chargeTimesElectronegativity - bestWeighted;
    }
    if (comparison > 0) return;
    if (tiedLeaves !== undefined) {
      if (comparison < 0) tiedLeaves.length = 0;
      if (tiedLeaves.length < tiedLimit) {
        tiedLeaves.push({ orders: bondOrders.slice(0, bondCount), lonePairs: lonePairs.slice(0, atomCount), unpairedAtom });
      }
    }
    let spread = 0;
    for (let bond = 0; bond < bondCount; bond++) spread += bondOrders[bond] * bondOrders[bond];
    if (comparison === 0) {
      resonanceForms++;
      // Equally good forms are all counted; the one drawn spreads its bonds most evenly (H-N=N=N
      // rather than H-N-N#N), as chemists draw the major form.
      if (!(spread < bestSpread)) return;
    } else {
      resonanceForms = 1;
    }
    hasBest = true;
    bestShellDeficit = shellDeficit;
    bestSumAbs = sumAbs;
    bestSumSquare = sumSquare;
    bestExpanded = expanded;
    bestWeighted = chargeTimesElectronegativity;
    bestSpread = spread;
    bestUnpaired = unpairedAtom;
    for (let bond = 0; bond < bondCount; bond++) bestOrders[bond] = bondOrders[bond];
    for (let atom = 0; atom < atomCount; atom++) bestLonePairs[atom] = lonePairs[atom];
  }

  let running = false;
  const lewisSearch: LewisSearch = {
    choose(skeleton, charge) {
      if (running) return createLewisSearch().choose(skeleton, charge);
      running = true;
      try {
        return runSearch(skeleton, charge);
      } finally {
        running = false;
      }
    },
    tiedStructures(skeleton, charge, limit) {
      if (running) return createLewisSearch().tiedStructures(skeleton, charge, limit);
      running = true;
      const leaves: TiedLeaf[] = [];
      tiedLeaves = leaves;
      tiedLimit = Math.max(0, limit);
      try {
        const outcome = runSearch(skeleton, charge);
        if (!outcome.ok) return [];
        const traits = skeleton.symbols.map((symbol) => atomTraits(symbol));
        return leaves.map((leaf) => graphOf(skeleton.symbols, traits, leaf.orders, leaf.lonePairs, leaf.unpairedAtom));
      } finally {
        tiedLeaves = undefined;
        running = false;
      }
    },
  };
  return lewisSearch;
}

/**
 * The search the analysis uses: one per process, its scratch growing to the largest species seen
 * (a few typed arrays of that many atoms and bonds).
 */
const processSearch = createLewisSearch();

/** Equivalent resonance forms of `skeleton` with net `charge` (see {@link LewisSearch.tiedStructures}). */
export function tiedLewisStructures(skeleton: Skeleton, charge: number, limit: number): readonly MolecularGraph[] {
  return processSearch.tiedStructures(skeleton, charge, limit);
}

/** The best Lewis structure of `skeleton` with net `charge`, or why there is none. */
export function chooseLewisStructure(skeleton: Skeleton, charge: number): LewisOutcome {
  return processSearch.choose(skeleton, charge);
}
