/**
 * A three-bonded nitrogen beside a boron with only six electrons gives its lone pair to boron's
 * empty p orbital: the B-N bond gains pi character and the nitrogen is planar. Where boron already
 * has four bonds (an adduct, a borate) there is no empty orbital and the nitrogen keeps its pair.
 */
import { describe, expect, it } from "vitest";
import { analyzeTyped } from "../../shared/src/index";

function nitrogenGeometries(text: string): readonly string[] {
  const result = analyzeTyped(text);
  if (!result.ok) throw new Error(`${text} not analysed: ${result.problem.message}`);
  return result.value.centres.filter((centre) => centre.atom === "N").map((centre) => centre.molecularGeometry);
}

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (aminoborane H2N=BH2 is planar,
// isoelectronic with ethene; aminoboranes R2N-BR2 and B(NMe2)3 have planar nitrogen and B-N pi
// bonding; ammonia borane H3N-BH3 is tetrahedral at both ends)
const CASES: readonly (readonly [species: string, nitrogen: string])[] = [
  ["H2NBH2", "trigonal planar"],
  ["smiles:NB", "trigonal planar"],
  ["smiles:CN(C)B(C)C", "trigonal planar"],
  ["B(NH2)3", "trigonal planar"],
  ["smiles:CN(C)B(N(C)C)N(C)C", "trigonal planar"],
  ["H2NBO", "trigonal planar"],
  ["H3NBH3", "tetrahedral"],
  ["smiles:N[B-](F)(F)F", "trigonal pyramidal"],
  ["smiles:CN(C)[B-](C)(C)C", "trigonal pyramidal"],
  ["NH3", "trigonal pyramidal"],
];

describe("nitrogen beside boron", () => {
  it.each(CASES)("%s: N is %s", (species, nitrogen) => {
    const geometries = nitrogenGeometries(species);
    expect(geometries.length).toBeGreaterThan(0);
    for (const geometry of geometries) expect(geometry).toBe(nitrogen);
  });

  // common practice: the planar nitrogen is sp2, its lone pair counted in the pi bond
  it("aminoborane's nitrogen is sp2", () => {
    const result = analyzeTyped("H2NBH2");
    const nitrogen = result.ok ? result.value.centres.find((centre) => centre.atom === "N") : undefined;
    expect(nitrogen?.hybridization).toBe("sp2");
    expect(nitrogen?.stericNumber).toBe(3);
  });
});
