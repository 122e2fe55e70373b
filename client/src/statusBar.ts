/**
 * The status-bar item: species mentioned and lonepair problems in the active document.
 * Problems are the diagnostics with source "lonepair" that the editor holds for the document
 * (all from the server: the document's own and the workspace check's), so the count is the Problems
 * panel's; the species
 * count is the server's, asked with `lonepair/documentSummary`.
 */
import * as vscode from "vscode";
import { DOCUMENT_SELECTOR } from "./documentSelector";
import type { LanguageClient } from "vscode-languageclient/node";
import { documentSummaryRequest } from "./protocol";

/** Diagnostics carry this source (the server's constant), so they can be told from others. */
export const DIAGNOSTIC_SOURCE = "lonepair";
const REFRESH_DELAY_MS = 300;

/** Creates the item and keeps it current; dispose to remove it. */
export function createStatusBar(client: LanguageClient): vscode.Disposable {
  const item = vscode.window.createStatusBarItem("lonepair.status", vscode.StatusBarAlignment.Right, 100);
  item.name = "lonepair";
  item.command = "workbench.actions.view.problems";
  let timer: NodeJS.Timeout | undefined;

  let asked = 0;
  const refresh = async (): Promise<void> => {
    const document = vscode.window.activeTextEditor?.document;
    if (!document || vscode.languages.match(DOCUMENT_SELECTOR, document) === 0) {
      item.hide();
      return;
    }
    const ask = ++asked;
    let summary = null;
    try {
      summary = await client.sendRequest(documentSummaryRequest, { uri: document.uri.toString() });
    } catch {
      // The server is restarting or busy: show what the editor knows and try again on the next change.
    }
    // A newer refresh started meanwhile: it will show the newer counts.
    if (ask !== asked) return;
    const problems = vscode.languages.getDiagnostics(document.uri).filter((diagnostic) => diagnostic.source === DIAGNOSTIC_SOURCE).length;
    const species = summary ? String(summary.species) : "?";
    item.text = `$(beaker) ${species} species, ${problems} ${problems === 1 ? "problem" : "problems"}`;
    item.tooltip = `lonepair: ${species} species mentions and ${problems} lonepair problems in this file. Click to open the Problems panel.`;
    item.show();
  };

  const scheduleRefresh = (): void => {
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => void refresh(), REFRESH_DELAY_MS);
  };

  const subscriptions = [
    item,
    vscode.window.onDidChangeActiveTextEditor(scheduleRefresh),
    vscode.workspace.onDidChangeTextDocument((event) => {
      if (event.document === vscode.window.activeTextEditor?.document) scheduleRefresh();
    }),
    vscode.languages.onDidChangeDiagnostics((event) => {
      const active = vscode.window.activeTextEditor?.document.uri.toString();
      if (active && event.uris.some((uri) => uri.toString() === active)) scheduleRefresh();
    }),
  ];
  void refresh();
  return {
    dispose() {
      if (timer) clearTimeout(timer);
      for (const subscription of subscriptions) subscription.dispose();
    },
  };
}
