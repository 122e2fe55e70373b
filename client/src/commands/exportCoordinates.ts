/**
 * "Export coordinates": the model coordinates of the species under the cursor, saved as XYZ or
 * MDL molfile where the user chooses.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { coordinateFile, type CoordinateFormat } from "../coordinateFile";
import { speciesAtCursor } from "../speciesAtCursor";

const FORMATS: readonly { readonly label: string; readonly description: string; readonly format: CoordinateFormat }[] = [
  { label: "XYZ", description: ".xyz: element symbols and positions in ångströms", format: "xyz" },
  { label: "MDL molfile", description: ".mol: atoms, bonds and charges (V2000)", format: "molfile" },
];

export async function exportCoordinates(client: LanguageClient, log: vscode.OutputChannel): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage("lonepair: put the cursor on a species in a lab note or data table first.");
    return;
  }
  const found = await speciesAtCursor(client, editor.document, editor.selection.active);
  if (!found) {
    void vscode.window.showInformationMessage("lonepair: there is no species under the cursor.");
    return;
  }
  if (!found.analysis.ok) {
    void vscode.window.showWarningMessage(`lonepair: no coordinates for ${found.text}: ${found.analysis.problem.message}`);
    return;
  }
  const picked = await vscode.window.showQuickPick(FORMATS, { title: `Export coordinates of ${found.text}`, placeHolder: "File format" });
  if (!picked) return;
  const result = coordinateFile(found.analysis.value, picked.format);
  if (!result.ok) {
    void vscode.window.showWarningMessage(`lonepair: no coordinates for ${found.text}: ${result.message}`);
    return;
  }
  const file = result.value;
  const folder = vscode.workspace.getWorkspaceFolder(editor.document.uri)?.uri ?? vscode.Uri.joinPath(editor.document.uri, "..");
  const target = await vscode.window.showSaveDialog({
    defaultUri: vscode.Uri.joinPath(folder, `${file.baseName}.${file.extension}`),
    filters: { [picked.label]: [file.extension] },
    title: `Save the coordinates of ${found.text}`,
  });
  if (!target) return;
  try {
    await vscode.workspace.fs.writeFile(target, new TextEncoder().encode(file.text));
  } catch (error) {
    log.appendLine(`Export coordinates: could not write ${target.toString()}: ${String(error)}`);
    void vscode.window.showErrorMessage(`lonepair: could not write ${target.fsPath || target.toString()}.`);
    return;
  }
  void vscode.window.showInformationMessage(
    `lonepair: saved model coordinates of ${found.text}. Model prediction, not measured data: follow the safety data sheet, local rules and licensed practice.`,
  );
}
