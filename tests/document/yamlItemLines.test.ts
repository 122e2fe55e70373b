// The YAML opening read, which builds long runs of one-line flow mappings itself rather than
// through the `yaml` package's full parse, gives the documents, the findings and the editor's
// findings that the package's own parse of the whole text gives, on varied documents: anchors and
// aliases, flow lists, several documents, comments, CRLF, tabs in strings, text outside ASCII,
// nesting past the limit, syntax errors in the middle, and every character written in a scalar.
import { describe, expect, it } from "vitest";
import { parseAllDocuments, type Document } from "yaml";
import { analyzeYamlStream } from "../../shared/src/document/analyzeDocument";
import { checkDocument } from "../../shared/src/document/checkDocument";
import { memoisedReader } from "../../shared/src/document/speciesReader";
import { MAX_YAML_NESTING, parseYamlStream, yamlNestingBound } from "../../shared/src/document/tables/yaml";
import { analyzeDocument, chunkedTextOf, createDocumentAnalyser, type Finding } from "../../shared/src/index";
import { canonical } from "../support/incrementalCheck";
import { seededRandom } from "../support/seededRandom";

/** The package's parse of the whole text, as the reader made it before (the reference). */
function wholeParse(text: string): Document.Parsed[] | undefined {
  if (yamlNestingBound(text) > MAX_YAML_NESTING) return undefined;
  try {
    return parseAllDocuments(text, { prettyErrors: false, keepSourceTokens: false }) as Document.Parsed[];
  } catch {
    return undefined;
  }
}

/** A node tree as plain data: each node's class and every own property, nodes inside included. */
function plainNode(value: unknown): unknown {
  // The merge key's value is a symbol made afresh by each parse.
  if (typeof value === "symbol") return `symbol ${value.description}`;
  if (value === null || typeof value !== "object") return value;
  if (Array.isArray(value)) return value.map(plainNode);
  const plain: Record<string, unknown> = { class: (value as object).constructor?.name };
  for (const [key, inner] of Object.entries(value)) plain[key] = plainNode(inner);
  return plain;
}

function plainDocuments(documents: readonly Document.Parsed[] | undefined): unknown {
  return documents?.map((document) => ({
    contents: plainNode(document.contents),
    range: document.range,
    errors: document.errors.map((error) => [error.code, error.pos, error.message]),
    warnings: document.warnings.map((warning) => [warning.code, warning.pos, warning.message]),
    commentBefore: document.commentBefore,
    comment: document.comment,
  }));
}

/** The findings of the whole text read from the package's whole parse (the plain path). */
function wholeFindings(text: string): Finding[] {
  const documents = wholeParse(text);
  const model = documents ? analyzeYamlStream(text, documents, memoisedReader()) : analyzeDocument(text, "yaml");
  return canonical([...model.problems, ...checkDocument(model)]);
}

/** What the opening read must agree on with the plain path: documents, findings, the editor's findings. */
function expectSameReading(text: string): void {
  expect(plainDocuments(parseYamlStream(text))).toEqual(plainDocuments(wholeParse(text)));
  const expected = wholeFindings(text);
  const model = analyzeDocument(text, "yaml");
  expect(canonical([...model.problems, ...checkDocument(model)])).toEqual(expected);
  // The editor reads nothing of a text with a NUL in it (it looks binary).
  if (!text.includes("\u0000"))
    expect(canonical(createDocumentAnalyser("yaml").analyse(chunkedTextOf(text, 4096)).findings())).toEqual(expected);
}

// common practice: valence electron counts, lone pairs and shapes of the lab's reference gases,
// right and wrong, as flow-mapping records of the Kestrel Ridge reference shelf.
const RECORD_LINES = [
  "{id: KR-1, formula: SF6, valence electrons: 48, molecular geometry: octahedral}",
  "{id: KR-2, formula: NF3, valence electrons: 24, lone pairs: 1}",
  "{id: KR-3, name: ammonia, formula: NH3, molecular geometry: trigonal planar}",
  "{id: KR-4, formula: XeF4, lone pairs: 2, molecular geometry: square planar}",
  "{id: KR-5, formula: ClF3, valence electrons: 28, charge: -1}",
  "{id: KR-6, formula: SO2, bond angle: 119.5, verified: true, note: null}",
  "{id: KR-7, formula: CH4, valence electrons: 0x08, mass: 1.6e1, shelf: +3}",
  "{id: KR-8, name: méthane, formula: CH₄, temperature: 25 °C, analyst: Dana Ó Briain}",
  "{id: KR-9, formula: H2O, lone pairs: 2, Lone pairs: 1}",
  "{id: KR-10, formula: BF3, molecular geometry: trigonal pyramidal, 1: one, 2: two}",
  "{id: KR-11, formula: PCl5, shape: trigonal bipyramidal (sp3d), ratio: 3/2}",
  "{id: KR-12, formula: SF4, bond angles: 102 and 173, checked by: Lee-Ann}",
  "{Id: KR-13, Formula: NO2, Valence electrons: 17, True: yes}",
  "{id: KR-14, formula: CO2, lone pairs: 0, 0: 0.0, .5: x}",
];

/** Keys that repeat (by their value): an error the package reports. */
const DUPLICATE_KEY_LINES = [
  "- {id: KR-15, formula: H2O, lone pairs: 2, lone pairs: 1}",
  "- {id: KR-16, formula: BF3, 1: one, 01: two}",
  "- {id: KR-17, formula: CH4, 0x10: a, 16: b}",
];

/** Lines that are not one-line flow mappings of plain scalars: read by the package. */
const OTHER_LINES = [
  "- formula: SF6\n  valence electrons: 46",
  '- {id: KR-20, formula: "NF3", note: "tab\tinside"}',
  "- {id: KR-21, formula: NH3} # counted twice",
  "- &kr22 {id: KR-22, formula: XeF4, lone pairs: 1}",
  "- *kr22",
  "- [SF6, NF3, CH5]",
  "- {id: KR-23, formula: SF4,\n   lone pairs: 1}",
  "- {id: KR-24, tags: [lab, shelf]}",
  "- { id: KR-25, formula: CH4 }",
  "- {id: KR-26,formula: H2O}",
  "- {id: KR-27, formula: 'SO3'}",
  "- notes: |\n    - {id: KR-28, formula: CH5}\n    - {id: KR-29, formula: NH5}\n    - {id: KR-30, formula: SF6}",
  "# a comment between records",
  "",
  "- {id: KR-31, formula: SF6, valence electrons: 48}   ",
  "- {id: KR-32, formula: CO2, note: a  b}",
];

/** Lines that break the YAML where they stand. */
const BROKEN_LINES = [
  "- {id: KR-40, formula: SF6",
  '- {id: KR-41, formula: "NF3}',
  "  bad: : :",
  "\t- {id: KR-42, formula: NH3}",
  "- {a: b}}",
];

function randomDocument(random: () => number): string {
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const indent = pick(["", "  ", "    "]);
  const lines: string[] = [];
  if (random() < 0.3) lines.push("# Kestrel Ridge Analytical reference shelf");
  if (random() < 0.15) lines.push("---");
  if (random() < 0.2) lines.push("defaults: &defaults {lab: Kestrel Ridge Analytical, formula: SF6}");
  if (indent !== "" || random() < 0.5) lines.push(indent === "" ? "records:" : `${pick(["records", "shelf", "equations"])}:`);
  const count = 5 + Math.floor(random() * 60);
  for (let index = 0; index < count; index++) {
    const roll = random();
    const line =
      roll < 0.82
        ? `- ${pick(RECORD_LINES)}`
        : roll < 0.97
          ? pick(OTHER_LINES)
          : roll < 0.98
            ? pick(DUPLICATE_KEY_LINES)
            : roll < 0.99
              ? pick(BROKEN_LINES)
              : "---";
    lines.push(line.replace(/^(?=.)/gm, indent));
  }
  if (random() < 0.3) lines.push("reviewed by: Dana", "merged: {<<: *defaults}");
  if (random() < 0.15)
    lines.push("...", "---", "- {id: KR-50, formula: SF6}", "- {id: KR-51, formula: NF3}", "- {id: KR-52, formula: CH5}");
  let text = lines.join("\n") + (random() < 0.8 ? "\n" : "");
  if (random() < 0.25) text = text.replaceAll("\n", "\r\n");
  if (random() < 0.05) text = `%YAML 1.1\n---\n${text}`;
  return text;
}

describe("YAML opening read of one-line flow mappings", () => {
  it.each(Array.from({ length: 12 }, (_, index) => [index * 50, index * 50 + 50] as const))(
    "random documents %i to %i read as the package reads them",
    (from, to) => {
      for (let seed = from; seed < to; seed++) expectSameReading(randomDocument(seededRandom(seed)));
    },
  );

  it.each([
    ["a run split by a syntax error in its middle", 40, "  - {id: KR-40, formula: SF6\n", 20],
    ["a run split by a record with a block scalar", 40, "  - notes: |\n      - {id: KR-1, formula: CH5}\n", 15],
    ["a run broken by a line at the wrong column", 30, "   - {id: KR-43, formula: SF6}\n", 10],
  ] as const)("%s", (_, count, inserted, at) => {
    const records = Array.from({ length: count }, (_, index) => `  - ${RECORD_LINES[index % RECORD_LINES.length]}\n`);
    records.splice(at, 0, inserted);
    const text = `lab: Kestrel Ridge Analytical\nrecords:\n${records.join("")}`;
    expectSameReading(text);
  });

  it("a syntax error in the middle of a long run is reported once, at its place, and the rest is still checked", () => {
    // common practice: SF6 has 48 valence electrons; 46 is wrong.
    const records = Array.from(
      { length: 300 },
      (_, index) => `  - {id: REF-${index}, formula: SF6, valence electrons: ${index === 250 ? 46 : 48}}`,
    );
    records[120] = "  - {id: REF-120, formula: SF6, valence electrons: 48";
    const text = `lab: Kestrel Ridge Analytical\nrecords:\n${records.join("\n")}\n`;
    expectSameReading(text);
    const findings = canonical(createDocumentAnalyser("yaml").analyse(chunkedTextOf(text, 4096)).findings());
    const syntax = findings.filter((finding) => finding.code === "yaml-syntax");
    expect(syntax).toHaveLength(1);
    // The package reports the unclosed mapping where the next record's dash shows it was left open.
    const brokenLine = text.indexOf("  - {id: REF-120,");
    const nextLineEnd = text.indexOf("\n", text.indexOf("\n", brokenLine) + 1);
    expect(syntax[0].range.start).toBeGreaterThanOrEqual(brokenLine);
    expect(syntax[0].range.start).toBeLessThan(nextLineEnd);
    // The wrong count 130 records further on is still found.
    const wrong = text.indexOf("valence electrons: 46") + "valence electrons: ".length;
    expect(findings.filter((finding) => finding.code === "table-valence-electrons").map((finding) => finding.range.start)).toEqual([wrong]);
  });

  it("nesting past the limit is refused as before", () => {
    const deep = `records:\n${Array.from({ length: 10 }, () => "  - {id: KR-1, formula: SF6}\n").join("")}${"[".repeat(MAX_YAML_NESTING + 5)}${"]".repeat(MAX_YAML_NESTING + 5)}\n`;
    expect(parseYamlStream(deep)).toBeUndefined();
    expectSameReading(deep);
  });

  it("a long list written by a script reads as the package reads it", () => {
    const records = Array.from(
      { length: 2000 },
      (_, index) => `  - ${RECORD_LINES[(index * 7) % RECORD_LINES.length].replace(/KR-\d+/, `REF-${index}`)}`,
    );
    expectSameReading(`lab: Kestrel Ridge Analytical\nrecords:\n${records.join("\n")}\nreviewed by: Dana\n`);
  });

  // Every character of the Basic Multilingual Plane below U+0800, and a seeded sample above it,
  // written first, inside and last in a key and in a value of a record in the middle of a run.
  const sample = seededRandom(16);
  const codePoints = [
    ...Array.from({ length: 0x800 }, (_, code) => code),
    ...[0x2000, 0x2007, 0x200b, 0x2028, 0x2029, 0x202f, 0x3000, 0xd800, 0xdfff, 0xfeff, 0xfffe, 0xffff],
    ...Array.from({ length: 1500 }, () => 0x800 + Math.floor(sample() * (0x10000 - 0x800))),
  ];
  it.each(Array.from({ length: Math.ceil(codePoints.length / 400) }, (_, index) => [index * 400] as const))(
    "characters from number %i of the sweep read as the package reads them",
    (from) => {
      for (const code of codePoints.slice(from, from + 400)) {
        const character = String.fromCharCode(code);
        for (const middle of [
          `{id: KR-2, ${character}name: a${character}b, formula: SF6}`,
          `{id: KR-2, na${character}me: ${character}x, formula: NF${character}}`,
          `{id${character}: KR-2, name: x ${character}, formula: SF6}`,
        ]) {
          expectSameReading(`records:\n  - {id: KR-1, formula: SF6}\n  - ${middle}\n  - {id: KR-3, formula: NH3}\n`);
        }
      }
    },
  );
});
