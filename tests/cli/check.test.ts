// `lonepair check` over the example workspace and the bay D fixtures: exact diagnostics, exit
// codes and the JSON shape, through the built command line.
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, fixtureCopy, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

interface JsonFinding {
  file: string;
  line: number;
  column: number;
  endLine: number;
  endColumn: number;
  severity: string;
  code: string;
  message: string;
  fix?: { title: string; edits: { line: number; column: number; endLine: number; endColumn: number; newText: string }[] };
}

function checkJson(...args: string[]): { status: number | null; findings: JsonFinding[] } {
  const run = runCli(["check", "--format", "json", ...args]);
  return { status: run.status, findings: JSON.parse(run.stdout) };
}

/** The text a finding covers, read back from the file with its 1-based line and column. */
function coveredText(finding: JsonFinding, root = repositoryRoot): string {
  const text = readFileSync(join(root, finding.file), "utf8").replace(/^\ufeff/, "");
  const line = text.split(/\r\n|\r|\n/)[finding.line - 1];
  return line.slice(finding.column - 1, finding.endColumn - 1);
}

describe("check over examples/", () => {
  it("reports the deliberate mistakes, one line each, compiler style, and exits 1 for the error", () => {
    const run = runCli(["check", "examples"]);
    expect(run.status).toBe(1);
    const lines = run.stdout.trim().split("\n");
    // common practice: NF3 has 5 + 3 x 7 = 26 valence electrons
    expect(lines).toContain(
      "examples/inventory/cylinders.csv:4:34: warning: Valence electrons for NF3 are 26, the table says 24. [table-valence-electrons]",
    );
    // common practice: NH3 is AX3E1, trigonal pyramidal
    expect(
      lines.some((line) =>
        line.startsWith("examples/inventory/cylinders.csv:13:25: warning: Molecular geometry of NH3 is trigonal pyramidal"),
      ),
    ).toBe(true);
    // common practice: carbon holds at most four electron pairs, so CH5 is impossible
    expect(
      lines.some((line) => line.startsWith("examples/inventory/cylinders.csv:15:17: error: CH5:") && line.endsWith("[octet-exceeded]")),
    ).toBe(true);
    // common practice: nitrite is AX2E1, bent
    expect(lines.some((line) => line.startsWith("examples/inventory/ions.yaml:44:25: warning: Molecular geometry of NO2- is bent"))).toBe(
      true,
    );
    // common practice: BrF5 has 7 + 5 x 7 = 42 and XeF4 8 + 4 x 7 = 36 valence electrons
    expect(lines).toContain(
      "examples/notebook/run-14-fluorinating-agents.md:22:38: warning: Valence electrons for BrF5 are 42, the table says 40. [table-valence-electrons]",
    );
    expect(lines).toContain(
      "examples/reference/species.json:16:78: warning: Valence electrons for XeF4 are 36, the table says 34. [table-valence-electrons]",
    );
    // from memory: Zumdahl, Chemistry, ch. 4: Ca2+ + 2 F- -> CaF2; sulfite to sulfate takes 2 SO3^2- per O2
    expect(lines.filter((line) => line.endsWith("[equation-unbalanced]"))).toHaveLength(2);
    expect(lines.at(-2)).toBe("3 errors, 6 warnings and 3 notes in 5 of 6 files checked.");
    expect(lines.at(-1)).toMatch(/^Caution: Model prediction, not measured data/);
  });

  it("places every finding on the text it names", () => {
    const { findings } = checkJson("examples");
    expect(findings.map((finding) => [finding.file, finding.code, coveredText(finding)])).toEqual([
      ["examples/inventory/cylinders.csv", "table-valence-electrons", "24"],
      ["examples/inventory/cylinders.csv", "table-molecular-geometry", "trigonal planar"],
      // from memory: methane is CH4, so its name disagrees with the CH5 beside it
      ["examples/inventory/cylinders.csv", "table-name-formula", "methane"],
      ["examples/inventory/cylinders.csv", "octet-exceeded", "CH5"],
      // One note for the row, on the formula: the name beside it names the same species.
      ["examples/inventory/cylinders.csv", "transition-metal-centre", "WF6"],
      ["examples/inventory/ions.yaml", "table-molecular-geometry", "linear"],
      // ZnSe windows: a zinc-blende solid, Zn2+ and Se2-, not a diatomic molecule
      ["examples/notebook/run-14-fluorinating-agents.md", "ionic-solid", "ZnSe"],
      ["examples/notebook/run-14-fluorinating-agents.md", "table-valence-electrons", "40"],
      // The two equations wrong on purpose: the finding sits on the arrow.
      ["examples/notebook/run-16-scrubber-chemistry.md", "equation-unbalanced", "→"],
      ["examples/notebook/run-16-scrubber-chemistry.md", "ionic-solid", "CaF2"],
      ["examples/notebook/run-16-scrubber-chemistry.md", "equation-unbalanced", "->"],
      ["examples/reference/species.json", "table-valence-electrons", "34"],
    ]);
  });
});

describe("check --notes", () => {
  // The three notes of examples/: WF6 (a transition-metal centre, in the CSV read as bytes),
  // ZnSe and CaF2 (ionic solids, in markdown read in batches).
  const NOTE_CODES = ["transition-metal-centre", "ionic-solid", "ionic-solid"];

  it.each([
    // [--notes, severity of each note, or none when left out]
    ["information", "information"],
    ["hint", "hint"],
    ["off", undefined],
  ])("--notes %s shows the notes as %s and leaves errors and warnings as they are", (notesAs, noteSeverity) => {
    const all = checkJson("examples").findings;
    const { status, findings } = checkJson("--notes", notesAs, "examples");
    expect(status).toBe(1);
    const isNote = (finding: JsonFinding) => NOTE_CODES.includes(finding.code);
    expect(all.filter(isNote).map((finding) => finding.code)).toEqual(NOTE_CODES);
    expect(findings.filter((finding) => !isNote(finding))).toEqual(all.filter((finding) => !isNote(finding)));
    const expected = noteSeverity === undefined ? [] : all.filter(isNote).map((finding) => ({ ...finding, severity: noteSeverity }));
    expect(findings.filter(isNote)).toEqual(expected);
  });

  it("counts only what it shows", () => {
    const lines = runCli(["check", "--notes", "off", "examples"]).stdout.trim().split("\n");
    expect(lines.at(-2)).toBe("3 errors and 6 warnings in 5 of 6 files checked.");
  });

  it("refuses a value it does not know", () => {
    const run = runCli(["check", "--notes", "quiet", "examples"]);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("unknown --notes 'quiet' (use information, hint, off)");
  });
});

describe("check exit codes", () => {
  it.each([
    // [arguments, expected status, why]
    [["tests/fixtures/cli/clean-notes.txt"], 0, "nothing to report"],
    [["--strict", "tests/fixtures/cli/clean-notes.txt"], 0, "strict, still nothing"],
    [["tests/fixtures/cli/bay-d-ions.yaml"], 0, "warnings only"],
    [["--strict", "tests/fixtures/cli/bay-d-ions.yaml"], 1, "warnings fail with --strict"],
    [["tests/fixtures/cli/run-22-bay-d-audit.md"], 1, "an impossible CH5 is an error"],
    [["tests/fixtures/cli/no-such-file.md"], 2, "I/O error"],
    [["--format", "xml", "examples"], 2, "unknown format"],
    [["--dry-run", "examples"], 2, "--dry-run without --fix"],
    [[], 2, "no path"],
    [["--no-such-option", "examples"], 2, "unknown option"],
  ] as [string[], number, string][])("check %j exits %i (%s)", (args, status) => {
    expect(runCli(["check", ...args]).status).toBe(status);
  });

  it("names a missing file on stderr and still checks the others", () => {
    const run = runCli(["check", "tests/fixtures/cli/no-such-file.md", "tests/fixtures/cli/bay-d-ions.yaml"]);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("tests/fixtures/cli/no-such-file.md: no such file or directory");
    expect(run.stdout).toContain("bay-d-ions.yaml:14:24: warning: Valence electrons for SO4^2- are 32, the table says 30.");
  });
});

describe("check --format json", () => {
  it("gives one object per finding with 1-based positions and the editor's fix", () => {
    const { status, findings } = checkJson("tests/fixtures/cli");
    expect(status).toBe(1);
    for (const finding of findings) {
      expect(Object.keys(finding).slice(0, 8)).toEqual(["file", "line", "column", "endLine", "endColumn", "severity", "code", "message"]);
    }
    const nf3 = findings.find((finding) => finding.file.endsWith("bay-d-cylinders.csv") && finding.code === "table-valence-electrons");
    // The file starts with a byte-order mark and uses CRLF; neither moves the column.
    expect(nf3).toEqual({
      file: "tests/fixtures/cli/bay-d-cylinders.csv",
      line: 3,
      column: 14,
      endLine: 3,
      endColumn: 16,
      severity: "warning",
      code: "table-valence-electrons",
      // common practice: NF3 has 5 + 3 x 7 = 26 valence electrons
      message: "Valence electrons for NF3 are 26, the table says 24.",
      fix: { title: "Change to 26", edits: [{ line: 3, column: 14, endLine: 3, endColumn: 16, newText: "26" }] },
    });
    expect(findings.map((finding) => [finding.code, coveredText(finding)])).toEqual([
      ["table-valence-electrons", "24"],
      // common practice: CO2 is AX2, linear
      ["table-molecular-geometry", "bent"],
      // common practice: nitrate is AX3, trigonal planar; sulfate has 6 + 4 x 6 + 2 = 32 valence electrons
      ["table-molecular-geometry", "trigonal pyramidal"],
      ["table-valence-electrons", "30"],
      // common practice: SF4 is AX4E1, seesaw
      ["table-molecular-geometry", "tetrahedral"],
      ["octet-exceeded", "CH5"],
    ]);
  });

  it("prints an empty array for a clean file", () => {
    expect(checkJson("tests/fixtures/cli/clean-notes.txt")).toEqual({ status: 0, findings: [] });
  });

  it("searches a folder outside git by walking it, skipping dot-folders", () => {
    const folder = fixtureCopy();
    const hidden = join(folder, ".drafts");
    mkdirSync(hidden);
    writeFileSync(join(hidden, "draft.md"), "The cylinder said CH5.\n");
    const run = runCli(["check", "--format", "json", "."], folder);
    const files = new Set((JSON.parse(run.stdout) as JsonFinding[]).map((finding) => finding.file));
    expect([...files].sort()).toEqual(["bay-d-cylinders.csv", "bay-d-ions.yaml", "run-22-bay-d-audit.md"]);
  });
});
