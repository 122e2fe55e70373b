/**
 * Precision and recall of the species scanner over the labelled corpus of lab write-ups.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeDocument } from "../../shared/src/document/analyzeDocument";
import type { DocumentKind } from "../../shared/src/document/types";
import { lineAndColumn, stripLabels, type Label } from "./labelledText";

const CORPUS = join(__dirname, "..", "fixtures", "corpus");

function kindOf(file: string): DocumentKind {
  return file.endsWith(".md") ? "markdown" : "plaintext";
}

interface Score {
  readonly truePositives: number;
  readonly falsePositives: string[];
  readonly misses: string[];
  readonly labels: number;
}

function score(file: string): Score {
  const { text, labels } = stripLabels(readFileSync(join(CORPUS, file), "utf8"));
  const found = analyzeDocument(text, kindOf(file)).occurrences;
  const key = (range: { start: number; end: number }): string => `${range.start}:${range.end}`;
  const expected = new Map<string, Label>(labels.map((label) => [key(label), label]));
  const foundKeys = new Set(found.map((occurrence) => key(occurrence.range)));
  const falsePositives = found
    .filter((occurrence) => !expected.has(key(occurrence.range)))
    .map((occurrence) => `${file}:${lineAndColumn(text, occurrence.range.start)} ${JSON.stringify(occurrence.text)}`);
  const misses = labels
    .filter((label) => !foundKeys.has(key(label)))
    .map((label) => `${file}:${lineAndColumn(text, label.start)} ${JSON.stringify(label.text)}`);
  return { truePositives: labels.length - misses.length, falsePositives, misses, labels: labels.length };
}

describe("labelled corpus", () => {
  const files = readdirSync(CORPUS).filter((file) => /\.(md|txt)$/.test(file) && file !== "README.md");
  const scores = files.map(score);
  const labels = scores.reduce((sum, each) => sum + each.labels, 0);
  const truePositives = scores.reduce((sum, each) => sum + each.truePositives, 0);
  const falsePositives = scores.flatMap((each) => each.falsePositives);
  const misses = scores.flatMap((each) => each.misses);
  const precision = truePositives / (truePositives + falsePositives.length);
  const recall = truePositives / labels;

  it("holds at least 300 labelled species mentions, traps included", () => {
    expect(labels).toBeGreaterThanOrEqual(300);
  });

  it("finds species with precision >= 0.98 and recall >= 0.95", () => {
    console.log(
      `corpus: ${files.length} documents, ${labels} labels, ${truePositives} found, ` +
        `${falsePositives.length} false positives, ${misses.length} misses; ` +
        `precision ${precision.toFixed(3)}, recall ${recall.toFixed(3)}`,
    );
    if (falsePositives.length > 0) console.log(`false positives:\n  ${falsePositives.join("\n  ")}`);
    if (misses.length > 0) console.log(`misses:\n  ${misses.join("\n  ")}`);
    // common practice: precision first for prose scanners, recall still high
    expect(precision).toBeGreaterThanOrEqual(0.98);
    expect(recall).toBeGreaterThanOrEqual(0.95);
  });
});
