/**
 * The equivalent Lewis structures of an analysed species, so that a diagram can show each one,
 * found the way the analysis counted them: for a structure read from SMILES (or a name that
 * stands for one), the ways to place its double bonds again (Kekulé structures, a charge traded
 * for a double bond); for a formula, the structures of its skeleton that tie with the chosen
 * one on every check of the Lewis search. The chosen structure always comes first.
 */
import { countEquivalentStructures } from "../../chemistry/analysis/equivalentStructures";
import { tiedLewisStructures } from "../../chemistry/lewis/chooseLewisStructure";
import type { GraphAtom, MolecularGraph, SpeciesAnalysis } from "../../chemistry/types";

/** More forms than this are counted by the analysis but not listed one by one. */
export const MAX_LISTED_FORMS = 24;

/**
 * The chosen structure followed by the other equivalent forms (at most {@link MAX_LISTED_FORMS}).
 * A species with one structure, or one whose forms cannot be listed within bounds, gets its
 * chosen structure alone.
 */
export function equivalentForms(analysis: SpeciesAnalysis): readonly MolecularGraph[] {
  const chosen = analysis.graph;
  if (analysis.resonanceForms <= 1) return [chosen];
  const fromStructure = analysis.reading.notation === "smiles" || analysis.reading.smiles !== undefined;
  const forms = fromStructure ? rearrangedDoubleBonds(chosen) : tiedStructures(analysis);
  // The forms must include the chosen structure, or they are not this species' forms.
  if (!forms.some((form) => sameStructure(form, chosen))) return [chosen];
  return [chosen, ...forms.filter((form) => !sameStructure(form, chosen))].slice(0, MAX_LISTED_FORMS);
}

function tiedStructures(analysis: SpeciesAnalysis): readonly MolecularGraph[] {
  const skeleton = {
    symbols: analysis.graph.atoms.map((atom) => atom.symbol),
    bonds: analysis.graph.bonds.map((bond) => [bond.from, bond.to] as const),
  };
  return tiedLewisStructures(skeleton, analysis.reading.charge, MAX_LISTED_FORMS + 1);
}

function rearrangedDoubleBonds(graph: MolecularGraph): readonly MolecularGraph[] {
  const forms: MolecularGraph[] = [];
  countEquivalentStructures(graph.atoms, graph.bonds, (orders) => {
    if (forms.length <= MAX_LISTED_FORMS) forms.push(withOrders(graph, orders));
  });
  return forms;
}

/** The graph with new bond orders: an atom that gains a bond order gives up a lone pair and a negative charge. */
function withOrders(graph: MolecularGraph, orders: readonly number[]): MolecularGraph {
  const gained = graph.atoms.map(() => 0);
  const bonds = graph.bonds.map((bond, index) => {
    const change = orders[index] - bond.order;
    gained[bond.from] += change;
    gained[bond.to] += change;
    return change === 0 ? bond : { ...bond, order: orders[index] };
  });
  const atoms = graph.atoms.map((atom, index): GraphAtom =>
    gained[index] === 0 ? atom : { ...atom, lonePairs: atom.lonePairs - gained[index], formalCharge: atom.formalCharge + gained[index] },
  );
  return { ...graph, atoms, bonds };
}

function sameStructure(first: MolecularGraph, second: MolecularGraph): boolean {
  if (first.atoms.length !== second.atoms.length || first.bonds.length !== second.bonds.length) return false;
  for (let k = 0; k < first.bonds.length; k++) if (first.bonds[k].order !== second.bonds[k].order) return false;
  for (let k = 0; k < first.atoms.length; k++) {
    const a = first.atoms[k];
    const b = second.atoms[k];
    if (a.lonePairs !== b.lonePairs || a.unpairedElectrons !== b.unpairedElectrons || a.formalCharge !== b.formalCharge) return false;
  }
  return true;
}
