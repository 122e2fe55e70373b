// `lonepair check --fix` on documents written the way other people write (the real-style corpus,
// labels stripped, and tests/fixtures/fix-safety: words, names, group abbreviations and deuterated
// solvents in species columns and prose): every species in them is written correctly, so no byte
// may change.
import { mkdtempSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { stripLabels } from "../document/labelledText";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

const FIXTURES = join(repositoryRoot, "tests", "fixtures");

/** Every document under `folder` as [path inside the fixtures, text without labels]. */
function documentsIn(folder: string): [string, string][] {
  return readdirSync(folder).flatMap((entry): [string, string][] => {
    const path = join(folder, entry);
    if (statSync(path).isDirectory()) return documentsIn(path);
    if (entry === "README.md") return [];
    return [[relative(FIXTURES, path), stripLabels(readFileSync(path, "utf8")).text]];
  });
}

describe("check --fix on real-style documents", () => {
  it("changes nothing that was correct", () => {
    const documents = [...documentsIn(join(FIXTURES, "real-style")), ...documentsIn(join(FIXTURES, "fix-safety"))];
    expect(documents.length).toBeGreaterThan(5);
    const folder = mkdtempSync(join(tmpdir(), "lonepair-real-style-"));
    for (const [name, text] of documents) {
      mkdirSync(join(folder, name, ".."), { recursive: true });
      writeFileSync(join(folder, name), text);
    }
    const run = runCli(["check", "--fix", "."], folder);
    expect(run.status, run.stderr).not.toBe(2);
    const changed = documents.filter(([name, text]) => readFileSync(join(folder, name), "utf8") !== text).map(([name]) => name);
    expect(changed, run.stdout).toEqual([]);
  });
});
