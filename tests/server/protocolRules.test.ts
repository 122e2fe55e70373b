/**
 * The protocol's own rules, checked over stdio against the built server: the life cycle
 * (nothing before `initialize`, one `initialize`, nothing after `shutdown`), cancelled requests,
 * texts that change without a new version number, and the cap on diagnostics per document.
 */
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import {
  DiagnosticSeverity,
  DidChangeTextDocumentNotification,
  DidCloseTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DocumentDiagnosticReportKind,
  DocumentDiagnosticRequest,
  ErrorCodes,
  HoverRequest,
  LSPErrorCodes,
  type ClientCapabilities,
  type Diagnostic,
  type DocumentDiagnosticReport,
  type FullDocumentDiagnosticReport,
  type MarkupContent,
} from "vscode-languageserver-protocol/node";
import { FULL_CAPABILITIES, fixtureUri, startSession, type LspSession } from "./lspSession";
import { startRawSession, type RawSession } from "./rawSession";

const INITIALIZE_PARAMS = { processId: null, rootUri: null, capabilities: FULL_CAPABILITIES };
const NOTE_URI = fixtureUri("notebook/run-31.md");
const NOTE = "Run 31: the SF4 cylinder KR-0931 went back to bay C.\n";
// Position of the S of SF4 in NOTE.
const ON_SF4 = { line: 0, character: 12 };

describe("life cycle", () => {
  let raw: RawSession | undefined;
  afterEach(() => raw?.kill());

  it("refuses requests before initialize and after shutdown, and a second initialize", async () => {
    raw = startRawSession();
    raw.send(
      { method: "textDocument/didOpen", params: { textDocument: { uri: NOTE_URI, languageId: "markdown", version: 1, text: NOTE } } },
      { id: 1, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_SF4 } },
    );
    // source: LSP 3.17 specification, "Initialize Request": ServerNotInitialized (-32002) before initialize
    expect((await raw.responseTo(1)).error?.code).toBe(ErrorCodes.ServerNotInitialized);

    raw.send({ id: 2, method: "initialize", params: INITIALIZE_PARAMS });
    expect((await raw.responseTo(2)).result).toHaveProperty("capabilities");
    raw.send({ id: 3, method: "initialize", params: INITIALIZE_PARAMS });
    // source: LSP 3.17 specification: initialize may be sent only once
    expect((await raw.responseTo(3)).error?.code).toBe(ErrorCodes.InvalidRequest);

    // The didOpen sent before initialize was dropped, as the specification says: no document, no hover.
    raw.send(
      { method: "initialized", params: {} },
      { id: 4, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_SF4 } },
    );
    expect((await raw.responseTo(4)).result).toBeNull();
    raw.send(
      { method: "textDocument/didOpen", params: { textDocument: { uri: NOTE_URI, languageId: "markdown", version: 1, text: NOTE } } },
      { id: 5, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_SF4 } },
    );
    // common practice: SF4 is a seesaw
    expect(JSON.stringify((await raw.responseTo(5)).result)).toContain("seesaw");

    raw.send({ id: 6, method: "shutdown" });
    expect((await raw.responseTo(6)).error).toBeUndefined();
    raw.send({ id: 7, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_SF4 } });
    // source: LSP 3.17 specification, "Shutdown Request": later requests fail with InvalidRequest
    expect((await raw.responseTo(7)).error?.code).toBe(ErrorCodes.InvalidRequest);
    raw.send({ method: "exit" });
    expect(await raw.exited()).toBe(0);
  });

  it("answers a request cancelled before it ran with RequestCancelled", async () => {
    raw = startRawSession();
    raw.send({ id: 1, method: "initialize", params: INITIALIZE_PARAMS });
    await raw.responseTo(1);
    raw.send(
      { method: "initialized", params: {} },
      { method: "textDocument/didOpen", params: { textDocument: { uri: NOTE_URI, languageId: "markdown", version: 1, text: NOTE } } },
      // The request and its cancellation arrive in one read, so the cancellation is always seen first.
      { id: 2, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_SF4 } },
      { method: "$/cancelRequest", params: { id: 2 } },
      { id: 3, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_SF4 } },
    );
    // source: LSP 3.17 specification, "Cancellation Support": RequestCancelled (-32800)
    expect((await raw.responseTo(2)).error?.code).toBe(LSPErrorCodes.RequestCancelled);
    // The uncancelled twin is answered in full.
    expect(JSON.stringify((await raw.responseTo(3)).result)).toContain("seesaw");
  });
});

const PULLING_CLIENT: ClientCapabilities = {
  ...FULL_CAPABILITIES,
  textDocument: { ...FULL_CAPABILITIES.textDocument, diagnostic: { dynamicRegistration: false } },
  workspace: { ...FULL_CAPABILITIES.workspace, configuration: true },
};

// common practice: carbon makes four bonds, so CH5 is an error and CH4 is fine.
const WRONG = "A trainee wrote CH5 in the cylinder log.\n";
const RIGHT = "A trainee wrote CH4 in the cylinder log.\n";

/** The three ways a client can hand over a new text without a new version number. */
type Replacement = (session: LspSession, uri: string, text: string) => Promise<void>;
const SAME_VERSION_REPLACEMENTS: readonly [string, Replacement][] = [
  [
    "closed and reopened at the same version",
    async (session, uri, text) => {
      await session.connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });
      await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
        textDocument: { uri, languageId: "markdown", version: 1, text },
      });
    },
  ],
  [
    "opened a second time without a close",
    (session, uri, text) =>
      session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
        textDocument: { uri, languageId: "markdown", version: 1, text },
      }),
  ],
  [
    "changed keeping its version number",
    (session, uri, text) =>
      session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
        textDocument: { uri, version: 1 },
        contentChanges: [{ text }],
      }),
  ],
];

const errorsIn = (items: readonly Diagnostic[]): Diagnostic[] => items.filter((item) => item.severity === DiagnosticSeverity.Error);

describe("a new text at the same version number", () => {
  let pulling: LspSession;
  let pushing: LspSession;
  beforeAll(async () => {
    [pulling, pushing] = await Promise.all([startSession({ capabilities: PULLING_CLIENT, configuration: () => ({}) }), startSession()]);
  });
  afterAll(async () => {
    await Promise.all([pulling?.stop(), pushing?.stop()]);
  });

  it.each(SAME_VERSION_REPLACEMENTS)("pull diagnostics: %s gets a full report of the new text", async (label, replace) => {
    const uri = fixtureUri(`notebook/pull-${label.replaceAll(" ", "-")}.md`);
    await pulling.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: "markdown", version: 1, text: WRONG },
    });
    const first = (await pulling.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri },
    })) as FullDocumentDiagnosticReport;
    expect(errorsIn(first.items)).toHaveLength(1);
    await replace(pulling, uri, RIGHT);
    const second: DocumentDiagnosticReport = await pulling.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri },
      previousResultId: first.resultId,
    });
    expect(second.kind, "an unchanged report would keep the old text's error on screen").toBe(DocumentDiagnosticReportKind.Full);
    expect(errorsIn((second as FullDocumentDiagnosticReport).items)).toEqual([]);
    expect((second as FullDocumentDiagnosticReport).resultId).not.toBe(first.resultId);
  });

  it.each(SAME_VERSION_REPLACEMENTS)("pushed diagnostics: %s are those of the new text", async (label, replace) => {
    const uri = fixtureUri(`notebook/push-${label.replaceAll(" ", "-")}.md`);
    await pushing.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: "markdown", version: 1, text: WRONG },
    });
    await pushing.waitForDiagnostics(uri, (params) => errorsIn(params.diagnostics).length === 1);
    await replace(pushing, uri, RIGHT);
    const after = await pushing.waitForDiagnostics(uri, undefined, 10_000);
    expect(errorsIn(after.diagnostics), "the diagnostics after the new text still show the old text's error").toEqual([]);
  });

  it.each(SAME_VERSION_REPLACEMENTS)("hover: %s reads the new text", async (label, replace) => {
    const uri = fixtureUri(`notebook/hover-${label.replaceAll(" ", "-")}.md`);
    await pushing.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: "markdown", version: 1, text: NOTE },
    });
    const hover = async (): Promise<string> =>
      (
        (await pushing.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: ON_SF4 }))?.contents as
          MarkupContent | undefined
      )?.value ?? "";
    // common practice: SF4 is a seesaw, XeF4 square planar
    expect(await hover()).toContain("seesaw");
    await replace(pushing, uri, NOTE.replace("SF4", "XeF4"));
    expect(await hover()).toContain("square planar");
  });
});

/** A note with `count` impossible species, one per line. */
function noteWithImpossibleSpecies(count: number): string {
  return Array.from({ length: count }, (_, index) => `Line ${index + 1}: a trainee wrote CH5 again.`).join("\n") + "\n";
}

const LIMIT_CODE = "diagnostics-limit-reached";

describe("diagnostics per document are capped", () => {
  let pulling: LspSession;
  let pushing: LspSession;
  let limit = 10;
  beforeAll(async () => {
    [pulling, pushing] = await Promise.all([
      startSession({ capabilities: PULLING_CLIENT, configuration: () => ({ diagnostics: { maxPerDocument: limit } }) }),
      startSession(),
    ]);
  });
  afterAll(async () => {
    await Promise.all([pulling?.stop(), pushing?.stop()]);
  });

  it("pushes at most 1,000 by default, then one diagnostic counting the rest", async () => {
    const uri = fixtureUri("notebook/many-mistakes.md");
    pushing.open(uri, "markdown", noteWithImpossibleSpecies(2500));
    const published = await pushing.waitForDiagnostics(uri, undefined, 60_000);
    expect(published.diagnostics).toHaveLength(1001);
    const summary = published.diagnostics.filter((diagnostic) => diagnostic.code === LIMIT_CODE);
    expect(summary).toHaveLength(1);
    expect(summary[0].message).toContain("1,500 more");
    // The shown ones are the first in the document, and the summary sits at the first one left out.
    expect(
      published.diagnostics.filter((diagnostic) => diagnostic.code !== LIMIT_CODE).map((diagnostic) => diagnostic.range.start.line),
    ).toEqual(Array.from({ length: 1000 }, (_, line) => line));
    expect(summary[0].range.start.line).toBe(1000);
  });

  it("stops looking through a document once the shown errors are settled, and says the count is a lower bound", async () => {
    // A plain-text log is read in parts as far as needed (markdown blocks are kept whole for edits).
    const uri = fixtureUri("notebook/endless-mistakes.txt");
    const lines = 20_000;
    pushing.open(uri, "plaintext", noteWithImpossibleSpecies(lines));
    const published = await pushing.waitForDiagnostics(uri, undefined, 60_000);
    expect(published.diagnostics).toHaveLength(1001);
    const summary = published.diagnostics.find((diagnostic) => diagnostic.code === LIMIT_CODE);
    const message = String(summary?.message ?? "");
    const counted = /^At least ([\d,]+) more problems/.exec(message);
    expect(counted, `the summary should give a lower bound, got: ${message}`).not.toBeNull();
    const leftOut = Number(counted![1].replace(/,/g, ""));
    // Every line holds one CH5, so exactly lines - 1000 are left out; fewer were looked at.
    expect(leftOut).toBeGreaterThan(0);
    expect(leftOut).toBeLessThan(lines - 1000);
    expect(summary!.range.start.line).toBe(1000);
    expect(
      published.diagnostics.filter((diagnostic) => diagnostic.code !== LIMIT_CODE).map((diagnostic) => diagnostic.range.start.line),
    ).toEqual(Array.from({ length: 1000 }, (_, line) => line));
  });

  it.each([
    [10, 25, 11],
    [10, 10, 10],
    [3, 4, 4],
  ])("pulls at most the configured %i (of %i), plus the count of the rest: %i items", async (configured, mistakes, expected) => {
    limit = configured;
    const uri = fixtureUri(`notebook/mistakes-${configured}-${mistakes}.md`);
    pulling.open(uri, "markdown", noteWithImpossibleSpecies(mistakes));
    const report = (await pulling.connection.sendRequest(DocumentDiagnosticRequest.type, {
      textDocument: { uri },
    })) as FullDocumentDiagnosticReport;
    expect(report.items).toHaveLength(expected);
    const summaries = report.items.filter((item) => item.code === LIMIT_CODE);
    expect(summaries).toHaveLength(mistakes > configured ? 1 : 0);
    if (mistakes > configured) expect(summaries[0].message).toContain(`${mistakes - configured} more`);
  });
});

describe("hover in the client's format", () => {
  const sessions: LspSession[] = [];
  afterAll(async () => {
    await Promise.all(sessions.map((session) => session.stop()));
  });

  /** The hover of SF4 and of CH5 for a client listing `formats` (undefined: no hover capability at all). */
  async function hoversFor(formats: string[] | undefined): Promise<MarkupContent[]> {
    const capabilities: ClientCapabilities = {
      ...FULL_CAPABILITIES,
      textDocument: {
        ...FULL_CAPABILITIES.textDocument,
        hover: formats ? { contentFormat: formats as MarkupContent["kind"][] } : undefined,
      },
    };
    const session = await startSession({ capabilities });
    sessions.push(session);
    const uri = fixtureUri("notebook/run-32.md");
    session.open(uri, "markdown", `${NOTE}A trainee wrote CH5 in the log.\n`);
    const onCh5 = { line: 1, character: 17 };
    const results = await Promise.all(
      [ON_SF4, onCh5].map((position) => session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position })),
    );
    return results.map((result) => result?.contents as MarkupContent);
  }

  it.each([
    [["plaintext"], "plaintext"],
    [["plaintext", "markdown"], "plaintext"],
    [undefined, "plaintext"],
    [["markdown", "plaintext"], "markdown"],
  ])("a client listing %j gets %s", async (formats, kind) => {
    const hovers = await hoversFor(formats);
    for (const hover of hovers) {
      expect(hover.kind).toBe(kind);
      // common practice: SF4 seesaw; CH5 is refused, and both cards keep the caution
      expect(hover.value).toMatch(/seesaw|not analysed/);
      expect(hover.value).toMatch(/model prediction, not measured data/i);
    }
    const markdownSyntax = /\*\*|`|!\[|\]\(|data:image|\\_|^_|_$/m;
    if (kind === "plaintext") {
      for (const hover of hovers) expect(hover.value, "plain text must not carry markdown syntax or an image").not.toMatch(markdownSyntax);
    } else {
      expect(hovers[0].value).toContain("data:image/svg+xml");
      expect(hovers[0].value).toContain("**seesaw**");
    }
  });
});

describe("one large species", () => {
  let raw: RawSession | undefined;
  afterEach(() => raw?.kill());

  // A 990-character `smiles:` span: a chain of 990 carbons (2,972 atoms with its hydrogens), whose
  // hover needs a 3D model of all of them for the polarity.
  const LARGE = "C".repeat(990);
  const TEXT = `Run 33: the wax sample is \`smiles:${LARGE}\` and the reference gas is SF4.\n`;
  const ON_LARGE = { line: 0, character: 40 };
  const ON_GAS = { line: 0, character: TEXT.indexOf("SF4") + 1 };

  it("does not hold up other requests while its hover card is written", async () => {
    raw = startRawSession();
    raw.send({ id: 1, method: "initialize", params: INITIALIZE_PARAMS });
    await raw.responseTo(1);
    raw.send(
      { method: "initialized", params: {} },
      { method: "textDocument/didOpen", params: { textDocument: { uri: NOTE_URI, languageId: "markdown", version: 1, text: TEXT } } },
      // Answered once the document is read, so the hovers below find it analysed.
      { id: 2, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_GAS } },
    );
    await raw.responseTo(2);
    raw.send(
      { id: 3, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_LARGE } },
      { id: 4, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_GAS } },
    );
    const [large, gas] = await Promise.all([raw.responseTo(3, 120_000), raw.responseTo(4)]);
    const order = raw.received
      .filter((message) => "id" in message && !("method" in message))
      .map((message) => (message as unknown as { id: number }).id);
    expect(order.indexOf(4), "the small species was answered only after the large one").toBeLessThan(order.indexOf(3));
    // common practice: SF4 is a seesaw; every carbon of an alkane is tetrahedral
    expect(JSON.stringify(gas.result)).toContain("seesaw");
    expect(JSON.stringify(large.result)).toContain("tetrahedral");
    expect(JSON.stringify(large.result)).toMatch(/Polarity/);
  });

  // A chain of 999 carbons, just inside the 1,000 characters a `smiles:` span may hold: 2,999 atoms
  // with its hydrogens, so building its 3D model takes a while.
  const NEAR_LIMIT = "C".repeat(999);
  const CHAIN_TEXT = `Run 35: the paraffin standard is \`smiles:${NEAR_LIMIT}\`; the reference gas is SF4.
`;
  const ON_CHAIN = { line: 0, character: 45 };
  const ON_CHAIN_GAS = { line: 0, character: CHAIN_TEXT.indexOf("SF4") + 1 };

  /** A session with the chain note open and analysed. */
  async function chainSession(): Promise<RawSession> {
    const session = startRawSession();
    session.send({ id: 1, method: "initialize", params: INITIALIZE_PARAMS });
    await session.responseTo(1);
    session.send(
      { method: "initialized", params: {} },
      { method: "textDocument/didOpen", params: { textDocument: { uri: NOTE_URI, languageId: "markdown", version: 1, text: CHAIN_TEXT } } },
      { id: 2, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_CHAIN_GAS } },
    );
    await session.responseTo(2);
    return session;
  }

  it.each(["lonepair/shapeModel", "lonepair/coordinates"])(
    "answers a hover on a small species while %s builds a model near the size limit",
    async (method) => {
      raw = await chainSession();
      raw.send(
        { id: 3, method, params: { uri: NOTE_URI, position: ON_CHAIN, format: "xyz" } },
        { id: 4, method: "textDocument/hover", params: { textDocument: { uri: NOTE_URI }, position: ON_CHAIN_GAS } },
      );
      const [model, gas] = await Promise.all([raw.responseTo(3, 120_000), raw.responseTo(4)]);
      const order = raw.received
        .filter((message) => "id" in message && !("method" in message))
        .map((message) => (message as unknown as { id: number }).id);
      expect(order.indexOf(4), "the hover waited for the 3D model of the large species").toBeLessThan(order.indexOf(3));
      // common practice: SF4 is a seesaw
      expect(JSON.stringify(gas.result)).toContain("seesaw");
      const answer = model.result as { model?: { atoms: unknown[] }; file?: { text: string } };
      // common practice: CnH2n+2, so 999 carbons carry 2,000 hydrogens: 2,999 atoms in all
      if (method === "lonepair/shapeModel") expect(answer.model?.atoms).toHaveLength(2999);
      else expect(answer.file?.text.split("\n")[0].trim()).toBe("2999");
    },
  );

  it("answers a cancelled 3D model request with RequestCancelled and goes on serving models", async () => {
    raw = await chainSession();
    raw.send({ id: 3, method: "lonepair/shapeModel", params: { uri: NOTE_URI, position: ON_CHAIN } });
    raw.send({ method: "$/cancelRequest", params: { id: 3 } });
    const cancelled = await raw.responseTo(3, 120_000);
    expect(cancelled.error?.code).toBe(-32800);
    raw.send({ id: 4, method: "lonepair/coordinates", params: { uri: NOTE_URI, position: ON_CHAIN, format: "xyz" } });
    const file = await raw.responseTo(4, 120_000);
    // common practice: CnH2n+2, so 999 carbons carry 2,000 hydrogens
    expect((file.result as { file?: { text: string } }).file?.text.split("\n")[0].trim()).toBe("2999");
  });

  it("answers the 3D model request for a species past the limit with the reason", async () => {
    const session = await startSession();
    try {
      const uri = fixtureUri("notebook/run-34.md");
      const ring = `C1${"C".repeat(98)}C1`;
      session.open(uri, "markdown", `Run 34: the macrocycle \`smiles:${ring}\` was set aside.\n`);
      const position = { line: 0, character: 40 };
      const shape = await session.connection.sendRequest<{ problem?: { code: string; message: string }; model?: unknown }>(
        "lonepair/shapeModel",
        { uri, position },
      );
      expect(shape.model).toBeUndefined();
      expect(shape.problem?.code).toBe("too-large-for-model");
      expect(shape.problem?.message).toMatch(/^Too large for a 3D model: a ring system of 100 atoms \(the limit is 64\)/);
      const file = await session.connection.sendRequest<{ problem?: { message: string } }>("lonepair/coordinates", {
        uri,
        position,
        format: "xyz",
      });
      expect(file.problem?.message).toMatch(/^Too large for a 3D model/);
    } finally {
      await session.stop();
    }
  });
});
