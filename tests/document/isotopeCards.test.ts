/**
 * An isotope-labelled species found in a document is analysed as the unlabelled species (the same
 * Lewis structure and shape), and its card and hover say which atoms carry which label, whatever
 * markup the writer used for the mass number.
 */
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  analyzeSpecies,
  formatAnalysisCard,
  hoverMarkdown,
  speciesAtOffset,
  type DocumentKind,
  type SpeciesAnalysis,
} from "../../shared/src/index";

/** The analysis of the species written at `mention` in `text`, failing when it is not found. */
function analysisAt(text: string, mention: string, kind: DocumentKind): SpeciesAnalysis {
  const offset = text.indexOf(mention);
  const found = speciesAtOffset(analyzeDocument(text, kind), offset);
  expect(found?.text, `${mention} is found whole`).toBe(mention);
  if (!found?.analysis.ok) throw new Error(`${mention} is not analysed`);
  return found.analysis.value;
}

function unlabelled(formula: string): SpeciesAnalysis {
  const result = analyzeSpecies(formula);
  if (!result.ok) throw new Error(`${formula} is not analysed`);
  return result.value;
}

/** What the structure is, label aside: electrons, and each centre's shape. */
function structureOf(analysis: SpeciesAnalysis): unknown {
  return {
    valenceElectrons: analysis.valenceElectrons,
    composition: analysis.reading.composition,
    centres: analysis.centres.map((centre) => [centre.atom, centre.axe, centre.molecularGeometry]),
  };
}

describe("isotope-labelled species in documents", () => {
  // from memory: a mass number changes no electron count, so the Lewis structure and VSEPR shape
  // are those of the unlabelled species (standard general chemistry texts); IUPAC nuclide notation
  it.each([
    ["The tracer ¹³CH₄ (99 atom %) was bought in.", "¹³CH₄", "markdown", "CH4", "carbon-13"],
    ["A tracer of <sup>13</sup>CO<sub>2</sub> in bay 4.", "<sup>13</sup>CO<sub>2</sub>", "markdown", "CO2", "carbon-13"],
    ["Injected $^{13}CO_2$ into the cell.", "^{13}CO_2", "markdown", "CO2", "carbon-13"],
    ["The ^13^CO~2~ cylinder sits in bay 4.", "^13^CO~2~", "plaintext", "CO2", "carbon-13"],
    ["Made up in $\\mathrm{H_2^{18}O}$ (97 %).", "H_2^{18}O", "markdown", "H2O", "oxygen-18"],
    ["Background 13CO2 in room air is 1.1 %.", "13CO2", "plaintext", "CO2", "carbon-13"],
    ["NMR in CD3OD and D2O.", "CD3OD", "plaintext", "CH3OH", "hydrogen-2"],
  ] as const)("%s: %s (%s) has the structure of %s and says %s", (text, mention, kind, plain, label) => {
    const analysis = analysisAt(text, mention, kind);
    expect(structureOf(analysis)).toEqual(structureOf(unlabelled(plain)));
    const hover = hoverMarkdown(analysis, { angleDecimals: 1, format: "plaintext" });
    expect(hover).toContain("Isotope labels:");
    expect(hover).toContain(label);
    expect(hover).toContain("same Lewis structure and shape");
    const card = formatAnalysisCard(mention, { ok: true, value: analysis });
    expect(card).toContain(label);
  });

  it("says nothing about isotopes for an unlabelled species", () => {
    const analysis = analysisAt("Plain CO2 in bay 3.", "CO2", "plaintext");
    expect(hoverMarkdown(analysis, { angleDecimals: 1, format: "plaintext" })).not.toContain("Isotope");
  });
});
