// Tables that state how many IR bands, Raman bands, IR-active modes or vibrational modes a
// species has: checked against the symmetry prediction, with fixes; and the summary table's
// optional band columns.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  analyzeSpecies,
  checkDocument,
  summaryTable,
  type DocumentKind,
  type SpeciesAnalysis,
} from "../../shared/src/index";

const TABLES = join(__dirname, "..", "fixtures", "tables");

/** Each finding as [code, the text it covers, the fix's replacement text or "-"]. */
function findings(text: string, kind: DocumentKind): [string, string, string][] {
  return checkDocument(analyzeDocument(text, kind)).map((finding) => [
    finding.code,
    text.slice(finding.range.start, finding.range.end),
    finding.fix?.newText ?? "-",
  ]);
}

/** Applies every offered fix, last first so earlier offsets stay right. */
function withFixes(text: string, kind: DocumentKind): string {
  const fixes = checkDocument(analyzeDocument(text, kind))
    .flatMap((finding) => (finding.fix ? [finding.fix] : []))
    .sort((a, b) => b.range.start - a.range.start);
  let fixed = text;
  for (const fix of fixes) fixed = fixed.slice(0, fix.range.start) + fix.newText + fixed.slice(fix.range.end);
  return fixed;
}

describe("band and mode counts in a CSV survey", () => {
  const survey = readFileSync(join(TABLES, "ir-band-survey.csv"), "utf8");

  it("finds each wrong count, and nothing in the right ones, the wavenumber column or S8", () => {
    expect(findings(survey, "csv")).toEqual([
      // from memory: Herzberg, "Infrared and Raman Spectra of Polyatomic Molecules": CO2's only
      // Raman fundamental is the symmetric stretch (Σg+)
      ["table-raman-bands", "2", "1"],
      // from memory: Cotton, "Chemical Applications of Group Theory": CH4 A1 + E + 2T2, only the T2 pair IR-active
      ["table-ir-bands", "4", "2"],
      // from memory: Wilson, Decius & Cross, "Molecular Vibrations": benzene has 3N − 6 = 30 modes
      // (20 distinct fundamentals)
      ["table-vibrational-modes", "20", "30"],
    ]);
  });

  // common practice: a fix must leave nothing to fix and touch nothing else
  it("applying the fixes leaves a survey with no findings", () => {
    const fixed = withFixes(survey, "csv");
    expect(findings(fixed, "csv")).toEqual([]);
    expect(fixed.split("\n").length).toBe(survey.split("\n").length);
  });
});

describe("headers people write for these columns", () => {
  // from memory: Nakamoto, "Infrared and Raman Spectra of Inorganic and Coordination Compounds":
  // SF6 has 15 modes, 2 IR-active (T1u) and 3 Raman-active fundamentals
  it.each([
    ["IR bands", "3", "table-ir-bands", "2"],
    ["No. of IR bands", "3", "table-ir-bands", "2"],
    ["Expected IR bands", "1 band", "table-ir-bands", "2 bands"],
    ["Normal modes", "1 mode", "table-vibrational-modes", "15 modes"],
    ["Raman bands", "2", "table-raman-bands", "3"],
    ["Raman-active fundamentals", "5", "table-raman-bands", "3"],
    ["IR-active modes", "4", "table-ir-active-modes", "2"],
    ["Number of vibrational modes", "12", "table-vibrational-modes", "15"],
    ["3N-6", "14", "table-vibrational-modes", "15"],
    ["Normal modes", "18", "table-vibrational-modes", "15"],
  ])("%s: SF6 %s is wrong (%s → %s)", (header, cell, code, fixed) => {
    const table = `| Formula | ${header} |\n| --- | --- |\n| SF6 | ${cell} |\n`;
    expect(findings(table, "markdown")).toEqual([[code, cell, fixed]]);
  });

  // from memory: as above; SF6's IR-active T1u pair, 2 bands or 6 modes counted one by one
  it.each([
    ["IR-active modes", "2"],
    ["IR-active modes", "6"],
    ["IR bands", "2 bands"],
    ["Raman bands", "3"],
    ["Vibrational modes", "15 modes"],
    // common practice: a column of band positions holds wavenumbers, not counts
    ["IR bands (cm-1)", "3"],
    ["IR bands / cm⁻¹", "948"],
    ["Raman band positions", "2"],
    // common practice: a number too large to count the modes of the species is something else
    ["IR bands", "948"],
    ["IR bands", "strong"],
  ])("%s: SF6 %s is no error", (header, cell) => {
    const table = `| Formula | ${header} |\n| --- | --- |\n| SF6 | ${cell} |\n`;
    expect(findings(table, "markdown")).toEqual([]);
  });

  // from memory: descriptive inorganic chemistry texts: S8 is a D4d crown the model does not reach,
  // so no count is checked against it
  it("S8: nothing is checked, since the model's symmetry is too low", () => {
    const table = "| Formula | IR bands | Raman bands |\n| --- | --- | --- |\n| S8 | 1 | 1 |\n";
    expect(findings(table, "markdown")).toEqual([]);
  });
});

describe("the summary table's optional band columns", () => {
  const analysed = (...species: string[]): SpeciesAnalysis[] =>
    species.map((text) => {
      const result = analyzeSpecies(text);
      if (!result.ok) throw new Error(`${text}: ${result.problem.message}`);
      return result.value;
    });

  // from memory: Herzberg (CO2: 2 IR, 1 Raman; H2O: 3 and 3) and Nakamoto (SF6: 2 IR, 3 Raman)
  it("shows IR and Raman band counts when asked, and leaves S8's cells empty", () => {
    const table = summaryTable({
      analyses: analysed("SF6", "CO2", "H2O", "S8"),
      columns: ["formula", "irBands", "ramanBands"],
      format: "csv",
      angleDecimals: 1,
    });
    expect(table.split("\r\n").slice(0, 5)).toEqual(["Formula,IR bands,Raman bands", "SF6,2,3", "CO2,2,1", "H2O,3,3", "S8,,"]);
  });

  // common practice: the default table is unchanged; band columns come only on request
  it("the default columns do not include them", () => {
    const table = summaryTable({ analyses: analysed("SF6"), format: "csv", angleDecimals: 1 });
    expect(table).not.toContain("IR bands");
  });

  // common practice: a generated table pasted into a document raises no problem of its own
  it("a markdown table with the band columns checks clean", () => {
    const table = summaryTable({
      analyses: analysed("SF6", "CO2", "NH3", "H2O", "XeF4"),
      columns: ["formula", "molecularGeometry", "irBands", "ramanBands"],
      format: "markdown",
      angleDecimals: 1,
    });
    expect(findings(table, "markdown")).toEqual([]);
  });
});
