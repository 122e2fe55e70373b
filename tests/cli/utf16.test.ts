// Spreadsheets save "Unicode text" as UTF-16 with a byte-order mark. `check`, `list` and `table`
// read such files and report exactly what they report for the same text in UTF-8; `--fix` leaves
// them untouched and says why.
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, runCli } from "./cliRunner";

beforeAll(ensureBuilt);

// common practice: SF4 has 34 valence electrons and NH3 is trigonal pyramidal; CH5 is impossible
const TABLE = "formula\tvalence electrons\tmolecular geometry\r\nSF4\t30\tseesaw\r\nNH3\t8\ttrigonal planar\r\nΩ-lot\t\t\r\nCH5\t\t\r\n";
const NOTES = "# Run 16\n\nThe Ω bay used SF4 and CH5 today.\n";

function utf16(text: string, order: "le" | "be"): Buffer {
  const little = Buffer.from(`\ufeff${text}`, "utf16le");
  if (order === "le") return little;
  // Swap each pair of bytes for big-endian.
  const big = Buffer.alloc(little.length);
  for (let index = 0; index < little.length; index += 2) {
    big[index] = little[index + 1];
    big[index + 1] = little[index];
  }
  return big;
}

function findingsOf(folder: string, name: string) {
  const run = runCli(["check", "--format", "json", name], folder);
  return { status: run.status, findings: JSON.parse(run.stdout).map(({ file: _file, ...rest }: { file: string }) => rest) };
}

describe("UTF-16 files", () => {
  it.each([
    ["a tab-separated table, little-endian", "store", "tsv", TABLE, "le"],
    ["a tab-separated table, big-endian", "store", "tsv", TABLE, "be"],
    ["markdown notes, little-endian", "notes", "md", NOTES, "le"],
    ["markdown notes, big-endian", "notes", "md", NOTES, "be"],
  ] as const)("%s gives the findings of the same text in UTF-8", (_label, base, extension, text, order) => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-utf16-"));
    writeFileSync(join(folder, `${base}-8.${extension}`), `\ufeff${text}`);
    writeFileSync(join(folder, `${base}-16.${extension}`), utf16(text, order));
    const expected = findingsOf(folder, `${base}-8.${extension}`);
    expect(expected.findings.length).toBeGreaterThan(0);
    expect(findingsOf(folder, `${base}-16.${extension}`)).toEqual(expected);
  });

  it("list and table read them too", () => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-utf16-"));
    writeFileSync(join(folder, "store.tsv"), utf16(TABLE, "le"));
    expect(runCli(["list", "store.tsv"], folder).stdout).toContain("store.tsv:2:1: SF4");
    expect(runCli(["table", "store.tsv"], folder).stdout).toContain("| SF4 | sulfur tetrafluoride | 34 | AX4E1 |");
  });

  it("--fix leaves a UTF-16 file byte for byte as it was and says why", () => {
    const folder = mkdtempSync(join(tmpdir(), "lonepair-utf16-"));
    const bytes = utf16(TABLE, "le");
    writeFileSync(join(folder, "store.tsv"), bytes);
    const run = runCli(["check", "--fix", "store.tsv"], folder);
    expect(run.stderr).toContain("not fixed: the file is UTF-16");
    expect(readFileSync(join(folder, "store.tsv")).equals(bytes)).toBe(true);
  });
});
