/**
 * `--format sarif`: a SARIF 2.1.0 log with one run. Rules list each code used; results carry the
 * level, the message, the place (URI relative to the working directory, 1-based lines and
 * columns counted in UTF-16 code units, as `columnKind` says) and the fix where there is one.
 */
import type { FindingSeverity } from "../../../../shared/src/index";
import { MODEL_CAUTION } from "../../../../shared/src/index";
import { jsonTerminalSafe } from "../terminalText";
import type { CheckReporter } from "./checkReporter";
import type { LineColumnRange, LocatedFinding } from "./locatedFinding";
import { ruleDescription } from "./ruleDescriptions";

const SARIF_SCHEMA = "https://json.schemastore.org/sarif-2.1.0.json";

/** SARIF levels: information and hints are notes. */
export function sarifLevel(severity: FindingSeverity): "error" | "warning" | "note" {
  return severity === "error" ? "error" : severity === "warning" ? "warning" : "note";
}

/** A relative path as a URI reference: forward slashes, each segment percent-encoded. */
export function relativeUri(displayPath: string): string {
  return displayPath
    .split("/")
    .map((segment) => (segment === ".." || segment === "." ? segment : encodeURIComponent(segment)))
    .join("/");
}

/**
 * A reporter writing one SARIF log to `write` as the findings come: the run's results first,
 * one per line, then the tool with the rules used (JSON does not order an object's members), so
 * a million results never have to be held or made into one string.
 */
export function sarifReporter(write: (text: string) => void, version: string): CheckReporter {
  const rules: string[] = [];
  const ruleIndex = new Map<string, number>();
  // The most severe level each rule was reported at becomes its default.
  const ruleLevel = new Map<string, "error" | "warning" | "note">();
  const rank = { note: 0, warning: 1, error: 2 };
  let written = 0;
  const opening = `{\n  "$schema": ${JSON.stringify(SARIF_SCHEMA)},\n  "version": "2.1.0",\n  "runs": [\n    {\n      "columnKind": "utf16CodeUnits",\n      "results": [`;
  return {
    findings(found) {
      let items = "";
      for (const finding of found) {
        const level = sarifLevel(finding.severity);
        if (!ruleIndex.has(finding.code)) {
          ruleIndex.set(finding.code, rules.length);
          rules.push(finding.code);
        }
        const known = ruleLevel.get(finding.code);
        if (!known || rank[level] > rank[known]) ruleLevel.set(finding.code, level);
        items += `${written === 0 ? `${opening}\n` : ",\n"}        ${JSON.stringify(sarifResult(finding, level, ruleIndex.get(finding.code)!))}`;
        written++;
        if (items.length >= WRITE_CHARACTERS) {
          write(jsonTerminalSafe(items));
          items = "";
        }
      }
      if (items.length > 0) write(jsonTerminalSafe(items));
    },
    end(summary) {
      const tool = {
        driver: {
          name: "lonepair",
          version,
          semanticVersion: version,
          shortDescription: { text: "Lewis structures and VSEPR shapes for the chemical species in lab notes and data tables." },
          fullDescription: {
            text: `Checks species and species tables in markdown, text, LaTeX, AsciiDoc, reStructuredText, CSV/TSV, JSON and YAML. ${MODEL_CAUTION}`,
          },
          rules: rules.map((code) => ({
            id: code,
            name: code,
            shortDescription: { text: ruleDescription(code) },
            defaultConfiguration: { level: ruleLevel.get(code) },
          })),
        },
      };
      // A file that could not be read makes the run unsuccessful, as the exit status says.
      const invocations = [{ executionSuccessful: summary.unreadable === 0 }];
      const indented = (value: object): string => JSON.stringify(value, null, 2).replace(/\n/g, "\n      ");
      write(
        `${written === 0 ? `${opening}]` : "\n      ]"},\n      "invocations": ${indented(invocations)},\n      "tool": ${indented(tool)}\n    }\n  ]\n}\n`,
      );
    },
  };
}

/** Characters of results gathered into one write. */
const WRITE_CHARACTERS = 1 << 20;

function sarifResult(finding: LocatedFinding, level: string, index: number): object {
  const artifactLocation = { uri: relativeUri(finding.file) };
  const result: Record<string, unknown> = {
    ruleId: finding.code,
    ruleIndex: index,
    level,
    message: { text: finding.message },
    locations: [{ physicalLocation: { artifactLocation, region: region(finding) } }],
  };
  // SARIF fixes are proposals: the one `--fix` applies, then those left for the reader to choose.
  const fixes = [...(finding.fix ? [finding.fix] : []), ...(finding.choices ?? [])];
  if (fixes.length > 0) {
    result.fixes = fixes.map((fix) => ({
      description: { text: fix.title },
      // One replacement per edit (an equation's coefficients one by one), regions as the file was read.
      artifactChanges: [
        {
          artifactLocation,
          replacements: fix.edits.map((edit) => ({ deletedRegion: region(edit), insertedContent: { text: edit.newText } })),
        },
      ],
    }));
  }
  return result;
}

function region(range: LineColumnRange): object {
  return { startLine: range.line, startColumn: range.column, endLine: range.endLine, endColumn: range.endColumn };
}
