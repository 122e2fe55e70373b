/**
 * The lonepair extension: starts the language server and adds what needs the editor itself:
 * the summary-table and Lewis-diagram insertions, the 3D shape panel, the workspace check, coordinate export and a
 * status-bar count.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { checkWorkspace } from "./commands/checkWorkspace";
import { exportCoordinates } from "./commands/exportCoordinates";
import { insertLewisDiagram } from "./commands/insertLewisDiagram";
import { insertSummaryTable } from "./commands/insertSummaryTable";
import { showShape } from "./commands/showShape";
import { startLanguageClient } from "./languageClient";
import { createShapePanelController } from "./shapePanel";
import { createStatusBar } from "./statusBar";

let client: LanguageClient | undefined;

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  const log = vscode.window.createOutputChannel("lonepair", { log: true });
  context.subscriptions.push(log);
  try {
    client = await startLanguageClient(context.extensionUri, log);
  } catch (error) {
    log.appendLine(`The lonepair language server did not start: ${String(error)}`);
    void vscode.window.showErrorMessage("lonepair: the language server did not start (see the lonepair output).");
    return;
  }
  const started = client;
  const shapePanel = createShapePanelController(context.extensionUri, started, log);
  context.subscriptions.push(
    shapePanel,
    createStatusBar(started),
    vscode.commands.registerCommand("lonepair.insertSummaryTable", () => insertSummaryTable(started, log)),
    vscode.commands.registerCommand("lonepair.showShape", () => showShape(shapePanel)),
    vscode.commands.registerCommand("lonepair.checkWorkspace", () => checkWorkspace(started, log)),
    vscode.commands.registerCommand("lonepair.exportCoordinates", () => exportCoordinates(started, log)),
    vscode.commands.registerCommand("lonepair.insertLewisDiagram", () => insertLewisDiagram(started, log)),
  );
}

export async function deactivate(): Promise<void> {
  await client?.stop();
  client = undefined;
}
