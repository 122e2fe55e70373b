/**
 * The workspace check over the protocol: `workspace/diagnostic` for a client that pulls, the
 * command `lonepair.checkWorkspaceFolders` (progress, cancellation, published diagnostics) for one
 * that does not. Both must find the files `lonepair check` finds in the same folder and report
 * what it reports, read open documents in their editor text, run nothing a checked folder
 * configures, and stop when cancelled.
 */
import { execFileSync } from "node:child_process";
import { chmodSync, cpSync, existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { afterEach, describe, expect, it } from "vitest";
import {
  CancellationTokenSource,
  DidChangeWatchedFilesNotification,
  DocumentDiagnosticReportKind,
  ExecuteCommandRequest,
  FileChangeType,
  WorkDoneProgressCancelNotification,
  WorkspaceDiagnosticRequest,
  type ClientCapabilities,
  type Diagnostic,
  type WorkspaceDiagnosticReport,
  type WorkspaceDocumentDiagnosticReport,
} from "vscode-languageserver-protocol/node";
import type { WorkspaceCheckResult } from "../../shared/src/editorRequests";
import { ensureBuilt, repositoryRoot, runCli } from "../cli/cliRunner";
import { FULL_CAPABILITIES, startSession, type LspSession } from "./lspSession";

const COMMAND = "lonepair.checkWorkspaceFolders";

/** A client that pushes nothing itself but shows progress the server creates (Neovim does so). */
const PUSH_CLIENT: ClientCapabilities = { ...FULL_CAPABILITIES, window: { workDoneProgress: true } };

/** A client that pulls diagnostics, document and workspace, and watches files for the server. */
const PULL_CLIENT: ClientCapabilities = {
  ...FULL_CAPABILITIES,
  textDocument: { ...FULL_CAPABILITIES.textDocument, diagnostic: { dynamicRegistration: false } },
  workspace: {
    ...FULL_CAPABILITIES.workspace,
    diagnostics: { refreshSupport: true },
    didChangeWatchedFiles: { dynamicRegistration: true },
  },
};

const sessions: LspSession[] = [];
const folders: string[] = [];

afterEach(async () => {
  for (const session of sessions.splice(0)) await session.stop();
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

/**
 * The lab's shared folder: the documents the edges test uses, plus what a check must leave out: a
 * scratch folder git ignores (holding an impossible CH5), and a binary file named like a table.
 */
function labFolder(options: { git: boolean }): string {
  const folder = mkdtempSync(join(tmpdir(), "lonepair-workspace-"));
  folders.push(folder);
  cpSync(join(repositoryRoot, "tests", "fixtures", "edges"), join(folder, "lab"), { recursive: true });
  mkdirSync(join(folder, "scratch"));
  // common practice: carbon holds at most four electron pairs, so CH5 is an error wherever it is checked.
  writeFileSync(join(folder, "scratch", "draft.md"), "Bay C draft: CH5 leak?\n");
  writeFileSync(join(folder, "lab", "spectrum.csv"), Buffer.from([0x66, 0x6f, 0x72, 0x6d, 0x00, 0x01, 0x02, 0x0a]));
  if (options.git) {
    execFileSync("git", ["init", "-q", folder]);
    writeFileSync(join(folder, ".gitignore"), "scratch/\n");
  }
  return folder;
}

async function session(folder: string, capabilities: ClientCapabilities): Promise<LspSession> {
  const started = await startSession({ capabilities, workspaceFolders: [{ uri: pathToFileURL(folder).href, name: "lab" }] });
  sessions.push(started);
  return started;
}

/** `path line:column severity code` of each diagnostic, sorted: what the command line prints, in its terms. */
function described(path: string, diagnostics: readonly Diagnostic[]): string[] {
  const severity = ["", "error", "warning", "information", "hint"];
  return diagnostics.map(
    (diagnostic) =>
      `${path} ${diagnostic.range.start.line + 1}:${diagnostic.range.start.character + 1} ${severity[diagnostic.severity ?? 3]} ${diagnostic.code}`,
  );
}

/** What `lonepair check` reports for `folder`, in the same terms. */
function cliFindings(folder: string): string[] {
  ensureBuilt();
  const run = runCli(["check", "--format", "json", "."], folder);
  const findings = JSON.parse(run.stdout) as { file: string; line: number; column: number; severity: string; code: string }[];
  return findings.map((finding) => `${finding.file} ${finding.line}:${finding.column} ${finding.severity} ${finding.code}`).sort();
}

function relativePath(folder: string, uri: string): string {
  return fileURLToPath(uri).slice(folder.length + 1);
}

function pull(session: LspSession, previous: { uri: string; value: string }[] = [], token?: CancellationTokenSource) {
  return session.connection.sendRequest(
    WorkspaceDiagnosticRequest.type,
    { identifier: "lonepair", previousResultIds: previous },
    token?.token,
  ) as Promise<WorkspaceDiagnosticReport>;
}

function fullItems(report: WorkspaceDiagnosticReport, folder: string): string[] {
  return report.items
    .filter((item): item is WorkspaceDocumentDiagnosticReport & { items: Diagnostic[] } => item.kind === DocumentDiagnosticReportKind.Full)
    .flatMap((item) => described(relativePath(folder, item.uri), item.items))
    .sort();
}

describe.each([
  ["in a git work tree", true],
  ["outside git", false],
])("the workspace check %s", (_title, git) => {
  it("through workspace/diagnostic finds what lonepair check finds, and leaves out what it leaves out", async () => {
    const folder = labFolder({ git });
    // Outside git nothing is ignored by a .gitignore: the scratch folder is checked by both.
    const expected = cliFindings(folder);
    expect(expected.some((line) => line.startsWith("lab/run-16-isomers.md") && line.endsWith("octet-exceeded"))).toBe(true);
    expect(expected.some((line) => line.startsWith("scratch/"))).toBe(!git);

    const client = await session(folder, PULL_CLIENT);
    expect(client.initializeResult.capabilities.diagnosticProvider).toMatchObject({ workspaceDiagnostics: true });
    const report = await pull(client);
    expect(fullItems(report, folder)).toEqual(expected);
    // Every checkable file has a report, clean ones too, so a client can clear what it showed before.
    const files = report.items.map((item) => relativePath(folder, item.uri)).sort();
    expect(files).toEqual(
      [
        "lab/cylinders.csv",
        "lab/gas-list.txt",
        "lab/ions.yaml",
        "lab/run-16-isomers.md",
        "lab/species.json",
        ...(git ? [] : ["scratch/draft.md"]),
      ].sort(),
    );
  });

  it("through the command publishes what lonepair check finds, with progress", async () => {
    const folder = labFolder({ git });
    const expected = cliFindings(folder);
    const client = await session(folder, PUSH_CLIENT);
    expect(client.initializeResult.capabilities.executeCommandProvider?.commands).toContain(COMMAND);
    const result = (await client.connection.sendRequest(ExecuteCommandRequest.type, {
      command: COMMAND,
      arguments: [],
    })) as WorkspaceCheckResult;
    expect(result).toMatchObject({ checked: result.files, problems: expected.length, cancelled: false });
    const published = client.published.flatMap((params) => described(relativePath(folder, params.uri), params.diagnostics)).sort();
    expect(published).toEqual(expected);
    // Progress came on a token the server created: begin, at least one report, end.
    expect(client.createdProgress).toHaveLength(1);
    const kinds = client.progress.map((event) => event.value.kind);
    expect(kinds[0]).toBe("begin");
    expect(kinds.at(-1)).toBe("end");
  });
});

describe("the workspace check with open documents", () => {
  it("reads an open document in its editor text, not the file on disk", async () => {
    const folder = labFolder({ git: true });
    const client = await session(folder, PULL_CLIENT);
    const uri = pathToFileURL(join(folder, "lab", "run-16-isomers.md")).href;
    // The writer corrected CH4 in the editor and has not saved yet.
    client.open(uri, "markdown", "Run 16 note: CH4 and SF4 only.\n");
    const report = await pull(client);
    const item = report.items.find((entry) => entry.uri === uri);
    expect(item).toMatchObject({ kind: DocumentDiagnosticReportKind.Full, version: 1, items: [] });
  });

  it("with the command leaves an open document's diagnostics to the document", async () => {
    const folder = labFolder({ git: true });
    const client = await session(folder, PUSH_CLIENT);
    const uri = pathToFileURL(join(folder, "lab", "run-16-isomers.md")).href;
    client.open(uri, "markdown", "Run 16 note: CH5 again.\n");
    const own = await client.waitForDiagnostics(uri);
    await client.connection.sendRequest(ExecuteCommandRequest.type, { command: COMMAND, arguments: [] });
    expect(client.published.filter((params) => params.uri === uri)).toEqual([own]);
  });
});

describe("repeated pulls", () => {
  it("wait for a change, then send again only the files that changed", async () => {
    const folder = labFolder({ git: true });
    const client = await session(folder, PULL_CLIENT);
    const first = await pull(client);
    const held = first.items.map((item) => ({ uri: item.uri, value: item.resultId! }));
    let answered = false;
    const second = pull(client, held).then((report) => ((answered = true), report));
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(answered, "a pull with nothing changed must wait, or a client pulling in a loop reads the workspace forever").toBe(false);
    // A cylinder is relabelled on disk; the client's watcher says so.
    const table = join(folder, "lab", "gas-list.txt");
    writeFileSync(table, "formula\tgeometry\nCO2\tlinear\n");
    await client.connection.sendNotification(DidChangeWatchedFilesNotification.type, {
      changes: [{ uri: pathToFileURL(table).href, type: FileChangeType.Changed }],
    });
    const report = await second;
    const changed = report.items
      .filter((item) => item.kind === DocumentDiagnosticReportKind.Full)
      .map((item) => relativePath(folder, item.uri));
    expect(changed).toEqual(["lab/gas-list.txt"]);
    expect(report.items.filter((item) => item.kind === DocumentDiagnosticReportKind.Unchanged)).toHaveLength(first.items.length - 1);
  });

  it("clear a file that was deleted", async () => {
    const folder = labFolder({ git: false });
    const client = await session(folder, PULL_CLIENT);
    const first = await pull(client);
    rmSync(join(folder, "scratch", "draft.md"));
    await client.connection.sendNotification(DidChangeWatchedFilesNotification.type, {
      changes: [{ uri: pathToFileURL(join(folder, "scratch", "draft.md")).href, type: FileChangeType.Deleted }],
    });
    const report = await pull(
      client,
      first.items.map((item) => ({ uri: item.uri, value: item.resultId! })),
    );
    const cleared = report.items.find((item) => relativePath(folder, item.uri) === "scratch/draft.md");
    expect(cleared).toMatchObject({ kind: DocumentDiagnosticReportKind.Full, items: [] });
  });
});

describe("a large workspace", () => {
  /** Many small write-ups, so a check takes long enough to be cancelled midway. */
  function manyFiles(count: number): string {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-many-"));
    folders.push(folder);
    for (let index = 0; index < count; index += 1)
      writeFileSync(join(folder, `run-${index}.md`), `Run ${index}: SF4, NF3 and CH5 in bay C.\n`);
    return folder;
  }

  it("stops when the user cancels the command's progress, and says so", async () => {
    const folder = manyFiles(400);
    const client = await session(folder, PUSH_CLIENT);
    const running = client.connection.sendRequest(ExecuteCommandRequest.type, {
      command: COMMAND,
      arguments: [],
    }) as Promise<WorkspaceCheckResult>;
    // Cancel as soon as the first file is reported checked.
    await waitFor(() => client.progress.some((event) => event.value.kind === "report" && /of 400 files/.test(event.value.message ?? "")));
    await client.connection.sendNotification(WorkDoneProgressCancelNotification.type, { token: client.createdProgress[0] });
    const result = await running;
    expect(result.cancelled).toBe(true);
    expect(result.files).toBe(400);
    expect(result.checked).toBeLessThan(400);
    expect(client.progress.at(-1)?.value.kind).toBe("end");
  });

  it("stops a pull the client cancels", async () => {
    const folder = manyFiles(400);
    const client = await session(folder, PULL_CLIENT);
    const source = new CancellationTokenSource();
    const running = pull(client, [], source);
    setTimeout(() => source.cancel(), 50);
    await expect(running).rejects.toMatchObject({ code: -32800 }); // RequestCancelled
  });
});

describe("a folder with a planted git configuration", () => {
  it("is checked without running any program it names", async () => {
    const folder = labFolder({ git: true });
    const marker = join(folder, "ran.txt");
    const program = join(folder, "planted.sh");
    writeFileSync(program, `#!/bin/sh\necho ran >> "${marker}"\n`);
    chmodSync(program, 0o755);
    execFileSync("git", ["config", "core.fsmonitor", program], { cwd: folder });
    execFileSync("git", ["config", "core.hooksPath", folder], { cwd: folder });
    // The plant works under plain git, so the check below can fail.
    execFileSync("git", ["ls-files", "--others", "--exclude-standard"], { cwd: folder, stdio: "ignore" });
    expect(existsSync(marker)).toBe(true);
    rmSync(marker);

    const client = await session(folder, PULL_CLIENT);
    const report = await pull(client);
    expect(existsSync(marker), "a program named in .git/config was run").toBe(false);
    // .gitignore still applies: git was asked, safely.
    expect(report.items.some((item) => item.uri.includes("/scratch/"))).toBe(false);
    expect(report.items.some((item) => item.uri.endsWith("/lab/cylinders.csv"))).toBe(true);
  });
});

async function waitFor(condition: () => boolean, timeoutMs = 15_000): Promise<void> {
  const start = Date.now();
  while (!condition()) {
    if (Date.now() - start > timeoutMs) throw new Error("condition not met in time");
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}
