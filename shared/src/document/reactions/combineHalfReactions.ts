/**
 * Combining an oxidation half-reaction with a reduction half-reaction written in the same
 * document: each is scaled so the electrons cancel, species on both sides (H+, OH-, H2O, or any
 * other) are netted out, and the overall equation is written on a new line after the later one.
 *
 * Which halves pair: a balanced half-reaction pairs with the nearest half-reaction of the other
 * kind in its own paragraph; failing that, when the document holds exactly one oxidation and one
 * reduction half-reaction, those two pair.
 */
import { add, fraction, isZero, multiply, divide, ZERO, smallestWholeRatio, type Fraction } from "../../chemistry/reactions/rational";
import { readSpecies } from "../../chemistry/reader/readSpecies";
import type { FormulaPart, TextRange } from "../../chemistry/types";
import type { SpeciesReader } from "../speciesReader";
import type { TextFix } from "../types";
import { writingStyle } from "./completeEquation";
import { coefficientOf, judgeReaction, termsOf } from "./judgeReaction";
import { readWholeEquation } from "./readEquation";
import type { Reaction, ReactionTerm } from "./reactionTypes";

/** A balanced half-reaction: electrons on one side only. */
interface HalfReaction {
  readonly reaction: Reaction;
  /** Electrons given up (written on the right) or taken (written on the left). */
  readonly kind: "oxidation" | "reduction";
  /** Electrons per equation as written. */
  readonly electrons: Fraction;
}

/** The overall equation two half-reactions make, and the edit that writes it. */
export interface CombinedEquation {
  readonly oxidation: Reaction;
  readonly reduction: Reaction;
  /** The overall equation as inserted (without the line's markup). */
  readonly equation: string;
  /** Inserts a new line after the later half-reaction's line. */
  readonly edit: TextFix;
}

/** The half-reaction `reaction` is, when it is balanced and has electrons on one side only. */
function halfReactionOf(reaction: Reaction): HalfReaction | undefined {
  const terms = termsOf(reaction);
  const electrons = terms.filter((term) => term.electron);
  if (electrons.length === 0 || terms.some((term) => !term.electron && !term.reading)) return undefined;
  const sides = new Set(electrons.map((term) => term.side));
  if (sides.size !== 1) return undefined;
  if (judgeReaction(reaction).kind !== "balanced") return undefined;
  const count = electrons.reduce((sum, term) => add(sum, coefficientOf(term)), ZERO);
  return { reaction, kind: electrons[0].side === "right" ? "oxidation" : "reduction", electrons: count };
}

/** What makes two terms the same species: elements with their counts, and the charge. */
function speciesKey(term: ReactionTerm): string {
  const counts = new Map<string, number>();
  for (const part of term.reading?.composition ?? ([] as FormulaPart[]))
    counts.set(part.symbol, (counts.get(part.symbol) ?? 0) + part.count);
  const elements = [...counts.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([symbol, count]) => `${symbol}${count}`);
  return `${elements.join("")}|${term.reading?.charge ?? 0}`;
}

/** Each species' net amount (left positive) in `reaction` scaled by `scale`, electrons left out. */
function netAmounts(
  reactions: readonly { reaction: Reaction; scale: Fraction }[],
): { key: string; term: ReactionTerm; amount: Fraction; side: "left" | "right" }[] {
  const entries = new Map<string, { key: string; term: ReactionTerm; amount: Fraction; side: "left" | "right" }>();
  for (const side of ["left", "right"] as const) {
    for (const { reaction, scale } of reactions) {
      for (const term of side === "left" ? reaction.left : reaction.right) {
        if (term.electron) continue;
        const key = speciesKey(term);
        const signed = multiply(multiply(coefficientOf(term), scale), fraction(side === "left" ? 1n : -1n));
        const entry = entries.get(key);
        if (entry) entry.amount = add(entry.amount, signed);
        else entries.set(key, { key, term, amount: signed, side });
      }
    }
  }
  return [...entries.values()];
}

/** The overall equation's text from the two halves, in the later one's notation; undefined when nothing is left on a side. */
function overallText(first: HalfReaction, second: HalfReaction): { text: string; signature: string } | undefined {
  const amounts = netAmounts([
    { reaction: first.reaction, scale: divide(fraction(1n), first.electrons) },
    { reaction: second.reaction, scale: divide(fraction(1n), second.electrons) },
  ]).filter((entry) => !isZero(entry.amount));
  const whole = smallestWholeRatio(amounts.map((entry) => entry.amount));
  const left: string[] = [];
  const right: string[] = [];
  const style = writingStyle(
    second.reaction.left.concat(second.reaction.right).some((term) => term.coefficient.written) ? second.reaction : first.reaction,
  );
  // Species that change sides on netting (water, OH-) go after those written on that side.
  const moved: { left: string[]; right: string[] } = { left: [], right: [] };
  amounts.forEach((entry, index) => {
    // smallestWholeRatio makes the first amount positive; put the real sign back.
    const value = whole[index] * (amounts[0].amount.numerator > 0n ? 1n : -1n);
    const size = value < 0n ? -value : value;
    const written = (size === 1n ? "" : style.glued ? String(size) : `${size} `) + entry.term.speciesText;
    const side = value > 0n ? "left" : "right";
    (entry.side === side ? (side === "left" ? left : right) : moved[side]).push(written);
  });
  left.push(...moved.left);
  right.push(...moved.right);
  if (left.length === 0 || right.length === 0) return undefined;
  const arrow = second.reaction.arrow.conditions.length > 0 ? "->" : second.reaction.arrow.text;
  const signature = amounts
    .map((entry, index) => `${entry.key}:${whole[index] * (amounts[0].amount.numerator > 0n ? 1n : -1n)}`)
    .sort()
    .join(" ");
  return { text: `${left.join(style.separator)} ${arrow} ${right.join(style.separator)}`, signature };
}

/** The signature of a balanced equation written in the document, to tell whether the overall one is there already. */
function signatureOf(reaction: Reaction): string | undefined {
  const terms = termsOf(reaction);
  if (terms.some((term) => term.electron || !term.reading)) return undefined;
  const whole = smallestWholeRatio(terms.map((term) => multiply(coefficientOf(term), fraction(term.side === "left" ? 1n : -1n))));
  const merged = new Map<string, bigint>();
  terms.forEach((term, index) => merged.set(speciesKey(term), (merged.get(speciesKey(term)) ?? 0n) + whole[index]));
  return [...merged.entries()]
    .filter(([, value]) => value !== 0n)
    .map(([key, value]) => `${key}:${value}`)
    .sort()
    .join(" ");
}

/** Offsets where blank lines separate paragraphs: a half-reaction's paragraph is the count before it. */
function paragraphOf(text: string, offset: number): number {
  let count = 0;
  const blank = /\n[ \t]*\r?\n/g;
  for (let match = blank.exec(text); match && match.index < offset; match = blank.exec(text)) count++;
  return count;
}

/** Most half-reactions looked at in one document. */
const MAX_HALVES = 200;

/**
 * The overall equations to offer for the half-reactions whose arrows touch `range`, each with
 * the edit that inserts it. `text` is the whole document; `reactions` its equations.
 */
export function combinedEquations(
  text: string,
  reactions: readonly Reaction[],
  range: TextRange,
  read: SpeciesReader = readSpecies,
): CombinedEquation[] {
  const touched = reactions.filter((reaction) => reaction.arrow.range.start <= range.end && range.start <= reaction.arrow.range.end);
  if (touched.length === 0) return [];
  const halves: HalfReaction[] = [];
  for (const reaction of reactions) {
    if (!reaction.left.concat(reaction.right).some((term) => term.electron)) continue;
    const half = halfReactionOf(reaction);
    if (half) halves.push(half);
    if (halves.length > MAX_HALVES) return [];
  }
  const results: CombinedEquation[] = [];
  for (const reaction of touched) {
    const half = halves.find((candidate) => candidate.reaction === reaction);
    if (!half) continue;
    const partner = partnerOf(text, half, halves);
    if (!partner) continue;
    const [first, second] = half.reaction.range.start < partner.reaction.range.start ? [half, partner] : [partner, half];
    const overall = overallText(first, second);
    if (!overall) continue;
    if (reactions.some((other) => signatureOf(other) === overall.signature)) continue;
    const again = readWholeEquation(overall.text, 0, overall.text.length, second.reaction.notation, read);
    if (!again || termsOf(again).some((term) => term.electron) || judgeReaction(again).kind !== "balanced") continue;
    const edit = insertionAfter(text, second.reaction, overall.text);
    // A range over both arrows asks for the same pair twice.
    if (!edit || results.some((result) => result.edit.range.start === edit.range.start && result.equation === overall.text)) continue;
    const [oxidation, reduction] = half.kind === "oxidation" ? [half.reaction, partner.reaction] : [partner.reaction, half.reaction];
    results.push({ oxidation, reduction, equation: overall.text, edit });
  }
  return results;
}

/** The nearest half-reaction of the other kind in the same paragraph, or the only one in the document. */
function partnerOf(text: string, half: HalfReaction, halves: readonly HalfReaction[]): HalfReaction | undefined {
  const others = halves.filter((other) => other.kind !== half.kind);
  const paragraph = paragraphOf(text, half.reaction.range.start);
  const near = others
    .filter((other) => paragraphOf(text, other.reaction.range.start) === paragraph)
    .sort(
      (a, b) => Math.abs(a.reaction.range.start - half.reaction.range.start) - Math.abs(b.reaction.range.start - half.reaction.range.start),
    );
  if (near.length > 0) return near[0];
  const same = halves.filter((other) => other.kind === half.kind);
  return others.length === 1 && same.length === 1 ? others[0] : undefined;
}

/**
 * The edit that puts `equation` on a new line after `after`'s line, with that line's indent,
 * bullet and mhchem wrapping (`$\ce{...}$`, or chemformula's `\ch{...}`); undefined when the
 * line's wrapping cannot be told.
 */
function insertionAfter(text: string, after: Reaction, equation: string): TextFix | undefined {
  const lineStart = text.lastIndexOf("\n", after.range.start - 1) + 1;
  let lineEnd = text.indexOf("\n", after.range.end);
  if (lineEnd < 0) lineEnd = text.length;
  const newline = text[lineEnd - 1] === "\r" ? "\r\n" : "\n";
  if (newline === "\r\n") lineEnd -= 1;
  const before = text.slice(lineStart, after.range.start);
  const lead = /^[ \t]*(?:[-*+][ \t]+)?/.exec(before)![0];
  let opener = "";
  let closer = "";
  if (after.notation === "mhchem") {
    const wrap = /(\$\$|\$|\\\(|\\\[)?\\c[eh]\{\s*$/.exec(before);
    if (!wrap) return undefined;
    opener = wrap[0].trimEnd();
    closer = "}" + ({ $$: "$$", $: "$", "\\(": "\\)", "\\[": "\\]" }[wrap[1] ?? ""] ?? "");
  } else if (after.notation !== "text") return undefined;
  return {
    range: { start: lineEnd, end: lineEnd },
    newText: `${newline}${lead}${opener}${equation}${closer}`,
    title: "Insert the overall equation (half-reactions combined)",
  };
}
