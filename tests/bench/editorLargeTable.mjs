// Benchmark of the language server on a large table, driven over stdio by a protocol client as an
// editor drives it: a 100,000-row cylinder CSV (one wrong electron count in every 997 rows) is
// opened, diagnostics are pulled, then one-line edits each make one more cell wrong and the
// diagnostics are pulled again. Prints open-to-diagnostics time, edit-to-diagnostics p50/p95, how
// many seeded errors were reported, and the server's peak memory, beside the aims.
import { spawn } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import {
  DidChangeTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DocumentDiagnosticRequest,
  InitializeRequest,
  InitializedNotification,
  StreamMessageReader,
  StreamMessageWriter,
  createProtocolConnection,
} from "vscode-languageserver-protocol/node";
import { CYLINDER_HEADER, cylinderRow, isSeededMistake } from "./cylinderRows.mjs";

const serverPath = fileURLToPath(new URL("../../dist/server.js", import.meta.url));
if (!existsSync(serverPath)) {
  console.error("dist/server.js is missing: run `npm run build` first.");
  process.exit(2);
}
const ROWS = 100_000;
const EDITS = 20;
const AIMS = { openMs: 1000, editP95Ms: 50, peakMb: 300 };

const lines = [CYLINDER_HEADER];
let seeded = 0;
for (let index = 0; index < ROWS; index++) {
  const wrong = isSeededMistake(index);
  if (wrong) seeded++;
  lines.push(cylinderRow(index, wrong));
}
const text = `${lines.join("\n")}\n`;

const child = spawn(process.execPath, ["--expose-gc", serverPath, "--stdio"], { stdio: ["pipe", "pipe", "inherit"] });
const connection = createProtocolConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
connection.onRequest("workspace/configuration", (params) => params.items.map(() => null));
connection.onRequest("client/registerCapability", () => null);
connection.onNotification(() => undefined);
connection.listen();

function peakMegabytes() {
  try {
    const status = readFileSync(`/proc/${child.pid}/status`, "utf8");
    const match = /VmHWM:\s+(\d+) kB/.exec(status);
    return match ? Number(match[1]) / 1024 : NaN;
  } catch {
    return NaN;
  }
}

await connection.sendRequest(InitializeRequest.type, {
  processId: process.pid,
  rootUri: null,
  capabilities: { textDocument: { diagnostic: { dynamicRegistration: false }, publishDiagnostics: {} } },
  workspaceFolders: null,
});
await connection.sendNotification(InitializedNotification.type, {});

const uri = "file:///kestrel-ridge/inventory/cylinders-100k.csv";
const errorsIn = (report) => (report.items ?? []).filter((item) => item.severity === 1 || item.severity === 2).length;
let version = 1;
const openStart = performance.now();
await connection.sendNotification(DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId: "csv", version, text } });
const opened = await connection.sendRequest(DocumentDiagnosticRequest.type, { textDocument: { uri } });
const openMs = performance.now() - openStart;
const reportedOnOpen = errorsIn(opened);

const editTimes = [];
let lastReport = opened;
for (let edit = 0; edit < EDITS; edit++) {
  // Make a correct row far into the file wrong: its electron count drops by two.
  const index = Math.floor(((edit + 1) * ROWS) / (EDITS + 1));
  const line = index + 1;
  const before = cylinderRow(index);
  const after = cylinderRow(index, true);
  version += 1;
  const start = performance.now();
  await connection.sendNotification(DidChangeTextDocumentNotification.type, {
    textDocument: { uri, version },
    contentChanges: [{ range: { start: { line, character: 0 }, end: { line, character: before.length } }, text: after }],
  });
  lastReport = await connection.sendRequest(DocumentDiagnosticRequest.type, { textDocument: { uri } });
  editTimes.push(performance.now() - start);
}
editTimes.sort((a, b) => a - b);
const p = (q) => editTimes[Math.min(editTimes.length - 1, Math.floor(q * editTimes.length))];
const peak = peakMegabytes();
const verdict = (ok) => (ok ? "meets aim" : "MISSES aim");
console.log(`editor, 100,000-row CSV over stdio (pull diagnostics), ${text.length.toLocaleString("en")} characters`);
console.log(`  open to diagnostics        ${openMs.toFixed(0)} ms   aim < ${AIMS.openMs} ms   ${verdict(openMs < AIMS.openMs)}`);
console.log(`  seeded wrong cells         ${reportedOnOpen} of ${seeded} reported on open   ${verdict(reportedOnOpen >= seeded)}`);
console.log(
  `  one-line edit to diagnostics  p50 ${p(0.5).toFixed(0)} ms  p95 ${p(0.95).toFixed(0)} ms   aim p95 < ${AIMS.editP95Ms} ms   ${verdict(p(0.95) < AIMS.editP95Ms)}`,
);
console.log(`  cells made wrong by edits  ${errorsIn(lastReport) - reportedOnOpen} of ${EDITS} reported after the edits`);
console.log(`  server peak memory         ${peak.toFixed(0)} MB   aim < ${AIMS.peakMb} MB   ${verdict(peak < AIMS.peakMb)}`);
child.kill();
process.exit(0);
