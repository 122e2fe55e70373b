/**
 * JSON and YAML records: every cell's range covers exactly its written value, and malformed
 * documents give problems with ranges instead of exceptions.
 */
import { describe, expect, it } from "vitest";
import { parse as parseJson } from "jsonc-parser/lib/esm/main.js";
import { parse as parseYaml } from "yaml";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import type { DocumentKind, DocumentModel } from "../../shared/src/document/types";

/** Every record as species text plus [meaning, written text] of each cell, read back from the ranges. */
function recordsReadBack(text: string, kind: DocumentKind): [string, [string, string][]][] {
  const model: DocumentModel = analyzeDocument(text, kind);
  return model.records.map((record) => {
    expect(text.slice(record.species.range.start, record.species.range.end)).toBe(record.species.text);
    return [record.species.text, record.cells.map((cell) => [cell.meaning, text.slice(cell.range.start, cell.range.end)])];
  });
}

const JSON_TEXT = `{
  // comments are allowed in lab files
  "records": [
    { "formula": "SF4", "valence electrons": 34, "shape": "seesaw", "polar": true },
    { "formula" : "NH4+",  "bond angle":109.5, "note": "ignored" },
  ],
  "by species": { "XeF2": { "LP": 3 }, "notes": { "text": "not a species" } }
}`;

const YAML_TEXT = `# ions
- formula: NH4+
  valence electrons: 8
  shape: "tetrahedral"
- formula: 'SO4^2-'
  polar: no   # sulfate is symmetric
---
XeF4:
  shape: square planar
  lone pairs: 2
`;

describe("JSON records", () => {
  it("gives exact ranges for arrays of objects and objects keyed by species", () => {
    expect(recordsReadBack(JSON_TEXT, "json")).toEqual([
      [
        "SF4",
        [
          ["valenceElectrons", "34"],
          ["molecularGeometry", "seesaw"],
          ["polarity", "true"],
        ],
      ],
      ["NH4+", [["bondAngle", "109.5"]]],
      ["XeF2", [["lonePairs", "3"]]],
    ]);
  });

  it("reads the same values jsonc-parser does", () => {
    // source: jsonc-parser npm package (its plain value parser)
    const parsed = parseJson(JSON_TEXT, [], { allowTrailingComma: true }) as { records: Record<string, unknown>[] };
    const model = analyzeDocument(JSON_TEXT, "json");
    expect(model.records[0].cells.map((cell) => cell.text)).toEqual(
      ["valence electrons", "shape", "polar"].map((key) => String(parsed.records[0][key])),
    );
  });

  it.each([
    ['{"formula": "SF4", "shape": }', 1],
    ['[{"formula": "SF4"', 1],
    ["{formula: SF4}", 1],
    ["", 1],
  ])("turns malformed %j into problems with ranges", (text, atLeast) => {
    const model = analyzeDocument(text, "json");
    expect(model.problems.length).toBeGreaterThanOrEqual(atLeast);
    for (const problem of model.problems) {
      expect(problem.code).toBe("json-syntax");
      expect(problem.range.start).toBeGreaterThanOrEqual(0);
      expect(problem.range.end).toBeLessThanOrEqual(text.length);
    }
  });
});

describe("YAML records", () => {
  it("gives exact ranges inside quotes and before comments, across documents", () => {
    expect(recordsReadBack(YAML_TEXT, "yaml")).toEqual([
      [
        "NH4+",
        [
          ["valenceElectrons", "8"],
          ["molecularGeometry", "tetrahedral"],
        ],
      ],
      ["SO4^2-", [["polarity", "no"]]],
      [
        "XeF4",
        [
          ["molecularGeometry", "square planar"],
          ["lonePairs", "2"],
        ],
      ],
    ]);
  });

  it("reads the same values the yaml package does", () => {
    // source: yaml npm package (parse of the first document)
    const parsed = parseYaml(YAML_TEXT.split("---")[0]) as Record<string, unknown>[];
    const model = analyzeDocument(YAML_TEXT, "yaml");
    expect(model.records[0].species.text).toBe(parsed[0].formula);
    expect(model.records[0].cells[1].text).toBe(parsed[0].shape);
  });

  it.each(["formula: [SF4\nshape: x", "a: b: c", "- formula: 'NF3\n", "key: value\n\tbad: tab"])(
    "turns malformed %j into problems with ranges",
    (text) => {
      const model = analyzeDocument(text, "yaml");
      expect(model.problems.length).toBeGreaterThan(0);
      for (const problem of model.problems) {
        expect(problem.code).toBe("yaml-syntax");
        expect(problem.range.end).toBeLessThanOrEqual(text.length);
      }
    },
  );
});
