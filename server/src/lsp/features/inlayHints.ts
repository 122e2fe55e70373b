/**
 * Inlay hints: the molecular geometry after each species, e.g. "SF4: seesaw". Only for the
 * range the editor asks for; prose and data files are switched on and off separately. Which
 * hints to show is the core's decision (`geometryHints`).
 */
import { InlayHintKind, type InlayHint, type InlayHintParams } from "vscode-languageserver";
import { HOVER_CAUTION, geometryHints, isProseKind, type DocumentKind } from "../../../../shared/src/index";
import { guarded } from "../guardedHandler";
import { offsetRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";
import type { HoverFeature } from "./hover";
import type { ServerSettings } from "../settings";

/**
 * Registers the inlay hint handler (only called when the client supports inlay hints). The range
 * asked for is the part of the document in view, which `view` is told of.
 */
export function registerInlayHints(context: ServerContext, view?: Pick<HoverFeature, "viewed">): void {
  context.connection.languages.inlayHint.on(
    guarded<InlayHintParams, InlayHint[]>(context.log, "inlay hints", [], async (params, token) => {
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled) return [];
      const { document, analysed } = enabled;
      const range = offsetRange(document, params.range);
      view?.viewed(document.uri, range.start, range.end);
      if (!hintsWanted(analysed.kind, enabled.settings)) return [];
      const hints = geometryHints(
        document.getText(),
        analysed.modelAround(range.start, range.end),
        range,
        () => token.isCancellationRequested,
      );
      return hints.map((hint) => ({
        position: document.positionAt(hint.offset),
        label: `: ${hint.label}`,
        kind: InlayHintKind.Type,
        tooltip: HOVER_CAUTION,
      }));
    }),
  );
}

function hintsWanted(kind: DocumentKind, settings: ServerSettings): boolean {
  return isProseKind(kind) ? settings.inlayHints.prose : settings.inlayHints.dataFiles;
}
