/**
 * Formulas that also spell words or abbreviations (SnO, InN) count only where the line is about
 * chemistry; in ordinary sentences they stay words. Each document marks what must be found with ⟦ ⟧.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/index";
import { lineAndColumn, stripLabels } from "./labelledText";

function check(marked: string): void {
  const { text, labels } = stripLabels(marked);
  const found = analyzeDocument(text, "markdown").occurrences.map(
    (occurrence) => `${lineAndColumn(text, occurrence.range.start)} ${occurrence.text}`,
  );
  expect(found).toEqual(labels.map((label) => `${lineAndColumn(text, label.start)} ${label.text}`));
}

describe("word-like formulas in chemical context", () => {
  // common practice: how lab reports name tin(II) oxide and indium nitride beside their formulas
  it.each([
    "Heat ⟦tin(II) oxide⟧ (⟦SnO⟧) gently; above 300 °C it turns into ⟦SnO2⟧.",
    "The black powder was ⟦SnO⟧, not the white ⟦SnO2⟧.",
    "⟦SnO⟧ is an oxide that darkens in air.",
    "⟦Stannous oxide⟧ (⟦SnO⟧) is kept dry.",
    "Films of ⟦InN⟧ are grown on sapphire; the nitride is a wurtzite solid.",
  ])("%s", (marked) => check(marked));
});

describe("word-like formulas in ordinary text stay words", () => {
  // common practice: meeting notes and names that happen to spell the same letters
  it.each(["The SnO team sync moved to Friday.", "We met at the InN near the station.", "Ask about SnO before the audit."])(
    "%s",
    (marked) => check(marked),
  );
});
