/**
 * A charge written in a column of its own: handbook and inventory exports keep an ion's formula
 * ("NH4", "SO4") and its charge ("+1", "2-", "−2") apart. The species of such a row is the formula
 * with that charge, decided here once for every table reader, check and hover.
 */
import { chargeText } from "../../chemistry/reader/chargeText";
import type { SpeciesReading } from "../../chemistry/types";
import type { SpeciesReader } from "../speciesReader";
import type { SpeciesOccurrence } from "../types";

/** The largest charge a cell is read as: anything larger is not a species' net charge. */
const MAX_CHARGE = 9;

/** Hyphen-minus, the minus sign and the dashes word processors put in its place. */
const MINUS = "[-\\u2212\\u2012\\u2013]";
const SIGN = `(?:\\+|${MINUS})`;
/** "+1", "-2", "−2", "2", "0", and the same with the sign after: "1+", "2-". */
const SIGN_FIRST = new RegExp(`^(${SIGN})?\\s*(\\d{1,2})$`);
const SIGN_AFTER = new RegExp(`^(\\d{1,2})\\s*(${SIGN})$`);
/** A sign once or repeated: "+", "++", "---". A lone "-" is a placeholder, and never reaches here. */
const SIGNS = new RegExp(`^(?:\\++|${MINUS}+)$`);
const SUPERSCRIPT_DIGITS = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";
/** Superscripts: "²⁺", "⁻", "³⁻". */
const SUPERSCRIPT = /^([\u2070\u00b9\u00b2\u00b3\u2074-\u2079]?)([\u207a\u207b])$/;

/** The net charge a charge cell writes, or undefined when it writes none that can be read. */
export function chargeOfCell(written: string): number | undefined {
  const text = written.trim();
  if (/^neutral$/i.test(text)) return 0;
  if (text.length === 0 || text.length > 4) return undefined;
  let charge: number | undefined;
  const signFirst = SIGN_FIRST.exec(text);
  const signAfter = signFirst ? undefined : SIGN_AFTER.exec(text);
  const superscript = SUPERSCRIPT.exec(text);
  if (signFirst) charge = signed(signFirst[1] ?? "+", Number(signFirst[2]));
  else if (signAfter) charge = signed(signAfter[2], Number(signAfter[1]));
  else if (SIGNS.test(text)) charge = signed(text.charAt(0), text.length);
  else if (superscript) {
    const magnitude = superscript[1] ? SUPERSCRIPT_DIGITS.indexOf(superscript[1]) : 1;
    charge = superscript[2] === "\u207a" ? magnitude : -magnitude;
  }
  return charge !== undefined && Math.abs(charge) <= MAX_CHARGE ? charge : undefined;
}

function signed(sign: string, magnitude: number): number {
  // `0 * -1` is -0, which prints as "0" but is no `===` match for a key; keep zero plain.
  if (magnitude === 0) return 0;
  return sign === "+" ? magnitude : -magnitude;
}

/** `charge` written the way the cell `written` writes charges: "+2", "2+", "−2", "++", "0". */
export function chargeInStyleOf(charge: number, written: string): string {
  if (charge === 0) return "0";
  const text = written.trim();
  const magnitude = Math.abs(charge);
  const minus = /\u2212/.test(text) ? "\u2212" : /\u2013/.test(text) ? "\u2013" : "-";
  const sign = charge > 0 ? "+" : minus;
  if (SUPERSCRIPT.test(text)) return (magnitude === 1 ? "" : SUPERSCRIPT_DIGITS.charAt(magnitude)) + (charge > 0 ? "\u207a" : "\u207b");
  if (SIGNS.test(text)) return sign.repeat(magnitude);
  if (SIGN_AFTER.test(text)) return `${magnitude}${sign}`;
  // An unsigned "2" keeps its style for a positive charge; a negative one needs its sign, and "0" has no style.
  if (/^[1-9]\d*$/.test(text) && charge > 0) return String(magnitude);
  return `${sign}${magnitude}`;
}

const STATE_SUFFIX = /\((?:aq|s|l|g)\)$/;

/**
 * The occurrence as the species of a row whose charge column says `charge`:
 * - as it is when it already carries that or another charge (the row's check compares the two),
 *   when the charge is zero, and for SMILES, which write every atom's charge themselves;
 * - an element's name ("sodium", "chlorine") with a charge is that element's monatomic ion;
 * - a formula ("NH4", "SO4(aq)") gets the charge before any state symbol, and is read again.
 * Undefined when the formula and the charge do not read as one species of the same atoms.
 */
export function withRowCharge(occurrence: SpeciesOccurrence, charge: number, read: SpeciesReader): SpeciesOccurrence | undefined {
  const { reading } = occurrence;
  if (charge === 0 || reading.charge !== 0 || reading.notation === "smiles") return occurrence;
  let speciesText: string;
  if (reading.notation === "name") {
    // common practice: an ion table lists "sodium, +1" for Na+ and "chlorine, -1" for Cl-
    if (reading.composition.length !== 1) return occurrence;
    speciesText = `${reading.composition[0].symbol}${chargeText(charge)}`;
  } else {
    const state = STATE_SUFFIX.exec(occurrence.text)?.[0] ?? "";
    speciesText = `${occurrence.text.slice(0, occurrence.text.length - state.length)}${chargeText(charge)}${state}`;
  }
  const result = read(speciesText);
  if (!result.ok || result.value.charge !== charge) return undefined;
  if (reading.notation !== "name" && !sameAtoms(result.value, reading)) return undefined;
  return {
    ...occurrence,
    speciesText,
    reading: { ...result.value, text: occurrence.text, range: occurrence.range, notation: reading.notation },
  };
}

function sameAtoms(a: SpeciesReading, b: SpeciesReading): boolean {
  if (a.composition.length !== b.composition.length) return false;
  return a.composition.every((part, index) => part.symbol === b.composition[index].symbol && part.count === b.composition[index].count);
}
