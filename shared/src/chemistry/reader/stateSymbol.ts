/**
 * State symbols written after a species: NaCl(s), H2O(l), NH3(g), HCl(aq), CO2 (aq), and mhchem's
 * SO4^2-(aq) and CO3^2-_{(aq)}. They say where the species is, not what it is made of.
 */
import type { PhysicalState } from "../types";
import { isSpace } from "./characters";

/** A state symbol at the end of a span and where the species before it ends. */
export interface StateSuffix {
  readonly bodyEnd: number;
  readonly state: PhysicalState;
}

const UNDERSCORE = 0x5f;

/** The state symbol ending `text[start, end)`, or undefined when there is none. */
export function readStateSuffix(text: string, start: number, end: number): StateSuffix | undefined {
  let closeAt = end - 1;
  const last = text.charCodeAt(closeAt);
  // mhchem's subscript form: _{(aq)}
  const braced = last === 0x7d;
  if (braced) closeAt--;
  if (closeAt - start < 3 || text.charCodeAt(closeAt) !== 0x29) return undefined;
  const state = stateBefore(text, closeAt);
  if (state === undefined) return undefined;
  let bodyEnd = closeAt - state.length - 1;
  if (braced) {
    if (bodyEnd - 2 < start || text.charCodeAt(bodyEnd - 1) !== 0x7b || text.charCodeAt(bodyEnd - 2) !== UNDERSCORE) {
      return undefined;
    }
    bodyEnd -= 2;
  } else if (bodyEnd - 1 >= start && text.charCodeAt(bodyEnd - 1) === UNDERSCORE) {
    bodyEnd--;
  }
  while (bodyEnd > start && isSpace(text.charCodeAt(bodyEnd - 1))) bodyEnd--;
  return bodyEnd > start ? { bodyEnd, state } : undefined;
}

/** The state symbol in "(...)" closed at `closeAt`. */
function stateBefore(text: string, closeAt: number): PhysicalState | undefined {
  const c1 = text.charCodeAt(closeAt - 1);
  const c2 = text.charCodeAt(closeAt - 2);
  if (c2 === 0x28) {
    if (c1 === 0x73) return "s";
    if (c1 === 0x6c) return "l";
    if (c1 === 0x67) return "g";
    return undefined;
  }
  if (c2 === 0x61 && c1 === 0x71 && text.charCodeAt(closeAt - 3) === 0x28) return "aq";
  return undefined;
}

/** The words for a state symbol, for cards and hovers. */
export function stateDescription(state: PhysicalState): string {
  if (state === "s") return "solid (s)";
  if (state === "l") return "liquid (l)";
  if (state === "g") return "gas (g)";
  return "aqueous solution (aq)";
}
