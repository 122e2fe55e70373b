/**
 * A Lewis diagram as a figure for a document: the SVG file's name, where it goes relative to the
 * document (a figures folder beside it), and the markdown image that links it with alt text.
 * Every editor that inserts a diagram asks for this one answer, so the file names and links are
 * the same whichever editor wrote them.
 */
import type { SpeciesAnalysis } from "../chemistry/types";
import { lastMhchemOpening } from "../document/mhchemSpan";
import { lewisDiagram, type DiagramTheme } from "./lewisDiagram";

/** The figures folder when the setting says nothing usable. */
export const DEFAULT_FIGURES_FOLDER = "figures";

/** What to draw and where the file goes. */
export interface LewisFigureOptions {
  /** Which equivalent structure, counting from 1 (default 1). */
  readonly form?: number;
  readonly theme?: DiagramTheme;
  /** The folder relative to the document, as {@link figuresFolderFrom} reads a setting. */
  readonly folder?: string;
}

/** A diagram ready to be saved beside a document and linked from it. */
export interface LewisFigure {
  readonly svg: string;
  readonly altText: string;
  /** The file's name, e.g. "lewis-SF4.svg", "lewis-NO3-minus-2.svg" for nitrate's second structure. */
  readonly fileName: string;
  /** The file's path relative to the document's folder, with forward slashes ("figures/lewis-SF4.svg"). */
  readonly relativePath: string;
  /** The markdown image to insert: `![alt text](figures/lewis-SF4.svg)`. */
  readonly markdown: string;
  readonly form: number;
  readonly equivalentStructures: number;
  readonly drawableForms: number;
}

export type LewisFigureResult = { readonly ok: true; readonly figure: LewisFigure } | { readonly ok: false; readonly message: string };

/**
 * A figures folder from a setting: trimmed, forward slashes, no "./" or trailing slash. An
 * absolute path, a drive letter or anything not a string falls back to the default, since a
 * link from a document must stay relative to it. An empty string means the document's own folder.
 */
export function figuresFolderFrom(raw: unknown): string {
  if (typeof raw !== "string") return DEFAULT_FIGURES_FOLDER;
  const folder = raw
    .trim()
    .replace(/\\/g, "/")
    .replace(/^(\.\/)+/, "")
    .replace(/\/+$/, "");
  if (folder.startsWith("/") || /^[A-Za-z]:/.test(folder) || folder.includes("\0")) return DEFAULT_FIGURES_FOLDER;
  return folder === "." ? "" : folder;
}

/** "lewis-SF4.svg", "lewis-SO4-2minus.svg", "lewis-NO3-minus-2.svg": safe on every file system. */
export function figureFileName(formula: string, form: number): string {
  const charge = /\^?(\d*)([+-])$/.exec(formula);
  const body = charge ? formula.slice(0, charge.index) : formula;
  const safeBody = body.replace(/[^A-Za-z0-9]+/g, "") || "species";
  const chargePart = charge ? `-${charge[1]}${charge[2] === "+" ? "plus" : "minus"}` : "";
  const formPart = form > 1 ? `-${form}` : "";
  return `lewis-${safeBody}${chargePart}${formPart}.svg`;
}

/** A markdown image; a path with spaces or brackets goes in angle brackets, as CommonMark allows. */
export function markdownImage(altText: string, path: string): string {
  const alt = altText.replace(/[\\[\]]/g, (character) => `\\${character}`);
  const destination = /[\s()<>]/.test(path) ? `<${path.replace(/[<>]/g, encodeURIComponent)}>` : path;
  return `![${alt}](${destination})`;
}

/** The figure of an analysed species, or why it cannot be drawn. */
export function lewisFigureOf(analysis: SpeciesAnalysis, options: LewisFigureOptions = {}): LewisFigureResult {
  const drawn = lewisDiagram(analysis, { form: options.form, theme: options.theme });
  if (!drawn.ok) return drawn;
  const diagram = drawn.diagram;
  const folder = figuresFolderFrom(options.folder ?? DEFAULT_FIGURES_FOLDER);
  const fileName = figureFileName(analysis.reading.formula, diagram.form);
  const relativePath = folder === "" ? fileName : `${folder}/${fileName}`;
  return {
    ok: true,
    figure: {
      svg: `${diagram.svg}\n`,
      altText: diagram.altText,
      fileName,
      relativePath,
      markdown: markdownImage(diagram.altText, relativePath),
      form: diagram.form,
      equivalentStructures: diagram.equivalentStructures,
      drawableForms: diagram.drawableForms,
    },
  };
}

/**
 * Where a figure's link goes after a species mention at [start, end) of `text`: right after the
 * mention, or after the markup that encloses it on its line (an inline code span, an mhchem
 * `\ce{...}` or chemformula `\ch{...}` and the `$` around it), so the link never lands inside the
 * chemistry's own text.
 */
export function figureLinkOffset(text: string, start: number, end: number): number {
  const lineStart = text.lastIndexOf("\n", start - 1) + 1;
  const lineEndAt = text.indexOf("\n", end);
  const lineEnd = lineEndAt < 0 ? text.length : lineEndAt;
  const before = text.slice(lineStart, start);
  let offset = end;
  const after = (character: string): number => {
    const found = text.indexOf(character, offset);
    return found >= 0 && found < lineEnd ? found + 1 : offset;
  };
  if ((before.match(/`/g)?.length ?? 0) % 2 === 1) offset = after("`");
  const opened = lastMhchemOpening(before, before.length);
  if (opened >= 0 && before.indexOf("}", opened) < 0) offset = after("}");
  if ((before.match(/\$/g)?.length ?? 0) % 2 === 1) offset = after("$");
  return offset;
}
