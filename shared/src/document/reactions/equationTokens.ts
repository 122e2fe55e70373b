/**
 * Splitting the text of an equation into words, "+" signs and arrows, with their offsets. One
 * scanner serves mhchem bodies (arrow labels in square brackets, "^" and "v" gas and precipitate
 * marks) and plain text (Unicode arrows, which may touch the formulas around them).
 */
import type { TextRange } from "../../chemistry/types";
import type { ArrowKind } from "./reactionTypes";

export type EquationToken =
  | ({ readonly type: "word"; readonly text: string } & TextRange)
  | ({ readonly type: "plus" } & TextRange)
  | ({ readonly type: "arrow"; readonly kind: ArrowKind; readonly text: string; readonly conditions: readonly string[] } & TextRange)
  /** Text in braces or dollars in mhchem: a note, never a species. */
  | ({ readonly type: "opaque" } & TextRange);

/** ASCII arrows, longest first, as mhchem and plain text write them. */
const ASCII_ARROWS: readonly (readonly [string, ArrowKind])[] = [
  ["<=>>", "equilibrium"],
  ["<<=>", "equilibrium"],
  ["<-->", "equilibrium"],
  ["<=>", "equilibrium"],
  ["<->", "resonance"],
  ["-->", "forward"],
  ["->", "forward"],
  ["<-", "backward"],
  ["=", "equals"],
];

/** Unicode arrows, each one character. */
const UNICODE_ARROWS: ReadonlyMap<number, ArrowKind> = new Map([
  [0x2192, "forward"], // →
  [0x27f6, "forward"], // ⟶
  [0x2190, "backward"], // ←
  [0x27f5, "backward"], // ⟵
  [0x21cc, "equilibrium"], // ⇌
  [0x21c4, "equilibrium"], // ⇄
  [0x21c6, "equilibrium"], // ⇆
  [0x2194, "resonance"], // ↔
  [0x27f7, "resonance"], // ⟷
]);

function isSpace(code: number): boolean {
  return code === 0x20 || code === 0x09 || code === 0x0a || code === 0x0d || code === 0xa0;
}

/** Tokens of `text[start, end)`; `mhchem` reads arrow labels and braces the mhchem way. */
export function equationTokens(text: string, start: number, end: number, mhchem: boolean): EquationToken[] {
  const tokens: EquationToken[] = [];
  let index = start;
  while (index < end) {
    const code = text.charCodeAt(index);
    if (isSpace(code)) {
      index++;
      continue;
    }
    if (mhchem && (code === 0x7b || code === 0x24)) {
      const close = code === 0x7b ? closing(text, index, end, 0x7b, 0x7d) : text.indexOf("$", index + 1);
      const stop = close < 0 || close >= end ? end : close + 1;
      tokens.push({ type: "opaque", start: index, end: stop });
      index = stop;
      continue;
    }
    const arrow = arrowAt(text, index, end, mhchem);
    if (arrow) {
      tokens.push(arrow);
      index = arrow.end;
      continue;
    }
    let wordEnd = index;
    while (wordEnd < end && !isSpace(text.charCodeAt(wordEnd)) && !UNICODE_ARROWS.has(text.charCodeAt(wordEnd))) wordEnd++;
    if (wordEnd === index) wordEnd++;
    const word = text.slice(index, wordEnd);
    if (word === "+" || word === "\uff0b") tokens.push({ type: "plus", start: index, end: wordEnd });
    else tokens.push({ type: "word", text: word, start: index, end: wordEnd });
    index = wordEnd;
  }
  return tokens;
}

/** An arrow starting at `index`: a Unicode arrow anywhere, an ASCII one only between spaces. */
function arrowAt(text: string, index: number, end: number, mhchem: boolean): EquationToken | undefined {
  const unicode = UNICODE_ARROWS.get(text.charCodeAt(index));
  if (unicode) return { type: "arrow", kind: unicode, text: text[index], conditions: [], start: index, end: index + 1 };
  if (index > 0 && !isSpace(text.charCodeAt(index - 1))) return undefined;
  for (const [written, kind] of ASCII_ARROWS) {
    if (!text.startsWith(written, index)) continue;
    let arrowEnd = index + written.length;
    const conditions: string[] = [];
    // mhchem writes conditions over and under an arrow: "->[H2SO4][heat]".
    while (mhchem && kind !== "equals" && arrowEnd < end && text.charCodeAt(arrowEnd) === 0x5b) {
      const close = closing(text, arrowEnd, end, 0x5b, 0x5d);
      if (close < 0) return undefined;
      conditions.push(text.slice(arrowEnd + 1, close).trim());
      arrowEnd = close + 1;
    }
    if (arrowEnd < end && !isSpace(text.charCodeAt(arrowEnd))) return undefined;
    return { type: "arrow", kind, text: text.slice(index, index + written.length), conditions, start: index, end: arrowEnd };
  }
  return undefined;
}

/** The bracket closing the one at `open` (depth counted), or -1. */
function closing(text: string, open: number, end: number, opener: number, closer: number): number {
  let depth = 0;
  for (let index = open; index < end; index++) {
    const code = text.charCodeAt(index);
    if (code === opener) depth++;
    else if (code === closer && --depth === 0) return index;
  }
  return -1;
}
