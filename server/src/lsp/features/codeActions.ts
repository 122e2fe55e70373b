/**
 * Quick fixes: one per finding that carries a fix (replacing only that range), one per choice
 * a finding offers (a row's name or its formula; never in fix-all), and one action that fixes
 * every table value (equation cells' coefficients included) in the file as a single workspace edit.
 */
import {
  CodeActionKind,
  type CodeAction,
  type CodeActionParams,
  type Diagnostic,
  type TextEdit,
  type WorkspaceEdit,
} from "vscode-languageserver";
import type { TextDocument } from "vscode-languageserver-textdocument";
import { editsOfFix, type Finding, type FixEdit, type TextFix, type TextRange } from "../core";
import {
  equationActions,
  isTextMarkup,
  READ_WHOLE_ELSEWHERE_FROM,
  tableValueFixesInParts,
  type EquationAction,
  type FindingPart,
} from "../../../../shared/src/index";
import type { AnalysedDocument } from "../documentCache";
import { guarded } from "../guardedHandler";
import { lspRange, offsetRange, rangesTouch } from "../ranges";
import { enabledDocument, type ServerContext } from "../serverContext";
import { DIAGNOSTIC_SOURCE, diagnosticsOf } from "./diagnostics";

/** Title of the action that fixes every table value in one go. */
export const FIX_ALL_TITLE = "Fix all lonepair table values in this file";

/** Kind of the fix-all action when the client asks for source actions. */
const FIX_ALL_KIND = `${CodeActionKind.SourceFixAll}.lonepair`;

/** What a deferred fix-all action carries until the client asks for its edit. */
interface FixAllData {
  readonly uri: string;
  readonly version: number;
  /** The text's revision: a version number alone may repeat for a different text. */
  readonly revision: number;
}

/** Registers the code action handler, and the resolve handler when the client resolves edits. */
export function registerCodeActions(context: ServerContext): void {
  context.connection.onCodeAction(
    guarded<CodeActionParams, CodeAction[]>(context.log, "code actions", [], async (params, token) => {
      // Without literal support a client can only run commands; we offer none rather than half a feature.
      if (!context.clientFeatures().codeActionLiterals) return [];
      const enabled = await enabledDocument(context, params.textDocument.uri);
      if (!enabled) return [];
      const { document, analysed } = enabled;
      const only = params.context.only;
      const wants = (kind: string): boolean => !only || only.some((requested) => kind === requested || kind.startsWith(`${requested}.`));
      const actions: CodeAction[] = [];
      if (wants(CodeActionKind.QuickFix)) {
        const requested = offsetRange(document, params.range);
        // The lightbulb asks on every cursor move: only the part of the document around the cursor is read.
        for (const finding of analysed.findingsAround(requested.start, requested.end)) {
          if (token.isCancellationRequested) return [];
          if (!rangesTouch(finding.range, requested)) continue;
          if (finding.fix) actions.push(quickFix(context, document, finding, finding.fix, params.context.diagnostics));
          // Fixes to choose between: each its own action, none preferred, so no shortcut picks one.
          for (const choice of finding.choices ?? []) {
            actions.push({ ...quickFix(context, document, finding, choice, params.context.diagnostics), isPreferred: false });
          }
        }
      }
      if (wants(CodeActionKind.QuickFix) || wants(CodeActionKind.RefactorRewrite)) {
        for (const action of equationActionsOf(document, analysed, offsetRange(document, params.range))) {
          if (token.isCancellationRequested) return [];
          const kind = action.kind === "complete" ? CodeActionKind.QuickFix : CodeActionKind.RefactorRewrite;
          if (wants(kind)) actions.push(equationAction(context, document, action, params.context.diagnostics));
        }
      }
      const kind = wants(CodeActionKind.QuickFix) ? CodeActionKind.QuickFix : wants(FIX_ALL_KIND) ? FIX_ALL_KIND : undefined;
      if (kind && hasTableFixes(analysed, document.chunked.length >= READ_WHOLE_ELSEWHERE_FROM)) {
        const action: CodeAction = { title: FIX_ALL_TITLE, kind };
        // A big table's fix-all edit is large: where the client resolves edits, it is built only when chosen.
        if (context.clientFeatures().codeActionResolveEdit)
          action.data = { uri: document.uri, version: document.version, revision: analysed.revision } satisfies FixAllData;
        else action.edit = fixAllEdit(context, document, analysed);
        actions.push(action);
      }
      return actions;
    }),
  );
  if (!context.clientFeatures().codeActionResolveEdit) return;
  context.connection.onCodeActionResolve(
    guarded<CodeAction, CodeAction>(context.log, "code action resolve", { title: FIX_ALL_TITLE }, async (action) => {
      const data = action.data as Partial<FixAllData> | undefined;
      if (action.title !== FIX_ALL_TITLE || typeof data?.uri !== "string") return action;
      const enabled = await enabledDocument(context, data.uri);
      // An edit for an older version would land in the wrong places: offer none.
      if (!enabled || enabled.document.version !== data.version || enabled.analysed.revision !== data.revision) return action;
      return { ...action, edit: fixAllEdit(context, enabled.document, enabled.analysed) };
    }),
  );
}

function fixAllEdit(context: ServerContext, document: TextDocument, analysed: AnalysedDocument): WorkspaceEdit {
  return workspaceEdit(
    context,
    document,
    [...tableFixesOf(analysed)].flatMap((fix) => editsOfFix(fix).map((edit) => textEdit(document, edit))),
  );
}

/** The fixes of the table values, found a part of the document at a time (see `tableValueFixesInParts`). */
function tableFixesOf(analysed: AnalysedDocument): Iterable<TextFix> {
  return tableValueFixesInParts(analysed.findingParts(), (start, end) => analysed.modelAround(start, end));
}

/**
 * Whether fix-all has anything to do, per analysed version: the lightbulb asks on every cursor
 * move, and only the first fix is looked for (its edit is built when the action is chosen).
 */
const hasTableFixesMemo = new WeakMap<AnalysedDocument, boolean>();

/** How long the lightbulb looks for a first table fix in a large document before answering without fix-all. */
const FIX_ALL_LOOK_MS = 10;

function hasTableFixes(analysed: AnalysedDocument, large: boolean): boolean {
  const known = hasTableFixesMemo.get(analysed);
  if (known !== undefined) return known;
  // The lightbulb must not wait on reading a large document: one whose findings are not worked
  // out within a few milliseconds (just opened), or a broken one waiting to be read whole on the
  // worker thread, offers no fix-all yet. What was read is kept, and the editor asks again once
  // the diagnostics change.
  let waiting = false;
  const start = performance.now();
  function* partsUntilWaiting(): Generator<FindingPart> {
    for (const part of analysed.findingParts()) {
      if (analysed.wholeReadWanted() || (large && performance.now() - start > FIX_ALL_LOOK_MS)) {
        waiting = true;
        return;
      }
      yield part;
    }
  }
  const fixes = tableValueFixesInParts(partsUntilWaiting(), (start, end) => analysed.modelAround(start, end));
  const has = !fixes.next().done;
  if (!waiting) hasTableFixesMemo.set(analysed, has);
  return has;
}

function quickFix(
  context: ServerContext,
  document: TextDocument,
  finding: Finding,
  fix: TextFix,
  contextDiagnostics: readonly Diagnostic[],
): CodeAction {
  const [own] = diagnosticsOf(document, [finding]);
  const matching = contextDiagnostics.filter(
    (diagnostic) => diagnostic.source === DIAGNOSTIC_SOURCE && diagnostic.code === own.code && sameRange(diagnostic, own),
  );
  return {
    title: fix.title,
    kind: CodeActionKind.QuickFix,
    diagnostics: matching.length > 0 ? matching : [own],
    isPreferred: true,
    // A fix of several edits (an equation's coefficients) is one workspace edit: one undo step.
    edit: workspaceEdit(
      context,
      document,
      editsOfFix(fix).map((edit) => textEdit(document, edit)),
    ),
  };
}

/**
 * Completing or combining half-reactions on the arrows in `range`. Only the part of the document
 * around `range` is read, unless an arrow is there in prose: a half-reaction is combined with its
 * partner, which may be anywhere in the document.
 */
function equationActionsOf(document: TextDocument, analysed: AnalysedDocument, range: TextRange): EquationAction[] {
  const around = analysed.modelAround(range.start, range.end);
  const touched = (around.reactions ?? []).some(
    (reaction) => reaction.arrow.range.start <= range.end && range.start <= reaction.arrow.range.end,
  );
  if (!touched) return [];
  const model = around.kind === "markdown" || isTextMarkup(around.kind) ? analysed.model : around;
  return equationActions(document.getText(), model, range);
}

/** One action whose edits go in together, so one undo takes the whole change back. */
function equationAction(
  context: ServerContext,
  document: TextDocument,
  action: EquationAction,
  contextDiagnostics: readonly Diagnostic[],
): CodeAction {
  const arrow = lspRange(document, action.arrow);
  const diagnostics = contextDiagnostics.filter(
    (diagnostic) =>
      diagnostic.source === DIAGNOSTIC_SOURCE && diagnostic.code === action.findingCode && sameRange(diagnostic, { range: arrow }),
  );
  return {
    title: action.title,
    kind: action.kind === "complete" ? CodeActionKind.QuickFix : CodeActionKind.RefactorRewrite,
    ...(diagnostics.length > 0 ? { diagnostics } : {}),
    edit: workspaceEdit(
      context,
      document,
      action.edits.map((fix) => textEdit(document, fix)),
    ),
  };
}

function textEdit(document: TextDocument, edit: FixEdit): TextEdit {
  return { range: lspRange(document, edit.range), newText: edit.newText };
}

/** Versioned document changes where the client takes them, so a stale edit is refused. */
function workspaceEdit(context: ServerContext, document: TextDocument, edits: TextEdit[]): WorkspaceEdit {
  if (context.clientFeatures().documentChanges) {
    return { documentChanges: [{ textDocument: { uri: document.uri, version: document.version }, edits }] };
  }
  return { changes: { [document.uri]: edits } };
}

function sameRange(a: Pick<Diagnostic, "range">, b: Pick<Diagnostic, "range">): boolean {
  return (
    a.range.start.line === b.range.start.line &&
    a.range.start.character === b.range.start.character &&
    a.range.end.line === b.range.end.line &&
    a.range.end.character === b.range.end.character
  );
}
