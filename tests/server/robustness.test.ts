/**
 * The server must outlive bad input: broken framing, unknown methods, malformed parameters,
 * huge or binary documents, cancelled requests and long runs of random edits.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  CancellationTokenSource,
  CodeActionRequest,
  ErrorCodes,
  ExecuteCommandRequest,
  HoverRequest,
  InlayHintRequest,
  LSPErrorCodes,
  RequestType,
  ResponseError,
  type MarkupContent,
} from "vscode-languageserver-protocol/node";
import { fixtureUri, positionOf, startSession, type LspSession } from "./lspSession";
import { seededRandom } from "../support/seededRandom";

let session: LspSession;

beforeAll(async () => {
  session = await startSession();
});

afterAll(async () => {
  await session?.stop();
});

/** Hovers on the first "SF4" of an open document and returns the card text. */
async function hoverOnSf4(uri: string): Promise<string> {
  const document = session.documents.get(uri)!;
  const hover = await session.connection.sendRequest(HoverRequest.type, {
    textDocument: { uri },
    position: positionOf(document, "SF4", 1),
  });
  return (hover?.contents as MarkupContent | undefined)?.value ?? "";
}

async function stillAnswers(): Promise<void> {
  const uri = fixtureUri("notebook/alive.md");
  if (!session.documents.has(uri)) session.open(uri, "markdown", "The reference gas is SF4.\n");
  // common practice: SF4 is a seesaw
  expect(await hoverOnSf4(uri)).toContain("seesaw");
  expect(session.child.exitCode).toBeNull();
}

describe("protocol abuse", () => {
  it("skips garbage bytes and broken frames and keeps answering", async () => {
    const random = seededRandom(14);
    // Random bytes without CR or LF, closed by a blank line: a header block the reader must reject.
    const garbage = Buffer.from(
      Array.from({ length: 4096 }, () => {
        const byte = Math.floor(random() * 256);
        return byte === 10 || byte === 13 ? 32 : byte;
      }),
    );
    const brokenJson = "{ this is not json";
    const notRpc = JSON.stringify({ hello: "Kestrel Ridge" });
    // All in one write, so the server sees it as one chunk, then garbage with no blank line at all.
    session.child.stdin.write(
      Buffer.concat([
        garbage,
        Buffer.from("\r\n\r\n"),
        Buffer.from("Content-Length: not-a-number\r\n\r\n"),
        Buffer.from(`Content-Length: ${Buffer.byteLength(brokenJson)}\r\n\r\n${brokenJson}`),
        Buffer.from(`Content-Length: ${Buffer.byteLength(notRpc)}\r\n\r\n${notRpc}`),
        Buffer.from("[1,2,3] no header here "),
      ]),
    );
    await stillAnswers();
    await stillAnswers();
  });

  it("answers an unknown method with MethodNotFound", async () => {
    const unknown = new RequestType<unknown, unknown, void>("lonepair/noSuchMethod");
    const error = await session.connection.sendRequest(unknown, {}).then(
      () => undefined,
      (reason: unknown) => reason,
    );
    expect(error).toBeInstanceOf(ResponseError);
    expect((error as ResponseError<unknown>).code).toBe(ErrorCodes.MethodNotFound);
    await stillAnswers();
  });

  it.each([
    ["hover without a document", HoverRequest.method, {}],
    [
      "hover at a nonsense position",
      HoverRequest.method,
      { textDocument: { uri: fixtureUri("notebook/alive.md") }, position: { line: -3, character: "x" } },
    ],
    ["inlay hints for a document that is not open", InlayHintRequest.method, { textDocument: { uri: "file:///nowhere.md" }, range: null }],
    ["code actions without a context", CodeActionRequest.method, { textDocument: { uri: fixtureUri("notebook/alive.md") }, range: null }],
    ["the table command with junk arguments", ExecuteCommandRequest.method, { command: "lonepair.summaryTable", arguments: [42, "x"] }],
  ])("answers %s without failing", async (_label, method, params) => {
    const request = new RequestType<unknown, unknown, void>(method);
    const result = await session.connection.sendRequest(request, params).then(
      (value) => ({ value }),
      (error: unknown) => ({ error }),
    );
    // Either an empty answer or a clean protocol error, never a dead server.
    if ("error" in result) expect(result.error).toBeInstanceOf(ResponseError);
    else expect([null, "", undefined].includes(result.value as null) || JSON.stringify(result.value).length < 200).toBe(true);
    await stillAnswers();
  });

  it("survives a cancelled request", async () => {
    const uri = fixtureUri("notebook/alive.md");
    await stillAnswers();
    const source = new CancellationTokenSource();
    const pending = session.connection
      .sendRequest(HoverRequest.type, { textDocument: { uri }, position: { line: 0, character: 22 } }, source.token)
      .then(
        (value) => ({ value }),
        (error: unknown) => ({ error }),
      );
    source.cancel();
    const result = await pending;
    if ("error" in result) expect((result.error as ResponseError<unknown>).code).toBe(LSPErrorCodes.RequestCancelled);
    await stillAnswers();
  });
});

describe("awkward documents", () => {
  it("analyses the first 50 Mi characters of a larger document and warns once on its first line", async () => {
    const uri = fixtureUri("notebook/huge.md");
    const paragraph = "Run 22 note: the SF4 cylinder KR-0812 was weighed and returned to bay C.\n";
    // Blank lines keep the analysis cheap; the species at the very end lies past the limit.
    const padding = "\n".repeat(51 * 1024 * 1024);
    const text = `${paragraph}${padding}${paragraph}`;
    session.open(uri, "markdown", text);
    const published = await session.waitForDiagnostics(uri, undefined, 100_000);
    const notes = published.diagnostics.filter((diagnostic) => diagnostic.code === "document-partly-analysed");
    expect(notes).toHaveLength(1);
    expect(notes[0].severity).toBe(2);
    expect(notes[0].range.start.line).toBe(0);
    expect(notes[0].message).toMatch(/checked only its first 50\.0 Mi characters/);
    expect(await hoverOnSf4(uri)).toContain("seesaw");
    // Past the analysed part there is nothing to hover.
    const lastLine = text.split("\n").length - 2;
    const late = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri },
      position: { line: lastLine, character: paragraph.indexOf("SF4") + 1 },
    });
    expect(late).toBeNull();
    session.close(uri);
    await stillAnswers();
  }, 120_000);

  it("handles a 1 MB single line", async () => {
    const uri = fixtureUri("notebook/one-line.md");
    const phrase = "the SF4 line in bay C reads steady at 2.1 bar; ";
    const text = phrase.repeat(Math.ceil((1024 * 1024) / phrase.length));
    session.open(uri, "markdown", text);
    await session.waitForDiagnostics(uri, undefined, 60_000);
    // common practice: SF4 is a seesaw
    expect(await hoverOnSf4(uri)).toContain("seesaw");
    const hints = await session.connection.sendRequest(InlayHintRequest.type, {
      textDocument: { uri },
      range: { start: { line: 0, character: 0 }, end: { line: 0, character: phrase.length * 3 } },
    });
    expect(hints?.map((hint) => hint.label)).toEqual([": seesaw", ": seesaw", ": seesaw"]);
    session.close(uri);
    await stillAnswers();
  }, 120_000);

  it("drops large broken bodies and reads a large open written with escapes", async () => {
    const uri = fixtureUri("notebook/escaped.md");
    // Lines with CRLF, a tab, quotes, a backslash, non-ASCII and a surrogate pair, 3 MB in all,
    // written as JSON with some characters as \u escapes, as some clients write them.
    const line = 'Bay C: "SF6" \\ 2.1 bar\t\u00e9 \ud83e\uddea checked\r\n';
    const text = `${line.repeat(Math.ceil((3 * 1024 * 1024) / line.length))}The last reading names SF4.\n`;
    const escapedText = JSON.stringify(text).slice(1, -1).replaceAll("\u00e9", "\\u00e9").replaceAll("\ud83e\uddea", "\\ud83e\\uddea");
    const body = (json: string): Buffer => {
      const bytes = Buffer.from(json, "utf8");
      return Buffer.concat([Buffer.from(`Content-Length: ${bytes.length}\r\n\r\n`), bytes]);
    };
    const open = (openUri: string, textJson: string): string =>
      `{"jsonrpc":"2.0","method":"textDocument/didOpen","params":{"textDocument":{"uri":"${openUri}","languageId":"markdown","version":1,"text":"${textJson}"}}}`;
    // A raw line feed inside the string, and an escape JSON does not have: neither is JSON, so
    // neither document is opened.
    const broken = [fixtureUri("notebook/escaped-line-feed.md"), fixtureUri("notebook/escaped-unknown.md")];
    const cut = escapedText.indexOf("Bay", 2_000_000);
    session.child.stdin.write(body(open(broken[0], `${escapedText.slice(0, cut)}\n${escapedText.slice(cut)}`)));
    session.child.stdin.write(body(open(broken[1], `${escapedText.slice(0, cut)}\\q${escapedText.slice(cut)}`)));
    session.child.stdin.write(body(open(uri, escapedText)));
    const lastLine = text.split("\r\n").length - 1;
    const position = { line: lastLine, character: "The last reading names SF4".length - 1 };
    // On the SF6 of the first line, which any reading of the broken bodies would have.
    const firstSf6 = { line: 0, character: 'Bay C: "SF6'.length - 1 };
    for (const brokenUri of broken) {
      expect(await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri: brokenUri }, position: firstSf6 })).toBeNull();
    }
    const hover = await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position });
    // common practice: SF4 is a seesaw
    expect((hover?.contents as MarkupContent | undefined)?.value).toContain("seesaw");
    expect(hover?.range?.start).toEqual({ line: lastLine, character: "The last reading names ".length });
    session.connection.sendNotification("textDocument/didClose", { textDocument: { uri } });
    await stillAnswers();
  }, 120_000);

  it("reports malformed JSON and still reads what it can", async () => {
    const uri = fixtureUri("reference/broken.json");
    session.open(uri, "json", '{"species": [ {"formula": "SF4", "molecular geometry": "seesaw" }, ');
    const published = await session.waitForDiagnostics(uri);
    expect(published.diagnostics.some((diagnostic) => diagnostic.severity === 1 && diagnostic.source === "lonepair")).toBe(true);
    // common practice: SF4 is a seesaw
    expect(await hoverOnSf4(uri)).toContain("seesaw");
    session.close(uri);
  });

  it("ignores binary content", async () => {
    const uri = fixtureUri("notebook/binary.md");
    const random = seededRandom(7);
    const text = Array.from({ length: 20_000 }, () => String.fromCharCode(Math.floor(random() * 0x2ff))).join("") + "\u0000SF4";
    session.open(uri, "markdown", `\u0000${text}`);
    const published = await session.waitForDiagnostics(uri);
    expect(published.diagnostics).toEqual([]);
    session.close(uri);
    await stillAnswers();
  });

  it("keeps up with a long run of random edits", async () => {
    const uri = fixtureUri("notebook/random-edits.md");
    const random = seededRandom(2207);
    const pieces = [
      "SF4",
      " ",
      "\n",
      "XeF4",
      "| NH3 | trigonal planar |",
      "\\ce{BF4-}",
      "CH5",
      "é",
      "🧪",
      "(",
      "]",
      "Cl",
      "2",
      "^",
      "-",
      ",",
    ];
    let document = session.open(uri, "markdown", "# Run 23\n\nSF4 and NF3 in bay C.\n");
    for (let step = 0; step < 300; step += 1) {
      const length = document.getText().length;
      const start = Math.floor(random() * (length + 1));
      const end = Math.min(length, start + Math.floor(random() * 6));
      const insert = random() < 0.7 ? pieces[Math.floor(random() * pieces.length)] : "";
      document = session.change(uri, [{ range: { start: document.positionAt(start), end: document.positionAt(end) }, text: insert }]);
      if (step % 25 === 0) {
        const position = document.positionAt(Math.floor(random() * (document.getText().length + 1)));
        await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position });
        await session.connection.sendRequest(InlayHintRequest.type, {
          textDocument: { uri },
          range: { start: { line: 0, character: 0 }, end: document.positionAt(document.getText().length) },
        });
        await session.connection.sendRequest(CodeActionRequest.type, {
          textDocument: { uri },
          range: { start: position, end: position },
          context: { diagnostics: [] },
        });
      }
    }
    document = session.change(uri, [
      {
        range: { start: document.positionAt(document.getText().length), end: document.positionAt(document.getText().length) },
        text: "\n\nFinal check: SF4.\n",
      },
    ]);
    const final = await session.waitForDiagnostics(uri, (params) => params.version === document.version);
    // Debounced and guarded: results arrive for ever newer versions, never for an older one after a newer.
    const versions = session.published.filter((params) => params.uri === uri).map((params) => params.version ?? 0);
    expect(versions).toEqual([...versions].sort((a, b) => a - b));
    expect(versions.length).toBeLessThan(300);
    const length = document.getText().length;
    for (const diagnostic of final.diagnostics) {
      expect(document.offsetAt(diagnostic.range.end)).toBeLessThanOrEqual(length);
      expect(diagnostic.source).toBe("lonepair");
    }
    // The server's text equals ours: a hover on the appended species finds it.
    const hover = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri },
      position: document.positionAt(document.getText().lastIndexOf("SF4") + 1),
    });
    // common practice: SF4 is a seesaw
    expect((hover?.contents as MarkupContent | undefined)?.value ?? "").toContain("seesaw");
    await stillAnswers();
  });
});
