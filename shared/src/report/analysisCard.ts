/**
 * A plain-text card for one analysis, for terminals and logs. The core never decides on
 * colour: the caller passes a `CardStyle` (the command line does, when stdout is a terminal).
 */
import { shapeOf } from "../chemistry/analysis/shape3d";
import type { AngleExpectation, AnalysisResult, CentreAnalysis, MeasuredAngle, SpeciesAnalysis } from "../chemistry/types";
import { lewisJson } from "./analysisJson";
import { NETWORK_SOLID_NOUN, compositeKind, distinctAnalysedParts, innerParts, latticeSiteLabel, partLabel } from "./compositeParts";
import { isotopeNote, stateNote } from "./notationNotes";
import { oxidationStatesLine } from "../chemistry/redox/oxidationStates";
import { measuredFundamentalsOf, realPointGroupOf, vibrationsOf } from "../chemistry/vibrations/speciesVibrations";
import { bandsLine, coincidenceLine, countedInNote, measuredLine, modesLine, notPredictedLine, stretchingLine } from "./vibrationText";

/** Wrappers for the parts of a card a caller may want to highlight. Identity by default. */
export interface CardStyle {
  readonly title: (text: string) => string;
  readonly label: (text: string) => string;
  readonly error: (text: string) => string;
  readonly warning: (text: string) => string;
  readonly muted: (text: string) => string;
}

const unstyled = (text: string): string => text;

/** No colour, no escape codes: what files, pipes and CI logs get. */
export const PLAIN_CARD_STYLE: CardStyle = {
  title: unstyled,
  label: unstyled,
  error: unstyled,
  warning: unstyled,
  muted: unstyled,
};

/** The caution every user-facing result carries. */
export const MODEL_CAUTION = "Model prediction, not measured data. Follow the safety data sheet, local rules and licensed practice.";

const LABEL_WIDTH = 22;
const INDENT = "  ";
/** Long values wrap so a card stays readable in an 80-100 column terminal. */
const LINE_WIDTH = 100;

/** Formats one analysis (or the reason it failed) as a multi-line card ending in a newline. */
export function formatAnalysisCard(input: string, result: AnalysisResult, style: CardStyle = PLAIN_CARD_STYLE): string {
  const lines = result.ok ? successLines(input, result.value, style) : failureLines(input, result, style);
  return lines.join("\n") + "\n";
}

function failureLines(input: string, result: Extract<AnalysisResult, { ok: false }>, style: CardStyle): string[] {
  const { problem, reading } = result;
  const heading = reading && reading.formula !== input.trim() ? `${input} (${reading.formula})` : input;
  if (result.parts) return compositeLines(heading, result, style);
  if (result.lattice) return latticeLines(heading, result, style);
  const lines = [
    style.title(heading) + " " + style.error("- not analysed"),
    row(style, "Problem", style.error(`${problem.message} [${problem.code}]`)),
  ];
  if (problem.suggestion !== undefined) lines.push(row(style, "Did you mean", problem.suggestion));
  return lines;
}

/** A network solid: what it is, each atom's surroundings in the solid, and the note. No molecule, no shape. */
function latticeLines(heading: string, result: Extract<AnalysisResult, { ok: false }>, style: CardStyle): string[] {
  const name = result.reading?.name;
  const title = name && !heading.includes(name) ? `${heading} - ${name}` : heading;
  const lines = [style.title(title) + " " + style.muted(`- ${NETWORK_SOLID_NOUN}`)];
  (result.lattice ?? []).forEach((site, position) => lines.push(row(style, position === 0 ? "Atoms" : "", latticeSiteLabel(site))));
  lines.push(row(style, "Note", `${result.problem.message} [${result.problem.code}]`));
  return lines;
}

/**
 * A species made of parts (a salt, a hydrate, a hydroxo ion): what it is, its parts with their
 * shapes, the note, then the card of each polyatomic part.
 */
function compositeLines(heading: string, result: Extract<AnalysisResult, { ok: false }>, style: CardStyle): string[] {
  const parts = result.parts ?? [];
  const name = result.reading?.name;
  const kind = compositeKind(result.problem.code);
  // The heading already shows the name when the name is what was written.
  const title = name && !heading.includes(name) ? `${heading} - ${name}` : heading;
  const lines = [style.title(title) + " " + style.muted(`- ${kind.noun}`)];
  parts.forEach((part, position) => {
    lines.push(row(style, position === 0 ? kind.partsLabel : "", partLabel(part)));
    for (const inner of innerParts(part)) lines.push(row(style, "", `- ${partLabel(inner)}`));
  });
  lines.push(row(style, "Note", `${result.problem.message} [${result.problem.code}]`));
  for (const analysis of distinctAnalysedParts(parts)) {
    lines.push("");
    for (const line of successLines(analysis.reading.formula, analysis, style, false)) lines.push(INDENT + line);
  }
  for (const line of wrapWords(`Caution: ${MODEL_CAUTION}`, LINE_WIDTH - INDENT.length)) {
    lines.push(INDENT + style.muted(line));
  }
  return lines;
}

function successLines(input: string, analysis: SpeciesAnalysis, style: CardStyle, withCaution = true): string[] {
  const { reading } = analysis;
  const title = reading.name ? `${reading.formula} - ${reading.name}` : reading.formula;
  const echoed = input.trim() === reading.formula || input.trim() === reading.name ? "" : `  (from "${input}")`;
  const lines = [style.title(title) + (echoed ? style.muted(echoed) : "")];
  lines.push(row(style, "Charge", signed(reading.charge)));
  const state = stateNote(reading);
  if (state) lines.push(row(style, "State", state));
  const isotopes = isotopeNote(reading);
  if (isotopes) lines.push(row(style, "Isotope labels", `${isotopes} (same Lewis structure and shape)`));
  lines.push(row(style, "Valence electrons", String(analysis.valenceElectrons)));
  lines.push(...lewisLines(analysis, style));
  const states = oxidationStatesLine(reading, { ok: true, value: analysis });
  if (states) lines.push(row(style, "Oxidation states", states));
  // Measured angles belong to the species; list them once, under the first centre.
  analysis.centres.forEach((centre, position) => lines.push(...centreLines(centre, position === 0 ? analysis.measuredAngles : [], style)));
  if (analysis.centres.length === 0) lines.push(row(style, "Centres", "none (no atom has two or more neighbours)"));
  const pointGroup = shapeOf(analysis).pointGroup;
  if (pointGroup) {
    const real = realPointGroupOf(analysis);
    const note = real && real !== pointGroup ? ` ${style.muted(`(of the model coordinates; the real molecule is ${real})`)}` : "";
    lines.push(row(style, "Point group", pointGroup + note));
  }
  const verdict = analysis.polarity.undetermined ? "not judged" : analysis.polarity.polar ? "polar" : "nonpolar";
  lines.push(row(style, "Polarity", `${verdict} - ${analysis.polarity.reason}`));
  lines.push(...vibrationLines(analysis, style));
  if (analysis.warnings.length === 0) {
    lines.push(row(style, "Warnings", "none"));
  } else {
    analysis.warnings.forEach((warning, position) => lines.push(row(style, position === 0 ? "Warnings" : "", style.warning(warning))));
  }
  if (!withCaution) return lines;
  for (const line of wrapWords(`Caution: ${MODEL_CAUTION}`, LINE_WIDTH - INDENT.length)) {
    lines.push(INDENT + style.muted(line));
  }
  return lines;
}

/** The normal modes by symmetry, or why they are not predicted. */
function vibrationLines(analysis: SpeciesAnalysis, style: CardStyle): string[] {
  const result = vibrationsOf(analysis);
  if (!result.ok) return [row(style, "Vibrations", style.muted(notPredictedLine(result)))];
  const value = result.value;
  const note = countedInNote(value);
  return [
    row(style, "Vibrations", modesLine(value) + (note ? ` ${style.muted(`(${note})`)}` : "")),
    row(style, "", bandsLine(value)),
    row(style, "", coincidenceLine(value)),
    row(style, "Stretching modes", stretchingLine(value)),
    ...measuredRows(analysis, style),
  ];
}

function measuredRows(analysis: SpeciesAnalysis, style: CardStyle): string[] {
  const measured = measuredFundamentalsOf(analysis);
  if (!measured) return [];
  const rows = [row(style, "Measured fundamentals", `${measuredLine(measured)} ${style.muted(`(source: ${measured.source})`)}`)];
  if (measured.note) rows.push(row(style, "", style.muted(measured.note)));
  return rows;
}

function lewisLines(analysis: SpeciesAnalysis, style: CardStyle): string[] {
  const lewis = lewisJson(analysis);
  const charges =
    lewis.formalCharges.length === 0
      ? "all zero"
      : lewis.formalCharges.map((entry) => `${entry.atom}${entry.index} ${signed(entry.formalCharge)}`).join(", ");
  const lines = [
    row(style, "Lewis structure", `${plural(lewis.bondingPairs, "bonding pair")}, ${plural(lewis.lonePairs, "lone pair")}`),
    row(style, "Formal charges", charges),
    row(style, "Resonance forms", String(lewis.resonanceForms)),
  ];
  if (analysis.radical) lines.push(row(style, "Radical", "yes (one unpaired electron)"));
  if (analysis.electronDeficient) lines.push(row(style, "Octet", "electron-deficient centre"));
  if (analysis.expandedOctet) lines.push(row(style, "Octet", "expanded octet"));
  return lines;
}

function centreLines(centre: CentreAnalysis, measuredAngles: readonly MeasuredAngle[], style: CardStyle): string[] {
  const sub = INDENT;
  const lines = [
    row(style, `Centre ${centre.atom} (atom ${centre.index})`, `${centre.axe}, steric number ${centre.stericNumber}`),
    row(style, "Electron geometry", centre.electronGeometry, sub),
    row(style, "Molecular geometry", centre.molecularGeometry, sub),
    row(style, "Ideal angles", `${centre.idealAngles.map(angleNumber).join(", ")} deg`, sub),
  ];
  centre.expectedAngles.forEach((angle, position) =>
    lines.push(row(style, position === 0 ? "Expected angles" : "", expectedText(angle), sub)),
  );
  measuredAngles.forEach((angle, position) =>
    lines.push(
      row(
        style,
        position === 0 ? "Measured" : "",
        `${degrees(angle.degrees)} ${angle.between} ${style.muted(`(source: ${angle.source})`)}`,
        sub,
      ),
    ),
  );
  const note = centre.hybridizationNote ? ` ${style.muted(`(${centre.hybridizationNote})`)}` : "";
  lines.push(row(style, "Hybridization", centre.hybridization + note, sub));
  return lines;
}

function expectedText(angle: AngleExpectation): string {
  const between = angle.between ? `${angle.between}: ` : "";
  const range = angle.min === angle.max ? degrees(angle.min) : `${angleNumber(angle.min)}-${degrees(angle.max)}`;
  return `${between}${range} (ideal ${degrees(angle.ideal)}; ${angle.note})`;
}

function row(style: CardStyle, label: string, value: string, extraIndent = ""): string {
  const width = LABEL_WIDTH - extraIndent.length;
  const valueColumn = INDENT.length + LABEL_WIDTH + 1;
  const continuation = "\n" + " ".repeat(valueColumn);
  return INDENT + extraIndent + style.label(label.padEnd(width)) + " " + wrapWords(value, LINE_WIDTH - valueColumn).join(continuation);
}

// Escape codes take no room on screen, so they must not count towards the width.
// eslint-disable-next-line no-control-regex -- matching terminal escape codes is the point
const ESCAPE_CODES = /\u001b\[[0-9;]*m/g;

function wrapWords(text: string, width: number): string[] {
  const lines: string[] = [];
  let current = "";
  for (const word of text.split(" ")) {
    const candidate = current === "" ? word : `${current} ${word}`;
    if (current !== "" && candidate.replace(ESCAPE_CODES, "").length > width) {
      lines.push(current);
      current = word;
    } else {
      current = candidate;
    }
  }
  lines.push(current);
  return lines;
}

function angleNumber(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(1);
}

function degrees(value: number): string {
  return `${angleNumber(value)} deg`;
}

function signed(value: number): string {
  return value > 0 ? `+${value}` : String(value);
}

/** "1 lone pair", "2 lone pairs", "0 lone pairs". */
export function plural(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? "" : "s"}`;
}
