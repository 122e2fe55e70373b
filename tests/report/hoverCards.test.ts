/**
 * The hover card memo never changes a card: memo on and memo off agree on random species in a
 * random order and in every format; it keeps within its budget, and a card is never reused for
 * another analysis of the same text.
 */
import { describe, expect, it } from "vitest";
import {
  analyzeSpecies,
  createHoverCardMemo,
  resultMarkdown,
  type AnalysisResult,
  type HoverMarkdownOptions,
} from "../../shared/src/index";
// @ts-expect-error: the benchmark's generator is plain JavaScript without type declarations.
import { generateSpecies } from "../bench/speciesGenerator.mjs";
import { seededRandom } from "../support/seededRandom";

// common practice: refusals (carbon with five bonds, nitrogen with five) and salts and hydrates,
// whose cards list their parts, beside the generator's molecules and ions
const REFUSED_AND_COMPOSITE = ["CH5", "NF5", "NaCl", "K2SO4", "CuSO4·5H2O", "NH4NO3", "Qq2", "C2H7"];
const SPECIES: string[] = [...generateSpecies(600), ...REFUSED_AND_COMPOSITE.flatMap((text) => Array<string>(6).fill(text))];

const OPTION_SETS: HoverMarkdownOptions[] = [
  { angleDecimals: 1 },
  { angleDecimals: 0, format: "markdown" },
  { angleDecimals: 2, format: "plaintext" },
  { angleDecimals: 1, maxCentreGroups: 2 },
];

function sample(count: number, seed: number): string[] {
  const random = seededRandom(seed);
  return Array.from({ length: count }, () => SPECIES[Math.floor(random() * SPECIES.length)]);
}

describe("hover card memo", () => {
  it("has species enough to mean something, analysed and refused", () => {
    expect(SPECIES.length).toBeGreaterThan(300);
    const results = SPECIES.map((text) => analyzeSpecies(text));
    expect(results.filter((result) => result.ok).length).toBeGreaterThan(100);
    expect(results.filter((result) => !result.ok && !result.parts).length).toBeGreaterThan(10);
    expect(results.filter((result) => !result.ok && result.parts).length).toBeGreaterThan(10);
  });

  it.each([1, 2])("memo on and off write the same cards for 400 random hovers (seed %i)", (seed) => {
    const memo = createHoverCardMemo();
    const random = seededRandom(seed + 100);
    for (const text of sample(400, seed)) {
      const result = analyzeSpecies(text);
      const options = OPTION_SETS[Math.floor(random() * OPTION_SETS.length)];
      const alsoAProblem = random() < 0.5;
      const plain = resultMarkdown(text, result, options, { alsoAProblem });
      expect(memo.card(text, result, options, { alsoAProblem }), text).toBe(plain);
      expect(memo.known(text, result, options, { alsoAProblem }), text).toBe(plain);
    }
  });

  it("tells the formats and decimals apart", () => {
    const memo = createHoverCardMemo();
    const result = analyzeSpecies("SF4");
    for (const options of OPTION_SETS) memo.card("SF4", result, options);
    for (const options of OPTION_SETS) expect(memo.known("SF4", result, options)).toBe(resultMarkdown("SF4", result, options));
    // common practice: plain text has no image, markdown carries the sketch
    expect(memo.known("SF4", result, { angleDecimals: 2, format: "plaintext" })).not.toContain("data:image/svg+xml");
    expect(memo.known("SF4", result, { angleDecimals: 1 })).toContain("data:image/svg+xml");
  });

  it("tells a refusal that is also reported from one that is not", () => {
    const memo = createHoverCardMemo();
    // common practice: carbon makes at most four bonds, so CH5 is refused
    const result = analyzeSpecies("CH5");
    expect(result.ok).toBe(false);
    const reported = memo.card("CH5", result, { angleDecimals: 1 }, { alsoAProblem: true });
    const unreported = memo.card("CH5", result, { angleDecimals: 1 }, { alsoAProblem: false });
    expect(reported).toContain("the reason is the problem reported on this text");
    expect(unreported).not.toBe(reported);
  });

  it("never serves a card written for another analysis of the same text", () => {
    const memo = createHoverCardMemo();
    const options = { angleDecimals: 1 };
    const water = analyzeSpecies("H2O");
    memo.card("X", water, options);
    const ammonia: AnalysisResult = analyzeSpecies("NH3");
    expect(memo.known("X", ammonia, options)).toBeUndefined();
    expect(memo.card("X", ammonia, options)).toBe(resultMarkdown("X", ammonia, options));
  });

  it("keeps a card written elsewhere", () => {
    const memo = createHoverCardMemo();
    const result = analyzeSpecies("BF3");
    memo.remember("BF3", result, { angleDecimals: 1 }, "a card from the worker");
    expect(memo.card("BF3", result, { angleDecimals: 1 })).toBe("a card from the worker");
  });

  it("holds no more card text than its budget", () => {
    const budget = 60_000;
    const memo = createHoverCardMemo(budget);
    const texts = [...new Set(sample(300, 9))];
    const results = texts.map((text) => analyzeSpecies(text));
    texts.forEach((text, index) => memo.card(text, results[index], { angleDecimals: 1 }));
    const kept = texts
      .map((text, index) => memo.known(text, results[index], { angleDecimals: 1 }))
      .filter((card): card is string => card !== undefined);
    const keptCharacters = kept.reduce((sum, card) => sum + card.length, 0);
    // One card past each generation's half of the budget may be kept before it turns over.
    const largest = Math.max(...kept.map((card) => card.length));
    expect(keptCharacters).toBeLessThanOrEqual(budget + 2 * largest);
    expect(kept.length).toBeGreaterThan(0);
    // The newest card is kept.
    expect(memo.known(texts.at(-1)!, results.at(-1)!, { angleDecimals: 1 })).toBeDefined();
  });
});
