// Where the writer meets the vibrational analysis: `lonepair analyze` (text and --json) and the
// hover card. `npm test` builds dist/ first; running this file alone builds it when it is missing.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, hoverMarkdown } from "../../shared/src/index";

const root = fileURLToPath(new URL("../..", import.meta.url));
const cliPath = fileURLToPath(new URL("../../dist/cli.js", import.meta.url));

function runCli(...args: string[]): { status: number | null; stdout: string } {
  const { status, stdout } = spawnSync(process.execPath, [cliPath, ...args], {
    cwd: root,
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
  });
  return { status, stdout };
}

beforeAll(() => {
  if (!existsSync(cliPath)) execFileSync(process.execPath, ["esbuild.config.mjs"], { cwd: root });
});

interface VibrationsJson {
  pointGroup: string;
  modes: number;
  representation: { symmetry: string; count: number; ir: boolean; raman: boolean }[];
  irBands: number;
  ramanBands: number;
  silent: number;
  stretching: { symmetry: string; count: number; ir: boolean; raman: boolean }[];
}

function analyzeJson(...species: string[]): { vibrations: VibrationsJson | null; vibrationsNote?: string }[] {
  const { stdout } = runCli("analyze", "--json", ...species);
  return JSON.parse(stdout);
}

describe("analyze --json: the vibrations object", () => {
  it("has the fixed fields first, in order", () => {
    const [sf6] = analyzeJson("SF6");
    expect(Object.keys(sf6.vibrations!).slice(0, 7)).toEqual([
      "pointGroup",
      "modes",
      "representation",
      "irBands",
      "ramanBands",
      "silent",
      "stretching",
    ]);
    for (const entry of [...sf6.vibrations!.representation, ...sf6.vibrations!.stretching]) {
      expect(Object.keys(entry)).toEqual(["symmetry", "count", "ir", "raman"]);
    }
  });

  // from memory: Nakamoto, "Infrared and Raman Spectra of Inorganic and Coordination Compounds":
  // octahedral XY6 is A1g + Eg + 2T1u + T2g + T2u, 2 IR and 3 Raman fundamentals, T2u silent
  it("SF6: 15 modes, 2 IR bands, 3 Raman bands, 1 silent", () => {
    const [sf6] = analyzeJson("SF6");
    const vibrations = sf6.vibrations!;
    expect(vibrations.pointGroup).toBe("Oh");
    expect([vibrations.modes, vibrations.irBands, vibrations.ramanBands, vibrations.silent]).toEqual([15, 2, 3, 1]);
    const t1u = vibrations.representation.find((entry) => entry.symmetry === "T1u");
    expect(t1u).toEqual({ symmetry: "T1u", count: 2, ir: true, raman: false });
    const t2u = vibrations.representation.find((entry) => entry.symmetry === "T2u");
    expect(t2u).toEqual({ symmetry: "T2u", count: 1, ir: false, raman: false });
  });

  // from memory: Herzberg, "Infrared and Raman Spectra of Polyatomic Molecules": CO2's
  // antisymmetric stretch is the Σu+ fundamental at 2349 cm⁻¹
  it("CO2: the measured fundamentals follow the fixed fields, with their source", () => {
    const [co2] = analyzeJson("CO2");
    const extra = co2.vibrations as unknown as { measured: { fundamentals: { symmetry: string; wavenumber: number }[]; source: string } };
    expect(Object.keys(co2.vibrations!).indexOf("measured")).toBeGreaterThan(6);
    expect(extra.measured.fundamentals).toContainEqual({ mode: "ν3", symmetry: "Σu+", wavenumber: 2349 });
    expect(extra.measured.source).toMatch(/Shimanouchi/);
  });

  // from memory: descriptive inorganic chemistry texts: S8 is a D4d crown, which the model does not reach
  it("S8: vibrations null, with the reason naming the real group", () => {
    const [s8] = analyzeJson("S8");
    expect(s8.vibrations).toBeNull();
    expect(s8.vibrationsNote).toContain("D4d");
  });
});

describe("analyze: the text card", () => {
  // from memory: Herzberg, "Infrared and Raman Spectra of Polyatomic Molecules": CO2 has Σg+ + Σu+ + Πu
  it("CO2 prints its modes, its bands and the mutual exclusion rule", () => {
    const { status, stdout } = runCli("analyze", "CO2");
    expect(status).toBe(0);
    expect(stdout).toMatch(/Vibrations\s+4 modes: Σg\+ \+ Σu\+ \+ Πu/);
    expect(stdout).toContain("IR: 2 bands (Σu+, Πu); Raman: 1 band (Σg+)");
    expect(stdout).toContain("mutual exclusion");
    expect(stdout).toMatch(/Stretching modes\s+Σg\+ \+ Σu\+/);
  });
});

describe("analyze: the point group of a model less symmetric than the molecule", () => {
  // from memory: descriptive inorganic chemistry texts: P4O10 is a Td cage
  it("P4O10's card says the real molecule is Td", () => {
    const { stdout } = runCli("analyze", "P4O10");
    expect(stdout).toMatch(/Point group\s+C3v \(of the model coordinates; the real molecule is Td\)/);
    expect(stdout).toMatch(/Vibrations\s+not predicted/);
  });
});

describe("the hover card's Vibrations section", () => {
  // from memory: Cotton, "Chemical Applications of Group Theory": H2O 2A1 + B2 (molecule in yz), all active
  it("water: modes, bands and stretching", () => {
    const water = analyzeSpecies("H2O");
    if (!water.ok) throw new Error(water.problem.message);
    const card = hoverMarkdown(water.value, { angleDecimals: 1 });
    expect(card).toContain("**Vibrations** · 3 modes: 2A1 + B2");
    expect(card).toContain("IR: 3 bands (A1, B2); Raman: 3 bands (A1, B2); none silent");
    expect(card).toContain("Stretching: A1 + B2");
    // common practice: the caution stays last
    expect(card.trimEnd().endsWith("_")).toBe(true);
  });

  it("P4O10 says why there are no band counts", () => {
    const cage = analyzeSpecies("P4O10");
    if (!cage.ok) throw new Error(cage.problem.message);
    expect(hoverMarkdown(cage.value, { angleDecimals: 1, format: "plaintext" })).toContain("Vibrations: not predicted");
  });
});
