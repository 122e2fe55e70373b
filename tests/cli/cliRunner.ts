// Runs `node dist/cli.js` as a user would, from a chosen folder; builds dist/ once if missing.
import { execFileSync, spawn, spawnSync } from "node:child_process";
import { cpSync, existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

export const repositoryRoot = fileURLToPath(new URL("../..", import.meta.url));
export const cliPath = join(repositoryRoot, "dist", "cli.js");

export interface CliRun {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Builds dist/ when a single test file is run on its own before any build. */
export function ensureBuilt(): void {
  if (!existsSync(cliPath)) execFileSync(process.execPath, ["esbuild.config.mjs"], { cwd: repositoryRoot });
}

/** Runs the command line with `args` in `cwd` (the repository by default). */
export function runCli(args: readonly string[], cwd = repositoryRoot): CliRun {
  const { status, stdout, stderr } = spawnSync(process.execPath, [cliPath, ...args], {
    cwd,
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
    maxBuffer: 64 * 1024 * 1024,
  });
  return { status, stdout, stderr };
}

/** A fresh copy of tests/fixtures/cli in a temporary folder (outside any git work tree). */
export function fixtureCopy(): string {
  const folder = mkdtempSync(join(tmpdir(), "lonepair-cli-"));
  cpSync(join(repositoryRoot, "tests", "fixtures", "cli"), folder, { recursive: true });
  return folder;
}

/** A command line started in the background, for tests that act while it runs. */
export interface StartedCli {
  readonly pid: number;
  /** Resolves when it has ended, with its status or the signal that ended it. */
  readonly ended: Promise<CliRun & { readonly signal: NodeJS.Signals | null }>;
}

/** Starts the command line with `args` in `cwd` without waiting for it. */
export function startCli(args: readonly string[], cwd: string, options: { uid?: number; gid?: number } = {}): StartedCli {
  const child = spawn(process.execPath, [cliPath, ...args], { cwd, env: { ...process.env, NO_COLOR: "1" }, ...options });
  let stdout = "";
  let stderr = "";
  child.stdout.setEncoding("utf8").on("data", (text: string) => (stdout += text));
  child.stderr.setEncoding("utf8").on("data", (text: string) => (stderr += text));
  const ended = new Promise<CliRun & { signal: NodeJS.Signals | null }>((resolve) => {
    child.on("close", (status, signal) => resolve({ status, signal, stdout, stderr }));
  });
  return { pid: child.pid!, ended };
}

/** Runs the command line as another user (tests running as root use it to meet permissions). */
export function runCliAs(uid: number, gid: number, args: readonly string[], cwd: string): CliRun {
  const { status, stdout, stderr } = spawnSync(process.execPath, [cliPath, ...args], {
    cwd,
    uid,
    gid,
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
    maxBuffer: 64 * 1024 * 1024,
  });
  return { status, stdout, stderr };
}
