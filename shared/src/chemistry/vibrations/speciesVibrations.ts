/**
 * The vibrational analysis of an analysed species, from the same 3D model and point group that
 * polarity uses, and only where that symmetry can be trusted: a cage or ring whose model comes
 * out less symmetric than the real molecule (S8, P4O10) would predict too many bands, so it gets
 * a reason instead of numbers.
 */
import { shapeOf, symmetrySearchOf } from "../analysis/shape3d";
import { singleStructureFor } from "../analysis/structuresByFormula";
import type { MolecularGraph, SpeciesAnalysis } from "../types";
import { measuredFundamentalsFor, type MeasuredFundamentals } from "./measuredFundamentals";
import { vibrationalModes, type VibrationalModesResult } from "./normalModes";

const results = new WeakMap<SpeciesAnalysis, VibrationalModesResult>();

/** The normal modes of an analysed species, or the reason they are not predicted. Worked out once per analysis. */
export function vibrationsOf(analysis: SpeciesAnalysis): VibrationalModesResult {
  const known = results.get(analysis);
  if (known) return known;
  const result = computeVibrations(analysis);
  results.set(analysis, result);
  return result;
}

/** Measured gas-phase fundamentals of the species, where they are listed for the analysed model. */
export function measuredFundamentalsOf(analysis: SpeciesAnalysis): MeasuredFundamentals | undefined {
  const result = vibrationsOf(analysis);
  return result.ok ? measuredFundamentalsFor(analysis.reading.composition, analysis.reading.charge, result.value) : undefined;
}

/** The point group of the real molecule where it is known apart from the model (cages and rings such as S8). */
export function realPointGroupOf(analysis: SpeciesAnalysis): string | undefined {
  return singleStructureFor(analysis.reading.composition, analysis.reading.charge)?.pointGroup;
}

function computeVibrations(analysis: SpeciesAnalysis): VibrationalModesResult {
  const { graph } = analysis;
  if (graph.atoms.length < 2) return { ok: false, reason: "a single atom has no vibrations" };
  if (!connected(graph)) {
    return { ok: false, reason: "the species is in separate pieces, each with its own vibrations; analyse each piece on its own" };
  }
  const shape = shapeOf(analysis);
  const tooLarge = shape.coordinates.tooLarge;
  if (tooLarge !== undefined) return { ok: false, reason: lowerFirst(tooLarge) };
  const group = shape.pointGroup;
  if (group === undefined) return { ok: false, reason: "the point group of the model could not be found" };
  const real = realPointGroupOf(analysis);
  if (real !== undefined && real !== group) {
    return {
      ok: false,
      reason: `the model coordinates reach only ${group} symmetry, while the real molecule is ${real}; band counts from the model would be too many, so none are given`,
    };
  }
  const atoms = shape.coordinates.atoms.map((atom) => ({ element: atom.symbol, position: atom.position }));
  const bonds = graph.bonds.map((bond): readonly [number, number] => [bond.from, bond.to]);
  return vibrationalModes(atoms, bonds, { pointGroup: group, search: symmetrySearchOf(shape) });
}

function connected(graph: MolecularGraph): boolean {
  const neighbours: number[][] = graph.atoms.map(() => []);
  for (const bond of graph.bonds) {
    if (bond.from < neighbours.length && bond.to < neighbours.length) {
      neighbours[bond.from].push(bond.to);
      neighbours[bond.to].push(bond.from);
    }
  }
  const seen = new Set<number>([0]);
  const queue = [0];
  while (queue.length > 0) {
    for (const next of neighbours[queue.pop()!]) {
      if (!seen.has(next)) {
        seen.add(next);
        queue.push(next);
      }
    }
  }
  return seen.size === graph.atoms.length;
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}
