/**
 * Memos and reused scratch state must never change an answer: every species analysed through
 * the memoised path equals a fresh analysis, whatever was analysed before it, and a Lewis search
 * with scratch arrays of its own gives the same structure as the process's shared search.
 */
import { describe, expect, it } from "vitest";
import { analyzeReading, analyzeSpecies, readSpecies, toAnalysisJson } from "../../shared/src/index";
import { chooseLewisStructure, createLewisSearch } from "../../shared/src/chemistry/lewis/chooseLewisStructure";
// @ts-expect-error: the benchmark's generator is plain JavaScript without type declarations.
import { generateSpecies } from "../bench/speciesGenerator.mjs";
import { seededRandom } from "../support/seededRandom";

const SPECIES: string[] = generateSpecies(3_000);

function shuffled<T>(items: readonly T[], seed: number): T[] {
  const random = seededRandom(seed);
  const copy = [...items];
  for (let index = copy.length - 1; index > 0; index--) {
    const other = Math.floor(random() * (index + 1));
    [copy[index], copy[other]] = [copy[other], copy[index]];
  }
  return copy;
}

function fresh(text: string): string {
  const read = readSpecies(text);
  return JSON.stringify(toAnalysisJson(text, read.ok ? analyzeReading(read.value) : { ok: false, problem: read.problem }));
}

describe("memoised and fresh analyses", () => {
  it("generates enough species to mean something", () => {
    expect(SPECIES.length).toBeGreaterThan(1_000);
  });

  it.each([1, 2, 3])("agree on 400 random species, analysed in a random order (seed %i)", (seed) => {
    const sample = shuffled(SPECIES, seed).slice(0, 400);
    for (const text of sample) {
      const first = JSON.stringify(toAnalysisJson(text, analyzeSpecies(text)));
      const again = JSON.stringify(toAnalysisJson(text, analyzeSpecies(text)));
      expect(again, text).toBe(first);
      expect(fresh(text), text).toBe(first);
    }
  });

  it("a search with its own scratch state agrees with the shared one on every skeleton shape", () => {
    const own = createLewisSearch();
    for (const text of shuffled(SPECIES, 7).slice(0, 300)) {
      const read = readSpecies(text);
      if (!read.ok) continue;
      // The star skeleton: the first element written is the centre, every other atom bonded to it.
      const symbols = read.value.composition.flatMap((part) => Array.from({ length: part.count }, () => part.symbol));
      const skeleton = { symbols, bonds: symbols.slice(1).map((_, index): [number, number] => [0, index + 1]) };
      expect(own.choose(skeleton, read.value.charge), text).toEqual(chooseLewisStructure(skeleton, read.value.charge));
    }
  });
});
