/**
 * Polar or nonpolar, from the vector sum of bond dipoles (electronegativity difference along each
 * ideal bond direction) and from how the lone pairs sit around each centre.
 */
import { add, norm, scale, type Vec3 } from "../geometry/vectors";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { MolecularGraph, PolarityVerdict } from "../types";
import type { CentreDetail } from "./analyzeCentre";

const ZERO = 1e-6;
const LONE_PAIR_WEIGHT = 0.5;

export function judgePolarity(
  graph: MolecularGraph,
  details: readonly CentreDetail[],
  mainCentre: number | undefined,
  charge: number,
): PolarityVerdict {
  const verdict = judgeNeutralShape(graph, details, mainCentre);
  if (charge === 0) return verdict;
  return {
    ...verdict,
    reason: `an ion (net charge ${charge > 0 ? "+" : ""}${charge}); its charge distribution is ${
      verdict.polar ? "asymmetric" : "symmetric"
    }: ${verdict.reason}`,
  };
}

function judgeNeutralShape(graph: MolecularGraph, details: readonly CentreDetail[], mainCentre: number | undefined): PolarityVerdict {
  if (graph.atoms.length === 1) return { polar: false, reason: "a single atom has no dipole", dipoleEstimate: 0 };
  if (graph.atoms.length === 2) {
    const [a, b] = graph.atoms;
    const difference = Math.abs(atomTraits(a.symbol).electronegativity - atomTraits(b.symbol).electronegativity);
    return difference > ZERO
      ? { polar: true, reason: "the two atoms differ in electronegativity", dipoleEstimate: round2(difference) }
      : { polar: false, reason: "two identical atoms share the electrons equally", dipoleEstimate: 0 };
  }
  const main = details.find((d) => d.centre.index === mainCentre) ?? details[0];
  if (!main) return { polar: false, reason: "no centre to judge", dipoleEstimate: 0 };

  const centreElectronegativity = atomTraits(main.centre.atom).electronegativity;
  let bondSum: Vec3 = [0, 0, 0];
  let anyPolarBond = false;
  main.ligands.forEach((ligand, k) => {
    const difference = ligand.electronegativity - centreElectronegativity;
    if (Math.abs(difference) > ZERO) anyPolarBond = true;
    bondSum = add(bondSum, scale(main.sites.ligandDirections[k], difference));
  });
  const loneSum = main.sites.lonePairDirections.reduce<Vec3>((sum, d) => add(sum, d), [0, 0, 0]);
  // Same model as for whole molecules: a lone pair counts half an electronegativity unit.
  const dipoleEstimate = round2(norm(add(bondSum, scale(loneSum, LONE_PAIR_WEIGHT))));

  // Outer groups that are themselves bent (O-H in H2SO4, N-H2 in hydrazine) point their dipoles
  // off the main axes, so nothing cancels them in the model.
  const bentOuterCentre = details.find((d) => d !== main && d.centre.lonePairs + d.centre.unpairedElectrons > 0);
  const shape = main.centre.molecularGeometry;
  if (bentOuterCentre) {
    return {
      polar: true,
      reason: `the ${bentOuterCentre.centre.atom} atom bonded to ${bentOuterCentre.ligands
        .map((l) => l.symbol)
        .join(" and ")} is bent, so its bond dipoles do not cancel`,
      dipoleEstimate,
    };
  }
  if (norm(loneSum) > ZERO) {
    const nonBonding = main.centre.lonePairs > 0 ? "lone pairs make" : "the single electron makes";
    return { polar: true, reason: `${nonBonding} the ${shape} shape asymmetric`, dipoleEstimate };
  }
  if (norm(bondSum) > ZERO) {
    return { polar: true, reason: `bond dipoles do not cancel in the ${shape} arrangement`, dipoleEstimate };
  }
  if (anyPolarBond) return { polar: false, reason: "bond dipoles cancel by symmetry", dipoleEstimate: 0 };
  return { polar: false, reason: "the bonds are nonpolar and the shape is symmetric", dipoleEstimate: 0 };
}

const round2 = (value: number) => Math.round(value * 100) / 100;
