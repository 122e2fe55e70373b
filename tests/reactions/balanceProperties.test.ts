/**
 * The balancer on random equations: species from the core's own vocabulary, broken into their
 * elements (with electrons for ions) and scaled by a random factor, are found balanced;
 * scrambling one coefficient is found unbalanced, and the fix restores the smallest ratio. The
 * element counts of the organic species are cross-checked with RDKit first.
 */
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeDocument, balanceText, checkDocument, knownSpeciesNames, readSpecies, type SpeciesReading } from "../../shared/src/index";
import { loadRdkit, rdkitAtoms, rdkitComposition } from "../multicentre/rdkitReference";

/** Species of the vocabulary, written as the reader writes their formula, without hydrates. */
const POOL: readonly SpeciesReading[] = (() => {
  const seen = new Set<string>();
  const pool: SpeciesReading[] = [];
  for (const name of knownSpeciesNames()) {
    const named = readSpecies(name);
    if (!named.ok || named.value.parts || named.value.composition.length === 0) continue;
    const formula = named.value.formula;
    const again = readSpecies(formula);
    if (seen.has(formula) || !again.ok || again.value.charge !== named.value.charge) continue;
    seen.add(formula);
    pool.push({ ...named.value, formula });
  }
  return pool;
})();

function countsOf(reading: SpeciesReading): Map<string, number> {
  const counts = new Map<string, number>();
  for (const part of reading.composition) counts.set(part.symbol, (counts.get(part.symbol) ?? 0) + part.count);
  return counts;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** "k X -> k·a H + k·b O" (with k·q electrons for an ion), and the smallest coefficients of it. */
function decomposition(reading: SpeciesReading, k: number): { terms: [number, string][]; arrowAt: number; smallest: number[] } {
  const counts = [...countsOf(reading)];
  const left: [number, string][] = [[1, reading.formula]];
  const right: [number, string][] = counts.map(([symbol, count]) => [count, symbol]);
  // common practice: an ion's charge is made up by electrons, on the side that needs them
  if (reading.charge > 0) left.push([reading.charge, "e-"]);
  if (reading.charge < 0) right.push([-reading.charge, "e-"]);
  const base = [...left, ...right].map(([count]) => count);
  const divisor = base.reduce((acc, value) => gcd(acc, value), 0);
  const smallest = base.map((value) => value / divisor);
  const terms = [...left, ...right].map(([count, text]): [number, string] => [count * k, text]);
  return { terms, arrowAt: left.length, smallest };
}

function written(terms: readonly [number, string][], arrowAt: number): string {
  const side = (list: readonly [number, string][]): string =>
    list.map(([count, text]) => (count === 1 ? text : `${count} ${text}`)).join(" + ");
  return `${side(terms.slice(0, arrowAt))} -> ${side(terms.slice(arrowAt))}`;
}

describe("the species used", () => {
  beforeAll(async () => {
    await loadRdkit();
  }, 60_000);

  it("are many", () => {
    expect(POOL.length).toBeGreaterThan(100);
  });

  it("organic ones have RDKit's element counts", () => {
    const organic = POOL.filter((reading) => reading.smiles !== undefined);
    expect(organic.length).toBeGreaterThan(10);
    for (const reading of organic) {
      // source: RDKit (WebAssembly build): the molecular formula of the stored SMILES
      const reference = rdkitComposition(rdkitAtoms(reading.smiles!));
      expect(Object.fromEntries(countsOf(reading)), `element counts of ${reading.formula}`).toEqual(Object.fromEntries(reference));
    }
  });
});

describe("random balanced equations", () => {
  const equation = fc.record({ index: fc.nat({ max: POOL.length - 1 }), k: fc.integer({ min: 1, max: 7 }) });

  it("are found balanced, with the smallest ratio as the answer", () => {
    fc.assert(
      fc.property(equation, ({ index, k }) => {
        const { terms, arrowAt, smallest } = decomposition(POOL[index], k);
        const answer = balanceText(written(terms, arrowAt));
        expect(answer.ok && answer.wasBalanced, written(terms, arrowAt)).toBe(true);
        expect(answer.ok ? answer.coefficients : []).toEqual(smallest);
        // common practice: a balanced equation has no finding
        const codes = checkDocument(analyzeDocument(`\\ce{${written(terms, arrowAt)}}`, "markdown")).map((finding) => finding.code);
        expect(codes.filter((code) => code.startsWith("equation-"))).toEqual([]);
      }),
      { numRuns: 300, seed: 14 },
    );
  });

  it("with one coefficient scrambled are found unbalanced, and the fix restores the smallest ratio", () => {
    const scrambled = fc.record({
      index: fc.nat({ max: POOL.length - 1 }),
      k: fc.integer({ min: 1, max: 7 }),
      which: fc.nat(),
      by: fc.integer({ min: 1, max: 9 }),
    });
    fc.assert(
      fc.property(scrambled, ({ index, k, which, by }) => {
        const { terms, arrowAt, smallest } = decomposition(POOL[index], k);
        const position = which % terms.length;
        const changed = terms.map(([count, text], at): [number, string] => [at === position ? count + by : count, text]);
        const text = `Run 40 note: \\ce{${written(changed, arrowAt)}} (Bay C).`;
        const findings = checkDocument(analyzeDocument(text, "markdown")).filter((finding) => finding.code.startsWith("equation-"));
        expect(findings.map((finding) => finding.code)).toEqual(["equation-unbalanced"]);
        const fix = findings[0].fix!;
        const fixed = text.slice(0, fix.range.start) + fix.newText + text.slice(fix.range.end);
        const expected = `Run 40 note: \\ce{${written(
          terms.map(([, name], at): [number, string] => [smallest[at], name]),
          arrowAt,
        )}} (Bay C).`;
        expect(fixed).toBe(expected);
        expect(checkDocument(analyzeDocument(fixed, "markdown")).filter((finding) => finding.code.startsWith("equation-"))).toEqual([]);
      }),
      { numRuns: 300, seed: 41 },
    );
  });
});
