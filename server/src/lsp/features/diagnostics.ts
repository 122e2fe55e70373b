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
import type { Finding, FindingSeverity } from "../core";
import { guarded } from "../guardedHandler";
import { lspRange } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";

/** Every diagnostic carries this source, so users can filter and quick fixes can match. */
export const DIAGNOSTIC_SOURCE = "lonepair";

/**
 * How long typing must pause before pushed diagnostics are recomputed, whatever the document's
 * size: an edit to a large table re-checks only the rows it changed.
 */
const PUSH_DELAY_MS = 50;

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

/** Registers pull diagnostics or sets up pushing, depending on the client. */
export function registerDiagnostics(context: ServerContext): DiagnosticsFeature {
  return context.clientFeatures().pullDiagnostics ? registerPull(context) : registerPush(context);
}

/** The diagnostics of a document's current text, at most `maxPerDocument` plus one summary. */
async function currentDiagnostics(
  context: ServerContext,
  uri: string,
): Promise<{ version: number; revision: number; items: Diagnostic[] } | undefined> {
  const enabled = await enabledDocument(context, uri);
  if (!enabled) return undefined;
  const { document, analysed, settings } = enabled;
  const items = diagnosticsOf(document, cappedFindings(analysed.findings(), settings.diagnostics.maxPerDocument));
  return { version: document.version, revision: analysed.revision, items };
}

const SEVERITY_RANK: Readonly<Record<FindingSeverity, number>> = { error: 0, warning: 1, information: 2, hint: 3 };

/**
 * Keeps the `limit` most serious findings (earlier first among equals), in document order, and
 * adds one finding that says how many were left out, at the first of them. A document full of
 * impossible species must not become a message of many megabytes sent on every pause in typing.
 */
export function cappedFindings(findings: readonly Finding[], limit: number): readonly Finding[] {
  if (findings.length <= limit) return findings;
  const rank = (finding: Finding): number => SEVERITY_RANK[finding.severity] ?? SEVERITY_RANK.information;
  const order = findings.map((_, index) => index);
  order.sort((a, b) => rank(findings[a]) - rank(findings[b]) || findings[a].range.start - findings[b].range.start || a - b);
  const kept = order.slice(0, limit).sort((a, b) => findings[a].range.start - findings[b].range.start || a - b);
  const left = order.slice(limit);
  const firstLeft = left.reduce((first, index) => (findings[index].range.start < findings[first].range.start ? index : first), left[0]);
  const mostSeriousLeft = findings[left[0]].severity;
  const summary: Finding = {
    range: { start: findings[firstLeft].range.start, end: findings[firstLeft].range.start },
    severity: mostSeriousLeft === "error" || mostSeriousLeft === "warning" ? "warning" : "information",
    code: "diagnostics-limit-reached",
    message:
      `${left.length.toLocaleString("en-US")} more problems in this document are not shown: ` +
      `lonepair shows at most ${limit.toLocaleString("en-US")} per document (setting lonepair.diagnostics.maxPerDocument).`,
  };
  return [...kept.map((index) => findings[index]), summary];
}

function registerPull(context: ServerContext): DiagnosticsFeature {
  const empty: DocumentDiagnosticReport = { kind: DocumentDiagnosticReportKind.Full, items: [] };
  // The result depends only on the text (its revision) and the settings; both are in the id.
  const resultIdOf = (revision: number): string => `${revision}:${context.settings.generation}`;
  context.connection.languages.diagnostics.on(
    guarded<DocumentDiagnosticParams, DocumentDiagnosticReport>(context.log, "diagnostics", empty, async (params) => {
      const uri = params.textDocument.uri;
      if (!context.documents.get(uri)) return empty;
      const resultId = resultIdOf(context.cache.revisionOf(uri));
      if (params.previousResultId === resultId) return { kind: DocumentDiagnosticReportKind.Unchanged, resultId };
      const current = await currentDiagnostics(context, uri);
      if (!current) return empty;
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

function registerPush(context: ServerContext): DiagnosticsFeature {
  const timers = new Map<string, NodeJS.Timeout>();

  const publish = async (uri: string): Promise<void> => {
    timers.delete(uri);
    if (!context.documents.get(uri)) return;
    const requestedRevision = context.cache.revisionOf(uri);
    try {
      const current = await currentDiagnostics(context, uri);
      // A newer text or a close wins over this result: it is stale, drop it.
      const now = context.documents.get(uri);
      if (!now || context.cache.revisionOf(uri) !== requestedRevision) return;
      if (current && current.revision !== requestedRevision) return;
      await context.connection.sendDiagnostics({ uri, version: now.version, diagnostics: current?.items ?? [] });
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
