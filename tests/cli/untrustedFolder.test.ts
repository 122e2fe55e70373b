// Checking a folder that is someone else's git repository never runs a program named in its
// configuration: a planted `.git/config` asks git for a file-system monitor and a pager that
// would each leave a marker file. Plain git runs them (so the plant works), lonepair must not.
import { execFileSync } from "node:child_process";
import { chmodSync, existsSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { gitCommandForUntrustedFolder } from "../../shared/src/index";
import { ensureBuilt, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

interface PlantedRepository {
  readonly folder: string;
  readonly marker: string;
}

/** A repository whose configuration names a program that creates `marker` when run. */
function plantedRepository(): PlantedRepository {
  const folder = mkdtempSync(join(tmpdir(), "lonepair-planted-"));
  const marker = join(folder, "ran.txt");
  execFileSync("git", ["init", "-q", folder]);
  const program = join(folder, "planted.sh");
  writeFileSync(program, `#!/bin/sh\necho ran >> "${marker}"\n`);
  chmodSync(program, 0o755);
  writeFileSync(
    join(folder, ".git", "config"),
    [
      "[core]",
      "\trepositoryformatversion = 0",
      "\tbare = false",
      `\tfsmonitor = ${program}`,
      `\thooksPath = ${folder}`,
      `\tpager = ${program}`,
      "[diff]",
      `\texternal = ${program}`,
      "",
    ].join("\n"),
  );
  // common practice: NF3 has 5 + 3 x 7 = 26 valence electrons
  writeFileSync(join(folder, "cylinders.csv"), "cylinder,formula,valence electrons\nKR-F-301,NF3,24\n");
  writeFileSync(join(folder, "scratch.md"), "SF6 and NF3 for the etch study.\n");
  writeFileSync(join(folder, ".gitignore"), "scratch.md\n");
  return { folder, marker };
}

describe("check on a folder with a planted git configuration", () => {
  it("the planted program runs under plain git, so the tests below can fail", () => {
    const { folder, marker } = plantedRepository();
    execFileSync("git", ["ls-files", "--others", "--exclude-standard"], { cwd: folder, stdio: "ignore" });
    expect(existsSync(marker)).toBe(true);
  });

  it.each([["text"], ["json"], ["sarif"]])("runs nothing from the repository (--format %s) and still honours .gitignore", (format) => {
    const { folder, marker } = plantedRepository();
    const run = runCli(["check", "--format", format, "."], folder);
    expect(existsSync(marker), "a program named in .git/config was run").toBe(false);
    expect(run.stdout).toContain("cylinders.csv");
    // scratch.md is ignored: listed by git, not by a plain walk.
    expect(run.stdout).not.toContain("scratch.md");
    expect(run.status).toBe(0);
  });

  it("runs nothing from the repository when fixing either", () => {
    const { folder, marker } = plantedRepository();
    runCli(["check", "--fix", "."], folder);
    expect(existsSync(marker)).toBe(false);
  });

  it("list and table run nothing from it either", () => {
    const { folder, marker } = plantedRepository();
    runCli(["list", "."], folder);
    runCli(["table", "."], folder);
    expect(existsSync(marker)).toBe(false);
  });
});

describe("the git command for a folder that is not trusted", () => {
  const environment = { PATH: "/usr/bin", HOME: "/home/kestrel", GIT_DIR: "/elsewhere/.git", GIT_EXTERNAL_DIFF: "/tmp/x" };

  it("points git at no other repository or program from the environment", () => {
    const command = gitCommandForUntrustedFolder(["ls-files"], environment);
    expect(command.env.GIT_DIR).toBeUndefined();
    expect(command.env.GIT_EXTERNAL_DIFF).toBeUndefined();
    expect(command.env.PATH).toBe("/usr/bin");
    expect(command.env.GIT_CONFIG_NOSYSTEM).toBe("1");
    expect(command.args.at(-1)).toBe("ls-files");
  });
});
