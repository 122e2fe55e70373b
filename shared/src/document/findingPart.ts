/**
 * Findings handed out a part at a time with the place of their part beside them, so that a
 * caller that keeps only a few (diagnostics show a capped number) moves only those into place.
 */
import { moved } from "./tables/delimitedFindings";
import type { Finding } from "./types";

/** Findings of one part of a document, with ranges counted from `offset`. */
export interface FindingPart {
  readonly findings: readonly Finding[];
  readonly offset: number;
}

/** `parts` placed in the document: what `findingParts` hands out. */
export function* placedParts(parts: Iterable<FindingPart>): Generator<readonly Finding[]> {
  for (const part of parts) yield part.offset === 0 ? part.findings : part.findings.map((finding) => moved(finding, part.offset));
}
