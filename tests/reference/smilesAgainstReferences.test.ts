import { beforeAll, describe, expect, it } from "vitest";
import { Molecule } from "openchemlib";
import { analyzeSmiles } from "../../shared/src/index";
import type { SpeciesAnalysis } from "../../shared/src/index";
import { CAGE_DIPOLES, CARBON_FRAMEWORKS, SMILES_DIPOLES, SMILES_RESONANCE } from "./data/smilesReferences";

function smilesAnalysis(smiles: string): SpeciesAnalysis {
  const result = analyzeSmiles(smiles);
  if (!result.ok) throw new Error(`expected ${smiles} to be analysed, got ${result.problem.code}: ${result.problem.message}`);
  return result.value;
}

// common practice: a carbon with no pi bond is sp3, with one sp2, with two sp
const HYBRIDIZATION_BY_PI: readonly string[] = ["sp3", "sp2", "sp"];

/** Hybridization of every carbon, from openchemlib's count of pi bonds (aromatic rings count one). */
function openchemlibCarbonHybridization(smiles: string): string[] {
  const molecule = Molecule.fromSmiles(smiles);
  const labels: string[] = [];
  for (let atom = 0; atom < molecule.getAllAtoms(); atom += 1) {
    if (molecule.getAtomLabel(atom) === "C") labels.push(HYBRIDIZATION_BY_PI[molecule.getAtomPi(atom)]);
  }
  return labels.sort();
}

describe("polarity of SMILES molecules against measured dipoles and symmetry", () => {
  it.each(SMILES_DIPOLES)("$name $smiles (measured $debye D)", ({ name, smiles, debye }) => {
    const { polarity } = smilesAnalysis(smiles);
    expect(
      polarity.polar,
      `${name}: measured ${debye} D; engine said ${polarity.polar ? "polar" : "nonpolar"} because "${polarity.reason}"`,
    ).toBe(debye > 0);
  });
  // Cages: the model must keep their full symmetry, or a nonpolar cage comes out polar.
  it.each(CAGE_DIPOLES)("$name $smiles (measured $debye D): cage model keeps its symmetry", ({ smiles, debye }) => {
    expect(smilesAnalysis(smiles).polarity.polar).toBe(debye > 0);
  });
});

describe("carbon hybridization against openchemlib", () => {
  // openchemlib builds its lookup tables on first use (seconds); do it once, outside any one case
  beforeAll(() => {
    Molecule.fromSmiles("C");
  });

  it.each(CARBON_FRAMEWORKS)("%s", (smiles) => {
    // source: openchemlib (pi-bond count per atom)
    const reference = openchemlibCarbonHybridization(smiles);
    const analysis = smilesAnalysis(smiles);
    const engine = analysis.centres
      .filter((centre) => centre.atom === "C")
      .map((centre) => centre.hybridization)
      .sort();
    expect(engine, `${smiles}: openchemlib says [${reference.join(", ")}]`).toEqual(reference);
  });
});

describe("resonance counted from SMILES", () => {
  it.each(SMILES_RESONANCE)("$name $smiles has $forms equivalent structures", ({ name, smiles, forms }) => {
    expect(smilesAnalysis(smiles).resonanceForms, name).toBe(forms);
  });
});
