/**
 * The pure text builders behind the hover card and the summary table, fed by the core's own
 * analyses. CSV output is read back with csv-parse, an independent RFC 4180 reader.
 */
import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { analyzeSpecies, type SpeciesAnalysis } from "../../shared/src/index";
import { HOVER_CAUTION, hoverMarkdown } from "../../shared/src/report/hoverMarkdown";
import { summaryTable } from "../../shared/src/report/summaryTable";
import { analyzeDocument, checkDocument, createSummaryCollector, type DocumentModel } from "../../shared/src/index";

function analysis(text: string): SpeciesAnalysis {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text}: ${result.problem.message}`);
  return result.value;
}

describe("hover card", () => {
  it.each([
    // common practice: VSEPR classes and shapes of these textbook species
    ["SF4", ["AX4E1", "trigonal bipyramidal", "seesaw", "sp3d", "polar"]],
    ["XeF4", ["AX4E2", "octahedral", "square planar", "sp3d2", "nonpolar"]],
    ["NH3", ["AX3E1", "tetrahedral", "trigonal pyramidal", "sp3"]],
    ["BF3", ["AX3", "trigonal planar", "sp2", "nonpolar"]],
  ])("%s names its class, shapes, hybridization and polarity", (formula, fragments) => {
    const card = hoverMarkdown(analysis(formula), { angleDecimals: 1 });
    for (const fragment of fragments) expect(card).toContain(fragment);
    expect(card).toContain(HOVER_CAUTION);
  });

  it.each([
    // from memory: S 6 + 4 F x 7 = 34 valence electrons, one lone pair on S
    ["SF4", "34 valence electrons", "(1 on S)"],
    // from memory: Xe 8 + 4 F x 7 = 36 valence electrons, two lone pairs on Xe
    ["XeF4", "36 valence electrons", "(2 on Xe)"],
    // from memory: H-B≡O has four bonding pairs and one lone pair, on O
    ["HBO", "4 bonding pairs · 1 lone pair (0 on B)", "(0 on B)"],
    // from memory: H-F has one bonding pair and three lone pairs on F
    ["HF", "1 bonding pair · 3 lone pairs", "3 lone pairs"],
  ])("%s counts electrons and the centre's lone pairs", (formula, electrons, lonePairs) => {
    const card = hoverMarkdown(analysis(formula), { angleDecimals: 1 });
    expect(card).toContain(electrons);
    expect(card).toContain(lonePairs);
  });

  it("shows ozone's resonance and formal charges // common practice: O3 has two resonance forms, O+ and O-", () => {
    const card = hoverMarkdown(analysis("O3"), { angleDecimals: 1 });
    expect(card).toContain("2 resonance forms");
    expect(card).toMatch(/formal charges .*O \+1/);
    expect(card).toMatch(/O −1/);
  });

  it.each([
    [0, "Ideal angles: 90°, 120°, 180°"],
    [2, "Ideal angles: 90.00°, 120.00°, 180.00°"],
  ])("writes angles with %i decimals // common practice: trigonal bipyramid angles 90, 120, 180 degrees", (decimals, expected) => {
    const card = hoverMarkdown(analysis("SF4"), { angleDecimals: decimals });
    expect(card).toContain(expected);
  });

  it("lists each kind of centre of a multi-centre species // common practice: both N of hydrazine are trigonal pyramidal", () => {
    const card = hoverMarkdown(analysis("N2H4"), { angleDecimals: 1 });
    expect(card).toContain("Centre N (×2)");
    expect(card).toContain("trigonal pyramidal");
  });
});

describe("summary table", () => {
  const species = ["SF4", "XeF4", "SF4", "NH3"].map(analysis);

  it("writes CSV that an RFC 4180 reader takes back, one row per species in first-seen order", () => {
    const text = summaryTable({ analyses: species, format: "csv", angleDecimals: 1 });
    const rows = parse(text) as string[][];
    expect(rows[0]).toEqual([
      "Formula",
      "Name",
      "Valence electrons",
      "AXE",
      "Electron geometry",
      "Molecular geometry",
      "Ideal angles",
      "Hybridization",
      "Polarity",
    ]);
    expect(rows.slice(1).map((row) => row[0])).toEqual(["SF4", "XeF4", "NH3"]);
    // common practice: SF4 ideal angles 90, 120 and 180 degrees (a field with commas, so quoted)
    expect(rows[1][6]).toBe("90.0°, 120.0°, 180.0°");
    // common practice: NH3 AX3E1 trigonal pyramidal, polar
    expect(rows[3].slice(3, 6)).toEqual(["AX3E1", "tetrahedral", "trigonal pyramidal"]);
    expect(rows[3][8]).toBe("polar");
  });

  it("keeps only the asked columns, in the asked order", () => {
    const text = summaryTable({ analyses: species, format: "csv", angleDecimals: 1, columns: ["molecularGeometry", "formula"] });
    // common practice: XeF4 square planar
    expect(parse(text)).toEqual([
      ["Molecular geometry", "Formula"],
      ["seesaw", "SF4"],
      ["square planar", "XeF4"],
      ["trigonal pyramidal", "NH3"],
    ]);
  });

  it("writes a markdown table with the caution and the species it could not analyse", () => {
    const text = summaryTable({
      analyses: species,
      unanalysed: [{ text: "CH5", message: "carbon cannot make five bonds" }],
      format: "markdown",
      angleDecimals: 1,
      columns: ["formula", "axe"],
    });
    const rows = text.split("\n").filter((line) => line.startsWith("|"));
    expect(rows).toEqual(["| Formula | AXE |", "| --- | --- |", "| SF4 | AX4E1 |", "| XeF4 | AX4E2 |", "| NH3 | AX3E1 |"]);
    expect(text).toContain("<!-- lonepair could not analyse: CH5 (carbon cannot make five bonds) -->");
    expect(text).toContain(HOVER_CAUTION);
  });

  it("inserted under a write-up, adds no problem the write-up did not already have", () => {
    const note = "# Run 22: Bay D audit\n\nThe log lists CH5 and NH5 beside SF4 and XeF4; barium sulfate was weighed.\n";
    const collected = createSummaryCollector();
    const before = analyzeDocument(note, "markdown");
    for (const occurrence of before.occurrences) collected.addOccurrence(occurrence);
    expect(collected.unanalysed.map((item) => item.text)).toEqual(expect.arrayContaining(["CH5", "NH5"]));
    const table = summaryTable({ analyses: collected.analyses, unanalysed: collected.unanalysed, format: "markdown", angleDecimals: 1 });
    const after = analyzeDocument(`${note}\n${table}`, "markdown");
    // Errors and warnings, each with its message: the list of species not analysed must repeat none.
    const problems = (model: DocumentModel) =>
      [...model.problems, ...checkDocument(model)]
        .filter((finding) => finding.severity === "error" || finding.severity === "warning")
        .map((finding) => `${finding.severity} ${finding.code} ${finding.message}`)
        .sort();
    expect(problems(after)).toEqual(problems(before));
  });

  it("writes a comment that the species list cannot close early", () => {
    const text = summaryTable({
      analyses: species,
      unanalysed: [{ text: "X-->Y", message: "a --> b" }],
      format: "markdown",
      angleDecimals: 1,
    });
    const comment = text.split("\n").find((line) => line.startsWith("<!--"))!;
    expect(comment.indexOf("-->")).toBe(comment.length - 3);
  });
});
