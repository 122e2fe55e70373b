// A protocol client for the editor benchmarks: starts the built server over stdio as an editor
// does, with pull diagnostics or with pushed ones, and times what an editor waits for.
import { spawn } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import {
  CodeActionRequest,
  DidChangeTextDocumentNotification,
  DidCloseTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DocumentDiagnosticRequest,
  HoverRequest,
  InitializeRequest,
  InitializedNotification,
  InlayHintRequest,
  PublishDiagnosticsNotification,
  StreamMessageReader,
  StreamMessageWriter,
  createProtocolConnection,
} from "vscode-languageserver-protocol/node";

const serverPath = fileURLToPath(new URL("../../dist/server.js", import.meta.url));

/** The machine's load beside each figure: the benchmark shares its cores. */
export function loadNote() {
  return `load average ${loadavg()
    .map((value) => value.toFixed(2))
    .join(" ")}`;
}

export function percentile(values, fraction) {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(fraction * sorted.length))];
}

export const verdict = (met) => (met ? "meets aim" : "MISSES aim");

/** What an editor asks after each edit besides diagnostics: the lightbulb's code actions where the cursor is, and the status bar's counts. */
export const AFTER_EDIT_AIM_MS = 50;

/** Times those two requests at `position` of `uri`; returns the slower. */
export async function afterEdit(server, uri, position) {
  const start = performance.now();
  await server.codeActions(uri, position);
  const actionsMs = performance.now() - start;
  const summaryStart = performance.now();
  await server.summary(uri);
  return Math.max(actionsMs, performance.now() - summaryStart);
}

/** The line that reports `afterEdit` times. */
export function afterEditLine(times) {
  const p95 = percentile(times, 0.95);
  return `  code actions and status-bar counts after each edit  p50 ${percentile(times, 0.5).toFixed(1)} ms  p95 ${p95.toFixed(1)} ms   aim p95 < ${AFTER_EDIT_AIM_MS} ms   ${verdict(p95 < AFTER_EDIT_AIM_MS)}`;
}

/**
 * Starts the server; `mode` is "pull" (the client asks for diagnostics) or "push" (the server
 * publishes them after a pause in typing).
 */
export async function startServer(mode) {
  if (!existsSync(serverPath)) {
    console.error("dist/server.js is missing: run `npm run build` first.");
    process.exit(2);
  }
  // LONEPAIR_BENCH_PROFILE=<folder> writes a CPU profile of the server there.
  const profile = process.env.LONEPAIR_BENCH_PROFILE;
  const flags = profile ? ["--cpu-prof", `--cpu-prof-dir=${profile}`] : [];
  const child = spawn(process.execPath, [...flags, serverPath, "--stdio"], { stdio: ["pipe", "pipe", "inherit"] });
  const connection = createProtocolConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
  connection.onRequest("workspace/configuration", (params) => params.items.map(() => null));
  connection.onRequest("client/registerCapability", () => null);
  const published = new Map();
  const waiting = [];
  connection.onNotification(PublishDiagnosticsNotification.type, (params) => {
    published.set(params.uri, params);
    for (const waiter of [...waiting]) waiter();
  });
  connection.onNotification(() => undefined);
  connection.listen();
  const textDocument =
    mode === "pull" ? { diagnostic: { dynamicRegistration: false }, publishDiagnostics: {} } : { publishDiagnostics: {} };
  await connection.sendRequest(InitializeRequest.type, {
    processId: process.pid,
    rootUri: null,
    capabilities: {
      textDocument: {
        ...textDocument,
        hover: { contentFormat: ["markdown"] },
        // As an editor with a lightbulb asks: on every cursor move, with literal actions.
        codeAction: {
          codeActionLiteralSupport: { codeActionKind: { valueSet: ["quickfix", "refactor", "source"] } },
          dataSupport: true,
          resolveSupport: { properties: ["edit"] },
        },
        inlayHint: {},
      },
    },
    workspaceFolders: null,
  });
  await connection.sendNotification(InitializedNotification.type, {});

  const pushedFor = (uri, version) =>
    new Promise((resolve) => {
      const check = () => {
        const params = published.get(uri);
        if (params && params.version === version) {
          waiting.splice(waiting.indexOf(check), 1);
          resolve(params.diagnostics);
        }
      };
      waiting.push(check);
      check();
    });

  return {
    mode,
    /** Diagnostics of `uri` at `version`: pulled, or waited for. */
    async diagnostics(uri, version) {
      if (mode === "pull") return (await connection.sendRequest(DocumentDiagnosticRequest.type, { textDocument: { uri } })).items ?? [];
      return pushedFor(uri, version);
    },
    open(uri, languageId, version, text) {
      return connection.sendNotification(DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId, version, text } });
    },
    replaceLine(uri, version, line, oldLength, text) {
      return connection.sendNotification(DidChangeTextDocumentNotification.type, {
        textDocument: { uri, version },
        contentChanges: [{ range: { start: { line, character: 0 }, end: { line, character: oldLength } }, text }],
      });
    },
    close(uri) {
      return connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });
    },
    hover(uri, position) {
      return connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position });
    },
    /** The code actions at `position`, as the lightbulb asks for them after a cursor move. */
    codeActions(uri, position) {
      return connection.sendRequest(CodeActionRequest.type, {
        textDocument: { uri },
        range: { start: position, end: position },
        context: { diagnostics: [], triggerKind: 2 },
      });
    },
    /** The inlay hints of lines `from` to `to`, as an editor asks for the lines in view. */
    inlayHints(uri, from, to) {
      return connection.sendRequest(InlayHintRequest.type, {
        textDocument: { uri },
        range: { start: { line: from, character: 0 }, end: { line: to, character: 0 } },
      });
    },
    /** The species and problem counts the status bar asks for after a pause in typing. */
    summary(uri) {
      return connection.sendRequest("lonepair/documentSummary", { uri });
    },
    /** The server's peak resident memory so far, in MB. */
    peakMegabytes() {
      try {
        const match = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${child.pid}/status`, "utf8"));
        return match ? Number(match[1]) / 1024 : NaN;
      } catch {
        return NaN;
      }
    },
    async stop() {
      if (!profile) return void child.kill();
      // A profile is written only on an orderly exit.
      await connection.sendRequest("shutdown");
      await connection.sendNotification("exit");
      await new Promise((resolve) => child.on("exit", resolve));
    },
  };
}
