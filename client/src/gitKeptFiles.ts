/**
 * The files git keeps in a folder (tracked, or untracked and not ignored): what `.gitignore`,
 * `.git/info/exclude` and the user's global excludes leave in. Asked of git itself, so every rule
 * of those files applies exactly. No vscode import: the workspace check filters with it.
 */
import { execFile } from "node:child_process";
import { relative, sep } from "node:path";
import { gitCommandForUntrustedFolder } from "./untrustedGit";

/** Listing more than this is not a lab notebook; the check then goes by the editor's excludes alone. */
const MAX_LISTING_BYTES = 64 * 1024 * 1024;

/** Files git keeps under one folder, by their path relative to it. */
export interface GitKeptFiles {
  /** True when git keeps `path` (an absolute path under the folder). */
  keeps(path: string): boolean;
}

/**
 * What git keeps under `folder`, or undefined when `folder` is not in a git work tree, git is
 * missing or fails. Safe for a folder nobody vouches for: git runs with every program the
 * repository's configuration could name switched off.
 */
export function gitKeptFiles(folder: string): Promise<GitKeptFiles | undefined> {
  return new Promise((done) => {
    const git = gitCommandForUntrustedFolder(["ls-files", "-z", "--cached", "--others", "--exclude-standard"], process.env);
    execFile(
      "git",
      [...git.args],
      { cwd: folder, env: git.env, encoding: "utf8", maxBuffer: MAX_LISTING_BYTES, windowsHide: true },
      (error, listed) => {
        if (error) return done(undefined);
        // git prints paths relative to the folder it runs in, with forward slashes.
        const kept = new Set(listed.split("\0").filter((path) => path.length > 0));
        done({ keeps: (path) => kept.has(relative(folder, path).split(sep).join("/")) });
      },
    );
  });
}
