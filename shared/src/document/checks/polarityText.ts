/**
 * Polarity as tables write it: polar/nonpolar/non-polar, yes/no, y/n, true/false, 1/0, and in
 * German, French and Spanish tables polar/unpolar, ja/nein, polaire/apolaire, polar/apolar.
 * Anything else is no verdict, and is left unchecked.
 */
import type { TableLanguage } from "../types";

/** Pairs of words for polar and nonpolar, each written back as its own pair. */
const PAIRS: readonly (readonly [polar: string, nonpolar: string])[] = [
  ["yes", "no"],
  ["y", "n"],
  ["true", "false"],
  ["1", "0"],
  ["ja", "nein"],
  ["oui", "non"],
];

const POLAR = new Set(["polar", "yes", "y", "true", "1", "p", "polar molecule", "ja", "polaire"]);
const NONPOLAR = new Set([
  "nonpolar",
  "non-polar",
  "non polar",
  "no",
  "n",
  "false",
  "0",
  "np",
  "apolar",
  "not polar",
  "unpolar",
  "nein",
  "apolaire",
  "non polaire",
  "non-polaire",
  "no polar",
]);

// A verdict word in a column whose header is in another language: yes and no of that language.
const LANGUAGE_ONLY: Readonly<Record<string, TableLanguage>> = { ja: "de", nein: "de", oui: "fr", non: "fr" };

/** True for a cell that says polar, false for nonpolar, undefined for anything else. */
export function parsePolarity(cell: string, language?: TableLanguage): boolean | undefined {
  const plain = cell.trim().toLowerCase();
  const only = LANGUAGE_ONLY[plain];
  if (only && language !== only) return undefined;
  if (POLAR.has(plain)) return true;
  if (NONPOLAR.has(plain)) return false;
  return undefined;
}

/** The words for polar and nonpolar in a column of each language. */
const IN_LANGUAGE: Readonly<Record<TableLanguage, readonly [string, string]>> = {
  de: ["polar", "unpolar"],
  fr: ["polaire", "apolaire"],
  es: ["polar", "apolar"],
};

/** How `polar` is written in the vocabulary, language and letter case of `cell`. */
export function polarityInStyleOf(polar: boolean, cell: string, language?: TableLanguage): string {
  const plain = cell.trim().toLowerCase();
  const pair = PAIRS.find((each) => each.includes(plain));
  let word: string;
  if (pair) word = polar ? pair[0] : pair[1];
  else if (plain === "unpolar") word = polar ? "polar" : "unpolar";
  else if (plain === "polaire" || plain === "apolaire" || plain === "non polaire") word = polar ? "polaire" : "apolaire";
  else if (language) word = IN_LANGUAGE[language][polar ? 0 : 1];
  else word = polar ? "polar" : plain.includes("-") ? "non-polar" : "nonpolar";
  const letters = cell.replace(/[^A-Za-z]/g, "");
  if (letters.length > 1 && letters === letters.toUpperCase()) return word.toUpperCase();
  if (/^[A-Z]/.test(cell.trim())) return word.charAt(0).toUpperCase() + word.slice(1);
  return word;
}
