/**
 * Checks a file's text with the bundled core, the way the server checks an open document:
 * the same cut for huge files, the same findings, as editor diagnostics with source "lonepair".
 * Used by the workspace check while the server has no `lonepair/checkText` request.
 */
import * as vscode from "vscode";
import { analysedTextOf } from "../../shared/src/index";
import { analyzeDocument, checkDocument, documentKindFor, type DocumentKind, type Finding } from "./core";
import { DIAGNOSTIC_SOURCE } from "./statusBar";

const SEVERITIES: Readonly<Record<Finding["severity"], vscode.DiagnosticSeverity>> = {
  error: vscode.DiagnosticSeverity.Error,
  warning: vscode.DiagnosticSeverity.Warning,
  information: vscode.DiagnosticSeverity.Information,
  hint: vscode.DiagnosticSeverity.Hint,
};

/** Diagnostics for `text` read as the file `fileName`; none when the kind is unknown or not enabled. */
export function checkTextLocally(fileName: string, text: string, enabledKinds: readonly DocumentKind[]): vscode.Diagnostic[] {
  const kind = documentKindFor(fileName, undefined, text.slice(0, 512));
  if (!kind || !enabledKinds.includes(kind)) return [];
  const analysed = analysedTextOf(text);
  if (analysed.binary) return [];
  const model = analyzeDocument(analysed.text, kind);
  const findings = [...model.problems, ...checkDocument(model)];
  const positions = positionFinder(text);
  return findings.map((finding) => {
    const diagnostic = new vscode.Diagnostic(
      new vscode.Range(positions(finding.range.start), positions(finding.range.end)),
      finding.message,
      SEVERITIES[finding.severity] ?? vscode.DiagnosticSeverity.Information,
    );
    diagnostic.source = DIAGNOSTIC_SOURCE;
    diagnostic.code = finding.code;
    return diagnostic;
  });
}

/** Offset to line and character (UTF-16, as the editor counts) by binary search over line starts. */
function positionFinder(text: string): (offset: number) => vscode.Position {
  const lineStarts = [0];
  for (let index = 0; index < text.length; index++) {
    const character = text.charCodeAt(index);
    if (character === 13 /* \r */ && text.charCodeAt(index + 1) === 10) continue;
    if (character === 10 || character === 13) lineStarts.push(index + 1);
  }
  return (offset) => {
    const clamped = Math.max(0, Math.min(offset, text.length));
    let low = 0;
    let high = lineStarts.length - 1;
    while (low < high) {
      const middle = (low + high + 1) >> 1;
      if (lineStarts[middle] <= clamped) low = middle;
      else high = middle - 1;
    }
    return new vscode.Position(low, clamped - lineStarts[low]);
  };
}
