/**
 * The files the workspace check reads: the selector's globs minus what the user excluded.
 * `workspace.findFiles` applies `files.exclude` only when given no exclude of its own, so both
 * `files.exclude` and `search.exclude` are turned into one exclude glob here. The stable API has
 * no way to ask for `.gitignore`, so in a trusted workspace git is asked which files it keeps, and
 * files in a git work tree that git ignores are left out too.
 */
import * as vscode from "vscode";
import { WORKSPACE_GLOB } from "./documentSelector";
import { gitKeptFiles, type GitKeptFiles } from "./gitKeptFiles";

/** More than this and the check stops listing; it says so. */
export const MAX_WORKSPACE_FILES = 100_000;

/** Every file to check, in no particular order. */
export async function workspaceFilesToCheck(token: vscode.CancellationToken): Promise<vscode.Uri[]> {
  const found = await vscode.workspace.findFiles(WORKSPACE_GLOB, excludeGlob(), MAX_WORKSPACE_FILES, token);
  // Running git in a folder runs what its configuration names: only where the user trusts the folder.
  if (!vscode.workspace.isTrusted) return found;
  const kept = new Map<string, GitKeptFiles | undefined>();
  for (const folder of vscode.workspace.workspaceFolders ?? []) {
    if (folder.uri.scheme === "file") kept.set(folder.uri.toString(), await gitKeptFiles(folder.uri.fsPath));
  }
  return found.filter((uri) => {
    const folder = vscode.workspace.getWorkspaceFolder(uri);
    const keptHere = folder ? kept.get(folder.uri.toString()) : undefined;
    return keptHere === undefined || keptHere.keeps(uri.fsPath);
  });
}

/** `{a,b,...}` of every pattern switched on in files.exclude and search.exclude; null for none. */
export function excludeGlob(): string | null {
  const patterns = new Set<string>();
  for (const section of ["files", "search"]) {
    const excluded = vscode.workspace.getConfiguration(section).get<Record<string, unknown>>("exclude") ?? {};
    // `{ "when": ... }` entries depend on sibling files; a plain glob cannot say that, so they are left out.
    for (const [pattern, on] of Object.entries(excluded))
      if (on === true) for (const expanded of expandBraces(pattern)) patterns.add(expanded);
  }
  return patterns.size === 0 ? null : `{${[...patterns].join(",")}}`;
}

/** Globs cannot nest braces, so `**\/*.{js,map}` becomes `**\/*.js` and `**\/*.map`. */
export function expandBraces(pattern: string): string[] {
  const open = pattern.indexOf("{");
  const close = open >= 0 ? pattern.indexOf("}", open) : -1;
  // A comma outside braces would split the combined glob; such a pattern cannot be passed on.
  if (open < 0 || close < 0) return pattern.includes(",") ? [] : [pattern];
  const head = pattern.slice(0, open);
  const tail = pattern.slice(close + 1);
  return pattern
    .slice(open + 1, close)
    .split(",")
    .flatMap((choice) => expandBraces(head + choice + tail));
}
