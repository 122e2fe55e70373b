// `lonepair check --fix` and `--fix --dry-run` on copies of the bay D fixtures: only the offending
// ranges change; byte-order mark, CRLF, trailing spaces and YAML comments stay byte for byte.
import { execFileSync } from "node:child_process";
import { cpSync, mkdtempSync, readdirSync, readFileSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, fixtureCopy, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

function bytesOf(folder: string): Record<string, Buffer> {
  return Object.fromEntries(
    readdirSync(folder)
      .sort()
      .map((name) => [name, readFileSync(join(folder, name))]),
  );
}

/** `before` with each [old, new] replaced once, at the place `old` first appears after `after`. */
function replacedOnce(before: Buffer, edits: readonly (readonly [string, string, string])[]): Buffer {
  let text = before.toString("latin1");
  for (const [after, oldText, newText] of edits) {
    const anchor = text.indexOf(after);
    const at = text.indexOf(oldText, anchor);
    expect(anchor).toBeGreaterThanOrEqual(0);
    text = text.slice(0, at) + newText + text.slice(at + oldText.length);
  }
  return Buffer.from(text, "latin1");
}

describe("check --fix", () => {
  it("rewrites only the offending values and reports what remains", () => {
    const folder = fixtureCopy();
    const before = bytesOf(folder);
    const run = runCli(["check", "--fix", "."], folder);
    const after = bytesOf(folder);

    // The CSV keeps its byte-order mark, CRLF line ends, trailing spaces and quoted note.
    // common practice: NF3 has 26 valence electrons; CO2 is linear
    expect(after["bay-d-cylinders.csv"]).toEqual(
      replacedOnce(before["bay-d-cylinders.csv"], [
        ["KR-D-102,NF3,", "24", "26"],
        ["KR-D-104,CO2,16,0,", "bent", "linear"],
      ]),
    );
    expect(after["bay-d-cylinders.csv"].subarray(0, 3)).toEqual(Buffer.from([0xef, 0xbb, 0xbf]));
    // The YAML keeps both comments, the one after the fixed value included.
    // common practice: nitrate is trigonal planar; sulfate has 32 valence electrons
    expect(after["bay-d-ions.yaml"]).toEqual(
      replacedOnce(before["bay-d-ions.yaml"], [
        ["formula: NO3-", "trigonal pyramidal", "trigonal planar"],
        ["formula: SO4^2-", "30", "32"],
      ]),
    );
    expect(after["bay-d-ions.yaml"].toString("utf8")).toContain("molecular geometry: trigonal planar   # typed from memory, check\n");
    // common practice: SF4 is seesaw
    expect(after["run-22-bay-d-audit.md"]).toEqual(
      replacedOnce(before["run-22-bay-d-audit.md"], [["| SF4     | 34                | ", "tetrahedral", "seesaw"]]),
    );
    // A file with nothing to fix is not rewritten.
    expect(after["clean-notes.txt"]).toEqual(before["clean-notes.txt"]);
    expect(readdirSync(folder).sort()).toEqual(Object.keys(before));

    // CH5 has no fix, so it remains, now with the error's exit status.
    expect(run.status).toBe(1);
    expect(run.stdout).toContain("run-22-bay-d-audit.md:10:37: error: CH5:");
    expect(run.stdout).toContain("Fixed 5 findings in 3 files.");
    expect(run.stdout).toContain("1 error in 1 of 4 files checked.");
    // Checking again finds only what no fix could settle.
    const again = runCli(["check", "--format", "json", "."], folder);
    expect(JSON.parse(again.stdout).map((finding: { code: string }) => finding.code)).toEqual(["octet-exceeded"]);
  });

  it("leaves files without a fix untouched, modification time included", () => {
    const folder = fixtureCopy();
    const before = statSync(join(folder, "clean-notes.txt")).mtimeMs;
    runCli(["check", "--fix", "clean-notes.txt"], folder);
    expect(statSync(join(folder, "clean-notes.txt")).mtimeMs).toBe(before);
  });
});

describe("check --fix --dry-run", () => {
  it("prints a unified diff, changes nothing, and the diff applies to give what --fix writes", () => {
    const folder = fixtureCopy();
    const before = bytesOf(folder);
    const run = runCli(["check", "--fix", "--dry-run", "."], folder);
    expect(bytesOf(folder)).toEqual(before);
    expect(run.stdout).toContain("--- a/bay-d-ions.yaml\n+++ b/bay-d-ions.yaml\n");
    expect(run.stdout).toContain("-    molecular geometry: trigonal pyramidal   # typed from memory, check\n");
    expect(run.stdout).toContain("+    molecular geometry: trigonal planar   # typed from memory, check\n");
    expect(run.stderr).toContain("Would fix 5 findings in 3 files.");

    // source: git apply, an independent reader of unified diffs
    const patched = mkdtempSync(join(tmpdir(), "lonepair-patch-"));
    cpSync(folder, patched, { recursive: true });
    execFileSync("git", ["apply", "-p1", "--whitespace=nowarn", "-"], { cwd: patched, input: run.stdout });
    runCli(["check", "--fix", "."], folder);
    expect(bytesOf(patched)).toEqual(bytesOf(folder));
  });
});
