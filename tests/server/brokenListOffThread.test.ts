/**
 * A keystroke that breaks a large JSON list of records: the real server (dist/server.js) reads
 * the broken text whole on its worker thread, answers a hover on a record far away before those
 * diagnostics, and the diagnostics it gives are a fresh reading's (the core's own analyzeDocument
 * + checkDocument are the reference); the keystroke that mends the record gives a fresh reading's
 * again.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TextDocument } from "vscode-languageserver-textdocument";
import {
  CodeActionRequest,
  DocumentDiagnosticRequest,
  HoverRequest,
  type Diagnostic,
  type DocumentDiagnosticReport,
  type MarkupContent,
} from "vscode-languageserver-protocol/node";
import { analyzeDocument } from "../../shared/src/index";
import { fromScratch } from "../support/incrementalCheck";
import { FIX_ALL_TITLE } from "../../server/src/lsp/features/codeActions";
import { FULL_CAPABILITIES, fixtureUri, startSession, type LspSession } from "./lspSession";

const PULLING_CLIENT = {
  ...FULL_CAPABILITIES,
  textDocument: { ...FULL_CAPABILITIES.textDocument, diagnostic: { dynamicRegistration: false } },
};

// common practice: SF6 has 48 valence electrons and is octahedral; NH3 has 8 and is trigonal pyramidal.
function record(index: number): string {
  const [formula, electrons, shape] = index % 2 === 0 ? ["SF6", 48, "octahedral"] : ["NH3", 8, "trigonal pyramidal"];
  // Every 211th record carries a wrong count, so there is something to report.
  return `    {"id": "KR-${index}", "formula": "${formula}", "valence electrons": ${index % 211 === 7 ? electrons - 2 : electrons}, "molecular geometry": "${shape}"},`;
}

/** Diagnostics as comparable lines: where, which code, what message. */
function comparable(items: readonly Diagnostic[]): string[] {
  return items
    .map(
      (item) =>
        `${item.range.start.line}:${item.range.start.character}-${item.range.end.line}:${item.range.end.character} ${item.code} ${item.message}`,
    )
    .sort();
}

function freshDiagnostics(text: string): string[] {
  const document = TextDocument.create("file:///fresh.json", "json", 1, text);
  return comparable(
    fromScratch(text, "json").map((finding) => ({
      range: { start: document.positionAt(finding.range.start), end: document.positionAt(finding.range.end) },
      code: finding.code,
      message: finding.message,
    })),
  );
}

describe("a large JSON list broken by a keystroke", () => {
  let session: LspSession;
  const uri = fixtureUri("reference/shelf.json");
  // Past the size from which a broken text is read on the worker thread (256 Ki characters).
  const lines = [
    '{"lab": "Kestrel Ridge Analytical", "records": [',
    ...Array.from({ length: 3_500 }, (_, index) => record(index)),
    '    {"id": "end"}',
    "]}",
    "",
  ];
  const text = lines.join("\n");

  beforeAll(async () => {
    session = await startSession({ capabilities: PULLING_CLIENT, configuration: () => ({}) });
  });
  afterAll(async () => {
    await session?.stop();
  });

  const pull = async (): Promise<Diagnostic[]> => {
    const report: DocumentDiagnosticReport = await session.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri },
    });
    return "items" in report ? report.items : [];
  };

  it("reads the broken text elsewhere, hovers meanwhile, and gives a fresh reading's diagnostics", async () => {
    expect(text.length).toBeGreaterThan(256 * 1024);
    session.open(uri, "json", text);
    expect(comparable(await pull())).toEqual(freshDiagnostics(text));

    // A quote typed before "formula" on a record a third of the way down leaves a string open.
    const brokenLine = 1 + 1_000;
    const at = lines[brokenLine].indexOf('"formula"');
    const broken = session.change(uri, [
      { range: { start: { line: brokenLine, character: at }, end: { line: brokenLine, character: at } }, text: '"' },
    ]);
    const order: string[] = [];
    const diagnostics = pull().then((items) => (order.push("diagnostics"), items));
    const farLine = 1 + 3_400;
    const hover = session.connection
      .sendRequest(HoverRequest.type, { textDocument: { uri }, position: { line: farLine, character: lines[farLine].indexOf("SF6") + 1 } })
      .then((answer) => (order.push("hover"), answer));
    // The status bar's counts, asked for meanwhile, wait for the same reading.
    const summary = session.connection.sendRequest("lonepair/documentSummary", { uri }) as Promise<{ species: number } | null>;
    const [items, card, counts] = await Promise.all([diagnostics, hover, summary]);
    expect(counts?.species).toBe(analyzeDocument(broken.getText(), "json").occurrences.length);
    expect(order).toEqual(["hover", "diagnostics"]);
    expect((card?.contents as MarkupContent).value).toContain("octahedral");
    expect(items.some((item) => item.code === "json-syntax")).toBe(true);
    expect(comparable(items)).toEqual(freshDiagnostics(broken.getText()));

    // The quote taken back: the records read as before the break.
    session.change(uri, [
      { range: { start: { line: brokenLine, character: at }, end: { line: brokenLine, character: at + 1 } }, text: "" },
    ]);
    expect(comparable(await pull())).toEqual(freshDiagnostics(text));
    // With the findings in, the lightbulb on a wrong count offers its fix and fix-all.
    const wrongLine = 1 + 211 * 3 + 7;
    const character = lines[wrongLine].indexOf('electrons": ') + 12;
    const actions = await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri },
      range: { start: { line: wrongLine, character }, end: { line: wrongLine, character } },
      context: { diagnostics: [] },
    });
    const titles = (actions ?? []).map((action) => action.title);
    expect(titles).toContain(FIX_ALL_TITLE);
    expect(titles.some((title) => /Change to (48|8)\b/.test(title))).toBe(true);
  });
});
