/**
 * A summary table lonepair writes is a correct table: checked again, it raises no warning or
 * error, in any format; a per-centre cell changed to a wrong shape is still caught.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, analyzeSpecies, checkDocument, summaryEntryOf, summaryTable } from "../../shared/src/index";
import type { SummaryEntry } from "../../shared/src/index";

// common practice: species with several centres (benzene, glycerol, hydrogen peroxide, acetic acid,
// ethanol, urea) beside single-centre ones, a salt and a hydrate
const SPECIES = ["C6H6", "glycerol", "H2O2", "CH3COOH", "CH3CH2OH", "urea", "SF4", "ClF3", "NH4NO3", "CuSO4·5H2O"];

function tableOf(format: "markdown" | "csv"): string {
  const entries = SPECIES.map((input) => summaryEntryOf(analyzeSpecies(input))).filter(
    (entry): entry is SummaryEntry => entry !== undefined,
  );
  expect(entries).toHaveLength(SPECIES.length);
  return summaryTable({ analyses: entries, format, angleDecimals: 1 });
}

function warningsAndErrors(text: string, kind: "markdown" | "csv"): string[] {
  return checkDocument(analyzeDocument(text, kind))
    .filter((finding) => finding.severity === "warning" || finding.severity === "error")
    .map((finding) => `${finding.code}: ${finding.message}`);
}

describe("a summary table checks clean", () => {
  it.each(["markdown", "csv"] as const)("as %s", (format) => {
    expect(warningsAndErrors(tableOf(format), format)).toEqual([]);
  });

  it("a wrong shape for one kind of centre is a warning, without a guessed fix", () => {
    const table = tableOf("markdown");
    // common practice: the O atoms of glycerol are bent (AX2E2), not linear
    const wrong = table.replace("O: bent; C: tetrahedral", "O: linear; C: tetrahedral");
    expect(wrong).not.toBe(table);
    const findings = checkDocument(analyzeDocument(wrong, "markdown")).filter((finding) => finding.code === "table-molecular-geometry");
    expect(findings).toHaveLength(1);
    expect(findings[0].message).toContain("O centres are bent");
    expect(findings[0].fix).toBeUndefined();
  });
});
