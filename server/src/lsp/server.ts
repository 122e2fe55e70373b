/**
 * Wires the features to a connection: capabilities from `initialize`, document sync, settings
 * and the handlers. Kept apart from `main.ts` so the wiring reads in one place.
 */
import {
  CodeActionKind,
  DidChangeConfigurationNotification,
  TextDocumentSyncKind,
  TextDocuments,
  type Connection,
  type ExecuteCommandParams,
  type InitializeParams,
  type InitializeResult,
} from "vscode-languageserver";
import { CHUNKED_DOCUMENTS } from "./chunkedDocument";
import { clientFeaturesFrom, type ClientFeatures } from "./clientFeatures";
import { createDocumentCache } from "./documentCache";
import { guarded, guardedNotification, yieldToEventLoop, type ServerLog } from "./guardedHandler";
import type { LongWork } from "./quickRequests";
import type { ServerContext } from "./serverContext";
import { createSettingsStore } from "./settingsStore";
import { registerCodeActions } from "./features/codeActions";
import { registerDiagnostics, type DiagnosticsFeature } from "./features/diagnostics";
import { registerHover, type HoverFeature } from "./features/hover";
import { createOffThreadWork } from "./offThreadWork";
import { createWholeReadings } from "./wholeReadings";
import { registerInlayHints } from "./features/inlayHints";
import { registerSpeciesRequests } from "./features/speciesRequests";
import { registerLewisFigure } from "./features/lewisFigure";
import { SUMMARY_TABLE_COMMAND, registerSummaryTable, summaryTableCommand } from "./features/summaryTable";
import { registerWorkspaceCheck, type WorkspaceCheckFeature } from "./features/workspaceCheck";
import { WORKSPACE_CHECK_COMMAND } from "../../../shared/src/index";
import { workspaceFoldersFrom, type WorkspaceFolders } from "./workspaceFolders";

/**
 * Starts serving on `connection`; returns once the handlers are registered. Long work gives way
 * to quick requests through `longWork` (when the transport is watched; otherwise it only yields).
 */
export function startServer(connection: Connection, longWork: LongWork = { giveWay: yieldToEventLoop }): void {
  const log: ServerLog = {
    error: (message) => connection.console.error(message),
    info: (message) => connection.console.info(message),
  };
  // Kept in chunks: an edit to a large table copies a few kilobytes, not the whole text.
  const documents = new TextDocuments(CHUNKED_DOCUMENTS);
  let features: ClientFeatures | undefined;
  let diagnostics: DiagnosticsFeature | undefined;
  let hover: HoverFeature | undefined;
  let workspaceCheck: WorkspaceCheckFeature | undefined;
  let folders: WorkspaceFolders | undefined;
  const settings = createSettingsStore(connection, () => features?.configuration ?? false, log);
  // A second worker for the whole reading of a large broken document: it never waits behind a
  // species. A small young generation keeps its peak lower (a 5 MB list: 237 MB, not 261).
  const wholeReadings = createWholeReadings(createOffThreadWork(log, undefined, { maxYoungGenerationSizeMb: 8 }));
  const context: ServerContext = {
    connection,
    documents,
    cache: createDocumentCache(),
    settings,
    log,
    longWork,
    wholeReadings,
    clientFeatures: () => features ?? clientFeaturesFrom({}),
    workspaceFolders: () => folders?.current() ?? [],
  };

  connection.onInitialize((params: InitializeParams): InitializeResult => {
    features = clientFeaturesFrom(params.capabilities ?? {});
    folders = workspaceFoldersFrom(params);
    // Clients without workspace/configuration may hand settings over here: { settings: { lonepair: {...} } }.
    const initialSettings = (params.initializationOptions as { settings?: unknown } | null | undefined)?.settings;
    if (initialSettings !== undefined) settings.changed(initialSettings);
    // One worker for every request about a large species: hovers, 3D models, coordinate files.
    const offThread = createOffThreadWork(log);
    hover = registerHover(context, offThread);
    registerCodeActions(context);
    registerSummaryTable(context);
    registerSpeciesRequests(context, offThread);
    registerLewisFigure(context);
    if (features.inlayHints) registerInlayHints(context, hover);
    // Once a document's diagnostics are out, its hover cards are written ahead.
    diagnostics = registerDiagnostics(context, hover.prepare, wholeReadings);
    workspaceCheck = registerWorkspaceCheck(context);
    if (features.workspaceFolders) {
      connection.workspace.onDidChangeWorkspaceFolders(
        guardedNotification(log, "workspace folders change", (event) => {
          folders?.changed(event);
          workspaceCheck?.filesMayHaveChanged();
        }),
      );
    }
    return { capabilities: serverCapabilities(features), serverInfo: { name: "lonepair" } };
  });

  connection.onInitialized(() => {
    workspaceCheck?.initialized();
    hover?.warmUp().catch((error: unknown) => log.error(`lonepair: hover warm-up failed: ${String(error)}`));
    if (features?.configurationRegistration) {
      connection.client.register(DidChangeConfigurationNotification.type, { section: "lonepair" }).catch(() => undefined);
    }
  });

  connection.onDidChangeConfiguration(
    guardedNotification(log, "settings change", (params) => {
      settings.changed(params.settings);
      diagnostics?.settingsChanged();
      workspaceCheck?.filesMayHaveChanged();
      if (features?.inlayHintRefresh) connection.languages.inlayHint.refresh().catch(() => undefined);
    }),
  );

  connection.onExecuteCommand(
    guarded<ExecuteCommandParams, unknown>(log, "command", null, (params, token) => {
      if (params.command === SUMMARY_TABLE_COMMAND) return summaryTableCommand(context)(params, token);
      if (params.command === WORKSPACE_CHECK_COMMAND) return workspaceCheck?.runCommand(params, token) ?? null;
      return null;
    }),
  );

  connection.onDidChangeWatchedFiles(guardedNotification(log, "watched files change", () => workspaceCheck?.filesMayHaveChanged()));

  documents.onDidChangeContent(
    guardedNotification(log, "document change", (event) => {
      // Every open and change is a new text, whatever version number the client gave it.
      context.cache.contentChanged(event.document.uri);
      diagnostics?.documentChanged(event.document.uri);
    }),
  );
  documents.onDidClose(
    guardedNotification(log, "document close", (event) => {
      context.cache.delete(event.document.uri);
      settings.forget(event.document.uri);
      diagnostics?.documentClosed(event.document.uri);
      hover?.closed(event.document.uri);
      // The file is the one on disk again, which may differ from the text the editor had.
      workspaceCheck?.filesMayHaveChanged();
    }),
  );
  documents.listen(connection);
  connection.listen();
}

function serverCapabilities(features: ClientFeatures): InitializeResult["capabilities"] {
  return {
    textDocumentSync: { openClose: true, change: TextDocumentSyncKind.Incremental },
    hoverProvider: true,
    codeActionProvider: features.codeActionLiterals
      ? {
          codeActionKinds: [CodeActionKind.QuickFix, `${CodeActionKind.SourceFixAll}.lonepair`],
          resolveProvider: features.codeActionResolveEdit,
        }
      : false,
    inlayHintProvider: features.inlayHints ? { resolveProvider: false } : undefined,
    diagnosticProvider: features.pullDiagnostics
      ? { identifier: "lonepair", interFileDependencies: false, workspaceDiagnostics: true }
      : undefined,
    executeCommandProvider: { commands: [SUMMARY_TABLE_COMMAND, WORKSPACE_CHECK_COMMAND] },
    workspace: { workspaceFolders: { supported: true, changeNotifications: true } },
  };
}
