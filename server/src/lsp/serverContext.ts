/**
 * What every feature adapter is given: the connection, the open documents, the model cache,
 * settings and the client's abilities. One object, so features stay short and testable.
 */
import type { Connection, TextDocuments } from "vscode-languageserver";
import type { ChunkedTextDocument } from "./chunkedDocument";
import type { ClientFeatures } from "./clientFeatures";
import type { AnalysedDocument, DocumentCache } from "./documentCache";
import type { ServerLog } from "./guardedHandler";
import type { LongWork } from "./quickRequests";
import type { ServerSettings } from "./settings";
import type { SettingsStore } from "./settingsStore";
import type { WholeReadings } from "./wholeReadings";
import type { WorkspaceFolderPath } from "./workspaceFolders";

export interface ServerContext {
  readonly connection: Connection;
  readonly documents: TextDocuments<ChunkedTextDocument>;
  readonly cache: DocumentCache;
  readonly settings: SettingsStore;
  readonly log: ServerLog;
  /** Long work calls `giveWay()` between slices, so quick requests are answered meanwhile. */
  readonly longWork: LongWork;
  /** The whole reading of a large broken JSON or YAML list, on a worker thread. */
  readonly wholeReadings: WholeReadings;
  /** Known once `initialize` has been answered. */
  clientFeatures(): ClientFeatures;
  /** The editor's open folders on disk (empty before `initialize`). */
  workspaceFolders(): readonly WorkspaceFolderPath[];
}

/** An open document that lonepair is enabled for, with its model and settings. */
export interface EnabledDocument {
  readonly document: ChunkedTextDocument;
  readonly analysed: AnalysedDocument;
  readonly settings: ServerSettings;
}

/** The open document at `uri` with its model, or undefined when it is closed or not enabled. */
export async function enabledDocument(context: ServerContext, uri: string): Promise<EnabledDocument | undefined> {
  const document = context.documents.get(uri);
  if (!document) return undefined;
  const settings = await context.settings.forUri(uri);
  // Settings came back asynchronously: a newer edit may have arrived meanwhile.
  const current = context.documents.get(uri);
  if (!current) return undefined;
  const kind = context.cache.kindOf(current);
  if (!kind || !settings.enabledLanguages.includes(kind)) return undefined;
  return { document: current, analysed: context.cache.get(current, kind), settings };
}
