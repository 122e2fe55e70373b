/**
 * Which prose words may start or be a species name. The reader decides whether a candidate really
 * is a name; these rules only keep it from being asked about every word of a document.
 */

/** Everyday names the reader may know, which do not follow the "-ide/-ate" pattern. */
const TRIVIAL_NAMES = new Set([
  "ammonia", "water", "methane", "ethane", "ethene", "ethylene", "ethyne", "acetylene", "ozone",
  "phosphine", "arsine", "stibine", "silane", "germane", "hydrazine", "borane", "diborane", "benzene",
  "formaldehyde", "methanol", "ethanol", "propane", "butane", "ammonium", "hydronium", "oxonium",
  "phosgene", "hydroxide",
]);

/** A lower-cased word that could be the last word of a species name. */
export function mayEndName(word: string): boolean {
  return word.length >= 5 && /(?:ide|ite|ate|ium)$/.test(word);
}

/** A lower-cased word that could be a one-word species name on its own. */
export function mayBeOneWordName(word: string): boolean {
  // "-ide" alone is too often a class ("a fluoride", "the oxide layer"); ions ending "-ate" or
  // "-ium" name one species.
  return TRIVIAL_NAMES.has(word) || (word.length >= 7 && /(?:ate|ite|ium)$/.test(word));
}
