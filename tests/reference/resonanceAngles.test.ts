// Bonds that resonance makes equal leave no room for one of them to push the others: the angles
// of an ion whose bonds are all alike are fixed by its symmetry, while a centre whose bonds
// really differ keeps a range.
import { describe, expect, it } from "vitest";
import { analysisOf, centreOf } from "./analysisHelpers";

const EXACT: readonly { species: string; centre: string; degrees: number; source: string }[] = [
  { species: "NO3-", centre: "N", degrees: 120, source: "from memory: nitrate is trigonal planar, D3h, all N-O bonds equal" },
  { species: "CO3^2-", centre: "C", degrees: 120, source: "from memory: carbonate is trigonal planar, D3h, all C-O bonds equal" },
  { species: "SO4^2-", centre: "S", degrees: 109.5, source: "from memory: sulfate is a regular tetrahedron, Td" },
  { species: "ClO4-", centre: "Cl", degrees: 109.5, source: "from memory: perchlorate is a regular tetrahedron, Td" },
  { species: "PO4^3-", centre: "P", degrees: 109.5, source: "from memory: phosphate is a regular tetrahedron, Td" },
];

const RANGED: readonly { species: string; centre: string; measured: number; note: RegExp; source: string }[] = [
  // The lone pair still squeezes; no multiple bond is left to push.
  {
    species: "O3",
    centre: "O",
    measured: 116.8,
    note: /^lone pairs/,
    source: "from memory: CRC Handbook, Structures of Free Molecules in the Gas Phase",
  },
  {
    species: "NO2-",
    centre: "N",
    measured: 115.4,
    note: /^lone pairs/,
    source: "from memory: nitrite ion O-N-O about 115 degrees in its salts",
  },
  {
    species: "ClO3-",
    centre: "Cl",
    measured: 106.7,
    note: /^lone pairs/,
    source: "from memory: chlorate ion O-Cl-O about 107 degrees in its salts",
  },
  // Bonds that really differ keep the multiple-bond range.
  {
    species: "SO2Cl2",
    centre: "S",
    measured: 123.5,
    note: /multiple bond/,
    source: "from memory: CRC Handbook, O-S-O in sulfuryl chloride",
  },
  {
    species: "HNO3",
    centre: "N",
    measured: 130.3,
    note: /multiple bond/,
    source: "from memory: CRC Handbook, terminal O-N-O in nitric acid",
  },
];

describe("angles of bonds made equal by resonance", () => {
  it.each(EXACT)("$species: every angle is $degrees degrees, fixed by symmetry ($source)", ({ species, centre, degrees }) => {
    const expectations = centreOf(analysisOf(species), centre).expectedAngles;
    expect(expectations.length).toBeGreaterThan(0);
    for (const expectation of expectations) {
      expect(expectation.ideal).toBeCloseTo(degrees, 0);
      expect([expectation.min, expectation.max]).toEqual([expectation.ideal, expectation.ideal]);
      expect(expectation.note).toBe("fixed by symmetry");
    }
  });

  it.each(RANGED)("$species keeps a range that holds $measured degrees ($source)", ({ species, centre, measured, note }) => {
    const expectations = centreOf(analysisOf(species), centre).expectedAngles;
    const holding = expectations.filter((expectation) => expectation.min <= measured && measured <= expectation.max);
    expect(holding.length, JSON.stringify(expectations)).toBeGreaterThan(0);
    expect(holding[0].min).toBeLessThan(holding[0].max);
    expect(holding[0].note).toMatch(note);
  });
});
