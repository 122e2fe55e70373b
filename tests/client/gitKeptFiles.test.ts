// The workspace check leaves out what git ignores: git itself is asked, in a real repository.
import { execFileSync } from "node:child_process";
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { gitKeptFiles } from "../../client/src/gitKeptFiles";

function repository(): string {
  const root = mkdtempSync(join(tmpdir(), "lonepair-git-"));
  execFileSync("git", ["init", "-q"], { cwd: root });
  mkdirSync(join(root, "notebook"));
  mkdirSync(join(root, "scratch"));
  writeFileSync(join(root, ".gitignore"), "scratch/\n*.tmp.csv\n");
  writeFileSync(join(root, "notebook", "run-14.md"), "SF4 is a seesaw.\n");
  writeFileSync(join(root, "notebook", "export.tmp.csv"), "formula\nCH5\n");
  writeFileSync(join(root, "scratch", "old.md"), "CH5\n");
  writeFileSync(join(root, "cylinders.csv"), "formula\nNF3\n");
  return root;
}

describe("files git keeps", () => {
  it("keeps tracked and untracked files and leaves out what .gitignore names", async () => {
    const root = repository();
    execFileSync("git", ["add", "cylinders.csv"], { cwd: root });
    const kept = await gitKeptFiles(root);
    expect(kept).toBeDefined();
    expect(kept?.keeps(join(root, "cylinders.csv"))).toBe(true);
    expect(kept?.keeps(join(root, "notebook", "run-14.md"))).toBe(true);
    expect(kept?.keeps(join(root, "notebook", "export.tmp.csv"))).toBe(false);
    expect(kept?.keeps(join(root, "scratch", "old.md"))).toBe(false);
  });

  it("answers for a folder inside the repository by paths under that folder", async () => {
    const root = repository();
    const kept = await gitKeptFiles(join(root, "notebook"));
    expect(kept?.keeps(join(root, "notebook", "run-14.md"))).toBe(true);
    expect(kept?.keeps(join(root, "notebook", "export.tmp.csv"))).toBe(false);
  });

  it("says nothing outside a git work tree, so nothing is filtered", async () => {
    const plain = mkdtempSync(join(tmpdir(), "lonepair-plain-"));
    writeFileSync(join(plain, "notes.md"), "NH3\n");
    expect(await gitKeptFiles(plain)).toBeUndefined();
  });
});
