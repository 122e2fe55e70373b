/**
 * `lonepair balance --acidic` / `--basic` as a user meets them: `node dist/cli.js`, the printed
 * equations, the JSON fields and the exit codes; and `check --fix`, which never picks a medium
 * for the writer.
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

const scratch = mkdtempSync(join(tmpdir(), "lonepair-solution-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe("lonepair balance --acidic / --basic", () => {
  it.each<[string, "--acidic" | "--basic", string]>([
    // from memory: Zumdahl, Chemistry, ch. 18 (permanganate half-reaction)
    ["\\ce{MnO4- -> Mn^2+}", "--acidic", "\\ce{MnO4- + 8 H+ + 5 e- -> Mn^2+ + 4 H2O}"],
    // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 20
    ["Cr2O7^2- -> Cr^3+", "--acidic", "Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr^3+ + 7 H2O"],
    // from memory: Zumdahl, ch. 18 (permanganate oxidises iron(II))
    ["\\ce{MnO4- + Fe^2+ -> Mn^2+ + Fe^3+}", "--acidic", "\\ce{MnO4- + 5 Fe^2+ + 8 H+ -> Mn^2+ + 5 Fe^3+ + 4 H2O}"],
    // from memory: Zumdahl, ch. 18 (permanganate and iodide in base)
    ["MnO4- + I- -> MnO2 + I2", "--basic", "2 MnO4- + 6 I- + 4 H2O -> 2 MnO2 + 3 I2 + 8 OH-"],
    // from memory: Brown, LeMay & Bursten, ch. 20 (cyanide and permanganate in base)
    ["CN- + MnO4- -> CNO- + MnO2", "--basic", "3 CN- + 2 MnO4- + H2O -> 3 CNO- + 2 MnO2 + 2 OH-"],
    // from memory: Petrucci, General Chemistry, ch. 5 (chromium(III) hydroxide to chromate)
    ["Cr(OH)3 -> CrO4^2-", "--basic", "Cr(OH)3 + 5 OH- -> CrO4^2- + 4 H2O + 3 e-"],
  ])("%s %s", (input, option, expected) => {
    const run = runCli("balance", option, input);
    expect(run.status).toBe(0);
    expect(run.stdout).toBe(`${expected}    (completed in ${option.slice(2)} solution)\n`);
  });

  it("--json keeps the fixed fields and adds completedIn", () => {
    const run = runCli("balance", "--json", "--basic", "MnO4- + I- -> MnO2 + I2", "Al + O2 -> Al2O3", "Al^3+ -> Al(OH)3");
    expect(run.status).toBe(1);
    expect(JSON.parse(run.stdout)).toEqual([
      // from memory: Zumdahl, ch. 18; coefficients in the order of the completed equation
      {
        input: "MnO4- + I- -> MnO2 + I2",
        ok: true,
        equation: "2 MnO4- + 6 I- + 4 H2O -> 2 MnO2 + 3 I2 + 8 OH-",
        coefficients: [2, 6, 4, 2, 3, 8],
        wasBalanced: false,
        completedIn: "basic",
      },
      // from memory: Tro, Chemistry: A Molecular Approach, ch. 7; nothing is added
      { input: "Al + O2 -> Al2O3", ok: true, equation: "4 Al + 3 O2 -> 2 Al2O3", coefficients: [4, 3, 2], wasBalanced: false },
      // common practice: no oxidation state changes, so nothing is completed
      {
        input: "Al^3+ -> Al(OH)3",
        ok: false,
        error: { code: "equation-cannot-balance", message: expect.stringContaining("only for a redox equation or half-reaction") },
      },
    ]);
  });

  it("both media at once is a usage error", () => {
    const run = runCli("balance", "--acidic", "--basic", "MnO4- -> Mn^2+");
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("--acidic or --basic");
  });
});

describe("lonepair check on a skeleton half-reaction", () => {
  it("reports the completed equations in the message, and --fix leaves the text alone", () => {
    const notebook = "# Run 47: chromate waste (Bay C)\n\nReduced with bisulfite: \\ce{Cr2O7^2- -> Cr^3+}\n";
    const path = join(scratch, "run-47.md");
    writeFileSync(path, notebook);
    const checked = runCli("check", "--format", "json", path);
    const findings = (JSON.parse(checked.stdout) as { code: string; message: string }[]).filter((finding) =>
      finding.code.startsWith("equation-"),
    );
    expect(findings.map((finding) => finding.code)).toEqual(["equation-cannot-balance"]);
    // from memory: Brown, LeMay & Bursten, ch. 20
    expect(findings[0].message).toContain("Completed in acidic solution: Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr^3+ + 7 H2O");
    runCli("check", "--fix", path);
    // The medium is the writer's choice: --fix does not make it.
    expect(readFileSync(path, "utf8")).toBe(notebook);
  });
});
