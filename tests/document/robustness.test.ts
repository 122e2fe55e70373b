/**
 * No input makes the document core throw: random binary, random text built from the characters
 * the scanners care about, pathological repetitions and large documents.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import { checkDocument } from "../../shared/src/document/checkDocument";
import { documentKindFor } from "../../shared/src/document/documentKind";
import type { DocumentKind, DocumentModel } from "../../shared/src/document/types";

const KINDS: readonly DocumentKind[] = ["markdown", "plaintext", "csv", "tsv", "json", "yaml"];

/** Every range in the model and its findings lies inside the text. */
function expectRangesInside(model: DocumentModel, length: number): void {
  const ranges = [
    ...model.occurrences.map((occurrence) => occurrence.range),
    ...model.records.flatMap((record) => record.cells.map((cell) => cell.range)),
    ...model.problems.map((problem) => problem.range),
    ...(model.unreadable ?? []).map((unreadable) => unreadable.range),
    ...checkDocument(model).map((finding) => finding.range),
  ];
  for (const range of ranges) {
    expect(range.start).toBeGreaterThanOrEqual(0);
    expect(range.end).toBeGreaterThanOrEqual(range.start);
    expect(range.end).toBeLessThanOrEqual(length);
  }
}

// Characters that drive the scanners' decisions, so random text reaches their corners.
const SIGNIFICANT = fc.constantFrom(
  "S",
  "F",
  "4",
  "N",
  "H",
  "+",
  "-",
  "^",
  "2",
  "(",
  ")",
  "[",
  "]",
  "`",
  "\\ce{",
  "}",
  "|",
  "---",
  "\n",
  "\r\n",
  " ",
  '"',
  ",",
  "\t",
  ":",
  "{",
  "<!--",
  "-->",
  "```",
  "smiles:",
  "·",
  "²",
  "⁻",
  "₄",
  "\ufeff",
  "#",
  "- ",
  "Cl",
  "Xe",
  "e",
  "\u0000",
);

describe("robustness", () => {
  it.each(KINDS)("never throws on random binary read as %s", (kind) => {
    fc.assert(
      fc.property(fc.string({ unit: "binary", maxLength: 400 }), (text) => {
        const model = analyzeDocument(text, kind);
        expectRangesInside(model, text.length);
      }),
      { numRuns: 300, seed: 7 },
    );
  });

  it.each(KINDS)("never throws on random scanner-significant text read as %s", (kind) => {
    fc.assert(
      fc.property(
        fc.array(SIGNIFICANT, { maxLength: 120 }).map((parts) => parts.join("")),
        (text) => {
          const model = analyzeDocument(text, kind);
          expectRangesInside(model, text.length);
        },
      ),
      { numRuns: 500, seed: 11 },
    );
  });

  it.each(KINDS)("reads pathological repetitions as %s without throwing", (kind) => {
    for (const unit of ["`", "<!--", "\\ce{", "[", "{", '"', "|-|\n", "- ", "(((SF4", "SF4^{", "a\u0000", "\ud800"]) {
      const text = unit.repeat(20_000);
      expect(() => expectRangesInside(analyzeDocument(text, kind), text.length)).not.toThrow();
    }
  });

  // common practice: a no-break space or a stray byte order mark is white space to a reader.
  it.each([
    ["a no-break space in an mhchem span", "$\\ce{SF4\u00a0+ F2 -> SF6}$ and NF3"],
    ["a byte order mark alone on a line of a chemistry fence", "```chem\nSF4 + F2\n\ufeff\nNF3\n"],
    ["a byte order mark inside a chemistry fence line", "```chem\nSF4\ufeff+ F2\n```\nNF3"],
  ])("reads %s to the end", (_, text) => {
    const model = analyzeDocument(text, "markdown");
    expect(model.occurrences.map((occurrence) => occurrence.text)).toContain("NF3");
    expectRangesInside(model, text.length);
  });

  it.each(KINDS)("reads a 2 MB document as %s", (kind) => {
    const line = '| SF4 | 34 | seesaw |, NF3,"x"\t- formula: NH4+ `smiles:C` \\ce{SO4^2-} KR-0412 ';
    const text = line.repeat(Math.ceil(2_000_000 / line.length));
    const model = analyzeDocument(text, kind);
    expect(model.kind).toBe(kind);
  });

  it("never throws on arbitrary input given to documentKindFor", () => {
    fc.assert(
      fc.property(fc.string(), fc.option(fc.string()), fc.option(fc.string({ unit: "binary" })), (name, language, bytes) => {
        const kind = documentKindFor(name, language ?? undefined, bytes ?? undefined);
        expect(kind === undefined || KINDS.includes(kind)).toBe(true);
      }),
      { numRuns: 500, seed: 3 },
    );
  });
});
