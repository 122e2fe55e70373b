// Measures the language server over stdio: time to first diagnostics, hover latency, and the
// cost of a large document. Run after `npm run build`: node tests/server/latency.bench.mjs
import { spawn } from "node:child_process";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import {
  CodeActionRequest,
  CodeActionResolveRequest,
  DidOpenTextDocumentNotification,
  ExitNotification,
  HoverRequest,
  InitializeRequest,
  InitializedNotification,
  PublishDiagnosticsNotification,
  ShutdownRequest,
  StreamMessageReader,
  StreamMessageWriter,
  createProtocolConnection,
} from "vscode-languageserver-protocol/node";

const root = fileURLToPath(new URL("../..", import.meta.url));
const child = spawn(process.execPath, [`${root}dist/server.js`, "--stdio"], { stdio: "pipe" });
const connection = createProtocolConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
const waiting = new Map();
connection.onNotification(PublishDiagnosticsNotification.type, (params) => waiting.get(params.uri)?.(params));
connection.listen();

const diagnosticsFor = (uri) => new Promise((resolve) => waiting.set(uri, resolve));
const percentile = (values, p) => [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.floor((p / 100) * values.length))];

await connection.sendRequest(InitializeRequest.type, {
  processId: process.pid,
  rootUri: null,
  capabilities: {
    textDocument: {
      hover: { contentFormat: ["markdown"] },
      publishDiagnostics: { versionSupport: true },
      // As VS Code does: the fix-all edit is resolved only when chosen.
      codeAction: {
        codeActionLiteralSupport: { codeActionKind: { valueSet: ["quickfix"] } },
        dataSupport: true,
        resolveSupport: { properties: ["edit"] },
      },
    },
  },
});
await connection.sendNotification(InitializedNotification.type, {});

async function open(uri, languageId, text) {
  const started = performance.now();
  const published = diagnosticsFor(uri);
  await connection.sendNotification(DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId, version: 1, text } });
  const params = await published;
  return { ms: performance.now() - started, count: params.diagnostics.length };
}

const notes = readFileSync(`${root}tests/fixtures/server/run-21-cylinder-audit.md`, "utf8");
const first = await open("file:///bench/run-21.md", "markdown", notes);
console.log(
  `fixture notebook (${notes.length} chars): first diagnostics after ${first.ms.toFixed(0)} ms (includes the 150 ms pause), ${first.count} diagnostics`,
);

const hoverTimes = [];
const line = notes.split("\n").findIndex((text) => text.startsWith("SF4 is the one"));
for (let index = 0; index < 500; index += 1) {
  const started = performance.now();
  await connection.sendRequest(HoverRequest.type, { textDocument: { uri: "file:///bench/run-21.md" }, position: { line, character: 1 } });
  hoverTimes.push(performance.now() - started);
}
console.log(`hover on SF4, 500 requests: p50 ${percentile(hoverTimes, 50).toFixed(2)} ms, p99 ${percentile(hoverTimes, 99).toFixed(2)} ms`);

for (const megabytes of [0.25, 1, 50]) {
  const paragraph = "Run 22 note: the SF4 cylinder KR-0812 was weighed and returned to bay C.\n";
  const text = paragraph.repeat(Math.ceil((megabytes * 1024 * 1024) / paragraph.length));
  const result = await open(`file:///bench/large-${megabytes}.md`, "markdown", text);
  console.log(`markdown of ${megabytes} MB: first diagnostics after ${result.ms.toFixed(0)} ms, ${result.count} diagnostics`);
}

const header = "id,species,formula,valence electrons,lone pairs on central atom,molecular geometry,polarity,supplier lot\n";
const row = "CYL-102,ammonia,NH3,8,1,trigonal planar,polar,KR-0813\n";
const table = header + row.repeat(Math.floor((1024 * 1024 - header.length) / row.length));
const csv = await open("file:///bench/cylinders.csv", "plaintext", table);
console.log(`CSV of ${(table.length / 1e6).toFixed(2)} M chars: first diagnostics after ${csv.ms.toFixed(0)} ms, ${csv.count} diagnostics`);
const actionTimes = [];
for (let index = 0; index < 20; index += 1) {
  const started = performance.now();
  const actions = await connection.sendRequest(CodeActionRequest.type, {
    textDocument: { uri: "file:///bench/cylinders.csv" },
    range: { start: { line: 1 + index, character: 30 }, end: { line: 1 + index, character: 30 } },
    context: { diagnostics: [] },
  });
  actionTimes.push(performance.now() - started);
  if (index === 0) console.log(`code actions at a row: ${actions.map((action) => action.title).join("; ")}`);
}
console.log(
  `code actions on that CSV, 20 requests: p50 ${percentile(actionTimes, 50).toFixed(1)} ms, max ${Math.max(...actionTimes).toFixed(1)} ms`,
);
const resolveStarted = performance.now();
const [, fixAll] = await connection.sendRequest(CodeActionRequest.type, {
  textDocument: { uri: "file:///bench/cylinders.csv" },
  range: { start: { line: 1, character: 30 }, end: { line: 1, character: 30 } },
  context: { diagnostics: [] },
});
const resolved = await connection.sendRequest(CodeActionResolveRequest.type, fixAll);
console.log(
  `fix all resolved: ${resolved.edit?.changes?.["file:///bench/cylinders.csv"]?.length} edits in ${(performance.now() - resolveStarted).toFixed(0)} ms`,
);

await connection.sendRequest(ShutdownRequest.type);
await connection.sendNotification(ExitNotification.type);
connection.dispose();
