// A document lonepair cannot read is never passed over in silence: a CI run must not go green
// without having checked it. Each case exits 2 and names the file on stderr, while the files
// that can be read are still checked.
import { execFileSync } from "node:child_process";
import { chmodSync, chownSync, mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, runCli, runCliAs, type CliRun } from "./cliRunner";

beforeAll(ensureBuilt);

// common practice: NF3 has 5 + 3 x 7 = 26 valence electrons
const READABLE_TABLE = "cylinder,formula,valence electrons\nKR-G-401,NF3,24\n";
const runningAsRoot = process.getuid?.() === 0;
const NOBODY = 65534;

function scratchFolder(): string {
  const folder = mkdtempSync(join(tmpdir(), "lonepair-unreadable-"));
  chmodSync(folder, 0o755);
  writeFileSync(join(folder, "cylinders.csv"), READABLE_TABLE);
  return folder;
}

/** The check fails with status 2, names `shown` with `why`, and still checked the readable file. */
function expectReported(run: CliRun, shown: string, why: string): void {
  expect(run.status, run.stderr).toBe(2);
  expect(run.stderr).toContain(`lonepair check: ${shown}: ${why}`);
  expect(run.stdout).toContain("cylinders.csv:2:");
  expect(run.stdout).toMatch(/could not be read or fixed: see the messages above\.$/m);
}

describe("check reports what it cannot read", () => {
  it.each([
    ["a folder walked", false],
    ["a git work tree", true],
  ])("a file name that is not valid UTF-8, in %s", (_where, inGit) => {
    const folder = scratchFolder();
    if (inGit) execFileSync("git", ["init", "-q"], { cwd: folder });
    // "run-\xff.md": 0xFF never occurs in UTF-8.
    writeFileSync(Buffer.from(`${folder}/run-\xff.md`, "latin1"), "SF4 is a seesaw.\n");
    expectReported(runCli(["check", "."], folder), "run-\\xff.md", "the file name is not valid UTF-8; not checked");
  });

  it("a folder name that is not valid UTF-8", () => {
    const folder = scratchFolder();
    mkdirSync(Buffer.from(`${folder}/bay-\xfe`, "latin1"));
    writeFileSync(Buffer.from(`${folder}/bay-\xfe/notes.md`, "latin1"), "CH5\n");
    expectReported(runCli(["check", "."], folder), "bay-\\xfe", "folder not searched: the folder name is not valid UTF-8");
  });

  it("a path longer than the system allows (4,096 bytes)", () => {
    const folder = scratchFolder();
    // Made one step at a time, as no single path to it may be that long.
    const segment = "d".repeat(200);
    const makeDeepFile = `const fs = require("node:fs"); for (let i = 0; i < 22; i++) { fs.mkdirSync("${segment}"); process.chdir("${segment}"); } fs.writeFileSync("deep.md", "CH5\\n");`;
    execFileSync(process.execPath, ["-e", makeDeepFile], { cwd: folder });
    const run = runCli(["check", "."], folder);
    expect(run.status, run.stderr).toBe(2);
    expect(run.stderr).toContain("the path is longer than the system allows");
    expect(run.stdout).toContain("cylinders.csv:2:");
  });

  it.runIf(runningAsRoot)("a file and a folder the user may not read", () => {
    const folder = scratchFolder();
    writeFileSync(join(folder, "locked.md"), "CH5\n");
    chmodSync(join(folder, "locked.md"), 0o000);
    mkdirSync(join(folder, "private"));
    writeFileSync(join(folder, "private", "notes.md"), "CH5\n");
    chmodSync(join(folder, "private"), 0o700);
    chownSync(join(folder, "cylinders.csv"), NOBODY, NOBODY);

    const run = runCliAs(NOBODY, NOBODY, ["check", "."], folder);

    expectReported(run, "locked.md", "permission denied");
    expect(run.stderr).toContain("lonepair check: private: folder not searched: permission denied");
  });

  it.runIf(runningAsRoot)("a file named on the command line that the user may not read", () => {
    const folder = scratchFolder();
    writeFileSync(join(folder, "locked.md"), "CH5\n");
    chmodSync(join(folder, "locked.md"), 0o000);
    const run = runCliAs(NOBODY, NOBODY, ["check", "locked.md", "cylinders.csv"], folder);
    expectReported(run, "locked.md", "permission denied");
  });

  it("never says 'No findings in 0 files checked' with status 0", () => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-unreadable-"));
    writeFileSync(Buffer.from(`${folder}/\xff.csv`, "latin1"), READABLE_TABLE);
    const run = runCli(["check", "."], folder);
    expect(run.status).toBe(2);
    expect(run.stdout).toBe("No findings in 0 files checked. 1 file or folder could not be read or fixed: see the messages above.\n");
  });

  it.each([
    ["run-14.md", Buffer.from("Run 14\nSF6 and NF3\u0000 on the line\n"), "it holds NUL bytes, so it looks like a binary file; skipped"],
    [
      "cylinders.ods",
      Buffer.from("cylinder list"),
      "not a markdown, text, LaTeX, AsciiDoc, reStructuredText, CSV/TSV, JSON or YAML file; skipped",
    ],
  ])("a file named on the command line and passed over says why (%s)", (name, bytes, why) => {
    const folder = scratchFolder();
    writeFileSync(join(folder, name), bytes);
    const run = runCli(["check", name, "cylinders.csv"], folder);
    expect(run.stderr).toBe(`lonepair check: ${name}: ${why}\n`);
    expect(run.stdout).toContain("cylinders.csv:2:");
  });

  it("files that are not documents (a binary, an image) are still passed over quietly", () => {
    const folder = scratchFolder();
    writeFileSync(join(folder, "spectrum.png"), Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0]));
    chmodSync(join(folder, "spectrum.png"), 0o000);
    const run = runCli(["check", "."], folder);
    expect(run.stderr).toBe("");
    expect(run.status).toBe(0);
  });
});
