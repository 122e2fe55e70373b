/**
 * Hydrates in running prose: every way people write the water of crystallisation is one mention
 * of one species, and a full stop after a formula is not a hydrate dot.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/index";
import { stripLabels } from "./labelledText";

/** Compares the mentions found with the ⟦labels⟧, as [start, text, formula] triples. */
function check(marked: string, formulas: readonly string[]): void {
  const { text, labels } = stripLabels(marked);
  const found = analyzeDocument(text, "markdown").occurrences.map((occurrence) => [
    occurrence.range.start,
    occurrence.text,
    occurrence.reading.formula,
  ]);
  expect(found).toEqual(labels.map((label, index) => [label.start, label.text, formulas[index]]));
}

describe("hydrates in prose are one mention", () => {
  // common practice: how lab notes and supplier labels write copper(II) sulfate pentahydrate,
  // washing soda and chrome alum
  it.each([
    ["Weighed ⟦CuSO4·5H2O⟧ (blue).", ["CuSO4·5H2O"]],
    ["Weighed ⟦CuSO4.5H2O⟧ (blue).", ["CuSO4·5H2O"]],
    ["Weighed ⟦CuSO4•5H2O⟧ and ⟦CuSO4∙5H2O⟧.", ["CuSO4·5H2O", "CuSO4·5H2O"]],
    ["Weighed ⟦CuSO4 · 5H2O⟧ on the balance.", ["CuSO4·5H2O"]],
    ["Weighed ⟦KCr(SO4)2 · 12 H2O⟧ crystals.", ["KCr(SO4)2·12H2O"]],
    ["⟦Washing soda⟧ is ⟦Na2CO3·10H2O⟧.", ["Na2CO3·10H2O", "Na2CO3·10H2O"]],
  ] as const)("%s", (marked, formulas) => {
    check(marked, formulas);
  });

  it.each([
    ["We dried the ⟦CuSO4⟧. Then we weighed it.", ["CuSO4"]],
    ["Stock of ⟦NaCl⟧.", ["NaCl"]],
    ["The ⟦NaCl⟧* (see note) and **⟦KNO3⟧**.", ["NaCl", "KNO3"]],
    ["Added ⟦NaCl⟧. 5 g of it.", ["NaCl"]],
  ] as const)("a full stop or a star is not a hydrate dot: %s", (marked, formulas) => {
    check(marked, formulas);
  });
});

describe("hydrates in mhchem are one mention", () => {
  // common practice: mhchem writes the hydrate dot as "*", often with spaces around it
  it.each([
    ["⟦Alum⟧, \\ce{⟦KCr(SO4)2 * 12 H2O⟧}, grows octahedra.", ["KAl(SO4)2·12H2O", "KCr(SO4)2·12H2O"]],
    ["\\ce{⟦CuSO4 * 5H2O⟧ -> ⟦CuSO4⟧ + 5 ⟦H2O⟧}", ["CuSO4·5H2O", "CuSO4", "H2O"]],
    ["\\ce{⟦CuSO4*5H2O⟧}", ["CuSO4·5H2O"]],
  ] as const)("%s", (marked, formulas) => {
    check(marked, formulas);
  });
});

describe("a list set off by centred dots is not a hydrate", () => {
  // common practice: encyclopedia "see also" lines separate entries with " · "
  it("NaCl · Carbon tetrachloride · KNO3", () => {
    check("See also: ⟦NaCl⟧ · ⟦Carbon tetrachloride⟧ · ⟦KNO3⟧", ["NaCl", "CCl4", "KNO3"]);
  });
});

describe("a hydrate inside the sentence's brackets", () => {
  // common practice: a reagent list gives the hydrate in brackets after its name
  it("(MnSO4•H2O, 480 g/L)", () => {
    check("Reagents: (⟦MnSO4•H2O⟧, 480 g/L) and (⟦CuSO4.5H2O⟧).", ["MnSO4·H2O", "CuSO4·5H2O"]);
  });
});
