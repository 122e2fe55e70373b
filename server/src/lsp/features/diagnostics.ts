/**
 * Diagnostics: the core's findings as protocol diagnostics. Pulled when the client supports
 * `textDocument/diagnostic`, otherwise pushed after a short pause in typing, and only for the
 * version they were computed from.
 */
import {
  DiagnosticSeverity,
  DocumentDiagnosticReportKind,
  type Diagnostic,
  type DocumentDiagnosticParams,
  type DocumentDiagnosticReport,
} from "vscode-languageserver";
import type { TextDocument } from "vscode-languageserver-textdocument";
import { moved, READ_WHOLE_ELSEWHERE_FROM, shownParts, type FindingPart } from "../../../../shared/src/index";
import type { Finding, FindingSeverity } from "../core";
import type { AnalysedDocument } from "../documentCache";
import { guarded } from "../guardedHandler";
import type { WholeReadings } from "../wholeReadings";
import type { LongWork } from "../quickRequests";
import { lspRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";

/** Every diagnostic carries this source, so users can filter and quick fixes can match. */
export const DIAGNOSTIC_SOURCE = "lonepair";

/**
 * How long typing must pause before pushed diagnostics are recomputed, whatever the document's
 * size: an edit to a large table re-checks only the rows it changed.
 */
const PUSH_DELAY_MS = 15;

const SEVERITIES: Readonly<Record<FindingSeverity, DiagnosticSeverity>> = {
  error: DiagnosticSeverity.Error,
  warning: DiagnosticSeverity.Warning,
  information: DiagnosticSeverity.Information,
  hint: DiagnosticSeverity.Hint,
};

/** Converts findings of `document` into diagnostics. */
export function diagnosticsOf(document: TextDocument, findings: readonly Finding[]): Diagnostic[] {
  return findings.map((finding) => ({
    range: lspRange(document, finding.range),
    severity: SEVERITIES[finding.severity] ?? DiagnosticSeverity.Information,
    source: DIAGNOSTIC_SOURCE,
    code: finding.code,
    message: finding.message,
  }));
}

/** What the rest of the server tells the diagnostics feature. */
export interface DiagnosticsFeature {
  /** A document was opened or changed. */
  documentChanged(uri: string): void;
  documentClosed(uri: string): void;
  /** Settings changed: everything may need recomputing. */
  settingsChanged(): void;
}

/**
 * Work to do once a document's diagnostics are out (hover cards written ahead); it gives up when
 * `stale()` says the text changed.
 */
export type AfterDiagnostics = (uri: string, stale: () => boolean) => Promise<void>;

/**
 * How long a text must stay unchanged before the work after its diagnostics starts: while the
 * user types, each edit's diagnostics come first, and cards are written in the pause after.
 */
const QUIET_MS = 200;

/** Runs `after` once the text has stayed as it is for `QUIET_MS`; nothing if it changed. */
function afterQuiet(after: AfterDiagnostics, uri: string, stale: () => boolean): void {
  setTimeout(() => {
    if (!stale()) after(uri, stale).catch(() => undefined);
  }, QUIET_MS);
}

/**
 * Registers pull diagnostics or sets up pushing, depending on the client. Work that cannot be cut
 * into slices (the whole reading of a large broken JSON or YAML list) goes to `wholeReadings`.
 */
export function registerDiagnostics(
  context: ServerContext,
  after: AfterDiagnostics = () => Promise.resolve(),
  wholeReadings?: WholeReadings,
): DiagnosticsFeature {
  const slices: Slices = { longWork: context.longWork, wholeReadings };
  return context.clientFeatures().pullDiagnostics ? registerPull(context, after, slices) : registerPush(context, after, slices);
}

/** How diagnostics are worked out without holding up other requests. */
export interface Slices {
  readonly longWork: LongWork;
  readonly wholeReadings?: WholeReadings;
}

/**
 * The diagnostics of a document's current text, at most `maxPerDocument` plus one summary.
 * Worked out in slices, so hovers are answered meanwhile; a newer text restarts the work (what
 * was done is kept for it), and `cancelled` gives up.
 */
async function currentDiagnostics(
  context: ServerContext,
  uri: string,
  slices: Slices,
  cancelled: () => boolean = () => false,
): Promise<{ version: number; revision: number; items: Diagnostic[] } | undefined> {
  while (!cancelled()) {
    const enabled = await enabledDocument(context, uri);
    if (!enabled) return undefined;
    const { document, analysed, settings } = enabled;
    const limit = settings.diagnostics.maxPerDocument;
    const stop = (): boolean => cancelled() || context.cache.revisionOf(uri) !== analysed.revision;
    const shown = shownParts(analysed.findingParts(), settings.diagnostics.notesAs);
    const parts = await partsInSlices(analysed, shown, limit, stop, slices);
    if (!parts) continue;
    // A large list may be broken by the next keystroke: its reader is loaded ahead, while the editor is quiet.
    if ((analysed.kind === "json" || analysed.kind === "yaml") && document.chunked.length >= READ_WHOLE_ELSEWHERE_FROM)
      slices.wholeReadings?.warm();
    const items = diagnosticsOf(document, cappedFindings(parts, limit));
    return { version: document.version, revision: analysed.revision, items };
  }
  return undefined;
}

/** How long diagnostics are worked out before other requests are let in. */
const SLICE_MS = 8;

/**
 * Reads `parts` (of `analysed`'s findings) as far as `cappedFindings` will (up to one non-empty
 * part after the cap's worth of errors), letting other requests in every few milliseconds, and
 * reading a broken text whole on the worker thread when `analysed` asks for that; undefined once
 * `stop()` says so.
 */
export async function partsInSlices(
  analysed: AnalysedDocument,
  parts: Iterable<FindingPart>,
  limit: number,
  stop: () => boolean,
  { longWork, wholeReadings }: Slices,
): Promise<FindingPart[] | undefined> {
  const taken: FindingPart[] = [];
  let errors = 0;
  let sliceStart = performance.now();
  for (const part of parts) {
    if (wholeReadings && analysed.wholeReadWanted() && !(await wholeReadings.settle(analysed, stop))) return undefined;
    taken.push(part);
    if (errors >= limit && part.findings.length > 0) break;
    for (const finding of part.findings) if (finding.severity === "error") errors++;
    if (performance.now() - sliceStart < SLICE_MS) continue;
    await longWork.giveWay();
    if (stop()) return undefined;
    sliceStart = performance.now();
  }
  return taken;
}

const SEVERITY_RANK: Readonly<Record<FindingSeverity, number>> = { error: 0, warning: 1, information: 2, hint: 3 };

/**
 * Keeps the `limit` most serious findings (earlier first among equals), in document order, and
 * adds one finding that says how many were left out, at the first of them. A document full of
 * impossible species must not become a message of many megabytes sent on every pause in typing.
 * `parts` are the findings in document order, a part at a time, each counted from its offset:
 * at most `limit` of each severity are held (and only those are moved into place), and once
 * `limit` errors are in hand nothing later could be shown, so the rest of the document is not
 * worked out and the summary gives the count found so far as a lower bound.
 */
export function cappedFindings(parts: Iterable<FindingPart>, limit: number): readonly Finding[] {
  const keptByRank: { finding: Finding; order: number }[][] = [[], [], [], []];
  const firstDropped: (Finding | undefined)[] = [];
  let dropped = 0;
  let order = 0;
  let stoppedEarly = false;
  for (const { findings, offset } of parts) {
    if (keptByRank[0].length >= limit) {
      // Errors rank first and the earliest win: whatever comes later is left out whatever it is.
      // One more part says that there is more; the rest of the document is not worked out.
      if (findings.length === 0) continue;
      dropped += findings.length;
      firstDropped[rankOf(findings[0])] ??= moved(findings[0], offset);
      stoppedEarly = true;
      break;
    }
    for (const finding of findings) {
      const rank = rankOf(finding);
      const kept = keptByRank[rank];
      if (kept.length < limit) kept.push({ finding: offset === 0 ? finding : moved(finding, offset), order: order++ });
      else {
        dropped++;
        firstDropped[rank] ??= moved(finding, offset);
      }
    }
  }
  const ranked = keptByRank.flat();
  if (ranked.length <= limit && dropped === 0) return ranked.sort((a, b) => a.order - b.order).map((entry) => entry.finding);
  const shown = ranked.slice(0, limit).sort((a, b) => a.finding.range.start - b.finding.range.start || a.order - b.order);
  const cut = ranked.slice(limit).map((entry) => entry.finding);
  // The most serious left out: the first cut one (ranked first), or a dropped one of a higher rank.
  const leftOut = [...cut, ...firstDropped.filter((finding): finding is Finding => finding !== undefined)];
  const mostSerious = leftOut.reduce((best, finding) => (rankOf(finding) < rankOf(best) ? finding : best), leftOut[0]);
  const firstStart = Math.min(...leftOut.map((finding) => finding.range.start));
  const count = (cut.length + dropped).toLocaleString("en-US");
  const summary: Finding = {
    range: { start: firstStart, end: firstStart },
    severity: mostSerious.severity === "error" || mostSerious.severity === "warning" ? "warning" : "information",
    code: "diagnostics-limit-reached",
    message:
      `${stoppedEarly ? `At least ${count}` : count} more problems in this document are not shown: ` +
      `lonepair shows at most ${limit.toLocaleString("en-US")} per document (setting lonepair.diagnostics.maxPerDocument)` +
      (stoppedEarly ? ", and stops looking once it has that many errors." : "."),
  };
  return [...shown.map((entry) => entry.finding), summary];
}

function rankOf(finding: Finding): number {
  return SEVERITY_RANK[finding.severity] ?? SEVERITY_RANK.information;
}

function registerPull(context: ServerContext, after: AfterDiagnostics, slices: Slices): DiagnosticsFeature {
  const empty: DocumentDiagnosticReport = { kind: DocumentDiagnosticReportKind.Full, items: [] };
  // The result depends only on the text (its revision) and the settings; both are in the id.
  const resultIdOf = (revision: number): string => `${revision}:${context.settings.generation}`;
  context.connection.languages.diagnostics.on(
    guarded<DocumentDiagnosticParams, DocumentDiagnosticReport>(context.log, "diagnostics", empty, async (params, token) => {
      const uri = params.textDocument.uri;
      if (!context.documents.get(uri)) return empty;
      const resultId = resultIdOf(context.cache.revisionOf(uri));
      if (params.previousResultId === resultId) return { kind: DocumentDiagnosticReportKind.Unchanged, resultId };
      const current = await currentDiagnostics(context, uri, slices, () => token.isCancellationRequested);
      if (!current) return empty;
      // Once the answer has gone out, hover cards are written while the editor is quiet.
      afterQuiet(after, uri, () => context.cache.revisionOf(uri) !== current.revision);
      return { kind: DocumentDiagnosticReportKind.Full, resultId: resultIdOf(current.revision), items: current.items };
    }),
  );
  return {
    documentChanged: () => undefined,
    documentClosed: () => undefined,
    settingsChanged() {
      if (context.clientFeatures().diagnosticRefresh) {
        context.connection.languages.diagnostics.refresh().catch(() => undefined);
      }
    },
  };
}

function registerPush(context: ServerContext, after: AfterDiagnostics, slices: Slices): DiagnosticsFeature {
  const timers = new Map<string, NodeJS.Timeout>();

  const publish = async (uri: string): Promise<void> => {
    timers.delete(uri);
    if (!context.documents.get(uri)) return;
    const requestedRevision = context.cache.revisionOf(uri);
    try {
      // A newer text has its own publication scheduled: give this one up.
      const current = await currentDiagnostics(context, uri, slices, () => context.cache.revisionOf(uri) !== requestedRevision);
      // A newer text or a close wins over this result: it is stale, drop it.
      const now = context.documents.get(uri);
      if (!now || context.cache.revisionOf(uri) !== requestedRevision) return;
      if (current && current.revision !== requestedRevision) return;
      await context.connection.sendDiagnostics({ uri, version: now.version, diagnostics: current?.items ?? [] });
      afterQuiet(after, uri, () => context.cache.revisionOf(uri) !== requestedRevision);
    } catch (error) {
      context.log.error(`lonepair: diagnostics for ${uri} failed: ${String(error)}`);
    }
  };

  const schedule = (uri: string): void => {
    clearTimeout(timers.get(uri));
    timers.set(
      uri,
      setTimeout(() => void publish(uri), PUSH_DELAY_MS),
    );
  };

  return {
    documentChanged: schedule,
    documentClosed(uri) {
      clearTimeout(timers.get(uri));
      timers.delete(uri);
      context.connection.sendDiagnostics({ uri, diagnostics: [] }).catch(() => undefined);
    },
    settingsChanged() {
      for (const document of context.documents.all()) schedule(document.uri);
    },
  };
}
