/**
 * Spelling suggestions for words that are not names: the closest listed name within two edits
 * ("amonia" -> "ammonia"), else a word-by-word repair that reads as a name
 * ("sulfer tetrafluoride" -> "sulfur tetrafluoride").
 */
import { ELEMENTS } from "../../elements";
import { ANION_ROOTS } from "./anionRoots";
import { editDistanceWithin } from "./editDistance";
import { GREEK_PREFIXES, joinPrefix } from "./greekPrefixes";
import { listedNames, matchName } from "./nameLookup";

const MAX_EDITS = 2;

let vocabulary: ReadonlySet<string> | undefined;

function nameWords(): ReadonlySet<string> {
  if (vocabulary !== undefined) return vocabulary;
  const words = new Set<string>();
  for (const name of listedNames()) for (const word of name.split(" ")) words.add(word);
  const stems = [...ELEMENTS.map((element) => element.name), ...ANION_ROOTS.map((entry) => entry.root)];
  for (const stem of stems) {
    words.add(stem);
    for (const prefix of GREEK_PREFIXES) words.add(joinPrefix(prefix, stem));
  }
  vocabulary = words;
  return words;
}

/** A known name close to `name` (already normalised), or undefined. */
export function suggestName(name: string): string | undefined {
  // one edit in a very short word is already a different word
  const wholeLimit = name.length < 5 ? 1 : MAX_EDITS;
  let best: string | undefined;
  let bestDistance = wholeLimit + 1;
  for (const candidate of listedNames()) {
    const distance = editDistanceWithin(name, candidate, bestDistance - 1);
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  if (best !== undefined) return best;
  return repairWordByWord(name);
}

function repairWordByWord(name: string): string | undefined {
  const words = name.split(" ");
  if (words.length < 2 || words.length > 4) return undefined;
  const known = nameWords();
  let budget = MAX_EDITS;
  const repaired: string[] = [];
  for (const word of words) {
    if (known.has(word)) {
      repaired.push(word);
      continue;
    }
    let best: string | undefined;
    let bestDistance = budget + 1;
    for (const candidate of known) {
      const distance = editDistanceWithin(word, candidate, bestDistance - 1);
      if (distance < bestDistance) {
        best = candidate;
        bestDistance = distance;
      }
    }
    if (best === undefined) return undefined;
    budget -= bestDistance;
    repaired.push(best);
  }
  const match = matchName(repaired.join(" "));
  return match === undefined ? undefined : match.name;
}
