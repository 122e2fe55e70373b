// A teaching lab's reagent shelf (tests/fixtures/reagent-shelf, Kestrel Ridge Analytical): every row
// is a correct everyday reagent, so `check` must give it no error and no warning, and `analyze`
// must read the d-block salts as their ions.
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, runCli } from "./cliRunner";

const SHELF = "tests/fixtures/reagent-shelf/teaching-shelf.csv";

interface JsonFinding {
  readonly line: number;
  readonly severity: string;
  readonly code: string;
  readonly message: string;
}

let findings: readonly JsonFinding[] = [];

beforeAll(() => {
  ensureBuilt();
  const run = runCli(["check", "--format", "json", SHELF]);
  expect(run.status, run.stderr).toBe(0);
  findings = JSON.parse(run.stdout) as JsonFinding[];
});

describe("check on the reagent shelf", () => {
  it("gives no false error or warning on any row", () => {
    expect(findings.filter((finding) => finding.severity !== "note" && finding.severity !== "information")).toEqual([]);
  });

  it("refuses no d-block salt as a transition-metal compound", () => {
    expect(findings.filter((finding) => finding.code === "transition-metal-centre").map((finding) => finding.message)).toEqual([]);
  });

  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (ions of these oxides and salts)
  it.each([
    ["CrO2", "Cr^4+ and O^2- (×2)"],
    ["V2O5", "V^5+ (×2) and O^2- (×5)"],
    ["CuCl", "Cu^+ and Cl^-"],
    ["MnS2", "Mn^2+ and S2^2-"],
    ["VOSO4", "VO^2+ and SO4^2-"],
    ["[Cu(NH3)4]SO4", "Cu(NH3)4^2+ and SO4^2-"],
  ])("the %s row is read as %s", (formula, ions) => {
    const finding = findings.find((candidate) => candidate.message.startsWith(`${formula} is an ionic compound of ${ions} ions`));
    expect(finding, `${formula}: ${findings.map((f) => f.message.slice(0, 40)).join(" | ")}`).toBeDefined();
  });
});

describe("analyze --json on everyday compounds", () => {
  // from memory: Greenwood & Earnshaw (Stock names of the d-block oxides and halides)
  it.each([
    ["CrO2", "chromium(IV) oxide", ["Cr^4+", "O^2-"]],
    ["VO2", "vanadium(IV) oxide", ["V^4+", "O^2-"]],
    ["V2O5", "vanadium(V) oxide", ["V^5+", "O^2-"]],
    ["CuCl", "copper(I) chloride", ["Cu^+", "Cl^-"]],
    ["MnS2", "manganese(II) disulfide", ["Mn^2+", "S2^2-"]],
  ])("%s is %s", (formula, name, ions) => {
    const run = runCli(["analyze", "--json", formula]);
    expect(run.status).toBe(0);
    const [record] = JSON.parse(run.stdout) as { name: string; error: { code: string }; parts: { formula: string }[] }[];
    expect(record.name).toBe(name);
    expect(record.error.code).toBe("ionic-solid");
    expect(record.parts.map((part) => part.formula)).toEqual(ions);
  });

  it("a radical dot is no malformed hydrate", () => {
    // common practice: chlorine atoms and nitric oxide written as radicals in mechanisms
    const run = runCli(["analyze", "--json", "NO•", "Cl•"]);
    expect(run.stdout).not.toContain("malformed-formula");
    const records = JSON.parse(run.stdout) as { formula: string }[];
    expect(records.map((record) => record.formula)).toEqual(["NO", "Cl"]);
  });
});
