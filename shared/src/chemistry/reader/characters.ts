/**
 * Character classes the formula scanner needs, by UTF-16 code unit. Plain comparisons instead of
 * regular expressions keep the hot path free of allocation.
 */

/** Value 0-9 of an ASCII digit or a Unicode subscript digit (₀-₉), otherwise -1. */
export function countDigitValue(code: number): number {
  if (code >= 0x30 && code <= 0x39) return code - 0x30;
  if (code >= 0x2080 && code <= 0x2089) return code - 0x2080;
  return -1;
}

/** Value 0-9 of an ASCII digit, otherwise -1. */
export function asciiDigitValue(code: number): number {
  return code >= 0x30 && code <= 0x39 ? code - 0x30 : -1;
}

/** Value 0-9 of a Unicode superscript digit (⁰¹²³⁴-⁹), otherwise -1. */
export function superscriptDigitValue(code: number): number {
  if (code === 0x2070) return 0;
  if (code === 0x00b9) return 1;
  if (code === 0x00b2) return 2;
  if (code === 0x00b3) return 3;
  if (code >= 0x2074 && code <= 0x2079) return code - 0x2070;
  return -1;
}

/** +1 for a plus sign, -1 for a minus sign (ASCII, Unicode minus, superscript forms), otherwise 0. */
export function signValue(code: number): number {
  // "+", superscript plus
  if (code === 0x2b || code === 0x207a) return 1;
  // "-", Unicode minus, superscript minus, en dash (word processors turn "-" into it)
  if (code === 0x2d || code === 0x2212 || code === 0x207b || code === 0x2013) return -1;
  return 0;
}

export function isSuperscriptSign(code: number): boolean {
  return code === 0x207a || code === 0x207b;
}

export function isUpperLetter(code: number): boolean {
  return code >= 0x41 && code <= 0x5a;
}

export function isLowerLetter(code: number): boolean {
  return code >= 0x61 && code <= 0x7a;
}

export function isAsciiLetter(code: number): boolean {
  return isUpperLetter(code) || isLowerLetter(code);
}

/** Whitespace as people type it between words: space, tab, line breaks, no-break and thin spaces. */
export function isSpace(code: number): boolean {
  return (
    code === 0x20 ||
    code === 0x09 ||
    code === 0x0a ||
    code === 0x0d ||
    code === 0x0c ||
    code === 0x0b ||
    code === 0xa0 ||
    code === 0x2009 ||
    code === 0x202f ||
    code === 0x3000
  );
}

/** The dots people put between a salt and its water of crystallisation: · • ∙ ⋅ . * */
export function isHydrateDot(code: number): boolean {
  return code === 0xb7 || code === 0x2022 || code === 0x2219 || code === 0x22c5 || code === 0x2e || code === 0x2a;
}

/** "=" for a double bond; "≡" or "#" for a triple bond (the SMILES spelling); otherwise undefined. */
export function bondMark(code: number): "=" | "≡" | undefined {
  if (code === 0x3d) return "=";
  if (code === 0x2261 || code === 0x23) return "≡";
  return undefined;
}

export function isOpenBracket(code: number): boolean {
  return code === 0x28 || code === 0x5b || code === 0x7b;
}

/** The closing bracket that matches an opening one: ( ) [ ] { }. */
export function closingFor(open: number): number {
  if (open === 0x28) return 0x29;
  if (open === 0x5b) return 0x5d;
  return 0x7d;
}

export function isCloseBracket(code: number): boolean {
  return code === 0x29 || code === 0x5d || code === 0x7d;
}

/**
 * Characters that take no room and mean nothing in a formula: zero-width space, non-joiner and
 * joiner, word joiner, byte-order mark and soft hyphen. Pasted text carries them unseen.
 */
export function isInvisibleFormatting(code: number): boolean {
  return code === 0x200b || code === 0x200c || code === 0x200d || code === 0x2060 || code === 0xfeff || code === 0x00ad;
}

/** No-break spaces (plain, narrow and figure): word processors put them where no break is wanted. */
export function isNoBreakSpace(code: number): boolean {
  return code === 0xa0 || code === 0x202f || code === 0x2007;
}

/** Value 0-9 of an ASCII or a Unicode superscript digit, otherwise -1. */
export function chargeDigitValue(code: number): number {
  const ascii = asciiDigitValue(code);
  return ascii >= 0 ? ascii : superscriptDigitValue(code);
}
