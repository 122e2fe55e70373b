/**
 * Handbook tables list a salt's cation and anion beside it ("Cation", "Anion" columns): each is a
 * species found where it is written, while the row stays about the salt, so no other cell of the
 * row is checked against an ion.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument } from "../../shared/src/index";

// from memory: solubility-product tables (CRC Handbook style) with ASCII charges, Ca++ and SO4--
const CSV = [
  "Compound,Formula,Cation,Anion,Ksp",
  "Barium sulfate,BaSO4,Ba++,SO4--,1.1E-10",
  "Iron(III) hydroxide,Fe(OH)3,Fe+++,OH-,2.8E-39",
  "Silver chloride,AgCl,Ag+,Cl-,1.8E-10",
  "Mixed salt,KAl(SO4)2,see text,SO4-2,n/a",
].join("\n");

describe("cation and anion columns", () => {
  const model = analyzeDocument(CSV, "csv");
  const spans = model.occurrences.map((occurrence) => CSV.slice(occurrence.range.start, occurrence.range.end));

  it("finds each ion where it is written", () => {
    for (const ion of ["Ba++", "SO4--", "Fe+++", "OH-", "Ag+", "Cl-", "SO4-2"]) expect(spans).toContain(ion);
    // from memory: Fe+++ is iron(III), SO4-- sulfate
    const readings = new Map(model.occurrences.map((occurrence) => [occurrence.text, occurrence.reading]));
    expect(readings.get("Fe+++")?.charge).toBe(3);
    expect(readings.get("SO4--")?.formula).toBe("SO4^2-");
  });

  it("keeps each row about its compound", () => {
    expect(model.records.map((record) => record.species.text)).toEqual(["BaSO4", "Fe(OH)3", "AgCl", "KAl(SO4)2"]);
    for (const record of model.records) expect(record.otherNames?.map((name) => name.text) ?? []).not.toContain("Cl-");
  });

  it("gives no finding for an ion column, a note in it included", () => {
    expect(checkDocument(model).filter((finding) => finding.severity === "error" || finding.severity === "warning")).toEqual([]);
    expect(model.unreadable ?? []).toEqual([]);
  });

  it("still checks the compound's own cells", () => {
    // from memory: sulfur dioxide is bent, so "linear" in its shape column is wrong
    const text = "Formula,Cation,Molecular geometry\nSO2,Na+,linear\n";
    const findings = checkDocument(analyzeDocument(text, "csv"));
    expect(findings.map((finding) => text.slice(finding.range.start, finding.range.end))).toEqual(["linear"]);
  });
});
