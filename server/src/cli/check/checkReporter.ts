/**
 * What every `check` output format implements. Findings arrive file by file and batch by batch,
 * in document order, so text and JSON can be written as they come (a huge CSV never has to be
 * held whole); SARIF, one JSON object with its rules up front, collects them.
 */
import type { CheckSummary } from "./checkSummary";
import type { LocatedFinding } from "./locatedFinding";

export interface CheckReporter {
  /** Findings of one batch of one file, in document order. */
  findings(found: readonly LocatedFinding[]): void;
  /** The run is over. */
  end(summary: CheckSummary, fixing: boolean): void;
}
