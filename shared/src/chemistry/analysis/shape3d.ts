/**
 * The 3D side of an analysis: model coordinates, the point group found in them, and polarity
 * judged from the whole molecule's bond dipoles. Worked out on demand and kept per analysis,
 * since editors ask for it only when a view or an export needs it.
 */
import { applyDoubleBondStereo } from "../geometry/applyDoubleBondStereo";
import { buildCoordinates, type MolecularCoordinates } from "../geometry/buildCoordinates";
import { add, norm, normalize, scale, sub, type Vec3 } from "../geometry/vectors";
import { atomTraits } from "../lewis/electronBookkeeping";
import { searchPointGroup, type PointGroupSearch } from "../symmetry/pointGroup";
import type { MolecularGraph, PolarityVerdict, SpeciesAnalysis } from "../types";

export interface SpeciesShape {
  readonly coordinates: MolecularCoordinates;
  /** Schoenflies symbol of the model geometry, e.g. "C2v"; undefined if the search failed. */
  readonly pointGroup: string | undefined;
}

const shapes = new WeakMap<SpeciesAnalysis, SpeciesShape>();

/** Groups whose symmetry allows a permanent dipole: C1, Cs, Cn, Cnv and C∞v. */
export function pointGroupAllowsDipole(symbol: string): boolean {
  return /^(C1|Cs|C\d+|C\d+v|C∞v)$/.test(symbol);
}

/** Coordinates and point group of an analysed species. */
export function shapeOf(analysis: SpeciesAnalysis): SpeciesShape {
  const cached = shapes.get(analysis);
  if (cached) return cached;
  const shape = computeShape(analysis.graph, analysis.radical);
  shapes.set(analysis, shape);
  return shape;
}

export function computeShape(graph: MolecularGraph, radical: boolean): SpeciesShape {
  const built = buildCoordinates(graph, radical);
  if (built.tooLarge !== undefined) return { coordinates: built, pointGroup: undefined };
  const coordinates = applyDoubleBondStereo(graph, built);
  const search = searchPointGroup(coordinates.atoms.map((atom) => ({ element: atom.symbol, position: atom.position })));
  const shape = { coordinates, pointGroup: search.result.ok ? search.result.value.symbol : undefined };
  searches.set(shape, search);
  return shape;
}

/** The symmetry search behind each shape, kept for analyses that use its elements (vibrations). */
const searches = new WeakMap<SpeciesShape, PointGroupSearch>();

/** The symmetry search the shape's point group came from, if the shape had one. */
export function symmetrySearchOf(shape: SpeciesShape): PointGroupSearch | undefined {
  return searches.get(shape);
}

/** Weight of one lone pair against a bond dipole of one electronegativity unit (a model choice). */
const LONE_PAIR_WEIGHT = 0.5;
/** Below this summed dipole (electronegativity units) the model calls a molecule nonpolar. */
const NEGLIGIBLE_DIPOLE = 0.02;

/**
 * Polarity of a molecule with several centres: the point group decides whether a dipole is
 * allowed; the vector sum of bond dipoles and lone pairs gives the size of the model estimate.
 */
export function polarityFromShape(graph: MolecularGraph, shape: SpeciesShape, charge: number): PolarityVerdict {
  const tooLarge = shape.coordinates.tooLarge;
  if (tooLarge !== undefined) return { polar: false, undetermined: true, reason: lowerFirst(tooLarge), dipoleEstimate: 0 };
  const positions = shape.coordinates.atoms.map((atom) => atom.position);
  let sum: Vec3 = [0, 0, 0];
  const electronegativity = effectiveElectronegativities(graph);
  for (const bond of graph.bonds) {
    const difference = electronegativity[bond.to] - electronegativity[bond.from];
    if (difference === 0) continue;
    sum = add(sum, scale(normalize(sub(positions[bond.to], positions[bond.from])), difference));
  }
  for (const lonePair of shape.coordinates.lonePairs) {
    sum = add(sum, scale(lonePair.direction, (LONE_PAIR_WEIGHT * lonePair.electrons) / 2));
  }
  const dipoleEstimate = Math.round(norm(sum) * 100) / 100;
  const group = shape.pointGroup;
  // Symmetry decides; the summed dipole is the model's estimate of its size. (Pairwise
  // electronegativity differences cancel along hydrocarbon chains, so the sum alone would call
  // propyne or toluene nonpolar.)
  const polar = group ? pointGroupAllowsDipole(group) : norm(sum) > NEGLIGIBLE_DIPOLE;
  const reason = !group
    ? polar
      ? "bond dipoles and lone pairs do not cancel"
      : "bond dipoles cancel"
    : polar
      ? `the model geometry has ${group} symmetry, which allows a permanent dipole`
      : `bond dipoles cancel by symmetry (the model geometry is ${group})`;
  const verdict: PolarityVerdict = { polar, reason, dipoleEstimate };
  if (charge === 0) return verdict;
  return {
    ...verdict,
    reason: `an ion (net charge ${charge > 0 ? "+" : ""}${charge}); its charge distribution is ${polar ? "asymmetric" : "symmetric"}: ${reason}`,
  };
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}

/** Each pi bond makes a carbon more electronegative (sp 3.29 > sp2 2.75 > sp3 2.48 on hybrid scales). */
const CARBON_SHIFT_PER_PI_BOND = 0.1;

/**
 * Pauling electronegativities, with carbon nudged up by its pi bonds so that sp and sp2 carbons
 * pull harder than sp3 ones (the dipole of propyne or toluene comes from that difference).
 */
function effectiveElectronegativities(graph: MolecularGraph): number[] {
  const values = graph.atoms.map((atom) => atomTraits(atom.symbol).electronegativity);
  for (const bond of graph.bonds) {
    if (bond.order < 2) continue;
    for (const atom of [bond.from, bond.to]) {
      if (graph.atoms[atom].symbol === "C") values[atom] += CARBON_SHIFT_PER_PI_BOND * (bond.order - 1);
    }
  }
  return values;
}
