/**
 * Half-reactions and ionic equations written as plain text (ASCII carets, Unicode superscripts,
 * spaced or glued electrons) are judged as their mhchem spelling is, and prose with arrows that is
 * not an equation stays quiet.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, type DocumentKind } from "../../shared/src/index";

/** Equation findings as [code, text under the finding, the document's line after the fix or "-"]. */
function equationFindings(text: string, kind: DocumentKind): [string, string, string][] {
  return checkDocument(analyzeDocument(text, kind))
    .filter((finding) => finding.code.startsWith("equation-"))
    .map((finding) => {
      const fix = finding.fix;
      const fixed = fix ? text.slice(0, fix.range.start) + fix.newText + text.slice(fix.range.end) : "-";
      return [finding.code, text.slice(finding.range.start, finding.range.end), fixed.trimEnd()];
    });
}

describe("plain-text half-reactions are judged as in mhchem", () => {
  it.each<[string, string]>([
    // from memory: Zumdahl, Chemistry, ch. 18 (iron oxidised to iron(III) gives up three electrons)
    ["ASCII caret", "Fe -> Fe^3+ + 3e-"],
    // from memory: Zumdahl, ch. 18
    ["Unicode superscripts", "Fe → Fe³⁺ + 3e⁻"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (copper plated at the cathode)
    ["glued electrons", "Cu2+ + 2e- -> Cu"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (chlorine reduced to chloride)
    ["spaced electrons", "Cl2 + 2 e- → 2 Cl-"],
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 19 (zinc anode)
    ["zinc anode", "Zn → Zn^2+ + 2 e^-"],
    // from memory: Tro, ch. 19 (silver cathode)
    ["silver cathode", "Ag+ + e- → Ag"],
    // from memory: Petrucci, General Chemistry, ch. 20 (iron(III)/iron(II) couple)
    ["an ion to an ion", "Fe^3+ + e- ⟶ Fe^2+"],
  ])("%s: a balanced half-reaction is quiet in text, markdown and mhchem", (_, equation) => {
    expect(equationFindings(`${equation}\n`, "plaintext")).toEqual([]);
    expect(equationFindings(`At the electrode: ${equation}.\n`, "markdown")).toEqual([]);
    expect(equationFindings(`\\ce{${equation.replace(/⁻/g, "-").replace(/³⁺/, "^3+")}}\n`, "markdown")).toEqual([]);
  });

  it.each<[string, string, DocumentKind, [string, string, string][]]>([
    // from memory: Zumdahl, ch. 18; Fe -> Fe3+ loses three electrons, not one
    ["one electron too few", "Fe -> Fe^3+ + e-", "plaintext", [["equation-unbalanced", "->", "Fe -> Fe^3+ + 3 e-"]]],
    // from memory: Zumdahl, ch. 18; the same written with Unicode superscripts
    ["superscripts, one electron too few", "Fe → Fe³⁺ + e⁻", "plaintext", [["equation-unbalanced", "→", "Fe → Fe³⁺ + 3 e⁻"]]],
    // from memory: Brown, LeMay & Bursten, ch. 20; Cu2+ takes two electrons
    ["copper, electrons missing a coefficient", "Cu2+ + e- -> Cu", "plaintext", [["equation-unbalanced", "->", "Cu2+ + 2 e- -> Cu"]]],
    // from memory: Brown, LeMay & Bursten, ch. 20; Cl2 gives two chloride ions
    ["chlorine, chloride without its 2", "Cl2 + 2 e- → Cl-", "markdown", [["equation-unbalanced", "→", "Cl2 + 2 e- → 2 Cl-"]]],
    // from memory: Tro, ch. 19; a half-reaction inside a student's sentence
    [
      "in a sentence",
      "The anode reaction is Zn → Zn^2+ + e-, as expected.",
      "markdown",
      [["equation-unbalanced", "→", "The anode reaction is Zn → Zn^2+ + 2 e-, as expected."]],
    ],
    // common practice: a half-reaction as the same equation in mhchem, for comparison
    ["the same in mhchem", "\\ce{Fe -> Fe^3+ + e-}", "markdown", [["equation-unbalanced", "->", "\\ce{Fe -> Fe^3+ + 3 e-}"]]],
  ])("%s", (_, text, kind, expected) => {
    expect(equationFindings(text, kind)).toEqual(expected);
  });
});

describe("arrows in prose that are not equations stay quiet", () => {
  it.each<[string, string]>([
    // common practice: arrows as "then" or "becomes" in lab notes
    ["steps", "step 1 -> step 2"],
    ["letters", "A -> B"],
    ["a setting", "pressure -> 2 bar"],
    ["grades", "Grade B → grade A after review."],
    ["an electron beam", "beam current -> e- dose"],
    ["a pronoun", "I -> e-"],
    ["a sentence about electrons", "Then e- flow -> cathode, see Fig. 2."],
    ["email", "Step 3 -> e-mail the results to KR-0412."],
    ["a bare element and an electron", "B -> C + e-"],
  ])("%s", (_, text) => {
    expect(equationFindings(`${text}\n`, "plaintext")).toEqual([]);
    expect(equationFindings(`${text}\n`, "markdown")).toEqual([]);
  });
});
