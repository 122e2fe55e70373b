/**
 * Oxidation states against textbook values, through the core's public face: from the Lewis
 * structure where lonepair draws one, by the usual rules where it does not (Fe3O4, MnO4-).
 */
import { describe, expect, it } from "vitest";
import {
  analyzeSpecies,
  formatOxidationState,
  hoverMarkdown,
  oxidationStatesOf,
  oxidationStatesText,
  readSpecies,
} from "../../shared/src/index";

/** Each element's states, one per atom, ascending: "S:-1,5 O:-2,-2,-2". */
function statesOf(formula: string): string {
  const reading = readSpecies(formula);
  if (!reading.ok) return `unread: ${reading.problem.message}`;
  const states = oxidationStatesOf(reading.value, analyzeSpecies(formula));
  if (!states) return "unknown";
  return states.elements.map((element) => `${element.symbol}:${element.states.join(",")}`).join(" ");
}

describe("oxidation states of every atom", () => {
  it.each<[string, string]>([
    // from memory: Zumdahl, Chemistry, ch. 4 (rules for assigning oxidation states)
    ["H2O", "H:1,1 O:-2"],
    ["CO2", "C:4 O:-2,-2"],
    ["CH4", "C:-4 H:1,1,1,1"],
    ["NH3", "N:-3 H:1,1,1"],
    ["SO4^2-", "S:6 O:-2,-2,-2,-2"],
    ["HNO3", "H:1 N:5 O:-2,-2,-2"],
    ["NO2-", "N:3 O:-2,-2"],
    ["ClO3-", "Cl:5 O:-2,-2,-2"],
    ["HClO4", "H:1 Cl:7 O:-2,-2,-2,-2"],
    ["H3PO4", "H:1,1,1 P:5 O:-2,-2,-2,-2"],
    ["CN-", "C:2 N:-3"],
    // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 4
    ["Cr2O7^2-", "Cr:6,6 O:-2,-2,-2,-2,-2,-2,-2"],
    ["MnO4-", "Mn:7 O:-2,-2,-2,-2"],
    ["KMnO4", "K:1 Mn:7 O:-2,-2,-2,-2"],
    ["K2Cr2O7", "K:1,1 Cr:6,6 O:-2,-2,-2,-2,-2,-2,-2"],
    ["Fe2O3", "Fe:3,3 O:-2,-2,-2"],
    ["NaCl", "Na:1 Cl:-1"],
    // from memory: Housecroft & Sharpe, Inorganic Chemistry (peroxides and fluorides of oxygen)
    ["H2O2", "H:1,1 O:-1,-1"],
    ["OF2", "O:2 F:-1,-1"],
    ["Na2O2", "Na:1,1 O:-1,-1"],
    // from memory: Housecroft & Sharpe (saline hydrides)
    ["NaH", "Na:1 H:-1"],
    ["CaH2", "Ca:2 H:-1,-1"],
    ["LiAlH4", "Li:1 Al:3 H:-1,-1,-1,-1"],
    // from memory: IUPAC technical report on the definition of oxidation state (Lewis structure, bonds to the more electronegative atom)
    ["S2O3^2-", "S:-1,5 O:-2,-2,-2"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (ammonium nitrate: N -3 and +5)
    ["NH4NO3", "N:-3,5 H:1,1,1,1 O:-2,-2,-2"],
    // from memory: Clayden, Organic Chemistry (oxidation levels of carbon in acetic acid)
    ["CH3COOH", "C:-3,3 H:1,1,1,1 O:-2,-2"],
    ["CH3OH", "C:-2 H:1,1,1,1 O:-2"],
    ["HCOOH", "H:1,1 C:2 O:-2,-2"],
    ["C2H6", "C:-3,-3 H:1,1,1,1,1,1"],
    // from memory: Greenwood & Earnshaw, Chemistry of the Elements (interhalogens and xenon fluorides)
    ["ClF3", "Cl:3 F:-1,-1,-1"],
    ["IF7", "I:7 F:-1,-1,-1,-1,-1,-1,-1"],
    ["XeF4", "Xe:4 F:-1,-1,-1,-1"],
    ["SF6", "S:6 F:-1,-1,-1,-1,-1,-1"],
    ["BrO3-", "Br:5 O:-2,-2,-2"],
    ["N2H4", "N:-2,-2 H:1,1,1,1"],
    ["P4O10", "P:5,5,5,5 O:-2,-2,-2,-2,-2,-2,-2,-2,-2,-2"],
    ["N2O4", "N:4,4 O:-2,-2,-2,-2"],
    // from memory: Greenwood & Earnshaw (nitrogen dioxide is N(IV), nitric oxide N(II), chlorine dioxide Cl(IV))
    ["NO2", "N:4 O:-2,-2"],
    ["NO", "N:2 O:-2"],
    ["ClO2", "Cl:4 O:-2,-2"],
    // from memory: IUPAC technical report on oxidation state (ionic approximation; an odd electron on
    // an atom with no less electronegative neighbour to carry it stays there)
    ["CH3", "C:-3 H:1,1,1"],
    ["OH", "O:-1 H:1"],
    ["HO2", "H:1 O:-1,0"],
    // from memory: Housecroft & Sharpe (ozone's Lewis structure: central O +1, terminal O 0 and -1)
    ["O3", "O:-1,0,1"],
    // common practice: an element on its own is 0
    ["O2", "O:0,0"],
    // from memory: Greenwood & Earnshaw (magnetite is Fe(II)Fe(III)2O4, red lead Pb(II)2Pb(IV)O4)
    ["Fe3O4", "Fe:2,3,3 O:-2,-2,-2,-2"],
    ["Pb3O4", "Pb:2,2,4 O:-2,-2,-2,-2"],
    // from memory: Zumdahl, ch. 4 (copper(II) sulfate pentahydrate)
    ["CuSO4·5H2O", "Cu:2 S:6 O:-2,-2,-2,-2,-2,-2,-2,-2,-2 H:1,1,1,1,1,1,1,1,1,1"],
  ])("%s has %s", (formula, expected) => {
    expect(statesOf(formula), `oxidation states of ${formula}`).toBe(expected);
  });

  it.each<[string, string, string]>([
    // from memory: Housecroft & Sharpe (superoxide O2- averages -1/2, as in KO2)
    ["O2^-", "O", "-1/2"],
    ["KO2", "O", "-1/2"],
    // from memory: Greenwood & Earnshaw (hydroperoxyl HO2 averages -1/2 on oxygen; ozone 0)
    ["HO2", "O", "-1/2"],
    ["O3", "O", "0"],
    // from memory: Zumdahl, ch. 4 (dinitrogen monoxide, N averages +1)
    ["N2O", "N", "+1"],
  ])("%s averages %s at %s", (formula, symbol, expected) => {
    const reading = readSpecies(formula);
    const states = reading.ok ? oxidationStatesOf(reading.value, analyzeSpecies(formula)) : undefined;
    const element = states?.elements.find((candidate) => candidate.symbol === symbol);
    expect(element && formatOxidationState(element.average.numerator, element.average.denominator)).toBe(expected);
  });

  it("shows an average with the per-atom split", () => {
    const reading = readSpecies("Fe3O4");
    const states = reading.ok ? oxidationStatesOf(reading.value, analyzeSpecies("Fe3O4")) : undefined;
    // from memory: Greenwood & Earnshaw: magnetite averages +8/3 over two Fe(III) and one Fe(II)
    expect(states && oxidationStatesText(states)).toBe("Fe 2× +3, 1× +2 (average +8/3); O -2");
  });

  it("splits tetrathionate's average from its structure", () => {
    const reading = readSpecies("S4O6^2-");
    const states = reading.ok ? oxidationStatesOf(reading.value, analyzeSpecies("S4O6^2-")) : undefined;
    // from memory: Harris, Quantitative Chemical Analysis: tetrathionate sulfur averages +2.5,
    // the two sulfonate S +5 and the two bridging S 0
    expect(states && oxidationStatesText(states)).toBe("S 2× +5, 2× 0 (average +5/2); O -2");
  });

  it("says so when nothing tells which atom has which state", () => {
    const reading = readSpecies("S3O6^2-");
    const states = reading.ok ? oxidationStatesOf(reading.value, analyzeSpecies("S3O6^2-")) : undefined;
    // from memory: Greenwood & Earnshaw, sulfur chapter: trithionate sulfur averages +10/3
    expect(states && oxidationStatesText(states)).toContain("S +10/3 (average");
  });
});

describe("per-atom splits and resonance", () => {
  /** The hover card's text for one species' oxidation states, other forms included. */
  function cardText(formula: string): string {
    const reading = readSpecies(formula);
    const states = reading.ok ? oxidationStatesOf(reading.value, analyzeSpecies(formula), { otherForms: true }) : undefined;
    return states ? oxidationStatesText(states) : "unknown";
  }

  it.each<[string, string]>([
    // from memory: Brown, LeMay & Bursten, ch. 8 (of N2O's forms, N≡N⁺–O⁻ puts the negative charge on
    // the most electronegative atom and is the major one); IUPAC Recommendations 2016 on oxidation state
    // (bonding electrons to the more electronegative atom, homonuclear bonds split evenly) then gives the
    // terminal N 0 and the central N +2 in it, -1 and +3 in ⁻N=N⁺=O; the average +1 in both
    ["N2O", "N 1× +2, 1× 0 in the drawn resonance form, 1× +3, 1× -1 in another (average +1 in every form); O -2"],
    // from memory: Housecroft & Sharpe, Inorganic Chemistry, nitrogen chapter (azide is the symmetric
    // [N=N=N]⁻): terminal N -1, central N +1, average -1/3
    ["N3-", "N 1× +1, 2× -1 (average -1/3)"],
    // from memory: IUPAC Recommendations 2016 on oxidation state (bonds to the more electronegative
    // atom, lone pairs stay put): diazomethane H2C=N⁺=N⁻ gives C 0 and both N -1, its other form
    // H2C⁻-N⁺≡N keeps a lone pair on C (C -2, both N 0), so no one average holds for every form
    ["CH2N2", "C 0 in the drawn resonance form, -2 in another; H +1; N 2× -1 in the drawn resonance form, 2× 0 in another"],
    // from memory: Greenwood & Earnshaw, carbon chapter (thiocyanate S -2, C +4, N -3; cyanate O -2, C +4, N -3):
    // carbon is the least electronegative atom, so every form gives the same split
    ["SCN-", "S -2; C +4; N -3"],
    ["OCN-", "O -2; C +4; N -3"],
    // from memory: Zumdahl, Chemistry, ch. 4 (carbonate: C +4); its three forms differ only in which O is doubly bonded
    ["CO3^2-", "C +4; O -2"],
    // from memory: Harris, Quantitative Chemical Analysis (tetrathionate: two sulfonate S +5, two bridging S 0)
    ["S4O6^2-", "S 2× +5, 2× 0 (average +5/2); O -2"],
    // from memory: IUPAC technical report on oxidation state (thiosulfate: central S +5, terminal S -1)
    ["S2O3^2-", "S 1× +5, 1× -1 (average +2); O -2"],
    // from memory: Housecroft & Sharpe (ozone: central O +1, terminal O 0 and -1 in either form)
    ["O3", "O 1× +1, 1× 0, 1× -1 (average 0)"],
  ])("%s: %s", (formula, expected) => {
    expect(cardText(formula)).toBe(expected);
  });

  it("the drawn form's split is the one with the negative charge on oxygen", () => {
    // from memory: Brown, LeMay & Bursten, ch. 8 (formal charges choose N≡N⁺–O⁻ for N2O)
    const result = analyzeSpecies("N2O");
    expect(result.ok && result.value.graph.atoms.map((atom) => `${atom.symbol}${atom.formalCharge}`)).toEqual(["N1", "N0", "O-1"]);
  });

  it("the hover card says the split is the drawn form's only where forms differ", () => {
    const n2o = analyzeSpecies("N2O");
    const co2 = analyzeSpecies("CO2");
    // from memory: Zumdahl, ch. 4 (CO2: C +4, O -2, one structure)
    expect(n2o.ok && hoverMarkdown(n2o.value, { angleDecimals: 1, format: "plaintext" })).toContain("in the drawn resonance form");
    expect(co2.ok && hoverMarkdown(co2.value, { angleDecimals: 1, format: "plaintext" })).toContain("Oxidation states: C +4; O -2");
    expect(co2.ok && hoverMarkdown(co2.value, { angleDecimals: 1, format: "plaintext" })).not.toContain("resonance form");
  });
});
