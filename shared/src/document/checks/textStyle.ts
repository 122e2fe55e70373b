/**
 * Writing a computed word the way the table already writes its words: lower case, UPPER CASE,
 * Title Case or Sentence case, with spaces or hyphens between words.
 */

export type LetterCase = "lower" | "upper" | "title" | "sentence";

/** The letter case a cell is written in. */
export function letterCaseOf(text: string): LetterCase {
  const letters = text.replace(/[^A-Za-z]/g, "");
  if (letters === letters.toLowerCase()) return "lower";
  if (letters.length > 1 && letters === letters.toUpperCase()) return "upper";
  const words = text.split(/[\s-]+/).filter((word) => /[A-Za-z]/.test(word));
  if (words.length > 1 && words.every((word) => /^[A-Z]/.test(word))) return "title";
  return "sentence";
}

/**
 * `words` (a computed value such as "trigonal pyramidal" or "T-shaped") in the style of `cell`.
 * A one-letter word that names a shape ("T", in "T-shaped", "T-förmig" or "en T") keeps its capital.
 */
export function inStyleOf(words: string, cell: string): string {
  const hyphenated = /[A-Za-z]-[A-Za-z]/.test(cell) && !/\s/.test(cell.trim());
  const joined = hyphenated ? words.replace(/ /g, "-") : words;
  switch (letterCaseOf(cell)) {
    case "upper":
      return joined.toUpperCase();
    case "title":
      return joined.replace(/(^|[\s-])([a-z])/g, (_, gap: string, letter: string) => gap + letter.toUpperCase());
    case "sentence":
      return joined.charAt(0).toUpperCase() + joined.slice(1);
    default:
      return joined.toLowerCase().replace(/(^|[\s-])t(?=$|[\s-])/, (_, gap: string) => `${gap}T`);
  }
}
