/**
 * Turn a chosen Lewis structure into everything the writer sees: centres, polarity, measured
 * angles and plain-language warnings.
 */
import { atomTraits } from "../lewis/electronBookkeeping";
import type { LewisStructure } from "../lewis/chooseLewisStructure";
import type { SpeciesAnalysis, SpeciesReading } from "../types";
import { analyzeCentre, type CentreDetail } from "../vsepr/analyzeCentre";
import { measuredAnglesFor } from "../vsepr/measuredAngles";
import { judgePolarity } from "../vsepr/polarity";

export function buildAnalysis(
  reading: SpeciesReading,
  structure: LewisStructure,
  mainCentre: number | undefined,
  aromaticAtoms: ReadonlySet<number> = new Set(),
): SpeciesAnalysis {
  const { graph } = structure;
  const radical = structure.valenceElectrons % 2 === 1;
  const inPiSystem = lonePairsInPiSystems(graph, aromaticAtoms);
  const details: CentreDetail[] = [];
  graph.atoms.forEach((_, index) => {
    const detail = analyzeCentre(graph, index, radical, inPiSystem.has(index));
    if (detail) details.push(detail);
  });

  let electronDeficient = false;
  let expandedOctet = false;
  const warnings: string[] = [];
  graph.atoms.forEach((atom, index) => {
    const traits = atomTraits(atom.symbol);
    const bondOrders = graph.bonds.reduce((sum, b) => sum + (b.from === index || b.to === index ? b.order : 0), 0);
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

  return {
    reading,
    valenceElectrons: structure.valenceElectrons,
    radical,
    electronDeficient,
    expandedOctet,
    graph,
    resonanceForms,
    centres: details.map((d) => d.centre),
    polarity: judgePolarity(graph, details, mainCentre, reading.charge),
    measuredAngles: measuredAnglesFor(reading.composition, reading.charge),
    warnings,
  };
}

/**
 * Atoms whose lone pair joins a pi system: lone-pair atoms inside aromatic rings (pyrrole N,
 * furan O, thiophene S), and three-bonded N next to a carbon with a multiple bond or an aromatic
 * carbon (amides, anilines).
 */
function lonePairsInPiSystems(graph: SpeciesAnalysis["graph"], aromaticAtoms: ReadonlySet<number>): Set<number> {
  const atomCount = graph.atoms.length;
  const multiplyBondedCarbon = new Array<boolean>(atomCount).fill(false);
  const neighbours: number[][] = Array.from({ length: atomCount }, () => []);
  for (const bond of graph.bonds) {
    neighbours[bond.from].push(bond.to);
    neighbours[bond.to].push(bond.from);
    if (bond.order > 1) {
      if (graph.atoms[bond.from].symbol === "C") multiplyBondedCarbon[bond.from] = true;
      if (graph.atoms[bond.to].symbol === "C") multiplyBondedCarbon[bond.to] = true;
    }
  }
  const result = new Set<number>();
  graph.atoms.forEach((atom, index) => {
    if (atom.lonePairs === 0 || neighbours[index].length < 2) return;
    if (!["N", "O", "S"].includes(atom.symbol)) return;
    // Inside an aromatic ring any of them joins the pi system; outside one, only a three-bonded
    // N (amides, anilines) flattens: the O of an ester or acid keeps its bent, sp3-like angle.

    const hasOwnMultipleBond = graph.bonds.some((b) => (b.from === index || b.to === index) && b.order > 1);
    if (hasOwnMultipleBond) return;
    if (aromaticAtoms.has(index)) {
      result.add(index);
      return;
    }
    if (atom.symbol !== "N" || neighbours[index].length !== 3) return;
    const nextToPi = neighbours[index].some(
      (other) => multiplyBondedCarbon[other] || (aromaticAtoms.has(other) && graph.atoms[other].symbol === "C"),
    );
    if (nextToPi) result.add(index);
  });
  return result;
}
