/**
 * The status-bar item: species mentioned and lonepair problems in the active document.
 * Problems are the diagnostics with source "lonepair" that the editor holds for the document
 * (the server's, plus the workspace check's); species are counted with the bundled core, as the
 * server has no request for a document summary.
 */
import * as vscode from "vscode";
import { DOCUMENT_SELECTOR } from "./documentSelector";
import { localDocumentModel } from "./localDocumentModel";

/** Diagnostics carry this source (the server's constant), so they can be told from others. */
export const DIAGNOSTIC_SOURCE = "lonepair";
const REFRESH_DELAY_MS = 300;

/** Creates the item and keeps it current; dispose to remove it. */
export function createStatusBar(): vscode.Disposable {
  const item = vscode.window.createStatusBarItem("lonepair.status", vscode.StatusBarAlignment.Right, 100);
  item.name = "lonepair";
  item.command = "workbench.actions.view.problems";
  let timer: NodeJS.Timeout | undefined;

  const refresh = (): void => {
    const document = vscode.window.activeTextEditor?.document;
    if (!document || vscode.languages.match(DOCUMENT_SELECTOR, document) === 0) {
      item.hide();
      return;
    }
    const model = localDocumentModel(document);
    const problems = vscode.languages.getDiagnostics(document.uri).filter((diagnostic) => diagnostic.source === DIAGNOSTIC_SOURCE).length;
    const species = model ? String(model.occurrences.length) : "?";
    item.text = `$(beaker) ${species} species, ${problems} ${problems === 1 ? "problem" : "problems"}`;
    item.tooltip = `lonepair: ${species} species mentions and ${problems} lonepair problems in this file. Click to open the Problems panel.`;
    item.show();
  };

  const scheduleRefresh = (): void => {
    if (timer) clearTimeout(timer);
    timer = setTimeout(refresh, REFRESH_DELAY_MS);
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
  refresh();
  return {
    dispose() {
      if (timer) clearTimeout(timer);
      for (const subscription of subscriptions) subscription.dispose();
    },
  };
}
