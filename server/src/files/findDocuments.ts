/**
 * Turns paths (a command line's, or an editor's workspace folders) into the documents to read:
 * files as given, folders searched for markdown, text, LaTeX, AsciiDoc, reStructuredText, CSV/TSV, JSON and YAML files. Inside a git
 * work tree a folder is listed by git, so .gitignore is respected; elsewhere (or without git) a
 * plain walk skips node_modules and dot-folders. Binary files are never documents. Whatever could
 * not be read is reported, never passed over in silence: a named path always, a file in a folder
 * when its extension makes it a document, and every folder that could not be listed. Both
 * programs use this, so the command line and the editor's workspace check read the same files.
 * Paths and messages are plain text; each program makes them safe for where it shows them.
 */
import { isUtf8 } from "node:buffer";
import { execFileSync } from "node:child_process";
import { closeSync, openSync, readdirSync, readSync, statSync } from "node:fs";
import { join, relative, resolve, sep } from "node:path";
import { documentKindFor, gitCommandForUntrustedFolder } from "../../../shared/src/index";
import type { DocumentKind } from "../../../shared/src/index";
import { bytesAsText } from "./pathText";

/** A file to read, with the path to show for it. */
export interface DocumentFile {
  readonly path: string;
  /** Relative to the working directory, with forward slashes. */
  readonly displayPath: string;
  readonly kind: DocumentKind;
  readonly size: number;
  /** When the file was last written, in milliseconds (the file system's clock). */
  readonly modifiedMs: number;
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
  /**
   * Paths that do not exist, or documents and folders that cannot be read (permissions, a path
   * too long for the system, a name that is not valid UTF-8): an I/O error for the caller.
   * In `path`, bytes that are not UTF-8 are written `\xHH`.
   */
  readonly unreadable: readonly UnreadablePath[];
  /** Files named on the command line that are not documents lonepair reads, and why. */
  readonly skipped: readonly SkippedPath[];
}

/** A file named on the command line and passed over: `why` ends the line that says so. */
export interface SkippedPath {
  readonly path: string;
  readonly why: string;
}

const NOT_A_DOCUMENT = "not a markdown, text, LaTeX, AsciiDoc, reStructuredText, CSV/TSV, JSON or YAML file; skipped";
const LOOKS_BINARY = "it holds NUL bytes, so it looks like a binary file; skipped";

/** A path that could not be read, and why, in plain words. */
export interface UnreadablePath {
  readonly path: string;
  readonly message: string;
}

/** Enough of the start of a file to tell binary from text and a table saved as .txt from prose. */
const PROBE_BYTES = 8192;
const SNIFF_CHARACTERS = 4096;

/** A folder entry: its path as text, or as bytes when the name is not valid UTF-8. */
type ListedPath = string | Buffer;

/** One step of a search: a document found, a path that could not be read, or a named file skipped. */
export type FoundItem =
  | { readonly kind: "document"; readonly file: DocumentFile }
  | { readonly kind: "unreadable"; readonly unreadable: UnreadablePath }
  | { readonly kind: "skipped"; readonly skipped: SkippedPath };

/**
 * Finds the documents under `paths`, in the order given, folders sorted, each file once. Never
 * runs a program from the folders searched (see `gitListing`).
 */
export function findDocuments(paths: readonly string[], workingDirectory = process.cwd()): FoundDocuments {
  const files: DocumentFile[] = [];
  const unreadable: UnreadablePath[] = [];
  const skipped: SkippedPath[] = [];
  for (const item of searchDocuments(paths, workingDirectory)) {
    if (item.kind === "document") files.push(item.file);
    else if (item.kind === "unreadable") unreadable.push(item.unreadable);
    else skipped.push(item.skipped);
  }
  return { files, unreadable, skipped };
}

/**
 * The same search one step at a time: each folder is listed at once (git answers in one go), and
 * each file in it is opened and sniffed only when the caller asks for the next step, so a caller
 * can stop, report progress or let other work run between files.
 */
export function* searchDocuments(paths: readonly string[], workingDirectory = process.cwd()): Generator<FoundItem> {
  const seen = new Set<string>();
  const visit = (path: ListedPath, named: boolean): FoundItem | undefined => {
    if (typeof path !== "string") {
      // Node reads such a name only as bytes; every step after this one works on text.
      const shown = bytesAsText(relativeBytes(path, workingDirectory));
      if (named || documentKindFor(path.toString("utf8")))
        return { kind: "unreadable", unreadable: { path: shown, message: "the file name is not valid UTF-8; not checked" } };
      return undefined;
    }
    const absolute = resolve(workingDirectory, path);
    if (seen.has(absolute)) return undefined;
    seen.add(absolute);
    const file = documentFile(absolute, workingDirectory);
    if (file.kind === "document") return { kind: "document", file: file.document };
    if (file.kind === "unreadable") {
      if (named || documentKindFor(absolute))
        return { kind: "unreadable", unreadable: { path: displayPathOf(absolute, workingDirectory), message: ioMessage(file.error) } };
      return undefined;
    }
    if (!named) return undefined;
    return {
      kind: "skipped",
      skipped: { path: displayPathOf(absolute, workingDirectory), why: file.kind === "binary" ? LOOKS_BINARY : NOT_A_DOCUMENT },
    };
  };
  for (const path of paths) {
    const absolute = resolve(workingDirectory, path);
    let stats;
    try {
      stats = statSync(absolute);
    } catch (error) {
      yield { kind: "unreadable", unreadable: { path, message: ioMessage(error) } };
      continue;
    }
    if (stats.isDirectory()) {
      const listed = filesUnder(absolute);
      for (const folder of listed.unreadableFolders) {
        const shown =
          typeof folder.path === "string"
            ? displayPathOf(folder.path, workingDirectory)
            : bytesAsText(relativeBytes(folder.path, workingDirectory));
        yield { kind: "unreadable", unreadable: { path: shown, message: `folder not searched: ${folder.message}` } };
      }
      for (const found of listed.files.sort(comparePaths)) {
        const item = visit(found, false);
        if (item) yield item;
      }
    } else {
      const item = visit(absolute, true);
      if (item) yield item;
    }
  }
}

/** A plain message for a failed file operation: "no such file or directory" rather than a stack. */
export function ioMessage(error: unknown): string {
  const code = (error as NodeJS.ErrnoException)?.code;
  if (code === "ENOENT") return "no such file or directory";
  if (code === "EACCES" || code === "EPERM") return "permission denied";
  if (code === "EISDIR") return "is a folder";
  if (code === "ENAMETOOLONG") return "the path is longer than the system allows";
  if (code === "ELOOP") return "too many symbolic links (a link loop?)";
  return error instanceof Error ? error.message : String(error);
}

/** The path relative to the working directory, with forward slashes. */
export function displayPathOf(absolute: string, workingDirectory = process.cwd()): string {
  const shown = relative(workingDirectory, absolute) || absolute;
  return sep === "/" ? shown : shown.split(sep).join("/");
}

/** A path given as bytes, relative to the working directory when it lies under it. */
function relativeBytes(path: Buffer, workingDirectory: string): Buffer {
  const prefix = Buffer.from(workingDirectory.endsWith(sep) ? workingDirectory : workingDirectory + sep);
  return path.subarray(0, prefix.length).equals(prefix) ? path.subarray(prefix.length) : path;
}

function comparePaths(a: ListedPath, b: ListedPath): number {
  if (typeof a !== "string" || typeof b !== "string") return Buffer.compare(Buffer.from(a), Buffer.from(b));
  return a < b ? -1 : a > b ? 1 : 0;
}

type FileVerdict =
  | { readonly kind: "document"; readonly document: DocumentFile }
  | { readonly kind: "unreadable"; readonly error: unknown }
  | { readonly kind: "binary" }
  | { readonly kind: "other" };

const OTHER: FileVerdict = { kind: "other" };
const BINARY: FileVerdict = { kind: "binary" };

function documentFile(absolute: string, workingDirectory: string): FileVerdict {
  let size: number;
  let modifiedMs: number;
  let start: Buffer;
  try {
    const stats = statSync(absolute);
    if (!stats.isFile()) return OTHER;
    size = stats.size;
    modifiedMs = stats.mtimeMs;
    start = readStart(absolute);
  } catch (error) {
    // Gone since it was listed (git still indexes a deleted file) or a link to nothing: nothing to read.
    if ((error as NodeJS.ErrnoException)?.code === "ENOENT") return OTHER;
    return { kind: "unreadable", error };
  }
  const encoding = encodingOf(start);
  // NUL bytes mark a binary file, except in UTF-16, where every ASCII character has one.
  if (encoding === "utf-8" && start.includes(0)) return BINARY;
  const text = encoding === "utf-8" ? start.toString("utf8") : new TextDecoder(encoding).decode(start);
  const kind = documentKindFor(absolute, undefined, text.slice(0, SNIFF_CHARACTERS));
  if (!kind) return OTHER;
  const file: DocumentFile = { path: absolute, displayPath: displayPathOf(absolute, workingDirectory), kind, size, modifiedMs };
  return { kind: "document", document: encoding === "utf-8" ? file : { ...file, encoding } };
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

/** What a folder holds: its files, and the folders under it that could not be listed. */
interface FolderListing {
  readonly files: ListedPath[];
  readonly unreadableFolders: { readonly path: ListedPath; readonly message: string }[];
}

/** Every file under `folder`: from git when the folder is in a work tree, else by walking. */
function filesUnder(folder: string): FolderListing {
  const listed = gitListing(folder);
  return listed ? { files: listed, unreadableFolders: [] } : filesByWalking(folder);
}

/**
 * The files git keeps under `folder` (tracked, or untracked and not ignored), or undefined
 * outside a work tree or without git. The folder may be anyone's repository, so git runs with
 * every program its configuration could name switched off (`gitCommandForUntrustedFolder`).
 */
function gitListing(folder: string): ListedPath[] | undefined {
  const git = (args: readonly string[], maxBuffer: number): Buffer => {
    const command = gitCommandForUntrustedFolder(args, process.env);
    return execFileSync("git", command.args, { cwd: folder, env: command.env, stdio: ["ignore", "pipe", "ignore"], maxBuffer });
  };
  try {
    if (
      git(["rev-parse", "--is-inside-work-tree"], 1 << 16)
        .toString("utf8")
        .trim() !== "true"
    )
      return undefined;
    const listed = git(["ls-files", "-z", "--cached", "--others", "--exclude-standard"], 1 << 30);
    // Paths come relative to the folder as bytes; deleted but still indexed files fail the stat later.
    const files: ListedPath[] = [];
    let start = 0;
    for (let end = listed.indexOf(0); end >= 0; start = end + 1, end = listed.indexOf(0, start)) {
      if (end > start) files.push(listedPath(folder, listed.subarray(start, end)));
    }
    return files;
  } catch {
    // No git, or not a work tree.
    return undefined;
  }
}

/** `folder` joined with `name` (bytes): as text when the name is UTF-8, else as bytes. */
function listedPath(folder: string, name: Buffer): ListedPath {
  return isUtf8(name) ? join(folder, name.toString("utf8")) : Buffer.concat([Buffer.from(folder + sep), name]);
}

function filesByWalking(folder: string): FolderListing {
  const files: ListedPath[] = [];
  const unreadableFolders: { path: ListedPath; message: string }[] = [];
  const pending = [folder];
  while (pending.length > 0) {
    const current = pending.pop()!;
    let entries;
    try {
      entries = readdirSync(current, { withFileTypes: true, encoding: "buffer" });
    } catch (error) {
      unreadableFolders.push({ path: current, message: ioMessage(error) });
      continue;
    }
    for (const entry of entries) {
      const path = listedPath(current, entry.name);
      const name = entry.name.toString("utf8");
      // Symbolic links to folders are not followed, so a link loop cannot trap the walk.
      if (entry.isDirectory()) {
        if (name === "node_modules" || name.startsWith(".")) continue;
        if (typeof path === "string") pending.push(path);
        else unreadableFolders.push({ path, message: "the folder name is not valid UTF-8" });
      } else if (entry.isFile() || entry.isSymbolicLink()) {
        files.push(path);
      }
    }
  }
  return { files, unreadableFolders };
}
