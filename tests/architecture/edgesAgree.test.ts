/**
 * Every edge gives the same answer on the same input. One set of documents (markdown with
 * `smiles:` spans and cis/trans SMILES, CSV, JSON, YAML and a tab-separated table saved as .txt)
 * goes through the language server (what every editor, the VS Code client included, shows) and
 * through the command line; their findings, summary tables and coordinates must agree.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DiagnosticSeverity, type Diagnostic } from "vscode-languageserver-protocol/node";
import type { CoordinatesResult, ShapeModelResult, SummaryTableResult } from "../../shared/src/editorRequests";
import { ensureBuilt, repositoryRoot, runCli } from "../cli/cliRunner";
import { startSession, type LspSession } from "../server/lspSession";

const FOLDER = join(repositoryRoot, "tests", "fixtures", "edges");

/** Each document with the language id an editor without extra extensions gives it. */
const DOCUMENTS = [
  ["run-16-isomers.md", "markdown"],
  ["cylinders.csv", "plaintext"],
  ["species.json", "json"],
  ["ions.yaml", "yaml"],
  ["gas-list.txt", "plaintext"],
] as const;

const SEVERITY_NAMES: Record<number, string> = {
  [DiagnosticSeverity.Error]: "error",
  [DiagnosticSeverity.Warning]: "warning",
  [DiagnosticSeverity.Information]: "information",
  [DiagnosticSeverity.Hint]: "hint",
};

interface Located {
  readonly line: number;
  readonly column: number;
  readonly code: string;
  readonly severity: string;
}

function sorted(items: Located[]): string[] {
  return items.map((item) => `${item.line}:${item.column} ${item.severity} ${item.code}`).sort();
}

let session: LspSession;
const uriOf = (name: string): string => pathToFileURL(join(FOLDER, name)).toString();

beforeAll(async () => {
  ensureBuilt();
  session = await startSession();
  for (const [name, languageId] of DOCUMENTS) session.open(uriOf(name), languageId, readFileSync(join(FOLDER, name), "utf8"));
});

afterAll(async () => {
  await session?.stop();
});

describe("the language server and the command line agree", () => {
  it.each(DOCUMENTS)("on the findings in %s", async (name) => {
    const pushed = await session.waitForDiagnostics(uriOf(name));
    const fromServer = pushed.diagnostics.map((diagnostic: Diagnostic) => ({
      line: diagnostic.range.start.line + 1,
      column: diagnostic.range.start.character + 1,
      code: String(diagnostic.code),
      severity: SEVERITY_NAMES[diagnostic.severity ?? DiagnosticSeverity.Error],
    }));
    const run = runCli(["check", "--format", "json", join(FOLDER, name)]);
    const fromCli = (JSON.parse(run.stdout) as Located[]).map(({ line, column, code, severity }) => ({ line, column, code, severity }));
    expect(fromServer.length).toBeGreaterThan(0);
    expect(sorted(fromServer)).toEqual(sorted(fromCli));
  });

  it.each(DOCUMENTS)("on the summary table of %s", async (name) => {
    const fromServer = await session.connection.sendRequest<SummaryTableResult>("lonepair/summaryTable", {
      uri: uriOf(name),
      format: "csv",
    });
    const run = runCli(["table", "--format", "csv", join(FOLDER, name)]);
    expect(fromServer.text.split(/\r?\n/).length).toBeGreaterThan(2);
    expect(fromServer.text).toBe(run.stdout);
  });

  it.each([
    ["cis", "F/C=C\\F"],
    ["trans", "F/C=C/F"],
  ])("on the coordinates of the %s isomer", async (_isomer, smiles) => {
    const text = readFileSync(join(FOLDER, "run-16-isomers.md"), "utf8");
    const offset = text.indexOf(smiles) + 2;
    const before = text.slice(0, offset).split("\n");
    const fromServer = await session.connection.sendRequest<CoordinatesResult | null>("lonepair/coordinates", {
      uri: uriOf("run-16-isomers.md"),
      position: { line: before.length - 1, character: before[before.length - 1].length },
      format: "xyz",
    });
    const run = runCli(["coords", `smiles:${smiles}`]);
    expect(run.status).toBe(0);
    expect(fromServer?.file?.text).toBe(run.stdout);
  });

  it.each([
    ["cis", "F/C=C\\F"],
    ["trans", "F/C=C/F"],
  ])("on the 3D view model of the %s isomer: the atoms the command line writes, where it writes them", async (_isomer, smiles) => {
    const text = readFileSync(join(FOLDER, "run-16-isomers.md"), "utf8");
    const before = text.slice(0, text.indexOf(smiles) + 2).split("\n");
    const view = await session.connection.sendRequest<ShapeModelResult | null>("lonepair/shapeModel", {
      uri: uriOf("run-16-isomers.md"),
      position: { line: before.length - 1, character: before[before.length - 1].length },
    });
    expect(view?.model, JSON.stringify(view)).toBeDefined();
    // The view is centred for turning and rounds to 0.001 Å; the file keeps the model's frame. The
    // same model in both means the same atoms in the same order at the same distances.
    const fromView = view!.model!.atoms.map((atom) => ({ symbol: atom.symbol, position: atom.position as readonly number[] }));
    const run = runCli(["coords", `smiles:${smiles}`]);
    const fromCli = run.stdout
      .trim()
      .split("\n")
      .slice(2)
      .map((line) => {
        const [symbol, ...position] = line.trim().split(/\s+/);
        return { symbol, position: position.map(Number) };
      });
    expect(fromView.map((atom) => atom.symbol)).toEqual(fromCli.map((atom) => atom.symbol));
    const distance = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
    for (let first = 0; first < fromCli.length; first += 1) {
      for (let second = first + 1; second < fromCli.length; second += 1) {
        const inView = distance(fromView[first].position, fromView[second].position);
        const inFile = distance(fromCli[first].position, fromCli[second].position);
        expect(Math.abs(inView - inFile), `atoms ${first} and ${second}: ${inView} Å in the view, ${inFile} Å in the file`).toBeLessThan(
          0.003,
        );
      }
    }
  });
});
