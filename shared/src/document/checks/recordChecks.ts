/**
 * Compares the cells of one table record with what the core works out for its species, and
 * proposes the computed value, written in the cell's own style, where they disagree.
 */
import type { CentreAnalysis, SpeciesAnalysis, TextRange } from "../../chemistry/types";
import { speciesTextOf } from "../analyzeOccurrence";
import { chargeInStyleOf, chargeOfCell } from "../tables/chargeColumn";
import type { Finding, TableCell, TableRecord } from "../types";
import { angleInStyleOf, hasUncertainty, mayHaveDecimalComma, parseAngles, type WrittenAngles } from "./angleText";
import { axeInStyleOf, parseAxe } from "./axeText";
import { computedGeometry, geometryInStyleOf, normalizeGeometry, readGeometry } from "./geometryText";
import { hybridizationInStyleOf, normalizeHybridization } from "./hybridizationText";
import { parsePolarity, polarityInStyleOf } from "./polarityText";
import { vibrationsOf } from "../../chemistry/vibrations/speciesVibrations";
import { modeSum } from "../../chemistry/vibrations/normalModes";

const MODEL = "(VSEPR model prediction)";

/** Every disagreement between `record`'s cells and `analysis`, added to `into` (returned). */
export function checkRecord(record: TableRecord, analysis: SpeciesAnalysis, into: Finding[] = []): Finding[] {
  const species = speciesTextOf(record.species);
  const centre = analysis.centres[0];
  let past: PastChecks | undefined;
  for (const cell of record.cells) {
    past ??= pastChecksOf(analysis, species);
    const finding = knownCheck(past, cell, species, analysis, centre);
    if (finding) into.push(finding);
  }
  return into;
}

/**
 * The checks of `record` that need its reading only, for a species the model does not analyse
 * (Fe3+, Fe(CN)6^3-, UO2^2+): a charge column that contradicts the charge written in the formula.
 * A salt or metal compound written without a charge ("iron(III) chloride" beside "+3") is left
 * alone: there the column most likely gives its cation's charge.
 */
export function checkRecordReading(record: TableRecord, into: Finding[] = []): Finding[] {
  if (record.species.reading.charge === 0) return into;
  for (const cell of record.cells) {
    if (cell.meaning !== "charge") continue;
    const finding = checkCharge(cell, speciesTextOf(record.species), record.species.reading.charge);
    if (finding) into.push(finding);
  }
  return into;
}

/** Past results by column meaning, then cell text; `null` when the cell was found right. */
type PastChecks = Map<string, Map<string, Finding | null>>;

/**
 * Past results per analysis and species text: a table repeats the same values, and the same value
 * for the same species always gets the same finding, only at another range. Weakly held, so an
 * analysis dropped by the core's memo takes its results along.
 */
const pastChecks = new WeakMap<SpeciesAnalysis, Map<string, PastChecks>>();

/** Distinct cells remembered per analysis and column; free text must not grow this without end. */
const PAST_CHECKS_LIMIT = 4096;

function pastChecksOf(analysis: SpeciesAnalysis, species: string): PastChecks {
  let bySpecies = pastChecks.get(analysis);
  if (!bySpecies) {
    bySpecies = new Map();
    pastChecks.set(analysis, bySpecies);
  }
  let past = bySpecies.get(species);
  if (!past) {
    if (bySpecies.size >= PAST_CHECKS_LIMIT) bySpecies.clear();
    past = new Map();
    bySpecies.set(species, past);
  }
  return past;
}

function knownCheck(
  past: PastChecks,
  cell: TableCell,
  species: string,
  analysis: SpeciesAnalysis,
  centre: CentreAnalysis | undefined,
): Finding | undefined {
  // A word reads, and a fix is written, in the column's language: "polar" is checked alike, fixed apart.
  const key = cell.language ? `${cell.meaning} ${cell.language}` : cell.meaning;
  let column = past.get(key);
  if (!column) {
    column = new Map();
    past.set(key, column);
  }
  const known = column.get(cell.text);
  if (known === null) return undefined;
  if (known) return placedAt(known, cell.range);
  const finding = checkCell(cell, species, analysis, centre);
  if (column.size >= PAST_CHECKS_LIMIT) column.clear();
  column.set(cell.text, finding ?? null);
  return finding;
}

/** A remembered finding moved to another cell: the finding and its fix cover the whole cell. */
function placedAt(finding: Finding, range: TextRange): Finding {
  if (finding.range === range) return finding;
  const placed: Finding = finding.fix ? { ...finding, range, fix: { ...finding.fix, range } } : { ...finding, range };
  return finding.choices ? { ...placed, choices: finding.choices.map((choice) => ({ ...choice, range })) } : placed;
}

/** What a one-value cell about "the" centre says of each centre, for species with several. */
const CENTRE_VALUES: Partial<Record<TableCell["meaning"], (centre: CentreAnalysis) => string>> = {
  lonePairs: (centre) => `${centre.lonePairs} lone pair${centre.lonePairs === 1 ? "" : "s"}`,
  axe: (centre) => centre.axe,
  electronGeometry: (centre) => centre.electronGeometry,
  molecularGeometry: (centre) => centre.molecularGeometry,
  hybridization: (centre) => centre.hybridization,
  bondAngle: (centre) => `${centre.idealAngles.map((angle) => `${angle}°`).join("/")} ideal`,
};

function checkCell(cell: TableCell, species: string, analysis: SpeciesAnalysis, centre: CentreAnalysis | undefined): Finding | undefined {
  const valueOf = CENTRE_VALUES[cell.meaning];
  if (valueOf && analysis.centres.length > 1 && !isPerCentre(cell.text)) return checkAnyCentre(cell, species, analysis, valueOf);
  return checkOneCentre(cell, species, analysis, centre);
}

/**
 * One value for a species with several centres ("trigonal planar" for CH3COCH3, "bent" for
 * CH3CH2OH): the writer describes one of them, so the value is right when some centre has it.
 * Otherwise the finding lists the centres, with no fix: which one was meant is not for lonepair
 * to guess.
 */
function checkAnyCentre(
  cell: TableCell,
  species: string,
  analysis: SpeciesAnalysis,
  valueOf: (centre: CentreAnalysis) => string,
): Finding | undefined {
  const centres = analysis.centres.filter(
    (centre, index) => analysis.centres.findIndex((other) => other.atom === centre.atom && valueOf(other) === valueOf(centre)) === index,
  );
  let first: Finding | undefined;
  for (const centre of centres) {
    const finding = checkOneCentre(cell, species, analysis, centre);
    if (!finding) return undefined;
    first ??= finding;
  }
  if (!first) return undefined;
  const listed = centres.map((centre) => `${centre.atom} ${valueOf(centre)}`).join(", ");
  return {
    range: first.range,
    severity: first.severity,
    code: first.code,
    message: `No centre of ${species} fits "${cell.text.trim()}" ${MODEL}: ${listed}.`,
  };
}

function checkOneCentre(
  cell: TableCell,
  species: string,
  analysis: SpeciesAnalysis,
  centre: CentreAnalysis | undefined,
): Finding | undefined {
  switch (cell.meaning) {
    case "valenceElectrons":
      return checkCount(
        cell,
        analysis.valenceElectrons,
        "table-valence-electrons",
        (value) => `Valence electrons for ${species} are ${value}, the table says ${cell.text}.`,
      );
    case "lonePairs":
      // A column that counts every lone pair of the species ("CO2, 4") keeps another count, not a wrong one.
      if (!centre || writtenCount(cell.text) === totalLonePairs(analysis)) return undefined;
      return checkCount(
        cell,
        centre.lonePairs,
        "table-lone-pairs",
        (value) => `Lone pairs on the central ${centre.atom} of ${species}: ${value} ${MODEL}, the table says ${cell.text}.`,
      );
    case "axe":
      return centre && checkAxe(cell, species, centre);
    case "electronGeometry":
      if (isPerCentre(cell.text)) {
        return checkPerCentreGeometry(
          cell,
          analysis,
          (each) => each.electronGeometry,
          "table-electron-geometry",
          `Electron geometry in ${species}`,
        );
      }
      return centre && checkGeometry(cell, centre.electronGeometry, "table-electron-geometry", `Electron geometry of ${species}`);
    case "molecularGeometry": {
      if (isPerCentre(cell.text)) {
        return checkPerCentreGeometry(
          cell,
          analysis,
          (each) => each.molecularGeometry,
          "table-molecular-geometry",
          `Molecular geometry in ${species}`,
        );
      }
      const geometry = centre?.molecularGeometry ?? (atomCount(analysis) === 2 ? "linear" : undefined);
      return geometry && checkGeometry(cell, geometry, "table-molecular-geometry", `Molecular geometry of ${species}`);
    }
    case "hybridization":
      return centre && checkHybridization(cell, species, centre);
    case "polarity":
      return checkPolarity(cell, species, analysis);
    case "bondAngle":
      return centre && checkAngle(cell, species, analysis, centre);
    case "charge":
      return checkCharge(cell, species, analysis.reading.charge);
    case "irBands":
    case "ramanBands":
    case "irActiveModes":
    case "vibrationalModes":
      return checkVibrationCount(cell, species, analysis);
    default:
      return undefined;
  }
}

function atomCount(analysis: SpeciesAnalysis): number {
  return analysis.reading.composition.reduce((sum, part) => sum + part.count, 0);
}

function mismatch(cell: TableCell, code: string, message: string, newText: string): Finding {
  return {
    range: cell.range,
    severity: "warning",
    code,
    message,
    fix: { range: cell.range, newText, title: `Change to ${newText}` },
  };
}

/**
 * A charge column that contradicts the charge written in the formula ("NH4+" beside -1). Either
 * may be the slip, so the new charge is offered as a choice, never applied by fix-all.
 */
function checkCharge(cell: TableCell, species: string, computed: number): Finding | undefined {
  const written = chargeOfCell(cell.text);
  if (written === undefined || written === computed) return undefined;
  const newText = chargeInStyleOf(computed, cell.text);
  const charge = computed === 0 ? "no charge" : `a charge of ${computed > 0 ? "+" : ""}${computed}`;
  return {
    range: cell.range,
    severity: "warning",
    code: "table-charge",
    message: `${species} has ${charge} as written, the table says ${cell.text.trim()}.`,
    choices: [{ range: cell.range, newText, title: `Change the charge to ${newText}` }],
  };
}

/** "2", "8 e-", "2 pairs", "1 LP": a count as a table writes it. */
const COUNT = /^(\d+)\s*(?:e-?|e\u207b|electrons?|pairs?|lps?)?$/i;

function writtenCount(text: string): number | undefined {
  const match = COUNT.exec(text.trim());
  return match ? Number(match[1]) : undefined;
}

function totalLonePairs(analysis: SpeciesAnalysis): number {
  return analysis.graph.atoms.reduce((sum, atom) => sum + atom.lonePairs, 0);
}

function checkCount(cell: TableCell, computed: number, code: string, message: (value: number) => string): Finding | undefined {
  const match = COUNT.exec(cell.text.trim());
  if (!match || Number(match[1]) === computed) return undefined;
  return mismatch(cell, code, message(computed), cell.text.trim().replace(match[1], String(computed)));
}

function checkAxe(cell: TableCell, species: string, centre: CentreAnalysis): Finding | undefined {
  const written = parseAxe(cell.text);
  const computed = parseAxe(centre.axe);
  if (!written || !computed) return undefined;
  if (written.bonded === computed.bonded && written.lonePairs === computed.lonePairs) return undefined;
  const newText = axeInStyleOf(computed, cell.text);
  return mismatch(cell, "table-axe", `AXE class of ${species} is ${centre.axe} ${MODEL}, the table says ${cell.text}.`, newText);
}

/** "C: tetrahedral; O: bent": a value for each kind of centre, as the summary table writes it. */
function isPerCentre(text: string): boolean {
  return /^\s*[A-Z][a-z]?\s*:/.test(text);
}

/**
 * A per-centre cell is right when each "atom: geometry" part names a geometry that some centre of
 * that element has; the parts need not list every centre. No fix: which centre was meant is not
 * for lonepair to guess.
 */
function checkPerCentreGeometry(
  cell: TableCell,
  analysis: SpeciesAnalysis,
  geometryOf: (centre: CentreAnalysis) => string,
  code: string,
  subject: string,
): Finding | undefined {
  for (const part of cell.text.split(";")) {
    const match = /^\s*([A-Z][a-z]?)\s*:\s*(.*?)\s*$/.exec(part);
    if (!match) return undefined;
    const [, atom, value] = match;
    const written = normalizeGeometry(value, cell.language);
    if (written === undefined) continue;
    const computed = [
      ...new Set(analysis.centres.filter((centre) => centre.atom === atom).map((centre) => computedGeometry(geometryOf(centre)))),
    ];
    if (computed.includes(written)) continue;
    const actual = computed.length === 0 ? `no ${atom} centre is analysed` : `the ${atom} centres are ${computed.join(" or ")}`;
    return {
      range: cell.range,
      severity: "warning",
      code,
      message: `${subject}: the table says ${atom}: ${value}, but ${actual} ${MODEL}.`,
    };
  }
  return undefined;
}

function checkGeometry(cell: TableCell, computed: string, code: string, subject: string): Finding | undefined {
  const written = readGeometry(cell.text, cell.language);
  if (written === undefined || written.geometry === computedGeometry(computed)) return undefined;
  const newText = geometryInStyleOf(computed, cell.text, written.language);
  return mismatch(cell, code, `${subject} is ${computed} ${MODEL}, the table says ${cell.text}.`, newText);
}

function checkHybridization(cell: TableCell, species: string, centre: CentreAnalysis): Finding | undefined {
  const written = normalizeHybridization(cell.text);
  if (written === undefined || written === centre.hybridization) return undefined;
  return mismatch(
    cell,
    "table-hybridization",
    `Hybridization of the central ${centre.atom} in ${species} is ${centre.hybridization} (a model description), the table says ${cell.text}.`,
    hybridizationInStyleOf(centre.hybridization, cell.text),
  );
}

function checkPolarity(cell: TableCell, species: string, analysis: SpeciesAnalysis): Finding | undefined {
  const written = parsePolarity(cell.text, cell.language);
  // A verdict the model could not reach never contradicts the table.
  if (analysis.polarity.undetermined) return undefined;
  const polar = analysis.polarity.polar;
  if (written === undefined || written === polar) return undefined;
  return mismatch(
    cell,
    "table-polarity",
    `${species} is ${polar ? "polar" : "nonpolar"} by the model (${analysis.polarity.reason}), the table says ${cell.text}.`,
    polarityInStyleOf(polar, cell.text, cell.language),
  );
}

/** "3", "3 bands", "15 modes": a count as a table writes it. */
const WRITTEN_COUNT = /^(\d+)(\s*)(band|mode|fundamental|vibration)?(s?)$/i;

/**
 * A count of modes or bands against the symmetry prediction. Checked only where the model's
 * symmetry is trusted; a number larger than 3N is no count of modes (a wavenumber, say), so it
 * is left alone. "IR-active modes" is right counted either way: one per band, or each
 * degenerate mode on its own.
 */
function checkVibrationCount(cell: TableCell, species: string, analysis: SpeciesAnalysis): Finding | undefined {
  const match = WRITTEN_COUNT.exec(cell.text.trim());
  if (!match) return undefined;
  const written = Number(match[1]);
  if (written > 3 * analysis.graph.atoms.length) return undefined;
  const result = vibrationsOf(analysis);
  if (!result.ok) return undefined;
  const value = result.value;
  const why = `${value.pointGroup}: ${modeSum(value.representation)}; a symmetry prediction from the model`;
  // "1 band" becomes "2 bands": the unit word follows the new number.
  const [, , space, unit, plural] = match;
  const inStyle = (computed: number) => `${computed}${space}${unit ?? ""}${unit ? (computed === 1 ? "" : plural || "s") : ""}`;
  const fix = (computed: number, code: string, subject: string) =>
    written === computed
      ? undefined
      : mismatch(cell, code, `${subject} for ${species}: ${computed} (${why}), the table says ${cell.text}.`, inStyle(computed));
  switch (cell.meaning) {
    case "irBands":
      return fix(value.irBands, "table-ir-bands", "IR bands expected");
    case "ramanBands":
      return fix(value.ramanBands, "table-raman-bands", "Raman bands expected");
    case "irActiveModes": {
      const counted = value.representation.filter((mode) => mode.ir).reduce((sum, mode) => sum + mode.count * mode.degeneracy, 0);
      if (written === counted) return undefined;
      return fix(value.irBands, "table-ir-active-modes", "IR-active fundamentals");
    }
    default:
      return fix(value.modes, "table-vibrational-modes", "Vibrational modes");
  }
}

/** How far a written angle may sit outside the expected range before it is called wrong. */
const TOLERANCE = 1;

function checkAngle(cell: TableCell, species: string, analysis: SpeciesAnalysis, centre: CentreAnalysis): Finding | undefined {
  const expected = centre.expectedAngles;
  if (expected.length === 0) return undefined;
  // "104,5" is 104.5 with a decimal comma, or 104 and 5 listed: right when either reading fits.
  const readings = mayHaveDecimalComma(cell.text) ? [parseAngles(cell.text, true), parseAngles(cell.text)] : [parseAngles(cell.text)];
  if (readings.some((written) => !written || anglesFit(written, analysis, centre))) return undefined;
  return angleMismatch(cell, species, analysis, centre);
}

/** Whether every angle the cell states fits what the model expects at `centre`. */
function anglesFit(written: WrittenAngles, analysis: SpeciesAnalysis, centre: CentreAnalysis): boolean {
  const expected = centre.expectedAngles;
  const slack = written.relation === "about" ? TOLERANCE * 2 : TOLERANCE;
  const fits = (degrees: number): boolean => {
    switch (written.relation) {
      case "below":
        return expected.some((range) => range.min < degrees);
      case "above":
        return expected.some((range) => range.max > degrees);
      default:
        return (
          expected.some((range) => degrees >= range.min - slack && degrees <= range.max + slack) ||
          centre.idealAngles.some((ideal) => Math.abs(ideal - degrees) <= slack) ||
          analysis.measuredAngles.some((measured) => Math.abs(measured.degrees - degrees) <= slack)
        );
    }
  };
  return written.degrees.every(fits);
}

function angleMismatch(cell: TableCell, species: string, analysis: SpeciesAnalysis, centre: CentreAnalysis): Finding {
  const expected = centre.expectedAngles;
  const description = expected
    .map((range) => {
      const span = range.min === range.max ? `${range.ideal}°` : `${range.min}–${range.max}°`;
      return range.between ? `${span} (${range.between})` : span;
    })
    .join(", ");
  const message = `Bond angle for ${species}: expected ${description} ${MODEL}, the table says ${cell.text}.`;
  if (expected.length !== 1 || hasUncertainty(cell.text))
    return { range: cell.range, severity: "warning", code: "table-bond-angle", message };
  const measured = analysis.measuredAngles.length === 1 ? analysis.measuredAngles[0].degrees : undefined;
  return mismatch(cell, "table-bond-angle", message, angleInStyleOf(measured ?? expected[0].ideal, cell.text));
}
