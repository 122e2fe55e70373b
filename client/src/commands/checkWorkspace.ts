/**
 * "Check all files in the workspace": lists the files, reads them a batch at a time, checks each
 * with the server's `lonepair/checkText` (which applies the same settings as to open files) and fills
 * the Problems panel through a diagnostic collection. Cancellable; yields between batches so the
 * extension host stays responsive with 10,000 files. Files open in an editor are left to the
 * server, which already reports on them.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { checkTextRequest } from "../protocol";
import { MAX_WORKSPACE_FILES, workspaceFilesToCheck } from "../workspaceFiles";

const BATCH_SIZE = 25;
/** Larger files are skipped: lab notes and tables are far smaller, and reading them would stall the check. */
const MAX_FILE_BYTES = 8 * 1024 * 1024;

/** What one run found, for the closing message and the tests. */
export interface WorkspaceCheckSummary {
  readonly files: number;
  readonly checked: number;
  readonly filesWithProblems: number;
  readonly problems: number;
  readonly skipped: number;
  readonly cancelled: boolean;
}

export async function checkWorkspace(
  client: LanguageClient,
  collection: vscode.DiagnosticCollection,
  log: vscode.OutputChannel,
): Promise<WorkspaceCheckSummary | undefined> {
  if (!vscode.workspace.workspaceFolders?.length) {
    void vscode.window.showInformationMessage("lonepair: open a folder first; there is no workspace to check.");
    return undefined;
  }
  const summary = await vscode.window.withProgress(
    { location: vscode.ProgressLocation.Notification, title: "lonepair: checking workspace files", cancellable: true },
    (progress, token) => runCheck(client, collection, log, progress, token),
  );
  const outcome =
    `${summary.checked} of ${summary.files} files checked: ${summary.problems} problems in ${summary.filesWithProblems} files` +
    (summary.skipped > 0 ? ` (${summary.skipped} skipped: open in an editor, too large or unreadable)` : "");
  log.appendLine(`Workspace check${summary.cancelled ? " (cancelled)" : ""}: ${outcome}.`);
  if (summary.cancelled) void vscode.window.showInformationMessage(`lonepair: check cancelled. ${outcome}.`);
  else if (summary.problems > 0) {
    const choice = await vscode.window.showWarningMessage(`lonepair: ${outcome}.`, "Show Problems");
    if (choice) void vscode.commands.executeCommand("workbench.actions.view.problems");
  } else void vscode.window.showInformationMessage(`lonepair: ${outcome}.`);
  return summary;
}

async function runCheck(
  client: LanguageClient,
  collection: vscode.DiagnosticCollection,
  log: vscode.OutputChannel,
  progress: vscode.Progress<{ message?: string; increment?: number }>,
  token: vscode.CancellationToken,
): Promise<WorkspaceCheckSummary> {
  progress.report({ message: "listing files…" });
  const files = await workspaceFilesToCheck(token);
  if (files.length >= MAX_WORKSPACE_FILES) log.appendLine(`Workspace check: stopped listing at ${MAX_WORKSPACE_FILES} files.`);
  collection.clear();
  const open = new Set(vscode.workspace.textDocuments.map((document) => document.uri.toString()));
  let checked = 0;
  let skipped = 0;
  let problems = 0;
  let filesWithProblems = 0;
  for (let start = 0; start < files.length; start += BATCH_SIZE) {
    if (token.isCancellationRequested) break;
    const batch = files.slice(start, start + BATCH_SIZE);
    const results = await Promise.all(
      batch.map(async (uri) => {
        if (open.has(uri.toString())) return undefined;
        try {
          return [uri, await checkFile(client, uri, token)] as const;
        } catch (error) {
          log.appendLine(`Workspace check: ${uri.fsPath}: ${String(error)}`);
          return undefined;
        }
      }),
    );
    for (const result of results) {
      if (!result || !result[1]) {
        skipped += 1;
        continue;
      }
      checked += 1;
      const [uri, diagnostics] = result;
      if (diagnostics.length === 0) continue;
      filesWithProblems += 1;
      problems += diagnostics.length;
      collection.set(uri, diagnostics);
    }
    progress.report({
      message: `${Math.min(start + BATCH_SIZE, files.length)} of ${files.length} files`,
      increment: (100 * batch.length) / files.length,
    });
    // Let the editor's own work run between batches.
    await new Promise((resolve) => setImmediate(resolve));
  }
  return { files: files.length, checked, skipped, problems, filesWithProblems, cancelled: token.isCancellationRequested };
}

/** The file's diagnostics, or undefined when it was skipped. */
async function checkFile(
  client: LanguageClient,
  uri: vscode.Uri,
  token: vscode.CancellationToken,
): Promise<vscode.Diagnostic[] | undefined> {
  const stat = await vscode.workspace.fs.stat(uri);
  if (stat.size > MAX_FILE_BYTES) return undefined;
  const bytes = await vscode.workspace.fs.readFile(uri);
  const text = new TextDecoder("utf-8").decode(bytes);
  const result = await client.sendRequest(checkTextRequest, { uri: uri.toString(), text }, token);
  return client.protocol2CodeConverter.asDiagnostics(result.diagnostics);
}
