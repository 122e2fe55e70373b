// The command line as a user meets it: `node dist/cli.js`, exit codes, JSON shape, text cards.
// `npm test` builds dist/ first; running this file alone builds it only when it is missing.
import { spawnSync, execFileSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { beforeAll, describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));
const cliPath = fileURLToPath(new URL("../dist/cli.js", import.meta.url));

interface CliRun {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

function runCli(...args: string[]): CliRun {
  const { status, stdout, stderr } = spawnSync(process.execPath, [cliPath, ...args], {
    cwd: root,
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
  });
  return { status, stdout, stderr };
}

/** One centre of an `analyze --json` entry, as far as these tests read it. */
interface CentreJson {
  index: number;
  atom: string;
  axe: string;
  molecularGeometry: string;
  hybridization: string;
}

/** One entry of `analyze --json`; the tests check the rest of its shape with matchers. */
interface AnalyzeJsonEntry {
  input: string;
  ok: boolean;
  formula?: string;
  centers: CentreJson[];
  warnings: unknown;
  error: { code: string; message: string };
}

function analyzeJson(...species: string[]): { run: CliRun; json: AnalyzeJsonEntry[] } {
  const run = runCli("analyze", "--json", ...species);
  return { run, json: JSON.parse(run.stdout) };
}

beforeAll(() => {
  if (!existsSync(cliPath)) execFileSync(process.execPath, ["esbuild.config.mjs"], { cwd: root });
});

describe("lonepair analyze --json", () => {
  it("gives SF4 the fixed shape, fields in order", () => {
    const { run, json } = analyzeJson("SF4");
    expect(run.status).toBe(0);
    expect(json).toHaveLength(1);
    const [sf4] = json;
    expect(Object.keys(sf4).slice(0, 10)).toEqual([
      "input",
      "ok",
      "formula",
      "charge",
      "name",
      "valenceElectrons",
      "radical",
      "centers",
      "polar",
      "warnings",
    ]);
    expect(sf4).toMatchObject({
      input: "SF4",
      ok: true,
      formula: "SF4",
      charge: 0,
      name: "sulfur tetrafluoride",
      valenceElectrons: 34, // common practice: 6 (S, group 16) + 4 x 7 (F, group 17)
      radical: false,
      polar: true, // from memory: CRC Handbook of Chemistry and Physics, dipole moment of SF4 0.63 D
    });
    expect(Array.isArray(sf4.warnings)).toBe(true);
    expect(sf4.centers).toHaveLength(1);
    const [sulfur] = sf4.centers;
    expect(Object.keys(sulfur).slice(0, 10)).toEqual([
      "index",
      "atom",
      "axe",
      "stericNumber",
      "bondingDomains",
      "lonePairs",
      "electronGeometry",
      "molecularGeometry",
      "idealAngles",
      "hybridization",
    ]);
    // from memory: Housecroft & Sharpe, Inorganic Chemistry, VSEPR shapes table (SF4: AX4E, seesaw, sp3d)
    expect(sulfur).toMatchObject({
      index: 0,
      atom: "S",
      axe: "AX4E1",
      stericNumber: 5,
      bondingDomains: 4,
      lonePairs: 1,
      electronGeometry: "trigonal bipyramidal",
      molecularGeometry: "seesaw",
      idealAngles: [90, 120, 180],
      hybridization: "sp3d",
    });
  });

  // common practice: the standard VSEPR assignments taught for these species
  it.each([
    { species: "XeF4", formula: "XeF4", charge: 0, electrons: 36, axe: "AX4E2", shape: "square planar", hybrid: "sp3d2", polar: false },
    { species: "NH4+", formula: "NH4+", charge: 1, electrons: 8, axe: "AX4", shape: "tetrahedral", hybrid: "sp3", polar: false },
    { species: "H2O", formula: "H2O", charge: 0, electrons: 8, axe: "AX2E2", shape: "bent", hybrid: "sp3", polar: true },
    { species: "ClF3", formula: "ClF3", charge: 0, electrons: 28, axe: "AX3E2", shape: "T-shaped", hybrid: "sp3d", polar: true },
    { species: "BF3", formula: "BF3", charge: 0, electrons: 24, axe: "AX3", shape: "trigonal planar", hybrid: "sp2", polar: false },
  ])("$species: $axe $shape", ({ species, charge, electrons, axe, shape, hybrid, polar }) => {
    const { run, json } = analyzeJson(species);
    expect(run.status).toBe(0);
    const [entry] = json;
    expect(entry).toMatchObject({ input: species, ok: true, charge, valenceElectrons: electrons, polar });
    expect(entry.centers[0]).toMatchObject({ axe, molecularGeometry: shape, hybridization: hybrid });
  });

  it("reports an impossible CH5 as an error object and exits 1", () => {
    const { run, json } = analyzeJson("CH5");
    expect(run.status).toBe(1);
    // common practice: carbon cannot carry five two-electron bonds (octet rule)
    expect(json).toEqual([
      { input: "CH5", ok: false, error: expect.objectContaining({ code: "octet-exceeded", message: expect.any(String) }) },
    ]);
    expect(json[0].error.message.length).toBeGreaterThan(0);
  });

  it("keeps one entry per argument, in order, and exits 1 when any species fails", () => {
    const { run, json } = analyzeJson("SF4", "CH5", "sulfur tetrafluoride");
    expect(run.status).toBe(1);
    expect(json.map((entry) => [entry.input, entry.ok])).toEqual([
      ["SF4", true],
      ["CH5", false],
      ["sulfur tetrafluoride", true],
    ]);
    expect(json[2].formula).toBe("SF4");
  });
});

describe("lonepair analyze --smiles", () => {
  it("reads benzene as SMILES: six sp2 trigonal planar carbons, hydrogens are not centres", () => {
    const run = runCli("analyze", "--smiles", "--json", "c1ccccc1");
    expect(run.status).toBe(0);
    const [benzene] = JSON.parse(run.stdout) as AnalyzeJsonEntry[];
    // source: RDKit (WebAssembly build): c1ccccc1 is C6H6 with all six carbons SP2
    expect(benzene).toMatchObject({ input: "c1ccccc1", ok: true, charge: 0 });
    expect(benzene.formula).toMatch(/^C6H6$/);
    // common practice: each aromatic carbon has three sigma neighbours and no lone pair (AX3)
    expect(
      benzene.centers.map((centre: CentreJson) => [centre.index, centre.atom, centre.axe, centre.molecularGeometry, centre.hybridization]),
    ).toEqual([0, 1, 2, 3, 4, 5].map((index) => [index, "C", "AX3", "trigonal planar", "sp2"]));
  });

  it("prints a text card for each SMILES and fails on one it cannot read", () => {
    const run = runCli("analyze", "--smiles", "CC(=O)O", "C1CC");
    expect(run.status).toBe(1);
    // common practice: acetic acid has an sp3 methyl carbon and an sp2 carboxyl carbon
    expect(run.stdout).toContain("C2H4O2");
    expect(run.stdout).toContain("tetrahedral");
    expect(run.stdout).toContain("trigonal planar");
    expect(run.stdout).toContain("not analysed");
    expect(run.stdout).toContain("2 species: 1 analysed, 1 not analysed");
  });

  it("without --smiles the same text is read as a formula, not as SMILES", () => {
    // common practice: "CO" as a formula is carbon monoxide; as SMILES it is methanol, CH3OH
    const asFormula = (JSON.parse(runCli("analyze", "--json", "CO").stdout) as AnalyzeJsonEntry[])[0];
    const asSmiles = (JSON.parse(runCli("analyze", "--json", "--smiles", "CO").stdout) as AnalyzeJsonEntry[])[0];
    expect(asFormula.formula).toBe("CO");
    expect(asSmiles.formula).toBe("CH4O");
    expect(asSmiles.centers.map((centre: CentreJson) => [centre.atom, centre.molecularGeometry])).toEqual([
      ["C", "tetrahedral"],
      ["O", "bent"],
    ]);
  });
});

describe("lonepair analyze (text)", () => {
  it("prints a card with the shape, the caution and no colour codes when piped", () => {
    const run = runCli("analyze", "SF4");
    expect(run.status).toBe(0);
    expect(run.stdout).toContain("sulfur tetrafluoride");
    expect(run.stdout).toContain("AX4E1");
    expect(run.stdout).toContain("seesaw");
    expect(run.stdout).toContain("sp3d");
    expect(run.stdout).toContain("not measured data");
    expect(run.stdout).not.toContain("\u001b[");
  });

  it.each([
    // from memory: any general chemistry text (sulfate: S +6, O -2; sulfur tetrafluoride: S +4)
    ["SO4^2-", "S +6; O -2"],
    ["SF4", "S +4; F -1"],
  ])("gives %s its oxidation states, as the hover card words them", (species, states) => {
    const run = runCli("analyze", species);
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(new RegExp(`\\n  Oxidation states +${states.replace(/\+/g, "\\+")}\\n`));
  });

  it("prints the problem for a species it cannot analyse", () => {
    const run = runCli("analyze", "CH5");
    expect(run.status).toBe(1);
    expect(run.stdout).toContain("CH5");
    expect(run.stdout).toContain("octet-exceeded");
  });
});

describe("usage", () => {
  it.each([
    { case: "no arguments", args: [] as string[] },
    { case: "analyze without species", args: ["analyze"] },
    { case: "analyze --json without species", args: ["analyze", "--json"] },
    { case: "analyze --smiles without species", args: ["analyze", "--smiles"] },
    { case: "unknown command", args: ["shapes", "SF4"] },
    { case: "unknown option", args: ["analyze", "--fast", "SF4"] },
    { case: "unknown top-level option", args: ["--fast"] },
  ])("$case: exit 2 with usage on stderr", ({ args }) => {
    const run = runCli(...args);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("Usage: lonepair");
    expect(run.stdout).toBe("");
  });

  it("--help lists the commands on stdout and exits 0", () => {
    const run = runCli("--help");
    expect(run.status).toBe(0);
    expect(run.stdout).toContain("Usage: lonepair");
    expect(run.stdout).toContain("analyze");
    expect(run.stderr).toBe("");
  });

  it("analyze --help explains the command and exits 0", () => {
    const run = runCli("analyze", "--help");
    expect(run.status).toBe(0);
    expect(run.stdout).toContain("lonepair analyze [--json] [--smiles] <species...>");
    expect(run.stdout).toContain("--smiles");
  });

  it("--version prints the package version", () => {
    const manifest = JSON.parse(readFileSync(`${root}/package.json`, "utf8")) as { version: string };
    const run = runCli("--version");
    expect(run.status).toBe(0);
    expect(run.stdout.trim()).toBe(manifest.version);
  });
});
