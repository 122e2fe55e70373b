/**
 * Measured gas-phase bond angles for well-known species, shown beside the model's prediction.
 * Keyed by composition (element symbols sorted, with counts) and charge, so any way of writing
 * the species finds them.
 */
import type { FormulaPart, MeasuredAngle } from "../types";
import { compareCodeUnits, sortSmall } from "../sortSmall";

const GAS_PHASE = "gas-phase structure (CRC Handbook of Chemistry and Physics, free molecules)";

const TABLE: Readonly<Record<string, readonly (readonly [number, string])[]>> = {
  H2O: [[104.5, "H-O-H"]],
  H2S: [[92.1, "H-S-H"]],
  H2Se: [[91.0, "H-Se-H"]],
  H3N: [[106.7, "H-N-H"]],
  H3P: [[93.3, "H-P-H"]],
  AsH3: [[92.1, "H-As-H"]],
  F3N: [[102.4, "F-N-F"]],
  F3P: [[97.8, "F-P-F"]],
  Cl3P: [[100.3, "Cl-P-Cl"]],
  Cl3N: [[107.1, "Cl-N-Cl"]],
  F2O: [[103.1, "F-O-F"]],
  Cl2O: [[110.9, "Cl-O-Cl"]],
  Cl2S: [[102.7, "Cl-S-Cl"]],
  O2S: [[119.3, "O-S-O"]],
  O3: [[116.8, "O-O-O"]],
  NO2: [[134.1, "O-N-O"]],
  ClO2: [[117.4, "O-Cl-O"]],
  ClNO: [[113.3, "O-N-Cl"]],
  F4S: [
    [101.6, "F(eq)-S-F(eq)"],
    [173.1, "F(ax)-S-F(ax)"],
  ],
  ClF3: [[87.5, "F(ax)-Cl-F(eq)"]],
  BrF3: [[86.2, "F(ax)-Br-F(eq)"]],
  BrF5: [[84.8, "F(ax)-Br-F(basal)"]],
  F2Xe: [[180, "F-Xe-F"]],
  F4Xe: [[90, "F-Xe-F"]],
  BF3: [[120, "F-B-F"]],
  O3S: [[120, "O-S-O"]],
  CO2: [[180, "O-C-O"]],
  CHN: [[180, "H-C-N"]],
  CH4: [[109.5, "H-C-H"]],
  H4Si: [[109.5, "H-Si-H"]],
  CCl4: [[109.5, "Cl-C-Cl"]],
  F4Si: [[109.5, "F-Si-F"]],
  F6S: [[90, "F-S-F"]],
  CH2O: [[116.5, "H-C-H"]],
  CCl2O: [[111.8, "Cl-C-Cl"]],
  Cl2OS: [[96.2, "Cl-S-Cl"]],
  Cl3OP: [[103.7, "Cl-P-Cl"]],
  Cl2O2S: [[100.3, "Cl-S-Cl"]],
};

/** Key such as "F4S" (symbols in alphabetical order) plus "^charge" for ions. */
export function compositionKey(composition: readonly FormulaPart[], charge: number): string {
  const counts = new Map<string, number>();
  for (const part of composition) counts.set(part.symbol, (counts.get(part.symbol) ?? 0) + part.count);
  const body = sortSmall([...counts.entries()], ([a], [b]) => compareCodeUnits(a, b))
    .map(([symbol, count]) => (count === 1 ? symbol : `${symbol}${count}`))
    .join("");
  return charge === 0 ? body : `${body}^${charge}`;
}

/** Every species in the table has at most three elements and seven atoms. */
const MAX_TABLE_PARTS = 3;
const MAX_TABLE_ATOMS = 7;

export function measuredAnglesFor(composition: readonly FormulaPart[], charge: number): MeasuredAngle[] {
  if (composition.length > MAX_TABLE_PARTS) return [];
  let atoms = 0;
  for (const part of composition) atoms += part.count;
  if (atoms > MAX_TABLE_ATOMS) return [];
  const entries = TABLE[compositionKey(composition, charge)] ?? [];
  return entries.map(([degrees, between]) => ({ degrees, between, source: GAS_PHASE }));
}
