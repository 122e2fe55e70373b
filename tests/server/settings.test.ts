/**
 * A client that pulls diagnostics and answers `workspace/configuration`: settings reach every
 * feature, and unchanged documents are reported as unchanged.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  CodeActionRequest,
  CodeActionResolveRequest,
  DidChangeConfigurationNotification,
  DocumentDiagnosticReportKind,
  DocumentDiagnosticRequest,
  ExecuteCommandRequest,
  HoverRequest,
  InlayHintRequest,
  type ClientCapabilities,
  type CodeAction,
  type TextEdit,
  type FullDocumentDiagnosticReport,
  type MarkupContent,
} from "vscode-languageserver-protocol/node";
import { FULL_CAPABILITIES, applyEdits, fixture, fixtureUri, positionOf, startSession, type LspSession } from "./lspSession";

const PULLING_CLIENT: ClientCapabilities = {
  ...FULL_CAPABILITIES,
  textDocument: {
    ...FULL_CAPABILITIES.textDocument,
    diagnostic: { dynamicRegistration: false },
    codeAction: { ...FULL_CAPABILITIES.textDocument?.codeAction, dataSupport: true, resolveSupport: { properties: ["edit"] } },
  },
  workspace: { ...FULL_CAPABILITIES.workspace, configuration: true },
};

let settings: Record<string, unknown> = {
  enabledLanguages: ["markdown", "csv", "plaintext"],
  inlayHints: { prose: true, dataFiles: true },
  angleDecimals: 2,
  summaryTable: { columns: ["formula", "molecularGeometry"] },
};

const CSV = fixtureUri("inventory/cylinders-bay-c.csv");
const YAML = fixtureUri("inventory/ions-bay-c.yaml");

let session: LspSession;

beforeAll(async () => {
  session = await startSession({ capabilities: PULLING_CLIENT, configuration: () => settings });
  session.open(CSV, "plaintext", fixture("cylinders-bay-c.csv"));
  session.open(YAML, "yaml", fixture("ions-bay-c.yaml"));
});

afterAll(async () => {
  await session?.stop();
});

describe("with workspace settings and pull diagnostics", () => {
  it("announces pull diagnostics and reports unchanged versions as unchanged", async () => {
    expect(session.initializeResult.capabilities.diagnosticProvider).toBeDefined();
    const first = (await session.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri: CSV },
    })) as FullDocumentDiagnosticReport;
    expect(first.kind).toBe(DocumentDiagnosticReportKind.Full);
    // common practice: CH5 cannot exist as a neutral molecule with five C-H bonds
    expect(first.items.some((item) => item.severity === 1 && item.source === "lonepair")).toBe(true);
    const second = await session.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri: CSV },
      previousResultId: first.resultId,
    });
    expect(second.kind).toBe(DocumentDiagnosticReportKind.Unchanged);
    expect(session.published.filter((params) => params.uri === CSV)).toEqual([]);
  });

  it("shows hints in data files when switched on // common practice: SF4 seesaw, BF3 trigonal planar", async () => {
    const document = session.documents.get(CSV)!;
    const hints = await session.connection.sendRequest(InlayHintRequest.type, {
      textDocument: { uri: CSV },
      range: { start: positionOf(document, "CYL-101"), end: positionOf(document, "CYL-102") },
    });
    expect(hints?.map((hint) => hint.label)).toEqual([": seesaw"]);
  });

  it("writes angles with the configured decimals // common practice: SF4 ideal angles 90, 120, 180", async () => {
    const document = session.documents.get(CSV)!;
    const hover = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri: CSV },
      position: positionOf(document, "SF4", 1),
    });
    const text = (hover?.contents as MarkupContent).value;
    expect(text).toContain("90.00°");
    expect(text).toContain("120.00°");
  });

  it("builds the table with the configured columns only", async () => {
    const result = (await session.connection.sendRequest(ExecuteCommandRequest.type, {
      command: "lonepair.summaryTable",
      arguments: [{ uri: CSV, format: "csv" }],
    })) as { text: string };
    const lines = result.text.trim().split(/\r?\n/);
    expect(lines[0]).toBe("Formula,Molecular geometry");
    // common practice: SF4 seesaw
    expect(lines).toContain("SF4,seesaw");
  });

  it("ignores documents of kinds that are not enabled", async () => {
    const document = session.documents.get(YAML)!;
    const hover = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri: YAML },
      position: positionOf(document, "NH4+", 1),
    });
    expect(hover).toBeNull();
    const report = (await session.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri: YAML },
    })) as FullDocumentDiagnosticReport;
    expect(report.items).toEqual([]);
  });

  it("rereads the settings after a change notification // common practice: SF4 is sp3d", async () => {
    settings = { ...settings, summaryTable: { columns: ["formula", "hybridization"] } };
    await session.connection.sendNotification(DidChangeConfigurationNotification.type, { settings: null });
    const result = (await session.connection.sendRequest(ExecuteCommandRequest.type, {
      command: "lonepair.summaryTable",
      arguments: [{ uri: CSV, format: "csv" }],
    })) as { text: string };
    const lines = result.text.trim().split(/\r?\n/);
    expect(lines[0]).toBe("Formula,Hybridization");
    expect(lines).toContain("SF4,sp3d");
  });
});

describe("with a client that resolves code action edits", () => {
  it("sends fix all without its edit and fills it in on resolve, for the current version only", async () => {
    const uri = fixtureUri("inventory/cylinders-resolve.csv");
    const document = session.open(uri, "plaintext", fixture("cylinders-bay-c.csv"));
    const actions = (await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri },
      range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } },
      context: { diagnostics: [] },
    })) as CodeAction[];
    const fixAll = actions.find((action) => action.title === "Fix all lonepair table values in this file")!;
    expect(fixAll.edit).toBeUndefined();
    const resolved = await session.connection.sendRequest(CodeActionResolveRequest.type, fixAll);
    const edits = (resolved.edit?.documentChanges?.[0] as { edits: TextEdit[] }).edits;
    // from memory: NF3 has 26 valence electrons; common practice: NH3 is trigonal pyramidal
    const after = applyEdits(document, edits);
    expect(after).toContain("CYL-102,ammonia,NH3,8,1,trigonal pyramidal,polar");
    expect(after).toContain("CYL-103,nitrogen trifluoride,NF3,26,1,");
    session.change(uri, [{ range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } }, text: "" }]);
    const stale = await session.connection.sendRequest(CodeActionResolveRequest.type, fixAll);
    expect(stale.edit).toBeUndefined();
  });
});

describe("with a bare client", () => {
  it("falls back to defaults and plain text when the client supports nothing optional", async () => {
    const bare = await startSession({ capabilities: {} });
    try {
      const capabilities = bare.initializeResult.capabilities;
      expect(capabilities.inlayHintProvider).toBeUndefined();
      expect(capabilities.codeActionProvider).toBe(false);
      const document = bare.open(CSV, "plaintext", fixture("cylinders-bay-c.csv"));
      const hover = await bare.connection.sendRequest(HoverRequest.type, {
        textDocument: { uri: CSV },
        position: positionOf(document, "SF4", 1),
      });
      const contents = hover?.contents as MarkupContent;
      expect(contents.kind).toBe("plaintext");
      // common practice: SF4 is a seesaw
      expect(contents.value).toContain("seesaw");
      const pushed = await bare.waitForDiagnostics(CSV);
      expect(pushed.diagnostics.length).toBeGreaterThan(0);
    } finally {
      await bare.stop();
    }
  });
});
