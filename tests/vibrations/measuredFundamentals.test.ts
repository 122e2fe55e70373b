// Measured gas-phase fundamentals beside the prediction: listed for common gases, each with its
// source, and only where they fit the predicted symmetry species one for one.
import { describe, expect, it } from "vitest";
import { analyzeSpecies, measuredFundamentalsOf, vibrationsOf } from "../../shared/src/index";

function measured(text: string) {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text}: ${result.problem.message}`);
  return { analysis: result.value, measured: measuredFundamentalsOf(result.value) };
}

describe("measured fundamentals", () => {
  // common practice: the gases of a gas-phase infrared lab
  it.each(["H2O", "CO2", "NH3", "CH4", "SF6", "SO2", "O3", "N2O", "NF3", "C2H2", "CO", "N2", "HCl"])(
    "%s: one measured value per predicted fundamental, with a source",
    (text) => {
      const { analysis, measured: values } = measured(text);
      expect(values, `${text} should list its measured fundamentals`).toBeDefined();
      const predicted = vibrationsOf(analysis);
      if (!predicted.ok || !values) return;
      const distinct = predicted.value.representation.reduce((sum, mode) => sum + mode.count, 0);
      expect(values.fundamentals).toHaveLength(distinct);
      expect(values.source).toMatch(/NSRDS-NBS 39/);
    },
  );

  // from memory: Herzberg, "Infrared and Raman Spectra of Polyatomic Molecules", and the NIST
  // Chemistry WebBook: CO2's antisymmetric stretch 2349 cm⁻¹ (Σu+), its bend 667 cm⁻¹ (Πu);
  // SF6's IR-active stretch 948 cm⁻¹ (T1u); water's bend 1595 cm⁻¹ (A1)
  it.each([
    ["CO2", "Σu+", 2349],
    ["CO2", "Πu", 667],
    ["SF6", "T1u", 948],
    ["H2O", "A1", 1595],
  ] as const)("%s has a %s fundamental at %i cm⁻¹", (text, symmetry, wavenumber) => {
    const values = measured(text).measured!.fundamentals;
    expect(values.some((value) => value.symmetry === symmetry && value.wavenumber === wavenumber)).toBe(true);
  });

  // common practice: no value is shown for a species the table does not list
  it("PCl5 and a model with the wrong symmetry (S8) show none", () => {
    expect(measured("PCl5").measured).toBeUndefined();
    expect(measured("S8").measured).toBeUndefined();
  });
});
