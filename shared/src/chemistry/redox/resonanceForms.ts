/**
 * Other resonance forms of a drawn Lewis structure that a chemist would also draw: the same atoms
 * and bonds, every atom with the same number of electrons around it, the electrons only moved
 * between bonds and lone pairs, formal charges no larger in total than the drawn form's and none
 * beyond ±1 (unless the drawn form has one). N2O is drawn N≡N⁺–O⁻; ⁻N=N⁺=O is such a form,
 * ²⁻N–N⁺≡O is not. Oxidation states per atom can differ between these forms even though each
 * element's total cannot.
 */
import { elementBySymbol } from "../elements";
import type { GraphBond, MolecularGraph } from "../types";

/** Bonds whose order may change: beyond this many the forms are not searched. */
const MAX_FLEXIBLE_BONDS = 12;
/** Search steps before giving up: a hover never waits on a large ring system. */
const MAX_STEPS = 50_000;

/**
 * The other forms of `graph` (not the drawn one), at most `limit`; undefined when they were not
 * searched (a radical, too many bonds that could change, the search cut short).
 */
export function otherResonanceForms(graph: MolecularGraph, limit = 32): readonly MolecularGraph[] | undefined {
  const atoms = graph.atoms;
  if (atoms.some((atom) => atom.unpairedElectrons > 0)) return undefined;
  const valence = atoms.map((atom) => elementBySymbol(atom.symbol)?.valenceElectrons);
  if (valence.some((value) => value === undefined)) return undefined;
  // Electrons around each atom, in pairs: kept fixed, so no atom loses or gains its octet.
  const pairs = atoms.map((atom) => atom.lonePairs);
  for (const bond of graph.bonds) {
    pairs[bond.from] += bond.order;
    pairs[bond.to] += bond.order;
  }
  const drawnCharges = atoms.map((atom) => Math.abs(atom.formalCharge));
  const drawnTotal = drawnCharges.reduce((sum, value) => sum + value, 0);
  const largestAllowed = Math.max(1, ...drawnCharges);
  // A bond to an atom with a single pair around it (hydrogen) stays single.
  const flexible = graph.bonds.map((_, index) => index).filter((index) => isFlexible(graph.bonds[index], pairs));
  if (flexible.length > MAX_FLEXIBLE_BONDS) return undefined;
  const orderSum = atoms.map(() => 0);
  for (const bond of graph.bonds) {
    if (!isFlexible(bond, pairs)) {
      orderSum[bond.from] += bond.order;
      orderSum[bond.to] += bond.order;
    }
  }
  const target = flexible.reduce((sum, index) => sum + graph.bonds[index].order, 0);
  const orders = graph.bonds.map((bond) => bond.order);
  const forms: MolecularGraph[] = [];
  let steps = 0;
  let cut = false;

  const leaf = (): void => {
    if (flexible.every((index) => orders[index] === graph.bonds[index].order)) return;
    let total = 0;
    const charges: number[] = [];
    for (let index = 0; index < atoms.length; index++) {
      const lonePairs = pairs[index] - orderSum[index];
      const charge = valence[index]! - 2 * lonePairs - orderSum[index];
      if (Math.abs(charge) > largestAllowed) return;
      total += Math.abs(charge);
      charges.push(charge);
    }
    if (total > drawnTotal) return;
    forms.push({
      ...graph,
      atoms: atoms.map((atom, index) => ({ ...atom, lonePairs: pairs[index] - orderSum[index], formalCharge: charges[index] })),
      bonds: graph.bonds.map((bond, index) => ({ ...bond, order: orders[index] })),
    });
  };

  const visit = (position: number, placed: number): void => {
    if (forms.length >= limit || cut) return;
    if (++steps > MAX_STEPS) {
      cut = true;
      return;
    }
    const left = flexible.length - position;
    if (placed + left > target || placed + 3 * left < target) return;
    if (position === flexible.length) {
      leaf();
      return;
    }
    const bond = graph.bonds[flexible[position]];
    for (let order = 1; order <= 3; order++) {
      if (orderSum[bond.from] + order > pairs[bond.from] || orderSum[bond.to] + order > pairs[bond.to]) break;
      orders[flexible[position]] = order;
      orderSum[bond.from] += order;
      orderSum[bond.to] += order;
      visit(position + 1, placed + order);
      orderSum[bond.from] -= order;
      orderSum[bond.to] -= order;
    }
    orders[flexible[position]] = graph.bonds[flexible[position]].order;
  };

  visit(0, 0);
  return cut ? undefined : forms;
}

function isFlexible(bond: GraphBond, pairs: readonly number[]): boolean {
  return pairs[bond.from] > 1 && pairs[bond.to] > 1;
}
