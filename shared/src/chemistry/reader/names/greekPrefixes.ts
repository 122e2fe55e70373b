/** Greek multiplying prefixes of binary covalent names, 1-10. */
export const GREEK_PREFIXES: readonly string[] = ["mono", "di", "tri", "tetra", "penta", "hexa", "hepta", "octa", "nona", "deca"];

/** The prefix for a count 1-10, or undefined. */
export function prefixFor(count: number): string | undefined {
  return GREEK_PREFIXES[count - 1];
}

/**
 * Every way to read `word` as prefix + rest, including the elided forms where a final "a" or "o"
 * is dropped before a vowel ("monoxide", "tetroxide", "pentoxide"). The unprefixed reading comes first.
 */
export function prefixReadings(word: string): { count: number; rest: string; prefixed: boolean }[] {
  const readings = [{ count: 1, rest: word, prefixed: false }];
  GREEK_PREFIXES.forEach((prefix, index) => {
    if (word.startsWith(prefix) && word.length > prefix.length) {
      readings.push({ count: index + 1, rest: word.slice(prefix.length), prefixed: true });
    }
    const stem = prefix.slice(0, -1);
    const last = prefix[prefix.length - 1];
    if ((last === "a" || last === "o") && word.startsWith(stem) && isVowel(word[stem.length])) {
      readings.push({ count: index + 1, rest: word.slice(stem.length), prefixed: true });
    }
  });
  return readings;
}

function isVowel(letter: string | undefined): boolean {
  return letter === "a" || letter === "e" || letter === "i" || letter === "o" || letter === "u";
}

/** Prefix + root with the elision chemists write: "mon" + "oxide" -> "monoxide". */
export function joinPrefix(prefix: string, root: string): string {
  const last = prefix[prefix.length - 1];
  if ((last === "a" || last === "o") && root.startsWith("o")) return prefix.slice(0, -1) + root;
  return prefix + root;
}
