/**
 * Character tables of the cubic and icosahedral groups, as printed in group-theory texts. The
 * standard frame puts the three mutually perpendicular C2 (or C4) axes along x, y and z, a C3 axis
 * along (1, 1, 1) and, for I and Ih, a C5 axis along (0, 1, φ).
 */
import { composeOperations, IDENTITY_OPERATION, INVERSION_OPERATION, operation, Z_AXIS } from "./classOperation";
import type { RawCharacterTable, RawIrrep, SymmetryClass } from "./tableTypes";

const GOLDEN = (1 + Math.sqrt(5)) / 2;
const BODY_DIAGONAL = [1, 1, 1] as const;
const FACE_DIAGONAL = [1, 1, 0] as const;
const FACE_DIAGONAL_NORMAL = [1, -1, 0] as const;
const FIVEFOLD = [0, 1, GOLDEN] as const;
const HALF_ROOT_THREE = Math.sqrt(3) / 2;

const E = { name: "E", size: 1, operation: IDENTITY_OPERATION };

// from memory: the T, Td, O and I character tables of standard chemical group theory texts
const T: RawCharacterTable = {
  group: "T",
  classes: [
    E,
    { name: "4C3", size: 4, operation: operation(true, 1 / 3, BODY_DIAGONAL) },
    { name: "4C3²", size: 4, operation: operation(true, 2 / 3, BODY_DIAGONAL) },
    { name: "3C2", size: 3, operation: operation(true, 1 / 2, Z_AXIS) },
  ],
  irreps: [
    { label: "A", characters: [1, 1, 1, 1] },
    { label: "E", characters: [2, -1, -1, 2], imaginaryParts: [0, HALF_ROOT_THREE, -HALF_ROOT_THREE, 0] },
    { label: "T", characters: [3, 0, 0, -1] },
  ],
};

const TD: RawCharacterTable = {
  group: "Td",
  classes: [
    E,
    { name: "8C3", size: 8, operation: operation(true, 1 / 3, BODY_DIAGONAL) },
    { name: "3C2", size: 3, operation: operation(true, 1 / 2, Z_AXIS) },
    { name: "6S4", size: 6, operation: operation(false, 1 / 4, Z_AXIS) },
    { name: "6σd", size: 6, operation: operation(false, 0, FACE_DIAGONAL_NORMAL) },
  ],
  irreps: [
    { label: "A1", characters: [1, 1, 1, 1, 1] },
    { label: "A2", characters: [1, 1, 1, -1, -1] },
    { label: "E", characters: [2, -1, 2, 0, 0] },
    { label: "T1", characters: [3, 0, -1, 1, -1] },
    { label: "T2", characters: [3, 0, -1, -1, 1] },
  ],
};

const O: RawCharacterTable = {
  group: "O",
  classes: [
    E,
    { name: "8C3", size: 8, operation: operation(true, 1 / 3, BODY_DIAGONAL) },
    { name: "6C2", size: 6, operation: operation(true, 1 / 2, FACE_DIAGONAL) },
    { name: "6C4", size: 6, operation: operation(true, 1 / 4, Z_AXIS) },
    { name: "3C2(=C4²)", size: 3, operation: operation(true, 1 / 2, Z_AXIS) },
  ],
  irreps: [
    { label: "A1", characters: [1, 1, 1, 1, 1] },
    { label: "A2", characters: [1, 1, -1, -1, 1] },
    { label: "E", characters: [2, -1, 0, 0, 2] },
    { label: "T1", characters: [3, 0, -1, 1, -1] },
    { label: "T2", characters: [3, 0, 1, -1, -1] },
  ],
};

const I: RawCharacterTable = {
  group: "I",
  classes: [
    E,
    { name: "12C5", size: 12, operation: operation(true, 1 / 5, FIVEFOLD) },
    { name: "12C5²", size: 12, operation: operation(true, 2 / 5, FIVEFOLD) },
    { name: "20C3", size: 20, operation: operation(true, 1 / 3, BODY_DIAGONAL) },
    { name: "15C2", size: 15, operation: operation(true, 1 / 2, Z_AXIS) },
  ],
  irreps: [
    { label: "A", characters: [1, 1, 1, 1, 1] },
    { label: "T1", characters: [3, GOLDEN, 1 - GOLDEN, 0, -1] },
    { label: "T2", characters: [3, 1 - GOLDEN, GOLDEN, 0, -1] },
    { label: "G", characters: [4, -1, -1, 1, 0] },
    { label: "H", characters: [5, 0, 0, -1, 1] },
  ],
};

/** The group times {E, i}: classes again after i, irreps once g and once u. */
function withInversion(group: string, table: RawCharacterTable, names: readonly string[]): RawCharacterTable {
  const inverted: SymmetryClass[] = table.classes.map((source, index) => ({
    name: names[index],
    size: source.size,
    operation: composeOperations(INVERSION_OPERATION, source.operation),
  }));
  const irreps: RawIrrep[] = [];
  // (+ 0 turns −0 into 0.)
  for (const [sign, suffix] of [
    [1, "g"],
    [-1, "u"],
  ] as const) {
    for (const irrep of table.irreps) {
      irreps.push({
        label: irrep.label + suffix,
        characters: [...irrep.characters, ...irrep.characters.map((value) => sign * value + 0)],
        ...(irrep.imaginaryParts
          ? { imaginaryParts: [...irrep.imaginaryParts, ...irrep.imaginaryParts.map((value) => sign * value + 0)] }
          : {}),
      });
    }
  }
  return { group, classes: [...table.classes, ...inverted], irreps };
}

const POLYHEDRAL: Readonly<Record<string, RawCharacterTable>> = {
  T,
  Td: TD,
  Th: withInversion("Th", T, ["i", "4S6⁵", "4S6", "3σh"]),
  O,
  Oh: withInversion("Oh", O, ["i", "8S6", "6σd", "6S4", "3σh"]),
  I,
  Ih: withInversion("Ih", I, ["i", "12S10³", "12S10", "20S6", "15σ"]),
};

/** The cubic or icosahedral table of `group`, if it is one. */
export function polyhedralTable(group: string): RawCharacterTable | undefined {
  return Object.prototype.hasOwnProperty.call(POLYHEDRAL, group) ? POLYHEDRAL[group] : undefined;
}
