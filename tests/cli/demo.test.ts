// The newcomer's first five minutes: a fresh clone, then the README's first command
// (`npm run demo`), must show the check report with the example workspace's deliberate mistakes
// and then a summary table, and end with status 0.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { repositoryRoot } from "./cliRunner";

const readme = readFileSync(join(repositoryRoot, "README.md"), "utf8");

describe("README's first command in a fresh clone", () => {
  it("is `npm run demo`, and it shows the deliberate mistakes and a table", () => {
    const firstCommand = /```sh\n([^\n]*)/.exec(readme)?.[1] ?? "";
    expect(firstCommand).toMatch(/^npm ci && npm run demo\b/);

    const clone = join(mkdtempSync(join(tmpdir(), "lonepair-clone-")), "lonepair");
    execFileSync("git", ["clone", "--quiet", repositoryRoot, clone]);
    // `npm ci` needs the registry; the installed packages are linked instead (same lock file).
    if (!existsSync(join(clone, "node_modules"))) symlinkSync(join(repositoryRoot, "node_modules"), join(clone, "node_modules"), "dir");
    const npm = process.platform === "win32" ? "npm.cmd" : "npm";
    const run = spawnSync(npm, ["run", "--silent", "demo"], { cwd: clone, encoding: "utf8", env: { ...process.env, NO_COLOR: "1" } });

    expect(run.status).toBe(0);
    const out = run.stdout;
    // The example workspace's deliberate mistakes, as the README lists them.
    // common practice: NF3 has 26 valence electrons, NH3 is trigonal pyramidal, CH5 exceeds carbon's octet
    expect(out).toContain("examples/inventory/cylinders.csv:4:34: warning: Valence electrons for NF3 are 26, the table says 24.");
    expect(out).toMatch(
      /examples\/inventory\/cylinders\.csv:13:25: warning: Molecular geometry of NH3 is trigonal pyramidal .*the table says trigonal planar/,
    );
    expect(out).toMatch(/examples\/inventory\/cylinders\.csv:15:17: error: CH5: .*\[octet-exceeded\]/);
    // common practice: BrF5 has 42, XeF4 36 valence electrons; nitrite is bent
    expect(out).toContain("Valence electrons for BrF5 are 42, the table says 40.");
    expect(out).toContain("Valence electrons for XeF4 are 36, the table says 34.");
    expect(out).toContain("Molecular geometry of NO2- is bent (VSEPR model prediction), the table says linear.");
    expect(out).toContain("3 errors, 6 warnings and 3 notes in 5 of 6 files checked.");
    // Then the summary table of a write-up. common practice: NF3 AX3E1, SF6 AX6
    expect(out).toMatch(/\| NF3 \| nitrogen trifluoride \| 26 \| AX3E1 \| tetrahedral \| trigonal pyramidal \|/);
    expect(out).toMatch(/\| SF6 \| sulfur hexafluoride \| 48 \| AX6 \| octahedral \| octahedral \|/);
  }, 180_000);
});
