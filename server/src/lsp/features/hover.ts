/**
 * Hover: the species under the cursor, found among the model's occurrences, shown as a card.
 */
import { MarkupKind, type Hover, type HoverParams } from "vscode-languageserver";
import { analyzeOccurrenceSafely, hoverMarkdown, occurrenceAt, problemMarkdown } from "../../../../shared/src/index";
import { guarded } from "../guardedHandler";
import { lspRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";

/** Registers the hover handler. */
export function registerHover(context: ServerContext): void {
  context.connection.onHover(
    guarded<HoverParams, Hover | null>(context.log, "hover", null, async (params) => {
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled) return null;
      const { document, analysed, settings } = enabled;
      const occurrence = occurrenceAt(analysed.model.occurrences, document.offsetAt(params.position));
      if (!occurrence) return null;
      const result = analyzeOccurrenceSafely(occurrence);
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
