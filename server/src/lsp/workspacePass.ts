/**
 * One pass of the workspace check: every document lonepair reads in the workspace folders,
 * found exactly as `lonepair check` finds them (the same search: .gitignore honoured through a
 * git that runs nothing the folder configures, binary files left out), each checked as the
 * editor checks an open document. Open documents are checked in their editor text. The pass is
 * bounded (a number of files, a length read per file), yields between files so a cancellation
 * or an edit can arrive, and reports its progress.
 */
import { fileURLToPath, pathToFileURL } from "node:url";
import type { CancellationToken, Diagnostic } from "vscode-languageserver";
import { TextDocument } from "vscode-languageserver-textdocument";
import { MAX_ANALYSED_LENGTH, shownParts, type WorkspaceCheckResult } from "../../../shared/src/index";
import { searchDocuments, type DocumentFile } from "../files/findDocuments";
import { readDocumentText } from "../files/readDocumentText";
import { analyseDocument, type AnalysedDocument } from "./documentCache";
import { cappedFindings, diagnosticsOf, partsInSlices } from "./features/diagnostics";
import { describeError } from "./guardedHandler";
import { enabledDocument, type ServerContext } from "./serverContext";
import type { ServerSettings } from "./settings";

/** The search stops at this many documents and says so: beyond it a folder is a data store, not a workspace. */
export const MAX_WORKSPACE_FILES = 100_000;

/** Files sniffed between two yields while searching. */
const SEARCH_STEPS_PER_YIELD = 64;

/** One file's outcome. */
export interface CheckedFile {
  readonly uri: string;
  /** The file's path on disk. */
  readonly path: string;
  /** The open document's version; null for a file read from disk. */
  readonly version: number | null;
  /** Tells this result from any other: the text's revision (open) or the file's time and size, and the settings. */
  readonly resultId: string;
  /** Absent when the result is the one the client already holds (see `PassOptions.previous`). */
  readonly diagnostics?: Diagnostic[];
  /** True when the document is open in the editor. */
  readonly open: boolean;
}

export interface PassOptions {
  readonly token: CancellationToken;
  /** The result ids the client holds, by path: a file on disk whose id still matches is not read again. */
  readonly previous?: ReadonlyMap<string, string>;
  /** Progress for the user: a message, and a percentage once the files are counted. */
  progress(message: string, percentage?: number): void;
  onFile(file: CheckedFile): void | Promise<void>;
}

/** Checks every document in the workspace folders; resolves with the counts (cancelled when the token fired). */
export async function checkWorkspaceFolders(context: ServerContext, options: PassOptions): Promise<WorkspaceCheckResult> {
  const { token } = options;
  const found: { readonly file: DocumentFile; readonly settings: ServerSettings }[] = [];
  const seen = new Set<string>();
  let unreadable = 0;
  let stoppedAt: number | undefined;
  let steps = 0;
  options.progress("finding files…");
  search: for (const folder of context.workspaceFolders()) {
    const settings = await context.settings.forUri(folder.uri || pathToFileURL(folder.path).href);
    for (const item of searchDocuments([folder.path], folder.path)) {
      if (++steps % SEARCH_STEPS_PER_YIELD === 0) {
        await context.longWork.giveWay();
        if (token.isCancellationRequested) break search;
        options.progress(`finding files: ${found.length}`);
      }
      if (item.kind === "unreadable") {
        unreadable += 1;
        context.log.info(`lonepair: workspace check: ${folder.path}: ${item.unreadable.path}: ${item.unreadable.message}`);
      } else if (item.kind === "document" && !seen.has(item.file.path)) {
        seen.add(item.file.path);
        if (!settings.enabledLanguages.includes(item.file.kind)) continue;
        if (found.length >= MAX_WORKSPACE_FILES) {
          stoppedAt = MAX_WORKSPACE_FILES;
          context.log.info(`lonepair: workspace check: stopped at ${MAX_WORKSPACE_FILES} files; the rest are not checked.`);
          break search;
        }
        found.push({ file: item.file, settings });
      }
    }
  }

  const openByPath = openDocumentsByPath(context);
  let checked = 0;
  let filesWithProblems = 0;
  let problems = 0;
  for (let index = 0; index < found.length && !token.isCancellationRequested; index += 1) {
    const { file, settings } = found[index];
    options.progress(`${index} of ${found.length} files`, Math.floor((100 * index) / found.length));
    try {
      const outcome = await checkOne(context, file, settings, openByPath.get(file.path), options.previous, token);
      checked += 1;
      if (outcome.diagnostics && outcome.diagnostics.length > 0) {
        filesWithProblems += 1;
        problems += outcome.diagnostics.length;
      }
      await options.onFile(outcome);
    } catch (error) {
      // A file given up on for a cancellation is neither checked nor unreadable.
      if (error instanceof PassCancelled) break;
      unreadable += 1;
      context.log.info(`lonepair: workspace check: ${file.path}: ${describeError(error)}`);
    }
    // Lets a cancellation, an edit or another request in between files.
    await context.longWork.giveWay();
  }
  return {
    files: found.length,
    checked,
    filesWithProblems,
    problems,
    unreadable,
    cancelled: token.isCancellationRequested,
    ...(stoppedAt !== undefined ? { stoppedAt } : {}),
  };
}

/** Thrown out of a file's check when the pass is cancelled in the middle of it. */
class PassCancelled extends Error {}

/** The path of a `file:` URI, or undefined for another scheme or a malformed URI. */
export function pathOfUri(uri: string): string | undefined {
  if (!uri.startsWith("file:")) return undefined;
  try {
    return fileURLToPath(uri);
  } catch {
    return undefined;
  }
}

function openDocumentsByPath(context: ServerContext): Map<string, string> {
  const open = new Map<string, string>();
  for (const document of context.documents.all()) {
    const path = pathOfUri(document.uri);
    if (path !== undefined) open.set(path, document.uri);
  }
  return open;
}

async function checkOne(
  context: ServerContext,
  file: DocumentFile,
  settings: ServerSettings,
  openUri: string | undefined,
  previous: ReadonlyMap<string, string> | undefined,
  token: CancellationToken,
): Promise<CheckedFile> {
  const generation = context.settings.generation;
  // A large file is read a part at a time between other requests, a broken list on the worker thread.
  const slices = { longWork: context.longWork, wholeReadings: context.wholeReadings };
  const stop = (): boolean => token.isCancellationRequested;
  const diagnosticsIn = async (document: TextDocument, analysed: AnalysedDocument, diagnostics: ServerSettings["diagnostics"]) => {
    const parts = await partsInSlices(
      analysed,
      shownParts(analysed.findingParts(), diagnostics.notesAs),
      diagnostics.maxPerDocument,
      stop,
      slices,
    );
    if (!parts) throw new PassCancelled();
    return diagnosticsOf(document, cappedFindings(parts, diagnostics.maxPerDocument));
  };
  if (openUri !== undefined) {
    // An open document is checked in the editor's text, as its own diagnostics are.
    const enabled = await enabledDocument(context, openUri);
    if (enabled) {
      const { document, analysed } = enabled;
      const diagnostics = await diagnosticsIn(document, analysed, enabled.settings.diagnostics);
      return {
        uri: openUri,
        path: file.path,
        version: document.version,
        resultId: `open:${analysed.revision}:${generation}`,
        diagnostics,
        open: true,
      };
    }
  }
  const uri = openUri ?? pathToFileURL(file.path).href;
  const resultId = `disk:${file.modifiedMs}:${file.size}:${generation}`;
  if (previous?.get(file.path) === resultId) return { uri, path: file.path, version: null, resultId, open: openUri !== undefined };
  const read = await readDocumentText(file, MAX_ANALYSED_LENGTH);
  const document = TextDocument.create(uri, "", 0, read.text);
  const diagnostics = await diagnosticsIn(document, analyseDocument(document, file.kind, 0, undefined, read.cutAt), settings.diagnostics);
  return { uri, path: file.path, version: null, resultId, diagnostics, open: openUri !== undefined };
}
