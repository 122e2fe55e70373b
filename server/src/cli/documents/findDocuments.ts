/**
 * Turns the paths on a command line into the documents to read: files as given, folders
 * searched for markdown, text, CSV/TSV, JSON and YAML files. Inside a git work tree a folder is
 * listed by git, so .gitignore is respected; elsewhere (or without git) a plain walk skips
 * node_modules and dot-folders. Binary files are never documents.
 */
import { execFileSync } from "node:child_process";
import { closeSync, openSync, readdirSync, readSync, statSync } from "node:fs";
import { join, relative, resolve, sep } from "node:path";
import { documentKindFor } from "../../../../shared/src/index";
import type { DocumentKind } from "../../../../shared/src/index";

/** A file to read, with the path to show for it. */
export interface DocumentFile {
  readonly path: string;
  /** Relative to the working directory, with forward slashes. */
  readonly displayPath: string;
  readonly kind: DocumentKind;
  readonly size: number;
  /** How the text is stored: UTF-8 (the default), or UTF-16 when the file opens with its byte-order mark. */
  readonly encoding?: TextEncoding;
}

export type TextEncoding = "utf-8" | "utf-16le" | "utf-16be";

/** UTF-16 by its byte-order mark (spreadsheets save "Unicode text" so); UTF-8 otherwise. */
export function encodingOf(start: Uint8Array): TextEncoding {
  if (start[0] === 0xff && start[1] === 0xfe) return "utf-16le";
  if (start[0] === 0xfe && start[1] === 0xff) return "utf-16be";
  return "utf-8";
}

/** What was found, and what could not be read or was skipped. */
export interface FoundDocuments {
  readonly files: readonly DocumentFile[];
  /** Paths that do not exist or cannot be read: an I/O error for the caller. */
  readonly missing: readonly { path: string; message: string }[];
  /** Files named on the command line that are not documents lonepair reads. */
  readonly skipped: readonly string[];
}

/** Enough of the start of a file to tell binary from text and a table saved as .txt from prose. */
const PROBE_BYTES = 8192;
const SNIFF_CHARACTERS = 4096;

/** Finds the documents under `paths`, in the order given, folders sorted, each file once. */
export function findDocuments(paths: readonly string[], workingDirectory = process.cwd()): FoundDocuments {
  const files: DocumentFile[] = [];
  const missing: { path: string; message: string }[] = [];
  const skipped: string[] = [];
  const seen = new Set<string>();
  const add = (path: string, named: boolean): void => {
    const absolute = resolve(workingDirectory, path);
    if (seen.has(absolute)) return;
    seen.add(absolute);
    const file = documentFile(absolute, workingDirectory);
    if (file) files.push(file);
    else if (named) skipped.push(displayPathOf(absolute, workingDirectory));
  };
  for (const path of paths) {
    const absolute = resolve(workingDirectory, path);
    let stats;
    try {
      stats = statSync(absolute);
    } catch (error) {
      missing.push({ path, message: ioMessage(error) });
      continue;
    }
    if (stats.isDirectory()) {
      for (const found of filesUnder(absolute).sort(comparePaths)) add(found, false);
    } else {
      add(absolute, true);
    }
  }
  return { files, missing, skipped };
}

/** A plain message for a failed file operation: "no such file or directory" rather than a stack. */
export function ioMessage(error: unknown): string {
  const code = (error as NodeJS.ErrnoException)?.code;
  if (code === "ENOENT") return "no such file or directory";
  if (code === "EACCES" || code === "EPERM") return "permission denied";
  if (code === "EISDIR") return "is a folder";
  return error instanceof Error ? error.message : String(error);
}

/** The path relative to the working directory, with forward slashes. */
export function displayPathOf(absolute: string, workingDirectory = process.cwd()): string {
  const shown = relative(workingDirectory, absolute) || absolute;
  return sep === "/" ? shown : shown.split(sep).join("/");
}

function comparePaths(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function documentFile(absolute: string, workingDirectory: string): DocumentFile | undefined {
  let size: number;
  let start: Buffer;
  try {
    const stats = statSync(absolute);
    if (!stats.isFile()) return undefined;
    size = stats.size;
    start = readStart(absolute);
  } catch {
    return undefined;
  }
  const encoding = encodingOf(start);
  // NUL bytes mark a binary file, except in UTF-16, where every ASCII character has one.
  if (encoding === "utf-8" && start.includes(0)) return undefined;
  const text = encoding === "utf-8" ? start.toString("utf8") : new TextDecoder(encoding).decode(start);
  const kind = documentKindFor(absolute, undefined, text.slice(0, SNIFF_CHARACTERS));
  if (!kind) return undefined;
  const file: DocumentFile = { path: absolute, displayPath: displayPathOf(absolute, workingDirectory), kind, size };
  return encoding === "utf-8" ? file : { ...file, encoding };
}

function readStart(path: string): Buffer {
  const descriptor = openSync(path, "r");
  try {
    const buffer = Buffer.alloc(PROBE_BYTES);
    const bytesRead = readSync(descriptor, buffer, 0, PROBE_BYTES, 0);
    return buffer.subarray(0, bytesRead);
  } finally {
    closeSync(descriptor);
  }
}

/** Every file under `folder`: from git when the folder is in a work tree, else by walking. */
function filesUnder(folder: string): string[] {
  return filesFromGit(folder) ?? filesByWalking(folder);
}

function filesFromGit(folder: string): string[] | undefined {
  try {
    const inside = execFileSync("git", ["rev-parse", "--is-inside-work-tree"], { cwd: folder, encoding: "utf8", stdio: ["ignore", "pipe", "ignore"] });
    if (inside.trim() !== "true") return undefined;
    const listed = execFileSync("git", ["ls-files", "-z", "--cached", "--others", "--exclude-standard"], {
      cwd: folder,
      encoding: "utf8",
      stdio: ["ignore", "pipe", "ignore"],
      maxBuffer: 1 << 30,
    });
    // Paths come relative to the folder; deleted but still indexed files fail the stat later.
    return listed.split("\0").filter((path) => path.length > 0).map((path) => join(folder, path));
  } catch {
    // No git, or not a work tree.
    return undefined;
  }
}

function filesByWalking(folder: string): string[] {
  const files: string[] = [];
  const pending = [folder];
  while (pending.length > 0) {
    const current = pending.pop()!;
    let entries;
    try {
      entries = readdirSync(current, { withFileTypes: true });
    } catch {
      continue;
    }
    for (const entry of entries) {
      const path = join(current, entry.name);
      // Symbolic links to folders are not followed, so a link loop cannot trap the walk.
      if (entry.isDirectory()) {
        if (entry.name !== "node_modules" && !entry.name.startsWith(".")) pending.push(path);
      } else if (entry.isFile() || entry.isSymbolicLink()) {
        files.push(path);
      }
    }
  }
  return files;
}
