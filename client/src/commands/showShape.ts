/** "Show 3D shape": opens the shape panel for the species under the cursor. */
import * as vscode from "vscode";
import type { ShapePanelController } from "../shapePanel";

export async function showShape(panel: ShapePanelController): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage("lonepair: put the cursor on a species in a lab note or data table first.");
    return;
  }
  await panel.show(editor);
}
