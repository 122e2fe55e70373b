// `lonepair check` and `check --fix` on data files with an equation column: the same findings as
// the editor (one code path), the quick byte reading of a large export equal to the ordinary
// reading, and fixes that change only coefficients inside their cells.
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { parse } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import { checkFile } from "../../server/src/cli/check/checkFile";
import { emptySummary } from "../../server/src/cli/check/checkSummary";
import type { LocatedFinding } from "../../server/src/cli/check/locatedFinding";
import { ensureBuilt, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const folder = mkdtempSync(join(tmpdir(), "lonepair-equation-cells-"));

async function checked(path: string, options: { ordinaryReading?: boolean; rowBufferBytes?: number }) {
  const located: LocatedFinding[] = [];
  const summary = emptySummary();
  await checkFile(
    { path, displayPath: "runs", kind: "csv", size: 0, modifiedMs: 0 },
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

// A run log exported from a lab sheet, in our scenario: Unicode arrows and superscripts, a quoted
// cell with a comma, free-text notes that must not be read.
// from memory: Zumdahl, Chemistry, ch. 18 (Fe -> Fe3+ + 3e-); Greenwood & Earnshaw (2 SO2 + O2 -> 2 SO3);
// Brown, LeMay & Bursten, ch. 3 (2 H2 + O2 -> 2 H2O)
const ROWS = [
  "KR-{i},Fe → Fe³⁺ + e⁻,Fe,lot № {i}",
  'KR-{i},"SO2 + O2 → SO3, over V2O5",SO3,bay C',
  "KR-{i},2 H2 + O2 → 2 H2O,H2O,NO CO here",
];

function runLog(count: number): string {
  const rows = Array.from({ length: count }, (_, index) => ROWS[index % ROWS.length].replace(/\{i\}/g, String(index)));
  return ["id,Reaction,formula,notes", ...rows].join("\r\n") + "\r\n";
}

describe("check of a CSV with an equation column", () => {
  it("reads repeated rows as bytes with the findings of the ordinary reading", async () => {
    const path = join(folder, "runs.csv");
    writeFileSync(path, runLog(3000));
    const quick = await checked(path, { rowBufferBytes: 256 });
    const ordinary = await checked(path, { ordinaryReading: true });
    expect(quick).toEqual(ordinary);
    // One unbalanced half-reaction and one unbalanced oxidation of every three rows.
    expect(quick.located.filter((finding) => finding.code === "equation-unbalanced")).toHaveLength(2000);
    const first = quick.located.find((finding) => finding.code === "equation-unbalanced")!;
    // "KR-0,Fe → ": the arrow is the 9th character (UTF-16 columns, 1-based).
    expect([first.line, first.column]).toEqual([2, 9]);
  });

  it("check --fix changes only coefficients, and the file stays the same CSV", () => {
    const path = join(folder, "fix.csv");
    const before = runLog(6);
    writeFileSync(path, before);
    const run = runCli(["check", "--fix", "fix.csv"], folder);
    expect(run.stdout + run.stderr).toContain("Fixed 4 findings in 1 file.");
    const after = readFileSync(path, "utf8");
    const rowsBefore = parse(before) as string[][];
    const rowsAfter = parse(after) as string[][];
    expect(rowsAfter.map((row) => row.length)).toEqual(rowsBefore.map((row) => row.length));
    // from memory: the balanced forms of the equations above
    expect(rowsAfter.slice(1, 4).map((row) => row[1])).toEqual(["Fe → Fe³⁺ + 3 e⁻", "2 SO2 + O2 → 2 SO3, over V2O5", "2 H2 + O2 → 2 H2O"]);
    rowsAfter.forEach((row, index) => expect([row[0], ...row.slice(2)]).toEqual([rowsBefore[index][0], ...rowsBefore[index].slice(2)]));
    expect(runCli(["check", "fix.csv"], folder).stdout).not.toContain("equation-");
  });
});
