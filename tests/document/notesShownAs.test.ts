/**
 * Notes shown as information, as hints or not at all: the one decision the editor's
 * `lonepair.diagnostics.notesAs` setting and `check --notes` both ask for.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, shownFindings, shownParts, type Finding, type NotesShownAs } from "../../shared/src/index";

// common practice: NaCl and CaF2 are ionic solids (lattices of ions); NO2 has 17 valence
// electrons, so it is a radical; carbon holds at most four electron pairs, so CH5 is impossible.
const WRITE_UP = "Run 18 salts: NaCl and CaF2 were dried; SF6 and NO2 came from the store; CH5 is a typo.\n";

/** Each finding shown as [severity, the text it covers]. */
function shown(notesAs: NotesShownAs): [string, string][] {
  const findings = checkDocument(analyzeDocument(WRITE_UP, "markdown"));
  return shownFindings(findings, notesAs).map((finding) => [finding.severity, WRITE_UP.slice(finding.range.start, finding.range.end)]);
}

describe("notes shown as", () => {
  it.each([
    // [notesAs, expected findings]
    [
      "information",
      [
        ["information", "NaCl"],
        ["information", "CaF2"],
        ["information", "NO2"],
        ["error", "CH5"],
      ],
    ],
    [
      "hint",
      [
        ["hint", "NaCl"],
        ["hint", "CaF2"],
        ["hint", "NO2"],
        ["error", "CH5"],
      ],
    ],
    ["off", [["error", "CH5"]]],
  ] as [NotesShownAs, [string, string][]][])("%s", (notesAs, expected) => {
    expect(shown(notesAs)).toEqual(expected);
  });

  it.each([
    // [finding severity, notesAs, shown severity]
    ["error", "off", "error"],
    ["warning", "off", "warning"],
    ["warning", "hint", "warning"],
    ["hint", "off", "hint"],
    ["information", "hint", "hint"],
    ["information", "off", undefined],
  ] as const)("a finding of severity %s with notes as %s is shown as %s", (severity, notesAs, expected) => {
    const finding: Finding = { range: { start: 0, end: 1 }, severity, code: "radical", message: "m" };
    expect(shownFindings([finding], notesAs)[0]?.severity).toBe(expected);
  });

  it("keeps each part's place when parts are shown", () => {
    const findings = checkDocument(analyzeDocument(WRITE_UP, "markdown"));
    const parts = [...shownParts([{ findings, offset: 40 }], "off")];
    expect(parts).toHaveLength(1);
    expect(parts[0].offset).toBe(40);
    expect(parts[0].findings.map((finding) => finding.code)).toEqual(["octet-exceeded"]);
  });
});
