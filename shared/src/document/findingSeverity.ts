/**
 * How serious a problem found in a document is. Errors fail `check`; a species outside what VSEPR
 * is meant for, or a name lonepair does not know, is a note, never an error.
 */
import type { ProblemCode } from "../chemistry/types";
import type { FindingSeverity } from "./types";

/** Species VSEPR is not meant for: worth a note, not an error. */
const OUTSIDE_THE_MODEL: ReadonlySet<ProblemCode> = new Set([
  "transition-metal-centre",
  "f-block-centre",
  "superheavy-element",
  "ionic-solid",
  "ions-in-solution",
  "metallic-element",
  "hydrate",
  "adduct",
  "network-solid",
  "metal-ion-complex",
  "three-centre-bonding",
  "ambiguous-connectivity",
  "no-central-atom",
  // "As(V)" in a speciation table is a correct way to write an oxidation state, just not a species.
  "oxidation-state",
  // An unknown name says more about lonepair's vocabulary than about the writer's text.
  "unknown-name",
]);

/** The severity of a finding with the problem `code`. */
export function severityOf(code: ProblemCode): FindingSeverity {
  return OUTSIDE_THE_MODEL.has(code) ? "information" : "error";
}
