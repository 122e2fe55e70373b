/**
 * What the prose and markdown scanners find, as inline documents with ⟦labels⟧ around every
 * species the scanner must report, and nothing else.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import { findSpeciesInProse } from "../../shared/src/document/scanProse";
import type { DocumentKind } from "../../shared/src/document/types";
import { stripLabels } from "./labelledText";

/** Compares the scanner's occurrences with the labels, as [start, text] pairs. */
function check(marked: string, kind: DocumentKind = "markdown"): void {
  const { text, labels } = stripLabels(marked);
  const found = analyzeDocument(text, kind).occurrences.map((occurrence) => [occurrence.range.start, occurrence.text]);
  expect(found).toEqual(labels.map((label) => [label.start, label.text]));
}

describe("species in prose", () => {
  // common practice: how formulas, ions and names are written in lab notes
  it.each([
    ["The ⟦SF4⟧ line, the ⟦NF3⟧ line and ⟦ClF3⟧."],
    ["Ions: ⟦NH4+⟧, ⟦SO4^2-⟧, ⟦SO₄²⁻⟧, ⟦Fe3+⟧, ⟦Cl-⟧ and ⟦Na+⟧."],
    ["Gases: ⟦Xe⟧, ⟦Ar⟧, ⟦Cl2⟧, ⟦O3⟧, ⟦N2⟧ and ⟦C60⟧ soot."],
    ["(⟦SF4⟧), [⟦NF3⟧], ⟦(NH4)2SO4⟧, ⟦CuSO4·5H2O⟧ and ⟦Ca(OH)2⟧."],
    ["An ⟦NF3⟧-rich feed, ⟦CF4⟧- and ⟦SF6⟧-based etchants, ⟦NF3⟧/⟦SF6⟧ blends."],
    ["⟦sulfur tetrafluoride⟧ and ⟦Chlorine trifluoride⟧; ⟦ammonia⟧ and ⟦nitrate⟧."],
    ["**⟦sulfur hexafluoride⟧** is inert; _⟦SF6⟧_ too."],
    ["\\ce{⟦SF4⟧ + 2 ⟦H2O⟧ -> ⟦SO2⟧ + 4 ⟦HF⟧} and \\ce{⟦SO4^2-⟧}"],
    ["As in Run 14, I think He was In the lab. No. At 5 mL, 60 Hz, 3 mm, 101 kPa and 2 Pa, pH 7."],
    ["US, NaN, OK, PhD, IR, UV, NMR, FTIR, HPLC, grades A, B+, C-, Phase II, IV, vial B2, well A1."],
    ["Lots KR-0412, CO-07, CYL-003; files ⟦SF6⟧ in SF6.csv and run_SF6; basis HF/6-31G; #NF3."],
    ["Golden, CO 80401 is the address; ⟦CO⟧ and ⟦NO⟧ are toxic. NO SMOKING, NO PHONES."],
    ["See https://lab.example/SF6?x=NF3 or mail ops-SF6@lab.example; [⟦NF3⟧ data](https://x.example/NF3)."],
    ["Plain code `SF6` is skipped, `smiles:⟦C1=CC=CC=C1⟧` is read."],
    ["Not H1N1, P450, B12 or N-methyl; but ⟦H2O2⟧ and ⟦HeH+⟧."],
    ["<!-- SF6 here is hidden --> wait: <!-- SF6 --> ⟦NF3⟧"],
    ["⟦SF4⟧ + 2 ⟦H2O⟧ -> ⟦SO2⟧ + 4 ⟦HF⟧, and ⟦SO<sub>2</sub>⟧ + ⟦HF⟧; but DO NOT VENT HF."],
    ["Runs N1, N2 and N3 ran late. Purge with ⟦N<sub>2</sub>⟧ or ⟦N₂⟧ first, not with N2."],
    // Structural formulas with bond marks are one species; two lone atoms and a mark are a bond.
    ["Lines: ⟦CH2=CH2⟧, ⟦HC≡CH⟧, ⟦O=C=O⟧, ⟦H2C=O⟧, ⟦CH3-CH=CH2⟧ and ⟦H–C≡N⟧."],
    ["The C=O bonds are polar, N≡N is strong, C=C=C is a fragment; S=O too."],
    ["Unspaced equations keep their parts: ⟦SO2⟧+⟦O2⟧=⟦SO3⟧ and ⟦CaCO3⟧=⟦CaO⟧+⟦CO2⟧."],
    // Charges in brackets, as handbook tables write them.
    ["Ions: ⟦SO4(2-)⟧, ⟦NH4(+)⟧, ⟦PO4(3-)⟧, ⟦Fe(3+)⟧ and ⟦HPO4(2-)⟧; not in (2-) alone."],
  ])("%s", (marked) => {
    check(marked, "markdown");
  });

  it("gives offsets shifted by the offset it is told", () => {
    const found = findSpeciesInProse("then SF4", 100).map((occurrence) => [occurrence.range, occurrence.reading.range]);
    expect(found).toEqual([
      [
        { start: 105, end: 108 },
        { start: 105, end: 108 },
      ],
    ]);
  });

  it("gives each reading the notation it was written in", () => {
    const notations = findSpeciesInProse("SF4, \\ce{NF3}, water, `smiles:O`").map((occurrence) => occurrence.reading.notation);
    expect(notations).toEqual(["formula", "mhchem", "name", "smiles"]);
  });
});

describe("names in prose", () => {
  // common practice: how lab notes name reagents and solvents; the whole written name is one span
  it.each([
    ["⟦Acetone⟧ dried the cell; ⟦ethyl acetate⟧ and ⟦diethyl ether⟧ were kept for the ester run."],
    ["Eluted with ⟦hexanes⟧/⟦EtOAc⟧ 4:1, then ⟦dichloromethane⟧ and ⟦chloroform⟧."],
    ["Bay C holds ⟦sulfuric acid⟧, ⟦Nitric acid⟧, ⟦sulphuric acid⟧ (old label) and ⟦hydrochloric acid⟧."],
    ["The etch bath used ⟦copper(II) sulfate⟧, ⟦iron (III) chloride⟧ and ⟦ferric chloride⟧."],
    ["⟦Stannous fluoride⟧ and ⟦tin(II) fluoride⟧ are one salt; ⟦copper(II) sulfate pentahydrate⟧ is blue."],
    ["Store ⟦ammonium chloride⟧ apart from ⟦ammonium nitrate⟧ and ⟦sodium hydroxide⟧."],
    ["⟦Carbon dioxide⟧ turns lime water milky; rinse with ⟦water⟧."],
    ["From the shelf: ⟦propan-2-ol⟧, ⟦1,2-dichloroethane⟧, ⟦butan-2-one⟧ and ⟦2-methylpropan-2-ol⟧."],
    ["Solvents ⟦DCM⟧, ⟦THF⟧, ⟦DMSO⟧, ⟦DMF⟧, ⟦MeOH⟧ and ⟦EtOH⟧; dcm and Thf are not how they are written."],
    ["⟦Glycerol⟧, ⟦glucose⟧, ⟦citric acid⟧, ⟦aniline⟧, ⟦phenolphthalein⟧ and ⟦silica⟧ gel."],
    ["Add ⟦bromine⟧ dropwise under ⟦nitrogen⟧; the nitrogen atom keeps its lone pair."],
    ["Two hydrogen atoms, hydrogen bonds and one fluorine on the ring are atoms, not species."],
    ["⟦Magnesium⟧ ribbon and ⟦zinc⟧ granules; ⟦sodium⟧ or ⟦potassium⟧ metal under oil."],
    ["The ⟦nitrate⟧ ion, ⟦chloride⟧ ions and ⟦sulfate⟧; but geranyl acetate and iron cyanide complexes."],
    ["A fluoride, the oxide layer, an amide and the ether extract are classes, not species."],
    ["Hexagonal cells, general methods, a chemical signal and alone are words, not names."],
    ["**⟦Ethanol⟧** and _⟦methanol⟧_, then ⟦anhydrous copper(II) sulfate⟧ as a drying test."],
    // from memory: CRC Handbook (double salts, counted cations and mixed-valence oxides by name)
    ["Weigh ⟦ammonium iron(II) sulfate hexahydrate⟧ and ⟦ferrous ammonium sulfate⟧ for the titration."],
    ["Buffer: ⟦disodium hydrogen phosphate⟧ with ⟦sodium dihydrogen phosphate⟧; ⟦trisodium phosphate⟧ to degrease."],
    ["⟦Magnetite⟧ is ⟦iron(II,III) oxide⟧; ⟦potassium aluminium sulfate dodecahydrate⟧ grows as octahedra."],
  ])("%s", (marked) => {
    check(marked, "markdown");
  });

  // common practice: a name that wraps onto the next line is still one name
  it("reads a name across a line break, but not across a blank line", () => {
    check("We washed with ⟦ethyl\nacetate⟧ twice; then a methyl\n\n⟦acetate⟧ paragraph.\n", "markdown");
  });
});

describe("markdown structure", () => {
  it.each([
    ["front matter keys are skipped, values read", "---\nSF6: ⟦NF3⟧\ngases: [⟦ClF3⟧, ⟦F2⟧]\n---\nBody ⟦SF4⟧.\n"],
    ["fenced code is skipped", "```python\nratio = SF6 / NF3\n```\n⟦SF4⟧\n"],
    ["chem fences are read as mhchem", "```chem\n⟦SF4⟧ + ⟦H2O⟧ -> ⟦SOF2⟧ + 2 ⟦HF⟧\n```\n"],
    ["an unclosed fence hides the rest", "⟦SF4⟧\n~~~\nSF6\n"],
    ["a multi-paragraph comment is skipped", "⟦SF4⟧\n<!--\nSF6\n\nNF3\n-->\n⟦ClF3⟧\n"],
    ["headings and lists are prose", "# ⟦NF3⟧ versus ⟦SF6⟧\n\n- ⟦XeF2⟧\n- ⟦XeF4⟧\n"],
    ["names may wrap onto the next line", "We used ⟦chlorine\ntrifluoride⟧ twice.\n"],
    [
      "tables read species cells and scan the others",
      "| Formula | Name | Notes |\n|---|---|---|\n| ⟦SF4⟧ | ⟦sulfur tetrafluoride⟧ | forms ⟦SOF2⟧ |\n| ⟦NF3⟧ | | lot KR-0415 |\n",
    ],
  ])("%s", (_, marked) => {
    check(marked, "markdown");
  });

  it("turns a markdown table with a species column into records with exact cell ranges", () => {
    const text = "| Species | Lone pairs | Shape |\n|:--|--:|---|\n| SF4 | 1 | seesaw |\n| NH3 | 1 | trigonal planar |\n";
    const records = analyzeDocument(text, "markdown").records.map((record) => [
      record.species.text,
      record.cells.map((cell) => [cell.meaning, text.slice(cell.range.start, cell.range.end)]),
    ]);
    expect(records).toEqual([
      [
        "SF4",
        [
          ["lonePairs", "1"],
          ["molecularGeometry", "seesaw"],
        ],
      ],
      [
        "NH3",
        [
          ["lonePairs", "1"],
          ["molecularGeometry", "trigonal planar"],
        ],
      ],
    ]);
  });
});
