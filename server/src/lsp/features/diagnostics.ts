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

/** How long typing must pause before pushed diagnostics are recomputed. */
const PUSH_DELAY_MS = 150;

/** Large documents cost more to re-analyse, so they wait longer: one more millisecond per kilobyte, up to a second. */
function pushDelay(length: number): number {
  return PUSH_DELAY_MS + Math.min(1000, Math.floor(length / 1024));
}

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

async function currentDiagnostics(context: ServerContext, uri: string): Promise<{ version: number; items: Diagnostic[] } | undefined> {
  const enabled = await enabledDocument(context, uri);
  if (!enabled) return undefined;
  return { version: enabled.document.version, items: diagnosticsOf(enabled.document, enabled.analysed.findings()) };
}

function registerPull(context: ServerContext): DiagnosticsFeature {
  const empty: DocumentDiagnosticReport = { kind: DocumentDiagnosticReportKind.Full, items: [] };
  context.connection.languages.diagnostics.on(
    guarded<DocumentDiagnosticParams, DocumentDiagnosticReport>(context.log, "diagnostics", empty, async (params) => {
      const uri = params.textDocument.uri;
      const document = context.documents.get(uri);
      if (!document) return empty;
      // The result depends only on the version and the settings, so an unchanged pair is reported as such.
      const resultId = `${document.version}:${context.settings.generation}`;
      if (params.previousResultId === resultId) return { kind: DocumentDiagnosticReportKind.Unchanged, resultId };
      const current = await currentDiagnostics(context, uri);
      if (!current) return { kind: DocumentDiagnosticReportKind.Full, items: [] };
      return { kind: DocumentDiagnosticReportKind.Full, resultId: `${current.version}:${context.settings.generation}`, items: current.items };
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
    const requested = context.documents.get(uri);
    if (!requested) return;
    try {
      const current = await currentDiagnostics(context, uri);
      // A newer version or a close wins over this result: it is stale, drop it.
      const now = context.documents.get(uri);
      if (!now || now.version !== requested.version) return;
      if (current && current.version !== now.version) return;
      await context.connection.sendDiagnostics({ uri, version: now.version, diagnostics: current?.items ?? [] });
    } catch (error) {
      context.log.error(`lonepair: diagnostics for ${uri} failed: ${String(error)}`);
    }
  };

  const schedule = (uri: string): void => {
    clearTimeout(timers.get(uri));
    const length = context.documents.get(uri)?.getText().length ?? 0;
    timers.set(uri, setTimeout(() => void publish(uri), pushDelay(length)));
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
