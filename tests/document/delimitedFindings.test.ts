// Checking a CSV/TSV once per distinct row gives exactly the findings of the ordinary reading of
// the whole text (the core's own analyzeDocument + checkDocument are the reference), whatever the
// column order, quoting, line ends, short or long rows, and however the text is cut into batches.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import { checkDocument } from "../../shared/src/document/checkDocument";
import { checkDelimitedText, delimitedRowMemo, findHeader } from "../../shared/src/document/tables/delimitedFindings";
import type { Finding, TextFix } from "../../shared/src/document/types";
import { tableArbitrary } from "../support/randomTables";

function ordinary(text: string, kind: "csv" | "tsv", delimiter: string): Finding[] {
  const model = analyzeDocument(text, kind, undefined, { delimiter });
  return [...model.problems, ...checkDocument(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}

describe("CSV findings worked out once per distinct row", () => {
  it("equal the ordinary reading for random tables", () => {
    fc.assert(
      fc.property(tableArbitrary, ({ text, delimiter, kind }) => {
        expect(checkDelimitedText(text, kind, { delimiter })).toEqual(ordinary(text, kind, delimiter));
      }),
      { numRuns: 400, seed: 4111 },
    );
  });

  it("equal the ordinary reading when the text comes in batches that share one memo", () => {
    fc.assert(
      fc.property(tableArbitrary, fc.nat(), ({ text, delimiter, kind, lineEnd, headerEnd }, cutSeed) => {
        const expected = ordinary(text, kind, delimiter);
        // Cut at some line end after the header; the second piece gets the start of the text up to
        // the header's end in front of it, as a file read in batches does.
        if (headerEnd >= text.length) return;
        const lineFeeds = [...text.matchAll(new RegExp(lineEnd, "g"))]
          .map((match) => match.index + lineEnd.length)
          .filter((at) => at > headerEnd && at < text.length);
        const cut = lineFeeds.length > 0 ? lineFeeds[cutSeed % lineFeeds.length] : text.length;
        // Only cut where the ordinary reading agrees a record ends (not inside quotes).
        if (text.slice(0, cut).split('"').length % 2 === 0) return;
        const memo = delimitedRowMemo();
        const prefix = text.slice(0, headerEnd);
        const firstPiece = checkDelimitedText(text.slice(0, cut), kind, { delimiter, memo });
        const secondPiece = checkDelimitedText(prefix + text.slice(cut), kind, { delimiter, memo, from: prefix.length }).map((finding) =>
          shifted(finding, cut - prefix.length),
        );
        const cutInsideFinding = expected.some((finding) => finding.range.start < cut && finding.range.end > cut);
        if (!cutInsideFinding) expect([...firstPiece, ...secondPiece]).toEqual(expected);
        // The same piece handed over with only the header row, as the editor reads a part of a table.
        const header = findHeader(text, delimiter);
        if (!header || cutInsideFinding) return;
        const underHeader = checkDelimitedText(text.slice(cut), kind, { delimiter, memo, header: header.text });
        expect([...firstPiece, ...underHeader.map((finding) => shifted(finding, cut))]).toEqual(expected);
      }),
      { numRuns: 300, seed: 77 },
    );
  });

  it("read the ordinary way, with the same result, once rows prove not to repeat", () => {
    // common practice: SF4 has 34 valence electrons; every row here is distinct by its id column
    const header = "formula,id,valence electrons";
    const rows = Array.from({ length: 5000 }, (_, index) => `SF4,CYL-${index},${index % 500 === 3 ? 32 : 34}`);
    const text = [header, ...rows].join("\n");
    const memo = delimitedRowMemo();
    const found = checkDelimitedText(text, "csv", { delimiter: ",", memo });
    expect(memo.ordinary).toBe(true);
    expect(found).toEqual(ordinary(text, "csv", ","));
    expect(found.filter((finding) => finding.code.includes("valence"))).toHaveLength(10);
    // The rows alone under the header row: the same findings, read the ordinary way too.
    const rowsOnly = rows.join("\n");
    const rowMemo = delimitedRowMemo();
    const underHeader = checkDelimitedText(rowsOnly, "csv", { delimiter: ",", memo: rowMemo, header });
    expect(rowMemo.ordinary).toBe(true);
    expect(underHeader.map((finding) => shifted(finding, header.length + 1))).toEqual(found);
  });

  it("remembers a repeated row once and places its finding on every copy", () => {
    // common practice: NF3 has 26 valence electrons, so 24 is wrong on every row that says so
    const rows = Array.from({ length: 300 }, (_, index) => `CYL-${index},NF3,24,KR-${index}`);
    const text = ["id,formula,valence electrons,supplier lot", ...rows].join("\n");
    const memo = delimitedRowMemo();
    const found = checkDelimitedText(text, "csv", { memo });
    expect(memo.worked).toBe(1);
    expect(found).toHaveLength(300);
    expect(found.every((finding) => text.slice(finding.range.start, finding.range.end) === "24")).toBe(true);
    expect(found).toEqual(ordinary(text, "csv", ","));
  });
});

function shifted(finding: Finding, by: number): Finding {
  const range = { start: finding.range.start + by, end: finding.range.end + by };
  const move = (fix: TextFix): TextFix => ({ ...fix, range: { start: fix.range.start + by, end: fix.range.end + by } });
  const fixed = finding.fix ? { ...finding, range, fix: move(finding.fix) } : { ...finding, range };
  return finding.choices ? { ...fixed, choices: finding.choices.map(move) } : fixed;
}
