// `lonepair list` and `lonepair table` through the built command line.
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { parse as parseCsv } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

interface ListedSpecies {
  file: string;
  line: number;
  column: number;
  length: number;
  text: string;
  formula: string;
  charge: number;
}

describe("list --json", () => {
  it("lists every species in document order with the exact span as written", () => {
    const run = runCli(["list", "--json", "tests/fixtures/cli/bay-d-ions.yaml", "tests/fixtures/cli/bay-d-cylinders.csv"]);
    expect(run.status).toBe(0);
    const listed: ListedSpecies[] = JSON.parse(run.stdout);
    for (const species of listed) expect(Object.keys(species)).toEqual(["file", "line", "column", "length", "text", "formula", "charge"]);
    // The span read back from the file by line, column and length is the text listed.
    for (const species of listed) {
      const lines = readFileSync(join(repositoryRoot, species.file), "utf8")
        .replace(/^\ufeff/, "")
        .split(/\r\n|\r|\n/);
      expect(lines[species.line - 1].slice(species.column - 1, species.column - 1 + species.length)).toBe(species.text);
    }
    expect(listed.filter((species) => species.file.endsWith(".yaml")).map((species) => [species.text, species.charge])).toEqual([
      // common practice: ammonium +1, nitrate -1, sulfate -2
      ["ammonium", 1],
      ["NH4+", 1],
      ["nitrate", -1],
      ["NO3-", -1],
      ["sulfate", -2],
      ["SO4^2-", -2],
    ]);
    expect(listed.filter((species) => species.file.endsWith(".csv")).map((species) => species.formula)).toEqual([
      "SF6",
      "NF3",
      "H2O",
      "CO2",
    ]);
    expect(listed.find((species) => species.text === "NF3")).toMatchObject({ line: 3, column: 10, length: 3 });
  });

  it("prints an empty array when no species is mentioned, and exits 2 for a missing file", () => {
    expect(runCli(["list", "--json", "package-lock.json"]).stdout).toBe("[]\n");
    expect(runCli(["list", "tests/fixtures/cli/none.md"]).status).toBe(2);
  });
});

describe("table", () => {
  it("reads a smiles: span as SMILES, as the editor's table does", () => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-table-"));
    const note = join(folder, "run-16.md");
    writeFileSync(note, "# Run 16\n\nSolvent blank: `smiles:CC(=O)C` and SF6.\n");
    const run = runCli(["table", "--format", "csv", note]);
    expect(run.status).toBe(0);
    // source: RDKit reads CC(=O)C as acetone, C3H6O
    expect((parseCsv(run.stdout, { columns: true }) as Record<string, string>[]).map((row) => row.Formula)).toEqual(["C3H6O", "SF6"]);
    expect(run.stderr).not.toMatch(/not analysed/);
  });

  it("prints the geometry summary table of a write-up, each species once, with the caution", () => {
    const run = runCli(["table", "tests/fixtures/cli/run-22-bay-d-audit.md"]);
    expect(run.status).toBe(0);
    const lines = run.stdout.split("\n");
    expect(lines[0]).toBe(
      "| Formula | Name | Valence electrons | AXE | Electron geometry | Molecular geometry | Ideal angles | Hybridization | Polarity |",
    );
    // common practice: SF4 AX4E1 seesaw, 34 electrons; ClF3 AX3E2 T-shaped, 28 electrons
    expect(lines[2]).toMatch(/^\| SF4 \| sulfur tetrafluoride \| 34 \| AX4E1 \| trigonal bipyramidal \| seesaw \|/);
    expect(lines[3]).toMatch(/^\| ClF3 \| chlorine trifluoride \| 28 \| AX3E2 \| trigonal bipyramidal \| T-shaped \|/);
    expect(run.stdout).toMatch(/<!-- lonepair could not analyse: .*CH5 \(/);
    expect(run.stdout).toMatch(/_Model prediction, not measured data/);
  });

  it("mixes species arguments and files, and writes CSV that a CSV reader reads back", () => {
    const run = runCli(["table", "--format", "csv", "NH3", "tests/fixtures/cli/bay-d-cylinders.csv", "NH3"]);
    expect(run.status).toBe(0);
    // source: csv-parse, an independent CSV reader
    const rows: string[][] = parseCsv(run.stdout);
    expect(rows.map((row) => row[0])).toEqual(["Formula", "NH3", "SF6", "NF3", "H2O", "CO2"]);
    // common practice: NH3 trigonal pyramidal, CO2 linear
    expect(rows[1][5]).toBe("trigonal pyramidal");
    expect(rows[5][5]).toBe("linear");
    expect(run.stderr).toMatch(/Model prediction, not measured data/);
  });

  it("says two-atom species are linear, and checking the table it wrote finds nothing", () => {
    const run = runCli(["table", "--format", "csv", "N2", "HCl", "NO+"]);
    expect(run.status).toBe(0);
    // source: csv-parse, an independent CSV reader
    const rows: string[][] = parseCsv(run.stdout);
    // common practice: two atoms always lie on a line
    expect(rows.slice(1).map((row) => row[5])).toEqual(["linear (two atoms)", "linear (two atoms)", "linear (two atoms)"]);
    const folder = mkdtempSync(join(tmpdir(), "lonepair-two-atoms-"));
    const file = join(folder, "two-atoms.csv");
    writeFileSync(file, run.stdout);
    const check = runCli(["check", file]);
    expect(check.stdout).toContain("No findings");
    expect(check.status).toBe(0);
  });

  it.each([
    [["CH5"], 1, "nothing could be analysed"],
    [["--format", "html", "SF4"], 2, "unknown format"],
    [[], 2, "no argument"],
  ] as [string[], number, string][])("table %j exits %i (%s)", (args, status) => {
    expect(runCli(["table", ...args]).status).toBe(status);
  });
});
