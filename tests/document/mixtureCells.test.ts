/**
 * A gas store's inventory lists balance-gas mixtures in its formula column ("N2/Ar", "5% H2 in
 * N2"), and a reagent shelf lists reagents sold in a solvent ("4 M HCl in dioxane"). Each
 * component is a species found where it is written, the cell is no error, and the row's
 * single-species cells are not checked against any one component. A formula with a stray slash
 * or space is still reported.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDelimitedText, checkDocument, type DocumentKind, type Finding } from "../../shared/src/index";

function findingsOf(text: string, kind: DocumentKind): Finding[] {
  const model = analyzeDocument(text, kind);
  return [...model.problems, ...checkDocument(model)];
}

/** Errors and warnings: a note on a component itself (NO is a radical) is no finding about the cell. */
function complaintsOf(text: string, kind: DocumentKind): Finding[] {
  return findingsOf(text, kind).filter((finding) => finding.severity === "error" || finding.severity === "warning");
}

/** The species found in the cell `cell` of a one-row table, as written. */
function componentsOf(cell: string, header = "Formula"): string[] {
  const text = `Cylinder,${header}\nKR-0412,"${cell}"\n`;
  const model = analyzeDocument(text, "csv");
  const start = text.indexOf(cell);
  return model.occurrences
    .filter((occurrence) => occurrence.range.start >= start && occurrence.range.end <= start + cell.length)
    .map((occurrence) => text.slice(occurrence.range.start, occurrence.range.end));
}

describe("a mixture in a formula column", () => {
  // common practice: how gas suppliers and reagent catalogues label mixtures and solutions
  it.each([
    ["N2/Ar", ["N2", "Ar"]],
    ["N2 / Ar", ["N2", "Ar"]],
    ["N2 + Ar", ["N2", "Ar"]],
    ["5% H2 in N2", ["H2", "N2"]],
    ["H2 5% / N2 balance", ["H2", "N2"]],
    ["H2 (5%) / N2 (balance)", ["H2", "N2"]],
    ["Ar/CO2 80/20", ["Ar", "CO2"]],
    ["Ar/CO2 (82:18)", ["Ar", "CO2"]],
    ["CO 1000 ppm in air", ["CO"]],
    ["NO 10 ppm, N2 bal", ["NO", "N2"]],
    ["HCl in dioxane", ["HCl", "dioxane"]],
    ["4 M HCl in dioxane", ["HCl", "dioxane"]],
    ["2.0 M NH3 in methanol", ["NH3", "methanol"]],
    ["He/O2 79/21", ["He", "O2"]],
    ["N2 + O2 (synthetic air)", ["N2", "O2"]],
    ["N2 (g) / Ar (g)", ["N2", "Ar"]],
  ])("%s: each component is found, and no finding", (cell, components) => {
    expect(componentsOf(cell)).toEqual(components);
    expect(complaintsOf(`Cylinder,Formula\nKR-0412,"${cell}"\n`, "csv")).toEqual([]);
  });

  it.each([
    // A stray separator or a coefficient is still a formula to report.
    ["SF4/", "malformed-formula"],
    ["/SF6", "malformed-formula"],
    ["NF 3", "malformed-formula"],
    ["2 H2 + O2", "malformed-formula"],
    ["SF4/Xq2", "malformed-formula"],
    ["5% H2 in nitrogn", "malformed-formula"],
  ])("%s is still reported (%s)", (cell, code) => {
    const findings = findingsOf(`Cylinder,Formula\nKR-0412,"${cell}"\n`, "csv");
    expect(findings.map((finding) => finding.code)).toContain(code);
  });

  it("checks no single-species cell of the row against a component", () => {
    // from memory: N2 has 10 valence electrons and is linear; Ar has 8
    const text = "Formula,Valence electrons,Molecular geometry\nN2/Ar,10,linear\nN2,10,linear\nN2,12,linear\n";
    const findings = findingsOf(text, "csv");
    expect(findings.map((finding) => [finding.code, text.slice(finding.range.start, finding.range.end)])).toEqual([
      ["table-valence-electrons", "12"],
    ]);
  });

  it("in a name column beside it, the name's components are found as well", () => {
    // "nitrogen balance" is a label, not a name: it gets no note while the formula cell reads.
    const text = "Name,Formula\n5% hydrogen in nitrogen,5% H2 in N2\nnitrogen balance,N2/Ar\n";
    expect(findingsOf(text, "csv")).toEqual([]);
    const found = analyzeDocument(text, "csv").occurrences.map((occurrence) => occurrence.text);
    expect(found).toEqual(["hydrogen", "nitrogen", "H2", "N2", "N2", "Ar"]);
  });

  it.each([
    ["json", '[{"cylinder": "KR-0412", "formula": "5% H2 in N2", "valence electrons": 2}]'],
    ["yaml", "- cylinder: KR-0412\n  formula: 5% H2 in N2\n  valence electrons: 2\n"],
    ["markdown", "| Cylinder | Formula | VE |\n|---|---|---|\n| KR-0412 | 5% H2 in N2 | 2 |\n"],
    ["tsv", "Cylinder\tFormula\tVE\nKR-0412\t5% H2 in N2\t2\n"],
  ] as const)("%s: the same reading", (kind, text) => {
    expect(findingsOf(text, kind)).toEqual([]);
    expect(analyzeDocument(text, kind).occurrences.map((occurrence) => occurrence.text)).toEqual(["H2", "N2"]);
  });

  it("the fast reading of repeated rows agrees with the ordinary one", () => {
    const rows = ["KR-0412,N2/Ar,10", "KR-0413,5% H2 in N2,", "KR-0414,SF4/,34", "KR-0415,SF6,48", "KR-0416,N2 + Ar,"];
    const text = `Cylinder,Formula,Valence electrons\n${Array.from({ length: 50 }, (_, index) => rows[index % rows.length]).join("\n")}\n`;
    const ordinary = findingsOf(text, "csv").sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
    expect(checkDelimitedText(text, "csv")).toEqual(ordinary);
    expect(ordinary.map((finding) => finding.code)).toEqual(Array(10).fill("malformed-formula"));
  });
});
