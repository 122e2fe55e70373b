// `check` reads a CSV/TSV as bytes where it can and hands unusual rows to the ordinary reading in
// batches: the findings, their lines and columns, and the summary must be exactly those of the
// ordinary reading of the whole file, whatever the table holds and however the reads fall.
import fc from "fast-check";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkFile } from "../../server/src/cli/check/checkFile";
import { emptySummary } from "../../server/src/cli/check/checkSummary";
import type { LocatedFinding } from "../../server/src/cli/check/locatedFinding";
import { tableArbitrary } from "../support/randomTables";

const folder = mkdtempSync(join(tmpdir(), "lonepair-bytes-"));

async function checked(path: string, kind: "csv" | "tsv", options: { ordinaryReading?: boolean; rowBufferBytes?: number }) {
  const located: LocatedFinding[] = [];
  const summary = emptySummary();
  await checkFile(
    { path, displayPath: "table", kind, size: 0, modifiedMs: 0 },
    { fix: false, dryRun: false, ...options },
    {
      reporter: { findings: (found) => located.push(...found), end: () => undefined },
      summary,
      writeDiff: () => undefined,
      progress: () => undefined,
      note: () => undefined,
    },
  );
  return { located, summary };
}

describe("check of a table read as bytes", () => {
  it("equals the ordinary reading for random tables and read sizes", async () => {
    await fc.assert(
      fc.asyncProperty(tableArbitrary, fc.integer({ min: 8, max: 400 }), async ({ text, kind }, rowBufferBytes) => {
        const path = join(folder, `table.${kind}`);
        writeFileSync(path, text);
        const ordinary = await checked(path, kind, { ordinaryReading: true });
        const quick = await checked(path, kind, { rowBufferBytes });
        expect(quick.located).toEqual(ordinary.located);
        expect(quick.summary).toEqual(ordinary.summary);
      }),
      { numRuns: 250, seed: 9140 },
    );
  });

  it("places findings after non-ASCII text by UTF-16 columns, on the right lines", async () => {
    // common practice: NF3 has 26 valence electrons; "Ω" and "№" are one UTF-16 unit, two or three UTF-8 bytes
    const rows = Array.from({ length: 50 }, (_, index) => `CYL-Ω${index},NF3,${index % 7 === 0 ? 24 : 26},lot № ${index}`);
    const path = join(folder, "store.csv");
    writeFileSync(path, ["id,formula,valence electrons,supplier lot", ...rows].join("\r\n"));
    const quick = await checked(path, "csv", { rowBufferBytes: 64 });
    expect(quick.located.map((finding) => [finding.line, finding.column, finding.endColumn])).toEqual(
      rows.flatMap((row, index) => (index % 7 === 0 ? [[index + 2, row.indexOf(",24") + 2, row.indexOf(",24") + 4]] : [])),
    );
    expect(quick).toEqual(await checked(path, "csv", { ordinaryReading: true }));
  });
});
