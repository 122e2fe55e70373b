// `lonepair coords` as a user meets it: `node dist/cli.js`, output formats, files, exit codes.
// `npm test` builds dist/ first; running this file alone builds it only when it is missing.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const require = createRequire(import.meta.url);
const OCL = require("openchemlib");
const root = fileURLToPath(new URL("../..", import.meta.url));
const cliPath = join(root, "dist", "cli.js");
const scratch = mkdtempSync(join(tmpdir(), "lonepair-coords-"));

function runCli(...args: string[]) {
  const { status, stdout, stderr } = spawnSync(process.execPath, [cliPath, ...args], {
    cwd: root,
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
  });
  return { status, stdout, stderr };
}

beforeAll(() => {
  if (!existsSync(cliPath)) execFileSync(process.execPath, ["esbuild.config.mjs"], { cwd: root });
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe("lonepair coords", () => {
  it("prints XYZ by default: atom count, a comment with the model caution, one line per atom", () => {
    const run = runCli("coords", "SF4");
    expect(run.status).toBe(0);
    const lines = run.stdout.trimEnd().split("\n");
    expect(lines[0]).toBe("5"); // common practice: SF4 has five atoms
    expect(lines[1]).toMatch(/^SF4 .*not measured data/);
    expect(
      lines
        .slice(2)
        .map((line) => line.trim().split(/\s+/)[0])
        .sort(),
    ).toEqual(["F", "F", "F", "F", "S"]);
  });

  it("prints an MDL molfile that OpenChemLib reads with its charges", () => {
    const run = runCli("coords", "--format", "mol", "NH4+");
    expect(run.status).toBe(0);
    const molecule = OCL.Molecule.fromMolfile(run.stdout);
    // source: OpenChemLib
    expect(molecule.getAllAtoms()).toBe(5);
    const charges = Array.from({ length: 5 }, (_, i) => molecule.getAtomCharge(i));
    expect(charges.reduce((a: number, b: number) => a + b, 0)).toBe(1);
    expect(run.stdout).toContain("M  END");
  });

  it.each([
    ["xyz", "H2O", "3"],
    ["mol", "XeF4", "  5  4  0  0  0  0  0  0  0  0999 V2000"],
  ])("writes --format %s for %s to a file", (format, species, expectedLine) => {
    const file = join(scratch, `out.${format}`);
    const run = runCli("coords", species, "--format", format, "--output", file);
    expect(run.status).toBe(0);
    expect(run.stdout).toContain(file);
    expect(readFileSync(file, "utf8").split("\n")).toContain(expectedLine);
  });

  it.each([
    ["an unknown species", ["coords", "Xq4"], 1],
    ["an impossible species", ["coords", "CH5"], 1],
    ["no species", ["coords"], 2],
    ["two species", ["coords", "SF4", "H2O"], 2],
    ["an unknown format", ["coords", "--format", "pdb", "SF4"], 2],
    ["an unknown option", ["coords", "--colour", "SF4"], 2],
    ["an unwritable file", ["coords", "SF4", "--output", join(scratch, "missing", "dir", "x.xyz")], 2],
  ])("exits with the right status for %s", (_what, args, status) => {
    const run = runCli(...(args as string[]));
    expect(run.status).toBe(status);
    expect(run.stdout).toBe("");
    expect(run.stderr).toMatch(/^lonepair coords: /);
  });

  it("shows help and is listed in the top-level help", () => {
    const help = runCli("coords", "--help");
    expect(help.status).toBe(0);
    expect(help.stdout).toContain("--format xyz|mol");
    expect(runCli("--help").stdout).toMatch(/^\s+coords\s/m);
  });
});
