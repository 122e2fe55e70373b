import { describe, expect, it } from "vitest";
import type { AngleExpectation } from "../../shared/src/index";
import { analysisOf, centreOf, sameAngle } from "./analysisHelpers";
import { MEASURED_ANGLES, MEASURED_ANGLE_SOURCE, type MeasuredAngleCase } from "./data/measuredAngles";
import { angleKey } from "./angleLabels";
import { labelFitsPair } from "./positionLabels";

function describeExpectation(expectation: AngleExpectation): string {
  const label = expectation.between ? ` "${expectation.between}"` : "";
  return `ideal ${expectation.ideal}°, range ${expectation.min}-${expectation.max}°${label}`;
}

/**
 * The expectations a measured angle should be judged against: those with the ideal angle of the
 * electron geometry for that pair of positions, narrowed by their label when two kinds of pair
 * share an ideal (apical-basal and basal-basal are both 90° in a square pyramid).
 */
function candidatesFor(row: MeasuredAngleCase, expectations: readonly AngleExpectation[]): AngleExpectation[] {
  const withIdeal = expectations.filter((expectation) => sameAngle(expectation.ideal, row.ideal));
  if (withIdeal.length <= 1 || row.positions === undefined) return withIdeal;
  const positions = row.positions;
  return withIdeal.filter((expectation) => labelFitsPair(expectation.between, positions));
}

describe("bond angles against measured gas-phase structures", () => {
  it.each(MEASURED_ANGLES)("$species $angle = $degrees° lies in the expected range", (row) => {
    const analysis = analysisOf(row.species, row.smiles);
    const centre = centreOf(analysis, row.centre);
    const offered = centre.expectedAngles.map(describeExpectation).join("; ") || "no expectations";
    const context = `${row.species} ${row.angle}: measured ${row.degrees}° (${MEASURED_ANGLE_SOURCE}); engine ${centre.axe} offered: ${offered}`;

    // common practice: the VSEPR class decides which ideal angle the measurement deviates from
    expect.soft(centre.axe, `${context}\nAXE class`).toBe(row.axe);

    const candidates = candidatesFor(row, centre.expectedAngles);
    expect(
      candidates.length,
      `${context}\nno expectation with ideal ${row.ideal}°${row.positions ? ` labelled ${row.positions}` : ""}`,
    ).toBeGreaterThan(0);

    const containing = candidates.filter((expectation) => expectation.min <= row.degrees && row.degrees <= expectation.max);
    expect(containing.length, `${context}\nmeasured ${row.degrees}° is outside every matching range`).toBeGreaterThan(0);
  });

  const centresMeasured = [...new Map(MEASURED_ANGLES.map((row) => [row.species, row])).values()];

  it.each(centresMeasured)("$species: every expected range is well formed and explained", (row) => {
    const centre = centreOf(analysisOf(row.species, row.smiles), row.centre);
    for (const expectation of centre.expectedAngles) {
      // common practice: min <= max, and each range is about a real angle between 0 and 180
      expect(expectation.min, `${row.species}: ${describeExpectation(expectation)}`).toBeLessThanOrEqual(expectation.max);
      expect(expectation.min).toBeGreaterThan(0);
      expect(expectation.max).toBeLessThanOrEqual(180);
      expect(expectation.note.trim().length, `${row.species}: empty note`).toBeGreaterThan(0);
    }
  });
});

describe("the measured angles the engine shows agree with the reference table", () => {
  // Tables quote gas-phase angles to 0.1°; different structure determinations differ by a few tenths.
  const AGREEMENT = 0.5;
  const speciesMeasured = [...new Set(MEASURED_ANGLES.filter((row) => !row.smiles).map((row) => row.species))];
  let compared = 0;

  it.each(speciesMeasured)("%s", (species) => {
    const analysis = analysisOf(species);
    const reference = MEASURED_ANGLES.filter((row) => row.species === species);
    for (const shown of analysis.measuredAngles) {
      expect(shown.source.trim().length, `${species} ${shown.between}: no source`).toBeGreaterThan(0);
      const match = reference.find((row) => angleKey(row.angle) === angleKey(shown.between));
      if (!match) continue;
      compared += 1;
      expect(
        Math.abs(shown.degrees - match.degrees),
        `${species} ${shown.between}: engine shows ${shown.degrees}°, reference ${match.degrees}° (${MEASURED_ANGLE_SOURCE})`,
      ).toBeLessThanOrEqual(AGREEMENT);
    }
  });

  it("matched at least one shown angle per two reference species", () => {
    // guards the label matching above: a silent mismatch of labels would compare nothing
    expect(compared).toBeGreaterThanOrEqual(speciesMeasured.length / 2);
  });
});
