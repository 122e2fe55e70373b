/**
 * Turn a chosen Lewis structure into everything the writer sees: centres, polarity, measured
 * angles and plain-language warnings.
 */
import { graphIndex } from "../graphIndex";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { LewisStructure } from "../lewis/chooseLewisStructure";
import type { CentreAnalysis, MolecularGraph, PolarityVerdict, SpeciesAnalysis, SpeciesReading } from "../types";
import { describeCentre, type CentreDetail, type SharedCentreDetail } from "../vsepr/analyzeCentre";
import { measuredAnglesFor } from "../vsepr/measuredAngles";
import { judgePolarity } from "../vsepr/polarity";
import { polarityFromShape, shapeOf } from "./shape3d";

export function buildAnalysis(
  reading: SpeciesReading,
  structure: LewisStructure,
  mainCentre: number | undefined,
): SpeciesAnalysis {
  const { graph } = structure;
  const atoms = graph.atoms;
  const atomCount = atoms.length;
  const radical = structure.valenceElectrons % 2 === 1;
  // Each centre's description as worked out (shared by centres alike) and its own index; the
  // centres themselves are put together the first time anyone asks for them.
  const descriptions: CentreAnalysis[] = [];
  const indices: number[] = [];
  let single: SharedCentreDetail | undefined;
  let allStericFourOrLess = true;
  for (let index = 0; index < atomCount; index++) {
    const described = describeCentre(graph, index, radical);
    if (!described) continue;
    if (descriptions.length === 0) single = described;
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

  if (radical) {
    const holder = atoms.findIndex((atom) => atom.unpairedElectrons > 0);
    warnings.push(
      `Odd number of valence electrons (${structure.valenceElectrons}): a radical, with the unpaired electron drawn on ${atoms[holder]?.symbol ?? "one atom"}. ` +
        "The single electron is a weak domain, so small radicals can be flatter or wider than predicted.",
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

  let resonanceForms = structure.resonanceForms;
  if (!Number.isFinite(resonanceForms) || resonanceForms < 1) resonanceForms = 1;

  // One centre: ideal directions settle polarity exactly, at once. Several: the whole 3D
  // model is needed, which costs milliseconds, so it is built the first time anyone asks.
  const judge =
    descriptions.length > 1
      ? judgeFromShape(graph, reading.charge)
      : judgeFromCentre(graph, single ? [ownDetail(single, indices[0])] : [], mainCentre, reading.charge);
  const analysis: SpeciesAnalysis = {
    reading,
    valenceElectrons: structure.valenceElectrons,
    radical,
    electronDeficient,
    expandedOctet,
    graph,
    resonanceForms,
    get centres(): readonly CentreAnalysis[] {
      const centres = ownCentres(descriptions, indices);
      Object.defineProperty(analysis, "centres", { value: centres, enumerable: true });
      return centres;
    },
    get polarity(): PolarityVerdict {
      const verdict = judge(analysis);
      Object.defineProperty(analysis, "polarity", { value: verdict, enumerable: true });
      return verdict;
    },
    measuredAngles: measuredAnglesFor(reading.composition, reading.charge),
    warnings,
  };
  return analysis;
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

// The polarity judges are made apart from buildAnalysis so that each closure keeps only what it
// needs: a memoised analysis of a large molecule must not hold on to every centre's ligands and
// sites through its polarity getter.

function judgeFromShape(graph: MolecularGraph, charge: number): (analysis: SpeciesAnalysis) => PolarityVerdict {
  return (analysis) => polarityFromShape(graph, shapeOf(analysis), charge);
}

function judgeFromCentre(
  graph: MolecularGraph,
  details: readonly CentreDetail[],
  mainCentre: number | undefined,
  charge: number,
): (analysis: SpeciesAnalysis) => PolarityVerdict {
  return () => judgePolarity(graph, details, mainCentre, charge);
}
