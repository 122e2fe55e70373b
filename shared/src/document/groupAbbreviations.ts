/**
 * Abbreviations chemists write inside formulas that are not element symbols: organic groups
 * (Ph, Me, Et, tBu, Ac), the hydrogen isotopes D and T, and placeholders for any group (R, Ar,
 * Hal, Nu; X and L are left out, as "CLF3" and "XEF4" are mis-cased formulas far more often). A formula written with them is correct as it stands, even where lonepair cannot
 * read it, so it is never "corrected" into element symbols (CDCl3 is not CdCl3).
 */

/** Written exactly so, case included. */
const ABBREVIATIONS: ReadonlySet<string> = new Set([
  "D",
  "T",
  "R",
  "Ar",
  "Hal",
  "Nu",
  "Me",
  "Et",
  "Pr",
  "iPr",
  "nPr",
  "Bu",
  "nBu",
  "iBu",
  "sBu",
  "tBu",
  "Ph",
  "Bn",
  "Bz",
  "Ac",
  "Cy",
  "Cp",
  "Py",
  "Ts",
  "Tf",
  "Ms",
  "Tol",
  "Mes",
  "Boc",
  "Cbz",
  "Fmoc",
  "Piv",
  "Tr",
  "Vin",
  "All",
  "Np",
]);

/** Segments as written: an optional lower-case prefix (i, n, s, t), a capital, lower-case letters. */
const SEGMENT = /[ints]?[A-Z][a-z]*/g;

/**
 * The first group abbreviation written in `token` ("Ph" in "PhCH3", "D" in "CDCl3"), or
 * undefined. Element symbols that double as abbreviations (Ar, Pr, Ac, Np) count only when the
 * token does not read as a formula anyway, which is when callers ask.
 */
export function groupAbbreviationIn(token: string): string | undefined {
  SEGMENT.lastIndex = 0;
  for (let match = SEGMENT.exec(token); match; match = SEGMENT.exec(token)) {
    const segment = match[0];
    if (ABBREVIATIONS.has(segment)) return segment;
    // "iPr" may sit after an element symbol ending in one of the prefix letters ("SiPr" is rare,
    // but the prefix is optional): try the segment without it too.
    if (segment.length > 1 && segment.charCodeAt(0) >= 0x61 && ABBREVIATIONS.has(segment.slice(1))) return segment.slice(1);
  }
  return undefined;
}
