/**
 * Sub- and superscripts written in markup rather than as characters, the way exported and pasted
 * text carries formulas:
 *
 * - HTML: `CO<sub>2</sub>`, `SO<sub>4</sub><sup>2&minus;</sup>` (character references allowed);
 * - wiki templates: `H{{sub|2}}O`, `SO{{sub|4}}{{sup|2−}}`;
 * - AsciiDoc: `H~2~O`, `SO~4~^2-^`, `^13^CO~2~`;
 * - reStructuredText roles: `H\ :sub:`2`\ O`, `NH\ :sub:`4`\ :sup:`+``;
 * - LaTeX text mode: `H\textsubscript{2}O`, `SO\textsubscript{4}\textsuperscript{2--}`;
 * - LaTeX math around the script only: `SO$_2$`, `H$_{2}$O`, `Ca$^{2+}$` (a count and a charge in
 *   one span, `SO$_4^{2-}$`, is not one script and is left unread).
 *
 * Each becomes the Unicode subscript or superscript characters the formula reader already knows.
 * A subscript holds a count; a superscript holds a charge ("2-", "+") or, right before an element
 * symbol, a mass number ("<sup>13</sup>C").
 */

const SUBSCRIPT_DIGITS = "₀₁₂₃₄₅₆₇₈₉";
const SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

/** The longest raw content looked at: a count or a charge is a few characters, a reference a few more. */
const MAX_RAW_CONTENT = 24;
/** The longest content once character references are decoded: "12", "2-", "3+". */
const MAX_CONTENT = 4;

/** One sub- or superscript written in markup. */
export interface ScriptMarkup {
  /** Just past the markup (past a trailing reStructuredText escaped space too). */
  readonly end: number;
  readonly superscript: boolean;
  /** The content with character references decoded: digits and the signs "+" and "-". */
  readonly content: string;
}

/** True when `text` may hold script markup (a cheap test before `withUnicodeScripts`). */
export function hasScriptMarkup(text: string): boolean {
  return (
    text.includes("<sub>") ||
    text.includes("<sup>") ||
    text.includes("{{su") ||
    text.includes(":sub:`") ||
    text.includes(":sup:`") ||
    text.includes("\\textsu") ||
    text.includes("$_") ||
    text.includes("$^") ||
    /~[0-9]{1,3}~|\^[0-9+\-\u2212\u2013]{1,4}\^/.test(text)
  );
}

/**
 * The script markup that opens at `at` and closes before `limit`, or undefined when there is none
 * or it holds anything but a count (subscript) or a charge or mass number (superscript).
 */
export function scriptMarkupAt(text: string, at: number, limit: number = text.length): ScriptMarkup | undefined {
  const code = text.charCodeAt(at);
  if (code === 0x3c) return tagged(text, at, limit);
  if (code === 0x7b) return templated(text, at, limit);
  if (code === 0x7e || code === 0x5e) return delimited(text, at, limit);
  if (code === 0x5c || code === 0x3a) return role(text, at, limit);
  if (code === 0x24) return mathScript(text, at, limit);
  return undefined;
}

/** `$_2$`, `$_{2}$`, `$^{2-}$`, `$^+$`: math mode for the script alone. */
function mathScript(text: string, at: number, limit: number): ScriptMarkup | undefined {
  const script = /^\$([_^])(?:\{([^{}$\n]{1,24})\}|([0-9]|[+-]))\$/.exec(text.slice(at, at + 30));
  if (!script || at + script[0].length > limit) return undefined;
  return scriptOf(script[2] ?? script[3], script[1] === "^", at + script[0].length);
}

/** `<sub>2</sub>`, `<sup>2&minus;</sup>`. */
function tagged(text: string, at: number, limit: number): ScriptMarkup | undefined {
  const kind = text.slice(at, at + 5);
  if (kind !== "<sub>" && kind !== "<sup>") return undefined;
  const superscript = kind === "<sup>";
  const contentStart = at + 5;
  const close = closingWithin(text, superscript ? "</sup>" : "</sub>", contentStart);
  if (close < 0 || close - contentStart > MAX_RAW_CONTENT || close + 6 > limit) return undefined;
  return scriptOf(text.slice(contentStart, close), superscript, close + 6);
}

/** `{{sub|2}}`, `{{sup|2−}}`. */
function templated(text: string, at: number, limit: number): ScriptMarkup | undefined {
  const kind = text.slice(at, at + 6);
  if (kind !== "{{sub|" && kind !== "{{sup|") return undefined;
  const contentStart = at + 6;
  const close = closingWithin(text, "}}", contentStart);
  if (close < 0 || close - contentStart > MAX_RAW_CONTENT || close + 2 > limit) return undefined;
  return scriptOf(text.slice(contentStart, close), kind === "{{sup|", close + 2);
}

/** AsciiDoc `~2~` and `^2-^`: the same mark on both sides, with no space inside. */
function delimited(text: string, at: number, limit: number): ScriptMarkup | undefined {
  const mark = text[at];
  let close = at + 1;
  while (close < limit && close - at <= MAX_CONTENT + 1 && text[close] !== mark && !/\s/.test(text[close])) close++;
  if (close >= limit || text[close] !== mark) return undefined;
  return scriptOf(text.slice(at + 1, close), mark === "^", close + 1);
}

/** LaTeX `\textsubscript{2}` and `\textsuperscript{2-}`; "--" is how LaTeX text types a dash. */
function textCommand(text: string, at: number, limit: number): ScriptMarkup | undefined {
  const command = /^\\text(sub|super)script\{/.exec(text.slice(at, at + 18));
  if (!command) return undefined;
  const contentStart = at + command[0].length;
  const close = closingWithin(text, "}", contentStart);
  if (close < 0 || close - contentStart > MAX_RAW_CONTENT || close + 1 > limit) return undefined;
  return scriptOf(text.slice(contentStart, close).replace(/--/g, "-"), command[1] === "super", close + 1);
}

/** reStructuredText `\ :sub:`2`\ ` (the escaped spaces glue the role to the letters around it). */
function role(text: string, at: number, limit: number): ScriptMarkup | undefined {
  if (text.startsWith("\\text", at)) return textCommand(text, at, limit);
  let open = at;
  if (text.charCodeAt(open) === 0x5c) {
    if (text.charCodeAt(open + 1) !== 0x20) return undefined;
    open += 2;
  }
  const kind = text.slice(open, open + 6);
  if (kind !== ":sub:`" && kind !== ":sup:`") return undefined;
  const contentStart = open + 6;
  const close = closingWithin(text, "`", contentStart);
  if (close < 0 || close - contentStart > MAX_RAW_CONTENT || close + 1 > limit) return undefined;
  let end = close + 1;
  if (text.charCodeAt(end) === 0x5c && text.charCodeAt(end + 1) === 0x20 && end + 2 <= limit) end += 2;
  return scriptOf(text.slice(contentStart, close), kind === ":sup:`", end);
}

/**
 * Where `closing` starts, looked for only as far as a script's content may reach from `from`, or
 * -1: a long document full of unclosed tags is not searched to its end at every tag.
 */
function closingWithin(text: string, closing: string, from: number): number {
  const found = text.slice(from, from + MAX_RAW_CONTENT + closing.length).indexOf(closing);
  return found < 0 ? -1 : from + found;
}

/** The markup's content checked and decoded, or undefined when it is not a count or a charge. */
function scriptOf(raw: string, superscript: boolean, end: number): ScriptMarkup | undefined {
  const content = decodedContent(raw);
  if (content === undefined || content.length === 0 || content.length > MAX_CONTENT) return undefined;
  const fits = superscript ? /^(?:[0-9]{0,2}[+-]{1,3}|[+-][0-9]?|[0-9]{1,3})$/.test(content) : /^[0-9]{1,3}$/.test(content);
  return fits ? { end, superscript, content } : undefined;
}

/** Character references a count or a charge is written with; anything else is not a script. */
const REFERENCES: ReadonlyMap<string, string> = new Map([
  ["minus", "-"],
  ["ndash", "-"],
  ["plus", "+"],
  ["#43", "+"],
  ["#45", "-"],
  ["#8211", "-"],
  ["#8722", "-"],
  ["#x2b", "+"],
  ["#x2d", "-"],
  ["#x2013", "-"],
  ["#x2212", "-"],
]);

/** `raw` with its character references and Unicode minus signs as ASCII, or undefined. */
function decodedContent(raw: string): string | undefined {
  let content = "";
  for (let index = 0; index < raw.length; index++) {
    const character = raw[index];
    if (character === "&") {
      const close = raw.indexOf(";", index + 1);
      const replacement = close < 0 ? undefined : REFERENCES.get(raw.slice(index + 1, close).toLowerCase());
      if (replacement === undefined) return undefined;
      content += replacement;
      index = close;
    } else if (character === "\u2212" || character === "\u2013") content += "-";
    else if (/[0-9+-]/.test(character)) content += character;
    else return undefined;
  }
  return content;
}

/**
 * `text` with every script markup replaced by Unicode sub- or superscripts, or undefined when a
 * markup does not hold a count, a charge or a mass number (then the text is not a formula written
 * in markup).
 */
export function withUnicodeScripts(text: string): string | undefined {
  let result = "";
  let copied = 0;
  for (let index = 0; index < text.length; index++) {
    const code = text.charCodeAt(index);
    if (code !== 0x3c && code !== 0x7b && code !== 0x7e && code !== 0x5e && code !== 0x5c && code !== 0x3a && code !== 0x24) continue;
    const markup = scriptMarkupAt(text, index);
    if (markup === undefined) {
      // A mark that opens no script is no formula character either.
      if (code === 0x3c || code === 0x7b || code === 0x7e || code === 0x5c || code === 0x24) return undefined;
      continue;
    }
    result += text.slice(copied, index) + unicodeScript(markup);
    copied = markup.end;
    index = markup.end - 1;
  }
  return result + text.slice(copied);
}

/** The content of `markup` in Unicode sub- or superscript characters. */
export function unicodeScript(markup: ScriptMarkup): string {
  let result = "";
  for (const character of markup.content) {
    if (character >= "0" && character <= "9") result += (markup.superscript ? SUPERSCRIPT_DIGITS : SUBSCRIPT_DIGITS)[Number(character)];
    else result += character === "+" ? "⁺" : "⁻";
  }
  return result;
}
