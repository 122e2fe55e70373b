/**
 * A real editor as the client: Debian's Neovim (0.7) starts `node dist/server.js --stdio`
 * headless, opens a lab write-up, waits for diagnostics and asks for hovers
 * (tests/editors/nvim-lsp-check.lua). The script writes what Neovim saw as JSON; this file checks
 * it. Positions are checked as Neovim reports them (diagnostic columns in bytes, hover positions in
 * UTF-16), so the fixture puts multi-byte characters before the species on purpose.
 */
import { spawn, spawnSync } from "node:child_process";
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
const SERVER = join(ROOT, "dist", "server.js");
const SCRIPT = join(ROOT, "tests", "editors", "nvim-lsp-check.lua");
const DOCUMENT = join(ROOT, "tests", "fixtures", "editors", "run-22.md");
const HOVER_WORDS = ["SF4", "XeF4"] as const;
const NVIM_TIMEOUT_MS = 45_000;

/** What nvim-lsp-check.lua writes. */
interface NeovimReport {
  readonly nvim_version: string;
  readonly steps: readonly string[];
  readonly error?: string;
  readonly filetype?: string;
  readonly offset_encoding?: string;
  readonly stopped?: boolean;
  readonly diagnostics: readonly {
    readonly lnum: number;
    readonly col: number;
    readonly end_lnum: number;
    readonly end_col: number;
    readonly severity: number;
    readonly code?: string;
    readonly source?: string;
    readonly message: string;
  }[];
  readonly hovers: readonly {
    readonly word: string;
    readonly found: boolean;
    readonly position?: { readonly line: number; readonly character: number };
    readonly text?: string;
    readonly error?: string;
  }[];
  readonly coordinates?: { readonly word: string; readonly text?: string; readonly extension?: string; readonly error?: string };
  readonly workspace?: {
    readonly error?: string;
    readonly result?: { readonly files: number; readonly checked: number; readonly problems: number; readonly cancelled: boolean };
    readonly diagnostics: readonly { readonly file: string; readonly lnum: number; readonly col: number; readonly code?: string }[];
    readonly progress_titles: readonly string[];
  };
}

interface NeovimRun {
  readonly exitCode: number | null;
  readonly stderr: string;
  readonly timedOut: boolean;
  /** Set when nvim could not be started at all. */
  readonly startError?: string;
}

// CI installs Neovim (.ci/run); elsewhere a missing nvim skips these tests.
const nvimVersion = spawnSync("nvim", ["--version"], { encoding: "utf8" });
const haveNeovim = nvimVersion.error === undefined && nvimVersion.status === 0;
const inCi = process.env.CI !== undefined;
const SKIP_REASON = "nvim is not on PATH; install it with `apt-get install -y neovim` (CI does, in .ci/run)";
const title =
  haveNeovim || inCi
    ? "Neovim (headless) as a client of the language server"
    : `Neovim (headless) as a client of the language server (skipped: ${SKIP_REASON})`;
if (!haveNeovim && !inCi) console.warn(`tests/editors/neovim.test.ts skipped: ${SKIP_REASON}`);

/** Runs the Lua script in headless Neovim with its own state folders, killed after a timeout. */
function runNeovim(resultPath: string, homeDir: string, workspace: string): Promise<NeovimRun> {
  return new Promise((resolve) => {
    const child = spawn("nvim", ["--headless", "--clean", "-n", "-c", `luafile ${SCRIPT}`], {
      cwd: ROOT,
      stdio: ["ignore", "ignore", "pipe"],
      env: {
        ...process.env,
        // Keeps Neovim's LSP log and state out of the user's home.
        XDG_CACHE_HOME: join(homeDir, "cache"),
        XDG_STATE_HOME: join(homeDir, "state"),
        XDG_DATA_HOME: join(homeDir, "data"),
        LONEPAIR_SERVER: SERVER,
        LONEPAIR_DOCUMENT: DOCUMENT,
        LONEPAIR_HOVER_WORDS: HOVER_WORDS.join(","),
        LONEPAIR_RESULT: resultPath,
        LONEPAIR_WORKSPACE: workspace,
        LONEPAIR_TIMEOUT_MS: "15000",
      },
    });
    let stderr = "";
    let timedOut = false;
    child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString("utf8")));
    const timer = setTimeout(() => {
      timedOut = true;
      child.kill("SIGKILL");
    }, NVIM_TIMEOUT_MS);
    child.on("error", (error) => {
      clearTimeout(timer);
      resolve({ exitCode: null, stderr, timedOut, startError: error.message });
    });
    child.on("close", (exitCode) => {
      clearTimeout(timer);
      resolve({ exitCode, stderr, timedOut });
    });
  });
}

/** Where `needle` first appears as Neovim counts: 0-based line, byte column and UTF-16 column. */
function locate(text: string, needle: string): { line: number; byteColumn: number; utf16Column: number } {
  const lines = text.split("\n");
  const line = lines.findIndex((candidate) => new RegExp(`\\b${needle}\\b`).test(candidate));
  const utf16Column = lines[line]!.search(new RegExp(`\\b${needle}\\b`));
  return { line, byteColumn: Buffer.byteLength(lines[line]!.slice(0, utf16Column), "utf8"), utf16Column };
}

describe.skipIf(!haveNeovim && !inCi)(title, () => {
  const documentText = readFileSync(DOCUMENT, "utf8");
  let workDir: string;
  let workspace: string;
  let run: NeovimRun;
  let report: NeovimReport;

  beforeAll(async () => {
    expect(existsSync(SERVER), "dist/server.js is missing: run `npm run build` first").toBe(true);
    workDir = mkdtempSync(join(tmpdir(), "lonepair-nvim-"));
    const resultPath = join(workDir, "report.json");
    // The lab's project folder: the documents every edge is compared on.
    workspace = join(workDir, "lab");
    cpSync(join(ROOT, "tests", "fixtures", "edges"), workspace, { recursive: true });
    run = await runNeovim(resultPath, workDir, workspace);
    expect(run.startError, `nvim could not be started: ${SKIP_REASON}`).toBeUndefined();
    expect(run.timedOut, `nvim did not finish within ${NVIM_TIMEOUT_MS} ms\n${run.stderr}`).toBe(false);
    expect(existsSync(resultPath), `nvim wrote no report (exit ${run.exitCode})\n${run.stderr}`).toBe(true);
    report = JSON.parse(readFileSync(resultPath, "utf8")) as NeovimReport;
  });

  afterAll(() => {
    if (workDir) rmSync(workDir, { recursive: true, force: true });
  });

  it("runs every step of the script and exits cleanly", () => {
    expect(report.error, `script failed after steps ${report.steps.join(", ")}`).toBeUndefined();
    expect(report.steps).toEqual(["opened", "started", "initialized", "diagnostics", "hovers", "coordinates", "workspace", "stopped"]);
    expect(run.exitCode).toBe(0);
    // The markdown file type is what Neovim sends as the languageId.
    expect(report.filetype).toBe("markdown");
    expect(report.stopped).toBe(true);
  });

  // common practice: carbon, a period-2 atom, holds at most four electron pairs, so CH5 cannot exist.
  it.each([["CH5", "octet-exceeded"]])("reports %s as an error with code %s at its place in the line", (species, code) => {
    const where = locate(documentText, species);
    const matching = report.diagnostics.filter((diagnostic) => diagnostic.code === code);
    expect(matching).toHaveLength(1);
    expect(matching[0]).toMatchObject({
      lnum: where.line,
      col: where.byteColumn,
      end_lnum: where.line,
      end_col: where.byteColumn + Buffer.byteLength(species, "utf8"),
      severity: 1, // vim.diagnostic.severity.ERROR
      source: "lonepair",
    });
    expect(matching[0]!.message).toContain(species);
  });

  it.each(["SF4", "XeF4"])("leaves the valid species %s without diagnostics", (species) => {
    const where = locate(documentText, species);
    expect(report.diagnostics.filter((diagnostic) => diagnostic.lnum === where.line)).toEqual([]);
  });

  // common practice: SF4 has four bonds and one lone pair on S (AX4E1, seesaw); XeF4 has four
  // bonds and two lone pairs on Xe (AX4E2, square planar).
  it.each([
    ["SF4", ["seesaw", "AX4E1"]],
    ["XeF4", ["square planar", "AX4E2"]],
  ] as const)("hover on %s shows %j", (species, expectedWords) => {
    const hover = report.hovers.find((entry) => entry.word === species);
    const where = locate(documentText, species);
    expect(hover?.found).toBe(true);
    expect(hover?.error).toBeUndefined();
    // Neovim converts its byte column to UTF-16 before asking.
    expect(hover?.position).toEqual({ line: where.line, character: where.utf16Column });
    for (const word of expectedWords) expect(hover?.text).toContain(word);
    expect(hover?.text).toContain("Model prediction, not measured data");
  });

  it("exports coordinates of the species under the cursor with the custom request, as the README shows", () => {
    expect(report.coordinates?.error).toBeUndefined();
    expect(report.coordinates?.extension).toBe("xyz");
    const lines = report.coordinates?.text?.trim().split("\n") ?? [];
    // common practice: SF4 is one S and four F atoms; XYZ starts with the atom count.
    expect(lines[0]).toBe("5");
    expect(
      lines
        .slice(2)
        .map((line) => line.trim().split(/\s+/)[0])
        .sort(),
    ).toEqual(["F", "F", "F", "F", "S"]);
  });

  it("checks every file of the workspace folder with the server's command, as the README shows", () => {
    expect(report.workspace?.error).toBeUndefined();
    // The command line reads the same folder with the same search: its findings are the expected ones.
    const cli = spawnSync(process.execPath, [join(ROOT, "dist", "cli.js"), "check", "--format", "json", "."], {
      cwd: workspace,
      encoding: "utf8",
    });
    const expected = (JSON.parse(cli.stdout) as { file: string; line: number; column: number; code: string }[])
      .map((finding) => `${finding.file} ${finding.line - 1} ${finding.code}`)
      .sort();
    expect(expected.length).toBeGreaterThan(0);
    expect(report.workspace?.result).toMatchObject({ files: 5, checked: 5, problems: expected.length, cancelled: false });
    const seen = (report.workspace?.diagnostics ?? [])
      .map((diagnostic) => `${diagnostic.file} ${diagnostic.lnum} ${diagnostic.code}`)
      .sort();
    expect(seen).toEqual(expected);
    // Neovim showed the server's work-done progress.
    expect(report.workspace?.progress_titles).toContain("lonepair: checking workspace files");
  });
});
