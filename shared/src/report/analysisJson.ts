/**
 * The machine-readable form of one analysis, as printed by `lonepair analyze --json`.
 * The leading field names are a published contract (scripts and CI read them); extra
 * fields may be added after them, never renamed or reordered.
 */
import { shapeOf } from "../chemistry/analysis/shape3d";
import type {
  AngleExpectation,
  AnalysisResult,
  CentreAnalysis,
  LatticeSite,
  MeasuredAngle,
  ProblemCode,
  SpeciesAnalysis,
  SpeciesPart,
} from "../chemistry/types";
import { partShapeText } from "../chemistry/analysis/partShapes";
import { measuredFundamentalsOf, vibrationsOf } from "../chemistry/vibrations/speciesVibrations";
import type { MeasuredFundamentals } from "../chemistry/vibrations/measuredFundamentals";
import type { ModeSymmetry, VibrationalModes } from "../chemistry/vibrations/normalModes";

/** One centre in the JSON output. */
export interface CentreJson {
  readonly index: number;
  readonly atom: string;
  readonly axe: string;
  readonly stericNumber: number;
  readonly bondingDomains: number;
  readonly lonePairs: number;
  readonly electronGeometry: string;
  readonly molecularGeometry: string;
  readonly idealAngles: readonly number[];
  readonly hybridization: string;
  // extras after the fixed fields
  readonly unpairedElectrons: number;
  readonly expectedAngles: readonly AngleExpectation[];
  readonly hybridizationNote?: string;
}

/** A non-zero formal charge on one atom of the chosen Lewis structure. */
export interface FormalChargeJson {
  readonly index: number;
  readonly atom: string;
  readonly formalCharge: number;
}

/** Summary of the chosen Lewis structure. */
export interface LewisJson {
  /** Shared electron pairs, a double bond counting two. */
  readonly bondingPairs: number;
  /** Lone pairs over all atoms. */
  readonly lonePairs: number;
  /** Only atoms whose formal charge is not zero. */
  readonly formalCharges: readonly FormalChargeJson[];
  readonly resonanceForms: number;
}

/** A species that was analysed. */
export interface AnalysisJsonSuccess {
  readonly input: string;
  readonly ok: true;
  readonly formula: string;
  readonly charge: number;
  readonly name: string | null;
  readonly valenceElectrons: number;
  readonly radical: boolean;
  readonly centers: readonly CentreJson[];
  /** Null when the species is too large for the model to judge. */
  readonly polar: boolean | null;
  readonly warnings: readonly string[];
  // extras after the fixed fields
  readonly polarityReason: string;
  /** Schoenflies point group of the model geometry, found by a search for symmetry elements. */
  readonly pointGroup: string | null;
  readonly lewis: LewisJson;
  readonly measuredAngles: readonly MeasuredAngle[];
  /** The state symbol written after the species, when one was: "s", "l", "g", "aq". */
  readonly state?: string;
  /** Isotope labels as written, when there were any. */
  readonly isotopes?: readonly { readonly written: string; readonly symbol: string; readonly massNumber: number }[];
  /** The normal modes by symmetry; null when they are not predicted (`vibrationsNote` says why). */
  readonly vibrations: VibrationsJson | null;
  readonly vibrationsNote?: string;
}

/** How many fundamentals of one symmetry, and where they show. */
export interface VibrationModeJson {
  readonly symmetry: string;
  readonly count: number;
  readonly ir: boolean;
  readonly raman: boolean;
}

/** The vibrational analysis; the leading fields are fixed, extras follow them. */
export interface VibrationsJson {
  readonly pointGroup: string;
  /** 3N − 6 (3N − 5 if linear), degenerate modes counted with their degeneracy. */
  readonly modes: number;
  readonly representation: readonly VibrationModeJson[];
  /** Each occurrence of an IR-active symmetry is one band. */
  readonly irBands: number;
  readonly ramanBands: number;
  /** Occurrences of symmetries active in neither spectrum. */
  readonly silent: number;
  /** The stretching modes alone (bond vectors). */
  readonly stretching: readonly VibrationModeJson[];
  // extras after the fixed fields
  readonly centrosymmetric: boolean;
  /** Bands expected in both spectra; 0 for a centrosymmetric species. */
  readonly coincidences: number;
  /** For a linear molecule, the finite group the counting was done in. */
  readonly countedIn?: string;
  /** Measured gas-phase fundamentals (cm⁻¹) with their source, for the species that have them listed. */
  readonly measured?: MeasuredFundamentals;
}

/** A species that could not be read or analysed. */
export interface AnalysisJsonFailure {
  readonly input: string;
  readonly ok: false;
  readonly error: {
    readonly code: ProblemCode;
    readonly message: string;
    readonly suggestion?: string;
  };
  // extras after the fixed fields
  /** The canonical formula, when the text was read. */
  readonly formula?: string;
  readonly name?: string;
  /** A salt's ions, a hydrate's parts, a hydroxo ion's metal and ligands, each analysed on its own. */
  readonly parts?: readonly PartJson[];
  /** A network solid's atoms, each with its surroundings in the solid. */
  readonly lattice?: readonly LatticeSite[];
}

/** One part of a salt, hydrate or complex ion. */
export interface PartJson {
  readonly role: SpeciesPart["role"];
  readonly count: number;
  readonly formula: string;
  readonly monatomic: boolean;
  /** The part's shape in a few words: "tetrahedral", "monatomic ion, no shape of its own". */
  readonly shape: string;
  /** The part's own analysis in this same form; absent for a monatomic part. */
  readonly analysis?: AnalysisJson;
}

export type AnalysisJson = AnalysisJsonSuccess | AnalysisJsonFailure;

/**
 * Turns an analysis into plain JSON-ready data with the fixed field order.
 * `input` is the text exactly as the user gave it.
 */
export function toAnalysisJson(input: string, result: AnalysisResult): AnalysisJson {
  if (!result.ok) {
    const { code, message, suggestion } = result.problem;
    const failure: AnalysisJsonFailure = {
      input,
      ok: false,
      error: suggestion === undefined ? { code, message } : { code, message, suggestion },
    };
    const { reading } = result;
    if (result.lattice)
      return {
        ...failure,
        ...(reading ? { formula: reading.formula } : {}),
        ...(reading?.name ? { name: reading.name } : {}),
        lattice: result.lattice.map((site) => ({ ...site })),
      };
    if (!result.parts) return failure;
    return {
      ...failure,
      ...(reading ? { formula: reading.formula } : {}),
      ...(reading?.name ? { name: reading.name } : {}),
      parts: result.parts.map(partJson),
    };
  }
  return successJson(input, result.value);
}

function successJson(input: string, analysis: SpeciesAnalysis): AnalysisJsonSuccess {
  const { reading } = analysis;
  return {
    input,
    ok: true,
    formula: reading.formula,
    charge: reading.charge,
    name: reading.name ?? null,
    valenceElectrons: analysis.valenceElectrons,
    radical: analysis.radical,
    centers: analysis.centres.map(centreJson),
    // null: too large for the model to judge (polarityReason says so).
    polar: analysis.polarity.undetermined ? null : analysis.polarity.polar,
    warnings: [...analysis.warnings],
    polarityReason: analysis.polarity.reason,
    pointGroup: shapeOf(analysis).pointGroup ?? null,
    lewis: lewisJson(analysis),
    measuredAngles: analysis.measuredAngles.map((angle) => ({ ...angle })),
    ...(reading.state ? { state: reading.state } : {}),
    ...(reading.isotopes ? { isotopes: reading.isotopes.map((label) => ({ ...label })) } : {}),
    ...vibrationsFields(analysis),
  };
}

function vibrationsFields(analysis: SpeciesAnalysis): { vibrations: VibrationsJson | null; vibrationsNote?: string } {
  const result = vibrationsOf(analysis);
  if (!result.ok) return { vibrations: null, vibrationsNote: result.reason };
  const measured = measuredFundamentalsOf(analysis);
  const vibrations = vibrationsJson(result.value);
  return {
    vibrations: measured
      ? { ...vibrations, measured: { ...measured, fundamentals: measured.fundamentals.map((value) => ({ ...value })) } }
      : vibrations,
  };
}

function modeJson(mode: ModeSymmetry): VibrationModeJson {
  return { symmetry: mode.symmetry, count: mode.count, ir: mode.ir, raman: mode.raman };
}

/** The vibrations object of `analyze --json`, with its fixed field order. */
export function vibrationsJson(value: VibrationalModes): VibrationsJson {
  return {
    pointGroup: value.pointGroup,
    modes: value.modes,
    representation: value.representation.map(modeJson),
    irBands: value.irBands,
    ramanBands: value.ramanBands,
    silent: value.silent,
    stretching: value.stretching.map(modeJson),
    centrosymmetric: value.centrosymmetric,
    coincidences: value.coincidences,
    ...(value.countedIn ? { countedIn: value.countedIn } : {}),
  };
}

function partJson(part: SpeciesPart): PartJson {
  const json: PartJson = {
    role: part.role,
    count: part.count,
    formula: part.formula,
    monatomic: part.monatomic,
    shape: partShapeText(part),
  };
  return part.analysis ? { ...json, analysis: toAnalysisJson(part.formula, part.analysis) } : json;
}

function centreJson(centre: CentreAnalysis): CentreJson {
  const json: CentreJson = {
    index: centre.index,
    atom: centre.atom,
    axe: centre.axe,
    stericNumber: centre.stericNumber,
    bondingDomains: centre.bondingDomains,
    lonePairs: centre.lonePairs,
    electronGeometry: centre.electronGeometry,
    molecularGeometry: centre.molecularGeometry,
    idealAngles: [...centre.idealAngles],
    hybridization: centre.hybridization,
    unpairedElectrons: centre.unpairedElectrons,
    expectedAngles: centre.expectedAngles.map((angle) => ({ ...angle })),
  };
  return centre.hybridizationNote === undefined ? json : { ...json, hybridizationNote: centre.hybridizationNote };
}

/** Counts the chosen Lewis structure's electron pairs; shared with the text card. */
export function lewisJson(analysis: SpeciesAnalysis): LewisJson {
  const { atoms, bonds } = analysis.graph;
  return {
    bondingPairs: bonds.reduce((sum, bond) => sum + bond.order, 0),
    lonePairs: atoms.reduce((sum, atom) => sum + atom.lonePairs, 0),
    formalCharges: atoms.flatMap((atom, index) =>
      atom.formalCharge === 0 ? [] : [{ index, atom: atom.symbol, formalCharge: atom.formalCharge }],
    ),
    resonanceForms: analysis.resonanceForms,
  };
}
