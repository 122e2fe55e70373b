/**
 * "Check all files in the workspace": asks the language server to run its workspace check
 * (`lonepair.checkWorkspaceFolders`), which finds the files as `lonepair check` does and sends their
 * diagnostics through workspace diagnostics. This command shows the server's progress in a
 * notification the user can cancel, and the outcome when it is done.
 */
import { randomUUID } from "node:crypto";
import * as vscode from "vscode";
import { ExecuteCommandRequest, WorkDoneProgress, type LanguageClient } from "vscode-languageclient/node";
import { WORKSPACE_CHECK_COMMAND, type WorkspaceCheckResult } from "../../../shared/src/editorRequests";

export async function checkWorkspace(client: LanguageClient, log: vscode.OutputChannel): Promise<WorkspaceCheckResult | undefined> {
  if (!vscode.workspace.workspaceFolders?.length) {
    void vscode.window.showInformationMessage("lonepair: open a folder first; there is no workspace to check.");
    return undefined;
  }
  const summary = await vscode.window.withProgress(
    { location: vscode.ProgressLocation.Notification, title: "lonepair: checking workspace files", cancellable: true },
    (progress, token) => runOnServer(client, progress, token),
  );
  if (!summary) {
    log.appendLine("Workspace check: cancelled.");
    void vscode.window.showInformationMessage("lonepair: workspace check cancelled.");
    return undefined;
  }
  const outcome =
    `${summary.checked} of ${summary.files} files checked: ${summary.problems} problems in ${summary.filesWithProblems} files` +
    (summary.unreadable > 0 ? ` (${summary.unreadable} could not be read; see the lonepair output)` : "") +
    (summary.stoppedAt !== undefined ? ` (stopped at ${summary.stoppedAt} files)` : "");
  log.appendLine(`Workspace check${summary.cancelled ? " (cancelled)" : ""}: ${outcome}.`);
  if (summary.cancelled) void vscode.window.showInformationMessage(`lonepair: check cancelled. ${outcome}.`);
  else if (summary.problems > 0) {
    const choice = await vscode.window.showWarningMessage(`lonepair: ${outcome}.`, "Show Problems");
    if (choice) void vscode.commands.executeCommand("workbench.actions.view.problems");
  } else void vscode.window.showInformationMessage(`lonepair: ${outcome}.`);
  return summary;
}

/** The server's answer, or undefined when the user cancelled before it came. */
async function runOnServer(
  client: LanguageClient,
  progress: vscode.Progress<{ message?: string; increment?: number }>,
  token: vscode.CancellationToken,
): Promise<WorkspaceCheckResult | undefined> {
  const workDoneToken = randomUUID();
  let shown = 0;
  const listener = client.onProgress(WorkDoneProgress.type, workDoneToken, (value) => {
    if (value.kind === "end") return;
    const increment = value.percentage !== undefined ? Math.max(0, value.percentage - shown) : undefined;
    if (value.percentage !== undefined) shown = Math.max(shown, value.percentage);
    progress.report({ message: value.message, increment });
  });
  try {
    const result = (await client.sendRequest(
      ExecuteCommandRequest.type,
      { command: WORKSPACE_CHECK_COMMAND, arguments: [], workDoneToken },
      token,
    )) as WorkspaceCheckResult | null;
    return result ?? undefined;
  } catch (error) {
    if (token.isCancellationRequested) return undefined;
    throw error;
  } finally {
    listener.dispose();
  }
}
