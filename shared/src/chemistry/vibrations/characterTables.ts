/**
 * Character tables for every finite point group the symmetry search can report, with what each
 * irreducible representation spans: x, y, z and the rotations (worked out from the operations of
 * each class, not typed in), and so whether fundamentals of that symmetry are IR- or Raman-active.
 */
import { axialTable } from "./axialTables";
import { operationMatrix, operationTrace, type ClassOperation } from "./classOperation";
import { polyhedralTable } from "./polyhedralTables";
import type { CharacterTable, IrreducibleRepresentation, RawCharacterTable } from "./tableTypes";

export type { CharacterTable, IrreducibleRepresentation, SymmetryClass } from "./tableTypes";

const tables = new Map<string, CharacterTable | null>();

/**
 * The character table of a finite point group by its Schoenflies symbol ("C2v", "D3h", "Td"),
 * or undefined for a symbol with no finite table (C∞v, D∞h, Kh, or an axis order past the limit).
 */
export function characterTable(group: string): CharacterTable | undefined {
  let table = tables.get(group);
  if (table === undefined) {
    const raw = polyhedralTable(group) ?? axialTable(group);
    table = raw ? completeTable(raw) : null;
    tables.set(group, table);
  }
  return table ?? undefined;
}

/** What the reduction formula needs of a table. */
export interface ReducibleOver {
  readonly order: number;
  readonly classes: readonly { readonly size: number }[];
  readonly irreps: readonly { readonly characters: readonly number[]; readonly imaginaryParts?: readonly number[] }[];
}

/**
 * How many times each irreducible representation occurs in a representation with the given
 * characters (one per class), by the reduction formula n_i = (1/h) Σ g_c χ(c) χ_i(c). Not
 * rounded: a result far from whole numbers means the characters were not a representation.
 */
export function reduceRepresentation(table: ReducibleOver, characters: readonly number[]): number[] {
  return table.irreps.map((irrep) => {
    let sum = 0;
    table.classes.forEach((c, index) => (sum += c.size * characters[index] * irrep.characters[index]));
    // A complex pair's printed characters are the sum of the pair; each member is half of that.
    return sum / (table.order * (irrep.imaginaryParts ? 2 : 1));
  });
}

/** Characters of x, y, z together: the trace of each class's matrix. */
export function vectorCharacters(classes: readonly { readonly operation: ClassOperation }[]): number[] {
  return classes.map((c) => operationTrace(c.operation));
}

/** Characters of the rotations Rx, Ry, Rz: an axial vector turns like x, y, z times the determinant. */
export function rotationCharacters(classes: readonly { readonly operation: ClassOperation }[]): number[] {
  return classes.map((c) => (c.operation.proper ? 1 : -1) * operationTrace(c.operation));
}

/** Characters of the six quadratic functions x², y², z², xy, xz, yz: (χ(R)² + χ(R²)) / 2. */
function quadraticCharacters(classes: readonly { readonly operation: ClassOperation }[]): number[] {
  return classes.map((c) => {
    const trace = operationTrace(c.operation);
    const squared = 1 + 2 * Math.cos(4 * Math.PI * c.operation.turn);
    return (trace * trace + squared) / 2;
  });
}

const AXES = ["x", "y", "z"] as const;

function completeTable(raw: RawCharacterTable): CharacterTable {
  const order = raw.classes.reduce((sum, c) => sum + c.size, 0);
  const base = { order, classes: raw.classes, irreps: raw.irreps };
  const counts = (characters: readonly number[]) => reduceRepresentation(base, characters).map((value) => Math.round(value));
  const dipole = counts(vectorCharacters(raw.classes));
  const quadratic = counts(quadraticCharacters(raw.classes));
  const linear = basisLabels(raw, base, "", () => 1);
  const rotations = basisLabels(raw, base, "R", (op) => (op.proper ? 1 : -1));
  const irreps: IrreducibleRepresentation[] = raw.irreps.map((irrep, index) => ({
    label: irrep.label,
    characters: irrep.characters,
    ...(irrep.imaginaryParts ? { imaginaryParts: irrep.imaginaryParts } : {}),
    degeneracy: irrep.characters[0],
    linear: linear[index],
    rotations: rotations[index],
    ir: dipole[index] > 0,
    raman: quadratic[index] > 0,
  }));
  const centrosymmetric = raw.classes.some((c) => !c.operation.proper && c.operation.turn === 0.5);
  return { group: raw.group, order, classes: raw.classes, irreps, centrosymmetric };
}

/**
 * Which irreducible representation each of x, y, z (or Rx, Ry, Rz) spans. A coordinate that every
 * class sends to plus or minus itself spans a one-dimensional representation of its own; the
 * ones that mix are written together, "(x, y)", under the one representation they span together.
 */
function basisLabels(raw: RawCharacterTable, base: ReducibleOver, prefix: string, determinant: (op: ClassOperation) => number): string[][] {
  const labels: string[][] = raw.irreps.map(() => []);
  const matrices = raw.classes.map((c) => operationMatrix(c.operation));
  const mixed: number[] = [];
  const leftover = raw.classes.map((c) => determinant(c.operation) * operationTrace(c.operation));
  AXES.forEach((axis, k) => {
    const diagonal = matrices.map((matrix, index) => determinant(raw.classes[index].operation) * matrix[k][k]);
    const own = diagonal.every((value) => Math.abs(Math.abs(value) - 1) < 1e-9);
    const match = own
      ? raw.irreps.findIndex((irrep) => !irrep.imaginaryParts && irrep.characters.every((value, c) => Math.abs(value - diagonal[c]) < 1e-9))
      : -1;
    if (match < 0) {
      mixed.push(k);
      return;
    }
    labels[match].push(`${prefix}${axis}`);
    diagonal.forEach((value, c) => (leftover[c] -= value));
  });
  if (mixed.length > 0) {
    const counts = reduceRepresentation(base, leftover).map((value) => Math.round(value));
    const spanned = counts.flatMap((count, index) => (count > 0 ? [index] : []));
    if (spanned.length === 1 && counts[spanned[0]] === 1) {
      labels[spanned[0]].push(`(${mixed.map((k) => `${prefix}${AXES[k]}`).join(", ")})`);
    }
  }
  return labels;
}
