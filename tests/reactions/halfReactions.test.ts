/**
 * Completing half-reactions and skeleton redox equations in acidic and basic solution, and
 * combining two half-reactions, through the core's public face: worked examples of the
 * ion-electron method, the equations that must not be completed, the writer's notation kept,
 * and the editor actions whose edits leave the equation balanced.
 */
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  balanceInSolution,
  checkDocument,
  equationActions,
  type EquationAction,
  type SolutionMedium,
} from "../../shared/src/index";

/** The completed equation lonepair gives for `skeleton` in `medium`, or the error code. */
function completed(skeleton: string, medium: SolutionMedium): string {
  const answer = balanceInSolution(skeleton, medium);
  if (!answer.ok) return answer.error.code;
  expect(answer.completedIn, skeleton).toBe(medium);
  return answer.equation;
}

describe("worked examples of the ion-electron method", () => {
  it.each<[string, string, SolutionMedium, string]>([
    // from memory: Zumdahl, Chemistry, ch. 18 (permanganate oxidises iron(II) in acid)
    ["permanganate and iron(II)", "MnO4- + Fe^2+ -> Mn^2+ + Fe^3+", "acidic", "MnO4- + 5 Fe^2+ + 8 H+ -> Mn^2+ + 5 Fe^3+ + 4 H2O"],
    // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 20 (oxalate titration)
    ["permanganate and oxalate", "MnO4- + C2O4^2- -> Mn^2+ + CO2", "acidic", "2 MnO4- + 5 C2O4^2- + 16 H+ -> 2 Mn^2+ + 10 CO2 + 8 H2O"],
    // from memory: Brown, LeMay & Bursten, ch. 20
    ["dichromate and iron(II)", "Cr2O7^2- + Fe^2+ -> Cr^3+ + Fe^3+", "acidic", "Cr2O7^2- + 6 Fe^2+ + 14 H+ -> 2 Cr^3+ + 6 Fe^3+ + 7 H2O"],
    // from memory: Petrucci, General Chemistry, ch. 5 (dichromate oxidises chloride)
    ["dichromate and chloride", "Cr2O7^2- + Cl- -> Cr^3+ + Cl2", "acidic", "Cr2O7^2- + 6 Cl- + 14 H+ -> 2 Cr^3+ + 3 Cl2 + 7 H2O"],
    // from memory: Zumdahl, Chemistry, ch. 4 (copper dissolves in dilute nitric acid)
    ["copper and nitrate", "Cu + NO3- -> Cu^2+ + NO", "acidic", "3 Cu + 2 NO3- + 8 H+ -> 3 Cu^2+ + 2 NO + 4 H2O"],
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 18 (concentrated nitric acid)
    ["copper and nitrate to NO2", "Cu + NO3- -> Cu^2+ + NO2", "acidic", "Cu + 2 NO3- + 4 H+ -> Cu^2+ + 2 NO2 + 2 H2O"],
    // from memory: Chang, Chemistry, ch. 4 (the breath analyser: ethanol to acetic acid)
    [
      "dichromate and ethanol",
      "Cr2O7^2- + C2H5OH -> Cr^3+ + CH3COOH",
      "acidic",
      "2 Cr2O7^2- + 3 C2H5OH + 16 H+ -> 4 Cr^3+ + 3 CH3COOH + 11 H2O",
    ],
    // from memory: Petrucci, ch. 5 (hydrogen peroxide reduces permanganate)
    ["permanganate and peroxide", "MnO4- + H2O2 -> Mn^2+ + O2", "acidic", "2 MnO4- + 5 H2O2 + 6 H+ -> 2 Mn^2+ + 5 O2 + 8 H2O"],
    // from memory: Silberberg, Chemistry: The Molecular Nature of Matter and Change, ch. 21 (bismuthate test for manganese)
    ["manganese(II) and bismuthate", "Mn^2+ + BiO3- -> MnO4- + Bi^3+", "acidic", "2 Mn^2+ + 5 BiO3- + 14 H+ -> 2 MnO4- + 5 Bi^3+ + 7 H2O"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (zinc reduces nitrate to ammonium)
    ["zinc and nitrate to ammonium", "Zn + NO3- -> Zn^2+ + NH4+", "acidic", "4 Zn + NO3- + 10 H+ -> 4 Zn^2+ + NH4+ + 3 H2O"],
    // from memory: Harris, Quantitative Chemical Analysis, ch. 16 (iodate and iodide make iodine)
    ["iodate and iodide", "IO3- + I- -> I2", "acidic", "IO3- + 5 I- + 6 H+ -> 3 I2 + 3 H2O"],
    // from memory: Zumdahl, ch. 18 (half-reaction of permanganate)
    ["permanganate half-reaction", "MnO4- -> Mn^2+", "acidic", "MnO4- + 8 H+ + 5 e- -> Mn^2+ + 4 H2O"],
    // from memory: Brown, LeMay & Bursten, ch. 20
    ["dichromate half-reaction", "Cr2O7^2- -> Cr^3+", "acidic", "Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr^3+ + 7 H2O"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (oxalate half-reaction)
    ["oxalate half-reaction", "C2O4^2- -> CO2", "acidic", "C2O4^2- -> 2 CO2 + 2 e-"],
    // from memory: Atkins & Jones, Chemical Principles, ch. 12 (table of standard potentials)
    ["oxygen reduced in acid", "O2 -> H2O", "acidic", "O2 + 4 H+ + 4 e- -> 2 H2O"],
    // from memory: Atkins & Jones, ch. 12 (peroxide oxidised)
    ["peroxide oxidised in acid", "H2O2 -> O2", "acidic", "H2O2 -> O2 + 2 H+ + 2 e-"],
    // from memory: Zumdahl, ch. 18 (permanganate and iodide in basic solution)
    ["permanganate and iodide in base", "MnO4- + I- -> MnO2 + I2", "basic", "2 MnO4- + 6 I- + 4 H2O -> 2 MnO2 + 3 I2 + 8 OH-"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (cyanide oxidised by permanganate in base)
    ["cyanide and permanganate", "CN- + MnO4- -> CNO- + MnO2", "basic", "3 CN- + 2 MnO4- + H2O -> 3 CNO- + 2 MnO2 + 2 OH-"],
    // from memory: Zumdahl, ch. 18 (silver leached with cyanide and air)
    ["silver leached by cyanide", "Ag + CN- + O2 -> Ag(CN)2-", "basic", "4 Ag + 8 CN- + O2 + 2 H2O -> 4 Ag(CN)2- + 4 OH-"],
    // from memory: Petrucci, ch. 5 (chromium(III) hydroxide oxidised to chromate)
    [
      "chromium hydroxide and chlorate",
      "Cr(OH)3 + ClO3- -> CrO4^2- + Cl-",
      "basic",
      "2 Cr(OH)3 + ClO3- + 4 OH- -> 2 CrO4^2- + Cl- + 5 H2O",
    ],
    // from memory: Housecroft & Sharpe, Inorganic Chemistry, halogens chapter (chlorine in hot alkali)
    ["chlorine disproportionates", "Cl2 -> Cl- + ClO3-", "basic", "3 Cl2 + 6 OH- -> 5 Cl- + ClO3- + 3 H2O"],
    // from memory: Silberberg, ch. 21 (bismuth hydroxide and stannite)
    ["bismuth hydroxide and stannite", "Bi(OH)3 + SnO2^2- -> Bi + SnO3^2-", "basic", "2 Bi(OH)3 + 3 SnO2^2- -> 2 Bi + 3 SnO3^2- + 3 H2O"],
    // from memory: Petrucci, ch. 5 (sulfite reduces permanganate in base)
    [
      "permanganate and sulfite in base",
      "MnO4- + SO3^2- -> MnO2 + SO4^2-",
      "basic",
      "2 MnO4- + 3 SO3^2- + H2O -> 2 MnO2 + 3 SO4^2- + 2 OH-",
    ],
    // from memory: Atkins & Jones, ch. 12 (oxygen reduced in base)
    ["oxygen reduced in base", "O2 -> OH-", "basic", "O2 + 2 H2O + 4 e- -> 4 OH-"],
    // from memory: Tro, ch. 18 (hypochlorite half-reaction in base)
    ["hypochlorite half-reaction", "ClO- -> Cl-", "basic", "ClO- + H2O + 2 e- -> Cl- + 2 OH-"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (aluminium in base)
    ["aluminium to aluminate", "Al -> Al(OH)4-", "basic", "Al + 4 OH- -> Al(OH)4- + 3 e-"],
    // from memory: Tro, ch. 18 (hydrogen electrode)
    ["hydrogen oxidised", "H2 -> H+", "acidic", "H2 -> 2 H+ + 2 e-"],
  ])("%s", (_name, skeleton, medium, expected) => {
    expect(completed(skeleton, medium)).toBe(expected);
    // The same equation written in mhchem keeps its wrapping.
    expect(completed(`\\ce{${skeleton}}`, medium)).toBe(`\\ce{${expected}}`);
  });

  it("a half-reaction missing only electrons is the same in acid and base", () => {
    // from memory: Zumdahl, ch. 18 (iron(II) to iron(III))
    expect(completed("Fe^2+ -> Fe^3+", "acidic")).toBe("Fe^2+ -> Fe^3+ + e-");
    expect(completed("Fe^2+ -> Fe^3+", "basic")).toBe("Fe^2+ -> Fe^3+ + e-");
  });

  it("an equation the coefficients alone balance is balanced as before", () => {
    // from memory: Tro, ch. 7
    const answer = balanceInSolution("Al + O2 -> Al2O3", "acidic");
    expect(answer).toMatchObject({ ok: true, equation: "4 Al + 3 O2 -> 2 Al2O3", wasBalanced: false });
    expect(answer.ok && answer.completedIn).toBeUndefined();
  });
});

describe("equations that are not completed", () => {
  it.each<[string, string, SolutionMedium]>([
    // common practice: carbonate and acid is acid-base chemistry, not redox
    ["carbonate in acid", "CO3^2- -> CO2", "acidic"],
    // common practice: aluminium hydroxide precipitates without a change of oxidation state
    ["aluminium hydroxide", "Al^3+ -> Al(OH)3", "basic"],
    // common practice: a sulfate spectator that appears on one side only cannot be mended with water
    ["a missing metal", "MnO4- -> Fe^3+", "acidic"],
    // common practice: chlorine appears on one side only
    ["a species on one side only", "MnO4- + Cl- -> Mn^2+", "acidic"],
  ])("%s", (_name, skeleton, medium) => {
    const answer = balanceInSolution(skeleton, medium);
    expect(answer.ok).toBe(false);
    expect(answer.ok ? "" : answer.error.code).toMatch(/^equation-/);
  });
});

describe("the writer's notation is kept", () => {
  it.each<[string, string, SolutionMedium, string]>([
    // common practice: a caret before a single charge gives H^+ and OH^-
    ["caret charges", "MnO4^- + Fe^2+ -> Mn^2+ + Fe^3+", "acidic", "MnO4^- + 5 Fe^2+ + 8 H^+ -> Mn^2+ + 5 Fe^3+ + 4 H2O"],
    // common practice: superscript charges and subscript digits, the writer's arrow
    ["Unicode", "MnO₄⁻ → Mn²⁺", "acidic", "MnO₄⁻ + 8 H⁺ + 5 e⁻ → Mn²⁺ + 4 H₂O"],
    // common practice: state symbols on every species give H+(aq) and H2O(l)
    [
      "state symbols",
      "Fe^2+(aq) + MnO4-(aq) -> Fe^3+(aq) + Mn^2+(aq)",
      "acidic",
      "5 Fe^2+(aq) + MnO4-(aq) + 8 H+(aq) -> 5 Fe^3+(aq) + Mn^2+(aq) + 4 H2O(l)",
    ],
    // common practice: coefficients written against the formula stay so
    ["glued coefficients", "2MnO4- + I- -> MnO2 + I2", "basic", "2MnO4- + 6I- + 4H2O -> 2MnO2 + 3I2 + 8OH-"],
    // common practice: a written electron keeps its spelling
    ["written electron", "MnO4- + e^- -> Mn^2+", "acidic", "MnO4- + 5 e^- + 8 H+ -> Mn^2+ + 4 H2O"],
  ])("%s", (_name, skeleton, medium, expected) => {
    expect(completed(skeleton, medium)).toBe(expected);
  });
});

/** The document after applying `action`'s edits. */
function applied(text: string, action: EquationAction): string {
  let result = "";
  let copied = 0;
  for (const edit of action.edits) {
    expect(edit.range.start).toBeGreaterThanOrEqual(copied);
    result += text.slice(copied, edit.range.start) + edit.newText;
    copied = edit.range.end;
  }
  return result + text.slice(copied);
}

function actionsAt(text: string, needle: string, kind: "markdown" | "plaintext" = "markdown"): EquationAction[] {
  const at = text.indexOf(needle);
  return equationActions(text, analyzeDocument(text, kind), { start: at, end: at });
}

function equationCodes(text: string, kind: "markdown" | "plaintext" = "markdown"): string[] {
  return checkDocument(analyzeDocument(text, kind))
    .filter((finding) => finding.code.startsWith("equation-"))
    .map((finding) => finding.code);
}

describe("completing in the editor", () => {
  const TEXT = "## Run 44: permanganate\n\nReduction at the cathode: $\\ce{MnO4- -> Mn^2+}$ (Bay C).\n";

  it("the finding says how it completes, and two actions offer it", () => {
    const finding = checkDocument(analyzeDocument(TEXT, "markdown")).find((item) => item.code === "equation-cannot-balance")!;
    // from memory: Zumdahl, ch. 18
    expect(finding.message).toContain("Completed in acidic solution: MnO4- + 8 H+ + 5 e- -> Mn^2+ + 4 H2O");
    expect(finding.message).toContain("in basic solution: MnO4- + 4 H2O + 5 e- -> Mn^2+ + 8 OH-");
    const actions = actionsAt(TEXT, "->");
    expect(actions.map((action) => action.title)).toEqual([
      "Complete in acidic solution (add H+, H2O, e-)",
      "Complete in basic solution (add OH-, H2O, e-)",
    ]);
    expect(actions.every((action) => action.findingCode === "equation-cannot-balance")).toBe(true);
  });

  it.each([
    ["\\ce{MnO4- -> Mn^2+}", "markdown"],
    ["$\\ce{MnO4- + Fe^2+ -> Mn^2+ + Fe^3+}$", "markdown"],
    ["Etch bath: 2 MnO4- + I- -> MnO2 + I2 (Bay C)", "plaintext"],
    ["\\ce{Cr2O7^2- + C2H5OH -> Cr^3+ + CH3COOH}", "markdown"],
    ["- Cu + NO3- → Cu^2+ + NO", "markdown"],
    ["\\ce{Fe^2+ -> Fe^3+}", "markdown"],
    ["MnO₄⁻ → Mn²⁺", "plaintext"],
  ] as const)("every fix on %s leaves it balanced, with no new finding and the species as written", (line, kind) => {
    const text = `Run 45 (Kestrel Ridge, Bay C)\n\n${line}\n\nEnd of run.\n`;
    const actions = actionsAt(text, line.includes("→") ? "→" : "->", kind);
    expect(actions.length).toBeGreaterThan(0);
    const before = new Set(checkDocument(analyzeDocument(text, kind)).map((finding) => finding.code));
    for (const action of actions) {
      const after = applied(text, action);
      // common practice: a quick fix must leave no equation finding behind
      expect(equationCodes(after, kind), `${action.title}: ${after}`).toEqual([]);
      const codes = checkDocument(analyzeDocument(after, kind)).map((finding) => finding.code);
      expect(codes.filter((code) => !before.has(code))).toEqual([]);
      for (const edit of action.edits) {
        const replaced = text.slice(edit.range.start, edit.range.end);
        // Only a written coefficient (and its space) is ever replaced; everything else is inserted.
        expect(replaced, action.title).toMatch(/^(?:\d+(?:\/\d+|\.\d+)?\s*)?$/);
      }
    }
  });
});

describe("combining two half-reactions", () => {
  const TEXT = [
    "# Run 46: iron(II) assay (Kestrel Ridge Analytical, Bay C)",
    "",
    "Oxidation: $\\ce{Fe^2+ -> Fe^3+ + e-}$",
    "",
    "Reduction: $\\ce{MnO4- + 8 H+ + 5 e- -> Mn^2+ + 4 H2O}$",
    "",
    "Titrated to a faint pink end point.",
    "",
  ].join("\n");

  it("is offered on each arrow and writes the overall equation on the line after the later one", () => {
    for (const needle of ["-> Fe^3+", "-> Mn^2+"]) {
      const actions = actionsAt(TEXT, needle).filter((action) => action.kind === "combine");
      expect(actions).toHaveLength(1);
      const after = applied(TEXT, actions[0]);
      // from memory: Zumdahl, ch. 18 (the two halves of the permanganate titration combined)
      expect(after).toBe(TEXT.replace("4 H2O}$\n", "4 H2O}$\n$\\ce{5 Fe^2+ + MnO4- + 8 H+ -> 5 Fe^3+ + Mn^2+ + 4 H2O}$\n"));
      expect(equationCodes(after)).toEqual([]);
      // Once the overall equation is there, it is not offered again.
      expect(actionsAt(after, needle).filter((action) => action.kind === "combine")).toEqual([]);
    }
  });

  it("keeps chemformula's \\ch wrapping on the line it writes", () => {
    const text = TEXT.replaceAll("\\ce{", "\\ch{");
    const actions = actionsAt(text, "-> Mn^2+").filter((action) => action.kind === "combine");
    expect(actions).toHaveLength(1);
    // from memory: Zumdahl, ch. 18 (the same titration as above)
    expect(applied(text, actions[0])).toBe(
      text.replace("4 H2O}$\n", "4 H2O}$\n$\\ch{5 Fe^2+ + MnO4- + 8 H+ -> 5 Fe^3+ + Mn^2+ + 4 H2O}$\n"),
    );
  });

  it.each<[string, string, string, string]>([
    // from memory: Brown, LeMay & Bursten, ch. 20 (oxalate and permanganate)
    [
      "C2O4^2- -> 2 CO2 + 2 e-",
      "MnO4- + 8 H+ + 5 e- -> Mn^2+ + 4 H2O",
      "plaintext",
      "5 C2O4^2- + 2 MnO4- + 16 H+ -> 10 CO2 + 2 Mn^2+ + 8 H2O",
    ],
    // from memory: Zumdahl, ch. 18 (the cyanide and permanganate halves in base, water netted out)
    [
      "CN- + 2 OH- -> CNO- + H2O + 2 e-",
      "MnO4- + 2 H2O + 3 e- -> MnO2 + 4 OH-",
      "plaintext",
      "3 CN- + 2 MnO4- + H2O -> 3 CNO- + 2 MnO2 + 2 OH-",
    ],
    // from memory: Tro, ch. 18 (a zinc and copper cell)
    ["\\ce{Zn -> Zn^2+ + 2 e-}", "\\ce{Cu^2+ + 2 e- -> Cu}", "markdown", "\\ce{Zn + Cu^2+ -> Zn^2+ + Cu}"],
  ])("%s with %s", (oxidation, reduction, kind, overall) => {
    const text = `Cell notes, Bay C\n${oxidation}\n${reduction}\n`;
    const actions = actionsAt(text, "->", kind as "plaintext").filter((action) => action.kind === "combine");
    expect(actions).toHaveLength(1);
    const after = applied(text, actions[0]);
    expect(after).toBe(`Cell notes, Bay C\n${oxidation}\n${reduction}\n${overall}\n`);
    expect(equationCodes(after, kind as "plaintext")).toEqual([]);
  });

  it("pairs the nearest halves in a paragraph, and nothing when two of a kind are far apart", () => {
    const text = [
      "Cell A:",
      "\\ce{Zn -> Zn^2+ + 2 e-}",
      "\\ce{Cu^2+ + 2 e- -> Cu}",
      "",
      "Cell B:",
      "\\ce{Fe -> Fe^2+ + 2 e-}",
      "",
      "Cell C:",
      "\\ce{Ag+ + e- -> Ag}",
      "",
    ].join("\n");
    const combine = (needle: string) => actionsAt(text, needle).filter((action) => action.kind === "combine");
    expect(applied(text, combine("-> Zn^2+")[0])).toContain("\\ce{Cu^2+ + 2 e- -> Cu}\n\\ce{Zn + Cu^2+ -> Zn^2+ + Cu}\n");
    // common practice: Fe and Ag sit in different paragraphs among other cells: no pairing is guessed
    expect(combine("-> Fe^2+")).toEqual([]);
    expect(combine("-> Ag")).toEqual([]);
  });

  it("a selection over both arrows offers the overall equation once", () => {
    const text = "\\ce{Zn -> Zn^2+ + 2 e-}\n\\ce{Cu^2+ + 2 e- -> Cu}\n";
    const actions = equationActions(text, analyzeDocument(text, "markdown"), { start: 0, end: text.length });
    // from memory: Tro, ch. 18 (a zinc and copper cell)
    expect(actions.map((action) => applied(text, action))).toEqual([`${text}\\ce{Zn + Cu^2+ -> Zn^2+ + Cu}\n`]);
  });

  it("two halves of the same kind are not combined", () => {
    const text = "\\ce{Zn -> Zn^2+ + 2 e-}\n\\ce{Fe -> Fe^2+ + 2 e-}\n";
    expect(actionsAt(text, "->").filter((action) => action.kind === "combine")).toEqual([]);
  });
});
