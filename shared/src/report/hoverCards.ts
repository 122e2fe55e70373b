/**
 * Hover cards written once per species text and options, and kept within a budget: a card (its
 * Lewis diagram and sketch as data URIs, its vibrations and oxidation states) takes about a
 * millisecond to write and several kilobytes to keep, and the same few species are hovered
 * again and again. The memo is an object its owner holds, so each server (and each test) has
 * its own.
 */
import { boundedMemo } from "../chemistry/boundedMemo";
import type { AnalysisResult } from "../chemistry/types";
import { resultMarkdown, type HoverMarkdownOptions, type ProblemCardOptions } from "./hoverMarkdown";

/**
 * Characters of card text kept at most (about 8 MB at two bytes a character): some 500 cards of a
 * usual 5,000 to 10,000 characters, and never fewer than 200 (a card is cut at about 20,000).
 */
export const HOVER_CARD_MEMO_CHARACTERS = 4_000_000;

/** Cards by species text and the options they were written with. */
export interface HoverCardMemo {
  /** The card `resultMarkdown` writes for `text` analysed as `result`, written at most once while kept. */
  card(text: string, result: AnalysisResult, options: HoverMarkdownOptions, problemOptions?: ProblemCardOptions): string;
  /** The card if it is kept already, without writing it. */
  known(text: string, result: AnalysisResult, options: HoverMarkdownOptions, problemOptions?: ProblemCardOptions): string | undefined;
  /** Keeps a card written elsewhere (a worker thread's) for `text` analysed as `result`. */
  remember(text: string, result: AnalysisResult, options: HoverMarkdownOptions, card: string, problemOptions?: ProblemCardOptions): void;
}

interface KeptCard {
  /** The analysis the card was written from: a card is only reused for that very analysis. */
  readonly result: AnalysisResult;
  readonly card: string;
}

/** A memo of hover cards holding at most about `budgetCharacters` characters of card text. */
export function createHoverCardMemo(budgetCharacters = HOVER_CARD_MEMO_CHARACTERS): HoverCardMemo {
  const kept = boundedMemo<KeptCard>(budgetCharacters, (key, value) => key.length + value.card.length);
  const known = (key: string, result: AnalysisResult): string | undefined => {
    const found = kept.get(key);
    // Another analysis of the same text (the analysis memo forgot and redid it) may differ.
    return found && found.result === result ? found.card : undefined;
  };
  return {
    card(text, result, options, problemOptions = {}) {
      const key = cardKey(text, result, options, problemOptions);
      const found = known(key, result);
      if (found !== undefined) return found;
      const card = resultMarkdown(text, result, options, problemOptions);
      kept.set(key, { result, card });
      return card;
    },
    known: (text, result, options, problemOptions = {}) => known(cardKey(text, result, options, problemOptions), result),
    remember(text, result, options, card, problemOptions = {}) {
      kept.set(cardKey(text, result, options, problemOptions), { result, card });
    },
  };
}

/** Everything besides the analysis that changes what `resultMarkdown` writes. */
function cardKey(text: string, result: AnalysisResult, options: HoverMarkdownOptions, problemOptions: ProblemCardOptions): string {
  // Only a plain refusal's card says whether the problem is also reported.
  const alsoAProblem = !result.ok && !result.parts && problemOptions.alsoAProblem === true;
  return [options.format ?? "markdown", options.angleDecimals, options.maxCentreGroups ?? "", alsoAProblem ? 1 : 0, text].join("\u0000");
}
