/**
 * Hover: the species under the cursor, found among the model's occurrences, shown as a card.
 */
import { MarkupKind, type Hover, type HoverParams } from "vscode-languageserver";
import { analyzeOccurrenceSafely, reactionAtOffset, reactionCard, resultMarkdown } from "../../../../shared/src/index";
import type { Finding, TextRange } from "../core";
import { guarded } from "../guardedHandler";
import { isLargeSmiles, type OffThreadSpecies } from "../offThreadSpecies";
import { lspRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";

/** Registers the hover handler. */
export function registerHover(context: ServerContext, offThread: OffThreadSpecies): void {
  context.connection.onHover(
    guarded<HoverParams, Hover | null>(context.log, "hover", null, async (params, token) => {
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled) return null;
      const { document, analysed, settings } = enabled;
      const offset = document.offsetAt(params.position);
      // The card is written in the format the client asked for, not merely labelled with it.
      const format = context.clientFeatures().hoverFormat;
      // Read from the rows or blocks around the position, not the whole model.
      const reaction = reactionAtOffset(analysed.modelAround(offset, offset), offset);
      if (reaction) {
        return {
          contents: { kind: format === "markdown" ? MarkupKind.Markdown : MarkupKind.PlainText, value: reactionCard(reaction, format) },
          range: lspRange(document, reaction.arrow.range),
        };
      }
      const species = analysed.speciesAt(offset);
      if (!species) return null;
      const result = species.analysis;
      const options = { angleDecimals: settings.angleDecimals, format };
      // A large SMILES species' card (its polarity needs the 3D model) is written on a worker
      // thread, so that other requests are answered meanwhile.
      const answer =
        result.ok && isLargeSmiles(result.value)
          ? await offThread.run({ kind: "card", smiles: result.value.reading.text, options }, token)
          : undefined;
      if (answer?.kind === "cancelled") return null;
      const written = answer?.kind === "done" ? answer.value : undefined;
      const alsoAProblem =
        !result.ok && isReported(analysed.findingsAround(species.range.start, species.range.end), species.range, result.problem.message);
      const value = written ?? resultMarkdown(species.text, result, options, { alsoAProblem });
      return {
        contents: { kind: format === "markdown" ? MarkupKind.Markdown : MarkupKind.PlainText, value },
        range: lspRange(document, species.range),
      };
    }),
  );
}

/** Distinct species whose cards are written ahead of hovers, per document version. */
const PREPARED_CARDS_LIMIT = 2000;
/** How long card preparation runs before it lets requests in. */
const PREPARE_SLICE_MS = 4;

/**
 * Writes, a few at a time between other requests, the hover card of each distinct species of a
 * document whose analysis is done, so that the first hover on a species costs no more than the
 * next (the card's 3D model is remembered with its analysis). `prepared` holds the species done
 * for this document already. Tables are left out: their models are read only around the rows
 * asked about. Gives up as soon as `stale()` says the text changed.
 */
export async function prepareHoverCards(context: ServerContext, uri: string, prepared: Set<string>, stale: () => boolean): Promise<void> {
  const enabled = await enabledDocument(context, uri);
  if (!enabled) return;
  const options = { angleDecimals: enabled.settings.angleDecimals, format: context.clientFeatures().hoverFormat };
  let sliceStart = performance.now();
  for (const occurrence of enabled.analysed.distinctSpecies()) {
    if (prepared.size >= PREPARED_CARDS_LIMIT) return;
    if (prepared.has(occurrence.text)) continue;
    prepared.add(occurrence.text);
    const result = analyzeOccurrenceSafely(occurrence);
    // Large SMILES species get their cards on the worker thread when hovered.
    if (!result.ok || isLargeSmiles(result.value)) continue;
    resultMarkdown(occurrence.text, result, options, { alsoAProblem: false });
    if (performance.now() - sliceStart < PREPARE_SLICE_MS) continue;
    await new Promise((resolve) => setImmediate(resolve));
    if (stale()) return;
    sliceStart = performance.now();
  }
}

/** Whether the editor already shows `message` as a problem on `range` (the hover then need not repeat it). */
function isReported(findings: readonly Finding[], range: TextRange, message: string): boolean {
  return findings.some(
    (finding) => finding.range.start === range.start && finding.range.end === range.end && finding.message.includes(message),
  );
}
