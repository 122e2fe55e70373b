/**
 * End to end over stdio: a real server process, a protocol client, the lab's fixture files.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  CodeActionRequest,
  DiagnosticSeverity,
  ExecuteCommandRequest,
  HoverRequest,
  InlayHintRequest,
  MarkupContent,
  RequestType,
  TextDocumentSyncKind,
  type CodeAction,
  type Diagnostic,
  type Range,
  type TextEdit,
} from "vscode-languageserver-protocol/node";
import type { TextDocument } from "vscode-languageserver-textdocument";
import { analyzeSpecies, resultMarkdown } from "../../shared/src/index";
import { applyEdits, fixture, fixtureUri, positionOf, startSession, type LspSession } from "./lspSession";

const CAUTION = "Model prediction, not measured data: follow the safety data sheet, local rules and licensed practice.";
const summaryRequest = new RequestType<{ uri: string; range?: Range; format?: string }, { text: string }, void>("lonepair/summaryTable");

const MARKDOWN = fixtureUri("notebook/run-21-cylinder-audit.md");
const CSV = fixtureUri("inventory/cylinders-bay-c.csv");
const JSON_URI = fixtureUri("reference/reference-bay-c.json");
const YAML = fixtureUri("inventory/ions-bay-c.yaml");

let session: LspSession;
const opened = new Map<string, TextDocument>();
const firstDiagnostics = new Map<string, Diagnostic[]>();

beforeAll(async () => {
  session = await startSession();
  const files: [string, string, string][] = [
    [MARKDOWN, "markdown", "run-21-cylinder-audit.md"],
    [CSV, "plaintext", "cylinders-bay-c.csv"],
    [JSON_URI, "json", "reference-bay-c.json"],
    [YAML, "yaml", "ions-bay-c.yaml"],
  ];
  for (const [uri, languageId, name] of files) opened.set(uri, session.open(uri, languageId, fixture(name)));
  for (const [uri] of files) firstDiagnostics.set(uri, (await session.waitForDiagnostics(uri)).diagnostics);
});

afterAll(async () => {
  await session?.stop();
});

function hoverText(result: unknown): string {
  const contents = (result as { contents: MarkupContent } | null)?.contents;
  return contents?.value ?? "";
}

function diagnosticAt(uri: string, needle: string, line: string): Diagnostic | undefined {
  const document = opened.get(uri)!;
  const lineStart = document.getText().indexOf(line);
  const offset = document.getText().indexOf(needle, lineStart);
  return firstDiagnostics.get(uri)!.find((diagnostic) => {
    const start = document.offsetAt(diagnostic.range.start);
    const end = document.offsetAt(diagnostic.range.end);
    return start <= offset && offset + needle.length <= end && end - start <= needle.length + 2;
  });
}

describe("initialize", () => {
  it("announces incremental sync and the features this client supports", () => {
    const capabilities = session.initializeResult.capabilities;
    expect(capabilities.textDocumentSync).toMatchObject({ openClose: true, change: TextDocumentSyncKind.Incremental });
    expect(capabilities.hoverProvider).toBe(true);
    expect(capabilities.inlayHintProvider).toBeTruthy();
    expect(capabilities.executeCommandProvider?.commands).toContain("lonepair.summaryTable");
    // This client did not offer pull diagnostics, so they are pushed.
    expect(capabilities.diagnosticProvider).toBeUndefined();
  });
});

describe("hover", () => {
  it.each([
    // common practice: SF4 has four bonds and one lone pair on S, AX4E1, seesaw
    [MARKDOWN, "SF4 is the one", ["seesaw", "AX4E1", "trigonal bipyramidal", "sp3d"]],
    // common practice: the same species read from a CSV formula cell
    [CSV, "SF4,34", ["seesaw", "AX4E1"]],
    // common practice: XeF4 is AX4E2, square planar, from two opposite lone pairs
    [MARKDOWN, "XeF4, keeps", ["square planar", "AX4E2", "octahedral"]],
    // common practice: NH4+ is tetrahedral, AX4E0
    [YAML, "NH4+", ["tetrahedral", "AX4"]],
  ])("%s at %s shows the shape and the caution", async (uri, needle, expected) => {
    const document = opened.get(uri)!;
    const result = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri },
      position: positionOf(document, needle, 1),
    });
    const text = hoverText(result);
    for (const fragment of expected) expect(text).toContain(fragment);
    expect(text).toContain(CAUTION);
    expect(text.length).toBeLessThan(100_000);
  });

  it("points to the problem of a species it cannot analyse instead of repeating it // common practice: carbon makes at most four bonds", async () => {
    const document = opened.get(MARKDOWN)!;
    const result = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri: MARKDOWN },
      position: positionOf(document, "CH5", 1),
    });
    const text = hoverText(result);
    expect(text).toContain("not analysed");
    expect(text).toContain("the reason is the problem reported on this text");
    expect(text).toContain(CAUTION);
    const reported = diagnosticAt(MARKDOWN, "CH5", "A trainee wrote CH5");
    expect(reported?.message).toContain("carbon");
    expect(text).not.toContain(String(reported?.message));
  });

  it.each(["SF4", "XeF4"])("the card of %s, written ahead after diagnostics, is the one the core writes", async (species) => {
    const document = opened.get(MARKDOWN)!;
    const position = positionOf(document, species === "SF4" ? "SF4 is the one" : "XeF4, keeps", 1);
    const first = hoverText(await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri: MARKDOWN }, position }));
    const again = hoverText(await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri: MARKDOWN }, position }));
    // The server's default is one decimal for angles; this client reads markdown.
    expect(first).toBe(resultMarkdown(species, analyzeSpecies(species), { angleDecimals: 1, format: "markdown" }));
    expect(again).toBe(first);
  });

  it("answers null away from any species", async () => {
    const document = opened.get(MARKDOWN)!;
    const result = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri: MARKDOWN },
      position: positionOf(document, "Why we looked", 2),
    });
    expect(result).toBeNull();
  });
});

describe("diagnostics", () => {
  it.each([
    [MARKDOWN, "CH5", "A trainee wrote CH5"],
    [CSV, "CH5", "CYL-104"],
  ])("%s: %s is an error (carbon cannot make five bonds) // common practice", (uri, needle, line) => {
    const diagnostic = diagnosticAt(uri, needle, line);
    expect(diagnostic?.severity).toBe(DiagnosticSeverity.Error);
    expect(diagnostic?.source).toBe("lonepair");
    expect(typeof diagnostic?.code).toBe("string");
  });

  it.each([
    [MARKDOWN, "| NH3"],
    [CSV, "CYL-102"],
    [JSON_URI, '"NH3"'],
  ])("%s: a trigonal planar NH3 is a warning naming trigonal pyramidal // common practice: NH3 is AX3E1", (uri, line) => {
    const diagnostic = diagnosticAt(uri, "trigonal planar", line);
    expect(diagnostic?.severity).toBe(DiagnosticSeverity.Warning);
    expect(diagnostic?.message).toContain("trigonal pyramidal");
  });

  it("flags a square planar BF4- in YAML // common practice: BF4- is AX4, tetrahedral", () => {
    const diagnostic = diagnosticAt(YAML, "square planar", "tetrafluoroborate");
    expect(diagnostic?.severity).toBe(DiagnosticSeverity.Warning);
    expect(diagnostic?.message).toContain("tetrahedral");
  });

  it.each([
    // from memory: NF3 has 5 + 3 x 7 = 26 valence electrons
    [CSV, "24", "CYL-103", "26"],
    // from memory: XeF4 has 8 + 4 x 7 = 36 valence electrons
    [JSON_URI, "34", '"XeF4"', "36"],
  ])("%s: a wrong valence electron count names the computed one", (uri, needle, line, computed) => {
    const diagnostic = diagnosticAt(uri, needle, line);
    expect(diagnostic?.message).toContain(computed);
  });

  it("leaves correct rows alone // common practice: BF3 is trigonal planar", () => {
    const document = opened.get(CSV)!;
    const row = document.getText().indexOf("CYL-105");
    const rowLine = document.positionAt(row).line;
    expect(firstDiagnostics.get(CSV)!.filter((diagnostic) => diagnostic.range.start.line === rowLine)).toEqual([]);
  });
});

describe("code actions", () => {
  async function actionsAt(uri: string, range: Range, diagnostics: Diagnostic[]): Promise<CodeAction[]> {
    const result = await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri },
      range,
      context: { diagnostics },
    });
    return (result ?? []) as CodeAction[];
  }

  function editsOf(action: CodeAction, uri: string): TextEdit[] {
    const changes = action.edit?.documentChanges ?? [];
    return changes.flatMap((change) => ("textDocument" in change && change.textDocument.uri === uri ? change.edits : [])) as TextEdit[];
  }

  it("a quick fix replaces only the offending CSV cell // common practice: NH3 is trigonal pyramidal", async () => {
    const diagnostic = diagnosticAt(CSV, "trigonal planar", "CYL-102")!;
    const actions = await actionsAt(CSV, diagnostic.range, [diagnostic]);
    const fix = actions.find((action) => action.kind === "quickfix" && action.title !== "Fix all lonepair table values in this file");
    expect(fix).toBeDefined();
    expect(fix!.diagnostics).toEqual([diagnostic]);
    const document = opened.get(CSV)!;
    const before = document.getText();
    const after = applyEdits(document, editsOf(fix!, CSV));
    expect(after).toBe(before.replace("CYL-102,ammonia,NH3,8,1,trigonal planar", "CYL-102,ammonia,NH3,8,1,trigonal pyramidal"));
  });

  it("fix all rewrites every fixable table value in one edit and nothing else", async () => {
    const document = opened.get(CSV)!;
    const whole = { start: { line: 0, character: 0 }, end: document.positionAt(document.getText().length) };
    const actions = await actionsAt(CSV, whole, firstDiagnostics.get(CSV)!);
    const fixAll = actions.find((action) => action.title === "Fix all lonepair table values in this file");
    expect(fixAll).toBeDefined();
    const after = applyEdits(document, editsOf(fixAll!, CSV));
    const beforeLines = document.getText().split("\n");
    const afterLines = after.split("\n");
    expect(afterLines.length).toBe(beforeLines.length);
    // from memory: NF3 has 26 valence electrons; common practice: NH3 is trigonal pyramidal
    expect(after).toContain("CYL-102,ammonia,NH3,8,1,trigonal pyramidal,polar,KR-0813");
    expect(after).toContain("CYL-103,nitrogen trifluoride,NF3,26,1,trigonal pyramidal,polar,KR-0814");
    for (const untouched of ["CYL-101", "CYL-105", "id,species"]) {
      const index = beforeLines.findIndex((line) => line.startsWith(untouched));
      expect(afterLines[index]).toBe(beforeLines[index]);
    }
  });
});

describe("source actions", () => {
  it("offers fix all as a source.fixAll action when only that kind is asked for", async () => {
    const document = opened.get(JSON_URI)!;
    const result = (await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri: JSON_URI },
      range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } },
      context: { diagnostics: [], only: ["source.fixAll"] },
    })) as CodeAction[];
    expect(result.map((action) => [action.title, action.kind])).toEqual([
      ["Fix all lonepair table values in this file", "source.fixAll.lonepair"],
    ]);
    const edits = (result[0].edit?.documentChanges?.[0] as { edits: TextEdit[] }).edits;
    const after = applyEdits(document, edits);
    // common practice: NH3 trigonal pyramidal; from memory: XeF4 has 36 valence electrons
    expect(after).toContain('"name": "ammonia", "valence electrons": 8, "molecular geometry": "trigonal pyramidal"');
    expect(after).toContain('"name": "xenon tetrafluoride", "valence electrons": 36,');
    expect(after.split("\n").length).toBe(document.getText().split("\n").length);
  });
});

describe("inlay hints", () => {
  it("shows the geometry after species in the requested prose range only // common practice: SF4 seesaw", async () => {
    const document = opened.get(MARKDOWN)!;
    const line = positionOf(document, "SF4 is the one").line;
    const hints = await session.connection.sendRequest(InlayHintRequest.type, {
      textDocument: { uri: MARKDOWN },
      range: { start: { line, character: 0 }, end: { line: line + 1, character: 0 } },
    });
    expect(hints?.map((hint) => hint.label)).toEqual([": seesaw"]);
    expect(hints?.[0].position).toEqual(positionOf(document, "SF4 is the one", 3));
  });

  it("gives no hints in a CSV file by default", async () => {
    const document = opened.get(CSV)!;
    const hints = await session.connection.sendRequest(InlayHintRequest.type, {
      textDocument: { uri: CSV },
      range: { start: { line: 0, character: 0 }, end: document.positionAt(document.getText().length) },
    });
    expect(hints).toEqual([]);
  });
});

describe("summary table", () => {
  it("lists each species once, in order of first appearance, as markdown", async () => {
    const result = (await session.connection.sendRequest(ExecuteCommandRequest.type, {
      command: "lonepair.summaryTable",
      arguments: [{ uri: MARKDOWN, format: "markdown" }],
    })) as { text: string };
    const rows = result.text.split("\n").filter((line) => line.startsWith("| "));
    expect(rows[0]).toContain("Molecular geometry");
    const formulas = rows.slice(2).map((row) => row.split("|")[1].trim());
    expect(formulas.slice(0, 2)).toEqual(["SF4", "XeF4"]);
    expect(new Set(formulas).size).toBe(formulas.length);
    // common practice: SF4 seesaw, XeF4 square planar
    expect(rows[2]).toContain("seesaw");
    expect(rows[3]).toContain("square planar");
    expect(result.text).toContain(CAUTION);
  });

  it("answers the custom request for a range, as CSV", async () => {
    const document = opened.get(CSV)!;
    const from = positionOf(document, "CYL-102");
    const to = positionOf(document, "CYL-104");
    const result = await session.connection.sendRequest(summaryRequest, {
      uri: CSV,
      range: { start: from, end: to },
      format: "csv",
    });
    const lines = result.text.trim().split(/\r?\n/);
    expect(lines[0].split(",")[0]).toBe("Formula");
    // The range covers the NH3 and NF3 rows (and their name cells), nothing else.
    expect(lines.slice(1).map((line) => line.split(",")[0])).toEqual(["NH3", "NF3"]);
  });
});

describe("editing", () => {
  it("incremental edits are applied and the warning goes once the cell is right", async () => {
    const uri = fixtureUri("inventory/cylinders-edit.csv");
    const document = session.open(uri, "plaintext", fixture("cylinders-bay-c.csv"));
    const before = await session.waitForDiagnostics(uri);
    expect(before.diagnostics.some((diagnostic) => JSON.stringify(diagnostic.message).includes("trigonal pyramidal"))).toBe(true);
    const offset = document.getText().indexOf("trigonal planar,polar,KR-0813");
    const start = document.positionAt(offset + "trigonal ".length);
    const end = document.positionAt(offset + "trigonal planar".length);
    // Type the fix in two keystroke-sized edits.
    session.change(uri, [{ range: { start, end }, text: "pyra" }]);
    const edited = session.change(uri, [
      {
        range: { start: { line: start.line, character: start.character + 4 }, end: { line: start.line, character: start.character + 4 } },
        text: "midal",
      },
    ]);
    expect(edited.getText()).toContain("CYL-102,ammonia,NH3,8,1,trigonal pyramidal,polar");
    const after = await session.waitForDiagnostics(uri, (params) => params.version === edited.version);
    const rowLine = positionOf(edited, "CYL-102").line;
    expect(after.diagnostics.filter((diagnostic) => diagnostic.range.start.line === rowLine)).toEqual([]);
    // A hover on the new text sees the new version.
    const hover = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri },
      position: positionOf(edited, "NH3", 1),
    });
    // common practice: NH3 is AX3E1, trigonal pyramidal
    expect(hoverText(hover)).toContain("AX3E1");
  });

  it("closing a document clears its diagnostics", async () => {
    const uri = fixtureUri("notebook/closing.md");
    session.open(uri, "markdown", "A trainee wrote CH5 on a label.\n");
    const open = await session.waitForDiagnostics(uri);
    expect(open.diagnostics.length).toBeGreaterThan(0);
    session.close(uri);
    const closed = await session.waitForDiagnostics(uri);
    expect(closed.diagnostics).toEqual([]);
  });
});

describe("shutdown", () => {
  it("exits with code 0 after shutdown and exit", async () => {
    const own = await startSession();
    expect(await own.stop()).toBe(0);
  });
});
