/**
 * A SMILES string already says which atoms bond, with what order and charge; the Lewis structure
 * follows directly: each atom's remaining valence electrons are its lone pairs (and an odd one is
 * a radical). Aromatic rings are read as one Kekulé structure.
 */
import { metalCentreProblem } from "./metalCentre";
import { countEquivalentStructures } from "./equivalentStructures";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { LewisStructure } from "../lewis/chooseLewisStructure";
import { kekulize, parseSmiles, smilesFormula, smilesNetCharge } from "../smiles";
import { sharedAtom } from "../sharedAtoms";
import type { SmilesMolecule } from "../smiles";
import type { DoubleBondStereo, FormulaPart, GraphAtom, GraphBond, MolecularGraph, Problem, SpeciesReading } from "../types";

export interface SmilesStructure {
  readonly reading: SpeciesReading;
  readonly structure: LewisStructure;
}

export type SmilesOutcome =
  | { readonly ok: true; readonly value: SmilesStructure }
  | { readonly ok: false; readonly reading?: SpeciesReading; readonly problem: Problem };

/** Read a SMILES string (the whole of `text`, surrounding spaces aside) into a Lewis structure. */
export function smilesStructure(text: string): SmilesOutcome {
  const start = text.length - text.trimStart().length;
  const trimmed = text.trim();
  const parsed = parseSmiles(trimmed);
  if (!parsed.ok) return { ok: false, problem: shift(parsed.problem, start) };
  const writtenAtoms = parsed.value.atoms;
  const kekule = kekulize(parsed);
  if (!kekule.ok) return { ok: false, problem: shift(kekule.problem, start) };
  const molecule = kekule.value;

  // Written atoms first, then each atom's hydrogens as atoms of their own, in atom order.
  const heavyAtoms = molecule.atoms;
  const heavyCount = heavyAtoms.length;
  let atomCount = heavyCount;
  for (let index = 0; index < heavyCount; index++) atomCount += heavyAtoms[index].hydrogens;
  const symbols = new Array<string>(atomCount);
  const charges = new Array<number>(atomCount);
  const writtenBonds = molecule.bonds;
  const bonds = new Array<GraphBond>(writtenBonds.length + atomCount - heavyCount);
  for (let k = 0; k < writtenBonds.length; k++) {
    const bond = writtenBonds[k];
    bonds[k] = { from: bond.from, to: bond.to, order: bond.order };
  }
  let next = heavyCount;
  let nextBond = writtenBonds.length;
  for (let index = 0; index < heavyCount; index++) {
    const atom = heavyAtoms[index];
    symbols[index] = atom.symbol;
    charges[index] = atom.charge;
  }
  for (let index = 0; index < heavyCount; index++) {
    for (let k = heavyAtoms[index].hydrogens; k > 0; k--) {
      bonds[nextBond++] = { from: index, to: next, order: 1 };
      symbols[next] = "H";
      charges[next] = 0;
      next++;
    }
  }

  const composition = compositionOf(symbols);
  const charge = smilesNetCharge(molecule);
  const reading: SpeciesReading = {
    text: trimmed,
    range: { start, end: start + trimmed.length },
    notation: "smiles",
    composition,
    writtenSequence: composition,
    charge,
    formula: smilesFormula(molecule),
  };

  const metal = metalCentreProblem(trimmed, symbols.slice(0, heavyCount));
  if (metal) return { ok: false, reading, problem: metal };

  const orderSums = new Array<number>(atomCount).fill(0);
  for (let k = 0; k < bonds.length; k++) {
    const bond = bonds[k];
    orderSums[bond.from] += bond.order;
    orderSums[bond.to] += bond.order;
  }
  let electrons = 0;
  let sumAbs = 0;
  let sumSquare = 0;
  const atoms = new Array<GraphAtom>(atomCount);
  for (let index = 0; index < atomCount; index++) {
    const symbol = symbols[index];
    const charge = charges[index];
    const traits = atomTraits(symbol);
    electrons += traits.valenceElectrons - charge;
    const nonBonding = traits.valenceElectrons - charge - orderSums[index];
    const shell = 2 * orderSums[index] + Math.max(0, nonBonding);
    if (nonBonding < 0 || shell > traits.shellCapacity) {
      const element = traits.element;
      return {
        ok: false,
        reading,
        problem: {
          code: element.period <= 2 ? "octet-exceeded" : "no-valid-structure",
          message:
            element.period <= 2
              ? `${trimmed}: the ${element.name} atom written at position ${index + 1} would need more than ${traits.fullShell} electrons around it.`
              : `${trimmed}: the ${element.name} atom written at position ${index + 1} has more bonds than its electrons allow; check its charge.`,
        },
      };
    }
    sumAbs += Math.abs(charge);
    sumSquare += charge * charge;
    atoms[index] = sharedAtom(
      traits.element.atomicNumber,
      symbol,
      nonBonding >> 1,
      nonBonding & 1,
      charge,
      index < heavyCount && writtenAtoms[index].aromatic,
    );
  }

  return {
    ok: true,
    value: {
      reading,
      structure: {
        graph: withStereo({ atoms, bonds }, doubleBondStereo(molecule)),
        score: {
          shellDeficit: 0,
          sumAbsFormalCharge: sumAbs,
          sumSquareFormalCharge: sumSquare,
          expandedAtoms: 0,
          chargeTimesElectronegativity: 0,
        },
        resonanceForms: countEquivalentStructures(atoms, bonds),
        valenceElectrons: electrons,
      },
    },
  };
}

function compositionOf(symbols: readonly string[]): FormulaPart[] {
  const counts = new Map<string, number>();
  for (const symbol of symbols) counts.set(symbol, (counts.get(symbol) ?? 0) + 1);
  return [...counts.entries()].map(([symbol, count]) => ({ symbol, count }));
}

function shift(problem: Problem, offset: number): Problem {
  if (!problem.range || offset === 0) return problem;
  return { ...problem, range: { start: problem.range.start + offset, end: problem.range.end + offset } };
}

const flip = (mark: "/" | "\\"): "/" | "\\" => (mark === "/" ? "\\" : "/");

/**
 * cis/trans relations written with / and \ around double bonds: each mark is turned to point
 * outward from the double-bond atom; equal outward marks on both ends mean cis (F/C=C\F).
 */
function doubleBondStereo(molecule: SmilesMolecule): DoubleBondStereo[] {
  const relations: DoubleBondStereo[] = [];
  const outward = (atom: number, other: number): { neighbour: number; mark: "/" | "\\" } | undefined => {
    for (const bond of molecule.bonds) {
      if (!bond.direction) continue;
      if (bond.from === atom && bond.to !== other) return { neighbour: bond.to, mark: bond.direction };
      if (bond.to === atom && bond.from !== other) return { neighbour: bond.from, mark: flip(bond.direction) };
    }
    return undefined;
  };
  for (const bond of molecule.bonds) {
    if (bond.order !== 2) continue;
    const left = outward(bond.from, bond.to);
    const right = outward(bond.to, bond.from);
    if (!left || !right) continue;
    relations.push({
      atoms: [left.neighbour, bond.from, bond.to, right.neighbour],
      relation: left.mark === right.mark ? "cis" : "trans",
    });
  }
  return relations;
}

function withStereo(graph: MolecularGraph, stereo: DoubleBondStereo[]): MolecularGraph {
  return stereo.length > 0 ? { ...graph, doubleBondStereo: stereo } : graph;
}
