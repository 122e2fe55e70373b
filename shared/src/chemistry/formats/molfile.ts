/**
 * MDL molfile (V2000 connection table) for a Lewis structure with model coordinates: three
 * header lines, the counts line, one line per atom and per bond, then formal charges as
 * `M  CHG` and odd electrons as `M  RAD` property lines, and `M  END`. Every hydrogen is an
 * explicit atom. Formal charges of ±1 to ±3 also go in the atom block's old charge field, for
 * readers that ignore property lines.
 */
import type { MolecularCoordinates } from "../geometry/buildCoordinates";
import type { MolecularGraph } from "../types";
import { singleLine } from "./xyz";

/** Most atoms or bonds a V2000 counts line can hold. */
export const MOLFILE_V2000_LIMIT = 999;

export type MolfileResult =
  | { readonly ok: true; readonly value: string }
  | { readonly ok: false; readonly problem: { readonly code: "too-many-atoms" | "coordinates-mismatch"; readonly message: string } };

/** Old-style charge codes of the atom block: 3 = +1, 2 = +2, 1 = +3, 5 = -1, 6 = -2, 7 = -3. */
const CHARGE_CODE: Readonly<Record<number, number>> = { 3: 1, 2: 2, 1: 3, [-1]: 5, [-2]: 6, [-3]: 7 };
/** Property-line radical code for a doublet (one unpaired electron). */
const DOUBLET = 2;
/** Entries one property line may carry. */
const PER_LINE = 8;

const pad = (value: number | string, width: number) => String(value).padStart(width);

/** Molfile text for the graph placed at the given coordinates; never throws. */
export function toMolfile(graph: MolecularGraph, coordinates: Pick<MolecularCoordinates, "atoms">, title: string): MolfileResult {
  const atoms = graph.atoms;
  if (coordinates.atoms.length !== atoms.length) {
    return {
      ok: false,
      problem: {
        code: "coordinates-mismatch",
        message: `The coordinates hold ${coordinates.atoms.length} atoms but the structure has ${atoms.length}.`,
      },
    };
  }
  if (atoms.length > MOLFILE_V2000_LIMIT || graph.bonds.length > MOLFILE_V2000_LIMIT) {
    return {
      ok: false,
      problem: {
        code: "too-many-atoms",
        message: `A V2000 molfile holds at most ${MOLFILE_V2000_LIMIT} atoms and ${MOLFILE_V2000_LIMIT} bonds.`,
      },
    };
  }

  const lines = [
    singleLine(title).slice(0, 80),
    // Columns: 2 initials, 8 program, 10 date (left blank so output is reproducible), then 3D.
    `  ${"lonepair".padEnd(8)}${" ".repeat(10)}3D`,
    "Model geometry from ideal VSEPR angles and covalent radii, not measured data.",
    `${pad(atoms.length, 3)}${pad(graph.bonds.length, 3)}  0  0  0  0  0  0  0  0999 V2000`,
  ];
  atoms.forEach((atom, index) => {
    const [x, y, z] = coordinates.atoms[index].position;
    const chargeCode = CHARGE_CODE[atom.formalCharge] ?? 0;
    lines.push(
      `${coordinate(x)}${coordinate(y)}${coordinate(z)} ${atom.symbol.padEnd(3)} 0${pad(chargeCode, 3)}  0  0  0  0  0  0  0  0  0  0`,
    );
  });
  for (const bond of graph.bonds) {
    lines.push(`${pad(bond.from + 1, 3)}${pad(bond.to + 1, 3)}${pad(bond.order, 3)}  0  0  0  0`);
  }
  const charged = atoms.flatMap((atom, index) => (atom.formalCharge !== 0 ? [[index + 1, atom.formalCharge] as const] : []));
  const radicals = atoms.flatMap((atom, index) => (atom.unpairedElectrons > 0 ? [[index + 1, DOUBLET] as const] : []));
  lines.push(...propertyLines("CHG", charged), ...propertyLines("RAD", radicals), "M  END");
  return { ok: true, value: lines.join("\n") + "\n" };
}

function coordinate(value: number): string {
  const text = value.toFixed(4);
  return pad(text === "-0.0000" ? "0.0000" : text, 10);
}

/** `M  CHG`/`M  RAD` lines, at most eight atom-value pairs each. */
function propertyLines(kind: string, entries: readonly (readonly [number, number])[]): string[] {
  const lines: string[] = [];
  for (let start = 0; start < entries.length; start += PER_LINE) {
    const chunk = entries.slice(start, start + PER_LINE);
    lines.push(`M  ${kind}${pad(chunk.length, 3)}${chunk.map(([atom, value]) => ` ${pad(atom, 3)} ${pad(value, 3)}`).join("")}`);
  }
  return lines;
}
