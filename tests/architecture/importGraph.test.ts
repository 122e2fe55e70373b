/**
 * The shape of the project, kept by a test: the language server and the command line reach the
 * core only through its one door, `shared/src/index.ts`; the VS Code client bundles no chemistry
 * and reads only the request contract (`shared/src/editorRequests.ts`); the core imports no edge
 * and nothing from the editor or the protocol; the client never imports the server.
 */
import { readdirSync, readFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const CORE_DOOR = join(ROOT, "shared/src/index");
const REQUEST_CONTRACT = join(ROOT, "shared/src/editorRequests");

function sourceFiles(folder: string): string[] {
  const found: string[] = [];
  for (const entry of readdirSync(join(ROOT, folder), { withFileTypes: true })) {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) found.push(...sourceFiles(path));
    else if (/\.(ts|mts|cts)$/.test(entry.name)) found.push(path);
  }
  return found;
}

interface ImportEdge {
  readonly file: string;
  readonly specifier: string;
  /** The imported path relative to the project root, for relative specifiers. */
  readonly target?: string;
}

const IMPORT_PATTERN = /(?:^|\n)\s*(?:import|export)\s[^;]*?\sfrom\s*["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;

function importsOf(file: string): ImportEdge[] {
  const text = readFileSync(join(ROOT, file), "utf8");
  const edges: ImportEdge[] = [];
  for (const match of text.matchAll(IMPORT_PATTERN)) {
    const specifier = match[1] ?? match[2];
    const target = specifier.startsWith(".") ? relative(ROOT, resolve(ROOT, dirname(file), specifier)) : undefined;
    edges.push({ file, specifier, target });
  }
  return edges;
}

const serverFiles = sourceFiles("server/src");
const clientFiles = sourceFiles("client/src");
const coreFiles = sourceFiles("shared/src");

describe("import graph", () => {
  it("finds the files it judges", () => {
    expect(serverFiles.length).toBeGreaterThan(20);
    expect(clientFiles.length).toBeGreaterThan(5);
    expect(coreFiles.length).toBeGreaterThan(50);
  });

  it("the language server and the command line reach the core only through shared/src/index", () => {
    const deeper = serverFiles
      .flatMap(importsOf)
      .filter((edge) => edge.target?.startsWith("shared/") && join(ROOT, edge.target) !== CORE_DOOR)
      .map((edge) => `${edge.file} imports ${edge.specifier}`);
    expect(deeper).toEqual([]);
  });

  it("the core imports no edge, no editor API, no protocol library and no Node I/O", () => {
    const forbidden =
      /^(vscode|vscode-languageserver.*|vscode-languageclient.*|vscode-jsonrpc.*|(node:)?(fs|path|child_process|net|os|worker_threads|process)(\/.*)?)$/;
    const outward = coreFiles
      .flatMap(importsOf)
      .filter((edge) => (edge.target ? !edge.target.startsWith("shared/") : forbidden.test(edge.specifier)))
      .map((edge) => `${edge.file} imports ${edge.specifier}`);
    expect(outward).toEqual([]);
  });

  it("the client reads only the request contract from the core", () => {
    const chemistry = clientFiles
      .flatMap(importsOf)
      .filter((edge) => edge.target?.startsWith("shared/") && join(ROOT, edge.target) !== REQUEST_CONTRACT)
      .map((edge) => `${edge.file} imports ${edge.specifier}`);
    expect(chemistry).toEqual([]);
  });

  it("the request contract imports nothing but types", () => {
    const text = readFileSync(`${REQUEST_CONTRACT}.ts`, "utf8");
    const valueImports = [...text.matchAll(/^import\s+(?!type\b)[^;]*;/gm)].map((match) => match[0]);
    expect(valueImports).toEqual([]);
  });

  it("the client never imports the server", () => {
    const crossing = sourceFiles("client/src")
      .flatMap(importsOf)
      .filter((edge) => edge.target?.startsWith("server/"))
      .map((edge) => `${edge.file} imports ${edge.specifier}`);
    expect(crossing).toEqual([]);
  });

  it("the command line and the language server are siblings that do not import each other", () => {
    const crossing = [
      ...sourceFiles("server/src/cli")
        .flatMap(importsOf)
        .filter((edge) => edge.target?.startsWith("server/src/lsp")),
      ...sourceFiles("server/src/lsp")
        .flatMap(importsOf)
        .filter((edge) => edge.target?.startsWith("server/src/cli")),
    ].map((edge) => `${edge.file} imports ${edge.specifier}`);
    expect(crossing).toEqual([]);
  });

  it("the file search both programs use (server/src/files) belongs to neither", () => {
    const files = sourceFiles("server/src/files");
    expect(files.length).toBeGreaterThan(0);
    const crossing = files
      .flatMap(importsOf)
      .filter((edge) => edge.target?.startsWith("server/src/lsp") || edge.target?.startsWith("server/src/cli"))
      .map((edge) => `${edge.file} imports ${edge.specifier}`);
    expect(crossing).toEqual([]);
  });
});
