// CSV streamed in batches of records gives exactly the findings and species of the whole file
// read at once: the core's own whole-document analysis is the reference.
import fc from "fast-check";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import { checkDocument } from "../../shared/src/document/checkDocument";
import { batchModel } from "../../server/src/cli/documents/batchModel";
import { readDocument } from "../../server/src/cli/documents/documentBatches";
import { lineIndexOf } from "../../server/src/cli/documents/lineIndex";
import { delimitedRowMemo } from "../../shared/src/document/tables/delimitedFindings";

const folder = mkdtempSync(join(tmpdir(), "lonepair-batches-"));

/** Findings and species of `text` read as one document. */
function whole(text: string, kind: "csv" | "tsv") {
  const model = analyzeDocument(text, kind);
  const findings = [...model.problems, ...checkDocument(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
  return { findings, species: model.occurrences.map((occurrence) => [occurrence.range.start, occurrence.text]) };
}

/** The same, streamed from a file in batches of about `batchCharacters`, moved back to document offsets. */
async function streamed(text: string, kind: "csv" | "tsv", batchCharacters: number) {
  const path = join(folder, `table.${kind}`);
  writeFileSync(path, text);
  const findings = [];
  const species = [];
  const positions = [];
  let rebuilt = "";
  // One memo of rows for the whole file, as `check` keeps it.
  const context = { rows: delimitedRowMemo() };
  for await (const batch of readDocument(path, kind, batchCharacters).batches) {
    rebuilt += batch.text;
    const model = batchModel(batch, kind, context);
    const move = (range: { start: number; end: number }) => ({ start: range.start + batch.offset, end: range.end + batch.offset });
    for (const finding of model.findings())
      findings.push({
        ...finding,
        range: move(finding.range),
        ...(finding.fix ? { fix: { ...finding.fix, range: move(finding.fix.range) } } : {}),
        ...(finding.choices ? { choices: finding.choices.map((choice) => ({ ...choice, range: move(choice.range) })) } : {}),
      });
    for (const occurrence of model.occurrences) {
      species.push([occurrence.range.start + batch.offset, occurrence.text]);
      positions.push(batch.lines.position(occurrence.range.start));
    }
  }
  return { rebuilt, findings, species, positions };
}

const ROWS = [
  "KR-1,SF4,34,seesaw",
  "KR-2,NF3,24,trigonal pyramidal",
  'KR-3,"NH3",8,"trigonal\nplanar"',
  "KR-4,CH5,8,tetrahedral",
  'KR-5,"CO2","16","bent"',
  "KR-6,,,",
  "",
  'KR-7,"BF3 ""gas""",24,trigonal planar',
  "KR-8,H2O,8,bent",
  "KR-9,XeF4,34,square planar",
];

describe("CSV in batches", () => {
  it("equals the whole-file reading for random tables, line ends and batch sizes", async () => {
    // common practice: RFC 4180 quoting, and the CRLF, LF and CR line ends found in real files
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.constantFrom(...ROWS), { minLength: 0, maxLength: 40 }),
        fc.constantFrom("\n", "\r\n", "\r"),
        fc.boolean(),
        fc.integer({ min: 1, max: 200 }),
        async (rows, lineEnd, byteOrderMark, batchCharacters) => {
          const text = `${byteOrderMark ? "\ufeff" : ""}id,formula,valence electrons,molecular geometry${lineEnd}${rows.join(lineEnd)}`;
          const expected = whole(text, "csv");
          const actual = await streamed(text, "csv", batchCharacters);
          expect(actual.rebuilt).toBe(text);
          expect(actual.findings).toEqual(expected.findings);
          expect(actual.species).toEqual(expected.species);
          // Lines and columns carried across batches equal those counted over the whole text.
          const wholeLines = lineIndexOf(text);
          expect(actual.positions).toEqual(expected.species.map(([start]) => wholeLines.position(start as number)));
        },
      ),
      { numRuns: 150, seed: 2207 },
    );
  });

  it("keeps the header's meaning across batches of a large table", async () => {
    const rows = Array.from({ length: 3000 }, (_, index) => (index % 500 === 7 ? `KR-${index}\tNF3\t24` : `KR-${index}\tSF6\t48`));
    const text = `cylinder\tformula\tvalence electrons\n${rows.join("\n")}\n`;
    const actual = await streamed(text, "tsv", 4096);
    expect(actual.findings).toEqual(whole(text, "tsv").findings);
    // common practice: NF3 has 26 valence electrons; six rows say 24
    expect(actual.findings.map((finding) => finding.code)).toEqual(Array(6).fill("table-valence-electrons"));
  });
  it("cuts a file larger than one disk read into batches that each end at the first record end past the batch size", async () => {
    // More than a megabyte, so one read from disk holds several batches.
    const rows = Array.from({ length: 24_000 }, (_, index) =>
      index % 997 === 5 ? `KR-${index},NF3,24,trigonal pyramidal` : `KR-${index},SF6,48,octahedral`,
    );
    const text = `id,formula,valence electrons,molecular geometry\n${rows.join("\n")}\n`;
    const path = join(folder, "large.csv");
    writeFileSync(path, text);
    const batchCharacters = 5000;
    const batches = [];
    for await (const batch of readDocument(path, "csv", batchCharacters).batches) batches.push(batch);
    expect(batches.map((batch) => batch.text).join("")).toBe(text);
    expect(batches.length).toBeGreaterThan(text.length / (batchCharacters * 1.1));
    for (const batch of batches.slice(0, -1)) {
      // Ends at a record end, and the record before that one ended short of the batch size.
      expect(batch.text.endsWith("\n")).toBe(true);
      expect(batch.text.lastIndexOf("\n", batch.text.length - 2) + 1).toBeLessThan(batchCharacters);
      expect(batch.text.length).toBeGreaterThanOrEqual(batchCharacters);
    }
    const actual = await streamed(text, "csv", batchCharacters);
    expect(actual.findings).toEqual(whole(text, "csv").findings);
    // common practice: NF3 has 26 valence electrons; the rows at 5, 1002, ... say 24
    expect(actual.findings.map((finding) => finding.code)).toEqual(
      Array(Math.floor((24_000 - 6) / 997) + 1).fill("table-valence-electrons"),
    );
  });
});
