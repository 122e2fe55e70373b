/**
 * Turn a chosen Lewis structure into everything the writer sees: centres, polarity, measured
 * angles and plain-language warnings.
 */
import { graphIndex } from "../graphIndex";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { LewisStructure } from "../lewis/chooseLewisStructure";
import type { PolarityVerdict, SpeciesAnalysis, SpeciesReading } from "../types";
import { analyzeCentre, type CentreDetail } from "../vsepr/analyzeCentre";
import { measuredAnglesFor } from "../vsepr/measuredAngles";
import { judgePolarity } from "../vsepr/polarity";
import { polarityFromShape, shapeOf } from "./shape3d";

export function buildAnalysis(
  reading: SpeciesReading,
  structure: LewisStructure,
  mainCentre: number | undefined,
): SpeciesAnalysis {
  const { graph } = structure;
  const radical = structure.valenceElectrons % 2 === 1;
  const details: CentreDetail[] = [];
  graph.atoms.forEach((_, index) => {
    const detail = analyzeCentre(graph, index, radical);
    if (detail) details.push(detail);
  });

  const orderSums = graphIndex(graph).bondOrderSums;
  let electronDeficient = false;
  let expandedOctet = false;
  const warnings: string[] = [];
  graph.atoms.forEach((atom, index) => {
    const traits = atomTraits(atom.symbol);
    const bondOrders = orderSums[index];
    const shell = 2 * bondOrders + 2 * atom.lonePairs + atom.unpairedElectrons;
    if (graph.atoms.length > 1 && !traits.isHydrogen && !traits.mustCompleteShell && shell < 8) {
      electronDeficient = true;
      warnings.push(
        `${atom.symbol} is electron-deficient: it has only ${shell} electrons around it, and it readily accepts a lone pair from a Lewis base.`,
      );
    }
    if (shell > 8) expandedOctet = true;
  });

  if (radical) {
    const holder = graph.atoms.findIndex((atom) => atom.unpairedElectrons > 0);
    warnings.push(
      `Odd number of valence electrons (${structure.valenceElectrons}): a radical, with the unpaired electron drawn on ${graph.atoms[holder]?.symbol ?? "one atom"}. ` +
        "The single electron is a weak domain, so small radicals can be flatter or wider than predicted.",
    );
  }
  if (expandedOctet && details.every((d) => d.centre.stericNumber <= 4)) {
    warnings.push(
      "Drawn with multiple bonds to the central atom to minimise formal charges (an expanded octet); an octet structure with separated charges describes the bonding as well. The shape is the same either way.",
    );
  }
  if (graph.atoms.length === 2 && graph.atoms.every((a) => a.symbol === "O") && reading.charge === 0) {
    warnings.push("The Lewis structure shows O=O with all electrons paired, but ground-state O2 has two unpaired electrons (a triplet).");
  }
  for (const { centre } of details) {
    if (centre.stericNumber === 7 && centre.lonePairs === 1) {
      warnings.push(
        `${centre.atom}: with six bonds and one lone pair the real molecule is fluxional; gas-phase XeF6 is a distorted octahedron rather than a clean pentagonal pyramid.`,
      );
    }
  }
  if (details.length === 0 && graph.atoms.length === 2) {
    warnings.push("A diatomic species is linear by definition; there is no central atom.");
  }
  if (graph.atoms.length === 1) warnings.push("A single atom or monatomic ion has no molecular shape.");

  let resonanceForms = structure.resonanceForms;
  if (!Number.isFinite(resonanceForms) || resonanceForms < 1) resonanceForms = 1;

  const analysis: SpeciesAnalysis = {
    reading,
    valenceElectrons: structure.valenceElectrons,
    radical,
    electronDeficient,
    expandedOctet,
    graph,
    resonanceForms,
    centres: details.map((d) => d.centre),
    // One centre: ideal directions settle polarity exactly, at once. Several: the whole 3D
    // model is needed, which costs milliseconds, so it is built the first time anyone asks.
    get polarity(): PolarityVerdict {
      const verdict =
        details.length > 1
          ? polarityFromShape(graph, shapeOf(analysis), reading.charge)
          : judgePolarity(graph, details, mainCentre, reading.charge);
      Object.defineProperty(analysis, "polarity", { value: verdict, enumerable: true });
      return verdict;
    },
    measuredAngles: measuredAnglesFor(reading.composition, reading.charge),
    warnings,
  };
  return analysis;
}

