import { describe, expect, it } from "vitest";
import { analyzeSpecies } from "../../shared/src/index";
import type { AnalysisResult } from "../../shared/src/index";
import { ANALYSIS_REFUSALS, READING_REFUSALS, type RefusalCase } from "./data/errors";

/** Titles stay short even for the very long input. */
function shortInput(input: string): string {
  return input.length > 30 ? `${input.slice(0, 12)}... (${input.length} characters)` : JSON.stringify(input);
}

function describeResult(result: AnalysisResult): string {
  if (result.ok) {
    const centres = result.value.centres.map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry}`).join(", ");
    return `ok with centres [${centres}]`;
  }
  return `${result.problem.code}: ${result.problem.message}`;
}

function expectRefusal(row: RefusalCase): Extract<AnalysisResult, { ok: false }> {
  let result: AnalysisResult | undefined;
  // common practice (house rule): bad input never throws
  expect(
    () => {
      result = analyzeSpecies(row.input);
    },
    `${shortInput(row.input)} threw`,
  ).not.toThrow();
  const got = result as AnalysisResult;
  expect(got.ok, `${shortInput(row.input)} (${row.why}) should be refused; got ${describeResult(got)}`).toBe(false);
  const refused = got as Extract<AnalysisResult, { ok: false }>;
  expect(refused.problem.code, `${shortInput(row.input)} (${row.why}): ${describeResult(got)}`).toBe(row.code);
  expect(refused).not.toHaveProperty("value");

  const message = refused.problem.message;
  expect(message.trim().length, "message should not be empty").toBeGreaterThan(0);
  // plain text for people: no stack trace, no leaked object or undefined
  expect(message).not.toMatch(/undefined|\[object |\bat .+:\d+:\d+|Error:/);
  if (row.mentions) expect(message, `message should name ${row.mentions}`).toContain(row.mentions);
  if (row.suggestion) expect(refused.problem.suggestion).toBe(row.suggestion);
  if (row.marks) {
    // common practice: a diagnostic points at the culprit, not at the whole input
    const range = refused.problem.range;
    expect(range, `${shortInput(row.input)}: the problem should carry a range`).toBeDefined();
    expect(row.input.slice(range!.start, range!.end)).toBe(row.marks);
  }
  return refused;
}

describe("analysis refusals", () => {
  it.each(ANALYSIS_REFUSALS)("$input: $code ($why)", (row) => {
    const refused = expectRefusal(row);
    // the species was read, so the reading is there for the message; only the shape is withheld
    expect(refused.reading, `${row.input}: the reading should be kept`).toBeDefined();
  });
});

describe("reading refusals", () => {
  it.each(READING_REFUSALS.map((row) => ({ ...row, title: shortInput(row.input) })))("$title: $code ($why)", (row) => {
    const refused = expectRefusal(row);
    expect(refused.reading, `${row.title}: nothing was read`).toBeUndefined();
  });
});
