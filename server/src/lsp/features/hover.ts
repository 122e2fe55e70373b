/**
 * Hover: the species under the cursor, found among the model's occurrences, shown as a card.
 * Cards are kept in a bounded memo and written ahead, once a document's analysis is done, for
 * the species it names (those in view first), so the first hover on a species is as quick as
 * the next.
 */
import { MarkupKind, type Hover, type HoverParams } from "vscode-languageserver";
import {
  analyzeOccurrenceSafely,
  analyzeSpecies,
  createHoverCardMemo,
  reactionAtOffset,
  reactionCard,
  speciesTextOf,
  type HoverCardMemo,
  type SpeciesOccurrence,
} from "../../../../shared/src/index";
import type { Finding, TextRange } from "../core";
import type { AnalysedDocument } from "../documentCache";
import { guarded } from "../guardedHandler";
import { isLargeSmiles, type OffThreadWork } from "../offThreadWork";
import { lspRange } from "../ranges";
import { DEFAULT_SETTINGS } from "../settings";
import { enabledDocument, type ServerContext } from "../serverContext";

/** What the rest of the server tells the hover feature. */
export interface HoverFeature {
  /**
   * Writes ahead, between other requests, the cards of the species in `uri`'s analysed text, those
   * in view first; gives up as soon as `stale()` says the text changed or a newer pass starts.
   */
  prepare(uri: string, stale: () => boolean): Promise<void>;
  /** The editor shows `start`..`end` of `uri` (an inlay hint request says so): its species come first. */
  viewed(uri: string, start: number, end: number): void;
  /** Forgets a closed document. */
  closed(uri: string): void;
  /**
   * Writes a few cards nobody asked for, one per turn of the event loop, into a memo of their
   * own: the first cards a process writes run code the engine has not compiled yet, several
   * times slower than later ones, and the first hover should not pay for that.
   */
  warmUp(): Promise<void>;
}

// common practice: small species of every electron geometry, with and without lone pairs,
// ions, multiple bonds, resonance, an odd electron, several centres and a salt, for the warm-up.
const WARM_UP_SPECIES = [
  "CO2",
  "BF3",
  "SO2",
  "CH4",
  "NH3",
  "H2O",
  "PCl5",
  "SF4",
  "ClF3",
  "XeF2",
  "SF6",
  "BrF5",
  "XeF4",
  "IF7",
  "NH4+",
  "PF6-",
  "SO4^2-",
  "NO3-",
  "O3",
  "NO2",
  "C2H4",
  "CH3OH",
  "NaCl",
  "CuSO4",
];
/** Rounds over the list: the engine compiles a function for speed only after it has run a few times. */
const WARM_UP_ROUNDS = 3;

/** Distinct species whose cards one pass writes ahead: with cards of 5,000-20,000 characters, they fit the memo. */
const PREPARED_CARDS_LIMIT = 200;
/** Around a hovered position, this many characters either side count as in view. */
const HOVER_VIEW_CHARACTERS = 2_000;

/** Registers the hover handler; `cards` defaults to a memo of its own. */
export function registerHover(
  context: ServerContext,
  offThread: OffThreadWork,
  cards: HoverCardMemo = createHoverCardMemo(),
): HoverFeature {
  const inView = new Map<string, TextRange>();
  const passes = new Map<string, number>();
  context.connection.onHover(
    guarded<HoverParams, Hover | null>(context.log, "hover", null, async (params, token) => {
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled) return null;
      const { document, analysed, settings } = enabled;
      const offset = document.offsetAt(params.position);
      // The card is written in the format the client asked for, not merely labelled with it.
      const format = context.clientFeatures().hoverFormat;
      const kind = format === "markdown" ? MarkupKind.Markdown : MarkupKind.PlainText;
      // Read from the rows or blocks around the position, not the whole model.
      const reaction = reactionAtOffset(analysed.modelAround(offset, offset), offset);
      if (reaction) {
        return { contents: { kind, value: reactionCard(reaction, format) }, range: lspRange(document, reaction.arrow.range) };
      }
      const species = analysed.speciesAt(offset);
      if (!species) return null;
      // Where the user looks: the next pass writes the cards around here first.
      inView.set(document.uri, aroundHover(offset));
      const result = species.analysis;
      const options = { angleDecimals: settings.angleDecimals, format };
      const alsoAProblem =
        !result.ok && isReported(analysed.findingsAround(species.range.start, species.range.end), species.range, result.problem.message);
      const problemOptions = { alsoAProblem };
      let value = cards.known(species.text, result, options, problemOptions);
      if (value === undefined && result.ok && isLargeSmiles(result.value)) {
        // A large SMILES species' card (its polarity needs the 3D model) is written on a worker
        // thread, so that other requests are answered meanwhile.
        const answer = await offThread.run({ kind: "card", smiles: result.value.reading.text, options }, token);
        if (answer.kind === "cancelled") return null;
        if (answer.kind === "done" && answer.value !== undefined) {
          value = answer.value;
          cards.remember(species.text, result, options, value, problemOptions);
        }
      }
      value ??= cards.card(species.text, result, options, problemOptions);
      return { contents: { kind, value }, range: lspRange(document, species.range) };
    }),
  );

  return {
    async prepare(uri, stale) {
      const pass = (passes.get(uri) ?? 0) + 1;
      passes.set(uri, pass);
      const superseded = (): boolean => stale() || passes.get(uri) !== pass;
      const enabled = await enabledDocument(context, uri);
      if (!enabled || superseded()) return;
      const { analysed, settings } = enabled;
      const options = { angleDecimals: settings.angleDecimals, format: context.clientFeatures().hoverFormat };
      const seen = new Set<string>();
      for (const occurrence of occurrencesInViewFirst(analysed, inView.get(uri))) {
        if (seen.size >= PREPARED_CARDS_LIMIT) break;
        const text = speciesTextOf(occurrence);
        if (seen.has(text)) continue;
        seen.add(text);
        const result = analyzeOccurrenceSafely(occurrence);
        // Large SMILES species get their cards on the worker thread when hovered; a plain
        // refusal's card is a sentence, quick to write when asked.
        if (result.ok ? isLargeSmiles(result.value) : !result.parts) continue;
        if (cards.known(text, result, options) !== undefined) continue;
        cards.card(text, result, options);
        // One card at a time: a request or an edit that came meanwhile goes first.
        await context.longWork.giveWay();
        if (superseded()) return;
      }
    },
    async warmUp() {
      const options = { angleDecimals: DEFAULT_SETTINGS.angleDecimals, format: context.clientFeatures().hoverFormat };
      for (let round = 0; round < WARM_UP_ROUNDS; round++) {
        const scratch = createHoverCardMemo();
        for (const text of WARM_UP_SPECIES) {
          await context.longWork.giveWay();
          scratch.card(text, analyzeSpecies(text), options);
        }
      }
    },
    viewed(uri, start, end) {
      inView.set(uri, { start, end });
    },
    closed(uri) {
      inView.delete(uri);
      passes.delete(uri);
    },
  };
}

/** The occurrences in the range the editor shows (when known), then one of each distinct species in the document. */
function* occurrencesInViewFirst(analysed: AnalysedDocument, view: TextRange | undefined): Generator<SpeciesOccurrence> {
  if (view) {
    for (const occurrence of analysed.modelAround(view.start, view.end).occurrences) {
      if (occurrence.range.end >= view.start && occurrence.range.start <= view.end) yield occurrence;
    }
  }
  // Tables have none here: their models are read only around the rows asked about.
  yield* analysed.distinctSpecies();
}

function aroundHover(offset: number): TextRange {
  return { start: Math.max(0, offset - HOVER_VIEW_CHARACTERS), end: offset + HOVER_VIEW_CHARACTERS };
}

/** Whether the editor already shows `message` as a problem on `range` (the hover then need not repeat it). */
function isReported(findings: readonly Finding[], range: TextRange, message: string): boolean {
  return findings.some(
    (finding) => finding.range.start === range.start && finding.range.end === range.end && finding.message.includes(message),
  );
}
