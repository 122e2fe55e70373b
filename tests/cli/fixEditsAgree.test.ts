// The fixes `check --format json` and `--format sarif` report are the edits `check --fix` makes:
// an equation's coefficients one edit each, never the whole equation retyped. Applying the
// reported edits to a copy of each file gives, byte for byte, what `check --fix` writes.
import { cpSync, mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const FIXTURES = join(repositoryRoot, "tests", "fixtures", "equation-fixes");
const FILES = readdirSync(FIXTURES).sort();

/** A placed edit, as both formats give it: 1-based lines and UTF-16 columns, end exclusive. */
interface PlacedEdit {
  readonly line: number;
  readonly column: number;
  readonly endLine: number;
  readonly endColumn: number;
  readonly newText: string;
}

interface JsonFinding {
  readonly file: string;
  readonly code: string;
  readonly fix?: { readonly title: string; readonly edits: readonly PlacedEdit[] };
}

interface SarifRegion {
  readonly startLine: number;
  readonly startColumn: number;
  readonly endLine: number;
  readonly endColumn: number;
}

interface SarifResult {
  readonly ruleId: string;
  readonly fixes?: readonly {
    readonly artifactChanges: readonly {
      readonly artifactLocation: { readonly uri: string };
      readonly replacements: readonly { readonly deletedRegion: SarifRegion; readonly insertedContent: { readonly text: string } }[];
    }[];
  }[];
}

function copyOfFixtures(): string {
  const folder = mkdtempSync(join(tmpdir(), "lonepair-fix-edits-"));
  cpSync(FIXTURES, folder, { recursive: true });
  return folder;
}

/** Fixes per file name, each a list of edits, from the JSON report. */
function jsonFixes(folder: string): Map<string, PlacedEdit[][]> {
  const findings = JSON.parse(runCli(["check", "--format", "json", "."], folder).stdout) as JsonFinding[];
  const fixes = new Map<string, PlacedEdit[][]>();
  for (const finding of findings) {
    if (!finding.fix) continue;
    fixes.set(finding.file, [...(fixes.get(finding.file) ?? []), [...finding.fix.edits]]);
  }
  return fixes;
}

/** Fixes per file name, each a list of edits, from the SARIF log. */
function sarifFixes(folder: string): Map<string, PlacedEdit[][]> {
  const log = JSON.parse(runCli(["check", "--format", "sarif", "."], folder).stdout);
  const fixes = new Map<string, PlacedEdit[][]>();
  for (const result of log.runs[0].results as SarifResult[]) {
    for (const fix of result.fixes ?? []) {
      for (const change of fix.artifactChanges) {
        const edits = change.replacements.map(({ deletedRegion: region, insertedContent }) => ({
          line: region.startLine,
          column: region.startColumn,
          endLine: region.endLine,
          endColumn: region.endColumn,
          newText: insertedContent.text,
        }));
        const file = decodeURIComponent(change.artifactLocation.uri);
        fixes.set(file, [...(fixes.get(file) ?? []), edits]);
      }
    }
  }
  return fixes;
}

/**
 * `text` with `fixes` applied the way a consumer of the report would: positions are in the file
 * as read (a byte-order mark is not a column), fixes in document order, and a fix that overlaps
 * one already taken is left out, as `check --fix` leaves it.
 */
function applied(text: string, fixes: readonly PlacedEdit[][]): string {
  const bom = text.startsWith("\ufeff") ? "\ufeff" : "";
  const body = text.slice(bom.length);
  const lineStarts = [0];
  for (const match of body.matchAll(/\r\n|\r|\n/g)) lineStarts.push(match.index! + match[0].length);
  const offset = (line: number, column: number): number => lineStarts[line - 1] + column - 1;
  const placed = fixes
    .map((edits) =>
      edits.map((edit) => ({ start: offset(edit.line, edit.column), end: offset(edit.endLine, edit.endColumn), newText: edit.newText })),
    )
    .sort((a, b) => a[0].start - b[0].start);
  const taken: { start: number; end: number; newText: string }[] = [];
  let coveredTo = -1;
  for (const edits of placed) {
    if (edits[0].start < coveredTo) continue;
    taken.push(...edits);
    coveredTo = edits[edits.length - 1].end;
  }
  let result = "";
  let copied = 0;
  for (const edit of taken) {
    result += body.slice(copied, edit.start) + edit.newText;
    copied = edit.end;
  }
  return bom + result + body.slice(copied);
}

describe("reported fixes are the edits check --fix makes", () => {
  const reported = copyOfFixtures();
  const fixed = copyOfFixtures();
  let byJson: Map<string, PlacedEdit[][]>;
  let bySarif: Map<string, PlacedEdit[][]>;

  beforeAll(() => {
    byJson = jsonFixes(reported);
    bySarif = sarifFixes(reported);
    runCli(["check", "--fix", "."], fixed);
  });

  it.each(FILES)("%s: applying the JSON edits gives the fixed file", (name) => {
    const before = readFileSync(join(reported, name), "utf8");
    const after = readFileSync(join(fixed, name), "utf8");
    // Every fixture has something to fix, so the comparison below compares a change.
    expect(after).not.toBe(before);
    expect(applied(before, byJson.get(name) ?? [])).toBe(after);
  });

  it.each(FILES)("%s: applying the SARIF replacements gives the fixed file", (name) => {
    const before = readFileSync(join(reported, name), "utf8");
    expect(applied(before, bySarif.get(name) ?? [])).toBe(readFileSync(join(fixed, name), "utf8"));
  });

  it("an equation's fix is one edit per coefficient, each a number written or removed", () => {
    const findings = JSON.parse(runCli(["check", "--format", "json", "run-31-etch-byproducts.md"], reported).stdout) as JsonFinding[];
    const text = readFileSync(join(reported, "run-31-etch-byproducts.md"), "utf8").split("\n");
    const equations = findings.filter((finding) => finding.code === "equation-unbalanced");
    const summary = equations.map((finding) =>
      finding.fix!.edits.map((edit) => [text[edit.line - 1].slice(edit.column - 1, edit.endColumn - 1), edit.newText]),
    );
    expect(summary).toEqual([
      // from memory: Zumdahl, Chemistry, ch. 3 (Fe2O3 + 3 CO -> 2 Fe + 3 CO2)
      [
        ["", "3 "],
        ["", "2 "],
        ["", "3 "],
      ],
      // from memory: Tro, Chemistry: A Molecular Approach, ch. 3 (C3H8 + 5 O2 -> 3 CO2 + 4 H2O)
      [
        ["", "5 "],
        ["", "3 "],
        ["", "4 "],
      ],
      // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 3 (2 KClO3 -> 2 KCl + 3 O2)
      [["", "2 "]],
      // from memory: Zumdahl, ch. 3 (CH4 + 2 O2 -> CO2 + 2 H2O): the doubled 2 is removed, nothing else
      [["2 ", ""]],
      // from memory: Tro, ch. 4 (Mg + 2 HCl -> MgCl2 + H2)
      [["", "2 "]],
      // from memory: Zumdahl, ch. 3 (2 H2 + O2 -> 2 H2O), written glued as the writer did
      [["", "2"]],
    ]);
  });
});
