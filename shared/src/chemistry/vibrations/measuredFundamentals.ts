/**
 * Measured gas-phase fundamentals of common gases, shown beside the symmetry prediction the way
 * measured angles are shown beside the VSEPR ones. Each value carries its source.
 */
import type { FormulaPart } from "../types";
import { compositionKey } from "../vsepr/measuredAngles";
import type { VibrationalModes } from "./normalModes";

/** One measured fundamental: its usual number (ν1, ν2, ...), symmetry and wavenumber in cm⁻¹. */
export interface MeasuredFundamental {
  readonly mode: string;
  readonly symmetry: string;
  readonly wavenumber: number;
}

/** The measured fundamentals of one species, with where they come from. */
export interface MeasuredFundamentals {
  readonly fundamentals: readonly MeasuredFundamental[];
  readonly source: string;
  /** A remark on a value (a band split by Fermi resonance, a mode seen only in combination). */
  readonly note?: string;
}

const SOURCE = "gas-phase fundamentals, Shimanouchi, Tables of Molecular Vibrational Frequencies (NSRDS-NBS 39)";

interface Entry {
  /** The point group the values belong to; the table answers only a model of that group. */
  readonly group: string;
  readonly values: readonly (readonly [string, string, number])[];
  readonly note?: string;
}

// from memory: Shimanouchi, Tables of Molecular Vibrational Frequencies, Consolidated Volume I
// (NSRDS-NBS 39, 1972), gas-phase values; symmetry labels in the core's convention
// (planar C2v molecules in the yz plane)
const MEASURED: Readonly<Record<string, Entry>> = {
  H2O: {
    group: "C2v",
    values: [
      ["ν1", "A1", 3657],
      ["ν2", "A1", 1595],
      ["ν3", "B2", 3756],
    ],
  },
  CO2: {
    group: "D∞h",
    values: [
      ["ν1", "Σg+", 1333],
      ["ν2", "Πu", 667],
      ["ν3", "Σu+", 2349],
    ],
    note: "ν1 is split by Fermi resonance with 2ν2 into Raman bands at 1285 and 1388 cm⁻¹",
  },
  H3N: {
    group: "C3v",
    values: [
      ["ν1", "A1", 3337],
      ["ν2", "A1", 950],
      ["ν3", "E", 3444],
      ["ν4", "E", 1627],
    ],
    note: "ν2 is split by inversion doubling into 932 and 968 cm⁻¹",
  },
  CH4: {
    group: "Td",
    values: [
      ["ν1", "A1", 2917],
      ["ν2", "E", 1534],
      ["ν3", "T2", 3019],
      ["ν4", "T2", 1306],
    ],
  },
  F6S: {
    group: "Oh",
    values: [
      ["ν1", "A1g", 775],
      ["ν2", "Eg", 643],
      ["ν3", "T1u", 948],
      ["ν4", "T1u", 615],
      ["ν5", "T2g", 524],
      ["ν6", "T2u", 347],
    ],
    note: "ν6 is inactive in both spectra; its value comes from combination bands",
  },
  O2S: {
    group: "C2v",
    values: [
      ["ν1", "A1", 1151],
      ["ν2", "A1", 518],
      ["ν3", "B2", 1362],
    ],
  },
  O3: {
    group: "C2v",
    values: [
      ["ν1", "A1", 1103],
      ["ν2", "A1", 701],
      ["ν3", "B2", 1042],
    ],
  },
  N2O: {
    group: "C∞v",
    values: [
      ["ν1", "Σ+", 1285],
      ["ν2", "Π", 589],
      ["ν3", "Σ+", 2224],
    ],
  },
  F3N: {
    group: "C3v",
    values: [
      ["ν1", "A1", 1032],
      ["ν2", "A1", 647],
      ["ν3", "E", 907],
      ["ν4", "E", 492],
    ],
  },
  C2H2: {
    group: "D∞h",
    values: [
      ["ν1", "Σg+", 3374],
      ["ν2", "Σg+", 1974],
      ["ν3", "Σu+", 3289],
      ["ν4", "Πg", 612],
      ["ν5", "Πu", 730],
    ],
  },
  CO: { group: "C∞v", values: [["ν", "Σ+", 2143]] },
  N2: { group: "D∞h", values: [["ν", "Σg+", 2331]] },
  ClH: { group: "C∞v", values: [["ν", "Σ+", 2886]] },
};

/**
 * The measured fundamentals of a species, when they are listed and belong to the analysed
 * model: same point group, and one value for every predicted fundamental of each symmetry.
 */
export function measuredFundamentalsFor(
  composition: readonly FormulaPart[],
  charge: number,
  predicted: VibrationalModes,
): MeasuredFundamentals | undefined {
  const entry = MEASURED[compositionKey(composition, charge)];
  if (!entry || entry.group !== predicted.pointGroup) return undefined;
  const listed = new Map<string, number>();
  for (const [, symmetry] of entry.values) listed.set(symmetry, (listed.get(symmetry) ?? 0) + 1);
  const agrees =
    listed.size === predicted.representation.length && predicted.representation.every((mode) => listed.get(mode.symmetry) === mode.count);
  if (!agrees) return undefined;
  return {
    fundamentals: entry.values.map(([mode, symmetry, wavenumber]) => ({ mode, symmetry, wavenumber })),
    source: SOURCE,
    ...(entry.note ? { note: entry.note } : {}),
  };
}
