/**
 * An element's name in a column of names is the element: bare ("argon", "Sodium") in every table
 * format, and with a grade or remark after it ("Argon (UHP)", "Helium - balloon grade"). Prose
 * keeps its own judgement: an element named in general is not a species.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, speciesAtOffset, type DocumentKind } from "../../shared/src/index";

/** The formula read at the first place `cell` is written in `text`, or undefined. */
function formulaAt(text: string, kind: DocumentKind, cell: string): string | undefined {
  const species = speciesAtOffset(analyzeDocument(text, kind), text.indexOf(cell) + 1);
  return species?.occurrence?.reading.formula;
}

describe("an element's name in a name column", () => {
  // from memory: the elements' names and symbols (IUPAC periodic table); nitrogen, oxygen and
  // chlorine as substances are the diatomic gases
  it.each([
    ["csv", "Name,Lot\nargon,KR-0413\n", "argon", "Ar"],
    ["csv", "Species,Valence electrons\nSodium,1\n", "Sodium", "Na"],
    ["csv", "Gas,Lot\nNitrogen,KR-0412\n", "Nitrogen", "N2"],
    ["csv", "Chemical name,Lot\nCHLORINE,KR-0417\n", "CHLORINE", "Cl2"],
    ["tsv", "Name\tLot\nxenon\tKR-0419\n", "xenon", "Xe"],
    ["markdown", "| Species | VE |\n|---|---|\n| neon | 8 |\n", "neon", "Ne"],
    ["json", '[{"name": "helium", "lot": "KR-0440"}]', "helium", "He"],
    ["yaml", "- species: krypton\n  lot: KR-0445\n", "krypton", "Kr"],
    // A grade or a remark after the name.
    ["csv", "Name,Lot\nArgon (UHP),KR-0413\n", "Argon", "Ar"],
    ["csv", 'Gas,Lot\n"Nitrogen, 99.999%",KR-0412\n', "Nitrogen", "N2"],
    ["csv", "Substance,Lot\nHelium - balloon grade,KR-0440\n", "Helium", "He"],
    ["json", '[{"gas": "Oxygen (medical)", "lot": "KR-0446"}]', "Oxygen", "O2"],
  ] as const)("%s: %j", (kind, text, cell, formula) => {
    expect(formulaAt(text, kind, cell)).toBe(formula);
    expect(checkDocument(analyzeDocument(text, kind))).toEqual([]);
  });

  it("is compared with the formula beside it", () => {
    // from memory: Ar is argon, Ne neon
    const text = "Name,Formula\nArgon (UHP),Ne\n";
    const findings = checkDocument(analyzeDocument(text, "csv"));
    expect(findings.map((finding) => [finding.code, text.slice(finding.range.start, finding.range.end)])).toEqual([
      ["table-name-formula", "Argon"],
    ]);
  });

  it.each([
    // A word that only starts like an element's name, and a formula column, are not read this way.
    ["Name,Lot\nArgonite,KR-0460\n", "Argonite"],
    ["Name,Lot\nCalcium monohydroxide ion,KR-0461\n", "Calcium"],
    ["Name,Lot\nCopper(II) carbonate basic,KR-0462\n", "Copper"],
    ["Name,Lot\nCarbon black,KR-0463\n", "Carbon"],
    ["Formula,Lot\nArgon (UHP),KR-0413\n", "Argon"],
  ])("%j: nothing at %s", (text, cell) => {
    expect(formulaAt(text, "csv", cell)).toBeUndefined();
  });

  it.each(["In this step two hydrogens are replaced by chlorine.", "The total iron content was 4 mg/L."])(
    "prose keeps its own reading: %j",
    (text) => {
      expect(analyzeDocument(text, "markdown").occurrences).toEqual([]);
    },
  );
});
