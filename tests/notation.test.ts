/**
 * Species written the way notebooks, handbooks and data exports write them: charges sign first,
 * state symbols, isotope labels, every element, TeX subscripts, invisible characters and shift-key
 * slips. Everything goes through the core's one door.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeSpecies, readSpecies } from "../shared/src/index";
import type { AnalysisResult, FormulaPart, SpeciesReading } from "../shared/src/index";

function read(input: string): SpeciesReading {
  const result = readSpecies(input);
  if (!result.ok) throw new Error(`expected ${JSON.stringify(input)} to read, got ${result.problem.code}: ${result.problem.message}`);
  return result.value;
}

/** "H2 O1": composition in first-appearance order, counts always written. */
function partsText(parts: readonly FormulaPart[]): string {
  return parts.map((part) => `${part.symbol}${part.count}`).join(" ");
}

function refusal(input: string): Extract<AnalysisResult, { ok: false }>["problem"] {
  const result = analyzeSpecies(input);
  if (result.ok) throw new Error(`expected ${JSON.stringify(input)} to be refused, but it was analysed`);
  return result.problem;
}

describe("charges in every style data exports use", () => {
  it.each([
    // from memory: CRC Handbook of Chemistry and Physics, thermodynamic properties of aqueous ions (charges printed sign first)
    ["SO4-2", "SO4^2-", -2],
    ["PO4-3", "PO4^3-", -3],
    ["Ca+2", "Ca^2+", 2],
    ["Fe+3", "Fe^3+", 3],
    ["Fe(CN)6-3", "Fe(CN)6^3-", -3],
    ["Fe(CN)6-4", "Fe(CN)6^4-", -4],
    ["Hg2+2", "Hg2^2+", 2],
    ["S2O3-2", "S2O3^2-", -2],
    ["SO4 -2", "SO4^2-", -2],
    ["OH-1", "OH^-", -1],
    // from memory: standard tables of common polyatomic ions, in the spellings textbooks and word processors give them
    ["SO4^2-", "SO4^2-", -2],
    ["SO4 2-", "SO4^2-", -2],
    ["SO₄²⁻", "SO4^2-", -2],
    ["SO4^-2", "SO4^2-", -2],
    ["SO4²−", "SO4^2-", -2],
    ["ClO4–", "ClO4^-", -1],
    ["ClO4−", "ClO4^-", -1],
    ["Ca⁺²", "Ca^2+", 2],
    ["CO3−2", "CO3^2-", -2],
  ])("%s reads as %s (charge %d)", (input, formula, charge) => {
    const reading = read(input);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(charge);
    expect(reading.range).toEqual({ start: 0, end: input.length });
  });

  it.each([
    // from memory: nuclide notation (IUPAC Green Book): element, hyphen, mass number
    ["C-14", "C", 14],
    ["U-235", "U", 235],
    ["O-18", "O", 18],
  ])("%s is the nuclide %s-%i, not a charge", (input, symbol, massNumber) => {
    const reading = read(input);
    expect(reading.charge).toBe(0);
    expect(partsText(reading.composition)).toBe(`${symbol}1`);
    expect(reading.isotopes).toEqual([{ symbol, massNumber, written: input }]);
  });

  it.each([
    // from memory: CRC Handbook aqueous ions; oxide, sulfide and nitride as handbook tables print them
    ["O-2", -2],
    ["S-2", -2],
    ["N-3", -3],
  ])("%s stays a charge (%d): too small a number for a mass number", (input, charge) => {
    expect(read(input).charge).toBe(charge);
  });
});

describe("sub- and superscripts set in markup", () => {
  it.each([
    // from memory: HTML 4 character entity references (minus, ndash) and numeric references to U+2212
    ["SO<sub>4</sub><sup>2&minus;</sup>", "SO4^2-", -2],
    ["CO<sub>3</sub><sup>2&#8722;</sup>", "CO3^2-", -2],
    ["NO<sub>3</sub><sup>&#x2212;</sup>", "NO3^-", -1],
    ["Cl<sup>&ndash;</sup>", "Cl^-", -1],
    // from memory: MediaWiki {{sub}} and {{sup}} templates as reference wikis write formulas
    ["H{{sub|2}}O", "H2O", 0],
    ["SO{{sub|4}}{{sup|2−}}", "SO4^2-", -2],
    ["N{{sub|2}}F{{sub|4}}", "N2F4", 0],
    // from memory: AsciiDoc subscript ~text~ and superscript ^text^ (Asciidoctor user manual)
    ["H~2~O", "H2O", 0],
    ["SO~4~^2-^", "SO4^2-", -2],
    ["Ca^2+^", "Ca^2+", 2],
    // from memory: reStructuredText :sub: and :sup: roles, glued with escaped spaces (Docutils reference)
    ["H\\ :sub:`2`\\ O", "H2O", 0],
    ["NH\\ :sub:`4`\\ :sup:`+`", "NH4^+", 1],
    // from memory: LaTeX text-mode \textsubscript and \textsuperscript; "--" is LaTeX's en dash
    ["H\\textsubscript{2}O", "H2O", 0],
    ["SO\\textsubscript{4}\\textsuperscript{2--}", "SO4^2-", -2],
  ])("%s reads as %s (charge %d)", (input, formula, charge) => {
    const reading = read(input);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(charge);
    expect(reading.range).toEqual({ start: 0, end: input.length });
  });

  it.each([
    // from memory: IUPAC nuclide notation, the mass number as a left superscript, in each markup
    ["<sup>13</sup>CO<sub>2</sub>", "C1 O2", "C", 13],
    ["H<sub>2</sub><sup>18</sup>O", "H2 O1", "O", 18],
    ["^13^CO~2~", "C1 O2", "C", 13],
    ["\\mathrm{^{13}CO_2}", "C1 O2", "C", 13],
    ["{}^{13}CO_2", "C1 O2", "C", 13],
    ["\\mathrm{H_2^{18}O}", "H2 O1", "O", 18],
  ])("%s reads as %s labelled %s-%i", (input, composition, symbol, massNumber) => {
    const reading = read(input);
    expect(partsText(reading.composition)).toBe(composition);
    expect(reading.isotopes?.map((label) => [label.symbol, label.massNumber])).toEqual([[symbol, massNumber]]);
  });

  it.each([
    // common practice: markup that holds words, not counts or charges, is no formula
    ["H{{sub|two}}O"],
    ["SO<sub>4</sub><sup>&amp;</sup>"],
    ["H~x~O"],
  ])("%s is refused", (input) => {
    expect(readSpecies(input).ok).toBe(false);
  });
});

describe("state symbols", () => {
  it.each([
    // from memory: IUPAC Green Book, state symbols (s), (l), (g), (aq) written after a formula
    ["NaCl(s)", "NaCl", 0, "s"],
    ["H2O(l)", "H2O", 0, "l"],
    ["NH3(g)", "NH3", 0, "g"],
    ["HCl(aq)", "HCl", 0, "aq"],
    ["CO2 (aq)", "CO2", 0, "aq"],
    ["Ca+2(aq)", "Ca^2+", 2, "aq"],
    ["SO4^2- (aq)", "SO4^2-", -2, "aq"],
    ["water (l)", "H2O", 0, "l"],
    // from memory: mhchem package documentation, states after a charge and as a subscript
    ["\\ce{SO4^2-(aq)}", "SO4^2-", -2, "aq"],
    ["\\ce{CO3^2-_{(aq)}}", "CO3^2-", -2, "aq"],
    ["\\ce{H2O(l)}", "H2O", 0, "l"],
  ])("%s is %s (charge %d) with state %s kept", (input, formula, charge, state) => {
    const reading = read(input);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(charge);
    expect(reading.state).toBe(state);
    expect(reading.range).toEqual({ start: 0, end: input.length });
  });

  it("shows the state on the analysis, so hovers and cards can say it", () => {
    // from memory: IUPAC Green Book, (aq) is an aqueous solution
    const result = analyzeSpecies("NH3(aq)");
    expect(result.ok && result.value.reading.state).toBe("aq");
  });

  it.each([["H2O(l)"], ["NH3(g)"], ["\\ce{SO4^2-(aq)}"], ["CO2 (aq)"]])("%s is never refused as an unknown element", (input) => {
    // common practice: a state symbol is notation, not part of the formula
    const result = analyzeSpecies(input);
    expect(result.ok ? "analysed" : result.problem.code).toBe("analysed");
  });
});

describe("every element of the periodic table", () => {
  it.each([
    // from memory: Greenwood and Earnshaw, Chemistry of the Elements (actinide halides and oxides)
    ["UF6", "U1 F6", "f-block-centre", "uranium"],
    ["PuF6", "Pu1 F6", "f-block-centre", "plutonium"],
    ["ThCl4", "Th1 Cl4", "f-block-centre", "thorium"],
    // from memory: Cotton, Lanthanide and Actinide Chemistry (LnCl3 are ionic lattices of Ln3+)
    ["CeCl3", "Ce1 Cl3", "ionic-solid", "Ce^3+"],
    ["GdCl3", "Gd1 Cl3", "ionic-solid", "Gd^3+"],
    // from memory: Greenwood and Earnshaw, ThO2 and CeO2 have the ionic fluorite lattice
    ["ThO2", "Th1 O2", "ionic-solid", "Th^4+"],
    ["CeO2", "Ce1 O2", "ionic-solid", "Ce^4+"],
    // from memory: Greenwood and Earnshaw, radium chloride is an ionic salt like BaCl2
    ["RaCl2", "Ra1 Cl2", "ionic-solid", "Ra"],
    ["FrCl", "Fr1 Cl1", "ionic-solid", "Fr"],
    // from memory: IUPAC 2016 names of elements 113-118; their chemistry is known from single atoms
    ["OgF4", "Og1 F4", "superheavy-element", "oganesson"],
    ["FlCl2", "Fl1 Cl2", "superheavy-element", "flerovium"],
    ["RfCl4", "Rf1 Cl4", "superheavy-element", "rutherfordium"],
  ])("%s reads as %s and is refused as %s, naming %s", (input, composition, code, mention) => {
    expect(partsText(read(input).composition)).toBe(composition);
    const problem = refusal(input);
    expect(problem.code).toBe(code);
    expect(problem.message).toContain(mention);
    expect(problem.message).not.toContain("not an element symbol");
  });

  it("says an f-block centre is f-block, not a transition metal", () => {
    // from memory: Cotton and Wilkinson, lanthanide and actinide bonding is largely ionic, shapes follow coordination number
    const message = refusal("UF6").message;
    expect(message).toContain("f-block");
    expect(message).not.toContain("transition metal");
  });
});

describe("isotopes and deuterium", () => {
  it.each([
    // common practice: D and T are the symbols of hydrogen-2 and hydrogen-3 (IUPAC allows them)
    ["D2O", "H2 O1", [["H", 2, "D"]]],
    ["CDCl3", "C1 H1 Cl3", [["H", 2, "D"]]],
    ["CD3OD", "C1 H4 O1", [["H", 2, "D"]]],
    ["T2O", "H2 O1", [["H", 3, "T"]]],
    ["HDO", "H2 O1", [["H", 2, "D"]]],
    // from memory: IUPAC nuclide notation, mass number as a left superscript
    ["13CO2", "C1 O2", [["C", 13, "13C"]]],
    ["^{13}CO2", "C1 O2", [["C", 13, "^{13}C"]]],
    ["^13CO2", "C1 O2", [["C", 13, "^13C"]]],
    ["¹³CO₂", "C1 O2", [["C", 13, "¹³C"]]],
    ["H2^{18}O", "H2 O1", [["O", 18, "^{18}O"]]],
    ["15NH3", "N1 H3", [["N", 15, "15N"]]],
    ["235UF6", "U1 F6", [["U", 235, "235U"]]],
    // from memory: mhchem package documentation, ^{227}_{90}Th
    ["\\ce{^{227}_{90}Th+}", "Th1", [["Th", 227, "^{227}_{90}Th"]]],
  ] as const)("%s reads as %s with labels %j", (input, composition, labels) => {
    const reading = read(input);
    expect(partsText(reading.composition)).toBe(composition);
    expect(reading.isotopes?.map((label) => [label.symbol, label.massNumber, label.written])).toEqual(labels);
  });

  it("reads CDCl3 as deuterochloroform, never as cadmium", () => {
    // common practice: CDCl3 is the NMR solvent; cadmium is Cd with a lower-case d
    const result = analyzeSpecies("CDCl3");
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.reading.composition.map((part) => part.symbol)).not.toContain("Cd");
  });

  it.each([
    // common practice: a small number in front of a formula counts molecules in an equation
    ["2H2O"],
    ["20H2O"],
    ["3O2"],
  ])("%s keeps its count-of-molecules refusal", (input) => {
    const result = readSpecies(input);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.message).toContain("counts molecules");
  });

  it.each([
    // from memory: no nucleus has fewer nucleons than protons; thorium is element 90
    ["^{5}CO2", "not a mass number"],
    ["\\ce{^{227}_{91}Th}", "does not match thorium"],
  ])("%s is refused in isotope terms", (input, words) => {
    const result = readSpecies(input);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problem.message).toContain(words);
      expect(result.problem.message).not.toContain("not an element symbol");
    }
  });
});

describe("shift-key slips", () => {
  it.each([
    // common practice: typed without the shift key; the species meant is the common molecule or ion
    ["co2", "CO2"],
    ["co", "CO"],
    ["nh3", "NH3"],
    ["nh4+", "NH4+"],
    ["cs2", "CS2"],
    ["hf", "HF"],
    ["no", "NO"],
    ["sih4", "SiH4"],
    ["sncl4", "SnCl4"],
    ["Sf4", "SF4"],
    ["XeOf4", "XeOF4"],
    ["nacl", "NaCl"],
    ["nh3(g)", "NH3(g)"],
  ])("%s suggests %s", (input, expected) => {
    expect(refusal(input).suggestion).toBe(expected);
  });

  it.each([["co2"], ["nh3"], ["cs2"], ["hf"], ["sncl4"], ["nh4+"]])("the suggestion for %s is a species that analyses", (input) => {
    // common practice: a correction is only worth offering when it is itself right
    const suggestion = refusal(input).suggestion as string;
    const result = analyzeSpecies(suggestion);
    expect(result.ok ? "analysed" : result.problem.code).toBe("analysed");
  });

  it("offers nothing when no spelling is a valid species", () => {
    // common practice: "Xx" is no element in any case
    expect(refusal("xx2").suggestion).toBeUndefined();
  });
});

describe("subscripts and invisible characters", () => {
  it.each([
    // common practice: TeX subscripts typed outside mhchem
    ["H_2O", "H2O", 0],
    ["CO_2", "CO2", 0],
    ["H_{2}O", "H2O", 0],
    ["SO_4^{2-}", "SO4^2-", -2],
    ["\\ce{H_2O}", "H2O", 0],
    // common practice: pasted text carries zero-width and no-break spaces
    ["H2\u200bO", "H2O", 0],
    ["\u200bCO2\u200b", "CO2", 0],
    ["H2\u00a0O", "H2O", 0],
    ["NH\u20604+", "NH4^+", 1],
    ["SO4\u00a02-", "SO4^2-", -2],
  ])("%j reads as %s", (input, formula, charge) => {
    const reading = read(input);
    expect(reading.formula).toBe(formula);
    expect(reading.charge).toBe(charge);
    expect(reading.text).toBe(input.slice(reading.range.start, reading.range.end));
  });

  it.each([["Xx\u200b2"], ["H2\u200bQ"], ["\u200bSf\u200b4"]])("a message about %j never quotes an invisible character", (input) => {
    // common practice: a message must show what is wrong, and an invisible character shows nothing
    const result = readSpecies(input);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.message).not.toMatch(/[\u200b\u2060\u00a0]/);
  });
});

describe("messages in the user's terms", () => {
  it.each([
    // common practice: these are notation, not element symbols or misplaced charges
    ["Ca+2"],
    ["SO4-2"],
    ["HCl(aq)"],
    ["D2O"],
    ["13CO2"],
  ])("%s is never called an unknown element or a misplaced charge", (input) => {
    const result = analyzeSpecies(input);
    const message = result.ok ? "" : result.problem.message;
    expect(message).not.toContain("not an element symbol");
    expect(message).not.toContain("can only come at the end");
  });

  it.each([
    // from memory: alkanes CnH2n+2 hold the most hydrogens: C2H6, C3H8 (any general chemistry text)
    ["C2H7", 6, 7],
    ["C3H9", 8, 9],
    ["C2H5Cl2", 6, 7],
  ])("%s is impossible (at most %i hydrogens and halogens, has %i), not ambiguous", (input, most, has) => {
    const problem = refusal(input);
    expect(problem.code).toBe("hydrogen-overbonded");
    expect(problem.message).toContain("too many hydrogens".replace("too", "Too"));
    expect(problem.message).toContain(`at most ${most}`);
    expect(problem.message).toContain(`has ${has}`);
  });

  it.each([
    // from memory: C2H7N is ethylamine or dimethylamine; C2H5 the ethyl radical (both real)
    ["C2H7N"],
    ["C2H6"],
  ])("%s is not called impossible", (input) => {
    const result = analyzeSpecies(input);
    expect(result.ok ? "analysed" : result.problem.code).not.toBe("hydrogen-overbonded");
  });
});

/** A species as element groups, with the charge: enough to write it every way people do. */
interface PlainSpecies {
  readonly groups: readonly (readonly [string, number])[];
  readonly charge: number;
}

// from memory: standard tables of common molecules and polyatomic ions (formulas and charges)
const SPECIES: readonly PlainSpecies[] = [
  {
    groups: [
      ["H", 2],
      ["O", 1],
    ],
    charge: 0,
  },
  {
    groups: [
      ["C", 1],
      ["O", 2],
    ],
    charge: 0,
  },
  {
    groups: [
      ["N", 1],
      ["H", 3],
    ],
    charge: 0,
  },
  {
    groups: [
      ["C", 1],
      ["H", 4],
    ],
    charge: 0,
  },
  {
    groups: [
      ["C", 1],
      ["H", 1],
      ["Cl", 3],
    ],
    charge: 0,
  },
  {
    groups: [
      ["S", 1],
      ["O", 4],
    ],
    charge: -2,
  },
  {
    groups: [
      ["P", 1],
      ["O", 4],
    ],
    charge: -3,
  },
  {
    groups: [
      ["N", 1],
      ["H", 4],
    ],
    charge: 1,
  },
  {
    groups: [
      ["C", 1],
      ["O", 3],
    ],
    charge: -2,
  },
  {
    groups: [
      ["N", 1],
      ["O", 3],
    ],
    charge: -1,
  },
  {
    groups: [
      ["Cl", 1],
      ["O", 4],
    ],
    charge: -1,
  },
  {
    groups: [
      ["H", 3],
      ["O", 1],
    ],
    charge: 1,
  },
  {
    groups: [
      ["H", 1],
      ["C", 1],
      ["O", 3],
    ],
    charge: -1,
  },
  {
    groups: [
      ["C", 2],
      ["H", 6],
    ],
    charge: 0,
  },
  {
    groups: [
      ["S", 1],
      ["F", 6],
    ],
    charge: 0,
  },
  { groups: [["Ca", 1]], charge: 2 },
  { groups: [["Al", 1]], charge: 3 },
];

const SUBSCRIPT_DIGITS = "₀₁₂₃₄₅₆₇₈₉";
const SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

type CountStyle = "plain" | "unicode" | "tex" | "braced";
type ChargeStyle = "caret" | "space" | "bracket" | "braced" | "unicode" | "signFirst" | "caretSignFirst" | "unicodeMinus" | "enDash";
type State = "" | "(aq)" | " (aq)" | "(s)" | "(l)" | "(g)";

function countText(count: number, style: CountStyle): string {
  if (count === 1) return "";
  if (style === "unicode") return [...String(count)].map((digit) => SUBSCRIPT_DIGITS[Number(digit)]).join("");
  if (style === "tex") return `_${count}`;
  if (style === "braced") return `_{${count}}`;
  return String(count);
}

function chargeTextIn(charge: number, style: ChargeStyle): string {
  if (charge === 0) return "";
  const sign = charge > 0 ? "+" : "-";
  const size = Math.abs(charge);
  const number = size === 1 ? "" : String(size);
  switch (style) {
    case "caret":
      return `^${number}${sign}`;
    case "space":
      return ` ${number}${sign}`;
    case "bracket":
      return `(${number}${sign})`;
    case "braced":
      return `^{${number}${sign}}`;
    case "unicode":
      return [...number].map((digit) => SUPERSCRIPT_DIGITS[Number(digit)]).join("") + (charge > 0 ? "⁺" : "⁻");
    case "signFirst":
      return `${sign}${size}`;
    case "caretSignFirst":
      return `^${sign}${size}`;
    case "unicodeMinus":
      return `^${number}${charge > 0 ? "+" : "−"}`;
    case "enDash":
      return ` ${number}${charge > 0 ? "+" : "–"}`;
  }
}

const writing = fc.record({
  species: fc.constantFrom(...SPECIES),
  countStyle: fc.constantFrom<CountStyle>("plain", "unicode", "tex", "braced"),
  chargeStyle: fc.constantFrom<ChargeStyle>(
    "caret",
    "space",
    "bracket",
    "braced",
    "unicode",
    "signFirst",
    "caretSignFirst",
    "unicodeMinus",
    "enDash",
  ),
  state: fc.constantFrom<State>("", "(aq)", " (aq)", "(s)", "(l)", "(g)"),
  deuterium: fc.boolean(),
  carbonLabel: fc.constantFrom("", "^{13}", "^13", "¹³", "13"),
  mhchem: fc.boolean(),
});

describe("every way of writing a species reads as the plain formula", () => {
  it("keeps element counts and charge whatever the notation", () => {
    fc.assert(
      fc.property(writing, ({ species, countStyle, chargeStyle, state, deuterium, carbonLabel, mhchem }) => {
        const plain =
          species.groups.map(([symbol, count]) => `${symbol}${count === 1 ? "" : count}`).join("") + chargeTextIn(species.charge, "caret");
        let body = "";
        species.groups.forEach(([symbol, count], index) => {
          // a leading bare mass number only where the formula starts with carbon
          const label = symbol === "C" && (carbonLabel !== "13" || index === 0) ? carbonLabel : "";
          const written = symbol === "H" && deuterium ? "D" : symbol;
          body += `${label}${written}${countText(count, countStyle)}`;
        });
        const text = `${body}${chargeTextIn(species.charge, chargeStyle)}${state}`;
        const input = mhchem ? `\\ce{${text}}` : text;
        const reference = read(plain);
        const reading = read(input);
        // source: the group list itself, counted by hand (common practice)
        const expected = new Map<string, number>();
        for (const [symbol, count] of species.groups) expected.set(symbol, (expected.get(symbol) ?? 0) + count);
        expect(new Map(reading.composition.map((part) => [part.symbol, part.count])), input).toEqual(expected);
        expect(new Map(reference.composition.map((part) => [part.symbol, part.count])), plain).toEqual(expected);
        expect(reading.charge, input).toBe(species.charge);
        expect(reading.state, input).toBe(state === "" ? undefined : state.trim().slice(1, -1));
        const labelled =
          (deuterium && expected.has("H")) ||
          (carbonLabel !== "" && expected.has("C") && (carbonLabel !== "13" || species.groups[0][0] === "C"));
        expect(reading.isotopes !== undefined, input).toBe(labelled);
      }),
      { numRuns: 600, seed: 20261203 },
    );
  });
});
