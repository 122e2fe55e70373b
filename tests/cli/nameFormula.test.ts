// A row whose name and formula disagree, on the command line: the same warning in every format,
// both fixes offered as choices, and `--fix` choosing neither.
import { cpSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const STORE = "tests/fixtures/name-formula/store-export.csv";
const CYLINDERS = "tests/fixtures/name-formula/gas-cylinders.tsv";

interface JsonFinding {
  readonly line: number;
  readonly code: string;
  readonly message: string;
  readonly fix?: unknown;
  readonly choices?: readonly { title: string; edits: readonly { line: number; column: number; newText: string }[] }[];
}

function jsonFindings(file: string): JsonFinding[] {
  return JSON.parse(runCli(["check", "--format", "json", file]).stdout) as JsonFinding[];
}

describe("check on a name column beside a formula column", () => {
  it("prints one warning naming both readings", () => {
    const lines = runCli(["check", STORE]).stdout.split("\n");
    // from memory: copper(II) chloride is CuCl2, CuCl is copper(I) chloride
    expect(lines).toContain(
      `${STORE}:78:11: warning: Name and formula disagree: the name says CuCl2 (copper(II) chloride); ` +
        "the formula column has CuCl (copper(I) chloride). [table-name-formula]",
    );
    expect(lines.filter((line) => line.endsWith("[table-name-formula]"))).toHaveLength(7);
  });

  it("gives both fixes as choices in JSON, and no fix of its own", () => {
    const finding = jsonFindings(STORE).find((each) => each.code === "table-name-formula" && each.line === 78)!;
    expect(finding.fix).toBeUndefined();
    expect(finding.choices).toEqual([
      { title: "Change the formula to CuCl2", edits: [{ line: 78, column: 31, endLine: 78, endColumn: 35, newText: "CuCl2" }] },
      {
        title: "Change the name to Copper(I) chloride",
        edits: [{ line: 78, column: 11, endLine: 78, endColumn: 30, newText: "Copper(I) chloride" }],
      },
    ]);
  });

  it("lists both choices as SARIF fixes", () => {
    const log = JSON.parse(runCli(["check", "--format", "sarif", CYLINDERS]).stdout);
    const result = log.runs[0].results.find(
      (each: { ruleId: string; message: { text: string } }) =>
        each.ruleId === "table-name-formula" && each.message.text.includes("SF4 (sulfur tetrafluoride)"),
    );
    // from memory: SF6 is sulfur hexafluoride
    expect(result.fixes.map((fix: { description: { text: string } }) => fix.description.text)).toEqual([
      "Change the formula to SF4",
      "Change the name to Sulfur hexafluoride",
    ]);
    const rule = log.runs[0].tool.driver.rules.find((each: { id: string }) => each.id === "table-name-formula");
    expect(rule.shortDescription.text).toMatch(/name and its formula/);
  });

  it("leaves both cells alone under --fix: the writer chooses", () => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-name-formula-"));
    cpSync(join(repositoryRoot, STORE), join(folder, "store.csv"));
    const before = readFileSync(join(folder, "store.csv"), "utf8");
    runCli(["check", "--fix", "store.csv"], folder);
    expect(readFileSync(join(folder, "store.csv"), "utf8")).toBe(before);
  });
});
