/**
 * A table's name and formula columns must name one species. The corpus in
 * tests/fixtures/name-formula is written the way others write such tables (a store's export with
 * grades and pack sizes, a gas-cylinder TSV, a semicolon-separated bench list with strengths, a
 * course handout of ions with charges in every style, a trainee's report with subscripts, JSON and
 * YAML records): every correct row must stay clean, and every mismatch seeded into it is found.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parse as parseCsv } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { parse as parseYaml } from "yaml";
import { analyzeDocument, checkDocument, editsOfFix, tableValueFixes } from "../../shared/src/index";
import type { DocumentKind, DocumentModel, Finding, TextFix } from "../../shared/src/index";
import { nameFormulaChecker, nameFormulaFinding } from "../../shared/src/document/checks/nameFormulaAgreement";

const FOLDER = join(__dirname, "..", "fixtures", "name-formula");
const CODE = "table-name-formula";

const FILES: readonly [file: string, kind: DocumentKind][] = [
  ["store-export.csv", "csv"],
  ["gas-cylinders.tsv", "tsv"],
  ["bench-solutions.csv", "csv"],
  ["ion-handout.md", "markdown"],
  ["student-report.md", "markdown"],
  ["reagents.json", "json"],
  ["hydrates.yaml", "yaml"],
];

/** The mismatches seeded into the corpus: the file, the name as written, the formula as written. */
const SEEDED: readonly (readonly [file: string, name: string, formula: string])[] = [
  // from memory: nitrite is NO2-, nitrate NO3- (any general chemistry text on polyatomic ions)
  ["store-export.csv", "Sodium nitrite", "NaNO3"],
  // from memory: copper(II) chloride is CuCl2, copper(I) chloride CuCl
  ["store-export.csv", "Copper(II) chloride", "CuCl"],
  // from memory: permanganate is MnO4-, so KMnO4; K2MnO4 is potassium manganate
  ["store-export.csv", "POTASSIUM PERMANGANATE", "K2MnO4"],
  // from memory: Co is cobalt, Cu copper
  ["store-export.csv", "Cobalt(II) chloride hexahydrate", "CuCl2·6H2O"],
  // from memory: Mg is magnesium, Mn manganese
  ["store-export.csv", "Magnesium sulfate heptahydrate", "MnSO4·7H2O"],
  // common practice: a capital I typed for a lower-case l makes NaCl into Na, C and I
  ["store-export.csv", "Sodium chloride", "NaCI"],
  // from memory: ammonium sulfate is (NH4)2SO4, two NH4+ for one SO4^2-
  ["store-export.csv", "Ammonium sulfate", "NH4SO4"],
  // from memory: the sulfur fluorides SF4 and SF6 are told apart by their prefixes
  ["gas-cylinders.tsv", "Sulfur tetrafluoride", "SF6"],
  // from memory: nitrous oxide is N2O, nitric oxide NO
  ["gas-cylinders.tsv", "Nitrous oxide", "NO"],
  // from memory: xenon tetrafluoride is XeF4
  ["gas-cylinders.tsv", "Xenon tetrafluoride", "XeF2"],
  // from memory: carbon monoxide is CO
  ["gas-cylinders.tsv", "Carbon monoxide", "CO2"],
  // from memory: boron trifluoride is BF3
  ["gas-cylinders.tsv", "Boron trifluoride", "BCl3"],
  // from memory: sodium hydroxide is NaOH, KOH is potassium hydroxide
  ["bench-solutions.csv", "Sodium hydroxide", "KOH(aq)"],
  // from memory: silver nitrate is AgNO3
  ["bench-solutions.csv", "Silver nitrate", "AgNO2(aq)"],
  // from memory: chlorate is ClO3-, perchlorate ClO4-
  ["bench-solutions.csv", "Potassium chlorate", "KClO4(aq)"],
  // from memory: sulfite SO3^2-, nitrite NO2-, iron(III) Fe3+, chlorate ClO3-, ammonium NH4+
  ["ion-handout.md", "sulfite", "SO4^2-"],
  ["ion-handout.md", "nitrite", "NO3-"],
  ["ion-handout.md", "iron(III) ion", "Fe2+"],
  ["ion-handout.md", "chlorate", "ClO4-"],
  ["ion-handout.md", "ammonium", "NH3"],
  // from memory: PCl3, ClF3 and NO2 are what the names say
  ["student-report.md", "Phosphorus trichloride", "PCl₅"],
  ["student-report.md", "Chlorine trifluoride", "ClF₅"],
  ["student-report.md", "Nitrogen dioxide", "N₂O"],
  // from memory: methanol CH3OH, sulfuric acid H2SO4, toluene C7H8, hydrogen peroxide H2O2
  ["reagents.json", "Methanol", "C2H5OH"],
  ["reagents.json", "Sulfuric acid", "H2SO3"],
  ["reagents.json", "Toluene", "C6H6"],
  ["reagents.json", "Hydrogen peroxide", "H2O"],
  // from memory: sulfate SO4^2-, thiosulfate S2O3^2-, iron(III) nitrate Fe(NO3)3
  ["hydrates.yaml", "copper(II) sulfate pentahydrate", "CuSO3·5H2O"],
  ["hydrates.yaml", "sodium thiosulfate pentahydrate", "Na2SO4·5H2O"],
  ["hydrates.yaml", "iron(III) nitrate nonahydrate", "Fe(NO3)2·9H2O"],
];

/**
 * Names in the corpus lonepair does not know (in-house mixtures, labels with the isotope in the
 * name): never read, so never compared, whatever the formula beside them.
 */
const UNKNOWN_NAMES: readonly string[] = [
  "Kestrel etch blend B",
  "Ridge calibration mix 3",
  "Kestrel purge blend",
  "Kestrel indicator mix",
  "Kestrel degreaser K-7",
  "Heavy water",
  "Chloroform-d",
];

/** Names that are read but never compared: a family of salts. */
const NEVER_COMPARED: readonly string[] = [
  // from memory: an alum is any M(I)M(III)(SO4)2·12H2O
  "alum",
];

interface Checked {
  readonly file: string;
  readonly kind: DocumentKind;
  readonly text: string;
  readonly model: DocumentModel;
  readonly findings: readonly Finding[];
}

function checked(file: string, kind: DocumentKind, text = readFileSync(join(FOLDER, file), "utf8")): Checked {
  const model = analyzeDocument(text, kind);
  return { file, kind, text, model, findings: checkDocument(model) };
}

const corpus = FILES.map(([file, kind]) => checked(file, kind));

/** The name and formula texts of a name-formula finding, from the record it is placed on. */
function pairOf(document: Checked, finding: Finding): [string, string] {
  const record = document.model.records.find((each) => each.nameBesideFormula?.name.range.start === finding.range.start);
  expect(record, `no record under ${document.text.slice(finding.range.start, finding.range.end)}`).toBeDefined();
  return [document.text.slice(finding.range.start, finding.range.end), record!.nameBesideFormula!.formula.text];
}

function isSerious(finding: Finding): boolean {
  return finding.severity === "error" || finding.severity === "warning";
}

describe("a table's name column against its formula column", () => {
  it.each(FILES.map(([file]) => file))("finds every mismatch seeded into %s, and no other", (file) => {
    const document = corpus.find((each) => each.file === file)!;
    const found = document.findings.filter((finding) => finding.code === CODE).map((finding) => [file, ...pairOf(document, finding)]);
    expect(found).toEqual(SEEDED.filter(([seededFile]) => seededFile === file).map((row) => [...row]));
  });

  it("leaves every other row of the corpus without an error or warning", () => {
    const serious = corpus.flatMap((document) =>
      document.findings.filter((finding) => isSerious(finding) && finding.code !== CODE).map((finding) => [document.file, finding.message]),
    );
    expect(serious).toEqual([]);
  });

  it("compares at least 150 correct rows: each of their names, beside a formula of other elements, is flagged", () => {
    const seededNames = new Set(SEEDED.map(([file, name]) => `${file}|${name}`));
    let compared = 0;
    const silent: string[] = [];
    for (const document of corpus) {
      for (const record of document.model.records) {
        const pair = record.nameBesideFormula;
        if (!pair) continue;
        const nameText = document.text.slice(pair.name.range.start, pair.name.range.end);
        if (seededNames.has(`${document.file}|${nameText}`)) continue;
        // common practice: krypton difluoride shares no element with anything in the corpus
        const probe = checked("probe.csv", "csv", `Name,Formula\n"${pair.nameCell.text.replace(/"/g, '""')}",KrF2\n`);
        if (probe.findings.some((finding) => finding.code === CODE)) compared++;
        else silent.push(pair.nameCell.text);
      }
    }
    expect(compared).toBeGreaterThanOrEqual(150);
    expect([...new Set(silent)].sort()).toEqual([...NEVER_COMPARED].sort());
  });

  it("reads no name it does not know, so those rows are never compared", () => {
    for (const name of UNKNOWN_NAMES) {
      const document = corpus.find((each) => each.text.includes(name));
      expect(document, name).toBeDefined();
      const start = document!.text.indexOf(name);
      const paired = document!.model.records.some((record) => record.nameBesideFormula?.nameCell.range.start === start);
      expect(paired, name).toBe(false);
      // common practice: krypton difluoride is nothing an unknown name could be checked against
      expect(checked("probe.csv", "csv", `Name,Formula\n${name},KrF2\n`).findings.some((finding) => finding.code === CODE)).toBe(false);
    }
  });

  it("offers the name's formula, and the formula's name where it has one, as two separate choices", () => {
    for (const document of corpus) {
      for (const finding of document.findings.filter((each) => each.code === CODE)) {
        expect(finding.fix).toBeUndefined();
        const choices = finding.choices ?? [];
        const [name, formula] = pairOf(document, finding);
        const formulaChoice = choices.find((choice) => choice.title.startsWith("Change the formula"));
        const nameChoice = choices.find((choice) => choice.title.startsWith("Change the name"));
        if (document.file === "student-report.md") {
          // The shape column was written for the formula's species: changing the formula would
          // make it wrong, so only the name is offered.
          expect(formulaChoice, `${name} / ${formula}`).toBeUndefined();
          expect(nameChoice, `${name} / ${formula}`).toBeDefined();
        } else {
          expect(formulaChoice, `${document.file}: ${name} / ${formula}`).toBeDefined();
          expect(document.text.slice(formulaChoice!.range.start, formulaChoice!.range.end)).toBe(formula);
        }
        if (nameChoice) expect(document.text.slice(nameChoice.range.start, nameChoice.range.end)).toBe(name);
      }
    }
    // from memory: SF6 is sulfur hexafluoride, CuCl copper(I) chloride, SO4^2- sulfate
    const titles = corpus.flatMap((document) =>
      document.findings.flatMap((finding) => (finding.choices ?? []).map((choice) => choice.title)),
    );
    expect(titles).toEqual(
      expect.arrayContaining([
        "Change the name to Sulfur hexafluoride",
        "Change the name to Copper(I) chloride",
        "Change the name to sulfate",
        "Change the formula to CuCl2",
        "Change the formula to SO3^2-",
        "Change the formula to NO2-",
      ]),
    );
  });

  it("keeps each choice a minimal edit that settles the row and leaves the file valid", () => {
    for (const document of corpus) {
      const before = document.findings.filter(isSerious);
      for (const finding of document.findings.filter((each) => each.code === CODE)) {
        for (const choice of finding.choices ?? []) {
          const after = applied(document.text, choice);
          const again = checked(document.file, document.kind, after);
          const label = `${document.file}: ${choice.title}`;
          // Only the row's own warning goes; nothing new appears anywhere.
          expect(again.findings.filter(isSerious).length, label).toBe(before.length - 1);
          expect(again.findings.filter((each) => each.code === CODE).length, label).toBe(
            document.findings.filter((each) => each.code === CODE).length - 1,
          );
          expect(structureOf(after, document.kind), label).toEqual(structureOf(document.text, document.kind));
        }
      }
    }
  });

  it("gives the same answer from remembered verdicts as worked out afresh, in any order", () => {
    const pairs = corpus.flatMap((document) =>
      document.model.records.flatMap((record) => (record.nameBesideFormula ? [[record.nameBesideFormula, document.kind] as const] : [])),
    );
    const remembering = nameFormulaChecker();
    for (const [pair, kind] of [...pairs, ...[...pairs].reverse(), ...pairs]) {
      expect(remembering(pair, kind)).toEqual(nameFormulaFinding(pair, kind));
    }
    expect(pairs.filter(([pair, kind]) => nameFormulaFinding(pair, kind) !== undefined)).toHaveLength(SEEDED.length);
  });

  it("never lets fix-all choose between the name and the formula", () => {
    for (const document of corpus) {
      const tableFixes = tableValueFixes(document.model, document.findings);
      const choices = document.findings.flatMap((finding) => finding.choices ?? []);
      expect(choices.length).toBeGreaterThan(0);
      for (const choice of choices) {
        expect(tableFixes.some((fix) => fix.range.start === choice.range.start && fix.newText === choice.newText)).toBe(false);
      }
    }
  });
});

/** `text` with the edits of `fix` applied. */
function applied(text: string, fix: TextFix): string {
  let result = text;
  for (const edit of [...editsOfFix(fix)].reverse())
    result = result.slice(0, edit.range.start) + edit.newText + result.slice(edit.range.end);
  return result;
}

/** The shape of a file that an edit of one cell must keep: rows and cells, or the parsed tree's keys. */
function structureOf(text: string, kind: DocumentKind): unknown {
  switch (kind) {
    case "csv":
    case "tsv": {
      // source: csv-parse, an RFC 4180 reader independent of lonepair's
      const delimiter = kind === "tsv" ? "\t" : text.split("\n")[0].includes(";") ? ";" : ",";
      return (parseCsv(text, { delimiter, relax_column_count: true }) as string[][]).map((row) => row.length);
    }
    case "json":
      return JSON.stringify(JSON.parse(text), (_, value: unknown) => (typeof value === "string" ? "" : value));
    case "yaml":
      return JSON.stringify(parseYaml(text), (_, value: unknown) => (typeof value === "string" ? "" : value));
    default:
      return text.split("\n").map((line) => line.split("|").length);
  }
}

/** One row in, the name-formula finding out: `[name, formula]` pairs in every style. */
function check(name: string, formula: string): boolean {
  const text = `Name,Formula\n"${name.replace(/"/g, '""')}","${formula}"\n`;
  return checkDocument(analyzeDocument(text, "csv")).some((finding) => finding.code === CODE);
}

describe("what counts as one species", () => {
  it.each([
    // from memory: CuSO4·5H2O is blue vitriol; inventories often leave the water out either way
    ["copper(II) sulfate pentahydrate", "CuSO4·5H2O"],
    ["copper(II) sulfate pentahydrate", "CuSO4"],
    ["copper(II) sulfate pentahydrate", "CuSO4.5H2O"],
    ["copper(II) sulfate", "CuSO4*5H2O"],
    ["anhydrous copper(II) sulfate", "CuSO4"],
    // from memory: aqueous ammonia is written NH3(aq) or NH4OH; carbonic acid as CO2(aq) + H2O
    ["ammonia solution", "NH4OH"],
    ["ammonium hydroxide", "NH3(aq)"],
    ["hydrochloric acid, dilute", "HCl(aq)"],
    ["sulfuric acid 1 M", "H2SO4(aq)"],
    // common practice: isomers share a molecular formula, which a formula column may give alone
    ["ethanol", "C2H6O"],
    ["dimethyl ether", "C2H6O"],
    ["isopropanol", "CH3CH2CH2OH"],
    // common practice: handbook exports write charges as +2, --, (+), ^2-, 2- and with superscripts
    ["calcium ion", "Ca+2"],
    ["sulfate", "SO4--"],
    ["ammonium", "NH4(+)"],
    ["sulfate", "SO4 2-"],
    ["oxide", "O2-"],
    ["sulfate", "SO42-"],
    ["phosphate", "PO₄³⁻"],
    ["sulfate", "SO4"],
    // from memory: D2O is water with deuterium; 13CO2 is carbon dioxide labelled with carbon-13
    ["water", "D2O"],
    ["carbon dioxide", "13CO2"],
    ["methane", "CH4(g)"],
    // from memory: P4O10 is written P2O5, Al2Cl6 as AlCl3, Hg2Cl2 keeps the Hg2 2+ pair, S8 is sulfur
    ["tetraphosphorus decoxide", "P2O5"],
    ["aluminium chloride", "Al2Cl6"],
    ["mercury(I) chloride", "HgCl"],
    ["sulfur", "S8"],
    ["sodium", "Na+"],
    // common practice: "copper oxide" with no numeral may mean either oxide
    ["copper oxide", "Cu2O"],
    ["lead oxide", "Pb3O4"],
  ])("%s beside %s is no mismatch", (name, formula) => {
    expect(check(name, formula)).toBe(false);
  });

  it.each([
    ["the supplier's code", "KR-0412", "SF6"],
    ["a name lonepair does not know", "Kestrel wash concentrate", "NaOH"],
    ["a name with more words than a grade or form after it", "Sodium chloride in ethanol", "KCl"],
  ])("%s is never compared (%s beside %s)", (_, name, formula) => {
    expect(check(name, formula)).toBe(false);
  });

  it.each([
    // from memory: copper(II) chloride CuCl2; sodium sulfite Na2SO3; sulfur tetrafluoride SF4
    ["copper(II) chloride", "CuCl"],
    ["sodium sulfite", "Na2SO4"],
    ["sulfur tetrafluoride", "SF6"],
    // from memory: superoxide is O2-, peroxide O2^2-; iron(III) is Fe3+
    ["peroxide", "O2-"],
    ["iron(III) ion", "Fe+2"],
    // from memory: hydrogen peroxide H2O2 differs from water by an O atom, not by water
    ["hydrogen peroxide", "H2O"],
    // from memory: methanol CH3OH and ethanol C2H5OH differ by CH2, not by water
    ["ethanol", "CH3OH"],
    // from memory: the name gives copper(II); CuCl2 and CoCl2 differ in the metal
    ["cobalt(II) chloride hexahydrate", "CuCl2·6H2O"],
    // from memory: ammonium is NH4+, ammonia NH3
    ["ammonium", "NH3"],
    ["Sodium chloride solution 0.9%", "KCl"],
  ])("%s beside %s is a mismatch", (name, formula) => {
    expect(check(name, formula)).toBe(true);
  });
});
