/**
 * How to run git in a folder that may be anyone's repository. A repository's own configuration
 * (`.git/config`) can name programs for git to run (a file-system monitor, hooks, a pager, an
 * external diff), so listing the files of a cloned or downloaded folder could run code from it.
 * Options given on git's command line outrank every configuration file, so these switch each such
 * program off; the environment drops the system-wide file and anything that redirects git to
 * another repository or program. Plain data, so every edge runs git the same way.
 */

/** Arguments and environment for one git run. */
export interface GitCommand {
  readonly args: readonly string[];
  readonly env: Readonly<Record<string, string>>;
}

/** Settings that would otherwise let a repository's configuration name a program to run. */
const NO_CONFIGURED_PROGRAMS: readonly string[] = [
  "core.fsmonitor=false",
  "core.hooksPath=/dev/null",
  "core.pager=cat",
  "core.editor=true",
  "core.askPass=",
  "core.sshCommand=ssh",
  "core.gitProxy=",
  "core.untrackedCache=false",
  "credential.helper=",
  "protocol.allow=never",
];

/** Variables that point git at another repository, configuration or program. */
const DROPPED_VARIABLES: readonly string[] = [
  "GIT_DIR",
  "GIT_WORK_TREE",
  "GIT_INDEX_FILE",
  "GIT_COMMON_DIR",
  "GIT_OBJECT_DIRECTORY",
  "GIT_ALTERNATE_OBJECT_DIRECTORIES",
  "GIT_CONFIG",
  "GIT_EXTERNAL_DIFF",
  "GIT_ASKPASS",
  "GIT_SSH",
  "GIT_SSH_COMMAND",
  "GIT_EDITOR",
  "GIT_SEQUENCE_EDITOR",
  "GIT_TRACE",
];

/**
 * The command for `git <gitArguments>` in a folder that is not trusted: no program named by the
 * repository's configuration runs, no pager, no optional lock (git writes nothing), no prompt.
 * `environment` is the caller's (process.env); the user's global configuration still applies,
 * so their global excludes file keeps working.
 */
export function gitCommandForUntrustedFolder(
  gitArguments: readonly string[],
  environment: Readonly<Record<string, string | undefined>>,
): GitCommand {
  const env: Record<string, string> = {};
  for (const [name, value] of Object.entries(environment)) {
    if (value !== undefined && !DROPPED_VARIABLES.includes(name)) env[name] = value;
  }
  Object.assign(env, {
    GIT_CONFIG_NOSYSTEM: "1",
    GIT_OPTIONAL_LOCKS: "0",
    GIT_TERMINAL_PROMPT: "0",
    GIT_PAGER: "cat",
    PAGER: "cat",
  });
  const settings = NO_CONFIGURED_PROGRAMS.flatMap((setting) => ["-c", setting]);
  return { args: ["--no-pager", "--no-optional-locks", ...settings, ...gitArguments], env };
}
