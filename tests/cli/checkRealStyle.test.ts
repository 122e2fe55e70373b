// `lonepair check` on the real-style corpus (tests/fixtures/real-style, labels stripped): every
// document there is correct chemistry written the way other people write it, so every error is a
// false error, which fails a user's CI on a correct file.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { documentKindFor } from "../../shared/src/index";
import { stripLabels } from "../document/labelledText";
import { ensureBuilt, repositoryRoot, runCli } from "./cliRunner";

const CORPUS = join(repositoryRoot, "tests", "fixtures", "real-style");

/**
 * Documents that still get false errors today, and what is missing. Each is an expected failure
 * (`it.fails`): once the engine gives the document no error the test passes, vitest reports it,
 * and the document comes off this list. The handbook table has its own row-by-row test.
 */
const KNOWN_FALSE_ERRORS: Readonly<Record<string, string>> = {};

/** The most false errors the whole corpus may get: today's count, lowered as the engine improves. */
const MAX_FALSE_ERRORS = 0;

interface JsonFinding {
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly severity: string;
  readonly code: string;
  readonly message: string;
}

// Only the files check reads (every corpus document has a kind today; the filter keeps it honest).
const documents: readonly string[] = readdirSync(CORPUS, { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .flatMap((entry) => readdirSync(join(CORPUS, entry.name)).map((file) => `${entry.name}/${file}`))
  .filter((document) => documentKindFor(document) !== undefined)
  .sort();

let errorsByDocument = new Map<string, string[]>();

beforeAll(() => {
  ensureBuilt();
  const folder = mkdtempSync(join(tmpdir(), "lonepair-real-style-"));
  for (const document of documents) {
    const target = join(folder, document);
    mkdirSync(dirname(target), { recursive: true });
    writeFileSync(target, stripLabels(readFileSync(join(CORPUS, document), "utf8")).text);
  }
  const run = runCli(["check", "--format", "json", "."], folder);
  const findings = JSON.parse(run.stdout) as JsonFinding[];
  errorsByDocument = new Map();
  for (const finding of findings.filter((each) => each.severity === "error")) {
    const document = finding.file.replace(/\\/g, "/").replace(/^\.\//, "");
    const described = `${finding.line}:${finding.column} ${finding.code}: ${finding.message}`;
    errorsByDocument.set(document, [...(errorsByDocument.get(document) ?? []), described]);
  }
});

describe("check on documents written the way other people write", () => {
  it("checks every document of the corpus", () => {
    expect(documents.length).toBeGreaterThanOrEqual(10);
    for (const known of Object.keys(KNOWN_FALSE_ERRORS)) expect(documents, `${known} is listed but missing`).toContain(known);
  });

  it(`gives at most ${MAX_FALSE_ERRORS} false errors over the whole corpus`, () => {
    const all = [...errorsByDocument.entries()].flatMap(([document, errors]) => errors.map((error) => `${document}:${error}`));
    expect(all.length, all.join("\n")).toBeLessThanOrEqual(MAX_FALSE_ERRORS);
  });

  for (const document of documents) {
    const missing = KNOWN_FALSE_ERRORS[document];
    const title = missing ? `no error on ${document} (still missing: ${missing})` : `no error on ${document}`;
    const noErrors = (): void => {
      expect(errorsByDocument.get(document) ?? [], `${document} is correct; every error on it is false`).toEqual([]);
    };
    if (missing) it.fails(title, noErrors);
    else it(title, noErrors);
  }
});
