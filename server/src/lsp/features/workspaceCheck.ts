/**
 * The workspace check through the protocol, so every LSP editor can check all its files:
 * `workspace/diagnostic` for clients that pull diagnostics, and the command
 * `lonepair.checkWorkspaceFolders` (with work-done progress that can be cancelled) for any client,
 * which publishes the diagnostics itself when the client does not pull. Both run the same pass
 * (`workspacePass.ts`).
 */
import {
  CancellationTokenSource,
  DidChangeWatchedFilesNotification,
  DocumentDiagnosticReportKind,
  WorkspaceDiagnosticRequest,
  type CancellationToken,
  type ExecuteCommandParams,
  type WorkDoneProgressReporter,
  type WorkspaceDiagnosticParams,
  type WorkspaceDiagnosticReport,
  type WorkspaceDocumentDiagnosticReport,
} from "vscode-languageserver";
import { pathToFileURL } from "node:url";
import type { WorkspaceCheckResult } from "../../../../shared/src/index";
import { guarded } from "../guardedHandler";
import type { ServerContext } from "../serverContext";
import { checkWorkspaceFolders, pathOfUri, type CheckedFile } from "../workspacePass";

/**
 * After a complete pass, the next pull waits for a sign that files changed (a watched file, a
 * closed document, new settings or folders, the command) or this long, whichever comes first:
 * a client pulls again as soon as it has an answer, and a workspace must not be read in a loop.
 */
export const REPULL_AFTER_MS = 60_000;

/** Reports sent to the client at a time as partial results. */
const PARTIAL_RESULT_SIZE = 100;

/** Files whose extension makes them documents, for the client's file watcher. */
const WATCHED_FILES = "**/*.{md,markdown,mdown,mkd,txt,text,csv,tsv,tab,json,jsonc,yaml,yml,dat,log}";

/** What the rest of the server tells the workspace check. */
export interface WorkspaceCheckFeature {
  /** Files may have changed on disk or in meaning (settings, folders, a closed document). */
  filesMayHaveChanged(): void;
  /** The client has finished initializing: register the file watcher if it can. */
  initialized(): void;
  /** Runs the command; the answer of `workspace/executeCommand`. */
  runCommand(params: ExecuteCommandParams, token: CancellationToken): Promise<WorkspaceCheckResult>;
}

export function registerWorkspaceCheck(context: ServerContext): WorkspaceCheckFeature {
  const { connection } = context;
  const pulls = context.clientFeatures().pullDiagnostics;
  let passCompleted = false;
  let changed = false;
  const waiting = new Set<() => void>();
  // Files with problems published by the command, so a later run can clear those now clean or gone.
  let publishedByCommand = new Set<string>();

  const filesMayHaveChanged = (): void => {
    changed = true;
    for (const wake of [...waiting]) wake();
  };

  /** Resolves at once for a first pull or after a change; otherwise at the next change, timeout or cancellation. */
  const nextChange = (token: CancellationToken): Promise<void> => {
    if (!passCompleted || changed) return Promise.resolve();
    return new Promise((resolve) => {
      const done = (): void => {
        clearTimeout(timer);
        waiting.delete(done);
        listener.dispose();
        resolve();
      };
      const timer = setTimeout(done, REPULL_AFTER_MS);
      const listener = token.onCancellationRequested(done);
      waiting.add(done);
    });
  };

  if (pulls) {
    connection.languages.diagnostics.onWorkspace(
      guarded<WorkspaceDiagnosticParams, WorkspaceDiagnosticReport>(
        context.log,
        "workspace diagnostics",
        { items: [] },
        async (params, token) => {
          await nextChange(token);
          if (token.isCancellationRequested) return { items: [] };
          changed = false;
          const previous = new Map<string, string>();
          for (const held of Array.isArray(params.previousResultIds) ? params.previousResultIds : []) {
            const path = typeof held?.uri === "string" ? pathOfUri(held.uri) : undefined;
            if (path !== undefined && typeof held.value === "string") previous.set(path, held.value);
          }
          const progress = connection.window.attachWorkDoneProgress(params.workDoneToken);
          progress.begin("lonepair: checking workspace files", 0, undefined, false);
          const items: WorkspaceDocumentDiagnosticReport[] = [];
          const partialToken = params.partialResultToken;
          const flush = (): void => {
            if (partialToken === undefined || items.length === 0) return;
            void connection.sendProgress(WorkspaceDiagnosticRequest.partialResult, partialToken, { items: items.splice(0) });
          };
          const reported = new Set<string>();
          const result = await checkWorkspaceFolders(context, {
            token,
            previous,
            progress: throttled(progress),
            onFile(file) {
              reported.add(file.path);
              items.push(reportOf(file));
              if (items.length >= PARTIAL_RESULT_SIZE) flush();
            },
          });
          progress.done();
          if (!result.cancelled) {
            // What the client holds from an earlier pass for files not found now (deleted, ignored, turned off): clear it.
            const open = new Set(context.documents.all().map((document) => pathOfUri(document.uri)));
            for (const [path, resultId] of previous) {
              if (resultId.startsWith("disk:") && !reported.has(path) && !open.has(path))
                items.push({ kind: DocumentDiagnosticReportKind.Full, uri: pathToFileURL(path).href, version: null, items: [] });
            }
            passCompleted = true;
          }
          flush();
          return { items };
        },
      ),
    );
  }

  return {
    filesMayHaveChanged,
    initialized() {
      if (!pulls || !context.clientFeatures().watchedFilesRegistration) return;
      connection.client
        .register(DidChangeWatchedFilesNotification.type, { watchers: [{ globPattern: WATCHED_FILES }] })
        .catch(() => undefined);
    },
    async runCommand(params, token) {
      const progress = await commandProgress(context, params);
      const cancellation = new CancellationTokenSource();
      const listeners = [token.onCancellationRequested(() => cancellation.cancel())];
      if ("token" in progress) listeners.push((progress.token as CancellationToken).onCancellationRequested(() => cancellation.cancel()));
      progress.begin("lonepair: checking workspace files", 0, "finding files…", true);
      const published = new Set<string>();
      try {
        const result = await checkWorkspaceFolders(context, {
          token: cancellation.token,
          progress: throttled(progress),
          async onFile(file: CheckedFile) {
            // A client that pulls gets these through workspace/diagnostic; an open file has its own diagnostics.
            if (pulls || file.open || !file.diagnostics) return;
            if (file.diagnostics.length === 0 && !publishedByCommand.has(file.uri)) return;
            if (file.diagnostics.length > 0) published.add(file.uri);
            await connection.sendDiagnostics({ uri: file.uri, diagnostics: file.diagnostics });
          },
        });
        if (!result.cancelled && !pulls) {
          for (const uri of publishedByCommand) {
            if (!published.has(uri) && !context.documents.get(uri)) await connection.sendDiagnostics({ uri, diagnostics: [] });
          }
          publishedByCommand = published;
        } else {
          for (const uri of published) publishedByCommand.add(uri);
        }
        if (pulls) filesMayHaveChanged();
        return result;
      } finally {
        progress.done();
        for (const listener of listeners) listener.dispose();
        cancellation.dispose();
      }
    },
  };
}

/** The protocol report of one file: in full, or unchanged when the client holds this result already. */
function reportOf(file: CheckedFile): WorkspaceDocumentDiagnosticReport {
  return file.diagnostics
    ? { kind: DocumentDiagnosticReportKind.Full, uri: file.uri, version: file.version, resultId: file.resultId, items: file.diagnostics }
    : { kind: DocumentDiagnosticReportKind.Unchanged, uri: file.uri, version: file.version, resultId: file.resultId };
}

/** The client's own progress token when it sent one; else one the server creates (a no-op for a client without progress). */
async function commandProgress(context: ServerContext, params: ExecuteCommandParams): Promise<WorkDoneProgressReporter> {
  if (params.workDoneToken !== undefined) return context.connection.window.attachWorkDoneProgress(params.workDoneToken);
  return context.connection.window.createWorkDoneProgress();
}

/** At most one progress message this often: a pass over many small files must not flood the client. */
const PROGRESS_INTERVAL_MS = 200;

/** Reports to `progress`, dropping messages that come sooner than `PROGRESS_INTERVAL_MS` after the last. */
function throttled(progress: WorkDoneProgressReporter): (message: string, percentage?: number) => void {
  let last = 0;
  return (message, percentage) => {
    const now = Date.now();
    if (now - last < PROGRESS_INTERVAL_MS) return;
    last = now;
    if (percentage === undefined) progress.report(message);
    else progress.report(percentage, message);
  };
}
