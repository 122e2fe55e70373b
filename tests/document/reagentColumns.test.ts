/**
 * A reagent list names its reagents as a bench writes them (names with a strength or form, a
 * formula, a reagent in its solvent): a Reagent column is read as names, and a cell it cannot read
 * is no mistake there. A Description column is free text and is not read at all.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, type DocumentKind } from "../../shared/src/index";

function foundIn(text: string, kind: DocumentKind): string[] {
  return analyzeDocument(text, kind).occurrences.map((occurrence) => `${occurrence.text}=${occurrence.reading.formula}`);
}

/** Errors and warnings: an ionic compound's note on a salt is the same in any name column. */
function complaintsOf(text: string, kind: DocumentKind): string[] {
  return checkDocument(analyzeDocument(text, kind))
    .filter((finding) => finding.severity === "error" || finding.severity === "warning")
    .map((finding) => finding.code);
}

describe("a Reagent column", () => {
  // from memory: sodium hydroxide is NaOH, sodium bicarbonate NaHCO3, 1,4-dioxane C4H8O2
  it.each([
    ["Sodium hydroxide pellets", ["Sodium hydroxide=NaOH"]],
    ["NaHCO3", ["NaHCO3=NaHCO3"]],
    ["4 M HCl in dioxane", ["HCl=HCl", "dioxane=C4H8O2"]],
    ["Argon (UHP)", ["Argon=Ar"]],
    ["see SOP-12", []],
    ["CLF3 (ask J. Okafor)", []],
  ])("%j is read as %j, with no complaint", (cell, expected) => {
    const text = `Reagent,Amount\n"${cell}",5 g\n`;
    expect(foundIn(text, "csv")).toEqual(expected);
    expect(complaintsOf(text, "csv")).toEqual([]);
  });

  it.each([
    ["json", '[{"reagent": "Sodium hydroxide pellets", "amount": "2 g"}]'],
    ["yaml", "- reagent: Sodium hydroxide pellets\n  amount: 2 g\n"],
    ["tsv", "Reagent\tAmount\nSodium hydroxide pellets\t2 g\n"],
  ] as const)("%s: the same reading", (kind, text) => {
    expect(foundIn(text, kind)).toEqual(["Sodium hydroxide=NaOH"]);
  });
});

describe("a Description column", () => {
  it.each([
    ["csv", 'Formula,Description\nSF4,"Sf4 and CH5 are typos here, NF 3 too"\n'],
    ["json", '[{"formula": "SF4", "description": "Sf4 and CH5 are typos here"}]'],
    ["yaml", "- formula: SF4\n  description: Sf4 and CH5 are typos here\n"],
  ] as const)("%s: free text is not read, and gives no finding", (kind, text) => {
    expect(foundIn(text, kind)).toEqual(["SF4=SF4"]);
    expect(checkDocument(analyzeDocument(text, kind))).toEqual([]);
  });
});
