import { describe, expect, it } from "vitest";
import { analyzeSpecies } from "../../shared/src/index";

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
    const carbons = result.value.centres.filter((c) => c.atom === "C").map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry} ${c.hybridization}`);
    expect(carbons).toEqual(Array.from({ length: count }, () => centre));
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
