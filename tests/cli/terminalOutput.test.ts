// What `check` prints is safe on a terminal and easy on a pipe: control sequences planted in a
// cell or a file name come out as visible escapes, every finding stays on one line, and a
// reader that stops early (`| head -1`) does not change the check's exit status.
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { cliPath, ensureBuilt, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const ESC = "\u001b";
const CSI_C1 = "\u009b";

/** The three controls a finding quotes back from the formula cells of `plantedFolder`, one per row. */
const QUOTED_CONTROLS = [ESC, CSI_C1, "\u0007"];

/**
 * A folder with one table under `fileName` whose formula cells hold control sequences (a title
 * change, the C1 form of CSI, a bell): the finding on each quotes the character it stops at.
 */
function plantedFolder(fileName: string): string {
  const folder = mkdtempSync(join(tmpdir(), "lonepair-terminal-"));
  // common practice: NF3 has 26 valence electrons and is trigonal pyramidal (AX3E1)
  const rows = [`NF3${ESC}]0;owned`, `NF3${CSI_C1}31m`, `NF3${"\u0007"}`].map(
    (cell, index) => `KR-H-50${index + 1},${cell},26,trigonal pyramidal`,
  );
  writeFileSync(join(folder, fileName), `cylinder,formula,valence electrons,molecular geometry\n${rows.join("\n")}\n`);
  return folder;
}

/** Characters a terminal acts on, other than the line feeds that end lines. */
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROL = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f]/;

describe("check output on a terminal", () => {
  it.each([
    ["a plain name", "cylinders.csv"],
    ["a name with a line feed and ESC", `bay\nH${ESC}[1m.csv`],
    ["a name with a carriage return and a C1 control", `bay\rH${CSI_C1}2J.csv`],
  ])("text: escapes cells and file names (%s), one finding per line", (_case, fileName) => {
    const run = runCli(["check", "."], plantedFolder(fileName));
    expect(run.stdout).not.toMatch(CONTROL);
    const findings = run.stdout.split("\n").filter((line) => / (error|warning|note): /.test(line));
    // One finding per planted cell, one line each, each naming the file and its row.
    expect(findings).toHaveLength(3);
    const shownName = fileName.replace("\n", "\\n").replace("\r", "\\r").replace(ESC, "\\x1b").replace(CSI_C1, "\\x9b");
    findings.forEach((line, index) => expect(line.startsWith(`${shownName}:${index + 2}:`)).toBe(true));
    for (const shown of ["\\x1b", "\\x9b", "\\x07"]) expect(run.stdout).toContain(`"${shown}"`);
  });

  it.each([["json"], ["sarif"]])("%s: no raw control character, and each planted character comes back exactly when parsed", (format) => {
    const fileName = `bay\nH${ESC}[1m.csv`;
    const run = runCli(["check", "--format", format, "."], plantedFolder(fileName));
    expect(run.stdout).not.toMatch(CONTROL);
    const parsed = JSON.parse(run.stdout);
    const messages: string[] =
      format === "json"
        ? parsed.map((finding: { message: string }) => finding.message)
        : parsed.runs[0].results.map((result: { message: { text: string } }) => result.message.text);
    // Each planted character comes back as itself once the output is parsed.
    for (const control of QUOTED_CONTROLS) expect(messages.some((message) => message.includes(`"${control}"`))).toBe(true);
    const files: string[] = format === "json" ? parsed.map((finding: { file: string }) => finding.file) : [];
    for (const file of files) expect(file).toBe(fileName);
  });

  it("list escapes the same way", () => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-terminal-"));
    writeFileSync(join(folder, `notes${ESC}[2J.md`), "The etch line runs on NF3.\n");
    const run = runCli(["list", "."], folder);
    expect(run.stdout).not.toMatch(CONTROL);
    expect(run.stdout).toContain("notes\\x1b[2J.md:1:");
  });
});

describe("check into a pipe that closes early", () => {
  /** Runs `lonepair <args> | head -c 1` in `cwd` and returns lonepair's own status. */
  function statusBeforeHead(args: readonly string[], cwd: string): number {
    const quoted = args.map((arg) => `'${arg}'`).join(" ");
    const script = `"${process.execPath}" "${cliPath}" ${quoted} | head -c 1 > /dev/null; echo "\${PIPESTATUS[0]}"`;
    const run = spawnSync("bash", ["-c", script], { cwd, encoding: "utf8", env: { ...process.env, NO_COLOR: "1" } });
    return Number(run.stdout.trim());
  }

  // common practice: carbon holds at most four electron pairs, so CH5 is an error
  function manyErrors(): string {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-pipe-"));
    writeFileSync(join(folder, "run-23.md"), `${"CH5 ".repeat(40)}\n`.repeat(500));
    writeFileSync(join(folder, "clean.md"), "Sulfur hexafluoride (SF6) is octahedral.\n");
    return folder;
  }

  it.each([["text"], ["json"], ["sarif"]])("keeps the check's status 1 for errors (--format %s)", (format) => {
    expect(statusBeforeHead(["check", "--format", format, "run-23.md"], manyErrors())).toBe(1);
  });

  it("keeps status 0 for a clean file", () => {
    expect(statusBeforeHead(["check", "clean.md"], manyErrors())).toBe(0);
  });
});
