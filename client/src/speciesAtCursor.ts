/**
 * The species under the cursor and its analysis: asked of the server with `lonepair/speciesAt`,
 * or read with the bundled core while the server does not answer that request.
 */
import * as vscode from "vscode";
import type { LanguageClient } from "vscode-languageclient/node";
import { analyzeReading, analyzeSpecies, type AnalysisResult } from "./core";
import { localDocumentModel } from "./localDocumentModel";
import { speciesAtRequest } from "./protocol";
import { serverOrLocal } from "./serverOrLocal";

/** A species mention and what the core makes of it. */
export interface SpeciesAtCursor {
  /** The text exactly as written in the document. */
  readonly text: string;
  readonly range: vscode.Range;
  readonly analysis: AnalysisResult;
}

/** The species covering `position` (touching either end counts), or undefined. */
export async function speciesAtCursor(
  client: LanguageClient,
  document: vscode.TextDocument,
  position: vscode.Position,
  token?: vscode.CancellationToken,
): Promise<SpeciesAtCursor | undefined> {
  return serverOrLocal(
    speciesAtRequest.method,
    async () => {
      const found = await client.sendRequest(
        speciesAtRequest,
        { uri: document.uri.toString(), position: client.code2ProtocolConverter.asPosition(position) },
        token,
      );
      if (!found) return undefined;
      return { text: found.text, range: client.protocol2CodeConverter.asRange(found.range), analysis: analyzeSpecies(found.text) };
    },
    () => localSpeciesAt(document, position),
  );
}

function localSpeciesAt(document: vscode.TextDocument, position: vscode.Position): SpeciesAtCursor | undefined {
  const model = localDocumentModel(document);
  if (!model) return undefined;
  const offset = document.offsetAt(position);
  const occurrence = model.occurrences.find((item) => item.range.start <= offset && offset <= item.range.end);
  if (occurrence) {
    return { text: occurrence.text, range: rangeOf(document, occurrence.range), analysis: analysisOf(occurrence.reading) };
  }
  const unreadable = model.unreadable?.find((item) => item.range.start <= offset && offset <= item.range.end);
  if (unreadable) return { text: unreadable.text, range: rangeOf(document, unreadable.range), analysis: { ok: false, problem: unreadable.problem } };
  return undefined;
}

function analysisOf(reading: Parameters<typeof analyzeReading>[0]): AnalysisResult {
  try {
    return analyzeReading(reading);
  } catch (error) {
    // The core promises not to throw; if it does, this one species fails, not the command.
    return { ok: false, reading, problem: { code: "no-valid-structure", message: `internal error: ${String(error)}` } };
  }
}

function rangeOf(document: vscode.TextDocument, range: { start: number; end: number }): vscode.Range {
  return new vscode.Range(document.positionAt(range.start), document.positionAt(range.end));
}
