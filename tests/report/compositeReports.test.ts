/**
 * Salts and hydrates in every report: the card, the hover, the JSON and the summary table list
 * the ions or parts with their shapes, and keep the caution.
 */
import { describe, expect, it } from "vitest";
import {
  HOVER_CAUTION,
  MODEL_CAUTION,
  analyzeSpecies,
  formatAnalysisCard,
  resultMarkdown,
  summaryEntryOf,
  summaryTable,
  toAnalysisJson,
} from "../../shared/src/index";
import type { SummaryEntry } from "../../shared/src/index";

// from memory: Housecroft & Sharpe, Inorganic Chemistry (ammonium tetrahedral, nitrate trigonal
// planar, sulfate tetrahedral, water bent)
const CASES: readonly (readonly [input: string, kind: string, partShapes: readonly string[]])[] = [
  ["NH4NO3", "ionic compound", ["NH4^+", "tetrahedral", "NO3^-", "trigonal planar"]],
  ["(NH4)2SO4", "ionic compound", ["NH4^+", "tetrahedral", "SO4^2-", "tetrahedral"]],
  ["CuSO4·5H2O", "hydrate", ["H2O", "bent", "SO4^2-", "tetrahedral", "Cu^2+", "monatomic ion"]],
];

describe("the card lists the parts with their shapes", () => {
  it.each(CASES)("%s", (input, kind, words) => {
    const card = formatAnalysisCard(input, analyzeSpecies(input));
    expect(card).toContain(kind);
    for (const word of words) expect(card).toContain(word);
    expect(card).not.toContain("not analysed");
    // common practice (house rule): every result keeps the caution
    expect(card.replace(/\s+/g, " ")).toContain(MODEL_CAUTION);
  });
});

describe("the hover lists the parts with their shapes", () => {
  it.each(CASES)("%s", (input, kind, words) => {
    const markdown = resultMarkdown(input, analyzeSpecies(input), { angleDecimals: 1 });
    expect(markdown).toContain(kind);
    for (const word of words) expect(markdown).toContain(word);
    expect(markdown).toContain(HOVER_CAUTION);
    expect(markdown.length).toBeLessThan(100_000);
  });
});

describe("the JSON report carries the parts", () => {
  it("(NH4)2SO4 lists two ammonium ions and one sulfate with their own analyses", () => {
    const json = toAnalysisJson("(NH4)2SO4", analyzeSpecies("(NH4)2SO4"));
    expect(json.ok).toBe(false);
    if (json.ok) return;
    // the fixed fields stay first, unchanged
    expect(Object.keys(json).slice(0, 3)).toEqual(["input", "ok", "error"]);
    expect(json.error.code).toBe("ionic-solid");
    expect(json.parts?.map((part) => [part.role, part.count, part.formula, part.shape])).toEqual([
      ["cation", 2, "NH4^+", "tetrahedral"],
      ["anion", 1, "SO4^2-", "tetrahedral"],
    ]);
    const sulfate = json.parts?.[1].analysis;
    expect(sulfate?.ok && sulfate.centers[0].axe).toBe("AX4");
    // from memory: the name of (NH4)2SO4 (IUPAC additive name of the salt)
    expect(json.name).toBe("ammonium sulfate");
  });

  it("a monatomic ion has no analysis of its own", () => {
    const json = toAnalysisJson("NaCl", analyzeSpecies("NaCl"));
    if (json.ok) throw new Error("NaCl should be an ionic compound");
    expect(json.parts?.every((part) => part.monatomic && part.analysis === undefined)).toBe(true);
  });
});

describe("the summary table gives a salt one row that lists its ions", () => {
  const entries = ["NH4NO3", "CuSO4·5H2O", "H2O"]
    .map((input) => summaryEntryOf(analyzeSpecies(input)))
    .filter((entry): entry is SummaryEntry => entry !== undefined);

  it("every species has a row and no species is left unanalysed", () => {
    expect(entries).toHaveLength(3);
    const table = summaryTable({ analyses: entries, format: "markdown", angleDecimals: 1 });
    expect(table).not.toContain("Not analysed");
    const ammoniumNitrate = table.split("\n").find((line) => line.startsWith("| NH4NO3 "));
    expect(ammoniumNitrate).toContain("NH4^+: tetrahedral");
    expect(ammoniumNitrate).toContain("NO3^-: trigonal planar");
    expect(ammoniumNitrate).toContain("ionic compound");
    const hydrate = table.split("\n").find((line) => line.startsWith("| CuSO4·5H2O "));
    expect(hydrate).toContain("H2O: bent");
    expect(hydrate).toContain("SO4^2-: AX4");
    expect(table).toContain(HOVER_CAUTION);
  });

  it("CSV keeps one row per species", () => {
    const csv = summaryTable({ analyses: entries, format: "csv", angleDecimals: 1 });
    expect(csv.trim().split("\r\n")).toHaveLength(4);
  });
});
