/**
 * A document's findings handed out in parts are exactly the findings of the whole document, in
 * the same order, whatever the part size; and a document full of findings comes in many small
 * parts rather than one huge list.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, documentKindFor, findingsInParts } from "../../shared/src/index";
import type { DocumentKind, Finding } from "../../shared/src/index";

const ROOT = join(__dirname, "..", "..");

function filesUnder(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const path = join(folder, name);
    return statSync(path).isDirectory() ? filesUnder(path) : [path];
  });
}

/** Every fixture and example document the core reads, with its kind. */
const DOCUMENTS: [string, DocumentKind, string][] = [join(ROOT, "tests", "fixtures"), join(ROOT, "examples")]
  .flatMap(filesUnder)
  .flatMap((path): [string, DocumentKind, string][] => {
    const text = readFileSync(path, "utf8");
    const kind = documentKindFor(path, undefined, text.slice(0, 4096));
    return kind && !path.endsWith(".schema.json") && !path.includes("sarif-schema") ? [[relative(ROOT, path), kind, text]] : [];
  });

function wholeDocumentFindings(text: string, kind: DocumentKind): Finding[] {
  const model = analyzeDocument(text, kind);
  return [...model.problems, ...checkDocument(model)];
}

function partsOf(text: string, kind: DocumentKind, partSize?: number): (readonly Finding[])[] {
  return [...findingsInParts(text, kind, { partSize })];
}

describe("findings in parts", () => {
  it("has fixtures of every prose kind to compare on", () => {
    const kinds = new Set(DOCUMENTS.map(([, kind]) => kind));
    expect([...kinds].sort()).toEqual(expect.arrayContaining(["markdown", "plaintext", "csv", "json", "yaml"]));
  });

  it.each(DOCUMENTS.flatMap(([path, kind, text]) => [1, 3, 64, undefined].map((size) => [path, size, kind, text] as const)))(
    "%s in parts of %s mentions gives the whole document's findings",
    (_path, size, kind, text) => {
      // The whole-document reading is the reference: parts change only when findings are worked out.
      expect(partsOf(text, kind, size).flat()).toEqual(wholeDocumentFindings(text, kind));
    },
  );

  it.each([1, 5, 100])("all markdown fixtures joined into one document, in parts of %i, give the same findings", (size) => {
    const joined = DOCUMENTS.filter(([, kind]) => kind === "markdown")
      .map(([, , text]) => text)
      .join("\n\n");
    expect(partsOf(joined, "markdown", size).flat()).toEqual(wholeDocumentFindings(joined, "markdown"));
  });

  it.each([
    ["one paragraph", "markdown", "Run 42 vented CH5 again. ".repeat(5000)],
    ["a chemistry fence", "markdown", "```chem\n" + "CH5 + NH5 -> CH5\n".repeat(2000) + "```\n"],
    ["a pipe table", "markdown", "| Species | Shape |\n| --- | --- |\n" + "| CH5 | tetrahedral |\n| SF4 | seesaw |\n".repeat(2000)],
    ["plain text", "plaintext", "Bay D log: CH5 seen; NH5 too.\n".repeat(4000)],
  ] as const)("%s full of findings comes in small parts, and they agree with the whole", (_name, kind, text) => {
    // common practice: carbon and nitrogen hold at most four electron pairs, so CH5 and NH5 are errors.
    const parts = partsOf(text, kind, 256);
    expect(parts.length, "a document with thousands of findings should come in many parts").toBeGreaterThan(10);
    // A part may run a little past its size: a whole step of the scan (a chunk, a row) is kept together.
    expect(Math.max(...parts.map((part) => part.length))).toBeLessThanOrEqual(256 + 8);
    expect(parts.flat()).toEqual(wholeDocumentFindings(text, kind));
  });
});
