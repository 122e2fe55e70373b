/**
 * Requests about the species under the cursor send the document and the position; the server
 * decides which mention that is and answers with what the editor needs.
 */
import type * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import type { SpeciesAtParams } from "../../shared/src/editorRequests";

/** The parameters that name the cursor `position` in `document`. */
export function cursorParams(client: LanguageClient, document: vscode.TextDocument, position: vscode.Position): SpeciesAtParams {
  return { uri: document.uri.toString(), position: client.code2ProtocolConverter.asPosition(position) };
}
