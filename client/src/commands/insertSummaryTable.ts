/**
 * "Insert geometry summary table": the server builds the table of the species in the selection
 * (or the whole document); the client inserts it at every cursor in one edit, so one undo
 * removes it. Markdown tables in prose files, CSV rows in CSV, tab-separated rows in TSV.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { kindOfDocument } from "../localDocumentModel";
import { summaryTableRequest } from "../protocol";

export async function insertSummaryTable(client: LanguageClient, log: vscode.OutputChannel): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (!editor) {
    void vscode.window.showInformationMessage("lonepair: open a lab note or data table first.");
    return;
  }
  const document = editor.document;
  const kind = kindOfDocument(document);
  const selected = editor.selections.find((selection) => !selection.isEmpty);
  let text: string;
  try {
    const result = await client.sendRequest(summaryTableRequest, {
      uri: document.uri.toString(),
      range: selected ? client.code2ProtocolConverter.asRange(selected) : undefined,
      format: kind === "csv" || kind === "tsv" ? "csv" : "markdown",
    });
    text = result.text;
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
  const table = withLineEndings(kind === "tsv" ? csvToTsv(text) : text, eol);
  const ok = await editor.edit((builder) => {
    for (const selection of editor.selections) {
      builder.insert(selection.active, blockAt(document, selection.active, table, eol, kind === "markdown"));
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

/** CSV as the server writes it (RFC 4180) to tab-separated fields; tabs inside a field become spaces. */
export function csvToTsv(csv: string): string {
  const lines: string[] = [];
  let fields: string[] = [];
  let field = "";
  let quoted = false;
  for (let index = 0; index < csv.length; index++) {
    const character = csv[index];
    if (quoted) {
      if (character === '"' && csv[index + 1] === '"') {
        field += '"';
        index++;
      } else if (character === '"') quoted = false;
      else field += character === "\t" || character === "\r" || character === "\n" ? " " : character;
    } else if (character === '"') quoted = true;
    else if (character === ",") {
      fields.push(field);
      field = "";
    } else if (character === "\n" || character === "\r") {
      if (character === "\r" && csv[index + 1] === "\n") index++;
      fields.push(field);
      lines.push(fields.join("\t"));
      fields = [];
      field = "";
    } else field += character;
  }
  if (field !== "" || fields.length > 0) lines.push([...fields, field].join("\t"));
  return lines.map((line) => `${line}\n`).join("");
}
