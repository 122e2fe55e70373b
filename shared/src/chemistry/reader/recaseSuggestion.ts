/**
 * Suggests a spelling for a formula with a mis-cased symbol ("Sf4" -> "SF4", "CL" -> "Cl"): the
 * re-casing of its letters with the fewest changed letters that makes every symbol a real element.
 */
import { elementBySymbol } from "../elements";
import { isAsciiLetter } from "./characters";

/** The re-cased `text[start, end)`, or undefined when no re-casing works or nothing would change. */
export function recaseSuggestion(text: string, start: number, end: number): string | undefined {
  let result = "";
  let i = start;
  while (i < end) {
    if (!isAsciiLetter(text.charCodeAt(i))) {
      result += text[i];
      i++;
      continue;
    }
    let runEnd = i;
    while (runEnd < end && isAsciiLetter(text.charCodeAt(runEnd))) runEnd++;
    const recased = recaseLetterRun(text.slice(i, runEnd));
    if (recased === undefined) return undefined;
    result += recased;
    i = runEnd;
  }
  return result === text.slice(start, end) ? undefined : result;
}

/** Re-casings tried at most; each is read (and analysed) before it is offered. */
const MAX_CANDIDATES = 8;
/** Longer runs of letters get only the cheapest split: the number of splits grows too fast. */
const MAX_ENUMERATED_RUN = 12;

/**
 * Every re-casing of `text[start, end)` into real element symbols, cheapest first (fewest letters
 * whose case changes), the first being `recaseSuggestion`'s. "co2" gives Co2 and CO2: which one the
 * writer meant is for the analysis to judge, as only one of them is a species it can shape.
 */
export function recaseCandidates(text: string, start: number, end: number): string[] {
  const best = recaseSuggestion(text, start, end);
  if (best === undefined) return [];
  let partial: { text: string; cost: number }[] = [{ text: "", cost: 0 }];
  let i = start;
  while (i < end) {
    if (!isAsciiLetter(text.charCodeAt(i))) {
      for (const entry of partial) entry.text += text[i];
      i++;
      continue;
    }
    let runEnd = i;
    while (runEnd < end && isAsciiLetter(text.charCodeAt(runEnd))) runEnd++;
    const run = text.slice(i, runEnd);
    const splits = run.length <= MAX_ENUMERATED_RUN ? letterRunSplits(run) : [];
    if (splits.length === 0) return [best];
    const next: { text: string; cost: number }[] = [];
    for (const entry of partial) for (const split of splits) next.push({ text: entry.text + split.text, cost: entry.cost + split.cost });
    next.sort((a, b) => a.cost - b.cost);
    partial = next.slice(0, MAX_CANDIDATES);
    i = runEnd;
  }
  const written = text.slice(start, end);
  const candidates = [best];
  for (const entry of partial) if (entry.text !== written && !candidates.includes(entry.text)) candidates.push(entry.text);
  return candidates;
}

/** Every split of a run of letters into element symbols, with its count of changed letters. */
function letterRunSplits(run: string): { text: string; cost: number }[] {
  const splits: { text: string; cost: number }[] = [];
  const walk = (at: number, text: string, cost: number): void => {
    if (splits.length >= MAX_CANDIDATES * 4) return;
    if (at === run.length) {
      splits.push({ text, cost });
      return;
    }
    for (let size = 1; size <= 2 && at + size <= run.length; size++) {
      const symbol = symbolCase(run.slice(at, at + size));
      if (elementBySymbol(symbol) === undefined) continue;
      walk(at + size, text + symbol, cost + changedLetters(run.slice(at, at + size), symbol));
    }
  };
  walk(0, "", 0);
  return splits.sort((a, b) => a.cost - b.cost);
}

/** Cheapest split of a run of letters into element symbols; cost = letters whose case changes. */
function recaseLetterRun(run: string): string | undefined {
  const length = run.length;
  // best[k]: cheapest cost for the first k letters; choice[k]: symbol length that ends there.
  const best = new Array<number>(length + 1).fill(Infinity);
  const choice = new Array<number>(length + 1).fill(0);
  best[0] = 0;
  for (let k = 0; k < length; k++) {
    if (best[k] === Infinity) continue;
    for (let size = 1; size <= 2 && k + size <= length; size++) {
      const symbol = symbolCase(run.slice(k, k + size));
      if (elementBySymbol(symbol) === undefined) continue;
      const cost = best[k] + changedLetters(run.slice(k, k + size), symbol);
      // ties go to the longer symbol, read left to right like the scanner
      if (cost < best[k + size] || (cost === best[k + size] && size === 2)) {
        best[k + size] = cost;
        choice[k + size] = size;
      }
    }
  }
  if (best[length] === Infinity) return undefined;
  const symbols: string[] = [];
  for (let k = length; k > 0; k -= choice[k]) symbols.push(symbolCase(run.slice(k - choice[k], k)));
  return symbols.reverse().join("");
}

function symbolCase(letters: string): string {
  return letters[0].toUpperCase() + letters.slice(1).toLowerCase();
}

function changedLetters(written: string, symbol: string): number {
  let changes = 0;
  for (let i = 0; i < written.length; i++) if (written[i] !== symbol[i]) changes++;
  return changes;
}
