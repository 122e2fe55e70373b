/**
 * The folders the editor has open, as the workspace check searches them: from `initialize`
 * (its workspace folders, else the root), kept current by `workspace/didChangeWorkspaceFolders`.
 * Only `file:` folders can be searched on disk; others are left out.
 */
import { fileURLToPath } from "node:url";
import type { InitializeParams, WorkspaceFoldersChangeEvent } from "vscode-languageserver";

/** One open folder: the URI the editor gave and its path on disk. */
export interface WorkspaceFolderPath {
  readonly uri: string;
  readonly path: string;
}

export interface WorkspaceFolders {
  /** The folders now open, in the editor's order. */
  current(): readonly WorkspaceFolderPath[];
  changed(event: WorkspaceFoldersChangeEvent): void;
}

/** The folders named in `initialize`: `workspaceFolders`, else `rootUri`, else `rootPath`. */
export function workspaceFoldersFrom(params: Pick<InitializeParams, "workspaceFolders" | "rootUri" | "rootPath">): WorkspaceFolders {
  const folders = new Map<string, WorkspaceFolderPath>();
  const add = (uri: unknown): void => {
    const folder = folderOf(uri);
    if (folder) folders.set(folder.path, folder);
  };
  if (Array.isArray(params.workspaceFolders)) for (const folder of params.workspaceFolders) add(folder?.uri);
  else if (typeof params.rootUri === "string") add(params.rootUri);
  else if (typeof params.rootPath === "string" && params.rootPath.length > 0)
    folders.set(params.rootPath, { uri: "", path: params.rootPath });
  return {
    current: () => [...folders.values()],
    changed(event) {
      for (const removed of event?.removed ?? []) {
        const folder = folderOf(removed?.uri);
        if (folder) folders.delete(folder.path);
      }
      for (const added of event?.added ?? []) add(added?.uri);
    },
  };
}

/** The folder at a `file:` URI, or undefined for any other URI or a malformed one. */
function folderOf(uri: unknown): WorkspaceFolderPath | undefined {
  if (typeof uri !== "string" || !uri.startsWith("file:")) return undefined;
  try {
    return { uri, path: fileURLToPath(uri) };
  } catch {
    return undefined;
  }
}
