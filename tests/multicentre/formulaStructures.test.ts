import { describe, expect, it } from "vitest";
import { analyzeSpecies, shapeOf } from "../../shared/src/index";

// common practice: a molecular formula with one ordinary structure is read as that structure;
// one with several familiar isomers is refused with the candidates named.
describe("molecular formulas that hide their connectivity", () => {
  it.each([
    ["C2H4", "C AX3 trigonal planar sp2", 2],
    ["C2H2", "C AX2 linear sp", 2],
    ["C2H6", "C AX4 tetrahedral sp3", 2],
    ["C6H6", "C AX3 trigonal planar sp2", 6],
    ["benzene", "C AX3 trigonal planar sp2", 6],
    ["cyclohexane", "C AX4 tetrahedral sp3", 6],
  ])("%s is read as its one ordinary structure", (text, centre, count) => {
    const result = analyzeSpecies(text);
    expect(result.ok, text).toBe(true);
    if (!result.ok) return;
    const carbons = result.value.centres
      .filter((c) => c.atom === "C")
      .map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry} ${c.hybridization}`);
    expect(carbons).toEqual(Array.from({ length: count }, () => centre));
    expect(result.value.warnings.some((w) => w.startsWith("Read as"))).toBe(true);
  });

  // from memory: the structures in any descriptive inorganic chemistry text (N2O4 is O2N-NO2, planar;
  // N2O5 is O2N-O-NO2; N2O3 is ON-NO2; C3O2 is O=C=C=C=O; Cl2O7 is O3Cl-O-ClO3)
  it.each([
    ["N2O4", ["N AX3 trigonal planar sp2", "N AX3 trigonal planar sp2"], "D2h"],
    ["dinitrogen tetroxide", ["N AX3 trigonal planar sp2", "N AX3 trigonal planar sp2"], "D2h"],
    ["N2O5", ["N AX3 trigonal planar sp2", "O AX2E2 bent sp3", "N AX3 trigonal planar sp2"], undefined],
    ["N2O3", ["N AX2E1 bent sp2", "N AX3 trigonal planar sp2"], "Cs"],
    ["N2F4", ["N AX3E1 trigonal pyramidal sp3", "N AX3E1 trigonal pyramidal sp3"], undefined],
    ["Si2H6", ["Si AX4 tetrahedral sp3", "Si AX4 tetrahedral sp3"], "D3d"],
    ["C3O2", ["C AX2 linear sp", "C AX2 linear sp", "C AX2 linear sp"], "D∞h"],
    ["Cl2O7", ["Cl AX4 tetrahedral sp3", "O AX2E2 bent sp3", "Cl AX4 tetrahedral sp3"], undefined],
  ])("inorganic %s is read as its one ordinary structure", (text, centres, pointGroup) => {
    const result = analyzeSpecies(text);
    expect(result.ok, text).toBe(true);
    if (!result.ok) return;
    expect(result.value.centres.map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry} ${c.hybridization}`)).toEqual(centres);
    if (pointGroup) expect(shapeOf(result.value).pointGroup).toBe(pointGroup);
    expect(result.value.warnings.some((w) => w.startsWith("Read as"))).toBe(true);
  });

  it.each([
    ["C2H6O", ["ethanol", "dimethyl ether"]],
    ["C3H8O", ["1-propanol", "2-propanol", "methyl ethyl ether"]],
    ["C4H10", ["butane", "isobutane"]],
  ])("%s is refused with its candidates named", (text, names) => {
    const result = analyzeSpecies(text);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe("ambiguous-connectivity");
    for (const name of names) expect(result.problem.message).toContain(name);
  });

  it("a formula with many isomers and no familiar list is refused plainly", () => {
    const result = analyzeSpecies("C6H12");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe("ambiguous-connectivity");
  });
});

describe("equally good Lewis structures", () => {
  // from memory: hydrazoic acid is drawn H-N=N(+)=N(-), with an HNN angle near 109 degrees and an
  // N=N double bond next to the hydrogen (any general chemistry text; microwave structures)
  it("HN3 is drawn with its bonds shared out, so the NH nitrogen is bent and sp2", () => {
    const result = analyzeSpecies("HN3");
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const centres = result.value.centres.map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry} ${c.hybridization}`);
    expect(centres).toEqual(["N AX2 linear sp", "N AX2E1 bent sp2"]);
    // Both forms still count as resonance forms.
    expect(result.value.resonanceForms).toBe(2);
  });
});
