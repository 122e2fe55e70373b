/**
 * Which inlay hints a document gets: the core decides, every editor shows the same. Cases are
 * written with a marker ⟦label⟧ where a hint must appear; the marker is removed from the text.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, geometryHints, type DocumentKind } from "../../shared/src/index";

/** The text without markers, and the hints the markers ask for. */
function expected(marked: string): { text: string; hints: { offset: number; label: string }[] } {
  const hints: { offset: number; label: string }[] = [];
  let text = "";
  let rest = marked;
  for (let match = /⟦([^⟧]*)⟧/.exec(rest); match; match = /⟦([^⟧]*)⟧/.exec(rest)) {
    text += rest.slice(0, match.index);
    hints.push({ offset: text.length, label: match[1] });
    rest = rest.slice(match.index + match[0].length);
  }
  return { text: text + rest, hints };
}

function check(marked: string, kind: DocumentKind = "markdown"): void {
  const { text, hints } = expected(marked);
  const model = analyzeDocument(text, kind);
  expect(geometryHints(text, model, { start: 0, end: text.length })).toEqual(hints);
}

describe("geometry hints", () => {
  it.each([
    // common practice: SF4 seesaw, XeF4 square planar, ClF3 T-shaped, H2O bent
    ["Bay C keeps SF4⟦seesaw⟧ and XeF4⟦square planar⟧ for the etch trials."],
    ["We used chlorine trifluoride (ClF3)⟦T-shaped⟧ as the etchant."],
    ["We used chlorine trifluoride, ClF3⟦T-shaped⟧ as the etchant."],
    ["The cylinder held \\ce{SF4}⟦seesaw⟧ at 2 bar."],
    // Diatomics have no centre and so no geometry of their own to show.
    ["The burn: \\ce{2 NO + O2 -> 2 NO2}⟦NO2 bent⟧."],
    // chemformula's \ch is read as \ce: the hint goes after its closing brace, not inside it.
    ["The scrubber took \\ch{SO2}⟦bent⟧ at pH 12."],
    ["The scrubber: \\ch{SO2 + 2 NaOH -> Na2SO3 + H2O}⟦SO2 bent; H2O bent⟧."],
    // A name and a different species beside it keep a hint each.
    ["Ammonia⟦trigonal pyramidal⟧ (and NF3⟦trigonal pyramidal⟧) were compared."],
  ])("%s", (marked) => check(marked));

  it("gives a hint only inside the asked range", () => {
    const text = "SF4 first.\n\nXeF4 second.\n";
    const model = analyzeDocument(text, "markdown");
    const second = text.indexOf("XeF4");
    expect(geometryHints(text, model, { start: second, end: text.length }).map((hint) => hint.label)).toEqual(["square planar"]);
  });

  it("stops with no hints once cancelled", () => {
    const text = "SF4 and XeF4.";
    expect(geometryHints(text, analyzeDocument(text, "markdown"), { start: 0, end: text.length }, () => true)).toEqual([]);
  });
});
