/**
 * Plain text and the markup languages whose paragraphs are plain lines (LaTeX, AsciiDoc,
 * reStructuredText): prose, with the blocks each marks off as code, comment or math
 * (`markupBlockAt`) skipped or read as math. Plain text itself knows reStructuredText literal
 * blocks and LaTeX verbatim environments, as they turn up in notes kept as .txt.
 *
 * Prose is read a paragraph at a time, each paragraph from its own text, so that an editor can
 * re-read only the paragraphs an edit touched. What the scan of a paragraph looks at stays inside
 * it: code spans, `\ce{...}` and math close in their paragraph or not at all (as in markdown,
 * reStructuredText and TeX, where a blank line ends inline markup), a name or a list of names
 * never runs on past a blank line, and words around a formula are looked for on its side of one.
 * Two things do reach across, handed on explicitly (`ProseCarry`): an HTML comment left open
 * hides the paragraphs after it until it closes (text is often commented out a paragraph at a
 * time), and ids numbered 1 in paragraphs within `SERIES_REACH` ("Runs N1, N2" a few paragraphs
 * above "the N2 extraction") make a lone "N2" an id there too.
 */
import { scanLatexMath } from "./latexMathSpan";
import { endOfLine, markupBlockAt, readableProse } from "./markupBlocks";
import { proseSteps, type ProseCarry } from "./scanProse";
import { shiftedModel } from "./shiftedModel";
import type { ScanSink, ScanSteps, SpeciesReader } from "./speciesReader";
import type { TextMarkup } from "./types";

/**
 * What plain text is cut into: paragraphs of prose (runs of lines between blank lines, or up to a
 * line that opens a literal block), and literal blocks, skipped as code or read as math. Offsets
 * are from the text's start; a unit's text runs from the start of its first line to just past its
 * last line break.
 */
export interface PlainTextUnit {
  readonly kind: "prose" | "code" | "math";
  readonly start: number;
  readonly end: number;
}

/** Scans a whole plain-text (or `markup`) document into `sink`. */
export function scanPlainText(text: string, read: SpeciesReader, sink: ScanSink, markup: TextMarkup = "plaintext"): void {
  for (const _ of plainTextSteps(text, read, sink, Infinity, markup));
}

/**
 * `scanPlainText` that pauses whenever `sink` holds at least `pauseAt` items (see `ScanSteps`).
 * Each unit is read from its own text, with only the carry of `plainTextCarry` from the units
 * beside it, exactly as an editor re-reads the units an edit touched.
 */
export function* plainTextSteps(
  text: string,
  read: SpeciesReader,
  sink: ScanSink,
  pauseAt: number,
  markup: TextMarkup = "plaintext",
): ScanSteps {
  const units = [...plainTextUnits(text, markup)];
  const sources = units.map((unit) => text.slice(unit.start, unit.end));
  const ids = sources.map((source, index) => (units[index].kind === "prose" ? seriesFirstIds(source) : NO_IDS));
  const near: UnitsNear = {
    count: units.length,
    startOf: (index) => units[index].start,
    endOf: (index) => units[index].end,
    idsOf: (index) => ids[index],
  };
  let commentOpen = false;
  for (let index = 0; index < units.length; index++) {
    const unit = units[index];
    const carry: ProseCarry = { commentOpen, seriesNearby: (symbol) => hasSeriesNear(near, index, symbol) };
    const local: ScanSink = { occurrences: [], unreadable: [], reactions: sink.reactions ? [] : undefined };
    const steps = plainTextUnitSteps(sources[index], unit.kind, markup, read, local, pauseAt, carry);
    for (const at of steps) {
      moveInto(sink, local, unit.start);
      yield unit.start + at;
    }
    moveInto(sink, local, unit.start);
    commentOpen = carry.commentOpen;
    if (sink.occurrences.length + sink.unreadable.length >= pauseAt) yield unit.end;
  }
}

/** No ids: the carry of a literal block, and the edges of the text. */
export const NO_IDS: ReadonlySet<string> = new Set();

/** How far from a paragraph's edges the paragraphs whose series ids count for it may lie. */
export const SERIES_REACH = 2048;

/** Units in document order, as `hasSeriesNear` looks through them. */
export interface UnitsNear {
  readonly count: number;
  startOf(index: number): number;
  endOf(index: number): number;
  /** The unit's `seriesFirstIds` (none for a literal block). */
  idsOf(index: number): ReadonlySet<string>;
}

/**
 * Whether "X1" stands alone, for `symbol` X, in another unit that starts or ends within
 * `SERIES_REACH` characters of unit `index`: a series of ids runs across a blank line or two.
 */
export function hasSeriesNear(units: UnitsNear, index: number, symbol: string): boolean {
  const from = units.startOf(index) - SERIES_REACH;
  const to = units.endOf(index) + SERIES_REACH;
  for (let other = index - 1; other >= 0 && units.endOf(other) >= from; other--) if (units.idsOf(other).has(symbol)) return true;
  for (let other = index + 1; other < units.count && units.startOf(other) <= to; other++) if (units.idsOf(other).has(symbol)) return true;
  return false;
}

/**
 * Reads one unit of a `markup` document from its own text `source` into `sink`, offsets from the
 * unit's start (comments inside a paragraph blanked, see `readableProse`); pauses as
 * `proseSteps` does. Leaves in `carry.commentOpen` whether a comment is open where it ends (a
 * literal block closes none: the prose after it starts afresh).
 */
export function* plainTextUnitSteps(
  source: string,
  kind: PlainTextUnit["kind"],
  markup: TextMarkup,
  read: SpeciesReader,
  sink: ScanSink,
  pauseAt: number,
  carry: ProseCarry,
): ScanSteps {
  if (kind === "prose") {
    const prose = readableProse(source, markup);
    yield* proseSteps(prose, 0, prose.length, sink, read, pauseAt, carry);
    return;
  }
  if (kind === "math") scanMathLines(source, 0, source.length, read, sink);
  carry.commentOpen = false;
}

/**
 * The letters X (one or two, an element symbol's shape) whose "X1" stands alone in `source`: a
 * series of sample or run ids, so that "X2" in the units near it is an id too.
 */
export function seriesFirstIds(source: string): ReadonlySet<string> {
  if (!source.includes("1")) return NO_IDS;
  let ids: Set<string> | undefined;
  for (const match of source.matchAll(/(?<![0-9A-Za-z])([A-Z][a-z]?)1(?![0-9A-Za-z+-])/g)) (ids ??= new Set()).add(match[1]);
  return ids ?? NO_IDS;
}

/** Moves what `from` holds into `to`, `by` characters on. */
function moveInto(to: ScanSink, from: ScanSink, by: number): void {
  if (from.occurrences.length === 0 && from.unreadable.length === 0 && (from.reactions?.length ?? 0) === 0) return;
  const placed = shiftedModel(
    {
      kind: "plaintext",
      occurrences: from.occurrences.splice(0),
      records: [],
      problems: [],
      unreadable: from.unreadable.splice(0),
      reactions: from.reactions?.splice(0) ?? [],
    },
    by,
  );
  to.occurrences.push(...placed.occurrences);
  to.unreadable.push(...(placed.unreadable ?? []));
  to.reactions?.push(...(placed.reactions ?? []));
}

/**
 * The units of `text` in order, each yielded as soon as it is decided. From the start of a prose
 * unit the rest depends only on the text after it: what an editor re-reading from there relies on.
 */
export function* plainTextUnits(text: string, markup: TextMarkup = "plaintext"): Generator<PlainTextUnit, void, void> {
  let paragraphStart = -1;
  let position = 0;
  while (position < text.length) {
    const lineEnd = endOfLine(text, position);
    const next = Math.min(text.length, lineEnd + 1);
    const line = text.slice(position, Math.min(lineEnd, position + 200)).trimEnd();
    if (line.trim().length === 0 && (lineEnd - position <= 200 || text.slice(position, lineEnd).trim().length === 0)) {
      if (paragraphStart >= 0) yield { kind: "prose", start: paragraphStart, end: position };
      paragraphStart = -1;
      position = next;
      continue;
    }
    const block = markupBlockAt(text, { start: position, end: lineEnd, text: line, inParagraph: paragraphStart >= 0 }, markup);
    if (block) {
      // The paragraph up to the block; a block that starts after its opening line leaves that line to the paragraph.
      const proseStart = paragraphStart >= 0 ? paragraphStart : position;
      if (block.start > proseStart) yield { kind: "prose", start: proseStart, end: block.start };
      yield block;
      paragraphStart = -1;
      position = block.end;
      continue;
    }
    if (paragraphStart < 0) paragraphStart = position;
    position = next;
  }
  if (paragraphStart >= 0) yield { kind: "prose", start: paragraphStart, end: text.length };
}

/**
 * Each line of a math block, read as LaTeX math: not a directive's options (":label:") nor the
 * block style and delimiters of an AsciiDoc stem block ("[latexmath]", "++++").
 */
function scanMathLines(text: string, start: number, end: number, read: SpeciesReader, sink: ScanSink): void {
  let position = start;
  while (position < end) {
    const lineEnd = Math.min(endOfLine(text, position), end);
    if (!MATH_BLOCK_MARKUP.test(text.slice(position, lineEnd))) scanLatexMath(text, position, lineEnd, read, sink);
    position = lineEnd + 1;
  }
}

const MATH_BLOCK_MARKUP = /^\s*:[a-z-]+:|^\[[a-z][^\]]*\]\s*$|^(?:\+{4,}|\.{4,}|-{4,})\s*$/;
