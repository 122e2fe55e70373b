/**
 * Equations from text: a whole mhchem body or table cell that is one equation, or the equations
 * inside a line of prose, where the words around them are not part of them.
 */
import type { SpeciesReader } from "../speciesReader";
import { equationTokens, type EquationToken } from "./equationTokens";
import { looksLikeFormula, MAX_TERM_WORDS, readTerm } from "./readTerm";
import type { Reaction, ReactionNotation, ReactionTerm } from "./reactionTypes";

type Word = Extract<EquationToken, { type: "word" }>;
type Arrow = Extract<EquationToken, { type: "arrow" }>;

/**
 * The equation that `text[start, end)` is as a whole (an mhchem body, a table cell), or
 * undefined when it is a single species, a scheme of several steps, or holds anything that is
 * not a term: such text is not judged.
 */
export function readWholeEquation(
  text: string,
  start: number,
  end: number,
  notation: ReactionNotation,
  read: SpeciesReader,
): Reaction | undefined {
  const tokens = equationTokens(text, start, end, notation === "mhchem");
  if (tokens.some((token) => token.type === "opaque")) return undefined;
  const arrows = tokens.filter((token): token is Arrow => token.type === "arrow");
  const arrow = arrows.length === 1 ? arrows[0] : undefined;
  if (!arrow) return undefined;
  const at = tokens.indexOf(arrow);
  const left = wholeSide(text, tokens.slice(0, at), "left", read);
  const right = wholeSide(text, tokens.slice(at + 1), "right", read);
  if (!left || !right) return undefined;
  if (arrow.kind === "equals" && !clearlyAnEquation(left, right, true)) return undefined;
  if (notation !== "mhchem" && !clearlyAnEquation(left, right, true)) return undefined;
  return reactionOf(text, notation, arrow, left, right);
}

/** Terms of a side where every word must belong to a term. */
function wholeSide(
  text: string,
  tokens: readonly EquationToken[],
  side: "left" | "right",
  read: SpeciesReader,
): ReactionTerm[] | undefined {
  const terms: ReactionTerm[] = [];
  for (const group of groupsOf(tokens)) {
    if (!group) return undefined;
    const term = readTerm(text, group, side, read);
    if (!term) return undefined;
    terms.push(term);
  }
  return terms.length > 0 ? terms : undefined;
}

/** Word groups between "+" signs; undefined marks a group that holds something else (an arrow). */
function groupsOf(tokens: readonly EquationToken[]): (Word[] | undefined)[] {
  const groups: (Word[] | undefined)[] = [];
  let current: Word[] | undefined = [];
  for (const token of tokens) {
    if (token.type === "plus") {
      groups.push(current);
      current = [];
    } else if (token.type === "word") current?.push(token);
    else current = undefined;
  }
  groups.push(current);
  return groups;
}

/**
 * Both sides written in formulas, and an equation beyond doubt: a "+" or a coefficient, or (for
 * an arrow) a line that is nothing but the equation. "grade B → grade A" and "C → D" are not.
 * A half-reaction counts too: electrons and an ion or formula beside a bare element ("Fe → Fe³⁺ + 3e⁻").
 */
function clearlyAnEquation(left: readonly ReactionTerm[], right: readonly ReactionTerm[], wholeLine: boolean): boolean {
  if (!(left.some(looksLikeFormula) && right.some(looksLikeFormula)) && !isHalfReaction(left, right)) return false;
  const terms = [...left, ...right];
  const counted = left.length + right.length > 2 || terms.some((term) => term.coefficient.written !== undefined);
  return counted || wholeLine;
}

/** Electrons on one side, and a species written as a formula (not only a bare symbol) besides them. */
function isHalfReaction(left: readonly ReactionTerm[], right: readonly ReactionTerm[]): boolean {
  const terms = [...left, ...right];
  return terms.some((term) => term.electron) && terms.some((term) => !term.electron && looksLikeFormula(term));
}

function reactionOf(text: string, notation: ReactionNotation, arrow: Arrow, left: ReactionTerm[], right: ReactionTerm[]): Reaction {
  const range = { start: left[0].range.start, end: right[right.length - 1].range.end };
  return {
    range,
    text: text.slice(range.start, range.end),
    notation,
    arrow: { range: { start: arrow.start, end: arrow.end }, text: arrow.text, kind: arrow.kind, conditions: arrow.conditions },
    left,
    right,
  };
}

/** Words that may stand before an equation on its line: bullets, numbers, labels ending in ":". */
function isLeadIn(word: string): boolean {
  return /^(?:[-*•>]|\d{1,3}[.)]|\(\w{1,3}\)|\[\w{1,3}\]|[^\s]*:)$/.test(word);
}

/** Words that may stand after an equation on its line: a number for it, punctuation. */
function isTrailer(word: string): boolean {
  return /^(?:\(\w{1,3}\)|\[\w{1,3}\]|[.,;:]+)$/.test(word);
}

/**
 * The equations in the prose line `text[start, end)`. Each arrow takes the terms next to it on
 * both sides, as far as they read; prose before and after is left alone. A chain of arrows
 * (A → B → C) is a scheme, not an equation, and is not read.
 */
export function equationsInLine(text: string, start: number, end: number, read: SpeciesReader): Reaction[] {
  const tokens = equationTokens(text, start, end, false);
  let arrowIndexes = indexesOf(tokens, (token) => token.type === "arrow" && token.kind !== "equals");
  // "=" stands for the arrow only where no arrow is written, once, on a line that is the equation.
  const equalsOnly = arrowIndexes.length === 0;
  if (equalsOnly) arrowIndexes = indexesOf(tokens, (token) => token.type === "arrow");
  if (arrowIndexes.length === 0 || (equalsOnly && arrowIndexes.length > 1)) return [];
  const sides = arrowIndexes.map((at, k) => {
    const from = k === 0 ? 0 : arrowIndexes[k - 1] + 1;
    const to = k + 1 < arrowIndexes.length ? arrowIndexes[k + 1] : tokens.length;
    const between = (slice: readonly EquationToken[]) => slice.filter((token) => token.type !== "arrow");
    return {
      arrow: tokens[at] as Arrow,
      left: outerSide(text, between(tokens.slice(from, at)), "left", read),
      right: outerSide(text, between(tokens.slice(at + 1, to)), "right", read),
    };
  });
  const reactions: Reaction[] = [];
  sides.forEach(({ arrow, left, right }, k) => {
    if (!left || !right) return;
    // Terms that fill the whole gap to the next or previous arrow make a scheme.
    if (k + 1 < sides.length && right.consumedAll) return;
    if (k > 0 && left.consumedAll) return;
    const wholeLine = left.bare && right.bare;
    if (equalsOnly && !(wholeLine && clearlyAnEquation(left.terms, right.terms, false))) return;
    if (!clearlyAnEquation(left.terms, right.terms, wholeLine)) return;
    reactions.push(reactionOf(text, "text", arrow, left.terms, right.terms));
  });
  return reactions;
}

function indexesOf(tokens: readonly EquationToken[], test: (token: EquationToken) => boolean): number[] {
  const indexes: number[] = [];
  tokens.forEach((token, index) => {
    if (test(token)) indexes.push(index);
  });
  return indexes;
}

/** The terms of one side next to the arrow. */
interface OuterSide {
  readonly terms: ReactionTerm[];
  /** Every word of the side belongs to a term. */
  readonly consumedAll: boolean;
  /** Nothing but lead-in or trailing words is left on the line beside the terms. */
  readonly bare: boolean;
}

/**
 * Groups are taken from the arrow outwards while they read; in a group that carries prose on its
 * far side, the longest run of words next to the operator that reads is the term, and the side
 * ends there.
 */
function outerSide(text: string, tokens: readonly EquationToken[], side: "left" | "right", read: SpeciesReader): OuterSide | undefined {
  const groups = groupsOf(tokens);
  if (side === "left") groups.reverse();
  const terms: ReactionTerm[] = [];
  for (let index = 0; index < groups.length; index++) {
    const group = groups[index];
    const found = group && group.length > 0 ? nearestTerm(text, group, side, read) : undefined;
    if (!found) {
      // The "+" before this group joined prose, not a term.
      if (terms.length === 0) return undefined;
      return { terms: ordered(terms, side), consumedAll: false, bare: false };
    }
    terms.push(found.term);
    if (found.rest.length > 0 || found.trimmed) {
      const last = index === groups.length - 1;
      const bare = last && found.rest.every((word) => (side === "left" ? isLeadIn(word.text) : isTrailer(word.text)));
      return { terms: ordered(terms, side), consumedAll: false, bare };
    }
  }
  return { terms: ordered(terms, side), consumedAll: true, bare: true };
}

function ordered(terms: ReactionTerm[], side: "left" | "right"): ReactionTerm[] {
  return side === "left" ? [...terms].reverse() : terms;
}

/** The longest run of the group's words next to the operator that reads as a term. */
function nearestTerm(
  text: string,
  group: readonly Word[],
  side: "left" | "right",
  read: SpeciesReader,
): { term: ReactionTerm; rest: Word[]; trimmed: boolean } | undefined {
  for (let length = Math.min(group.length, MAX_TERM_WORDS); length >= 1; length--) {
    const words = side === "left" ? group.slice(group.length - length) : group.slice(0, length);
    const rest = side === "left" ? group.slice(0, group.length - length) : group.slice(length);
    const whole = readTerm(text, words, side, read);
    if (whole) return { term: whole, rest, trimmed: false };
    const trimmed = trimmedPunctuation(words, side);
    const term = trimmed && readTerm(text, trimmed, side, read);
    if (term) return { term, rest, trimmed: true };
  }
  return undefined;
}

/** The words with a sentence's full stop or comma taken off the last ("2 SO2." ends a sentence). */
function trimmedPunctuation(words: readonly Word[], side: "left" | "right"): Word[] | undefined {
  if (side === "left" || words.length === 0) return undefined;
  const last = words[words.length - 1];
  const trimmed = last.text.replace(/[.,;:]+$/, "");
  if (trimmed === last.text || trimmed.length === 0) return undefined;
  return [...words.slice(0, -1), { ...last, text: trimmed, end: last.start + trimmed.length }];
}
