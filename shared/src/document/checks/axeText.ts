/**
 * AXE notation as tables write it: AX4E1, AX4E, AX₄E₁, AX4 E0, "AX3E", ax2e2.
 */

export interface AxeClass {
  readonly bonded: number;
  readonly lonePairs: number;
}

const SUBSCRIPTS = /[\u2080-\u2089]/g;

/** The numbers behind an AXE class, or undefined when the cell is not one. */
export function parseAxe(cell: string): AxeClass | undefined {
  const plain = cell
    .replace(SUBSCRIPTS, (digit) => String(digit.charCodeAt(0) - 0x2080))
    .replace(/\s+/g, "")
    .toUpperCase();
  const match = /^AX(\d*)(?:E(\d*))?$/.exec(plain);
  if (!match) return undefined;
  return {
    bonded: match[1] === "" ? 1 : Number(match[1]),
    lonePairs: match[2] === undefined ? 0 : match[2] === "" ? 1 : Number(match[2]),
  };
}

/** The class written like `cell`: "E" without a 1, "E0" kept, subscript digits, letter case. */
export function axeInStyleOf(axe: AxeClass, cell: string): string {
  const plain = cell.replace(/\s+/g, "");
  const bareE = /E(?![0-9\u2080-\u2089])/i.test(plain);
  const zeroE = /E[0\u2080]/i.test(plain);
  let lone = "";
  if (axe.lonePairs === 1) lone = bareE ? "E" : "E1";
  else if (axe.lonePairs > 1) lone = `E${axe.lonePairs}`;
  else if (zeroE) lone = "E0";
  let text = `AX${axe.bonded === 1 ? "" : axe.bonded}${lone}`;
  if (SUBSCRIPTS.test(cell)) text = text.replace(/\d/g, (digit) => String.fromCharCode(0x2080 + Number(digit)));
  SUBSCRIPTS.lastIndex = 0;
  return /[a-z]/.test(cell) && !/[A-Z]/.test(cell) ? text.toLowerCase() : text;
}
