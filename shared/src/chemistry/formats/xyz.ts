/**
 * The XYZ coordinate format: atom count, one comment line, then `Symbol x y z` per atom in
 * ångströms with six decimals.
 */
import type { MolecularCoordinates } from "../geometry/buildCoordinates";

/** XYZ text for the coordinates; the title becomes the comment line (line breaks turned into spaces). */
export function toXyz(coordinates: Pick<MolecularCoordinates, "atoms">, title: string): string {
  const lines = [String(coordinates.atoms.length), singleLine(title)];
  for (const { symbol, position } of coordinates.atoms) {
    lines.push([symbol.padEnd(2), ...position.map((value) => fixed(value).padStart(12))].join(" "));
  }
  return lines.join("\n") + "\n";
}

/** One line of text: line breaks and tabs become single spaces. */
export function singleLine(text: string): string {
  return String(text ?? "")
    .replace(/[\r\n\t]+/g, " ")
    .trim();
}

/** Six decimals without a negative zero. */
function fixed(value: number): string {
  const text = value.toFixed(6);
  return text === "-0.000000" ? "0.000000" : text;
}
