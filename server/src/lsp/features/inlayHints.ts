/**
 * Inlay hints: the molecular geometry after each species, e.g. "SF4: seesaw". Only for the
 * range the editor asks for; prose and data files are switched on and off separately.
 */
import { InlayHintKind, type InlayHint, type InlayHintParams } from "vscode-languageserver";
import { HOVER_CAUTION, analyzeOccurrenceSafely } from "../../../../shared/src/index";
import type { DocumentKind, DocumentModel, SpeciesAnalysis, SpeciesOccurrence, TextRange } from "../core";
import { guarded } from "../guardedHandler";
import { offsetRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";
import type { ServerSettings } from "../settings";

const PROSE_KINDS: readonly DocumentKind[] = ["markdown", "plaintext"];

/** Registers the inlay hint handler (only called when the client supports inlay hints). */
export function registerInlayHints(context: ServerContext): void {
  context.connection.languages.inlayHint.on(
    guarded<InlayHintParams, InlayHint[]>(context.log, "inlay hints", [], async (params, token) => {
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled || !hintsWanted(enabled.analysed.kind, enabled.settings)) return [];
      const { document, analysed } = enabled;
      const requested = offsetRange(document, params.range);
      const hints: InlayHint[] = [];
      for (const occurrence of hintedOccurrences(analysed.model)) {
        if (token.isCancellationRequested) return [];
        // Occurrences come in order of their start; a nested one may end before its parent.
        if (occurrence.range.start > requested.end) break;
        if (occurrence.range.end < requested.start || occurrence.range.end > requested.end) continue;
        const result = analyzeOccurrenceSafely(occurrence);
        const label = result.ok ? geometryLabel(result.value) : undefined;
        if (!label) continue;
        hints.push({
          position: document.positionAt(occurrence.range.end),
          label: `: ${label}`,
          kind: InlayHintKind.Type,
          tooltip: HOVER_CAUTION,
        });
      }
      return hints;
    }),
  );
}

function hintsWanted(kind: DocumentKind, settings: ServerSettings): boolean {
  return PROSE_KINDS.includes(kind) ? settings.inlayHints.prose : settings.inlayHints.dataFiles;
}

/**
 * In prose a table's species cells are data and get no hint. In data files only each record's
 * species cell does: a name cell beside the formula would repeat it.
 */
function hintedOccurrences(model: DocumentModel): readonly SpeciesOccurrence[] {
  if (!PROSE_KINDS.includes(model.kind)) return model.records.map((record) => record.species);
  const key = (range: TextRange): string => `${range.start}:${range.end}`;
  const speciesCells = new Set(model.records.map((record) => key(record.species.range)));
  return model.occurrences.filter((occurrence) => !speciesCells.has(key(occurrence.range)));
}

/** "seesaw" for one centre; "C: tetrahedral, O: bent" when the centres differ. */
export function geometryLabel(analysis: SpeciesAnalysis): string | undefined {
  const labels: string[] = [];
  for (const centre of analysis.centres) {
    const label = `${centre.atom}: ${centre.molecularGeometry}`;
    if (!labels.includes(label)) labels.push(label);
  }
  if (labels.length === 0) return undefined;
  const geometries = new Set(analysis.centres.map((centre) => centre.molecularGeometry));
  return geometries.size === 1 ? analysis.centres[0].molecularGeometry : labels.join(", ");
}
