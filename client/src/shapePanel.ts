/**
 * The 3D shape panel: one webview beside the editor showing the species under the cursor,
 * updated by message as the cursor moves. Scripts run only under a nonce-based policy, and the
 * page may load files from the extension's media folder only.
 */
import { randomBytes } from "node:crypto";
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { shapePageHtml } from "./shapePageHtml";
import { shapeModelRequest } from "./protocol";
import { cursorParams } from "./speciesAtCursor";
import { DOCUMENT_SELECTOR } from "./documentSelector";

const VIEW_TYPE = "lonepair.shapeView";
/** Cursor moves closer together than this are one update. */
const FOLLOW_DELAY_MS = 200;

/** What the page is told. */
type PageMessage =
  | { readonly type: "show"; readonly model: unknown; readonly lewis?: unknown }
  | { readonly type: "problem"; readonly text: string; readonly message: string }
  | { readonly type: "clear" };

/** Opens (or reveals) the panel and keeps it following the cursor; dispose to stop. */
export interface ShapePanelController extends vscode.Disposable {
  show(editor: vscode.TextEditor | undefined): Promise<void>;
}

export function createShapePanelController(
  extensionUri: vscode.Uri,
  client: LanguageClient,
  log: vscode.OutputChannel,
): ShapePanelController {
  const mediaRoot = vscode.Uri.joinPath(extensionUri, "client", "media");
  // The renderer the page draws with: the core's drawing code, bundled for the browser.
  const rendererRoot = vscode.Uri.joinPath(extensionUri, "dist", "webview");
  let panel: vscode.WebviewPanel | undefined;
  let lastMessage: PageMessage = { type: "clear" };
  let lastKey = "";
  let timer: NodeJS.Timeout | undefined;
  let pending: vscode.CancellationTokenSource | undefined;

  const post = (message: PageMessage): void => {
    lastMessage = message;
    void panel?.webview.postMessage(message);
  };

  const update = async (editor: vscode.TextEditor | undefined): Promise<void> => {
    if (!panel || !editor || vscode.languages.match(DOCUMENT_SELECTOR, editor.document) === 0) return;
    pending?.cancel();
    const cancellation = new vscode.CancellationTokenSource();
    pending = cancellation;
    try {
      const found = await client.sendRequest(
        shapeModelRequest,
        cursorParams(client, editor.document, editor.selection.active),
        cancellation.token,
      );
      if (cancellation.token.isCancellationRequested || !found) return;
      // The same species again (the cursor moved inside it): keep the page and its rotation as they are.
      const key = `${editor.document.uri.toString()}|${found.text}|${found.formula ?? ""}`;
      if (key === lastKey) return;
      lastKey = key;
      post(
        found.model
          ? { type: "show", model: found.model, lewis: found.lewis }
          : { type: "problem", text: found.text, message: found.problem?.message ?? "No 3D model could be built for this species." },
      );
    } catch (error) {
      log.appendLine(`3D view: could not read the species under the cursor: ${String(error)}`);
    }
  };

  const scheduleUpdate = (editor: vscode.TextEditor): void => {
    if (!panel) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => void update(editor), FOLLOW_DELAY_MS);
  };

  const createPanel = (): vscode.WebviewPanel => {
    const created = vscode.window.createWebviewPanel(
      VIEW_TYPE,
      "lonepair: 3D shape",
      { viewColumn: vscode.ViewColumn.Beside, preserveFocus: true },
      { enableScripts: true, localResourceRoots: [mediaRoot, rendererRoot] },
    );
    const webview = created.webview;
    webview.html = shapePageHtml({
      cspSource: webview.cspSource,
      nonce: randomBytes(18).toString("base64"),
      scriptUri: webview.asWebviewUri(vscode.Uri.joinPath(mediaRoot, "shapeView.js")).toString(),
      rendererUri: webview.asWebviewUri(vscode.Uri.joinPath(rendererRoot, "shapeScene.js")).toString(),
      styleUri: webview.asWebviewUri(vscode.Uri.joinPath(mediaRoot, "shapeView.css")).toString(),
    });
    const subscriptions = [
      webview.onDidReceiveMessage((message: { type?: unknown; svg?: unknown; formula?: unknown }) => {
        // The page asks once it has loaded (or reloaded after being hidden): give it the current species.
        if (message?.type === "ready") void webview.postMessage(lastMessage);
        else if (message?.type === "save-svg") void saveViewSvg(message.svg, message.formula, log);
      }),
      created.onDidDispose(() => {
        panel = undefined;
        lastKey = "";
        lastMessage = { type: "clear" };
        for (const subscription of subscriptions) subscription.dispose();
      }),
    ];
    return created;
  };

  const following = [
    vscode.window.onDidChangeTextEditorSelection((event) => scheduleUpdate(event.textEditor)),
    vscode.window.onDidChangeActiveTextEditor((editor) => editor && scheduleUpdate(editor)),
  ];

  return {
    async show(editor) {
      if (panel) panel.reveal(undefined, true);
      else panel = createPanel();
      lastKey = "";
      await update(editor);
    },
    dispose() {
      if (timer) clearTimeout(timer);
      pending?.cancel();
      for (const subscription of following) subscription.dispose();
      panel?.dispose();
    },
  };
}

/** Pictures of a few hundred atoms stay well under this; anything larger is not the page's own. */
const MAX_SAVED_SVG_LENGTH = 5_000_000;

/** Saves the page's current view where the user chooses; the page's text is checked first. */
async function saveViewSvg(svg: unknown, formula: unknown, log: vscode.OutputChannel): Promise<void> {
  if (typeof svg !== "string" || !svg.startsWith("<svg ") || svg.length > MAX_SAVED_SVG_LENGTH) {
    log.appendLine("3D view: the page sent no picture to save.");
    return;
  }
  const baseName = (typeof formula === "string" ? formula : "").replace(/[^A-Za-z0-9+-]+/g, "_").replace(/^_+|_+$/g, "") || "shape";
  const folder = vscode.workspace.workspaceFolders?.[0]?.uri;
  const target = await vscode.window.showSaveDialog({
    ...(folder ? { defaultUri: vscode.Uri.joinPath(folder, `${baseName}-shape.svg`) } : {}),
    filters: { "SVG picture": ["svg"] },
    title: "Save the 3D view as SVG",
  });
  if (!target) return;
  try {
    await vscode.workspace.fs.writeFile(target, new TextEncoder().encode(svg));
  } catch (error) {
    log.appendLine(`3D view: could not write ${target.toString()}: ${String(error)}`);
    void vscode.window.showErrorMessage(`lonepair: could not write ${target.fsPath || target.toString()}.`);
    return;
  }
  void vscode.window.showInformationMessage(
    "lonepair: saved the view. Model prediction, not measured data: follow the safety data sheet, local rules and licensed practice.",
  );
}
