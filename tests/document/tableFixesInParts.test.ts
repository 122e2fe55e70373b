// "Fix every table value" worked out a part of the document at a time, each fix placed against
// the model around it, gives the fixes the whole-document rule gives on the whole model and
// every finding (the core's own analyzeDocument + checkDocument are the reference): for random
// tables cut into many small segments, for JSON and YAML lists, and for markdown with a table.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  chunkedTextOf,
  createDocumentAnalyser,
  tableValueFixes,
  tableValueFixesInParts,
  type DocumentKind,
  type TextFix,
} from "../../shared/src/index";
import { fromScratch } from "../support/incrementalCheck";
import { JSON_RECORD_LINES, jsonDocument } from "../support/jsonEdits";
import { tableArbitrary } from "../support/randomTables";

function wholeDocumentFixes(text: string, kind: DocumentKind): TextFix[] {
  return tableValueFixes(analyzeDocument(text, kind), fromScratch(text, kind));
}

function fixesInParts(text: string, kind: DocumentKind, chunk: number): TextFix[] {
  const analysis = createDocumentAnalyser(kind, undefined, { listStep: 200 }).analyse(chunkedTextOf(text, chunk));
  return [...tableValueFixesInParts(analysis.findingPartsAt(), (start, end) => analysis.modelAround(start, end))];
}

// common practice: valence electrons SF4 34, NF3 26; NH3 is trigonal pyramidal, BF3 trigonal planar.
const YAML_RECORDS = [
  "  - {id: KR-1, formula: SF4, valence electrons: 32, lone pairs: 1}",
  "  - {id: KR-2, formula: NF3, valence electrons: 26, molecular geometry: trigonal planar}",
  "  - formula: NH3\n    molecular geometry: tetrahedral",
  "  - {id: KR-4, formula: Sf4}",
  "  - {id: KR-5, equation: N2 + H2 -> NH3}",
];

const MARKDOWN = [
  "# Run 14: fluorinating agents",
  "",
  "The \\ce{Sf4} line and the CLF3 line were compared; N2 + H2 -> NH3 was not run.",
  "",
  "| formula | valence electrons | molecular geometry |",
  "| --- | --- | --- |",
  "| SF4 | 32 | seesaw |",
  "| NH3 | 8 | trigonal planar |",
  "| BF3 | 24 | trigonal pyramidal |",
  "",
  "Afterwards Nf3 was vented.",
  "",
].join("\n");

describe("table fixes found a part at a time", () => {
  it("equal the whole-document rule on random tables in small segments", () => {
    fc.assert(
      fc.property(tableArbitrary, fc.integer({ min: 16, max: 400 }), ({ text, kind }, chunk) => {
        expect(fixesInParts(text, kind, chunk)).toEqual(wholeDocumentFixes(text, kind));
      }),
      { numRuns: 150 },
    );
  });

  it.each([
    ["json", jsonDocument(Array.from({ length: 40 }, (_, index) => JSON_RECORD_LINES[index % JSON_RECORD_LINES.length]))],
    [
      "yaml",
      `lab: Kestrel Ridge Analytical\nrecords:\n${Array.from({ length: 30 }, (_, index) => YAML_RECORDS[index % YAML_RECORDS.length]).join("\n")}\n`,
    ],
    ["markdown", MARKDOWN],
  ] as const)("equal the whole-document rule in %s", (kind, text) => {
    const expected = wholeDocumentFixes(text, kind);
    // The documents hold wrong table values, so the comparison is not of two empty lists.
    expect(expected.length).toBeGreaterThan(2);
    for (const chunk of [32, 256, 4096]) expect(fixesInParts(text, kind, chunk)).toEqual(expected);
  });

  it("leaves fixes outside table values out (misspelt formulas in prose)", () => {
    const outside = [MARKDOWN.indexOf("Sf4"), MARKDOWN.indexOf("CLF3")];
    // Both carry a fix of their own, offered one at a time but never by fix-all.
    const fixed = fromScratch(MARKDOWN, "markdown").filter((finding) => finding.fix !== undefined);
    for (const start of outside) expect(fixed.some((finding) => finding.range.start === start)).toBe(true);
    const fixes = fixesInParts(MARKDOWN, "markdown", 64);
    for (const start of outside) expect(fixes.some((fix) => fix.range.start === start)).toBe(false);
  });
});
