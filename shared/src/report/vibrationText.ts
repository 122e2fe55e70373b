/**
 * The vibrational analysis in words, shared by the text card, the hover and the JSON: one
 * decision about how modes and band counts are written.
 */
import type { MeasuredFundamentals } from "../chemistry/vibrations/measuredFundamentals";
import { modeSum, type ModeSymmetry, type VibrationalModes, type VibrationalModesResult } from "../chemistry/vibrations/normalModes";

export { modeSum };

function bands(count: number): string {
  return `${count} band${count === 1 ? "" : "s"}`;
}

function symmetriesOf(modes: readonly ModeSymmetry[]): string {
  return modes.length === 0 ? "" : ` (${modes.map((mode) => mode.symmetry).join(", ")})`;
}

/** "15 modes: A1g + Eg + T2g + 2T1u + T2u". */
export function modesLine(value: VibrationalModes): string {
  return `${value.modes} mode${value.modes === 1 ? "" : "s"}: ${modeSum(value.representation)}`;
}

/** "IR: 2 bands (T1u); Raman: 3 bands (A1g, Eg, T2g); 1 silent (T2u)". */
export function bandsLine(value: VibrationalModes): string {
  const ir = value.representation.filter((mode) => mode.ir);
  const raman = value.representation.filter((mode) => mode.raman);
  const silent = value.representation.filter((mode) => !mode.ir && !mode.raman);
  const parts = [`IR: ${bands(value.irBands)}${symmetriesOf(ir)}`, `Raman: ${bands(value.ramanBands)}${symmetriesOf(raman)}`];
  parts.push(value.silent === 0 ? "none silent" : `${value.silent} silent${symmetriesOf(silent)}`);
  return parts.join("; ");
}

/** The mutual exclusion rule, or how many bands show in both spectra. */
export function coincidenceLine(value: VibrationalModes): string {
  if (value.centrosymmetric) return "centre of symmetry: no band is both IR- and Raman-active (mutual exclusion)";
  if (value.coincidences === 0) return "no band is both IR- and Raman-active";
  return `${bands(value.coincidences)} in both IR and Raman`;
}

/** "A1g + Eg + T1u: IR 1 band, Raman 2 bands". */
export function stretchingLine(value: VibrationalModes): string {
  const ir = value.stretching.filter((mode) => mode.ir).reduce((sum, mode) => sum + mode.count, 0);
  const raman = value.stretching.filter((mode) => mode.raman).reduce((sum, mode) => sum + mode.count, 0);
  return `${modeSum(value.stretching)}: IR ${bands(ir)}, Raman ${bands(raman)}`;
}

/** For a linear molecule, where the counting was done. */
export function countedInNote(value: VibrationalModes): string | undefined {
  return value.countedIn ? `counted in ${value.countedIn} and correlated to ${value.pointGroup}` : undefined;
}

/** The one-line reason given in place of the numbers. */
export function notPredictedLine(result: Extract<VibrationalModesResult, { ok: false }>): string {
  return `not predicted: ${result.reason}`;
}

/** "ν1 3657 (A1), ν2 1595 (A1), ν3 3756 (B2) cm⁻¹". */
export function measuredLine(measured: MeasuredFundamentals): string {
  return `${measured.fundamentals.map((value) => `${value.mode} ${value.wavenumber} (${value.symmetry})`).join(", ")} cm⁻¹`;
}
