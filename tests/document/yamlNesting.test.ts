/**
 * YAML nested deep enough to exhaust the parser's stack is refused before it is parsed: one clear
 * problem, and the process stays healthy for the next document (an overflow inside the parser
 * once left it to fail outright on a later file).
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import { createDocumentAnalyser } from "../../shared/src/document/incrementalAnalysis";
import { chunkedTextOf } from "../../shared/src/document/chunkedText";
import { MAX_YAML_NESTING, yamlNestingBound } from "../../shared/src/document/tables/yaml";
import { ensureBuilt, runCli } from "../cli/cliRunner";

const nestedLines = (depth: number): string => Array.from({ length: depth }, (_, level) => `${"  ".repeat(level)}- `).join("\n") + "SF4\n";

const DEEP: readonly { readonly name: string; readonly text: string }[] = [
  { name: "indicators on one line", text: "- ".repeat(5000) + "SF4\n" },
  { name: "one more indented line per level", text: nestedLines(1200) },
  { name: "levels behind comments at the margin", text: nestedLines(1200).replace(/\n/g, "\n# note\n") },
  { name: "flow brackets", text: "[".repeat(5000) + "]".repeat(5000) + "\n" },
  { name: "flow mappings", text: "{a: ".repeat(3000) + "SF4" + "}".repeat(3000) + "\n" },
  {
    name: "keys nested by indentation",
    text: Array.from({ length: 1200 }, (_, level) => `${" ".repeat(level)}k${level}:`).join("\n") + " SF4\n",
  },
];

describe("YAML nesting bound", () => {
  // common practice: inventories and logs nest a few levels; the bound must not refuse them.
  it.each([
    ["a list of records", "species:\n  - formula: SF4\n    lone pairs: 1\n  - formula: XeF4\n    tags: [lab, shelf 3]\n", 2, 4],
    ["nested mappings", "site:\n  room:\n    shelf:\n      bottle: {formula: NH3, notes: [a, {b: c}]}\n", 4, 7],
    ["a block scalar", "notes: |\n  line one\n  line two\nformula: H2O\n", 1, 3],
  ])("%s stays far below the limit", (_name, text, atLeast, atMost) => {
    const bound = yamlNestingBound(text);
    expect(bound).toBeGreaterThanOrEqual(atLeast);
    expect(bound).toBeLessThanOrEqual(atMost);
  });

  it.each(DEEP)("$name is refused with one clear problem", ({ text }) => {
    expect(yamlNestingBound(text)).toBeGreaterThan(MAX_YAML_NESTING);
    const model = analyzeDocument(text, "yaml");
    expect(model.problems).toHaveLength(1);
    expect(model.problems[0].message).toMatch(/nests deeper than \d+ levels/);
  });

  it("the editor's analyser refuses it the same way, and reads the next version normally", () => {
    const analyser = createDocumentAnalyser("yaml");
    const deep = analyser.analyse(chunkedTextOf(DEEP[1].text));
    expect(deep.findings().map((finding) => finding.message)).toEqual([expect.stringMatching(/nests deeper than/)]);
    const fine = analyser.analyse(chunkedTextOf("- formula: SF4\n  lone pairs: 2\n"));
    // source: VSEPR, from memory: general chemistry texts (SF4 has one lone pair on S)
    expect(fine.findings().some((finding) => finding.code === "table-lone-pairs")).toBe(true);
  });

  it("one command-line run over several deep files finishes with findings, not a crash", () => {
    ensureBuilt();
    const folder = mkdtempSync(join(tmpdir(), "lonepair-deep-yaml-"));
    DEEP.forEach(({ text }, index) => writeFileSync(join(folder, `deep-${index}.yaml`), text));
    const run = runCli(["check", folder]);
    expect(run.stderr).not.toMatch(/out of memory|FATAL/i);
    expect(run.status).toBe(1);
    expect(run.stdout.match(/nests deeper than/g)).toHaveLength(DEEP.length);
  });
});
