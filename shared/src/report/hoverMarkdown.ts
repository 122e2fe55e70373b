/**
 * Turns one species analysis into a short card for an editor hover, as markdown or, for
 * clients that only show plain text, as the same card without markup or images.
 * Pure: takes the core's plain data, returns a string; no editor or protocol types.
 */
import { oxidationStatesLine } from "../chemistry/redox/oxidationStates";
import type {
  AnalysisResult,
  AngleExpectation,
  CentreAnalysis,
  MeasuredAngle,
  MolecularGraph,
  SpeciesAnalysis,
  SpeciesPart,
} from "../chemistry/types";
import { isotopeNote, stateNote } from "./notationNotes";
import { shapeSketchSvg, svgDataUri } from "./shapeSketch";
import { lewisDiagram } from "./lewisDiagram";
import { plural } from "./analysisCard";
import { NETWORK_SOLID_NOUN, compositeKind, distinctAnalysedParts, innerParts, latticeSiteLabel, roleWords } from "./compositeParts";
import { partShapeText } from "../chemistry/analysis/partShapes";
import { measuredFundamentalsOf, vibrationsOf } from "../chemistry/vibrations/speciesVibrations";
import { bandsLine, coincidenceLine, countedInNote, measuredLine, modesLine, notPredictedLine, stretchingLine } from "./vibrationText";

/** The caution every editor-facing result carries (hover cards and summary tables). */
export const HOVER_CAUTION = "Model prediction, not measured data: follow the safety data sheet, local rules and licensed practice.";

/** The text formats a hover card can be written in (the protocol's markup kinds). */
export type HoverFormat = "markdown" | "plaintext";

/** Options that change how the card and its numbers are written. */
export interface HoverMarkdownOptions {
  /** Digits after the decimal point for angles (0-3). */
  readonly angleDecimals: number;
  /** Markdown by default; plain text has no markup, no escapes and no sketch image. */
  readonly format?: HoverFormat;
  /** At most this many distinct centre groups are listed; the rest are counted. */
  readonly maxCentreGroups?: number;
}

const DEFAULT_MAX_CENTRE_GROUPS = 8;

/** Long lists are cut here; a hover is a glance, not a report. */
const MAX_LISTED = 10;

/** Editors refuse hover markdown past 100,000 characters; stay far below. */
const MAX_CARD_LENGTH = 20_000;

/**
 * A sketch longer than this is left out. It comes right after the title, so with this bound the
 * cut at MAX_CARD_LENGTH never falls inside its URI.
 */
const MAX_SKETCH_LENGTH = 16_000;

/**
 * The Lewis diagram joins the hover for species up to this many atoms: beyond it the diagram is
 * too dense to read at hover size, and the card would wait for its layout.
 */
const MAX_HOVER_LEWIS_ATOMS = 24;
/** Largest side of the hover's Lewis diagram, in pixels. */
const HOVER_LEWIS_SIZE = 220;

/** Writes an angle in degrees with a fixed number of decimals, e.g. "109.5°". */
export function formatAngle(degrees: number, decimals: number): string {
  const digits = Math.max(0, Math.min(3, Math.trunc(decimals)));
  return `${degrees.toFixed(digits)}°`;
}

/** How emphasis, code and document text are written in one format. */
interface Markup {
  readonly strong: (text: string) => string;
  readonly code: (text: string) => string;
  readonly emphasis: (text: string) => string;
  /** Text from the document or the core, made safe for the format. */
  readonly text: (text: string) => string;
  readonly images: boolean;
}

const MARKDOWN: Markup = {
  strong: (text) => `**${text}**`,
  code: (text) => `\`${text}\``,
  emphasis: (text) => `_${text}_`,
  text: escapeMarkdown,
  images: true,
};

const same = (text: string): string => text;
const PLAIN_TEXT: Markup = { strong: same, code: same, emphasis: same, text: same, images: false };

function markupFor(format: HoverFormat | undefined): Markup {
  return format === "plaintext" ? PLAIN_TEXT : MARKDOWN;
}

/** Builds the hover card for one analysed species (markdown unless `options.format` says otherwise). */
export function hoverMarkdown(analysis: SpeciesAnalysis, options: HoverMarkdownOptions): string {
  const markup = markupFor(options.format);
  const lines: string[] = [];
  lines.push(titleLine(analysis, markup));
  lines.push("");
  const notation = notationLine(analysis, markup);
  if (notation) lines.push(notation, "");
  const pictures = markup.images ? picturesLine(analysis) : undefined;
  if (pictures) lines.push(pictures, "");
  lines.push(electronLine(analysis));
  lines.push("");
  const states = oxidationStatesLine(analysis.reading, { ok: true, value: analysis });
  if (states) lines.push(`Oxidation states: ${markup.text(states)}`, "");
  const measured = measuredLines(analysis.measuredAngles.slice(0, MAX_LISTED), options.angleDecimals, markup);
  const blocks = centreBlocks(analysis.centres, options, markup);
  // With one centre the measured angles belong to its block; with several they get their own.
  if (blocks.length === 1) blocks[0].push(...measured);
  for (const block of blocks) lines.push(...block, "");
  if (analysis.centres.length === 0) {
    lines.push("No central atom: fewer than two atoms are bonded to any one atom.", "");
  }
  if (blocks.length !== 1 && measured.length > 0) lines.push(markup.strong("Measured angles"), ...measured, "");
  lines.push(polarityLine(analysis, markup), "");
  lines.push(...vibrationBlock(analysis, markup), "");
  for (const warning of analysis.warnings.slice(0, MAX_LISTED)) lines.push(`- ⚠ ${markup.text(warning)}`);
  if (analysis.warnings.length > 0) lines.push("");
  const body = lines.join("\n");
  // The caution must survive any cut, so it is added after it.
  const kept = body.length > MAX_CARD_LENGTH ? `${body.slice(0, MAX_CARD_LENGTH)}…\n\n` : body;
  return `${kept}${markup.emphasis(HOVER_CAUTION)}`;
}

/** How a refusal's card is shown. */
export interface ProblemCardOptions {
  /**
   * The same sentence is already a problem on this text, which the editor shows beside the card:
   * the card then says where to look instead of repeating it.
   */
  readonly alsoAProblem?: boolean;
}

/**
 * The hover card for any result: the full card of an analysed species, the parts of a salt,
 * hydrate or hydroxo ion with their shapes, or the reason nothing could be analysed.
 */
export function resultMarkdown(
  text: string,
  result: AnalysisResult,
  options: HoverMarkdownOptions,
  problemOptions: ProblemCardOptions = {},
): string {
  if (result.ok) return hoverMarkdown(result.value, options);
  if (result.parts) return compositeMarkdown(text, result, options);
  if (result.lattice) return latticeMarkdown(text, result, options);
  return problemMarkdown(text, result.problem.message, options.format, problemOptions);
}

/** A salt lists its ions, a hydrate its parts, each with its shape; then the note and each polyatomic part's centres. */
function compositeMarkdown(text: string, result: Extract<AnalysisResult, { ok: false }>, options: HoverMarkdownOptions): string {
  const markup = markupFor(options.format);
  const parts = result.parts ?? [];
  const formula = markup.code(result.reading?.formula ?? text);
  const name = result.reading?.name;
  const kind = compositeKind(result.problem.code);
  const title = name ? `${markup.strong(markup.text(name))} · ${formula}` : markup.strong(formula);
  const lines = [`${title} · ${kind.noun}`, "", markup.strong(kind.partsLabel)];
  for (const part of parts.slice(0, MAX_LISTED)) {
    lines.push(partBullet(part, "- ", markup));
    for (const inner of innerParts(part).slice(0, MAX_LISTED)) lines.push(partBullet(inner, "  - ", markup));
  }
  lines.push("", markup.text(result.problem.message), "");
  const states = result.reading && oxidationStatesLine(result.reading, result);
  if (states) lines.push(`Oxidation states: ${markup.text(states)}`, "");
  for (const analysis of distinctAnalysedParts(parts).slice(0, MAX_LISTED)) {
    const centres = centreBlocks(analysis.centres, { ...options, maxCentreGroups: 2 }, markup);
    if (centres.length === 0) continue;
    lines.push(`${markup.strong(markup.code(analysis.reading.formula))} · ${electronLine(analysis)}`, "");
    for (const block of centres) lines.push(...block, "");
  }
  const body = lines.join("\n");
  const kept = body.length > MAX_CARD_LENGTH ? `${body.slice(0, MAX_CARD_LENGTH)}…\n\n` : body;
  return `${kept}${markup.emphasis(HOVER_CAUTION)}`;
}

/** A network solid: each atom's surroundings in the solid, then the note. */
function latticeMarkdown(text: string, result: Extract<AnalysisResult, { ok: false }>, options: HoverMarkdownOptions): string {
  const markup = markupFor(options.format);
  const formula = markup.code(result.reading?.formula ?? text);
  const name = result.reading?.name;
  const title = name ? `${markup.strong(markup.text(name))} · ${formula}` : markup.strong(formula);
  const lines = [`${title} · ${NETWORK_SOLID_NOUN}`, "", markup.strong("Atoms")];
  for (const site of result.lattice ?? []) lines.push(`- ${markup.text(latticeSiteLabel(site))}`);
  lines.push("", markup.text(result.problem.message), "", markup.emphasis(HOVER_CAUTION));
  return lines.join("\n");
}

function partBullet(part: SpeciesPart, bullet: string, markup: Markup): string {
  return `${bullet}${markup.code(part.formula)} ×${part.count} (${roleWords(part)}): ${markup.strong(markup.text(partShapeText(part)))}`;
}

/** Builds a short card for text that names no species lonepair can analyse. */
export function problemMarkdown(text: string, message: string, format?: HoverFormat, options: ProblemCardOptions = {}): string {
  const markup = markupFor(format);
  const reason = options.alsoAProblem ? "the reason is the problem reported on this text" : message;
  return [`${markup.strong(markup.text(text))}: not analysed`, "", markup.text(reason), "", markup.emphasis(HOVER_CAUTION)].join("\n");
}

/** "State: aqueous solution (aq) · Isotope labels: D = hydrogen-2", or undefined. */
function notationLine(analysis: SpeciesAnalysis, markup: Markup): string | undefined {
  const parts: string[] = [];
  const state = stateNote(analysis.reading);
  if (state) parts.push(`State: ${state}`);
  const isotopes = isotopeNote(analysis.reading);
  if (isotopes) parts.push(`Isotope labels: ${markup.text(isotopes)} (same Lewis structure and shape)`);
  return parts.length === 0 ? undefined : parts.join(" · ");
}

function titleLine(analysis: SpeciesAnalysis, markup: Markup): string {
  const formula = markup.code(analysis.reading.formula);
  const name = analysis.reading.name;
  return name ? `${markup.strong(markup.text(name))} · ${formula}` : markup.strong(formula);
}

/**
 * The Lewis diagram and the ball-and-stick sketch side by side, as markdown images (editors drop
 * raw HTML and remote SVG in hovers); together they stay within MAX_SKETCH_LENGTH, the sketch
 * taking precedence, since the card's cut must never fall inside a URI.
 */
function picturesLine(analysis: SpeciesAnalysis): string | undefined {
  const sketch = sketchLine(analysis);
  const lewis = lewisLine(analysis);
  if (lewis && (sketch?.length ?? 0) + lewis.length + 1 <= MAX_SKETCH_LENGTH) return sketch ? `${lewis} ${sketch}` : lewis;
  return sketch;
}

/** The Lewis diagram as a markdown image, its alt text from the core; undefined for large species. */
function lewisLine(analysis: SpeciesAnalysis): string | undefined {
  // A lone atom's dots say no more than the card's electron count; keep its card short.
  const atomCount = analysis.graph.atoms.length;
  if (atomCount < 2 || atomCount > MAX_HOVER_LEWIS_ATOMS) return undefined;
  const result = lewisDiagram(analysis, { maxSize: HOVER_LEWIS_SIZE });
  if (!result.ok) return undefined;
  return `![${escapeMarkdown(result.diagram.altText)}](${svgDataUri(result.diagram.svg)})`;
}

/** A markdown image (editors drop raw HTML and remote SVG in hovers), alt text naming the shape. */
function sketchLine(analysis: SpeciesAnalysis): string | undefined {
  const svg = shapeSketchSvg(analysis);
  if (!svg) return undefined;
  const uri = svgDataUri(svg);
  if (uri.length > MAX_SKETCH_LENGTH) return undefined;
  const geometries = [...new Set(analysis.centres.map((centre) => centre.molecularGeometry))].slice(0, 3);
  // Two atoms and no centre: the only shape there is.
  const shape = geometries.length > 0 ? geometries.join(", ") : "linear";
  return `![ball-and-stick sketch of ${escapeMarkdown(analysis.reading.formula)}, ${shape}](${uri})`;
}

function electronLine(analysis: SpeciesAnalysis): string {
  const parts = [
    `${analysis.valenceElectrons} valence electrons`,
    plural(bondingPairs(analysis.graph), "bonding pair"),
    `${plural(lonePairTotal(analysis.graph), "lone pair")}${centreLonePairs(analysis.centres)}`,
  ];
  const charges = formalChargeText(analysis.graph);
  if (charges) parts.push(`formal charges ${charges}`);
  if (analysis.resonanceForms > 1) parts.push(`${analysis.resonanceForms} resonance forms`);
  if (analysis.radical) parts.push("radical");
  return `Lewis structure: ${parts.join(" · ")}`;
}

/** A double bond shares two pairs, a triple bond three. */
function bondingPairs(graph: MolecularGraph): number {
  return graph.bonds.reduce((sum, bond) => sum + bond.order, 0);
}

function lonePairTotal(graph: MolecularGraph): number {
  return graph.atoms.reduce((sum, atom) => sum + atom.lonePairs, 0);
}

/** "(1 on S)" when there is one centre, so the reader need not subtract the outer atoms' pairs. */
function centreLonePairs(centres: readonly CentreAnalysis[]): string {
  return centres.length === 1 ? ` (${centres[0].lonePairs} on ${centres[0].atom})` : "";
}

function formalChargeText(graph: MolecularGraph): string {
  const charged = new Map<string, number>();
  for (const atom of graph.atoms) {
    if (atom.formalCharge === 0) continue;
    const label = `${atom.symbol} ${signed(atom.formalCharge)}`;
    charged.set(label, (charged.get(label) ?? 0) + 1);
  }
  return [...charged].map(([label, count]) => (count > 1 ? `${label} (×${count})` : label)).join(", ");
}

function signed(value: number): string {
  return value > 0 ? `+${value}` : `−${Math.abs(value)}`;
}

/** Identical centres (the six carbons of hexane) are listed once with a count. */
function centreBlocks(centres: readonly CentreAnalysis[], options: HoverMarkdownOptions, markup: Markup): string[][] {
  const groups = new Map<string, { centre: CentreAnalysis; count: number }>();
  for (const centre of centres) {
    const key = [centre.atom, centre.axe, centre.molecularGeometry, centre.hybridization].join("|");
    const group = groups.get(key);
    if (group) group.count += 1;
    else groups.set(key, { centre, count: 1 });
  }
  const limit = options.maxCentreGroups ?? DEFAULT_MAX_CENTRE_GROUPS;
  const listed = [...groups.values()].slice(0, limit);
  const blocks = listed.map(({ centre, count }) => centreBlock(centre, count, centres.length > 1, options, markup));
  const hidden = groups.size - listed.length;
  if (hidden > 0) blocks.push([`…and ${hidden} more kinds of centre.`]);
  return blocks;
}

function centreBlock(centre: CentreAnalysis, count: number, multiCentre: boolean, options: HoverMarkdownOptions, markup: Markup): string[] {
  const label = markup.strong(multiCentre ? `Centre ${centre.atom}${count > 1 ? ` (×${count})` : ""}` : `Centre ${centre.atom}`);
  const lines = [
    `${label} · ${centre.axe} · steric number ${centre.stericNumber}`,
    `- Electron geometry: ${centre.electronGeometry}`,
    `- Molecular geometry: ${markup.strong(centre.molecularGeometry)}`,
  ];
  if (centre.idealAngles.length > 0) {
    lines.push(`- Ideal angles: ${centre.idealAngles.map((angle) => formatAngle(angle, options.angleDecimals)).join(", ")}`);
  }
  let previousNote: string | undefined;
  for (const expectation of centre.expectedAngles) {
    // Several position pairs often share one reason; say it once.
    const note = expectation.note === previousNote ? undefined : expectation.note;
    previousNote = expectation.note;
    lines.push(`- Expected: ${expectationText(expectation, note, options.angleDecimals, markup)}`);
  }
  const note = centre.hybridizationNote ? ` (${markup.text(centre.hybridizationNote)})` : "";
  lines.push(`- Hybridization: ${centre.hybridization}${note}`);
  return lines;
}

function expectationText(expectation: AngleExpectation, note: string | undefined, decimals: number, markup: Markup): string {
  const between = expectation.between ? `${markup.text(expectation.between)} ` : "";
  const span =
    expectation.min === expectation.max
      ? formatAngle(expectation.min, decimals)
      : `${formatAngle(expectation.min, decimals)}–${formatAngle(expectation.max, decimals)}`;
  const reason = note ? `: ${markup.text(note)}` : "";
  return `${between}${span} (ideal ${formatAngle(expectation.ideal, decimals)})${reason}`;
}

function measuredLines(measured: readonly MeasuredAngle[], decimals: number, markup: Markup): string[] {
  return measured.map(
    (angle) => `- Measured: ${formatAngle(angle.degrees, decimals)} ${markup.text(angle.between)} (source: ${markup.text(angle.source)})`,
  );
}

function polarityLine(analysis: SpeciesAnalysis, markup: Markup): string {
  const verdict = analysis.polarity.undetermined ? "not judged" : analysis.polarity.polar ? "polar" : "nonpolar";
  return `Polarity: ${markup.strong(verdict)} (${markup.text(analysis.polarity.reason)})`;
}

/** The "Vibrations" section: modes by symmetry, IR and Raman band counts, stretching modes. */
function vibrationBlock(analysis: SpeciesAnalysis, markup: Markup): string[] {
  const result = vibrationsOf(analysis);
  const heading = markup.strong("Vibrations");
  if (!result.ok) return [`${heading}: ${markup.text(notPredictedLine(result))}`];
  const value = result.value;
  const note = countedInNote(value);
  return [
    `${heading} · ${markup.text(modesLine(value))}${note ? ` (${markup.text(note)})` : ""}`,
    `- ${markup.text(bandsLine(value))}`,
    `- ${markup.text(coincidenceLine(value))}`,
    `- Stretching: ${markup.text(stretchingLine(value))}`,
    ...measuredHoverLines(analysis, markup),
  ];
}

function measuredHoverLines(analysis: SpeciesAnalysis, markup: Markup): string[] {
  const measured = measuredFundamentalsOf(analysis);
  if (!measured) return [];
  const note = measured.note ? `; ${measured.note}` : "";
  return [`- Measured: ${markup.text(measuredLine(measured))} (source: ${markup.text(measured.source)}${markup.text(note)})`];
}

/** Text from the document or the core goes into markdown; keep it from turning into markup. */
function escapeMarkdown(text: string): string {
  return text.replace(/[\\`*_[\]<>|#]/g, (character) => `\\${character}`);
}
