/**
 * How the client runs git in a workspace folder: with every program the repository's own
 * configuration could name switched off. The client bundles nothing of the core, so this is a
 * copy of the core's `gitCommandForUntrustedFolder`; a test keeps the two identical.
 */

/** Arguments and environment for one git run. */
export interface GitCommand {
  readonly args: readonly string[];
  readonly env: Readonly<Record<string, string>>;
}

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

/** The command for `git <gitArguments>` with no program from the repository's configuration. */
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
