/**
 * Equations in data files: a CSV/TSV column, or a JSON/YAML key, whose header means reaction or
 * equation. Each value is judged as a markdown table's equation cell is, its fix stays inside the
 * cell and keeps the file valid, its species keep their own findings, and no other cell is read.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { parse as parseYaml } from "yaml";
import {
  analyzeDocument,
  checkDelimitedText,
  checkDocument,
  chunkedTextOf,
  createDocumentAnalyser,
  editChunkedText,
  documentKindFor,
  editsOfFix,
  type DocumentKind,
  type Finding,
} from "../../shared/src/index";

/** The text with every edit of `finding`'s fix applied. */
function fixed(text: string, finding: Finding): string {
  let result = "";
  let copied = 0;
  for (const edit of editsOfFix(finding.fix!)) {
    result += text.slice(copied, edit.range.start) + edit.newText;
    copied = edit.range.end;
  }
  return result + text.slice(copied);
}

function equationFindings(text: string, kind: DocumentKind): Finding[] {
  return checkDocument(analyzeDocument(text, kind)).filter((finding) => finding.code.startsWith("equation-"));
}

/** [code, text under the finding, the document after its fix or "-"] for each equation finding. */
function summary(text: string, kind: DocumentKind): [string, string, string][] {
  return equationFindings(text, kind).map((finding) => [
    finding.code,
    text.slice(finding.range.start, finding.range.end),
    finding.fix ? fixed(text, finding) : "-",
  ]);
}

describe("which headers mean a column of equations", () => {
  // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 3 (2 H2 + O2 -> 2 H2O)
  const row = "H2 + O2 -> H2O";
  it.each([
    "Reaction",
    "reaction",
    "REACTION",
    "Reactions",
    "Equation",
    "Balanced equation",
    "balanced_equation",
    "Net ionic equation",
    "Chemical equation",
    "Overall reaction",
    "Half-reaction",
    "half reaction",
    "rxn",
    "Rxn",
    "Reaction (balanced)",
    "Equation 2",
  ])("%s is read", (header) => {
    // common practice: how lab sheets and handbook exports head their equation column
    expect(summary(`id,${header}\nR1,${row}\n`, "csv").map(([code]) => code)).toEqual(["equation-unbalanced"]);
  });

  it.each([
    "Reaction time (min)",
    "Reaction temperature",
    "Heat of reaction",
    "Reaction ID",
    "Equation of state",
    "Notes",
    "Rxn yield %",
    "Formula",
  ])("%s is not", (header) => {
    // common practice: columns about a reaction that do not hold its equation
    expect(summary(`id,${header}\nR1,${row}\n`, "csv")).toEqual([]);
  });
});

describe("CSV and TSV equation cells", () => {
  it.each<[string, string, DocumentKind, [string, string, string][]]>([
    [
      // from memory: Zumdahl, Chemistry, ch. 3 (4 Al + 3 O2 -> 2 Al2O3)
      "an unquoted cell",
      "run,reaction,yield\nKR-16-01,Al + O2 -> Al2O3,0.91\n",
      "csv",
      [["equation-unbalanced", "->", "run,reaction,yield\nKR-16-01,4 Al + 3 O2 -> 2 Al2O3,0.91\n"]],
    ],
    [
      // from memory: Greenwood & Earnshaw, sulfur chapter (2 SO2 + O2 -> 2 SO3); a quoted cell stays quoted
      "a quoted cell with a comma",
      'run,reaction,notes\nKR-16-02,"SO2 + O2 → SO3, over V2O5",converter\n',
      "csv",
      [["equation-unbalanced", "→", 'run,reaction,notes\nKR-16-02,"2 SO2 + O2 → 2 SO3, over V2O5",converter\n']],
    ],
    [
      // from memory: Tro, Chemistry: A Molecular Approach, ch. 4 (CaCO3 + 2 HCl -> CaCl2 + H2O + CO2)
      "a TSV cell with states",
      "step\tequation\nwash\tCaCO3(s) + HCl(aq) → CaCl2(aq) + H2O(l) + CO2(g)\n",
      "tsv",
      [["equation-unbalanced", "→", "step\tequation\nwash\tCaCO3(s) + 2 HCl(aq) → CaCl2(aq) + H2O(l) + CO2(g)\n"]],
    ],
    [
      // from memory: Brown, LeMay & Bursten, ch. 20 (Cu2+ + 2e- -> Cu); a half-reaction in a semicolon export
      "a half-reaction in a semicolon-delimited export",
      "electrode;half-reaction\ncathode;Cu2+ + e- -> Cu\n",
      "csv",
      [["equation-unbalanced", "->", "electrode;half-reaction\ncathode;Cu2+ + 2 e- -> Cu\n"]],
    ],
    [
      // from memory: Zumdahl, ch. 4 (Ba2+ + SO4^2- -> BaSO4), balanced; handbook-style charges
      "a balanced net ionic equation with handbook charges",
      "Reaction,Ksp note\nBa+2 + SO4-2 = BaSO4,insoluble\n",
      "csv",
      [],
    ],
  ])("%s", (_, text, kind, expected) => {
    expect(summary(text, kind)).toEqual(expected);
  });

  it("a fixed cell stays one valid CSV field, and no other cell changes", () => {
    // from memory: Housecroft & Sharpe, nitrogen chapter (4 NH3 + 5 O2 -> 4 NO + 6 H2O)
    const text = 'id,Balanced equation,conditions\nKR-9,"NH3 + O2 -> NO + H2O, Pt gauze","850 °C, ""fast"""\n';
    const [finding] = equationFindings(text, "csv");
    const after = fixed(text, finding);
    const rows = parse(after) as string[][];
    expect(rows).toEqual([
      ["id", "Balanced equation", "conditions"],
      ["KR-9", "4 NH3 + 5 O2 -> 4 NO + 6 H2O, Pt gauze", '850 °C, "fast"'],
    ]);
    for (const edit of editsOfFix(finding.fix!)) expect(text.slice(edit.range.start, edit.range.end)).toMatch(/^\d*\s?$/);
  });

  it("species in an equation cell keep their own findings, and the equation is then not judged", () => {
    // common practice: CH5 has one hydrogen too many for carbon; the same as in a markdown table
    const csv = checkDocument(analyzeDocument("id,reaction\n1,CH5 + O2 -> CO2 + H2O\n", "csv")).map((finding) => finding.code);
    const markdown = checkDocument(analyzeDocument("| id | reaction |\n|---|---|\n| 1 | CH5 + O2 -> CO2 + H2O |\n", "markdown")).map(
      (finding) => finding.code,
    );
    expect(csv).toEqual(markdown);
    expect(csv.length).toBeGreaterThan(0);
    expect(csv.some((code) => code.startsWith("equation-"))).toBe(false);
  });

  it("a reaction column reads no other cell", () => {
    // common practice: notes and ids are free text; "NO", "CO" and "US" in them are words here
    const text = "id,notes,reaction,operator\nKR-1,NO CO2 vent,2 H2 + O2 -> 2 H2O,US\nKR-2,see CO log,N2 + 3 H2 -> 2 NH3,CO\n";
    const model = analyzeDocument(text, "csv");
    const cells = [...text.matchAll(/[^,\n]*->[^,\n]*/g)].map((match) => ({ start: match.index!, end: match.index! + match[0].length }));
    expect(model.occurrences.length).toBeGreaterThan(0);
    for (const occurrence of model.occurrences) {
      expect(cells.some((cell) => occurrence.range.start >= cell.start && occurrence.range.end <= cell.end)).toBe(true);
    }
    expect(equationFindings(text, "csv")).toEqual([]);
    expect(model.reactions).toHaveLength(2);
  });

  it("the quick reading of repeated rows gives what the ordinary reading gives", () => {
    // from memory: Zumdahl, ch. 3 (CH4 + 2 O2 -> CO2 + 2 H2O); a log repeats its few reactions
    const rows = Array.from({ length: 3000 }, (_, index) =>
      index % 3 === 0 ? `KR-${index},CH4 + O2 → CO2 + 2 H2O,ok` : `KR-${index},CH4 + 2 O2 → CO2 + 2 H2O,ok`,
    );
    const text = ["id,reaction,status", ...rows].join("\n");
    const quick = checkDelimitedText(text, "csv");
    const ordinary = [...analyzeDocument(text, "csv").problems, ...checkDocument(analyzeDocument(text, "csv"))];
    expect(quick).toEqual(ordinary.sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end));
    expect(quick.filter((finding) => finding.code === "equation-unbalanced")).toHaveLength(1000);
  });
});

describe("the editor's reading of a large table with an equation column", () => {
  it("gives the findings of a reading from scratch, before and after edits", () => {
    // from memory: Zumdahl, ch. 3 (N2 + 3 H2 -> 2 NH3); rows repeat, some wrong, a few edited
    const rows = Array.from({ length: 4000 }, (_, index) =>
      index % 5 === 0 ? `KR-${index},N2 + H2 -> NH3,NH3` : `KR-${index},N2 + 3 H2 -> 2 NH3,NH3`,
    );
    let text = ["id,reaction,formula", ...rows].join("\n");
    const scratch = (): string[] =>
      checkDocument(analyzeDocument(text, "csv"))
        .map((finding) => `${finding.range.start} ${finding.code} ${finding.fix ? fixed(text, finding).length : "-"}`)
        .sort();
    const analyser = createDocumentAnalyser("csv");
    let chunked = chunkedTextOf(text);
    const incremental = (): string[] =>
      analyser
        .analyse(chunked)
        .findings()
        .map((finding) => `${finding.range.start} ${finding.code} ${finding.fix ? fixed(text, finding).length : "-"}`)
        .sort();
    expect(incremental()).toEqual(scratch());
    for (const at of [text.indexOf("KR-2000,"), text.indexOf("KR-15,"), text.indexOf("KR-3999,")]) {
      const cell = text.indexOf(",", at) + 1;
      chunked = editChunkedText(chunked, cell, cell, "2 ");
      text = text.slice(0, cell) + "2 " + text.slice(cell);
      expect(incremental()).toEqual(scratch());
    }
  });
});

describe("JSON and YAML values under an equation key", () => {
  it.each<[string, string, DocumentKind, [string, string, string][]]>([
    [
      // from memory: Tro, ch. 7 (4 Fe + 3 O2 -> 2 Fe2O3); a student's lab-report export
      "a JSON string",
      '{"run": "KR-16", "steps": [{"reaction": "Fe + O2 -> Fe2O3", "observed": "rust"}]}',
      "json",
      [["equation-unbalanced", "->", '{"run": "KR-16", "steps": [{"reaction": "4 Fe + 3 O2 -> 2 Fe2O3", "observed": "rust"}]}']],
    ],
    [
      // from memory: Zumdahl, ch. 3 (2 KClO3 -> 2 KCl + 3 O2); a list under a camel-case key
      "a JSON list",
      '{"balancedEquations": ["2 H2 + O2 -> 2 H2O", "KClO3 -> KCl + O2"]}',
      "json",
      [["equation-unbalanced", "->", '{"balancedEquations": ["2 H2 + O2 -> 2 H2O", "2 KClO3 -> 2 KCl + 3 O2"]}']],
    ],
    [
      // from memory: Brown, LeMay & Bursten, ch. 20 (Cl2 + 2e- -> 2 Cl-)
      "a YAML plain scalar",
      "run: KR-16\nhalf_reaction: Cl2 + 2 e- -> Cl-\nnote: bench\n",
      "yaml",
      [["equation-unbalanced", "->", "run: KR-16\nhalf_reaction: Cl2 + 2 e- -> 2 Cl-\nnote: bench\n"]],
    ],
    [
      // from memory: Greenwood & Earnshaw, halogens chapter (Cl2 + 2 OH- -> Cl- + ClO- + H2O); quoted and listed
      "a YAML list of quoted equations",
      "reactions:\n  - \"Cl2 + OH- -> Cl- + ClO- + H2O\"\n  - 'N2 + 3 H2 -> 2 NH3'\n",
      "yaml",
      [["equation-unbalanced", "->", "reactions:\n  - \"Cl2 + 2 OH- -> Cl- + ClO- + H2O\"\n  - 'N2 + 3 H2 -> 2 NH3'\n"]],
    ],
    // common practice: a value that is a note, not an equation, says nothing
    ["a note under an equation key", '{"equation": "see page 4"}', "json", []],
  ])("%s", (_, text, kind, expected) => {
    const found = summary(text, kind);
    expect(found).toEqual(expected);
    // The fixed document still parses to the same shape.
    for (const [, , after] of found) {
      if (kind === "json") expect(() => JSON.parse(after)).not.toThrow();
      else expect(Object.keys(parseYaml(after) as object)).toEqual(Object.keys(parseYaml(text) as object));
    }
  });
});

describe("correct files in the styles other people write stay quiet", () => {
  const FIXTURES = join(__dirname, "..", "fixtures", "fix-safety");
  it.each<[string, DocumentKind, number, string, string]>([
    // from memory: CRC Handbook of Chemistry and Physics, electrochemical series (handbook charges, "=", glued
    // electrons); the dropped coefficient is the 8 of 8H+ in the permanganate couple
    ["handbook-reduction-potentials.tsv", "tsv", 11, "MnO4- + 8H+", "MnO4- + H+"],
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 4 and 19 (a student's exported lab report)
    ["student-lab-report.json", "json", 5, "CaCO3(s) + 2 HCl(aq)", "CaCO3(s) + HCl(aq)"],
    // from memory: Zumdahl, Chemistry, ch. 18 (permanganate and oxalate; iron(II) oxidised)
    ["titration-log.yaml", "yaml", 3, "2 MnO4- + 5 C2O4^2-", "2 MnO4- + C2O4^2-"],
    // from memory: Greenwood & Earnshaw (contact process, Haber process); Housecroft & Sharpe (Ostwald process)
    ["run-log-export.csv", "csv", 5, "4 NH3 + 5 O2", "4 NH3 + O2"],
  ])("%s: every equation is read, none is flagged; a dropped coefficient is", (name, kind, count, written, dropped) => {
    const text = readFileSync(join(FIXTURES, name), "utf8");
    const model = analyzeDocument(text, kind);
    expect(model.reactions).toHaveLength(count);
    expect(equationFindings(text, kind)).toEqual([]);
    const broken = text.replace(written, dropped);
    const found = equationFindings(broken, kind);
    expect(found.map((finding) => finding.code)).toEqual(["equation-unbalanced"]);
    expect(fixed(broken, found[0])).toBe(text);
  });
});

describe("the example workspace", () => {
  it("shows only the two equations wrong on purpose", () => {
    const root = join(__dirname, "..", "..", "examples");
    const found: string[] = [];
    const visit = (folder: string): void => {
      for (const entry of readdirSync(folder)) {
        const path = join(folder, entry);
        if (statSync(path).isDirectory()) visit(path);
        else {
          const kind = documentKindFor(path);
          if (!kind) continue;
          const text = readFileSync(path, "utf8");
          for (const finding of equationFindings(text, kind)) found.push(`${entry} ${finding.code} ${fixed(text, finding).length > 0}`);
        }
      }
    };
    visit(root);
    // common practice: run-16 carries two deliberate mistakes (a missing 2 F-, a missing 2 SO3^2-)
    expect(found).toEqual([
      "run-16-scrubber-chemistry.md equation-unbalanced true",
      "run-16-scrubber-chemistry.md equation-unbalanced true",
    ]);
  });
});
