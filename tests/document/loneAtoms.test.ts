/**
 * Lone element symbols in equations: a metal written alone is the element (a metallic solid), a
 * lone nonmetal atom is a free atom, and single capitals in a lettered equation are placeholders.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, analyzeSpecies, checkDocument } from "../../shared/src/index";

/** Each species spotted, as written. */
function spotted(text: string): string[] {
  return analyzeDocument(text, "markdown").occurrences.map((occurrence) => occurrence.text);
}

/** Each finding as "code text". */
function notes(text: string): string[] {
  return checkDocument(analyzeDocument(text, "markdown")).map(
    (finding) => `${finding.code} ${text.slice(finding.range.start, finding.range.end)}`,
  );
}

describe("a lone metal symbol is the element", () => {
  it.each([
    // from memory: aluminium burns to its oxide, 4 Al + 3 O2 -> 2 Al2O3
    ["4 Al + 3 O2 -> 2 Al2O3", "Al"],
    // from memory: sodium and chlorine give sodium chloride
    ["2 Na + Cl2 -> 2 NaCl", "Na"],
    // from memory: magnesium dissolves in hydrochloric acid with hydrogen given off
    ["Mg + 2 HCl -> MgCl2 + H2", "Mg"],
    // from memory: potassium and water give potassium hydroxide and hydrogen
    ["2 K + 2 H2O -> 2 KOH + H2", "K"],
    // from memory: the thermite reaction, 2 Al + Fe2O3 -> Al2O3 + 2 Fe
    ["2 Al + Fe2O3 → Al2O3 + 2 Fe", "Fe"],
    // from memory: zinc displaces copper from copper(II) sulfate
    ["Zn + CuSO4 -> ZnSO4 + Cu", "Cu"],
  ])("%s: %s is spotted, with no note on it", (line, metal) => {
    expect(spotted(line)).toContain(metal);
    expect(notes(line).filter((note) => note.endsWith(` ${metal}`))).toEqual([]);
  });

  it.each([
    // from memory: aluminium is a metal (group 13), sodium and potassium alkali metals
    ["Al", "aluminium"],
    ["Na", "sodium"],
    ["K", "potassium"],
    // from memory: mercury is the metal that is liquid at room temperature
    ["Hg", "mercury"],
    // from memory: lead and tin are post-transition metals
    ["Pb", "lead"],
    ["Sn", "tin"],
    // from memory: iron is a transition metal; written alone it is the metal
    ["Fe", "iron"],
  ])("%s alone is the element %s, a metal, not a radical", (symbol, name) => {
    const result = analyzeSpecies(symbol);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe("metallic-element");
    expect(result.problem.message).toContain(`element ${name}, a metal`);
  });

  it.each([
    // from memory: Na+ has the neon configuration, no unpaired electron
    ["Na+", 0],
    // from memory: Al3+ is a closed-shell ion
    ["Al3+", 0],
  ])("the ion %s is still analysed as an ion", (ion, valenceElectrons) => {
    const result = analyzeSpecies(ion);
    expect(result.ok && result.value.valenceElectrons).toBe(valenceElectrons);
  });

  it.each([
    // from memory: a chlorine atom has seven valence electrons, a radical
    ["Cl", 7],
    // from memory: a nitrogen atom has five valence electrons (three unpaired in reality)
    ["N", 5],
  ])("a lone nonmetal atom %s stays a radical", (symbol, valenceElectrons) => {
    const result = analyzeSpecies(symbol);
    expect(result.ok && result.value.radical).toBe(true);
    expect(result.ok && result.value.valenceElectrons).toBe(valenceElectrons);
  });
});

describe("single capitals in a lettered equation are placeholders", () => {
  it.each([
    // common practice: kinetics texts write generic reactions in capitals
    ["The reaction A + B → C is first order in A.", []],
    // common practice: X and Y for two generic elements
    ["X + Y -> XY", []],
    // common practice: R for an organic group
    ["R + O2 -> RO2", ["O2"]],
    // common practice: M for a generic metal
    ["M + 2 HCl -> MCl2 + H2", ["HCl", "H2"]],
    // common practice: a lettered scheme with an element-like letter in the middle
    ["A → B → C", []],
  ])("%s", (line, species) => {
    expect(spotted(line)).toEqual(species);
    expect(notes(line).filter((note) => note.startsWith("radical"))).toEqual([]);
  });

  it.each([
    // from memory: carbon burns to carbon dioxide
    ["C + O2 -> CO2", ["C", "O2", "CO2"]],
    // from memory: sulfur burns to sulfur dioxide
    ["S + O2 -> SO2", ["S", "O2", "SO2"]],
    // from memory: chlorine atoms destroy ozone, Cl + O3 -> ClO + O2
    ["Cl + O3 -> ClO + O2", ["Cl", "O3", "ClO", "O2"]],
  ])("real elements still count: %s", (line, species) => {
    expect(spotted(line)).toEqual(species);
  });

  it("a free chlorine atom in an ozone cycle is a radical, as is ClO", () => {
    // from memory: Cl (7 valence electrons) and ClO (13) are both radicals in the ozone cycle
    expect(notes("Cl + O3 -> ClO + O2")).toEqual(["radical Cl", "radical ClO"]);
  });

  it("a chain step written with radical dots keeps the methyl radical", () => {
    // from memory: chlorination of methane, Cl• + CH4 -> HCl + CH3•
    const line = "Cl• + CH4 -> HCl + CH3•";
    expect(spotted(line)).toEqual(expect.arrayContaining(["CH4", "HCl", "CH3"]));
    expect(notes(line)).toContain("radical CH3");
  });
});
