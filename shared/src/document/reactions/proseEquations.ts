/**
 * Equations written in prose lines ("2H2 + O2 → 2H2O", "CaCO3 = CaO + CO2"). Code spans, mhchem
 * spans, math and comments on the line are masked first: an arrow inside them is not the line's.
 */
import { mhchemOpensAt } from "../mhchemSpan";
import type { SpeciesReader } from "../speciesReader";
import { equationsInLine } from "./readEquation";
import type { Reaction, ReactionTerm } from "./reactionTypes";
import type { TextRange } from "../../chemistry/types";

/** Longest line looked at: longer ones are data, not a written equation. */
const MAX_LINE = 600;

/** A character that can make a line an equation: an arrow or "=". */
const EQUATION_MARK = /[\u2192\u27f6\u2190\u27f5\u21cc\u21c4\u21c6\u2194\u27f7=]|->|<-/;

/** Every equation in the prose `text[start, end)`, line by line, in document order. */
export function equationsInProse(text: string, start: number, end: number, read: SpeciesReader): Reaction[] {
  const reactions: Reaction[] = [];
  let lineStart = start;
  while (lineStart < end) {
    let lineEnd = text.indexOf("\n", lineStart);
    if (lineEnd < 0 || lineEnd > end) lineEnd = end;
    if (lineEnd - lineStart <= MAX_LINE) {
      const line = text.slice(lineStart, lineEnd);
      if (EQUATION_MARK.test(line)) {
        const masked = maskedLine(line);
        if (EQUATION_MARK.test(masked)) {
          // The masked line has the line's length, so its offsets move by the line's start.
          for (const reaction of equationsInLine(masked, 0, masked.length, read)) reactions.push(shiftedReaction(reaction, lineStart));
        }
      }
    }
    lineStart = lineEnd + 1;
  }
  return reactions;
}

/** The line with code spans, `\ce{...}`, `$...$` and `<!-- -->` replaced by spaces of the same length. */
function maskedLine(line: string): string {
  // Most lines hold nothing to mask.
  if (!/[`$\\<]/.test(line)) return line;
  const pieces: string[] = [];
  let copied = 0;
  let index = 0;
  while (index < line.length) {
    const end = maskedEnd(line, index);
    if (end > index) {
      pieces.push(line.slice(copied, index), " ".repeat(end - index));
      copied = end;
      index = end;
    } else index++;
  }
  pieces.push(line.slice(copied));
  return pieces.join("");
}

/** Where a span that is not prose, starting at `index`, ends; `index` itself when none starts there. */
function maskedEnd(line: string, index: number): number {
  const code = line.charCodeAt(index);
  if (code === 0x60) {
    let ticks = index;
    while (line.charCodeAt(ticks) === 0x60) ticks++;
    const close = line.indexOf(line.slice(index, ticks), ticks);
    return close < 0 ? line.length : close + (ticks - index);
  }
  if (code === 0x24) {
    const double = line.charCodeAt(index + 1) === 0x24;
    const close = line.indexOf(double ? "$$" : "$", index + (double ? 2 : 1));
    return close < 0 ? line.length : close + (double ? 2 : 1);
  }
  if (code === 0x5c && mhchemOpensAt(line, index)) {
    let depth = 0;
    for (let at = index + 3; at < line.length; at++) {
      if (line[at] === "{") depth++;
      else if (line[at] === "}" && --depth === 0) return at + 1;
    }
    return line.length;
  }
  if (code === 0x5c && (line[index + 1] === "(" || line[index + 1] === "[")) {
    const close = line.indexOf(line[index + 1] === "(" ? "\\)" : "\\]", index + 2);
    return close < 0 ? line.length : close + 2;
  }
  if (code === 0x3c && line.startsWith("<!--", index)) {
    const close = line.indexOf("-->", index + 4);
    return close < 0 ? line.length : close + 3;
  }
  return index;
}

function shifted(range: TextRange, by: number): TextRange {
  return { start: range.start + by, end: range.end + by };
}

function shiftedTerm(term: ReactionTerm, by: number): ReactionTerm {
  const written = term.coefficient.written;
  return {
    ...term,
    range: shifted(term.range, by),
    speciesRange: shifted(term.speciesRange, by),
    coefficient: written ? { ...term.coefficient, written: shifted(written, by) } : term.coefficient,
    reading: term.reading && { ...term.reading, range: shifted(term.speciesRange, by) },
  };
}

/** `reaction` with every range moved by `by`. */
export function shiftedReaction(reaction: Reaction, by: number): Reaction {
  if (by === 0) return reaction;
  return {
    ...reaction,
    range: shifted(reaction.range, by),
    arrow: { ...reaction.arrow, range: shifted(reaction.arrow.range, by) },
    left: reaction.left.map((term) => shiftedTerm(term, by)),
    right: reaction.right.map((term) => shiftedTerm(term, by)),
  };
}
