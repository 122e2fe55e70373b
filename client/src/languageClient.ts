/**
 * Starts the lonepair language server (dist/server.js) in a Node process over IPC, for the
 * documents of the selector, with the `lonepair` settings section synchronised.
 */
import * as vscode from "vscode";
import { LanguageClient, TransportKind, type LanguageClientOptions, type ServerOptions } from "vscode-languageclient/node";
import { DOCUMENT_SELECTOR } from "./documentSelector";

/** Creates and starts the client; resolves once the server has answered `initialize`. */
export async function startLanguageClient(extensionUri: vscode.Uri, outputChannel: vscode.LogOutputChannel): Promise<LanguageClient> {
  const module = vscode.Uri.joinPath(extensionUri, "dist", "server.js").fsPath;
  const serverOptions: ServerOptions = {
    run: { module, transport: TransportKind.ipc },
    debug: { module, transport: TransportKind.ipc, options: { execArgv: ["--nolazy", "--inspect=6019"] } },
  };
  const clientOptions: LanguageClientOptions = {
    documentSelector: [...DOCUMENT_SELECTOR],
    outputChannel,
    synchronize: { configurationSection: "lonepair" },
    // The server reads `settings.lonepair`, the same shape as a configuration-change notification.
    initializationOptions: { settings: { lonepair: JSON.parse(JSON.stringify(vscode.workspace.getConfiguration("lonepair"))) as unknown } },
  };
  const client = new LanguageClient("lonepair", "lonepair", serverOptions, clientOptions);
  await client.start();
  return client;
}
