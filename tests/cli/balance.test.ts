/**
 * `lonepair balance` and equations in `lonepair check` as a user meets them: `node dist/cli.js`,
 * exit codes and the JSON shape.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";

const cliPath = fileURLToPath(new URL("../../dist/cli.js", import.meta.url));

function runCli(...args: string[]): { status: number | null; stdout: string; stderr: string } {
  const { status, stdout, stderr } = spawnSync(process.execPath, [cliPath, ...args], {
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
  });
  return { status, stdout, stderr };
}

const scratch = mkdtempSync(join(tmpdir(), "lonepair-balance-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe("lonepair balance", () => {
  it("prints each equation balanced, exit 0", () => {
    const run = runCli("balance", "Al + O2 -> Al2O3", "\\ce{C3H8 + O2 -> CO2 + H2O}");
    expect(run.status).toBe(0);
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 7; Zumdahl, Chemistry, ch. 3
    expect(run.stdout).toBe("4 Al + 3 O2 -> 2 Al2O3\n\\ce{C3H8 + 5 O2 -> 3 CO2 + 4 H2O}\n");
  });

  it("--json gives one object per argument with the fixed fields", () => {
    const run = runCli("balance", "--json", "Al + O2 -> Al2O3", "2 H2 + O2 -> 2 H2O", "S + O2 -> CO2", "H2 + O2 -> H2O + H2O2");
    expect(run.status).toBe(1);
    const answers = JSON.parse(run.stdout) as unknown[];
    expect(answers).toEqual([
      // from memory: Tro, ch. 7
      { input: "Al + O2 -> Al2O3", ok: true, equation: "4 Al + 3 O2 -> 2 Al2O3", coefficients: [4, 3, 2], wasBalanced: false },
      // from memory: Zumdahl, ch. 3
      { input: "2 H2 + O2 -> 2 H2O", ok: true, equation: "2 H2 + O2 -> 2 H2O", coefficients: [2, 1, 2], wasBalanced: true },
      // common practice: sulfur cannot become carbon
      {
        input: "S + O2 -> CO2",
        ok: false,
        error: { code: "equation-cannot-balance", message: expect.stringContaining("S appears only on the left") },
      },
      // common practice: two reactions written as one
      { input: "H2 + O2 -> H2O + H2O2", ok: false, error: { code: "equation-balance-not-unique", message: expect.any(String) } },
    ]);
  });

  it("counts electrons of a half-reaction in written order", () => {
    const run = runCli("balance", "--json", "MnO4- + H+ + e- -> Mn^2+ + H2O");
    // from memory: Atkins, Physical Chemistry, table of standard potentials
    expect(JSON.parse(run.stdout)[0].coefficients).toEqual([1, 8, 5, 1, 4]);
  });

  it("usage error without an equation", () => {
    expect(runCli("balance").status).toBe(2);
  });
});

describe("lonepair check on equations", () => {
  const notebook = [
    "# Run 32: scrubber chemistry",
    "",
    "Lime bed: CaCO3 + SO2 + O2 → CaSO4 + CO2",
    "",
    "Blank check (Bay C): \\ce{2 H2 + O2 -> 2 H2O}",
    "",
    "The old notes say `x -> y` and pH 6 -> 8; the ratio is 1 = 2 in prose.",
    "",
  ].join("\n");

  it("reports the unbalanced equation with its code, and --fix rewrites its coefficients", () => {
    const path = join(scratch, "run-32.md");
    writeFileSync(path, notebook);
    const checked = runCli("check", "--format", "json", path);
    expect(checked.status).toBe(1);
    const codes = (JSON.parse(checked.stdout) as { code: string; line: number }[])
      .filter((finding) => finding.code.startsWith("equation-"))
      .map((finding) => [finding.code, finding.line]);
    expect(codes).toEqual([["equation-unbalanced", 3]]);
    const fixed = runCli("check", "--fix", path);
    expect(fixed.status).toBe(0);
    // from memory: flue-gas desulfurisation, Greenwood & Earnshaw, sulfur chapter
    expect(readFileSync(path, "utf8")).toBe(notebook.replace("CaCO3 + SO2 + O2 → CaSO4 + CO2", "2 CaCO3 + 2 SO2 + O2 → 2 CaSO4 + 2 CO2"));
  });
});
