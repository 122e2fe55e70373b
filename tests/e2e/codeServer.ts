/**
 * A real VS Code for the end-to-end tests: code-server (VS Code served to a browser) installed in a
 * cache folder outside the project's dependencies, with the packaged extension installed into a
 * throwaway extensions folder and a throwaway user profile, listening on loopback only.
 */
import { execFile, spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { promisify } from "node:util";

const run = promisify(execFile);

export const REPOSITORY_ROOT = fileURLToPath(new URL("../..", import.meta.url));

/** Runs the idempotent install script; answers the path of the code-server launcher. */
export async function installedCodeServer(logFile: string): Promise<string> {
  const script = join(REPOSITORY_ROOT, "tests", "e2e", "installCodeServer.sh");
  try {
    const { stdout, stderr } = await run("bash", [script], { cwd: REPOSITORY_ROOT, maxBuffer: 64 * 1024 * 1024, timeout: 20 * 60_000 });
    writeFileSync(logFile, stderr);
    const launcher = join(stdout.trim().split("\n").pop() ?? "", "node_modules", ".bin", "code-server");
    if (!existsSync(launcher)) throw new Error(`the install script answered no launcher (${launcher})`);
    return launcher;
  } catch (error) {
    const failure = error as { stderr?: string; message: string };
    writeFileSync(logFile, failure.stderr ?? "");
    throw new Error(`code-server could not be installed (log: ${logFile}): ${failure.message}`, { cause: error });
  }
}

/** Packs the already built extension (dist/) into a .vsix, as a user would install it. */
export async function packagedExtension(outDirectory: string): Promise<string> {
  for (const bundle of ["client.js", "server.js"]) {
    if (!existsSync(join(REPOSITORY_ROOT, "dist", bundle))) throw new Error(`dist/${bundle} is missing: run npm run build first`);
  }
  const vsix = join(outDirectory, "lonepair.vsix");
  const vsce = join(REPOSITORY_ROOT, "node_modules", "@vscode", "vsce", "vsce");
  await run(
    process.execPath,
    [vsce, "package", "--no-dependencies", "--allow-missing-repository", "--no-rewrite-relative-links", "--out", vsix],
    {
      cwd: REPOSITORY_ROOT,
      timeout: 180_000,
    },
  );
  return vsix;
}

/** Folders of one editor session; all of them temporary. */
export interface EditorFolders {
  readonly userData: string;
  readonly extensions: string;
  readonly config: string;
}

/** Settings that keep the editor quiet and predictable: no welcome page, no tips, no network. */
const QUIET_SETTINGS = {
  "workbench.startupEditor": "none",
  "workbench.tips.enabled": false,
  "workbench.welcomePage.walkthroughs.openOnInstall": false,
  "telemetry.telemetryLevel": "off",
  "extensions.autoCheckUpdates": false,
  "extensions.autoUpdate": false,
  "update.mode": "none",
  "workbench.enableExperiments": false,
  "chat.disableAIFeatures": true,
  "editor.minimap.enabled": false,
  "git.enabled": false,
} as const;

export function prepareEditorFolders(root: string): EditorFolders {
  const folders = { userData: join(root, "user-data"), extensions: join(root, "extensions"), config: join(root, "config.yaml") };
  mkdirSync(join(folders.userData, "User"), { recursive: true });
  mkdirSync(folders.extensions, { recursive: true });
  writeFileSync(join(folders.userData, "User", "settings.json"), JSON.stringify(QUIET_SETTINGS, null, 2));
  // Our own config file, so code-server never writes one into the user's home.
  writeFileSync(folders.config, "bind-addr: 127.0.0.1:0\nauth: none\ncert: false\n");
  return folders;
}

/** The environment minus an enclosing editor's variables, which would send commands to that editor. */
function cleanEnvironment(): NodeJS.ProcessEnv {
  return Object.fromEntries(Object.entries(process.env).filter(([name]) => !name.startsWith("VSCODE_")));
}

function commonArguments(folders: EditorFolders): string[] {
  return ["--config", folders.config, "--user-data-dir", folders.userData, "--extensions-dir", folders.extensions];
}

export async function installExtension(launcher: string, folders: EditorFolders, vsix: string): Promise<void> {
  const { stdout } = await run(launcher, [...commonArguments(folders), "--install-extension", vsix], {
    env: cleanEnvironment(),
    timeout: 180_000,
  });
  if (!/successfully installed/i.test(stdout)) throw new Error(`code-server did not install the extension: ${stdout}`);
}

/** A running code-server; `stop` ends its whole process group (the server and its extension hosts). */
export interface RunningCodeServer {
  readonly url: string;
  stop(): Promise<void>;
}

export async function startCodeServer(launcher: string, folders: EditorFolders, logFile: string): Promise<RunningCodeServer> {
  const args = [
    ...commonArguments(folders),
    "--bind-addr",
    "127.0.0.1:0",
    "--auth",
    "none",
    "--disable-workspace-trust",
    "--disable-telemetry",
    "--disable-update-check",
  ];
  const server = spawn(launcher, args, { env: cleanEnvironment(), detached: true, stdio: ["ignore", "pipe", "pipe"] });
  let log = "";
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`code-server did not start listening:\n${log}`)), 120_000);
    const read = (chunk: Buffer): void => {
      log += chunk.toString();
      writeFileSync(logFile, log);
      // Port 0 lets the system pick a free port; code-server prints the one it got.
      const listening = /HTTP server listening on (http:\/\/127\.0\.0\.1:\d+)\//.exec(log);
      if (listening) {
        clearTimeout(timer);
        resolve(listening[1]);
      }
    };
    server.stdout?.on("data", read);
    server.stderr?.on("data", read);
    server.on("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`code-server exited with ${code}:\n${log}`));
    });
  });
  return { url, stop: () => stopProcessGroup(server) };
}

async function stopProcessGroup(child: ChildProcess): Promise<void> {
  if (child.pid === undefined || child.exitCode !== null) return;
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const signalGroup = (signal: NodeJS.Signals): void => {
    try {
      process.kill(-(child.pid as number), signal);
    } catch {
      // The group is already gone.
    }
  };
  signalGroup("SIGTERM");
  const timer = setTimeout(() => signalGroup("SIGKILL"), 10_000);
  await exited;
  clearTimeout(timer);
  // Extension hosts and the language server share the group and may outlive the server by a moment.
  signalGroup("SIGKILL");
}
