/**
 * The radical dot: "Cl•", "NO·", "•OH", "HO•", "O2•-". A bullet or middle dot at either end of a
 * formula, or just before a closing charge sign, marks the species' unpaired electron; it is not a
 * hydrate dot, which always has a formula on both sides. The formula is read without it, and the
 * dot is checked against the electron count: only a species with an odd number of valence
 * electrons has one unpaired electron to mark.
 */
import { elementBySymbol } from "../elements";
import type { SpeciesReading } from "../types";

/** Bullet, middle dot, bullet operator, dot operator; never "." or "*", which end sentences and stand for hydrate dots. */
function isRadicalDot(code: number): boolean {
  return code === 0xb7 || code === 0x2022 || code === 0x2219 || code === 0x22c5;
}

function isFormulaEnd(code: number): boolean {
  return (
    (code >= 0x41 && code <= 0x5a) || (code >= 0x61 && code <= 0x7a) || (code >= 0x30 && code <= 0x39) || code === 0x29 || code === 0x5d
  );
}

function isUpper(code: number): boolean {
  return code >= 0x41 && code <= 0x5a;
}

/** "-", "+", "−" and a digit before them: the charge that may follow a radical dot ("O2•-", "CO2•2-" is not a thing). */
const CHARGE_AFTER_DOT = /^(?:[+\-\u2212]|\^?[+\-\u2212]|\^?\d?[+\-\u2212])$/;

/**
 * The position of a radical dot in `text[start, end)`, or -1. One dot only: "Cl·Cl" is a hydrate
 * or adduct, and "·5H2O" is water of crystallisation.
 */
export function radicalDotAt(text: string, start: number, end: number): number {
  let found = -1;
  for (let i = start; i < end; i++) {
    if (!isRadicalDot(text.charCodeAt(i))) continue;
    if (found >= 0) return -1;
    found = i;
  }
  if (found < 0 || end - start < 2) return -1;
  if (found === start) return isUpper(text.charCodeAt(start + 1)) ? found : -1;
  if (!isFormulaEnd(text.charCodeAt(found - 1))) return -1;
  if (found === end - 1) return found;
  return CHARGE_AFTER_DOT.test(text.slice(found + 1, end)) ? found : -1;
}

/** Valence electrons of the reading, as the Lewis structure counts them. */
function valenceElectrons(reading: SpeciesReading): number | undefined {
  let total = -reading.charge;
  for (const part of reading.composition) {
    const element = elementBySymbol(part.symbol);
    if (element === undefined) return undefined;
    total += element.valenceElectrons * part.count;
  }
  return total;
}

/**
 * Why the radical dot does not fit the reading, or undefined when it does (an odd electron count,
 * or a species whose count the dot cannot be checked against).
 */
export function radicalDotMismatch(reading: SpeciesReading): string | undefined {
  if (reading.parts !== undefined) return "A radical dot marks one species' unpaired electron; it cannot sit on a hydrate or adduct.";
  const electrons = valenceElectrons(reading);
  if (electrons === undefined || electrons % 2 === 1) return undefined;
  return (
    `The dot marks a radical (one unpaired electron), but ${reading.formula} has an even number of valence electrons ` +
    `(${electrons}), so it has no single unpaired electron. Remove the dot, or check the formula and charge.`
  );
}
