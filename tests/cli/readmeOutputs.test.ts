// Every command output the README shows is what the command line prints now: each block is found
// by the sentence that introduces it, and the command is run where the sentence says (the
// repository, or a copy of examples/). A block marked "first lines" or "first items" is the
// start of the output.
// common practice: a README shows what its commands print, so each shown output is checked against a run.
import { cpSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const readme = readFileSync(join(repositoryRoot, "README.md"), "utf8").split("\n");

/** The lines of the first fenced block after the line holding `anchor`. */
function blockAfter(anchor: string): string[] {
  const at = readme.findIndex((line) => line.includes(anchor));
  expect(at, `README has no line with ${anchor}`).toBeGreaterThanOrEqual(0);
  const open = readme.findIndex((line, index) => index > at && line.startsWith("```"));
  const close = readme.findIndex((line, index) => index > open && line.startsWith("```"));
  return readme.slice(open + 1, close);
}

/** Output lines; CSV output ends its rows with CRLF, which a README block cannot show. */
function linesOf(text: string): string[] {
  return text.replace(/\r?\n$/, "").split(/\r?\n/);
}

/** A copy of examples/ per test: `--fix` writes into it. */
function examplesCopy(): string {
  const folder = join(mkdtempSync(join(tmpdir(), "lonepair-readme-")), "examples");
  cpSync(join(repositoryRoot, "examples"), folder, { recursive: true });
  return folder;
}

describe("the README's shown outputs", () => {
  it.each<[string, string[]]>([
    ["A real run (`node dist/cli.js analyze SF4 CH5`", ["analyze", "SF4", "CH5"]],
    ["`node dist/cli.js analyze --json SF4`:", ["analyze", "--json", "SF4"]],
    ["A real run (`node dist/cli.js check examples`", ["check", "examples"]],
    ["`node dist/cli.js check --format json examples/inventory/ions.yaml`:", ["check", "--format", "json", "examples/inventory/ions.yaml"]],
    [
      "`node dist/cli.js check --format sarif examples/inventory/ions.yaml`:",
      ["check", "--format", "sarif", "examples/inventory/ions.yaml"],
    ],
    [
      "`node dist/cli.js check --fix --dry-run examples/notebook/run-16-scrubber-chemistry.md` prints:",
      ["check", "--fix", "--dry-run", "examples/notebook/run-16-scrubber-chemistry.md"],
    ],
    ["`node dist/cli.js table examples/notebook/run-15-nf3-vs-sf6.md`:", ["table", "examples/notebook/run-15-nf3-vs-sf6.md"]],
    ["`node dist/cli.js table --format csv SF4", ["table", "--format", "csv", "SF4", "NH4+"]],
  ])("after %s", (anchor, args) => {
    expect(linesOf(runCli(args).stdout)).toEqual(blockAfter(anchor));
  });

  it.each<[string, string[]]>([
    ["`node dist/cli.js list examples/notebook/run-15-nf3-vs-sf6.md` (first lines):", ["list", "examples/notebook/run-15-nf3-vs-sf6.md"]],
    ["`node dist/cli.js list --json examples/inventory/ions.yaml` (first items):", ["list", "--json", "examples/inventory/ions.yaml"]],
  ])("after %s, the start of the output", (anchor, args) => {
    const shown = blockAfter(anchor).filter((line) => line.trim() !== "..." && line !== "]");
    expect(linesOf(runCli(args).stdout).slice(0, shown.length)).toEqual(shown);
  });

  it("balance, as the README shows the session", () => {
    const shownSession = [
      ...blockAfter("`lonepair balance` balances equations given on the command line"),
      ...blockAfter("`--acidic` or `--basic` completes half-reactions"),
    ];
    const rerun: string[] = [];
    for (const line of shownSession) {
      if (!line.startsWith("$ node dist/cli.js ")) continue;
      // The shown commands quote each argument with double quotes and nothing inside them.
      const args = [...line.slice("$ node dist/cli.js ".length).matchAll(/"([^"]*)"|(\S+)/g)].map((match) => match[1] ?? match[2]);
      rerun.push(line, ...linesOf(runCli(args).stdout));
    }
    expect(rerun.length).toBeGreaterThan(4);
    expect(rerun).toEqual(shownSession);
  });

  it("check --fix in a copy of examples/, the dry run of one file and then the whole fix", () => {
    const folder = examplesCopy();
    const dryRun = runCli(["check", "--fix", "--dry-run", "inventory/ions.yaml"], folder);
    expect(linesOf(dryRun.stdout)).toEqual(blockAfter("`node dist/cli.js check --fix --dry-run inventory/ions.yaml` prints:"));
    expect(linesOf(dryRun.stderr)).toEqual(blockAfter("and on stderr:"));
    const fixed = runCli(["check", "--fix", "."], folder);
    expect(fixed.status).toBe(1);
    expect(linesOf(fixed.stdout)).toEqual(blockAfter("`node dist/cli.js check --fix .` in the same copy"));
  });
});
