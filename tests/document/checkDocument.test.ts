/**
 * Findings and fixes for small data tables with deliberate mistakes.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import { checkDocument } from "../../shared/src/document/checkDocument";
import type { DocumentKind } from "../../shared/src/document/types";

const TABLES = join(__dirname, "..", "fixtures", "tables");

/** Each finding as [code, the text it covers, the fix's replacement text or "-"]. */
function findings(text: string, kind: DocumentKind): [string, string, string][] {
  return checkDocument(analyzeDocument(text, kind)).map((finding) => [
    finding.code,
    text.slice(finding.range.start, finding.range.end),
    finding.fix?.newText ?? "-",
  ]);
}

function fixture(name: string): string {
  return readFileSync(join(TABLES, name), "utf8");
}

describe("checkDocument on data tables", () => {
  it("finds every deliberate mistake in a CSV cylinder list, and nothing else", () => {
    expect(findings(fixture("store-check.csv"), "csv")).toEqual([
      // from memory: electron counting, N 5 + 3 × F 7 = 26
      ["table-valence-electrons", "24", "26"],
      // from memory: NH3 is trigonal pyramidal (AX3E1), any general chemistry text
      ["table-molecular-geometry", "trigonal planar", "trigonal pyramidal"],
      // from memory: BF3 is trigonal planar with cancelling bond dipoles, so nonpolar
      ["table-polarity", "polar", "nonpolar"],
      // source: CRC Handbook of Chemistry and Physics, H-O-H 104.5° in the gas phase
      ["table-bond-angle", "120°", "104.5°"],
      // from memory: ClF3 is AX3E2, two lone pairs on chlorine
      ["table-lone-pairs", "1", "2"],
      // common practice: carbon holds at most four electron pairs
      ["octet-exceeded", "CH5", "-"],
      // from memory: methane is CH4, so the name beside CH5 names another species
      ["table-name-formula", "methane", "-"],
      // common practice: element symbols are one capital and an optional lower-case letter
      ["unknown-element", "Sf6", "SF6"],
      // from memory: CO2 is linear, sp on carbon
      ["table-hybridization", "sp2", "sp"],
      // from memory: NO2 has 17 valence electrons, a radical (said once for the row, on the formula,
      // not again for the name beside it)
      ["radical", "NO2", "-"],
    ]);
  });

  it("checks JSON records, including objects stored under a species key, keeping value types", () => {
    expect(findings(fixture("reference.json"), "json")).toEqual([
      // from memory: NH3 has 5 + 3 × 1 = 8 valence electrons and is trigonal pyramidal
      ["table-valence-electrons", "10", "8"],
      ["table-molecular-geometry", "Trigonal Planar", "Trigonal Pyramidal"],
      // from memory: SO2 is bent and polar (dipole about 1.6 D)
      ["table-polarity", "false", "true"],
      // from memory: SF6 is AX6, no lone pair on sulfur
      ["table-lone-pairs", "1", "0"],
    ]);
  });

  it("checks YAML records, inside quotes and under species keys", () => {
    expect(findings(fixture("ions.yaml"), "yaml")).toEqual([
      // from memory: nitrite NO2- is AX2E1, bent
      ["table-molecular-geometry", "linear", "bent"],
      // from memory: sulfate has 6 + 4 × 6 + 2 = 32 valence electrons
      ["table-valence-electrons", "30", "32"],
      // from memory: triiodide I3- is AX2E3, three lone pairs on the central iodine
      ["table-lone-pairs", "2", "3"],
    ]);
  });

  it.each([
    // [cell as written, fix expected] — the fix keeps the cell's style
    ["Trigonal Planar", "Trigonal Pyramidal"],
    ["TRIGONAL PLANAR", "TRIGONAL PYRAMIDAL"],
    ["trigonal-planar", "trigonal-pyramidal"],
    ["Trigonal planar", "Trigonal pyramidal"],
  ])("writes the corrected geometry for %j as %j", (cell, fix) => {
    const text = `formula,molecular geometry\nNH3,${cell}\n`;
    // from memory: NH3 is trigonal pyramidal
    expect(findings(text, "csv")).toEqual([["table-molecular-geometry", cell, fix]]);
  });

  it.each([
    // [column, species, cell] — spellings that agree with the computed value
    ["molecular geometry", "SF4", "see-saw"],
    ["molecular geometry", "ClF3", "T shaped"],
    ["molecular geometry", "NH3", "Trigonal-Pyramidal"],
    ["hybridization", "SF4", "sp³d"],
    ["hybridization", "SF6", "d2sp3"],
    ["polar", "NF3", "Yes"],
    ["polar", "CF4", "non-polar"],
    ["polar", "CO2", "FALSE"],
    ["axe", "SF4", "AX4E"],
    ["axe", "CH4", "AX4E0"],
    ["bond angle", "NH3", "107°"],
    ["bond angle", "NH3", "<109.5"],
    ["bond angle", "H2O", "~104.5"],
    ["bond angle", "SF4", "90, 120, 180"],
    // source: CRC Handbook of Chemistry and Physics, H-O-H 104.5° and H-N-H 107.3° (gas phase);
    // the uncertainty qualifies the value and is no second angle
    ["bond angle", "H2O", "104.5 ± 0.3"],
    ["bond angle", "H2O", "104.5(3)°"],
    ["bond angle", "NH3", "107.3 +/- 0.2"],
    ["bond angle", "H2O", "104.5°±0.5°"],
    ["valence electrons", "SO4^2-", "32"],
    ["lone pairs on central atom", "XeF2", "3"],
    // from memory: every lone pair of the species, the way some tables count them: two on each O
    // of CO2, three on each F of NF3 plus one on N
    ["lone pairs", "CO2", "4"],
    ["lone pairs", "NF3", "10"],
    ["lone pairs (total)", "SF6", "18"],
  ])("accepts %s %j for %s", (column, species, cell) => {
    // from memory: VSEPR shapes and counts of common species, any general chemistry text
    expect(findings(`formula,${column}\n${species},${cell}\n`, "csv")).toEqual([]);
  });

  it.each([
    // [column, species, cell] — one value for a species with several centres names one of them
    ["molecular geometry", "CH3COCH3", "trigonal planar"],
    ["molecular geometry", "CH3COCH3", "tetrahedral"],
    ["molecular geometry", "CH3CH2OH", "bent"],
    ["molecular geometry", "CH3OCH3", "bent"],
    ["molecular geometry", "CH3COOH", "trigonal planar"],
    ["hybridization", "CH3COCH3", "sp2"],
    ["hybridization", "CH3CN", "sp"],
    ["lone pairs", "CH3OH", "2"],
    ["axe", "CH3OH", "AX2E2"],
  ])("accepts %s %j for %s, a species with several centres", (column, species, cell) => {
    // from memory: carbonyl carbons are trigonal planar and sp2, ether and alcohol oxygens bent
    // with two lone pairs, nitrile carbons sp; any general chemistry text
    expect(findings(`formula,${column}\n${species},${cell}\n`, "csv")).toEqual([]);
  });

  it("finds a wrong angle stated with an uncertainty, and offers no fix that would drop it", () => {
    // from memory: H-O-H is about 104.5°, far from 120°
    const found = checkDocument(analyzeDocument("formula,bond angle\nH2O,120.5 ± 0.3\n", "csv"));
    expect(found.map((finding) => [finding.code, finding.fix])).toEqual([["table-bond-angle", undefined]]);
  });

  it("lists the centres, with no fix, when no centre of such a species fits", () => {
    // from memory: acetone has a tetrahedral methyl carbon and a trigonal planar carbonyl carbon
    const found = checkDocument(analyzeDocument("formula,molecular geometry\nCH3COCH3,square planar\n", "csv"));
    expect(found.map((finding) => [finding.code, finding.message, finding.fix])).toEqual([
      [
        "table-molecular-geometry",
        'No centre of CH3COCH3 fits "square planar" (VSEPR model prediction): C tetrahedral, C trigonal planar.',
        undefined,
      ],
    ]);
  });

  it.each([
    // [name, formula, valence electrons cell, findings]
    ["Acetone", "C3H6O", "24", []],
    ["Propanal", "C3H6O", "22", [["table-valence-electrons", "22", "24"]]],
    ["Dimethyl ether", "C2H6O", "20", []],
    ["", "C3H6O", "24", [["ambiguous-connectivity", "C3H6O", "-"]]],
  ])("a name (%j) beside an ambiguous molecular formula %s says which structure is meant", (name, formula, electrons, expected) => {
    // from memory: C3H6O has 3 x 4 + 6 x 1 + 6 = 24 valence electrons, C2H6O 2 x 4 + 6 + 6 = 20
    expect(findings(`name,formula,valence electrons\n${name},${formula},${electrons}\n`, "csv")).toEqual(expected);
  });

  it("reports rejected prose species at the token and leaves look-alike words alone", () => {
    const text = "Run 14 found CH5 in the log. He said In and As were fine; pH 7, 5 mL, lot KR-0412.";
    // common practice: carbon holds at most four electron pairs
    expect(findings(text, "plaintext")).toEqual([["octet-exceeded", "CH5", "-"]]);
  });

  it("offers the reader's spelling for a confident but misspelt prose formula", () => {
    // common practice: chlorine is Cl; CLF3 spells carbon, L and fluorine
    expect(findings("The CLF3 cylinder was changed.", "plaintext")).toEqual([["unknown-element", "CLF3", "ClF3"]]);
  });

  it("marks mhchem species the reader rejects", () => {
    const result = findings("See \\ce{Xy3 + SF4}.", "markdown");
    expect(result.map(([code, covered]) => [code, covered])).toEqual([["unknown-element", "Xy3"]]);
  });

  it("uses the analysis passed in, once per distinct species", () => {
    const seen: string[] = [];
    const model = analyzeDocument("SF4 and SF4 and NF3", "plaintext");
    checkDocument(model, (text) => {
      seen.push(text);
      return { ok: false, problem: { code: "no-valid-structure", message: `no structure for ${text}` } };
    });
    expect(seen).toEqual(["SF4", "NF3"]);
  });
});
