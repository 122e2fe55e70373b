/**
 * How notes (findings of severity information) are shown: as they are, as faint hints, or not at
 * all. A write-up naming a dozen salts gets a dozen correct notes ("read as its ions"); writers
 * who know that may want them quieter. The editor's setting and the command line's option both
 * ask here, so the two never show a different set.
 */
import type { FindingPart } from "./findingPart";
import type { Finding, FindingSeverity } from "./types";

/** What notes are shown as. */
export type NotesShownAs = "information" | "hint" | "off";

/** Every choice, the first the default (notes shown as they are found). */
export const NOTES_SHOWN_AS: readonly NotesShownAs[] = ["information", "hint", "off"];

export function isNotesShownAs(value: unknown): value is NotesShownAs {
  return typeof value === "string" && (NOTES_SHOWN_AS as readonly string[]).includes(value);
}

/** The severity a finding of `severity` is shown with, or undefined when it is not shown. */
export function shownSeverity(severity: FindingSeverity, notesAs: NotesShownAs): FindingSeverity | undefined {
  if (severity !== "information" || notesAs === "information") return severity;
  return notesAs === "hint" ? "hint" : undefined;
}

/** `findings` as they are shown: notes turned into hints or left out; errors and warnings as they are. */
export function shownFindings(findings: readonly Finding[], notesAs: NotesShownAs): readonly Finding[] {
  if (notesAs === "information") return findings;
  const shown: Finding[] = [];
  for (const finding of findings) {
    const severity = shownSeverity(finding.severity, notesAs);
    if (severity !== undefined) shown.push(severity === finding.severity ? finding : { ...finding, severity });
  }
  return shown;
}

/** `parts` with each part's findings as they are shown; read lazily, as the parts are. */
export function* shownParts(parts: Iterable<FindingPart>, notesAs: NotesShownAs): Generator<FindingPart> {
  for (const part of parts)
    yield notesAs === "information" ? part : { findings: shownFindings(part.findings, notesAs), offset: part.offset };
}
