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
  type InitializeParams,
  type InitializeResult,
} from "vscode-languageserver";
import { CHUNKED_DOCUMENTS } from "./chunkedDocument";
import { clientFeaturesFrom, type ClientFeatures } from "./clientFeatures";
import { createDocumentCache } from "./documentCache";
import { guarded, guardedNotification, type ServerLog } from "./guardedHandler";
import type { ServerContext } from "./serverContext";
import { createSettingsStore } from "./settingsStore";
import { registerCodeActions } from "./features/codeActions";
import { registerDiagnostics, type DiagnosticsFeature } from "./features/diagnostics";
import { registerHover } from "./features/hover";
import { registerInlayHints } from "./features/inlayHints";
import { registerSpeciesRequests } from "./features/speciesRequests";
import { SUMMARY_TABLE_COMMAND, registerSummaryTable, summaryTableCommand } from "./features/summaryTable";

/** Starts serving on `connection`; returns once the handlers are registered. */
export function startServer(connection: Connection): void {
  const log: ServerLog = {
    error: (message) => connection.console.error(message),
    info: (message) => connection.console.info(message),
  };
  // Kept in chunks: an edit to a large table copies a few kilobytes, not the whole text.
  const documents = new TextDocuments(CHUNKED_DOCUMENTS);
  let features: ClientFeatures | undefined;
  let diagnostics: DiagnosticsFeature | undefined;
  const settings = createSettingsStore(connection, () => features?.configuration ?? false, log);
  const context: ServerContext = {
    connection,
    documents,
    cache: createDocumentCache(),
    settings,
    log,
    clientFeatures: () => features ?? clientFeaturesFrom({}),
  };

  connection.onInitialize((params: InitializeParams): InitializeResult => {
    features = clientFeaturesFrom(params.capabilities ?? {});
    // Clients without workspace/configuration may hand settings over here: { settings: { lonepair: {...} } }.
    const initialSettings = (params.initializationOptions as { settings?: unknown } | null | undefined)?.settings;
    if (initialSettings !== undefined) settings.changed(initialSettings);
    registerHover(context);
    registerCodeActions(context);
    registerSummaryTable(context);
    registerSpeciesRequests(context);
    if (features.inlayHints) registerInlayHints(context);
    diagnostics = registerDiagnostics(context);
    return { capabilities: serverCapabilities(features), serverInfo: { name: "lonepair" } };
  });

  connection.onInitialized(() => {
    if (features?.configurationRegistration) {
      connection.client.register(DidChangeConfigurationNotification.type, { section: "lonepair" }).catch(() => undefined);
    }
  });

  connection.onDidChangeConfiguration(
    guardedNotification(log, "settings change", (params) => {
      settings.changed(params.settings);
      diagnostics?.settingsChanged();
      if (features?.inlayHintRefresh) connection.languages.inlayHint.refresh().catch(() => undefined);
    }),
  );

  connection.onExecuteCommand(
    guarded(log, "command", null, (params, token) =>
      params.command === SUMMARY_TABLE_COMMAND ? summaryTableCommand(context)(params, token) : null,
    ),
  );

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
      ? { identifier: "lonepair", interFileDependencies: false, workspaceDiagnostics: false }
      : undefined,
    executeCommandProvider: { commands: [SUMMARY_TABLE_COMMAND] },
  };
}
