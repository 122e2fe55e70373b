/**
 * Test input only: a Lewis-structure graph from SMILES, with hydrogens made explicit and lone
 * pairs filled from the valence-electron count, for multi-centre molecules the species reader
 * does not analyse yet. Radicals and odd electron counts are not handled; the inputs are
 * closed-shell organics.
 */
import { elementBySymbol } from "../../shared/src/index";
import { kekulize, parseSmiles } from "../../shared/src/chemistry/smiles/index";
import type { GraphAtom, GraphBond, MolecularGraph } from "../../shared/src/chemistry/types";

export function graphFromSmiles(smiles: string): MolecularGraph {
  const read = kekulize(parseSmiles(smiles));
  if (!read.ok) throw new Error(`${smiles}: ${read.problem.message}`);
  const heavy = read.value.atoms;
  const bonds: GraphBond[] = read.value.bonds.map((b) => ({ from: b.from, to: b.to, order: b.order }));
  const symbols = heavy.map((a) => a.symbol);
  heavy.forEach((atom, index) => {
    for (let h = 0; h < atom.hydrogens; h++) {
      bonds.push({ from: index, to: symbols.length, order: 1 });
      symbols.push("H");
    }
  });
  const charges = [...heavy.map((a) => a.charge), ...symbols.slice(heavy.length).map(() => 0)];
  const atoms: GraphAtom[] = symbols.map((symbol, index) => {
    const bonded = bonds.filter((b) => b.from === index || b.to === index).reduce((sum, b) => sum + b.order, 0);
    const spare = elementBySymbol(symbol)!.valenceElectrons - charges[index] - bonded;
    if (spare < 0 || spare % 2 !== 0) throw new Error(`${smiles}: atom ${index} has ${spare} spare electrons`);
    return { symbol, lonePairs: spare / 2, unpairedElectrons: 0, formalCharge: charges[index] };
  });
  return { atoms, bonds };
}
