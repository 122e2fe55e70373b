/**
 * `lonepair.diagnostics.notesAs`: notes (severity information) reach the editor as information,
 * as hints or not at all, in pulled and pushed diagnostics and in `lonepair/checkText`; errors
 * and warnings never change.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  DidChangeConfigurationNotification,
  DocumentDiagnosticRequest,
  type ClientCapabilities,
  type Diagnostic,
  type FullDocumentDiagnosticReport,
} from "vscode-languageserver-protocol/node";
import { CHECK_TEXT_METHOD, type CheckTextResult } from "../../shared/src/index";
import { settingsFrom } from "../../server/src/lsp/settings";
import { FULL_CAPABILITIES, fixtureUri, startSession, type LspSession } from "./lspSession";

const PULLING_CLIENT: ClientCapabilities = {
  ...FULL_CAPABILITIES,
  textDocument: { ...FULL_CAPABILITIES.textDocument, diagnostic: { dynamicRegistration: false } },
  workspace: { ...FULL_CAPABILITIES.workspace, configuration: true },
};

// common practice: NaCl and CaF2 are ionic solids (lattices of ions), NO2 (17 valence electrons)
// is a radical, and carbon holds at most four electron pairs, so CH5 is impossible.
const WRITE_UP = "# Run 18\n\nThe salts NaCl and CaF2 were dried; SF6 and NO2 came from the store; CH5 is a typo.\n";

/** Each diagnostic as [protocol severity, code]. */
const severities = (diagnostics: readonly Diagnostic[]): [number | undefined, string][] =>
  diagnostics.map((diagnostic) => [diagnostic.severity, String(diagnostic.code)]);

const NOTES = ["ionic-solid", "ionic-solid", "radical"];

describe("reading the setting", () => {
  it.each([
    // [value sent by the client, setting read]
    [undefined, "information"],
    ["information", "information"],
    ["hint", "hint"],
    ["off", "off"],
    // Anything malformed falls back to the default rather than hiding notes by accident.
    ["Hint", "information"],
    ["none", "information"],
    [false, "information"],
    [2, "information"],
  ])("%j reads as %s", (value, expected) => {
    expect(settingsFrom({ diagnostics: { notesAs: value } }).diagnostics.notesAs).toBe(expected);
  });

  it("leaves the other diagnostics setting alone", () => {
    expect(settingsFrom({ diagnostics: { notesAs: "off", maxPerDocument: 7 } }).diagnostics).toEqual({ notesAs: "off", maxPerDocument: 7 });
  });
});

describe("a client that pulls diagnostics and answers workspace/configuration", () => {
  let notesAs: unknown = undefined;
  let session: LspSession;
  const uri = fixtureUri("notebook/run-18-salts.md");

  beforeAll(async () => {
    session = await startSession({ capabilities: PULLING_CLIENT, configuration: () => ({ diagnostics: { notesAs } }) });
    session.open(uri, "markdown", WRITE_UP);
  });
  afterAll(async () => {
    await session?.stop();
  });

  it.each([
    // [setting, protocol severity of each note (3 information, 4 hint), or none]
    [undefined, 3],
    ["hint", 4],
    ["off", undefined],
    ["information", 3],
  ])("with notesAs %j the notes come as %j and the error stays an error", async (setting, noteSeverity) => {
    notesAs = setting;
    await session.connection.sendNotification(DidChangeConfigurationNotification.type, { settings: null });
    const report = (await session.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri },
    })) as FullDocumentDiagnosticReport;
    const notes: [number | undefined, string][] = noteSeverity === undefined ? [] : NOTES.map((code) => [noteSeverity, code]);
    expect(severities(report.items)).toEqual([...notes, [1, "octet-exceeded"]]);
  });

  it("checks a text that is not open with the settings of its URI", async () => {
    notesAs = "hint";
    await session.connection.sendNotification(DidChangeConfigurationNotification.type, { settings: null });
    const result: CheckTextResult = await session.connection.sendRequest(CHECK_TEXT_METHOD, {
      uri: fixtureUri("notebook/run-19-closed.md"),
      languageId: "markdown",
      text: WRITE_UP,
    });
    expect(severities(result.diagnostics as Diagnostic[])).toEqual([...NOTES.map((code) => [4, code]), [1, "octet-exceeded"]]);
  });
});

describe("a client that pushes its settings", () => {
  it("publishes without the notes once they are switched off", async () => {
    const session = await startSession();
    try {
      const uri = fixtureUri("notebook/run-18-pushed.md");
      session.open(uri, "markdown", WRITE_UP);
      const before = await session.waitForDiagnostics(uri);
      expect(severities(before.diagnostics)).toEqual([...NOTES.map((code) => [3, code]), [1, "octet-exceeded"]]);
      await session.connection.sendNotification(DidChangeConfigurationNotification.type, {
        settings: { lonepair: { diagnostics: { notesAs: "off" } } },
      });
      const after = await session.waitForDiagnostics(uri, (params) => params.diagnostics.length < before.diagnostics.length);
      expect(severities(after.diagnostics)).toEqual([[1, "octet-exceeded"]]);
    } finally {
      await session.stop();
    }
  });
});
