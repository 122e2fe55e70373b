/**
 * Document kinds from file names, language ids and the first bytes.
 */
import { describe, expect, it } from "vitest";
import { documentKindFor } from "../../shared/src/document/documentKind";

describe("documentKindFor", () => {
  // common practice: the usual file extensions of these formats
  it.each([
    ["notebook/run-14.md", "markdown"],
    ["README.MARKDOWN", "markdown"],
    ["notes.txt", "plaintext"],
    ["inventory/cylinders.csv", "csv"],
    ["ions.tsv", "tsv"],
    ["reference/species.json", "json"],
    ["settings.jsonc", "json"],
    ["inventory/ions.yaml", "yaml"],
    ["ions.yml", "yaml"],
    ["C:\\lab\\data\\Cylinders.CSV", "csv"],
  ])("%s is %s", (fileName, kind) => {
    expect(documentKindFor(fileName)).toBe(kind);
  });

  it.each([
    ["untitled-1", "markdown", "markdown"],
    ["untitled-2", "yaml", "yaml"],
    ["scratch", "jsonc", "json"],
    ["data.xyz", "plaintext", "plaintext"],
  ])("%s with language %s is %s", (fileName, languageId, kind) => {
    expect(documentKindFor(fileName, languageId)).toBe(kind);
  });

  it.each([
    ["export.dat", "formula,lone pairs\nSF4,1\nNF3,1\n", "csv"],
    ["export.txt", "species\tshape\nSF4\tseesaw\nNF3\ttrigonal pyramidal\n", "tsv"],
    ["export", "\ufeffname,formula,notes\nwater,H2O,x\nammonia,NH3,y\n", "csv"],
    ["notes.txt", "Dear Tomasz, thanks, see you\nat nine, then lunch, ok\n", "plaintext"],
    ["notes.txt", "a,b\n1,2\n", "plaintext"],
  ])("%s starting %j is %s", (fileName, firstBytes, kind) => {
    expect(documentKindFor(fileName, "plaintext", firstBytes)).toBe(kind);
  });

  it.each(["image.png", "archive.tar.gz", "program.ts"])("%s is nothing lonepair reads", (fileName) => {
    expect(documentKindFor(fileName)).toBeUndefined();
  });
});
