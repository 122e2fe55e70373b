// Species of thousands of atoms: analysed with the right shape at every atom and without a stack
// overflow, 3D models built for long chains, and a clear refusal (with the per-atom shapes still
// given) past the size limit of the 3D model. Timings are the benchmark's (tests/bench/largeSmiles.mjs).
import { describe, expect, it } from "vitest";
import {
  MAX_MODEL_ATOMS,
  MAX_RING_SYSTEM_ATOMS,
  analyzeSmiles,
  buildCoordinates,
  hoverMarkdown,
  type SpeciesAnalysis,
} from "../../shared/src/index";
import { angleDegrees, distance, sub } from "../../shared/src/chemistry/geometry/vectors";

/** Large SMILES written out: n carbons in a chain, a ring, an aromatic ring; n atoms of formaldehyde-free fragments. */
const chain = (carbons: number): string => "C".repeat(carbons);
const ring = (carbons: number): string => `C1${"C".repeat(carbons - 2)}C1`;
const aromaticRing = (carbons: number): string => `c1${"c".repeat(carbons - 2)}c1`;
/** A linear acene of `rings` fused benzene rings (naphthalene for 2, anthracene for 3). */
function acene(rings: number): string {
  const label = (k: number): string => (k < 10 ? String(k) : `%${k}`);
  let opening = label(2);
  let closing = `c${label(rings)}`;
  for (let k = 3; k <= rings; k++) opening += `cc${label(k)}`;
  for (let k = rings - 1; k >= 2; k--) closing += `cc${label(k)}`;
  return `c1ccc${opening}cccc${closing}c1`;
}
const fragments = (count: number, unit: string): string => Array.from({ length: count }, () => unit).join(".");

function analysed(smiles: string): SpeciesAnalysis {
  const result = analyzeSmiles(smiles);
  if (!result.ok) throw new Error(`not analysed: ${result.problem.message}`);
  return result.value;
}

function geometriesOf(analysis: SpeciesAnalysis): Map<string, number> {
  const counts = new Map<string, number>();
  for (const centre of analysis.centres) {
    const key = `${centre.atom} ${centre.molecularGeometry}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return counts;
}

describe("analysis of one large species", () => {
  it.each([
    // common practice: every carbon of an alkane is sp3, tetrahedral; CnH2n+2
    ["a chain of 10,000 carbons", chain(10_000), 30_002, { "C tetrahedral": 10_000 }],
    // common practice: a cycloalkane is CnH2n, every carbon tetrahedral
    ["a ring of 10,000 carbons", ring(10_000), 30_000, { "C tetrahedral": 10_000 }],
    // common practice: an aromatic ring carbon (CH) is sp2, trigonal planar
    ["an aromatic ring of 10,000 carbons", aromaticRing(10_000), 20_000, { "C trigonal planar": 10_000 }],
    // common practice: anthracene-like acenes C(4n+2)H(2n+4), every carbon trigonal planar
    ["an acene of 90 fused rings", acene(90), 362 + 184, { "C trigonal planar": 362 }],
    // common practice: methanol's C is tetrahedral and its O bent
    ["3,000 methanol fragments", fragments(3000, "CO"), 18_000, { "C tetrahedral": 3000, "O bent": 3000 }],
    // common practice: isobutane-like branches keep every carbon tetrahedral
    ["a branched chain of 10,000 carbons", "C(C)".repeat(5000), 30_002, { "C tetrahedral": 10_000 }],
  ])("%s: every atom gets its shape, without a stack overflow", (_label, smiles, atoms, geometries) => {
    const analysis = analysed(smiles);
    expect(analysis.graph.atoms).toHaveLength(atoms);
    expect(Object.fromEntries(geometriesOf(analysis))).toEqual(geometries);
  });

  it("reads the smallest acenes as the known molecules // common practice: naphthalene C10H8, anthracene C14H10", () => {
    expect(analysed(acene(2)).reading.formula).toBe("C10H8");
    expect(analysed(acene(3)).reading.formula).toBe("C14H10");
  });
});

describe("3D models of large species", () => {
  it("builds a chain of 2,000 carbons with ideal bonds and angles // common practice: C–C about 1.54 Å, sp3 angles 109.5°", () => {
    const analysis = analysed(chain(2000));
    const model = buildCoordinates(analysis.graph, false);
    expect(model.tooLarge).toBeUndefined();
    expect(model.atoms).toHaveLength(6002);
    const at = (index: number) => model.atoms[index].position;
    for (let carbon = 0; carbon + 1 < 2000; carbon++) {
      expect(distance(at(carbon), at(carbon + 1))).toBeCloseTo(1.54, 1);
      if (carbon + 2 < 2000)
        expect(angleDegrees(sub(at(carbon), at(carbon + 1)), sub(at(carbon + 2), at(carbon + 1)))).toBeCloseTo(109.47, 0);
    }
  });

  it.each([
    ["a chain of 4,000 carbons", chain(4000), /12,002 atoms \(the limit is 10,000\)/],
    ["an aromatic ring of 10,000 carbons", aromaticRing(10_000), /20,000 atoms/],
    ["a ring of 1,000 carbons", ring(1000), /a ring system of 1,000 atoms \(the limit is 64\)/],
    ["a ring of 100 carbons", ring(100), /a ring system of 100 atoms/],
    ["an acene of 20 fused rings", acene(20), /a ring system of 82 atoms/],
  ])("declines %s as too large, with the reason", (_label, smiles, reason) => {
    const analysis = analysed(smiles);
    const model = buildCoordinates(analysis.graph, false);
    expect(model.atoms).toEqual([]);
    expect(model.tooLarge).toMatch(/^Too large for a 3D model: /);
    expect(model.tooLarge).toMatch(reason);
    // The per-atom shapes are there all the same, and the hover says why polarity is not judged.
    expect(analysis.centres.length).toBeGreaterThan(0);
    const card = hoverMarkdown(analysis, { angleDecimals: 1 });
    expect(card).toContain("Polarity: **not judged**");
    expect(card).toContain("too large for a 3D model");
    expect(card).toMatch(/model prediction, not measured data/i);
  });

  it("keeps the limits where the documentation puts them", () => {
    expect(MAX_MODEL_ATOMS).toBe(10_000);
    expect(MAX_RING_SYSTEM_ATOMS).toBe(64);
  });

  it.each([
    // common practice: cyclohexane closes as a chair with C–C–C near 111°, within a few degrees of 109.5°
    ["cyclohexane", ring(6)],
    // common practice: a 60-atom ring system (fullerene size) is still modelled
    ["a ring of 60 carbons", ring(60)],
  ])("still builds %s inside the ring-system limit", (_label, smiles) => {
    const analysis = analysed(smiles);
    const model = buildCoordinates(analysis.graph, false);
    expect(model.tooLarge).toBeUndefined();
    expect(model.atoms).toHaveLength(analysis.graph.atoms.length);
  });
});
