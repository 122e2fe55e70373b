/**
 * Handbook and inventory exports keep an ion's charge in a column of its own ("NH4" beside "+1"):
 * the row's species is the formula with that charge, for checks, hovers and fixes alike, in every
 * table format. A charge column that contradicts a charge written in the formula is a warning.
 */
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  checkDelimitedText,
  checkDocument,
  speciesAtOffset,
  type DocumentKind,
  type Finding,
} from "../../shared/src/index";

function findingsOf(text: string, kind: DocumentKind): Finding[] {
  const model = analyzeDocument(text, kind);
  return [...model.problems, ...checkDocument(model)];
}

/** The species formula read for the cell `cell` in `text`, with its charge. */
function speciesAt(text: string, kind: DocumentKind, cell: string): string | undefined {
  const analysis = speciesAtOffset(analyzeDocument(text, kind), text.indexOf(cell) + 1)?.analysis;
  if (!analysis) return undefined;
  return analysis.ok ? analysis.value.reading.formula : analysis.problem.code;
}

describe("a charge column gives the row's species its charge", () => {
  // from memory: ammonium NH4+, sulfate SO4 2-, chloride Cl-, magnesium Mg2+, phosphate PO4 3-,
  // nitrate NO3- (any general chemistry table of common ions)
  it.each([
    ["NH4", "+1", "NH4^+"],
    ["NH4", "1+", "NH4^+"],
    ["NH4", "+", "NH4^+"],
    ["SO4", "-2", "SO4^2-"],
    ["SO4", "2-", "SO4^2-"],
    ["SO4", "\u22122", "SO4^2-"],
    ["SO4", "\u20132", "SO4^2-"],
    ["Ca", "++", "Ca^2+"],
    ["SO4", "\u00b2\u207b", "SO4^2-"],
    ["PO4", "3-", "PO4^3-"],
    ["NO3", "-1", "NO3^-"],
    ["Cl", "-1", "Cl^-"],
    ["Mg", "2", "Mg^2+"],
    ["Mg", "2+", "Mg^2+"],
    ["SO4(aq)", "-2", "SO4^2-"],
    ["H2O", "0", "H2O"],
    ["H2O", "neutral", "H2O"],
    // Nothing to read: the formula stands as written.
    ["CO2", "", "CO2"],
    ["CO2", "n/a", "CO2"],
    ["CO2", "\u2014", "CO2"],
    // A run of minus signs is a placeholder, as it is in any other column.
    ["SO4", "--", "ambiguous-connectivity"],
    ["NH4", "variable", "no-valid-structure"],
    ["NH4", "+1/+2", "no-valid-structure"],
    // Written in the formula and in the column alike.
    ["NH4+", "+1", "NH4^+"],
    ["SO4^2-", "2-", "SO4^2-"],
    // A neutral formula takes the column's charge, whatever it makes: water's radical cation.
    ["H2O", "+1", "H2O^+"],
  ])("%s with charge %j is %s", (formula, charge, expected) => {
    const text = `Formula,Charge\n${formula},${charge}\n`;
    expect(speciesAt(text, "csv", formula)).toBe(expected);
  });

  it.each([
    ["csv", "Name,Formula,Charge\nammonium,NH4,+1\nsulfate,SO4,-2\n"],
    ["tsv", "Ion\tFormula\tCharge\nammonium\tNH4\t1+\nsulfate\tSO4\t2-\n"],
    ["json", '[{"name": "ammonium", "formula": "NH4", "charge": 1}, {"name": "sulfate", "formula": "SO4", "charge": -2}]'],
    ["yaml", "- name: ammonium\n  formula: NH4\n  charge: +1\n- name: sulfate\n  formula: SO4\n  charge: -2\n"],
    ["markdown", "| Name | Formula | Charge |\n|---|---|---|\n| ammonium | NH4 | +1 |\n| sulfate | SO4 | −2 |\n"],
  ] as const)("%s: no finding, and the hover shows the ion", (kind, text) => {
    expect(findingsOf(text, kind)).toEqual([]);
    expect(speciesAt(text, kind, "NH4")).toBe("NH4^+");
    expect(speciesAt(text, kind, "SO4")).toBe("SO4^2-");
  });

  it.each([
    // common practice: an ion table lists an element's name with the charge of its monatomic ion
    ["sodium", "+1", "Na^+"],
    ["chlorine", "-1", "Cl^-"],
    ["Oxygen", "2-", "O^2-"],
    ["argon", "0", "Ar"],
  ])("the element name %s with charge %s is %s", (name, charge, expected) => {
    const text = `Name,Charge\n${name},${charge}\n`;
    expect(speciesAt(text, "csv", name)).toBe(expected);
    expect(findingsOf(text, "csv")).toEqual([]);
  });

  it("checks the other cells against the charged species", () => {
    // from memory: NH4+ has 8 valence electrons and is tetrahedral; SO4 2- has 32
    const text = "Formula,Charge,Valence electrons,Shape\nNH4,+1,8,tetrahedral\nSO4,-2,30,tetrahedral\n";
    const findings = findingsOf(text, "csv");
    expect(findings.map((finding) => [finding.code, text.slice(finding.range.start, finding.range.end)])).toEqual([
      ["table-valence-electrons", "30"],
    ]);
    expect(findings[0].message).toContain("SO4^2-");
  });

  it("reads the same formula by its own row: the charge is no property of the text", () => {
    // NH4 with no charge has no Lewis structure; beside +1 it is ammonium.
    const text = "Formula,Charge\nNH4,+1\nNH4,\nNH4,+1\n";
    const findings = findingsOf(text, "csv");
    expect(findings.map((finding) => [finding.code, text.slice(0, finding.range.start).split("\n").length])).toEqual([
      ["no-valid-structure", 3],
    ]);
    expect(findings[0].fix).toBeUndefined();
  });
});

describe("minus signs alone in a charge column", () => {
  // A lone "-" is a placeholder in any other column; here a name of the row with that charge says it is the charge.
  // from memory: hydroxide OH-, chloride Cl-, sulfate SO4 2-; water is neutral
  it.each([
    ["hydroxide,OH,-,8", "OH", "OH^-"],
    ["chloride,Cl,\u2212,8", "Cl", "Cl^-"],
    ["sulfate,SO4,--,32", "SO4", "SO4^2-"],
    ["water,H2O,-,8", "H2O", "H2O"],
    ["sulfate,SO4,-,32", "SO4", "ambiguous-connectivity"],
  ])("%j: %s is %s", (row, formula, expected) => {
    const text = `Name,Formula,Charge,Valence electrons\n${row}\n`;
    expect(speciesAt(text, "csv", `,${formula},`)).toBe(expected);
    expect(findingsOf(text, "csv").filter((finding) => finding.severity === "warning" || finding.severity === "error")).toEqual([]);
  });

  it("without a name, a lone minus says nothing", () => {
    expect(speciesAt("Formula,Charge\nOH,-\n", "csv", "OH")).toBe("OH");
  });
});

describe("a charge column that contradicts the formula", () => {
  it.each([
    ["NH4+", "-1", "+1"],
    ["NH4+", "1-", "1+"],
    ["SO4^2-", "\u22121", "\u22122"],
    ["NH4+", "0", "+1"],
  ])("%s beside %j: a warning on the charge cell, offering %j as a choice", (formula, charge, offered) => {
    const text = `Formula,Charge\n${formula},${charge}\n`;
    const findings = findingsOf(text, "csv").filter((finding) => finding.code === "table-charge");
    expect(findings).toHaveLength(1);
    const [finding] = findings;
    expect(text.slice(finding.range.start, finding.range.end)).toBe(charge);
    expect(finding.severity).toBe("warning");
    // Either cell may be the slip: never applied by fix-all.
    expect(finding.fix).toBeUndefined();
    expect(finding.choices?.map((choice) => choice.newText)).toEqual([offered]);
    const fixed = text.slice(0, finding.range.start) + offered + text.slice(finding.range.end);
    expect(findingsOf(fixed, "csv")).toEqual([]);
  });

  it.each([
    // [header, cell, charge cell, charge offered] — species the model gives no shape: the
    // contradiction is still one, as it needs the formula's charge only
    // from memory: iron(III) Fe3+, copper(II) Cu2+, hexacyanoferrate(III) Fe(CN)6 3-, uranyl UO2 2+
    ["Formula", "Fe3+", "+2", "+3"],
    ["Formula", "Cu2+", "+1", "+2"],
    ["Formula", "Fe(CN)6-3", "-4", "-3"],
    ["Formula", "UO2^2+", "1+", "2+"],
    ["Name", "iron(III)", "+2", "+3"],
  ])("%s %s beside %j, a species not analysed: a warning, offering %j as a choice", (header, species, charge, offered) => {
    const text = `${header},Charge\n${species},${charge}\n`;
    const findings = findingsOf(text, "csv").filter((finding) => finding.code === "table-charge");
    expect(findings.map((finding) => [text.slice(finding.range.start, finding.range.end), finding.severity, finding.fix])).toEqual([
      [charge, "warning", undefined],
    ]);
    expect(findings[0].choices?.map((choice) => choice.newText)).toEqual([offered]);
    const fixed = text.slice(0, findings[0].range.start) + offered + text.slice(findings[0].range.end);
    expect(findingsOf(fixed, "csv").filter((finding) => finding.code === "table-charge")).toEqual([]);
  });

  it.each([
    // the charge column gives an uncharged formula or name its charge: nothing to contradict
    ["Formula", "Fe", "+3"],
    ["Formula", "Fe3+", "+3"],
    ["Name", "iron", "+2"],
    ["Formula", "Cr2O7^2-", "2-"],
    // a salt the model gives no shape, beside its cation's charge: no contradiction claimed
    ["Name", "iron(III) chloride", "+3"],
    ["Formula", "NaCl", "+1"],
  ])("%s %s beside %j, a species not analysed, agrees", (header, species, charge) => {
    const text = `${header},Charge\n${species},${charge}\n`;
    expect(findingsOf(text, "csv").filter((finding) => finding.code === "table-charge")).toEqual([]);
  });

  it("is reported alike on every repeated row (remembered checks move with the cell)", () => {
    const text = `Formula,Charge\n${"NH4+,-1\n".repeat(3)}`;
    const findings = findingsOf(text, "csv");
    expect(findings.map((finding) => text.slice(finding.range.start, finding.range.end))).toEqual(["-1", "-1", "-1"]);
    for (const finding of findings) expect(finding.choices?.[0].range).toEqual(finding.range);
  });
});

describe("the fast reading of repeated rows agrees with the ordinary one", () => {
  it("on a store export of repeated ions", () => {
    const rows = ["ammonium,NH4,+1,8", "sulfate,SO4,-2,30", "ammonium,NH4+,-1,8", "sulfite,SO4,-2,", "nitrate,NO3,,24"];
    const text = `Name,Formula,Charge,Valence electrons\n${Array.from({ length: 60 }, (_, index) => rows[index % rows.length]).join("\n")}\n`;
    const ordinary = findingsOf(text, "csv").sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
    expect(checkDelimitedText(text, "csv")).toEqual(ordinary);
    expect(new Set(ordinary.map((finding) => finding.code))).toEqual(
      new Set(["table-valence-electrons", "table-charge", "table-name-formula", "radical"]),
    );
  });

  it("offers the name's formula without a charge when the charge has a column of its own", () => {
    // from memory: sulfite is SO3 2-, sulfate SO4 2-
    const text = "Name,Formula,Charge\nsulfite,SO4,-2\n";
    const [finding] = findingsOf(text, "csv");
    expect(finding.code).toBe("table-name-formula");
    expect(finding.choices?.map((choice) => choice.newText)).toContain("SO3");
  });
});

describe("a cell that reads as a placeholder", () => {
  // from memory: Na is sodium's symbol (IUPAC periodic table)
  it.each([
    ["Na", "Na"],
    ["NA", undefined],
    ["na", undefined],
    ["N/A", undefined],
    ["n/a", undefined],
  ])("%j in a formula column is %s", (cell, expected) => {
    const text = `Formula,Lot\n${cell},KR-0412\n`;
    expect(analyzeDocument(text, "csv").occurrences.map((occurrence) => occurrence.reading.formula)[0]).toBe(expected);
    expect(findingsOf(text, "csv")).toEqual([]);
  });

  it("Na beside a charge column is the sodium ion", () => {
    expect(speciesAt("Name,Formula,Charge\nSodium,Na,+1\n", "csv", "Na,")).toBe("Na^+");
  });
});
