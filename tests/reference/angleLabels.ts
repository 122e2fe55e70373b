/**
 * Turns an angle written as atoms ("F(ax)-S-F(ax)", "F(ap)-Br-F(basal)", "F-S-F (cis)") into a key
 * that ignores order and position synonyms, so two tables can be matched row by row.
 */
import { positionKindOfWord } from "./positionLabels";

function terminalKey(part: string): string {
  const element = /^[A-Z][a-z]?/.exec(part)?.[0] ?? part;
  const position = /\(([^)]*)\)/.exec(part)?.[1];
  const kind = position === undefined ? undefined : positionKindOfWord(position);
  return kind === undefined ? element : `${element}:${kind}`;
}

/** "F:axial|S|F:equatorial" style key, with the two ends sorted; undefined when not X-A-Y. */
export function angleKey(angle: string): string | undefined {
  const withoutNote = angle.replace(/\s+\([^)]*\)\s*$/, "").trim();
  const parts = withoutNote.split("-");
  if (parts.length !== 3) return undefined;
  const [first, centre, last] = parts;
  const ends = [terminalKey(first), terminalKey(last)].sort();
  return `${ends[0]}|${centre}|${ends[1]}`;
}
