/**
 * Hybridization as tables write it (sp3d, sp³d, SP3D, dsp3, d2sp3, sp3 d2), reduced for comparison
 * and written back in the cell's own style.
 */

const SUPERSCRIPTS: Readonly<Record<string, string>> = { "\u00b9": "1", "\u00b2": "2", "\u00b3": "3" };
const TO_SUPERSCRIPT: Readonly<Record<string, string>> = { "1": "\u00b9", "2": "\u00b2", "3": "\u00b3" };

/** The cell's hybridization as "sp", "sp2", "sp3", "sp3d", "sp3d2", "sp3d3", or undefined. */
export function normalizeHybridization(cell: string): string | undefined {
  const plain = cell
    .toLowerCase()
    .replace(/[\u00b9\u00b2\u00b3]/g, (digit) => SUPERSCRIPTS[digit])
    .replace(/[\s^_\-{}]/g, "");
  if (!/^[spd0-9]+$/.test(plain) || !plain.includes("s")) return undefined;
  const byOrbital = (letter: "s" | "p" | "d"): number => {
    let count = 0;
    for (const match of plain.matchAll(new RegExp(`${letter}(\\d*)`, "g"))) count += match[1] ? Number(match[1]) : 1;
    return count;
  };
  const s = byOrbital("s");
  const p = byOrbital("p");
  const d = byOrbital("d");
  if (s !== 1 || p > 3) return undefined;
  return `s${p === 0 ? "" : p === 1 ? "p" : `p${p}`}${d === 0 ? "" : d === 1 ? "d" : `d${d}`}`;
}

/** The computed hybridization written like `cell`: superscript digits, upper case. */
export function hybridizationInStyleOf(computed: string, cell: string): string {
  let text = computed;
  if (/[\u00b9\u00b2\u00b3]/.test(cell)) text = text.replace(/[123]/g, (digit) => TO_SUPERSCRIPT[digit]);
  return /[SPD]/.test(cell) && !/[spd]/.test(cell) ? text.toUpperCase() : text;
}
