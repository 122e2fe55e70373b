/**
 * Summary table: a geometry table of the species in a document or a range, as markdown or
 * CSV. Reachable as the command `lonepair.summaryTable` and as the request `lonepair/summaryTable`.
 */
import { RequestType, type ExecuteCommandParams } from "vscode-languageserver";
import {
  SUMMARY_TABLE_METHOD,
  createSummaryCollector,
  summaryTable,
  type SummaryFormat,
  type SummaryTableParams,
  type SummaryTableResult,
  type EditorRange,
} from "../../../../shared/src/index";
import { guarded } from "../guardedHandler";
import { offsetRange, rangesTouch } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";

/** The command name, also listed in `executeCommandProvider`. */
export const SUMMARY_TABLE_COMMAND = "lonepair.summaryTable";

export const summaryTableRequest = new RequestType<SummaryTableParams, SummaryTableResult, void>(SUMMARY_TABLE_METHOD);

const EMPTY: SummaryTableResult = { text: "" };

/** Registers the request; the command is dispatched by `main.ts` through `summaryTableFor`. */
export function registerSummaryTable(context: ServerContext): void {
  context.connection.onRequest(
    summaryTableRequest,
    guarded<SummaryTableParams, SummaryTableResult>(context.log, "summary table", EMPTY, (params) => summaryTableFor(context, params)),
  );
}

/** Handles `workspace/executeCommand` for the summary table command. */
export function summaryTableCommand(context: ServerContext) {
  return guarded<ExecuteCommandParams, SummaryTableResult>(context.log, "summary table command", EMPTY, (params) => {
    const [argument] = params.arguments ?? [];
    return summaryTableFor(context, argument as SummaryTableParams);
  });
}

/** Builds the table for checked parameters; anything malformed gives an empty text. */
export async function summaryTableFor(context: ServerContext, params: unknown): Promise<SummaryTableResult> {
  if (!isParams(params)) return EMPTY;
  const enabled = await enabledDocument(context, params.uri);
  if (!enabled) return EMPTY;
  const { document, analysed, settings } = enabled;
  const requested = params.range ? offsetRange(document, params.range) : undefined;
  const collected = createSummaryCollector();
  for (const occurrence of analysed.model.occurrences) {
    if (!requested || rangesTouch(occurrence.range, requested)) collected.addOccurrence(occurrence);
  }
  const format = params.format ?? defaultFormat(analysed.kind);
  const text = summaryTable({
    analyses: collected.analyses,
    unanalysed: collected.unanalysed,
    columns: settings.summaryTable.columns,
    format,
    angleDecimals: settings.angleDecimals,
  });
  return { text, format };
}

/** A table in the document's own format: rows for CSV and TSV files, a markdown table elsewhere. */
function defaultFormat(kind: string): SummaryFormat {
  return kind === "csv" ? "csv" : kind === "tsv" ? "tsv" : "markdown";
}

function isParams(value: unknown): value is SummaryTableParams {
  if (typeof value !== "object" || value === null) return false;
  const candidate = value as Record<string, unknown>;
  if (typeof candidate.uri !== "string") return false;
  if (candidate.range !== undefined && !isRange(candidate.range)) return false;
  return candidate.format === undefined || candidate.format === "markdown" || candidate.format === "csv" || candidate.format === "tsv";
}

function isRange(value: unknown): value is EditorRange {
  const range = value as EditorRange | null;
  return (
    typeof range === "object" &&
    range !== null &&
    Number.isInteger(range.start?.line) &&
    Number.isInteger(range.start?.character) &&
    Number.isInteger(range.end?.line) &&
    Number.isInteger(range.end?.character)
  );
}
