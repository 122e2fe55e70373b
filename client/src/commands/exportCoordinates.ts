/**
 * "Export coordinates": the model coordinates of the species under the cursor, saved as XYZ or
 * MDL molfile where the user chooses.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import type { CoordinatesParams } from "../../../shared/src/editorRequests";
import { coordinatesRequest } from "../protocol";
import { cursorParams } from "../speciesAtCursor";

const FORMATS: readonly { readonly label: string; readonly description: string; readonly format: CoordinatesParams["format"] }[] = [
  { label: "XYZ", description: ".xyz: element symbols and positions in ångströms", format: "xyz" },
  { label: "MDL molfile", description: ".mol: atoms, bonds and charges (V2000)", format: "molfile" },
];

export async function exportCoordinates(client: LanguageClient, log: vscode.OutputChannel): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage("lonepair: put the cursor on a species in a lab note or data table first.");
    return;
  }
  const document = editor.document;
  const position = editor.selection.active;
  const picked = await vscode.window.showQuickPick(FORMATS, {
    title: "Export coordinates of the species under the cursor",
    placeHolder: "File format",
  });
  if (!picked) return;
  let found;
  try {
    found = await client.sendRequest(coordinatesRequest, { ...cursorParams(client, document, position), format: picked.format });
  } catch (error) {
    log.appendLine(`Export coordinates: the request failed: ${String(error)}`);
    void vscode.window.showErrorMessage("lonepair: the language server could not build the coordinates (see the lonepair output).");
    return;
  }
  if (!found) {
    void vscode.window.showInformationMessage("lonepair: there is no species under the cursor.");
    return;
  }
  if (!found.file) {
    void vscode.window.showWarningMessage(
      `lonepair: no coordinates for ${found.text}: ${found.problem?.message ?? "no 3D model could be built."}`,
    );
    return;
  }
  const file = found.file;
  const folder = vscode.workspace.getWorkspaceFolder(document.uri)?.uri ?? vscode.Uri.joinPath(document.uri, "..");
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
