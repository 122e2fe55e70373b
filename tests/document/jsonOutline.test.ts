// The JSON opening read, which reads clean JSON in one pass without a syntax tree, gives the model
// and the findings that reading the tree gives, on varied documents: records in a root list or
// under keys, species as keys, equations under equation keys (one string or a list), comments,
// trailing commas, escapes, text outside ASCII, CRLF, deep nesting, and syntax errors anywhere.
import { describe, expect, it } from "vitest";
import { analyzeJsonTree } from "../../shared/src/document/analyzeDocument";
import { memoisedReader } from "../../shared/src/document/speciesReader";
import { parseJsonTree } from "../../shared/src/document/tables/json";
import { jsonOutline } from "../../shared/src/document/tables/jsonOutline";
import {
  analyzeDocument,
  checkDocument,
  chunkedTextOf,
  createDocumentAnalyser,
  speciesAtOffset,
  type DocumentModel,
} from "../../shared/src/index";
import { canonical } from "../support/incrementalCheck";
import { seededRandom } from "../support/seededRandom";

/** The model of `text` read through its syntax tree (the reference). */
function treeModel(text: string): DocumentModel {
  return analyzeJsonTree(text, parseJsonTree(text), memoisedReader());
}

/** The bounds of the record list's elements from the syntax tree: the root list, or the longest list under the root object. */
function treeListBounds(text: string): { starts: number[]; ends: number[] } | undefined {
  const root = parseJsonTree(text).root;
  let list = root?.type === "array" ? root : undefined;
  if (root?.type === "object") {
    for (const property of root.children ?? []) {
      const value = property.children?.[1];
      if (value?.type === "array" && (value.children?.length ?? 0) > (list?.children?.length ?? 0)) list = value;
    }
  }
  const children = list?.children ?? [];
  return list && { starts: children.map((child) => child.offset), ends: children.map((child) => child.offset + child.length) };
}

function expectSameReading(text: string, random: () => number = seededRandom(text.length)): void {
  const expected = treeModel(text);
  const outline = jsonOutline(text, () => false);
  if (outline) {
    const list = outline.list && { starts: [...outline.list.starts], ends: [...outline.list.ends] };
    expect(list).toEqual(treeListBounds(text));
  }
  const model = analyzeDocument(text, "json");
  expect(model).toEqual(expected);
  const findings = canonical([...expected.problems, ...checkDocument(expected)]);
  const analysis = createDocumentAnalyser("json").analyse(chunkedTextOf(text, 4096));
  expect(canonical(analysis.findings())).toEqual(findings);
  // A hover reads the records around its place, cut where the opening read cut the list.
  for (const occurrence of expected.occurrences.filter(() => random() < 0.2)) {
    const offset = occurrence.range.start + Math.floor(random() * (occurrence.range.end - occurrence.range.start + 1));
    expect(analysis.speciesAt(offset)?.range).toEqual(speciesAtOffset(expected, offset)?.range);
  }
}

// common practice: valence electron counts, lone pairs and shapes of the lab's reference gases,
// right and wrong, as JSON records of the Kestrel Ridge reference shelf.
const RECORDS = [
  '{"id": "KR-1", "formula": "SF6", "valence electrons": 48, "molecular geometry": "octahedral"}',
  '{"id": "KR-2", "formula": "NF3", "valence electrons": 24, "lone pairs": 1}',
  '{"id": "KR-3", "name": "ammonia", "formula": "NH3", "molecular geometry": "trigonal planar"}',
  '{"id": "KR-4", "formula": "XeF4", "lone pairs": 2, "verified": true, "note": null}',
  '{"id": "KR-5", "formula": "CH\\u2084", "name": "m\\u00e9thane", "temperature": "25 \u00b0C"}',
  '{"SF4": {"lone pairs": 2}, "BF3": {"molecular geometry": "trigonal pyramidal"}}',
  '{"id": "KR-7", "equation": "SF4 + F2 -> SF6", "formula": "SF4"}',
  '{"id": "KR-8", "reactions": ["N2 + H2 -> NH3", 4, {"formula": "CH5"}, "H2 + O2 -> H2O"]}',
  '{"id": "KR-9", "formula": "ClF3", "tags": ["lab", "shelf"], "valence electrons": 2.8e1}',
  '{"id": "KR-10", "formula": "SO2", "formula": "SO3", "lone pairs": 1} // a key twice',
  '{"id": "KR-11", "formula": "H2O", "lone pairs": 2, /* checked */ "bond angle": 104.5,}',
  '[{"formula": "NO2"}, {"formula": "CO2", "lone pairs": 0}]',
  '{"id": "KR-13", "nested": {"deeper": {"formula": "PCl5", "molecular geometry": "see-saw"}}}',
  '"a string in the list"',
  "17",
  "{}",
];

const BROKEN = [
  '{"id": "KR-40", "formula": "SF6"',
  '{"formula": "NF3" "lone pairs": 1}',
  '{"formula": }',
  "{'formula': 'SF4'}",
  "]",
  '{"a": 1}}',
  "/* open",
];

function randomDocument(random: () => number): string {
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const count = 1 + Math.floor(random() * 40);
  const items = Array.from({ length: count }, () => (random() < 0.03 ? pick(BROKEN) : pick(RECORDS)));
  const list = `[\n    ${items.join(",\n    ")}${random() < 0.2 ? "," : ""}\n  ]`;
  const shape = random();
  let text =
    shape < 0.3
      ? `${list}\n`
      : shape < 0.8
        ? `{\n  "lab": "Kestrel Ridge Analytical",\n  "records": ${list},\n  "short": [${pick(RECORDS)}],\n  "reviewed by": {"formula": "NO2"}\n}\n`
        : `// Kestrel Ridge reference shelf\n{"NF3": {"lone pairs": 1, "valence electrons": 26}, "shelves": ${list}, "more": ${list}}`;
  if (random() < 0.2) text = text.replaceAll("\n", "\r\n");
  if (random() < 0.03) text += pick(BROKEN);
  return text;
}

describe("JSON opening read without a syntax tree", () => {
  it.each(Array.from({ length: 8 }, (_, index) => [index * 60, index * 60 + 60] as const))(
    "random documents %i to %i read as the tree reads them",
    (from, to) => {
      for (let seed = from; seed < to; seed++) {
        const random = seededRandom(seed);
        expectSameReading(randomDocument(random), random);
      }
    },
  );

  it.each([
    ["an empty text", ""],
    ["only a comment", "// nothing yet\n"],
    ["a bare string", '"SF6"'],
    ["two values", '{"formula": "SF6"} {"formula": "NF3"}'],
    ["a list nested 900 deep", `${"[".repeat(900)}{"formula": "SF4", "lone pairs": 2}${"]".repeat(900)}`],
    ["a list nested 1,200 deep", `${"[".repeat(1200)}{"formula": "SF4", "lone pairs": 2}${"]".repeat(1200)}`],
    ["objects nested 1,200 deep", `${'{"a": '.repeat(1200)}{"formula": "SF4"}${"}".repeat(1200)}`],
    [
      "a syntax error after many records",
      `[${Array.from({ length: 300 }, (_, index) => RECORDS[index % 4]).join(",")}, {"formula": "SF6",]`,
    ],
    ["equation keys in camel case", '[{"balancedEquation": "SF4 + F2 -> SF6", "halfReactions": ["Fe3+ + e- -> Fe2+"]}]'],
  ])("%s", (_, text) => {
    expectSameReading(text);
  });
});
