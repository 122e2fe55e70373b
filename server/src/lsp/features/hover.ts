/**
 * Hover: the species under the cursor, found among the model's occurrences, shown as a card.
 */
import { MarkupKind, type Hover, type HoverParams } from "vscode-languageserver";
import { hoverMarkdown, problemMarkdown } from "../../../../shared/src/index";
import type { SpeciesOccurrence } from "../core";
import { guarded } from "../guardedHandler";
import { lspRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";
import { analysisOf } from "../speciesAnalyses";

/** Registers the hover handler. */
export function registerHover(context: ServerContext): void {
  context.connection.onHover(
    guarded<HoverParams, Hover | null>(context.log, "hover", null, async (params) => {
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled) return null;
      const { document, analysed, settings } = enabled;
      const occurrence = occurrenceUnderCursor(analysed.model.occurrences, document.offsetAt(params.position));
      if (!occurrence) return null;
      const result = analysisOf(occurrence);
      // The card is written in the format the client asked for, not merely labelled with it.
      const format = context.clientFeatures().hoverFormat;
      const value = result.ok
        ? hoverMarkdown(result.value, { angleDecimals: settings.angleDecimals, format })
        : problemMarkdown(occurrence.text, result.problem.message, format);
      return {
        contents: { kind: format === "markdown" ? MarkupKind.Markdown : MarkupKind.PlainText, value },
        range: lspRange(document, occurrence.range),
      };
    }),
  );
}

/** The narrowest occurrence containing the offset; the cursor just after a species counts. */
export function occurrenceUnderCursor(occurrences: readonly SpeciesOccurrence[], offset: number): SpeciesOccurrence | undefined {
  let best: SpeciesOccurrence | undefined;
  for (const occurrence of occurrences) {
    if (occurrence.range.start > offset) break;
    if (offset > occurrence.range.end) continue;
    if (!best || occurrence.range.end - occurrence.range.start < best.range.end - best.range.start) best = occurrence;
  }
  return best;
}
