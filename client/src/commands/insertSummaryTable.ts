/**
 * "Insert geometry summary table": the server builds the table of the species in the selection
 * (or the whole document); the client inserts it at every cursor in one edit, so one undo
 * removes it. The server writes markdown tables for prose files, CSV rows for CSV and tab-separated rows for TSV.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { summaryTableRequest } from "../protocol";

export async function insertSummaryTable(client: LanguageClient, log: vscode.OutputChannel): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage("lonepair: open a lab note or data table first.");
    return;
  }
  const document = editor.document;
  const selected = editor.selections.find((selection) => !selection.isEmpty);
  let text: string;
  // The server writes the table in the document's own format (CSV rows, TSV rows or markdown).
  let format: string;
  try {
    const result = await client.sendRequest(summaryTableRequest, {
      uri: document.uri.toString(),
      range: selected ? client.code2ProtocolConverter.asRange(selected) : undefined,
    });
    text = result.text;
    format = result.format ?? "markdown";
  } catch (error) {
    log.appendLine(`Summary table request failed: ${String(error)}`);
    void vscode.window.showErrorMessage("lonepair: the language server could not build the table (see the lonepair output).");
    return;
  }
  if (text.trim() === "") {
    void vscode.window.showInformationMessage(`lonepair: no species found in the ${selected ? "selection" : "document"}.`);
    return;
  }
  const eol = document.eol === vscode.EndOfLine.CRLF ? "\r\n" : "\n";
  const table = withLineEndings(text, eol);
  const ok = await editor.edit((builder) => {
    for (const selection of editor.selections) {
      builder.insert(selection.active, blockAt(document, selection.active, table, eol, format === "markdown"));
    }
  });
  if (!ok) void vscode.window.showWarningMessage("lonepair: the table could not be inserted (the document changed meanwhile).");
}

/** The table on lines of its own; markdown also wants a blank line before it. */
function blockAt(document: vscode.TextDocument, position: vscode.Position, table: string, eol: string, markdown: boolean): string {
  const lineBefore = document.lineAt(position.line).text.slice(0, position.character);
  const lineAfter = document.lineAt(position.line).text.slice(position.character);
  let prefix = "";
  if (lineBefore.trim() !== "") prefix = markdown ? eol + eol : eol;
  else if (markdown && position.line > 0 && document.lineAt(position.line - 1).text.trim() !== "") prefix = eol;
  const suffix = lineAfter.trim() !== "" ? eol : "";
  return prefix + table + suffix;
}

function withLineEndings(text: string, eol: string): string {
  return text.replace(/\r?\n/g, eol);
}
