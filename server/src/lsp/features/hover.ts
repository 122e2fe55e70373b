/**
 * Hover: the species under the cursor, found among the model's occurrences, shown as a card.
 */
import { MarkupKind, type Hover, type HoverParams } from "vscode-languageserver";
import { resultMarkdown, speciesAtOffset } from "../../../../shared/src/index";
import type { Finding, TextRange } from "../core";
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
      const species = speciesAtOffset(analysed.model, document.offsetAt(params.position));
      if (!species) return null;
      const result = species.analysis;
      // The card is written in the format the client asked for, not merely labelled with it.
      const format = context.clientFeatures().hoverFormat;
      const alsoAProblem = !result.ok && isReported(analysed.findings(), species.range, result.problem.message);
      const value = resultMarkdown(species.text, result, { angleDecimals: settings.angleDecimals, format }, { alsoAProblem });
      return {
        contents: { kind: format === "markdown" ? MarkupKind.Markdown : MarkupKind.PlainText, value },
        range: lspRange(document, species.range),
      };
    }),
  );
}

/** Whether the editor already shows `message` as a problem on `range` (the hover then need not repeat it). */
function isReported(findings: readonly Finding[], range: TextRange, message: string): boolean {
  return findings.some((finding) => finding.range.start === range.start && finding.range.end === range.end && finding.message.includes(message));
}
