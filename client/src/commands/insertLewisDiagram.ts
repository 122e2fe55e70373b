/**
 * "Insert Lewis diagram": the server draws the species under the cursor (or one the user types)
 * and names the figure; the client writes the SVG into the figures folder beside the document
 * and inserts the markdown image link in one edit, so one undo removes the link. The file stays.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import type { LewisFigureParams, LewisFigureRequestResult } from "../../../shared/src/editorRequests";
import { lewisFigureRequest } from "../protocol";
import { cursorParams } from "../speciesAtCursor";

const CAUTION = "Model prediction, not measured data: follow the safety data sheet, local rules and licensed practice.";

export async function insertLewisDiagram(client: LanguageClient, log: vscode.OutputChannel): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage("lonepair: open a markdown lab note first.");
    return;
  }
  const document = editor.document;
  if (document.languageId !== "markdown") {
    void vscode.window.showInformationMessage("lonepair: Lewis diagrams are inserted as markdown images; open a markdown document.");
    return;
  }
  if (document.isUntitled) {
    void vscode.window.showInformationMessage("lonepair: save the document first; the diagram is written to a folder beside it.");
    return;
  }
  const ask = async (params: LewisFigureParams): Promise<LewisFigureRequestResult | null | undefined> => {
    try {
      return await client.sendRequest(lewisFigureRequest, params);
    } catch (error) {
      log.appendLine(`Insert Lewis diagram: the request failed: ${String(error)}`);
      void vscode.window.showErrorMessage("lonepair: the language server could not draw the diagram (see the lonepair output).");
      return undefined;
    }
  };

  let params: LewisFigureParams = cursorParams(client, document, editor.selection.active);
  let found = await ask(params);
  if (found === undefined) return;
  if (found === null) {
    const typed = await vscode.window.showInputBox({
      title: "Insert Lewis diagram",
      prompt: "No species under the cursor: type one (a formula such as SF4, a name, or smiles: and a SMILES string)",
    });
    if (!typed?.trim()) return;
    params = { uri: document.uri.toString(), species: typed };
    found = await ask(params);
    if (!found) return;
  }
  if (!found.figure) {
    void vscode.window.showWarningMessage(
      `lonepair: no Lewis diagram for ${found.text}: ${found.problem?.message ?? "it could not be drawn."}`,
    );
    return;
  }
  if (found.figure.drawableForms > 1) {
    const count = found.figure.drawableForms;
    const picked = await vscode.window.showQuickPick(
      Array.from({ length: count }, (_, index) => ({
        label: `Structure ${index + 1}`,
        description: index === 0 ? "as analysed" : undefined,
        form: index + 1,
      })),
      { title: `${found.text} has ${found.figure.equivalentStructures} equivalent structures`, placeHolder: "Which one to draw" },
    );
    if (!picked) return;
    if (picked.form !== 1) {
      const again = await ask({ ...params, form: picked.form });
      if (!again?.figure) return;
      found = again;
    }
  }
  const figure = found.figure!;

  const documentFolder = vscode.Uri.joinPath(document.uri, "..");
  let target: { uri: vscode.Uri; relativePath: string };
  try {
    target = await freeTarget(documentFolder, figure.relativePath, figure.svg);
    await vscode.workspace.fs.createDirectory(vscode.Uri.joinPath(target.uri, ".."));
    await vscode.workspace.fs.writeFile(target.uri, new TextEncoder().encode(figure.svg));
  } catch (error) {
    log.appendLine(`Insert Lewis diagram: could not write the figure: ${String(error)}`);
    void vscode.window.showErrorMessage(`lonepair: could not write ${figure.relativePath} beside the document.`);
    return;
  }
  // A renamed file keeps the server's link text, with the new path in it.
  const link =
    target.relativePath === figure.relativePath ? figure.markdown : figure.markdown.replace(figure.relativePath, target.relativePath);
  const mention = found.range ? client.protocol2CodeConverter.asRange(found.range) : undefined;
  const afterMention = found.linkPosition ? client.protocol2CodeConverter.asPosition(found.linkPosition) : mention?.end;
  const ok = await editor.edit((builder) => {
    for (const selection of editor.selections) {
      // Never split the species' own text or its markup: after them when the cursor is on it.
      const at = mention?.contains(selection.active) && afterMention ? afterMention : selection.active;
      const before = at.character > 0 ? document.lineAt(at.line).text.charAt(at.character - 1) : "";
      builder.insert(at, before !== "" && !/\s/.test(before) ? ` ${link}` : link);
    }
  });
  if (!ok) {
    void vscode.window.showWarningMessage(
      "lonepair: the link could not be inserted (the document changed meanwhile); the figure was written.",
    );
    return;
  }
  void vscode.window.showInformationMessage(`lonepair: wrote ${target.relativePath}. ${CAUTION}`);
}

/**
 * Where to write: the suggested path, or when a different file already has that name, the
 * first free "-2", "-3", ... beside it. The same diagram already there is simply written again.
 */
async function freeTarget(folder: vscode.Uri, relativePath: string, svg: string): Promise<{ uri: vscode.Uri; relativePath: string }> {
  const dot = relativePath.lastIndexOf(".");
  for (let attempt = 1; attempt < 100; attempt++) {
    const candidate = attempt === 1 ? relativePath : `${relativePath.slice(0, dot)}-${attempt}${relativePath.slice(dot)}`;
    const uri = vscode.Uri.joinPath(folder, ...candidate.split("/"));
    let existing: Uint8Array;
    try {
      existing = await vscode.workspace.fs.readFile(uri);
    } catch {
      return { uri, relativePath: candidate };
    }
    if (new TextDecoder().decode(existing) === svg) return { uri, relativePath: candidate };
  }
  throw new Error(`no free file name for ${relativePath}`);
}
