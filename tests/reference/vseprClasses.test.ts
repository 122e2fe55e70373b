import { describe, expect, it } from "vitest";
import { analysisOf, centreOf, sameAngle } from "./analysisHelpers";
import { VSEPR_CLASSES } from "./data/vseprClasses";

describe("every AXE class from AX2 to AX7 on a real species", () => {
  it.each(VSEPR_CLASSES)("$species is $axe ($molecularGeometry)", (row) => {
    const centre = centreOf(analysisOf(row.species), row.centre);
    const got = {
      axe: centre.axe,
      stericNumber: centre.stericNumber,
      bondingDomains: centre.bondingDomains,
      lonePairs: centre.lonePairs,
      electronGeometry: centre.electronGeometry,
      molecularGeometry: centre.molecularGeometry,
      hybridization: centre.hybridization,
    };
    const want = {
      axe: row.axe,
      stericNumber: row.stericNumber,
      bondingDomains: row.bondingDomains,
      lonePairs: row.lonePairs,
      electronGeometry: row.electronGeometry,
      molecularGeometry: row.molecularGeometry,
      hybridization: row.hybridization,
    };
    expect(got, `${row.species} ${row.centre} centre`).toEqual(want);
  });

  it.each(VSEPR_CLASSES)("$species has ideal angles $idealAngles", (row) => {
    const centre = centreOf(analysisOf(row.species), row.centre);
    const message = `${row.species}: expected ideal angles [${row.idealAngles.join(", ")}], got [${centre.idealAngles.join(", ")}]`;
    expect(centre.idealAngles.length, message).toBe(row.idealAngles.length);
    row.idealAngles.forEach((angle, i) => expect(sameAngle(centre.idealAngles[i], angle), message).toBe(true));
  });

  it.each(VSEPR_CLASSES)("$species: AXE, steric number and domain counts agree with each other", (row) => {
    // common practice: AX(n)E(m) means n bonding domains and m lone pairs, steric number n + m
    const centre = centreOf(analysisOf(row.species), row.centre);
    const lonePartText = centre.lonePairs > 0 ? `E${centre.lonePairs}` : "";
    expect(centre.axe).toBe(`AX${centre.bondingDomains}${lonePartText}`);
    expect(centre.stericNumber).toBe(centre.bondingDomains + centre.lonePairs);
  });

  const distorted = VSEPR_CLASSES.filter((row) => row.realShapeDiffers);

  it.each(distorted)("$species: any warning about the real shape is plain text", (row) => {
    // common practice: XeF6 is a fluxional distorted octahedron, not the VSEPR pentagonal pyramid;
    // a warning is welcome but not required, so only its form is checked.
    const analysis = analysisOf(row.species);
    for (const warning of analysis.warnings) expect(warning.trim().length).toBeGreaterThan(0);
    expect(centreOf(analysis, row.centre).axe).toBe(row.axe);
  });
});
