/**
 * What the writer's notation said beyond the formula: the state symbol and isotope labels. Cards,
 * hovers and JSON all show them from here, so every edge words them alike.
 */
import { elementBySymbol } from "../chemistry/elements";
import { stateDescription } from "../chemistry/reader/stateSymbol";
import type { IsotopeLabel, SpeciesReading } from "../chemistry/types";

/** "aqueous solution (aq)", or undefined when no state was written. */
export function stateNote(reading: SpeciesReading): string | undefined {
  return reading.state === undefined ? undefined : stateDescription(reading.state);
}

/** "D = hydrogen-2, 13C = carbon-13", or undefined when no isotope was labelled. */
export function isotopeNote(reading: SpeciesReading): string | undefined {
  if (reading.isotopes === undefined || reading.isotopes.length === 0) return undefined;
  return reading.isotopes.map(isotopeText).join(", ");
}

function isotopeText(label: IsotopeLabel): string {
  const name = elementBySymbol(label.symbol)?.name ?? label.symbol;
  return `${label.written} = ${name}-${label.massNumber}`;
}
