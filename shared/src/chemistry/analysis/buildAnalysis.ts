/**
 * Turn a chosen Lewis structure into everything the writer sees: centres, polarity, measured
 * angles and plain-language warnings.
 */
import { graphIndex } from "../graphIndex";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { LewisStructure } from "../lewis/chooseLewisStructure";
import type { CentreAnalysis, PolarityVerdict, SpeciesAnalysis, SpeciesReading } from "../types";
import { describeCentre, type CentreDetail, type SharedCentreDetail } from "../vsepr/analyzeCentre";
import { measuredAnglesFor } from "../vsepr/measuredAngles";
import { oddElectronSite, type OddElectronSite } from "../vsepr/oddElectron";
import { judgePolarity } from "../vsepr/polarity";
import { polarityFromShape, shapeOf } from "./shape3d";

export function buildAnalysis(
  reading: SpeciesReading,
  structure: LewisStructure,
  mainCentre: number | undefined,
  /** Notes the caller knows about the species (isomers sharing its formula). */
  notes: readonly string[] = [],
): SpeciesAnalysis {
  const { graph } = structure;
  const atoms = graph.atoms;
  const atomCount = atoms.length;
  const radical = structure.valenceElectrons % 2 === 1;
  // Each centre's description as worked out (shared by centres alike) and its own index; the
  // centres themselves are put together the first time anyone asks for them.
  const descriptions: CentreAnalysis[] = [];
  const indices: number[] = [];
  let allStericFourOrLess = true;
  for (let index = 0; index < atomCount; index++) {
    const described = describeCentre(graph, index, radical);
    if (!described) continue;
    descriptions.push(described.alike);
    indices.push(index);
    if (described.alike.stericNumber > 4) allStericFourOrLess = false;
  }

  const orderSums = graphIndex(graph).bondOrderSums;
  let electronDeficient = false;
  let expandedOctet = false;
  const warnings: string[] = [];
  for (let index = 0; index < atomCount; index++) {
    const atom = atoms[index];
    const shell = 2 * orderSums[index] + 2 * atom.lonePairs + atom.unpairedElectrons;
    // Most atoms of a large molecule have a full octet: look up traits only for the others.
    if (shell === 8) continue;
    if (shell > 8) {
      expandedOctet = true;
      continue;
    }
    const traits = atomTraits(atom.symbol);
    if (atomCount > 1 && !traits.isHydrogen && !traits.mustCompleteShell) {
      electronDeficient = true;
      warnings.push(
        `${atom.symbol} is electron-deficient: it has only ${shell} electrons around it, and it readily accepts a lone pair from a Lewis base.`,
      );
    }
  }

  // A neutral molecule drawn with a doubly charged atom is almost always the wrong skeleton
  // (groups hung on the wrong atom); the writer must hear of it.
  if (reading.charge === 0 && atomCount > 1) {
    for (let index = 0; index < atomCount; index++) {
      const charge = atoms[index].formalCharge;
      if (Math.abs(charge) < 2) continue;
      warnings.push(
        `${atoms[index].symbol} (atom ${index}) carries a formal charge of ${charge > 0 ? "+" : ""}${charge}: unusual in a neutral molecule, so this may not be the structure meant. Check the formula, or write a structural formula or SMILES.`,
      );
    }
  }
  if (reading.notation !== "smiles" && structure.graph.bonds.length > 0) {
    const isomeric = cisTransBond(structure.graph);
    if (isomeric) {
      warnings.push(
        `${isomeric}: cis and trans isomers both exist (the groups on its two ends on the same side or on opposite sides). The model draws one of them; each atom's shape is the same in both, but the polarity can differ. Write SMILES with / and \\ to choose one.`,
      );
    }
  }
  if (radical) {
    const holder = atoms.findIndex((atom) => atom.unpairedElectrons > 0);
    const symbol = atoms[holder]?.symbol ?? "one atom";
    warnings.push(
      `Odd number of valence electrons (${structure.valenceElectrons}): a radical, with the unpaired electron drawn on ${symbol}. ` +
        oddElectronNote(symbol, descriptions[indices.indexOf(holder)], holder < 0 ? undefined : oddElectronSite(graph, holder)),
    );
  }
  if (expandedOctet && allStericFourOrLess) {
    warnings.push(
      "Drawn with multiple bonds to the central atom to minimise formal charges (an expanded octet); an octet structure with separated charges describes the bonding as well. The shape is the same either way.",
    );
  }
  if (atomCount === 2 && atoms.every((a) => a.symbol === "O") && reading.charge === 0) {
    warnings.push("The Lewis structure shows O=O with all electrons paired, but ground-state O2 has two unpaired electrons (a triplet).");
  }
  for (const centre of descriptions) {
    if (centre.stericNumber === 7 && centre.lonePairs === 1) {
      warnings.push(
        `${centre.atom}: with six bonds and one lone pair the real molecule is fluxional; gas-phase XeF6 is a distorted octahedron rather than a clean pentagonal pyramid.`,
      );
    }
  }
  if (descriptions.length === 0 && atomCount === 2) {
    warnings.push("A diatomic species is linear by definition; there is no central atom.");
  }
  if (atomCount === 1) warnings.push("A single atom or monatomic ion has no molecular shape.");
  for (const note of notes) warnings.push(note);

  let resonanceForms = structure.resonanceForms;
  if (!Number.isFinite(resonanceForms) || resonanceForms < 1) resonanceForms = 1;

  const analysis = {
    reading,
    valenceElectrons: structure.valenceElectrons,
    radical,
    electronDeficient,
    expandedOctet,
    graph,
    resonanceForms,
  } as Record<PropertyKey, unknown>;
  // `centres` and `polarity` are worked out the first time they are read (one centre: ideal
  // directions settle polarity at once; several: the whole 3D model is needed, which costs
  // milliseconds). The getters are shared by every analysis and find what they need in a hidden
  // property: getters written into an object literal would be new functions for each analysis
  // and put the object in the slow dictionary mode, which costs more than the rest of a small
  // analysis to make and to keep.
  Object.defineProperty(analysis, "centres", CENTRES_ON_FIRST_READ);
  Object.defineProperty(analysis, "polarity", POLARITY_ON_FIRST_READ);
  analysis.measuredAngles = measuredAnglesFor(reading.composition, reading.charge);
  // Kept with the memoised analysis: copied to arrays of their final size, since an array grown
  // by push keeps room for more.
  analysis.warnings = warnings.length === 0 ? warnings : warnings.slice();
  const pending: PendingParts = { descriptions: descriptions.slice(), indices: indices.slice(), mainCentre };
  Object.defineProperty(analysis, PENDING, { value: pending, writable: true, configurable: true });
  return analysis as unknown as SpeciesAnalysis;
}

/**
 * How the shape counts the odd electron on a centre without lone pairs, where the count decides
 * the shape; elsewhere, the general caution.
 */
function oddElectronNote(symbol: string, holder: CentreAnalysis | undefined, site: OddElectronSite | undefined): string {
  const general = "The single electron is a weak domain, so small radicals can be flatter or wider than predicted.";
  if (holder === undefined || holder.lonePairs > 0) return general;
  if (site === "two-neighbours" && holder.stericNumber === 3) {
    return (
      `With only two neighbours and no lone pair, ${symbol} keeps it in an orbital of its own, so it is counted as a domain ` +
      "(steric number 3) and bends the atom; a single electron repels less than a pair, so the real angle opens past the ideal."
    );
  }
  if (site === "electronegative-neighbours" && holder.stericNumber === 4) {
    return (
      `The neighbours of ${symbol} are more electronegative than it and draw p character into their bonds, leaving the electron ` +
      "an orbital with s character of its own: it is counted as a domain (steric number 4) and the atom is pyramidal, " +
      "flatter than with a lone pair."
    );
  }
  if (site === "p-orbital" && holder.bondingDomains === 3 && holder.stericNumber === 3) {
    return (
      `The three bonds of ${symbol} leave a p orbital free, and the electron sits there without a position of its own, ` +
      "so it is not counted as a domain and the atom is drawn flat; the real atom may pucker a little."
    );
  }
  return general;
}

/** What the first read of `centres` or `polarity` needs that the analysis does not show. */
interface PendingParts {
  readonly descriptions: readonly CentreAnalysis[];
  readonly indices: readonly number[];
  readonly mainCentre: number | undefined;
}

const PENDING = Symbol("pending analysis parts");

function pendingParts(analysis: SpeciesAnalysis): PendingParts {
  return (analysis as unknown as Record<symbol, PendingParts>)[PENDING];
}

const CENTRES_ON_FIRST_READ: PropertyDescriptor = {
  get(this: SpeciesAnalysis): readonly CentreAnalysis[] {
    const { descriptions, indices } = pendingParts(this);
    const centres = ownCentres(descriptions, indices);
    Object.defineProperty(this, "centres", { value: centres, enumerable: true });
    return centres;
  },
  enumerable: true,
  configurable: true,
};

const POLARITY_ON_FIRST_READ: PropertyDescriptor = {
  get(this: SpeciesAnalysis): PolarityVerdict {
    const verdict = judge(this, pendingParts(this));
    Object.defineProperty(this, "polarity", { value: verdict, enumerable: true });
    return verdict;
  },
  enumerable: true,
  configurable: true,
};

/**
 * One centre: judged from its ideal directions. Its ligands and sites are worked out again here
 * rather than kept from the analysis, so that a memoised analysis does not hold on to them.
 */
function judge(analysis: SpeciesAnalysis, parts: PendingParts): PolarityVerdict {
  const { graph, reading } = analysis;
  if (parts.descriptions.length > 1) return polarityFromShape(graph, shapeOf(analysis), reading.charge);
  const details: CentreDetail[] = [];
  if (parts.descriptions.length === 1) {
    const index = parts.indices[0];
    const described = describeCentre(graph, index, analysis.radical);
    if (described) details.push(ownDetail(described, index));
  }
  return judgePolarity(graph, details, parts.mainCentre, reading.charge);
}

/** Each centre as its own object: a shared description gets the centre's own index. */
function ownCentres(descriptions: readonly CentreAnalysis[], indices: readonly number[]): CentreAnalysis[] {
  const centres = new Array<CentreAnalysis>(descriptions.length);
  for (let k = 0; k < descriptions.length; k++) {
    const alike = descriptions[k];
    centres[k] = alike.index === indices[k] ? alike : { ...alike, index: indices[k] };
  }
  return centres;
}

function ownDetail(described: SharedCentreDetail, index: number): CentreDetail {
  const { alike, ligands, sites } = described;
  return { centre: alike.index === index ? alike : { ...alike, index }, ligands, sites };
}

/**
 * The first open-chain double bond whose two ends each carry two different things (a group and a
 * lone pair, or two groups of different elements), written as "N=N"; undefined when none.
 */
function cisTransBond(graph: SpeciesAnalysis["graph"]): string | undefined {
  if (!graph.bonds.some((bond) => bond.order === 2)) return undefined;
  const neighbours: number[][] = graph.atoms.map(() => []);
  for (const bond of graph.bonds) {
    neighbours[bond.from].push(bond.to);
    neighbours[bond.to].push(bond.from);
  }
  const endIsStereogenic = (end: number, partner: number): boolean => {
    const others = neighbours[end].filter((atom) => atom !== partner);
    if (others.length === 1) return graph.atoms[end].lonePairs > 0;
    return others.length === 2 && graph.atoms[others[0]].symbol !== graph.atoms[others[1]].symbol;
  };
  for (const bond of graph.bonds) {
    if (bond.order !== 2) continue;
    if (!endIsStereogenic(bond.from, bond.to) || !endIsStereogenic(bond.to, bond.from)) continue;
    if (joinedOtherwise(neighbours, bond.from, bond.to)) continue;
    return `${graph.atoms[bond.from].symbol}=${graph.atoms[bond.to].symbol}`;
  }
  return undefined;
}

/** True when `a` and `b` are connected by a path that avoids their own bond (a ring bond). */
function joinedOtherwise(neighbours: readonly (readonly number[])[], a: number, b: number): boolean {
  const seen = new Set<number>([a]);
  const queue = neighbours[a].filter((atom) => atom !== b);
  for (const atom of queue) seen.add(atom);
  while (queue.length > 0) {
    const atom = queue.pop()!;
    if (atom === b) return true;
    for (const next of neighbours[atom]) {
      if (seen.has(next)) continue;
      seen.add(next);
      queue.push(next);
    }
  }
  return false;
}
