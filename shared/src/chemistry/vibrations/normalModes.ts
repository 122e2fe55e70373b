/**
 * The symmetry of a molecule's normal modes from its 3D coordinates: the operation of each class
 * is applied to the coordinates to count the atoms it leaves in place, which gives the reducible
 * representation of the 3N displacements (each unmoved atom contributes the trace of the
 * operation); translations and rotations are taken away and the rest is reduced. The bond
 * vectors give the stretching modes the same way (a bond counts when it is left in place).
 */
import { dot, type Vec3 } from "../geometry/vectors";
import type { Matrix3 } from "../geometry/symmetricEigen";
import { centreMolecule, type CentredMolecule, type PositionedAtom } from "../symmetry/centredMolecule";
import { classifyPointGroup } from "../symmetry/classifyPointGroup";
import { findSymmetryElements } from "../symmetry/findSymmetryElements";
import { DEFAULT_SYMMETRY_TOLERANCE, findPointGroup, MAX_SYMMETRY_ATOMS, type PointGroupSearch } from "../symmetry/pointGroup";
import { symmetryPermutation } from "../symmetry/operations";
import { characterTable, reduceRepresentation, rotationCharacters, vectorCharacters } from "./characterTables";
import { multiplyMatrices, operationMatrix } from "./classOperation";
import { correlateToLinear, linearSubgroup } from "./linearGroups";
import { candidateFrames, type SymmetryFrame } from "./symmetryFrame";
import type { CharacterTable } from "./tableTypes";

/** How many fundamentals of one symmetry there are, and whether they show in IR and Raman. */
export interface ModeSymmetry {
  /** Mulliken label: "A1g", "T1u", "Πu". */
  readonly symmetry: string;
  readonly count: number;
  readonly ir: boolean;
  readonly raman: boolean;
  /** 1, or 2 and 3 for a degenerate set (which is one band). */
  readonly degeneracy: number;
}

/** The vibrational analysis of one molecule. */
export interface VibrationalModes {
  /** The point group the analysis used (the model's). */
  readonly pointGroup: string;
  /** 3N − 6, or 3N − 5 for a linear molecule: degenerate modes counted with their degeneracy. */
  readonly modes: number;
  /** Γvib reduced, in the character table's order. */
  readonly representation: readonly ModeSymmetry[];
  /** Fundamentals expected in the IR spectrum: each occurrence of an IR-active symmetry is one band. */
  readonly irBands: number;
  /** Fundamentals expected in the Raman spectrum, counted the same way. */
  readonly ramanBands: number;
  /** Fundamentals active in neither. */
  readonly silent: number;
  /** The stretching modes alone (the representation of the bond vectors). */
  readonly stretching: readonly ModeSymmetry[];
  /** The group holds an inversion centre, so no fundamental is both IR- and Raman-active. */
  readonly centrosymmetric: boolean;
  /** Fundamentals active in both spectra (coinciding bands); 0 when centrosymmetric. */
  readonly coincidences: number;
  /** For a linear molecule, the finite subgroup the counting was done in ("C2v" or "D2h"). */
  readonly countedIn?: string;
}

export type VibrationalModesResult =
  { readonly ok: true; readonly value: VibrationalModes } | { readonly ok: false; readonly reason: string };

/** "2A1 + B2": the symmetry species with their counts, in character-table order. */
export function modeSum(modes: readonly ModeSymmetry[]): string {
  return modes.map((mode) => `${mode.count > 1 ? mode.count : ""}${mode.symmetry}`).join(" + ");
}

/** Options for {@link vibrationalModes}. */
export interface VibrationalModesOptions {
  /** The point group, when already found for these coordinates (saves a second search). */
  readonly pointGroup?: string;
  /** Ångströms; the same tolerance the point group was found with. */
  readonly tolerance?: number;
  /** The search that found the point group for these coordinates, whose elements are then reused. */
  readonly search?: PointGroupSearch;
}

/**
 * Works out the symmetry species of the normal modes of the molecule given by `atoms` (element
 * labels and positions in ångströms) and `bonds` (pairs of atom indices). Never throws.
 */
export function vibrationalModes(
  atoms: readonly PositionedAtom[],
  bonds: readonly (readonly [number, number])[],
  options: VibrationalModesOptions = {},
): VibrationalModesResult {
  const tolerance = options.tolerance ?? DEFAULT_SYMMETRY_TOLERANCE;
  if (atoms.length < 2) return { ok: false, reason: "a single atom has no vibrations" };
  if (atoms.length > MAX_SYMMETRY_ATOMS) {
    return { ok: false, reason: `${atoms.length} atoms is more than the ${MAX_SYMMETRY_ATOMS} the symmetry search takes at once` };
  }
  let group = options.pointGroup;
  if (group === undefined) {
    const found = findPointGroup(atoms, tolerance);
    if (!found.ok) return { ok: false, reason: found.problem.message };
    group = found.value.symbol;
  }
  const subgroup = linearSubgroup(group);
  const table = characterTable(subgroup ?? group);
  if (!table) return { ok: false, reason: `no character table for the point group ${group}` };
  if (group === "C1") return trivialModes(table, atoms.length, bonds.length);

  const reused = options.search?.molecule && options.search.molecule.atoms.length === atoms.length ? options.search : undefined;
  const molecule = reused?.molecule ?? centreMolecule(atoms, tolerance);
  const elements = subgroup ? undefined : (reused?.elements ?? findSymmetryElements(molecule, tolerance));
  const principal = elements ? classifyPointGroup(elements).principalAxis?.direction : undefined;
  for (const frame of candidateFrames(group, molecule, elements, principal, tolerance)) {
    const permutations = classPermutations(table, frame, molecule, tolerance);
    if (permutations) return countModes(group, table, permutations, atoms.length, bonds, subgroup);
  }
  return { ok: false, reason: `the model's ${group} symmetry elements could not be matched to the ${group} character table` };
}

/** Where each class's operation sends the atoms, or undefined if one does not map the molecule onto itself. */
function classPermutations(
  table: CharacterTable,
  frame: SymmetryFrame,
  molecule: CentredMolecule,
  tolerance: number,
): (readonly number[])[] | undefined {
  // Columns x, y, z: standard-frame coordinates into the molecule's frame.
  const toMolecule: Matrix3 = [
    [frame.x[0], frame.y[0], frame.z[0]],
    [frame.x[1], frame.y[1], frame.z[1]],
    [frame.x[2], frame.y[2], frame.z[2]],
  ];
  const toStandard: Matrix3 = [frame.x, frame.y, frame.z];
  const result: (readonly number[])[] = [];
  for (const c of table.classes) {
    const matrix = multiplyMatrices(toMolecule, multiplyMatrices(operationMatrix(c.operation), toStandard));
    const permutation = symmetryPermutation(molecule, matrix, tolerance);
    if (!permutation) return undefined;
    result.push(permutation);
  }
  return result;
}

function countModes(
  group: string,
  table: CharacterTable,
  permutations: readonly (readonly number[])[],
  atomCount: number,
  bonds: readonly (readonly [number, number])[],
  subgroup: "C2v" | "D2h" | undefined,
): VibrationalModesResult {
  const vector = vectorCharacters(table.classes);
  const unmoved = permutations.map((permutation) => permutation.filter((image, index) => image === index).length);
  const displacements = unmoved.map((count, index) => count * vector[index]);
  let rotations = rotationCharacters(table.classes);
  // A linear molecule has no rotation about its own axis (z of the subgroup's frame).
  if (subgroup) rotations = rotations.map((value, index) => value - rotationAboutZ(table, index));
  const vibrations = displacements.map((value, index) => value - vector[index] - rotations[index]);
  const stretches = permutations.map((permutation) => bonds.filter(([a, b]) => sameBond(permutation[a], permutation[b], a, b)).length);

  const vibrationCounts = wholeCounts(reduceRepresentation(table, vibrations));
  const stretchCounts = wholeCounts(reduceRepresentation(table, stretches));
  if (!vibrationCounts || !stretchCounts) return { ok: false, reason: `the modes did not reduce to whole numbers in ${table.group}` };
  const expectedModes = 3 * atomCount - (subgroup ? 5 : 6);

  const listed = (counts: readonly number[]) => speciesList(table, counts, subgroup);
  const representation = listed(vibrationCounts);
  const stretching = listed(stretchCounts);
  if (!representation || !stretching) return { ok: false, reason: `the modes of a linear molecule did not correlate from ${table.group}` };
  const modes = representation.reduce((sum, mode) => sum + mode.count * mode.degeneracy, 0);
  if (modes !== expectedModes)
    return { ok: false, reason: `the modes add up to ${modes}, not 3N − ${subgroup ? 5 : 6} = ${expectedModes}` };
  return { ok: true, value: summarise(group, representation, stretching, table.centrosymmetric, subgroup) };
}

/** A C1 molecule: every mode is A, IR- and Raman-active; no search needed. */
function trivialModes(table: CharacterTable, atomCount: number, bondCount: number): VibrationalModesResult {
  const [irrep] = table.irreps;
  const modes = 3 * atomCount - 6;
  if (modes <= 0) return { ok: false, reason: "too few atoms for a molecule with no symmetry" };
  const entry = (count: number): ModeSymmetry[] =>
    count > 0 ? [{ symmetry: irrep.label, count, ir: irrep.ir, raman: irrep.raman, degeneracy: 1 }] : [];
  return { ok: true, value: summarise("C1", entry(modes), entry(bondCount), false, undefined) };
}

function summarise(
  group: string,
  representation: readonly ModeSymmetry[],
  stretching: readonly ModeSymmetry[],
  centrosymmetric: boolean,
  subgroup: string | undefined,
): VibrationalModes {
  const total = (pick: (mode: ModeSymmetry) => boolean) => representation.filter(pick).reduce((sum, mode) => sum + mode.count, 0);
  return {
    pointGroup: group,
    modes: representation.reduce((sum, mode) => sum + mode.count * mode.degeneracy, 0),
    representation,
    irBands: total((mode) => mode.ir),
    ramanBands: total((mode) => mode.raman),
    silent: total((mode) => !mode.ir && !mode.raman),
    stretching,
    centrosymmetric,
    coincidences: total((mode) => mode.ir && mode.raman),
    ...(subgroup ? { countedIn: subgroup } : {}),
  };
}

function speciesList(table: CharacterTable, counts: readonly number[], subgroup: "C2v" | "D2h" | undefined): ModeSymmetry[] | undefined {
  if (subgroup) {
    const byLabel = new Map(table.irreps.map((irrep, index) => [irrep.label, counts[index]]));
    const linear = correlateToLinear(subgroup, byLabel);
    return linear?.map(({ species, count }) => ({
      symmetry: species.label,
      count,
      ir: species.ir,
      raman: species.raman,
      degeneracy: species.degeneracy,
    }));
  }
  return table.irreps.flatMap((irrep, index) =>
    counts[index] > 0
      ? [{ symmetry: irrep.label, count: counts[index], ir: irrep.ir, raman: irrep.raman, degeneracy: irrep.degeneracy }]
      : [],
  );
}

/** Whole, non-negative counts, or undefined when the reduction went wrong. */
function wholeCounts(values: readonly number[]): number[] | undefined {
  const rounded = values.map((value) => Math.round(value));
  const whole = values.every((value, index) => Math.abs(value - rounded[index]) < 1e-6 && rounded[index] >= 0);
  return whole ? rounded.map((value) => value + 0) : undefined;
}

function sameBond(imageA: number, imageB: number, a: number, b: number): boolean {
  return (imageA === a && imageB === b) || (imageA === b && imageB === a);
}

/** The character of Rz under one class: the determinant times the zz entry (z maps to ±z in C2v and D2h). */
function rotationAboutZ(table: CharacterTable, index: number): number {
  const op = table.classes[index].operation;
  const zz = dot(operationMatrix(op)[2], [0, 0, 1] satisfies Vec3);
  return (op.proper ? 1 : -1) * zz;
}
