/**
 * Balancing equations through the core's public face: worked examples from general chemistry
 * texts, equations that cannot balance or balance in more than one way, and the verdict a
 * document check gives with its coefficient fix.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, balanceText, checkDocument, REACTION_CODES } from "../../shared/src/index";

/** The smallest whole-number coefficients lonepair finds for `equation`, or its error code. */
function coefficientsFor(equation: string): readonly number[] | string {
  const answer = balanceText(equation);
  return answer.ok ? answer.coefficients : answer.error.code;
}

describe("worked examples balance to the textbook coefficients", () => {
  it.each<[string, string, readonly number[]]>([
    // from memory: Zumdahl, Chemistry, ch. 3 (balancing combustion equations)
    ["propane burns", "C3H8 + O2 -> CO2 + H2O", [1, 5, 3, 4]],
    // from memory: Zumdahl, Chemistry, ch. 3
    ["methane burns", "CH4 + O2 -> CO2 + H2O", [1, 2, 1, 2]],
    // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 3
    ["ethane burns", "C2H6 + O2 -> CO2 + H2O", [2, 7, 4, 6]],
    // from memory: Petrucci, General Chemistry, ch. 4 (octane in petrol)
    ["octane burns", "C8H18 + O2 -> CO2 + H2O", [2, 25, 16, 18]],
    // from memory: Brown, LeMay & Bursten, ch. 3 (respiration)
    ["glucose is oxidised", "C6H12O6 + O2 -> CO2 + H2O", [1, 6, 6, 6]],
    // from memory: Zumdahl, Chemistry, ch. 3 (ethanol combustion worked example)
    ["ethanol burns", "C2H5OH + O2 -> CO2 + H2O", [1, 3, 2, 3]],
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 7
    ["aluminium oxidises", "Al + O2 -> Al2O3", [4, 3, 2]],
    // from memory: Tro, ch. 7 (rusting)
    ["iron rusts", "Fe + O2 -> Fe2O3", [4, 3, 2]],
    // from memory: Brown, LeMay & Bursten, ch. 3 (Haber process)
    ["ammonia synthesis", "N2 + H2 -> NH3", [1, 3, 2]],
    // from memory: Zumdahl, ch. 3 (decomposition of potassium chlorate)
    ["chlorate decomposes", "KClO3 -> KCl + O2", [2, 2, 3]],
    // from memory: Brown, LeMay & Bursten, ch. 3
    ["peroxide decomposes", "H2O2 -> H2O + O2", [2, 2, 1]],
    // from memory: Brown, LeMay & Bursten, ch. 3 (air bags)
    ["sodium azide in an air bag", "NaN3 -> Na + N2", [2, 2, 3]],
    // from memory: Petrucci, ch. 4 (blast furnace)
    ["iron ore reduced by CO", "Fe2O3 + CO -> Fe + CO2", [1, 3, 2, 3]],
    // from memory: Greenwood & Earnshaw, Chemistry of the Elements, sulfur chapter (roasting pyrite)
    ["pyrite roasted", "FeS2 + O2 -> Fe2O3 + SO2", [4, 11, 2, 8]],
    // from memory: Housecroft & Sharpe, Inorganic Chemistry, nitrogen chapter (Ostwald process)
    ["ammonia oxidised", "NH3 + O2 -> NO + H2O", [4, 5, 4, 6]],
    // from memory: Zumdahl, ch. 4 (copper in dilute nitric acid)
    ["copper in nitric acid", "Cu + HNO3 -> Cu(NO3)2 + NO + H2O", [3, 8, 3, 2, 4]],
    // from memory: Tro, ch. 4 (precipitation)
    ["silver chloride precipitates", "AgNO3 + NaCl -> AgCl + NaNO3", [1, 1, 1, 1]],
    // from memory: Tro, ch. 4 (lead iodide precipitate)
    ["lead iodide precipitates", "Pb(NO3)2 + KI -> PbI2 + KNO3", [1, 2, 1, 2]],
    // from memory: Zumdahl, ch. 4
    ["barium sulfate precipitates", "BaCl2 + Na2SO4 -> BaSO4 + NaCl", [1, 1, 1, 2]],
    // from memory: Zumdahl, ch. 4 (net ionic equation)
    ["net ionic barium sulfate", "Ba^2+ + SO4^2- -> BaSO4", [1, 1, 1]],
    // from memory: Brown, LeMay & Bursten, ch. 4 (neutralisation)
    ["sulfuric acid neutralised", "H2SO4 + NaOH -> Na2SO4 + H2O", [1, 2, 1, 2]],
    // from memory: Petrucci, ch. 4
    ["calcium phosphate formed", "Ca(OH)2 + H3PO4 -> Ca3(PO4)2 + H2O", [3, 2, 1, 6]],
    // from memory: Tro, ch. 4 (gas-forming reaction)
    ["limestone in acid", "CaCO3(s) + HCl(aq) -> CaCl2(aq) + H2O(l) + CO2(g)", [1, 2, 1, 1, 1]],
    // from memory: Brown, LeMay & Bursten, ch. 3 (baking soda)
    ["baking soda decomposes", "NaHCO3 -> Na2CO3 + H2O + CO2", [2, 1, 1, 1]],
    // from memory: Zumdahl, ch. 4 (single displacement)
    ["aluminium in acid", "Al + HCl -> AlCl3 + H2", [2, 6, 2, 3]],
    // from memory: Greenwood & Earnshaw, halogens chapter (hot alkali)
    ["chlorine disproportionates in hot alkali", "Cl2 + NaOH -> NaCl + NaClO3 + H2O", [3, 6, 5, 1, 3]],
    // from memory: Housecroft & Sharpe, halogens chapter (cold alkali)
    ["chlorine disproportionates in cold alkali", "Cl2 + OH- -> Cl- + ClO- + H2O", [1, 2, 1, 1, 1]],
    // from memory: Housecroft & Sharpe, nitrogen chapter
    ["nitrogen dioxide disproportionates", "NO2 + H2O -> HNO3 + NO", [3, 1, 2, 1]],
    // from memory: Shriver & Atkins, Inorganic Chemistry, ch. 5 (copper(I) disproportionation)
    ["copper(I) disproportionates", "Cu+ -> Cu + Cu^2+", [2, 1, 1]],
    // from memory: Zumdahl, ch. 18 (permanganate titration of iron(II), acidic)
    ["permanganate and iron(II)", "MnO4- + Fe^2+ + H+ -> Mn^2+ + Fe^3+ + H2O", [1, 5, 8, 1, 5, 4]],
    // from memory: Brown, LeMay & Bursten, ch. 20 (dichromate and iron(II))
    ["dichromate and iron(II)", "Cr2O7^2- + Fe^2+ + H+ -> Cr^3+ + Fe^3+ + H2O", [1, 6, 14, 2, 6, 7]],
    // from memory: Petrucci, ch. 5 (permanganate and oxalate)
    ["permanganate and oxalate", "MnO4- + C2O4^2- + H+ -> Mn^2+ + CO2 + H2O", [2, 5, 16, 2, 10, 8]],
    // from memory: Brown, LeMay & Bursten, ch. 20 (basic solution)
    ["permanganate and iodide in base", "MnO4- + I- + H2O -> MnO2 + I2 + OH-", [2, 6, 4, 2, 3, 8]],
    // from memory: Zumdahl, ch. 18 (basic solution worked example)
    ["chromium(III) hydroxide and chlorate in base", "Cr(OH)3 + ClO3- + OH- -> CrO4^2- + Cl- + H2O", [2, 1, 4, 2, 1, 5]],
    // from memory: Harris, Quantitative Chemical Analysis (iodometry)
    ["iodine and thiosulfate", "I2 + S2O3^2- -> I- + S4O6^2-", [1, 2, 2, 1]],
    // from memory: Atkins, Physical Chemistry, electrochemistry tables (half-reaction)
    ["permanganate half-reaction", "MnO4- + H+ + e- -> Mn^2+ + H2O", [1, 8, 5, 1, 4]],
    // from memory: Atkins, Physical Chemistry, electrochemistry tables (half-reaction)
    ["dichromate half-reaction", "Cr2O7^2- + H+ + e- -> Cr^3+ + H2O", [1, 14, 6, 2, 7]],
    // from memory: Tro, ch. 3 (hydrates lose water on heating)
    ["blue vitriol dehydrated", "CuSO4·5H2O -> CuSO4 + H2O", [1, 1, 5]],
    // from memory: Petrucci, ch. 3 (washing soda)
    ["washing soda dehydrated", "Na2CO3·10H2O -> Na2CO3 + H2O", [1, 1, 10]],
    // from memory: Tro, ch. 4 (states written)
    ["magnesium burns", "Mg(s) + O2(g) -> MgO(s)", [2, 1, 2]],
    // from memory: Zumdahl, ch. 18 (Daniell cell reaction)
    ["zinc displaces copper", "Zn(s) + Cu^2+(aq) -> Zn^2+(aq) + Cu(s)", [1, 1, 1, 1]],
    // from memory: Greenwood & Earnshaw, phosphorus chapter
    ["white phosphorus burns", "P4 + O2 -> P4O10", [1, 5, 1]],
    // from memory: Greenwood & Earnshaw, phosphorus chapter (phosphine from white phosphorus in alkali)
    ["phosphorus disproportionates in alkali", "P4 + OH- + H2O -> PH3 + H2PO2-", [1, 3, 3, 1, 3]],
    // from memory: Petrucci, ch. 4 (magnetite reduced)
    ["magnetite reduced by hydrogen", "Fe3O4 + H2 -> Fe + H2O", [1, 4, 3, 4]],
    // from memory: Greenwood & Earnshaw, phosphorus chapter (electric furnace process)
    ["phosphorus from phosphate rock", "Ca3(PO4)2 + SiO2 + C -> CaSiO3 + P4 + CO", [2, 6, 10, 6, 1, 10]],
    // from memory: Housecroft & Sharpe, halogens chapter (chlorine from permanganate)
    ["permanganate and hydrochloric acid", "KMnO4 + HCl -> KCl + MnCl2 + Cl2 + H2O", [2, 16, 2, 2, 5, 8]],
    // from memory: Zumdahl, ch. 3 (mhchem notation of the same propane equation)
    ["an mhchem span", "\\ce{C3H8 + O2 -> CO2 + H2O}", [1, 5, 3, 4]],
    // common practice: chemformula's \ch takes the same notation
    ["a chemformula span", "\\ch{C3H8 + O2 -> CO2 + H2O}", [1, 5, 3, 4]],
    // from memory: Atkins, Physical Chemistry (equilibrium arrow, Unicode)
    ["an equilibrium in Unicode", "N₂O₄ ⇌ NO₂", [1, 2]],
  ])("%s: %s", (_, equation, expected) => {
    expect(coefficientsFor(equation), `coefficients for ${equation}`).toEqual(expected);
  });
});

describe("equations that have no single answer", () => {
  it.each<[string, string, string]>([
    // common practice: sulfur cannot turn into carbon
    ["an element on one side only", "S + O2 -> CO2", REACTION_CODES.impossible],
    // common practice: an oxidation written without electrons cannot conserve charge
    ["a half-reaction without electrons", "Fe^2+ -> Fe^3+", REACTION_CODES.impossible],
    // common practice: water and peroxide from hydrogen and oxygen are two reactions in one
    ["two reactions written as one", "H2 + O2 -> H2O + H2O2", REACTION_CODES.notUnique],
    // common practice: a reactant written among the products would need a negative coefficient
    ["a species on the wrong side", "H2O -> H2 + O2 + H2O2 + O3", REACTION_CODES.notUnique],
  ])("%s: %s", (_, equation, code) => {
    expect(coefficientsFor(equation)).toBe(code);
  });

  it("names the element that cannot balance", () => {
    const answer = balanceText("S + O2 -> CO2");
    // common practice: sulfur appears only among the reactants
    expect(answer.ok ? "balanced" : answer.error.message).toContain("S appears only on the left");
  });

  it("says an oxidation without electrons needs them", () => {
    const answer = balanceText("Fe^2+ -> Fe^3+");
    // common practice: Fe2+ -> Fe3+ + e- is the balanced half-reaction
    expect(answer.ok ? "balanced" : answer.error.message).toContain("electrons");
  });
});

/** Equation findings of a document as [code, text under the finding, the equation after the fix or "-"]. */
function equationFindings(text: string, kind: "markdown" | "plaintext" = "markdown"): [string, string, string][] {
  const model = analyzeDocument(text, kind);
  return checkDocument(model)
    .filter((finding) => finding.code.startsWith("equation-"))
    .map((finding) => {
      const fix = finding.fix;
      const equation = model.reactions?.find((reaction) => reaction.arrow.range.start === finding.range.start)?.range;
      const fixed =
        fix && equation ? text.slice(equation.start, fix.range.start) + fix.newText + text.slice(fix.range.end, equation.end) : "-";
      return [finding.code, text.slice(finding.range.start, finding.range.end), fixed];
    });
}

describe("documents: a finding on the arrow and a fix that touches only coefficients", () => {
  it.each<[string, string, [string, string, string][]]>([
    // from memory: Zumdahl, ch. 3 (water from hydrogen and oxygen)
    ["mhchem, a coefficient missing", "Burn: \\ce{H2 + O2 -> 2 H2O}.", [["equation-unbalanced", "->", "2 H2 + O2 -> 2 H2O"]]],
    // from memory: Tro, ch. 7; glued coefficients stay glued
    ["plain text, glued coefficients", "Rust: 4Fe + 2O2 → 2Fe2O3", [["equation-unbalanced", "→", "4Fe + 3O2 → 2Fe2O3"]]],
    // from memory: Zumdahl, ch. 3; a coefficient that becomes 1 is removed
    ["a coefficient becomes 1", "\\ce{2 CH4 + 2 O2 -> CO2 + 2 H2O}", [["equation-unbalanced", "->", "CH4 + 2 O2 -> CO2 + 2 H2O"]]],
    // from memory: Zumdahl, ch. 3; balanced with a fraction, so nothing is said
    ["a fractional coefficient that balances", "H2 + 1/2 O2 -> H2O", []],
    // from memory: Greenwood & Earnshaw (Claus process), balanced
    ["a balanced equation in a sentence", "The Claus step is 2 H2S + SO2 → 3 S + 2 H2O, run hot.", []],
    // common practice: prose with arrows and equals signs that are not equations
    ["arrows in prose", "Grade B → grade A; pH 6 -> 8; x = 5; titre 8.1 mL -> DO = 8.1 mg/L.", []],
    // common practice: an arrow in a code span is code
    ["an arrow in code", "Run `H2 + O2 -> H2O` as a string.", []],
    // common practice: a scheme of steps is not one equation
    ["a chain of steps", "CH4 → CH3Cl → CH2Cl2", []],
    // common practice: a lone "A → B" inside a sentence is shorthand, not an equation
    ["shorthand in a sentence", "We moved the line from NH3 → NF3 last week.", []],
    // common practice: "=" is an equation only where the line is nothing else
    ["= in prose", "The ratio O2 = 2 NaCl in the old notes is a typo.", []],
    // from memory: Brown, LeMay & Bursten, ch. 3; "=" on a line of its own
    ["= on a line of its own", "CaCO3 = CaO + 2 CO2", [["equation-unbalanced", "=", "CaCO3 = CaO + CO2"]]],
    // common practice: a refused species keeps its own finding and the equation is not judged
    ["a species the core refuses", "\\ce{CH5 + O2 -> CO2 + H2O}", []],
  ])("%s", (_, text, expected) => {
    expect(equationFindings(text)).toEqual(expected);
  });

  it.each<[string, string, string]>([
    // common practice: a wrong coefficient is the writer's mistake
    ["a coefficient missing", "\\ce{H2 + O2 -> 2 H2O}", "error"],
    // common practice: reaction schemes leave out by-products (the water of an esterification)
    ["a scheme without its by-product", "\\ce{CH3COOH + CH3CH2OH -> CH3COOCH2CH3}", "warning"],
    // common practice: two reactions written as one
    ["two reactions in one", "\\ce{H2 + O2 -> H2O + H2O2}", "warning"],
  ])("%s: %s", (_, text, severity) => {
    const found = checkDocument(analyzeDocument(text, "markdown")).filter((finding) => finding.code.startsWith("equation-"));
    expect(found.map((finding) => finding.severity)).toEqual([severity]);
  });

  it("keeps the refused species' own finding", () => {
    // common practice: CH5 has one hydrogen too many for carbon
    const codes = checkDocument(analyzeDocument("\\ce{CH5 + O2 -> CO2 + H2O}", "markdown")).map((finding) => finding.code);
    expect(codes.some((code) => !code.startsWith("equation-"))).toBe(true);
  });

  it("reads an equation column of a markdown table, shorthand included", () => {
    // from memory: Greenwood & Earnshaw, sulfur chapter (SO3 from SO2)
    const table = "| Step | Reaction |\n|---|---|\n| 1 | SO2 + O2 → SO3 |\n| 2 | SO3 + H2O → H2SO4 |\n";
    expect(equationFindings(table)).toEqual([["equation-unbalanced", "→", "2 SO2 + O2 → 2 SO3"]]);
  });
});
