/**
 * A small LSP client for the end-to-end tests: starts `node dist/server.js --stdio`, talks to it
 * over the protocol, records pushed diagnostics and log messages.
 */
import { spawn, type ChildProcessWithoutNullStreams } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { TextDocument } from "vscode-languageserver-textdocument";
import {
  ConfigurationRequest,
  DidChangeTextDocumentNotification,
  DidCloseTextDocumentNotification,
  DidOpenTextDocumentNotification,
  ExitNotification,
  InitializeRequest,
  InitializedNotification,
  LogMessageNotification,
  PublishDiagnosticsNotification,
  RegistrationRequest,
  ShutdownRequest,
  StreamMessageReader,
  WorkDoneProgress,
  WorkDoneProgressCreateRequest,
  StreamMessageWriter,
  createProtocolConnection,
  type ClientCapabilities,
  type InitializeResult,
  type ProgressToken,
  type WorkDoneProgressBegin,
  type WorkDoneProgressEnd,
  type WorkDoneProgressReport,
  type WorkspaceFolder,
  type ProtocolConnection,
  type PublishDiagnosticsParams,
  type TextDocumentContentChangeEvent,
  type TextEdit,
} from "vscode-languageserver-protocol/node";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
export const SERVER_PATH = `${ROOT}dist/server.js`;
const FIXTURES = `${ROOT}tests/fixtures/server/`;

/** A client that can do everything the server offers, with diagnostics pushed. */
export const FULL_CAPABILITIES: ClientCapabilities = {
  textDocument: {
    hover: { contentFormat: ["markdown", "plaintext"] },
    codeAction: { codeActionLiteralSupport: { codeActionKind: { valueSet: ["quickfix", "source.fixAll"] } } },
    inlayHint: {},
    publishDiagnostics: { versionSupport: true },
    synchronization: { didSave: false },
  },
  workspace: { workspaceEdit: { documentChanges: true } },
};

export interface SessionOptions {
  readonly capabilities?: ClientCapabilities;
  /** Answer to every `workspace/configuration` item (the `lonepair` section), read at each request. */
  readonly configuration?: () => unknown;
  /** The workspace folders to announce (default: none, with the made-up lab folder as root). */
  readonly workspaceFolders?: WorkspaceFolder[];
}

/** One `$/progress` notification of work done, as the client received it. */
export interface ProgressEvent {
  readonly token: ProgressToken;
  readonly value: WorkDoneProgressBegin | WorkDoneProgressReport | WorkDoneProgressEnd;
}

/** A running server and the client side of its connection. */
export interface LspSession {
  readonly connection: ProtocolConnection;
  readonly child: ChildProcessWithoutNullStreams;
  readonly initializeResult: InitializeResult;
  /** Every diagnostics notification, in arrival order. */
  readonly published: PublishDiagnosticsParams[];
  readonly logs: string[];
  /** Tokens the server created with `window/workDoneProgress/create`, in order. */
  readonly createdProgress: ProgressToken[];
  /** Every work-done progress notification, in arrival order. */
  readonly progress: ProgressEvent[];
  /** Open documents as the client sees them, for applying edits. */
  readonly documents: Map<string, TextDocument>;
  open(uri: string, languageId: string, text: string): TextDocument;
  change(uri: string, changes: TextDocumentContentChangeEvent[]): TextDocument;
  close(uri: string): void;
  /** Resolves with the first diagnostics for `uri` (after any already seen) that satisfy `accept`. */
  waitForDiagnostics(
    uri: string,
    accept?: (params: PublishDiagnosticsParams) => boolean,
    timeoutMs?: number,
  ): Promise<PublishDiagnosticsParams>;
  stop(): Promise<number | null>;
}

/** Text of a fixture in tests/fixtures/server. */
export function fixture(name: string): string {
  return readFileSync(`${FIXTURES}${name}`, "utf8");
}

/** A file URI in a made-up workspace of the lab. */
export function fixtureUri(name: string): string {
  return `file:///kestrel-ridge/${name}`;
}

/** Starts the server and completes the initialize handshake. */
export async function startSession(options: SessionOptions = {}): Promise<LspSession> {
  if (!existsSync(SERVER_PATH)) throw new Error("dist/server.js is missing: run `npm run build` first");
  const child = spawn(process.execPath, [SERVER_PATH, "--stdio"], { stdio: "pipe" });
  const connection = createProtocolConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
  const published: PublishDiagnosticsParams[] = [];
  const logs: string[] = [];
  const createdProgress: ProgressToken[] = [];
  const progress: ProgressEvent[] = [];
  const waiters = new Set<() => void>();
  const documents = new Map<string, TextDocument>();
  child.stderr.on("data", (chunk: Buffer) => logs.push(chunk.toString()));
  connection.onNotification(PublishDiagnosticsNotification.type, (params) => {
    published.push(params);
    for (const wake of waiters) wake();
  });
  connection.onNotification(LogMessageNotification.type, (params) => {
    logs.push(typeof params.message === "string" ? params.message : JSON.stringify(params.message));
  });
  connection.onRequest(ConfigurationRequest.type, (params) => params.items.map(() => options.configuration?.() ?? null));
  connection.onRequest(RegistrationRequest.type, () => undefined);
  connection.onRequest(WorkDoneProgressCreateRequest.type, (params) => {
    createdProgress.push(params.token);
    // Every created token is listened to, so its reports are recorded.
    connection.onProgress(WorkDoneProgress.type, params.token, (value) => {
      progress.push({ token: params.token, value });
    });
  });
  connection.onError(() => undefined);
  connection.listen();

  const initializeResult = await connection.sendRequest(InitializeRequest.type, {
    processId: process.pid,
    rootUri: options.workspaceFolders?.[0]?.uri ?? "file:///kestrel-ridge",
    capabilities: options.capabilities ?? FULL_CAPABILITIES,
    workspaceFolders: options.workspaceFolders ?? null,
  });
  await connection.sendNotification(InitializedNotification.type, {});

  const seen = new Map<string, number>();
  return {
    connection,
    child,
    initializeResult,
    published,
    logs,
    createdProgress,
    progress,
    documents,
    open(uri, languageId, text) {
      const document = TextDocument.create(uri, languageId, 1, text);
      documents.set(uri, document);
      void connection.sendNotification(DidOpenTextDocumentNotification.type, {
        textDocument: { uri, languageId, version: 1, text },
      });
      return document;
    },
    change(uri, changes) {
      const previous = documents.get(uri);
      if (!previous) throw new Error(`${uri} is not open`);
      const document = TextDocument.update(previous, changes, previous.version + 1);
      documents.set(uri, document);
      void connection.sendNotification(DidChangeTextDocumentNotification.type, {
        textDocument: { uri, version: document.version },
        contentChanges: changes,
      });
      return document;
    },
    close(uri) {
      documents.delete(uri);
      void connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });
    },
    waitForDiagnostics(uri, accept = () => true, timeoutMs = 20_000) {
      return new Promise((resolve, reject) => {
        const check = (): boolean => {
          for (let index = seen.get(uri) ?? 0; index < published.length; index += 1) {
            const params = published[index];
            if (params.uri !== uri) continue;
            if (accept(params)) {
              seen.set(uri, index + 1);
              return (resolve(params), true);
            }
          }
          return false;
        };
        if (check()) return;
        const timer = setTimeout(() => {
          waiters.delete(wake);
          reject(new Error(`no matching diagnostics for ${uri} within ${timeoutMs} ms`));
        }, timeoutMs);
        const wake = (): void => {
          if (check()) {
            clearTimeout(timer);
            waiters.delete(wake);
          }
        };
        waiters.add(wake);
      });
    },
    async stop() {
      const exited = new Promise<number | null>((resolve) => {
        if (child.exitCode !== null) resolve(child.exitCode);
        else child.once("exit", (code) => resolve(code));
      });
      try {
        await connection.sendRequest(ShutdownRequest.type);
        await connection.sendNotification(ExitNotification.type);
      } catch {
        child.kill();
      }
      const timer = setTimeout(() => child.kill(), 5000);
      const code = await exited;
      clearTimeout(timer);
      connection.dispose();
      return code;
    },
  };
}

/** Applies workspace text edits for one document the way an editor would. */
export function applyEdits(document: TextDocument, edits: readonly TextEdit[]): string {
  return TextDocument.applyEdits(document, [...edits]);
}

/** The position of the first occurrence of `needle` (plus `delta` characters) in `document`. */
export function positionOf(document: TextDocument, needle: string, delta = 0): { line: number; character: number } {
  const offset = document.getText().indexOf(needle);
  if (offset < 0) throw new Error(`"${needle}" not in ${document.uri}`);
  return document.positionAt(offset + delta);
}
