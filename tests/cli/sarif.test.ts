// `lonepair check --format sarif`: the log validates against the SARIF 2.1.0 JSON schema and
// carries rules, levels, relative URIs, UTF-16 columns and fixes.
// source: SARIF 2.1.0 JSON schema (OASIS standard), as shipped in the npm package
// @microsoft/jest-sarif 1.0.0-beta.0 (lib/schemas/sarif-2.1.0-rtm.5.json), kept as
// tests/fixtures/sarif-schema-2.1.0.json with its draft-04 header written as draft-07 ("id" -> "$id").
import Ajv from "ajv";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const schema = JSON.parse(readFileSync(join(repositoryRoot, "tests", "fixtures", "sarif-schema-2.1.0.json"), "utf8"));
// Formats are not checked (ajv-formats is not installed); the schema's language pattern is only
// valid without the unicode flag.
const validate = new Ajv({ strict: false, validateFormats: false, unicodeRegExp: false, allErrors: true }).compile(schema);

function sarifOf(...paths: string[]) {
  const run = runCli(["check", "--format", "sarif", ...paths]);
  return { run, log: JSON.parse(run.stdout) };
}

describe("check --format sarif", () => {
  it.each([["examples"], ["tests/fixtures/cli"], ["tests/fixtures/cli/clean-notes.txt"]])("is a valid SARIF 2.1.0 log for %s", (path) => {
    const { log } = sarifOf(path);
    const valid = validate(log);
    expect(validate.errors ?? []).toEqual([]);
    expect(valid).toBe(true);
  });

  it("the schema rejects a log with a wrong level, so the check above can fail", () => {
    const { log } = sarifOf("examples");
    log.runs[0].results[0].level = "information";
    expect(validate(log)).toBe(false);
  });

  it("has one run by lonepair with a rule for each code used, and UTF-16 columns", () => {
    const { run, log } = sarifOf("examples");
    expect(run.status).toBe(1);
    expect(log.version).toBe("2.1.0");
    expect(log.runs).toHaveLength(1);
    const [only] = log.runs;
    expect(only.columnKind).toBe("utf16CodeUnits");
    expect(only.tool.driver.name).toBe("lonepair");
    expect(only.tool.driver.version).toBe(JSON.parse(readFileSync(join(repositoryRoot, "package.json"), "utf8")).version);
    const ruleIds = only.tool.driver.rules.map((rule: { id: string }) => rule.id);
    expect(new Set(ruleIds)).toEqual(new Set(only.results.map((result: { ruleId: string }) => result.ruleId)));
    expect(ruleIds.sort()).toEqual([
      "equation-unbalanced",
      "ionic-solid",
      "octet-exceeded",
      "table-molecular-geometry",
      "table-name-formula",
      "table-valence-electrons",
      "transition-metal-centre",
    ]);
    for (const result of only.results) expect(only.tool.driver.rules[result.ruleIndex].id).toBe(result.ruleId);
  });

  it("maps severities to levels and places results by relative URI and 1-based region", () => {
    const { log } = sarifOf("examples");
    const results = log.runs[0].results;
    const levels = Object.fromEntries(results.map((result: { ruleId: string; level: string }) => [result.ruleId, result.level]));
    expect(levels).toEqual({
      "table-valence-electrons": "warning",
      "table-molecular-geometry": "warning",
      "table-name-formula": "warning",
      "octet-exceeded": "error",
      "transition-metal-centre": "note",
      "equation-unbalanced": "error",
      "ionic-solid": "note",
    });
    const ch5 = results.find((result: { ruleId: string }) => result.ruleId === "octet-exceeded");
    expect(ch5.locations[0].physicalLocation).toEqual({
      artifactLocation: { uri: "examples/inventory/cylinders.csv" },
      region: { startLine: 15, startColumn: 17, endLine: 15, endColumn: 20 },
    });
    expect(ch5.fixes).toBeUndefined();
    const nf3 = results.find((result: { ruleId: string; message: { text: string } }) => result.message.text.includes("NF3"));
    // common practice: NF3 has 5 + 3 x 7 = 26 valence electrons
    expect(nf3.fixes).toEqual([
      {
        description: { text: "Change to 26" },
        artifactChanges: [
          {
            artifactLocation: { uri: "examples/inventory/cylinders.csv" },
            replacements: [
              { deletedRegion: { startLine: 4, startColumn: 34, endLine: 4, endColumn: 36 }, insertedContent: { text: "26" } },
            ],
          },
        ],
      },
    ]);
  });
});
