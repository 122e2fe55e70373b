// `lonepair check` on a handbook-style table of aqueous ions exported as TSV (charges written sign
// first, `Ca+2`, `CO3-2`, `Fe(CN)6-3`; names like "Carbonate ion"). Every row of the table is
// correct, so any error on a row is a false error: as serious as a crash for a user whose CI fails.
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { stripLabels } from "../document/labelledText";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

// source: ion formulas, charges and names as printed in the CRC Handbook's table of standard
// thermodynamic properties of aqueous ions (from memory); the fixture's README says more.
const TABLE = join(repositoryRoot, "tests", "fixtures", "real-style", "handbook-tsv", "aqueous-ions-298K.tsv");

/**
 * Rows the engine still gives a false error today, by ion as written (none since sign-first
 * charges read). Each is an expected failure (`it.fails`): when the reader learns the notation the
 * test starts passing, vitest reports it, and the ion comes off this list.
 */
const KNOWN_FALSE_ERRORS: ReadonlySet<string> = new Set<string>([]);

/** A row that is wrong on purpose, so the harness is seen to catch an error at all. */
const BROKEN_ROW = "Qz+2\tQuartzium ion\t+2\t—\t—\t—";

interface JsonFinding {
  readonly line: number;
  readonly severity: string;
  readonly code: string;
  readonly message: string;
}

interface Row {
  readonly line: number;
  readonly ion: string;
  readonly name: string;
}

const tableText = stripLabels(readFileSync(TABLE, "utf8")).text;
const rows: readonly Row[] = tableText
  .split("\n")
  .map((text, index) => ({ line: index + 1, cells: text.split("\t") }))
  .filter(({ line, cells }) => line > 1 && cells.length > 1)
  .map(({ line, cells }) => ({ line, ion: cells[0], name: cells[1] }));

let errorsByLine = new Map<number, JsonFinding[]>();

beforeAll(() => {
  ensureBuilt();
  const folder = mkdtempSync(join(tmpdir(), "lonepair-handbook-"));
  const file = join(folder, "aqueous-ions-298K.tsv");
  writeFileSync(file, `${tableText}${BROKEN_ROW}\n`);
  const run = runCli(["check", "--format", "json", file], folder);
  const findings = JSON.parse(run.stdout) as JsonFinding[];
  errorsByLine = new Map();
  for (const finding of findings.filter((each) => each.severity === "error")) {
    errorsByLine.set(finding.line, [...(errorsByLine.get(finding.line) ?? []), finding]);
  }
});

function errorsOn(row: Row): string[] {
  return (errorsByLine.get(row.line) ?? []).map((finding) => `${finding.code}: ${finding.message}`);
}

describe("check on a handbook table of aqueous ions", () => {
  it("reads the whole table, and reports the row that is wrong on purpose", () => {
    expect(rows.length).toBe(53);
    const brokenLine = rows.length + 2;
    expect(errorsByLine.get(brokenLine)?.length ?? 0, "a row with no element Qz must be an error").toBeGreaterThan(0);
  });

  for (const row of rows) {
    const title = `no error on the correct row ${row.ion} (${row.name})`;
    const noErrors = (): void => {
      expect(errorsOn(row), `line ${row.line}: ${row.ion} is a correct aqueous ion`).toEqual([]);
    };
    if (KNOWN_FALSE_ERRORS.has(row.ion)) it.fails(title, noErrors);
    else it(title, noErrors);
  }
});
