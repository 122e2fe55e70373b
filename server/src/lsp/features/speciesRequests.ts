/**
 * The custom requests that give any LSP editor what the VS Code client shows: the species at a
 * position, its 3D view model, its model coordinates as a file, a document's counts for a status
 * line, and the check of a file's text that is not open. Every decision is the core's; this file
 * only turns positions into offsets and back.
 */
import { TextDocument } from "vscode-languageserver-textdocument";
import {
  CHECK_TEXT_METHOD,
  COORDINATES_METHOD,
  DOCUMENT_SUMMARY_METHOD,
  SHAPE_MODEL_METHOD,
  SPECIES_AT_METHOD,
  documentKindFor,
  type CheckTextParams,
  type CheckTextResult,
  type CoordinatesParams,
  type CoordinatesResult,
  type DocumentSummaryResult,
  type EditorPosition,
  type ShapeModelResult,
  type SpeciesAtOffset,
  type SpeciesAtParams,
  type SpeciesAtResult,
  shownFindings,
} from "../../../../shared/src/index";
import { analyseDocument, fileNameOf, SNIFF_LENGTH, type AnalysedDocument } from "../documentCache";
import { guarded } from "../guardedHandler";
import { lspRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";
import { diagnosticsOf } from "./diagnostics";
import { isLargeSmiles, type OffThreadWork } from "../offThreadWork";
import { coordinatesAnswer, shapeModelAnswer } from "../speciesModelAnswers";

/** Registers the five requests. */
export function registerSpeciesRequests(context: ServerContext, offThread: OffThreadWork): void {
  const { connection, log } = context;
  connection.onRequest(
    SPECIES_AT_METHOD,
    guarded<unknown, SpeciesAtResult | null>(log, "species at position", null, async (params) => {
      const found = await speciesAt(context, params);
      return found ? describe(found.document, found.species) : null;
    }),
  );
  connection.onRequest(
    SHAPE_MODEL_METHOD,
    guarded<unknown, ShapeModelResult | null>(log, "shape model", null, async (params, token) => {
      const found = await speciesAt(context, params);
      if (!found) return null;
      const described = describe(found.document, found.species);
      if (!found.species.analysis.ok) return described;
      const analysis = found.species.analysis.value;
      // A large species' model takes a while to build: on the worker, so other requests go on.
      const answer = isLargeSmiles(analysis)
        ? await offThread.run({ kind: "shapeModel", smiles: analysis.reading.text }, token)
        : undefined;
      if (answer?.kind === "cancelled") return null;
      return { ...described, ...((answer?.kind === "done" ? answer.value : undefined) ?? shapeModelAnswer(analysis)) };
    }),
  );
  connection.onRequest(
    COORDINATES_METHOD,
    guarded<unknown, CoordinatesResult | null>(log, "coordinates", null, async (params, token) => {
      const format = (params as Partial<CoordinatesParams> | null)?.format;
      if (format !== "xyz" && format !== "molfile") return null;
      const found = await speciesAt(context, params);
      if (!found) return null;
      const described = describe(found.document, found.species);
      if (!found.species.analysis.ok) return described;
      const analysis = found.species.analysis.value;
      const answer = isLargeSmiles(analysis)
        ? await offThread.run({ kind: "coordinates", smiles: analysis.reading.text, format }, token)
        : undefined;
      if (answer?.kind === "cancelled") return null;
      return { ...described, ...((answer?.kind === "done" ? answer.value : undefined) ?? coordinatesAnswer(analysis, format)) };
    }),
  );
  connection.onRequest(
    DOCUMENT_SUMMARY_METHOD,
    guarded<unknown, DocumentSummaryResult | null>(log, "document summary", null, async (params, token) => {
      const uri = documentUri(params);
      if (uri === undefined) return null;
      // Counted a part at a time, letting other requests in; a newer text starts the count again.
      for (;;) {
        const enabled = await enabledDocument(context, uri);
        if (!enabled) return null;
        const { analysed } = enabled;
        const stale = (): boolean => token.isCancellationRequested || context.cache.revisionOf(uri) !== analysed.revision;
        const counts = await countsInSlices(analysed, stale, context);
        if (token.isCancellationRequested) return null;
        if (!counts) continue;
        return {
          version: analysed.version,
          ...counts,
          ...(analysed.truncatedAt !== undefined ? { checkedLength: analysed.truncatedAt } : {}),
        };
      }
    }),
  );
  connection.onRequest(
    CHECK_TEXT_METHOD,
    guarded<unknown, CheckTextResult>(log, "check text", { diagnostics: [] }, async (params) => checkText(context, params)),
  );
}

/** How long the counts are worked out before other requests are let in. */
const COUNT_SLICE_MS = 8;

/**
 * A document's species mentions and findings, counted a part at a time (a large table is never
 * read whole into one model), letting other requests in every few milliseconds; undefined once
 * `stale()` says the text changed or the request was cancelled.
 */
async function countsInSlices(
  analysed: AnalysedDocument,
  stale: () => boolean,
  { longWork, wholeReadings }: Pick<ServerContext, "longWork" | "wholeReadings">,
): Promise<{ species: number; problems: number } | undefined> {
  let sliceStart = performance.now();
  const giveWay = async (): Promise<boolean> => {
    // A broken text waits for its whole reading on the worker, shared with its diagnostics.
    if (analysed.wholeReadWanted() && !(await wholeReadings.settle(analysed, stale))) return false;
    if (performance.now() - sliceStart < COUNT_SLICE_MS) return true;
    await longWork.giveWay();
    sliceStart = performance.now();
    return !stale();
  };
  let problems = 0;
  for (const part of analysed.findingParts()) {
    problems += part.findings.length;
    if (!(await giveWay())) return undefined;
  }
  const steps = analysed.speciesCount();
  for (;;) {
    const step = steps.next();
    if (step.done) return { species: step.value, problems };
    if (!(await giveWay())) return undefined;
  }
}

/** The open document and the species at the asked position, or undefined. */
export async function speciesAt(
  context: ServerContext,
  params: unknown,
): Promise<{ document: TextDocument; species: SpeciesAtOffset } | undefined> {
  const candidate = params as Partial<SpeciesAtParams> | null;
  const uri = documentUri(params);
  if (uri === undefined || !isPosition(candidate?.position)) return undefined;
  const enabled = await enabledDocument(context, uri);
  if (!enabled) return undefined;
  const species = enabled.analysed.speciesAt(enabled.document.offsetAt(candidate.position));
  return species ? { document: enabled.document, species } : undefined;
}

export function describe(document: TextDocument, species: SpeciesAtOffset): SpeciesAtResult {
  const range = lspRange(document, species.range);
  return species.analysis.ok
    ? { text: species.text, range, formula: species.analysis.value.reading.formula }
    : { text: species.text, range, problem: { code: species.analysis.problem.code, message: species.analysis.problem.message } };
}

/** The diagnostics the file would get were it open, with the settings of its URI. */
async function checkText(context: ServerContext, params: unknown): Promise<CheckTextResult> {
  const candidate = params as Partial<CheckTextParams> | null;
  if (typeof candidate?.uri !== "string" || typeof candidate.text !== "string") return { diagnostics: [] };
  const languageId = typeof candidate.languageId === "string" ? candidate.languageId : "";
  const kind = documentKindFor(fileNameOf(candidate.uri), languageId, candidate.text.slice(0, SNIFF_LENGTH));
  if (!kind) return { diagnostics: [] };
  const settings = await context.settings.forUri(candidate.uri);
  if (!settings.enabledLanguages.includes(kind)) return { diagnostics: [] };
  const document = TextDocument.create(candidate.uri, languageId, 0, candidate.text);
  const diagnostics = diagnosticsOf(document, shownFindings(analyseDocument(document, kind, 0).findings(), settings.diagnostics.notesAs));
  return { diagnostics: diagnostics.map((diagnostic) => ({ ...diagnostic, message: String(diagnostic.message) })) };
}

/**
 * The document a request names: `uri`, or `textDocument.uri` as in the protocol's own position
 * parameters (what editors' helpers such as Neovim's `make_position_params` build).
 */
export function documentUri(params: unknown): string | undefined {
  const candidate = params as { uri?: unknown; textDocument?: { uri?: unknown } } | null;
  if (typeof candidate?.uri === "string") return candidate.uri;
  return typeof candidate?.textDocument?.uri === "string" ? candidate.textDocument.uri : undefined;
}

function isPosition(value: unknown): value is EditorPosition {
  const position = value as EditorPosition | null | undefined;
  return (
    typeof position === "object" &&
    position !== null &&
    Number.isInteger(position.line) &&
    Number.isInteger(position.character) &&
    position.line >= 0 &&
    position.character >= 0
  );
}
