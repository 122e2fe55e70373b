// What every randomised test of incremental analysis checks after an edit: the analyser's
// findings (whole, a part at a time, around a place) and the species under a hover agree with a
// from-scratch analysis of the same text by the core's own analyzeDocument + checkDocument.
import { expect } from "vitest";
import {
  analyzeDocument,
  checkDocument,
  createDocumentAnalyser,
  isTextMarkup,
  speciesAtOffset,
  wholeText,
  type ChunkedText,
  type DocumentKind,
  type Finding,
} from "../../shared/src/index";

/** The findings of `text` read from scratch, in document order. */
export function fromScratch(text: string, kind: DocumentKind): Finding[] {
  const model = analyzeDocument(text, kind);
  return [...model.problems, ...checkDocument(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}

/** Findings in one canonical order, so ties between equal ranges do not matter. */
export function canonical(findings: readonly Finding[]): Finding[] {
  const key = (finding: Finding): string => `${finding.range.start}:${finding.range.end}:${finding.code}:${finding.message}`;
  return [...findings].sort((a, b) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0));
}

/** A document being edited: its current text and the analyser kept across its versions. */
export interface Session {
  text: ChunkedText;
  readonly analyser: ReturnType<typeof createDocumentAnalyser>;
}

/** Checks the analyser's view of the session's current text against a from-scratch analysis. */
export function checkAgainstScratch(session: Session, kind: DocumentKind, random: () => number): void {
  const plain = wholeText(session.text);
  const analysis = session.analyser.analyse(session.text);
  const scratch = canonical(fromScratch(plain, kind));
  // Findings a part at a time, before the whole list is asked for, give the same list.
  expect(canonical([...session.analyser.analyse(session.text).findingParts()].flat())).toEqual(scratch);
  // Part of the work done a part at a time, as a server between other requests does it, the rest at once.
  for (const _ of analysis.findingParts()) if (random() < 0.05) break;
  expect(canonical(analysis.findings())).toEqual(scratch);
  // A request about one place sees every finding there.
  const place = Math.floor(random() * (plain.length + 1));
  const touching = (finding: Finding): boolean => finding.range.start <= place && place <= finding.range.end;
  expect(canonical(analysis.findingsAround(place, place).filter(touching))).toEqual(scratch.filter(touching));
  // The species a hover asks for, at a few random places.
  const model = analyzeDocument(plain, kind);
  if (kind === "markdown" || isTextMarkup(kind)) {
    // Every mention, table row and equation where a fresh reading finds it.
    const whole = analysis.model();
    const places = (items: readonly { readonly range: { readonly start: number; readonly end: number } }[]): string[] =>
      items.map((item) => `${item.range.start}-${item.range.end}`);
    expect(places(whole.occurrences)).toEqual(places(model.occurrences));
    expect(places(whole.records.map((record) => record.species))).toEqual(places(model.records.map((record) => record.species)));
    expect((whole.reactions ?? []).length).toEqual((model.reactions ?? []).length);
  }
  for (let probe = 0; probe < 3; probe++) {
    const offset = Math.floor(random() * (plain.length + 1));
    expect(analysis.speciesAt(offset)?.range).toEqual(speciesAtOffset(model, offset)?.range);
  }
  // The status bar's count of mentions, a part at a time, is the fresh model's.
  expect(speciesCountOf(session.analyser.analyse(session.text))).toBe(model.occurrences.length);
}

/** `analysis.speciesCount()` run to its end. */
export function speciesCountOf(analysis: ReturnType<ReturnType<typeof createDocumentAnalyser>["analyse"]>): number {
  const steps = analysis.speciesCount();
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
  }
}

/**
 * Requests about a few random places of `analysis` (the findings there, the species under a
 * hover) agree with a fresh reading of `plain`: asked first, before anything else is read.
 */
export function placesAgree(
  analysis: ReturnType<ReturnType<typeof createDocumentAnalyser>["analyse"]>,
  plain: string,
  kind: DocumentKind,
  random: () => number,
): void {
  const scratch = canonical(fromScratch(plain, kind));
  const model = analyzeDocument(plain, kind);
  for (let probe = 0; probe < 3; probe++) {
    const place = Math.floor(random() * (plain.length + 1));
    const touching = (finding: Finding): boolean => finding.range.start <= place && place <= finding.range.end;
    expect(canonical(analysis.findingsAround(place, place).filter(touching))).toEqual(scratch.filter(touching));
    expect(analysis.speciesAt(place)?.range).toEqual(speciesAtOffset(model, place)?.range);
  }
}
