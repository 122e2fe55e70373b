import { describe, expect, it } from "vitest";
import { analysisOf } from "./analysisHelpers";
import { DIPOLE_MOMENTS } from "./data/dipoles";

describe("polarity against measured dipole moments", () => {
  it.each(DIPOLE_MOMENTS)("$species (measured $debye D)", ({ species, debye }) => {
    const { polarity } = analysisOf(species);
    const measuredPolar = debye > 0;
    expect(
      polarity.polar,
      `${species}: measured dipole ${debye} D, so it should be ${measuredPolar ? "polar" : "nonpolar"}; ` +
        `engine said ${polarity.polar ? "polar" : "nonpolar"} because "${polarity.reason}" ` +
        `(estimate ${polarity.dipoleEstimate})`,
    ).toBe(measuredPolar);
    expect(polarity.reason.trim().length, `${species}: the verdict needs a reason`).toBeGreaterThan(0);
  });

  const symmetric = DIPOLE_MOMENTS.filter((row) => row.debye === 0);

  it.each(symmetric)("$species: bond dipoles cancel in the model's estimate too", ({ species }) => {
    // common practice: bond dipoles of a symmetric shape sum to zero vector
    const { polarity } = analysisOf(species);
    expect(polarity.dipoleEstimate, `${species}: nonzero estimate ${polarity.dipoleEstimate}`).toBeCloseTo(0, 2);
  });
});
