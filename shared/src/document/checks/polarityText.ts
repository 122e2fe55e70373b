/**
 * Polarity as tables write it: polar/nonpolar/non-polar, yes/no, y/n, true/false, 1/0.
 */

const POLAR = new Set(["polar", "yes", "y", "true", "1", "p", "polar molecule"]);
const NONPOLAR = new Set(["nonpolar", "non-polar", "non polar", "no", "n", "false", "0", "np", "apolar", "not polar"]);

/** True for a cell that says polar, false for nonpolar, undefined for anything else. */
export function parsePolarity(cell: string): boolean | undefined {
  const plain = cell.trim().toLowerCase();
  if (POLAR.has(plain)) return true;
  if (NONPOLAR.has(plain)) return false;
  return undefined;
}

/** How `polar` is written in the vocabulary and letter case of `cell`. */
export function polarityInStyleOf(polar: boolean, cell: string): string {
  const plain = cell.trim().toLowerCase();
  let word: string;
  if (plain === "yes" || plain === "no") word = polar ? "yes" : "no";
  else if (plain === "y" || plain === "n") word = polar ? "y" : "n";
  else if (plain === "true" || plain === "false") word = polar ? "true" : "false";
  else if (plain === "1" || plain === "0") word = polar ? "1" : "0";
  else word = polar ? "polar" : plain.includes("-") ? "non-polar" : "nonpolar";
  const letters = cell.replace(/[^A-Za-z]/g, "");
  if (letters.length > 1 && letters === letters.toUpperCase()) return word.toUpperCase();
  if (/^[A-Z]/.test(cell.trim())) return word.charAt(0).toUpperCase() + word.slice(1);
  return word;
}
