/**
 * Bond angles as tables write them: "104.5", "104.5°", "~107", "≈ 107 deg", "<109.5", "90, 120",
 * "90/180", "102-104", "104,5°" with a decimal comma, "104.5 ± 0.3" and "104.5(3)" with an uncertainty.
 */

export type AngleRelation = "equal" | "about" | "below" | "above";

export interface WrittenAngles {
  readonly degrees: readonly number[];
  readonly relation: AngleRelation;
}

/**
 * A comma between digits with one or two digits after it: a decimal comma ("104,5°") in a table
 * from a country that writes them, or a list without spaces ("120,90"). Both readings are tried.
 */
const DECIMAL_COMMA = /(\d),(\d{1,2})(?!\d)/g;

/**
 * A measurement's uncertainty: "± 0.3", "+/- 0.2", "±0.5°", or digits in brackets against the
 * value ("104.5(3)"). The angle is the value it qualifies, not a second angle.
 */
const UNCERTAINTY = /\s*(?:\u00b1|\+\/-|\+-)\s*\d+(?:[.,]\d+)?\s*\u00b0?|(?<=\d)\(\d{1,3}\)/g;

/** True when the cell states an uncertainty: a fix would drop it, so none is offered. */
export function hasUncertainty(cell: string): boolean {
  return cell.search(UNCERTAINTY) >= 0;
}

/** True when the cell may be written with decimal commas. */
export function mayHaveDecimalComma(cell: string): boolean {
  return /\d,\d{1,2}(?!\d)/.test(cell);
}

/**
 * The angles in a cell and how they are stated, or undefined when it holds no angle. With
 * `decimalComma`, "104,5" is one angle, 104.5; without, it is two, 104 and 5.
 */
export function parseAngles(cell: string, decimalComma = false): WrittenAngles | undefined {
  const written = cell.trim().toLowerCase().replace(UNCERTAINTY, "");
  const plain = decimalComma ? written.replace(DECIMAL_COMMA, "$1.$2") : written;
  const numbers = [...plain.matchAll(/\d+(?:\.\d+)?/g)].map((match) => Number(match[0]));
  if (numbers.length === 0 || numbers.some((value) => value > 360)) return undefined;
  // Anything but numbers, separators, degree marks and relation words: not a plain angle.
  if (/[a-z]/.test(plain.replace(/deg(?:rees?)?|ca\.?|about|approx\.?|approximately|less than|under|slightly|and/g, ""))) return undefined;
  let relation: AngleRelation = "equal";
  if (/^(?:<|≤|less than|under|slightly less)/.test(plain)) relation = "below";
  else if (/^(?:>|≥)/.test(plain)) relation = "above";
  else if (/^(?:~|≈|ca|about|approx)/.test(plain)) relation = "about";
  return { degrees: numbers, relation };
}

/** A computed angle written like `cell`: with its degree sign, "~" and decimal comma when the cell has them. */
export function angleInStyleOf(degrees: number, cell: string): string {
  const prefix = /^\s*[~≈]/.test(cell) ? cell.trim()[0] : "";
  const suffix = cell.includes("\u00b0") ? "\u00b0" : /deg/i.test(cell) ? " deg" : "";
  const number = mayHaveDecimalComma(cell) && !cell.includes(".") ? String(degrees).replace(".", ",") : String(degrees);
  return `${prefix}${number}${suffix}`;
}
