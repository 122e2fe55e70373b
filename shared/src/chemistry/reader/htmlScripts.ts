/**
 * HTML sub- and superscripts as web pages and converted course notes write formulas:
 * `CO<sub>2</sub>`, `Al<sub>2</sub>(CO<sub>3</sub>)<sub>3</sub>`, `SO<sub>4</sub><sup>2−</sup>`.
 * They become the Unicode subscript and superscript characters the formula reader already knows.
 */

const SUBSCRIPT_DIGITS = "₀₁₂₃₄₅₆₇₈₉";
const SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

/** The longest tag content looked at: a count or a charge is a few characters. */
const MAX_CONTENT = 6;

/** True when `text` holds an opening `<sub>` or `<sup>` tag. */
export function hasHtmlScript(text: string): boolean {
  return text.includes("<sub>") || text.includes("<sup>");
}

/**
 * Where the tag pair opened at `open` ends (just past `</sub>` or `</sup>`), or -1 when there is
 * no such pair there or it holds anything but a count (sub) or a charge (sup).
 */
export function htmlScriptEnd(text: string, open: number, limit: number = text.length): number {
  if (text.charCodeAt(open) !== 0x3c || text.charCodeAt(open + 1) !== 0x73 || text.charCodeAt(open + 2) !== 0x75) return -1;
  const kind = text.slice(open, open + 5);
  if (kind !== "<sub>" && kind !== "<sup>") return -1;
  const contentStart = open + 5;
  const close = text.indexOf(kind === "<sub>" ? "</sub>" : "</sup>", contentStart);
  if (close < 0 || close - contentStart > MAX_CONTENT || close + 6 > limit || close === contentStart) return -1;
  for (let index = contentStart; index < close; index++) {
    const code = text.charCodeAt(index);
    const digit = code >= 0x30 && code <= 0x39;
    if (!(digit || (kind === "<sup>" && isChargeSign(code)))) return -1;
  }
  return close + 6;
}

function isChargeSign(code: number): boolean {
  return code === 0x2b || code === 0x2d || code === 0x2212 || code === 0x2013;
}

/**
 * `text` with every tag pair replaced by Unicode sub- or superscripts, or undefined when a tag
 * does not hold a count or a charge (then the text is not a formula written in HTML).
 */
export function withUnicodeScripts(text: string): string | undefined {
  let result = "";
  let copied = 0;
  let open = text.indexOf("<su");
  while (open >= 0) {
    const tagEnd = htmlScriptEnd(text, open);
    if (tagEnd < 0) return undefined;
    result += text.slice(copied, open);
    const superscript = text.charCodeAt(open + 3) === 0x70;
    for (let index = open + 5; index < tagEnd - 6; index++) {
      const code = text.charCodeAt(index);
      if (code >= 0x30 && code <= 0x39) result += (superscript ? SUPERSCRIPT_DIGITS : SUBSCRIPT_DIGITS)[code - 0x30];
      else result += code === 0x2b ? "⁺" : "⁻";
    }
    copied = tagEnd;
    open = text.indexOf("<su", tagEnd);
  }
  return result + text.slice(copied);
}
