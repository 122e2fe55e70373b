/**
 * A Lewis structure drawn as a flat SVG diagram: element symbols, one line per shared pair
 * (single, double, triple bonds), lone pairs as pairs of dots in the free directions round each
 * atom, an odd electron as one dot, formal charges beside their atoms, an ion in square brackets
 * with its charge outside, and a caption under a structure that is one of several equivalent
 * ones. Pure: no scripts, no fonts or images fetched; every text drawn comes from the core.
 */
import type { MolecularGraph, SpeciesAnalysis } from "../chemistry/types";
import { MODEL_CAUTION } from "./analysisCard";
import { svgDataUri } from "./shapeSketch";
import { centreLayout } from "./lewis/centreLayout";
import { clearestDirection, normalised, spreadInGaps } from "./lewis/directions";
import { equivalentForms } from "./lewis/equivalentForms";
import type { DiagramLayout, Point } from "./lewis/layoutTypes";
import { MAX_DIAGRAM_ATOMS, moleculeLayout } from "./lewis/moleculeLayout";

export { MAX_DIAGRAM_ATOMS } from "./lewis/moleculeLayout";

/**
 * How the diagram is coloured. `plate` (the default) draws dark ink on a white card of its own,
 * which reads on light and dark pages alike and suits an image file or a hover; `light` and
 * `dark` draw on a transparent background for a page of that kind; `current` uses the colour
 * of the surrounding text (`currentColor`), for a diagram placed inline in a styled page.
 */
export type DiagramTheme = "plate" | "light" | "dark" | "current";

/** The themes in the order they are offered. */
export const DIAGRAM_THEMES: readonly DiagramTheme[] = ["plate", "light", "dark", "current"];

/** Which structure to draw and how. */
export interface LewisDiagramOptions {
  /** Which of the equivalent structures to draw, counting from 1 (default 1, the one the analysis chose). */
  readonly form?: number;
  /** Colours (default `plate`). */
  readonly theme?: DiagramTheme;
  /**
   * Largest width or height in pixels at which the picture is shown; a larger diagram is scaled
   * down to fit (the drawing keeps its proportions). Default: natural size.
   */
  readonly maxSize?: number;
}

/** A drawn Lewis diagram and what it shows. */
export interface LewisDiagram {
  /** The SVG document, one line per element. */
  readonly svg: string;
  /** Width and height in pixels. */
  readonly width: number;
  readonly height: number;
  /** The structure drawn, counting from 1. */
  readonly form: number;
  /** How many equivalent structures the analysis counts (1 for a single structure). */
  readonly equivalentStructures: number;
  /** How many of them can be drawn one by one (`form` runs from 1 to this). */
  readonly drawableForms: number;
  /** The structure drawn: atoms, bonds, lone pairs and formal charges. */
  readonly graph: MolecularGraph;
  /** A one-line description for an image's alt text. */
  readonly altText: string;
}

export type LewisDiagramResult = { readonly ok: true; readonly diagram: LewisDiagram } | { readonly ok: false; readonly message: string };

const SCALE = 46;
const MARGIN = 14;
const FONT_SIZE = 16;
const CHARGE_FONT_SIZE = 11;
const CAPTION_FONT_SIZE = 11;
const DOT_RADIUS = 1.9;
const PAIR_HALF_GAP = 3.3;
const BOND_GAP = 3.4;
const FONT_FAMILY = "Helvetica, Arial, sans-serif";
const THEME_INK: Readonly<Record<DiagramTheme, string>> = { plate: "#1b1b1b", light: "#1b1b1b", dark: "#ececec", current: "currentColor" };
const SAFE_SYMBOL = /^[A-Z][a-z]{0,2}$/;

/** Space kept clear round an element symbol, in pixels, by symbol length. */
const clearance = (symbol: string): number => (symbol.length === 1 ? 9 : 12.5);

/**
 * The Lewis diagram of an analysed species. Refuses (with a message) a species of more than
 * {@link MAX_DIAGRAM_ATOMS} atoms and a form number outside 1..drawableForms.
 */
export function lewisDiagram(analysis: SpeciesAnalysis, options: LewisDiagramOptions = {}): LewisDiagramResult {
  const atomCount = analysis.graph.atoms.length;
  if (atomCount > MAX_DIAGRAM_ATOMS) {
    return {
      ok: false,
      message: `${analysis.reading.formula} has ${atomCount} atoms; a Lewis diagram is drawn for at most ${MAX_DIAGRAM_ATOMS}.`,
    };
  }
  const forms = equivalentForms(analysis);
  const form = options.form ?? 1;
  if (!Number.isInteger(form) || form < 1 || form > forms.length) {
    const choice = forms.length === 1 ? "it has one structure to draw" : `choose 1 to ${forms.length}`;
    return { ok: false, message: `${analysis.reading.formula} has no structure ${form}; ${choice}.` };
  }
  const graph = forms[form - 1];
  const layout = layoutOf(analysis, graph);
  const theme = options.theme ?? "plate";
  const altText = altTextOf(analysis, form);
  const drawing = draw(graph, layout, analysis.reading.charge, analysis.resonanceForms, form, theme, altText, options.maxSize);
  return {
    ok: true,
    diagram: {
      ...drawing,
      form,
      equivalentStructures: analysis.resonanceForms,
      drawableForms: forms.length,
      graph,
      altText,
    },
  };
}

function layoutOf(analysis: SpeciesAnalysis, graph: MolecularGraph): DiagramLayout {
  const degree = graph.atoms.map(() => 0);
  for (const bond of graph.bonds) {
    degree[bond.from]++;
    degree[bond.to]++;
  }
  const inner = degree.flatMap((count, index) => (count >= 2 ? [index] : []));
  if (inner.length === 1 && degree.every((count, index) => count === 1 || index === inner[0])) {
    const centre = analysis.centres.find((candidate) => candidate.index === inner[0]);
    const layout = centre && centreLayout(graph, centre.index, centre.electronGeometry, analysis.radical);
    if (layout) return layout;
  }
  return moleculeLayout(graph);
}

function altTextOf(analysis: SpeciesAnalysis, form: number): string {
  const reading = analysis.reading;
  const named = reading.name ? `${reading.formula} (${reading.name})` : reading.formula;
  const forms = analysis.resonanceForms > 1 ? `, structure ${form} of ${analysis.resonanceForms} equivalent ones` : "";
  return `Lewis structure of ${named}${forms}`;
}

/** Growing bounds of everything drawn, in pixels. */
interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

function include(bounds: Bounds, x: number, y: number, halfWidth = 0, halfHeight = halfWidth): void {
  bounds.minX = Math.min(bounds.minX, x - halfWidth);
  bounds.maxX = Math.max(bounds.maxX, x + halfWidth);
  bounds.minY = Math.min(bounds.minY, y - halfHeight);
  bounds.maxY = Math.max(bounds.maxY, y + halfHeight);
}

const round = (value: number): string => (Math.round(value * 10) / 10).toString();

/** "+", "2+", "−", "3−": the way charges are written beside an atom or an ion. */
export function chargeLabel(charge: number): string {
  const sign = charge > 0 ? "+" : "\u2212";
  const size = Math.abs(charge);
  return size === 1 ? sign : `${size}${sign}`;
}

function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function draw(
  graph: MolecularGraph,
  layout: DiagramLayout,
  ionCharge: number,
  equivalentStructures: number,
  form: number,
  theme: DiagramTheme,
  altText: string,
  maxSize: number | undefined,
): { svg: string; width: number; height: number } {
  // Pixel positions, y down.
  const at: Point[] = layout.positions.map((point) => ({ x: point.x * SCALE, y: -point.y * SCALE }));
  const bondAngles: number[][] = graph.atoms.map(() => []);
  for (const bond of graph.bonds) {
    const from = at[bond.from];
    const to = at[bond.to];
    bondAngles[bond.from].push(normalised((Math.atan2(from.y - to.y, to.x - from.x) * 180) / Math.PI));
    bondAngles[bond.to].push(normalised((Math.atan2(to.y - from.y, from.x - to.x) * 180) / Math.PI));
  }
  const bounds: Bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  const body: string[] = [];

  graph.bonds.forEach((bond, index) => {
    const from = at[bond.from];
    const to = at[bond.to];
    const length = Math.hypot(to.x - from.x, to.y - from.y) || 1;
    const ux = (to.x - from.x) / length;
    const uy = (to.y - from.y) / length;
    const startGap = clearance(graph.atoms[bond.from].symbol);
    const endGap = clearance(graph.atoms[bond.to].symbol);
    for (let line = 0; line < bond.order; line++) {
      const offset = (line - (bond.order - 1) / 2) * 2 * BOND_GAP;
      const x1 = from.x + ux * startGap - uy * offset;
      const y1 = from.y + uy * startGap + ux * offset;
      const x2 = to.x - ux * endGap - uy * offset;
      const y2 = to.y - uy * endGap + ux * offset;
      body.push(
        `<line class="bond" data-bond="${index}" data-from="${bond.from}" data-to="${bond.to}" x1="${round(x1)}" y1="${round(y1)}" x2="${round(x2)}" y2="${round(y2)}"/>`,
      );
    }
  });

  const monatomic = graph.atoms.length === 1;
  graph.atoms.forEach((atom, index) => {
    const { x, y } = at[index];
    const symbol = SAFE_SYMBOL.test(atom.symbol) ? atom.symbol : "?";
    const radius = clearance(symbol);
    body.push(`<text class="atom" data-atom="${index}" x="${round(x)}" y="${round(y)}">${escapeXml(symbol)}</text>`);
    include(bounds, x, y, radius, 10);

    const loneDomains = atom.lonePairs + atom.unpairedElectrons;
    const fixed = layout.loneAngles?.[index];
    const angles = fixed && fixed.length === loneDomains ? fixed : spreadInGaps(bondAngles[index], loneDomains);
    const distance = radius + 5;
    angles.forEach((angle, k) => {
      const radians = (angle * Math.PI) / 180;
      const cx = x + Math.cos(radians) * distance;
      const cy = y - Math.sin(radians) * distance;
      // Pairs first, the odd electron last, as the core lists lone domains.
      const pair = k < atom.lonePairs;
      const offsets = pair ? [-PAIR_HALF_GAP, PAIR_HALF_GAP] : [0];
      for (const offset of offsets) {
        const dx = -Math.sin(radians) * offset;
        const dy = -Math.cos(radians) * offset;
        body.push(`<circle class="electron" data-atom="${index}" cx="${round(cx + dx)}" cy="${round(cy + dy)}" r="${DOT_RADIUS}"/>`);
        include(bounds, cx + dx, cy + dy, DOT_RADIUS + 1);
      }
    });

    // A lone atom's charge is the ion's, written outside its brackets.
    if (atom.formalCharge !== 0 && !monatomic) {
      const occupied = [...bondAngles[index], ...angles];
      const angle = clearestDirection(occupied, [45, 135, 315, 225, 90, 270, 0, 180, 20, 160, 340, 200]);
      const radians = (angle * Math.PI) / 180;
      const cx = x + Math.cos(radians) * (radius + 8);
      const cy = y - Math.sin(radians) * (radius + 8);
      body.push(
        `<text class="formal-charge" data-atom="${index}" x="${round(cx)}" y="${round(cy)}">${chargeLabel(atom.formalCharge)}</text>`,
      );
      include(bounds, cx, cy, 7);
    }
  });

  if (!Number.isFinite(bounds.minX)) include(bounds, 0, 0, 10);
  const extras: string[] = [];
  let top = bounds.minY - MARGIN;
  let left = bounds.minX - MARGIN;
  let right = bounds.maxX + MARGIN;
  let bottom = bounds.maxY + MARGIN;
  if (ionCharge !== 0) {
    const x1 = bounds.minX - 7;
    const x2 = bounds.maxX + 7;
    const y1 = bounds.minY - 5;
    const y2 = bounds.maxY + 5;
    extras.push(
      `<path class="ion-bracket" d="M${round(x1 + 5)} ${round(y1)}H${round(x1)}V${round(y2)}H${round(x1 + 5)}"/>`,
      `<path class="ion-bracket" d="M${round(x2 - 5)} ${round(y1)}H${round(x2)}V${round(y2)}H${round(x2 - 5)}"/>`,
      `<text class="ion-charge" x="${round(x2 + 4)}" y="${round(y1 + 4)}" text-anchor="start">${chargeLabel(ionCharge)}</text>`,
    );
    left = x1 - MARGIN;
    right = x2 + 4 + 7 * chargeLabel(ionCharge).length + MARGIN;
    top = Math.min(top, y1 - 8);
    bottom = Math.max(bottom, y2 + MARGIN);
  }
  if (equivalentStructures > 1) {
    const caption =
      form === 1
        ? `one of ${equivalentStructures} equivalent structures`
        : `one of ${equivalentStructures} equivalent structures (no. ${form})`;
    const centreX = (bounds.minX + bounds.maxX) / 2;
    extras.push(`<text class="caption" x="${round(centreX)}" y="${round(bottom + 2)}">${caption}</text>`);
    const halfWidth = caption.length * 3.1 + MARGIN;
    left = Math.min(left, centreX - halfWidth);
    right = Math.max(right, centreX + halfWidth);
    bottom += CAPTION_FONT_SIZE + 8;
  }

  const width = Math.ceil(right - left);
  const height = Math.ceil(bottom - top);
  const fit = maxSize !== undefined && maxSize > 0 ? Math.min(1, maxSize / Math.max(width, height)) : 1;
  const shownWidth = Math.max(1, Math.round(width * fit));
  const shownHeight = Math.max(1, Math.round(height * fit));
  const ink = THEME_INK[theme];
  const plate =
    theme === "plate"
      ? `<rect class="plate" x="${round(left)}" y="${round(top)}" width="${width}" height="${height}" rx="6" fill="#ffffff"/>`
      : "";
  const svg = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${shownWidth}" height="${shownHeight}" viewBox="${round(left)} ${round(top)} ${width} ${height}" role="img" aria-label="${escapeXml(altText)}">`,
    `<title>${escapeXml(altText)}</title>`,
    `<desc>${escapeXml(MODEL_CAUTION)}</desc>`,
    plate,
    `<g stroke="${ink}" stroke-width="1.6" stroke-linecap="round" fill="none">`,
    ...body.filter((item) => item.startsWith("<line")),
    ...extras.filter((item) => item.startsWith("<path")),
    `</g>`,
    `<g fill="${ink}" font-family="${FONT_FAMILY}" text-anchor="middle" dominant-baseline="central">`,
    `<g font-size="${FONT_SIZE}">`,
    ...body.filter((item) => item.startsWith('<text class="atom"')),
    `</g>`,
    `<g font-size="${CHARGE_FONT_SIZE}">`,
    ...body.filter((item) => item.startsWith('<text class="formal-charge"')),
    ...extras.filter((item) => item.startsWith('<text class="ion-charge"')),
    `</g>`,
    ...body.filter((item) => item.startsWith("<circle")),
    ...extras
      .filter((item) => item.startsWith('<text class="caption"'))
      .map((item) => item.replace("<text ", `<text font-size="${CAPTION_FONT_SIZE}" `)),
    `</g>`,
    `</svg>`,
  ]
    .filter((line) => line.length > 0)
    .join("\n");
  return { svg, width: shownWidth, height: shownHeight };
}

/** The Lewis diagram for a page that follows the editor's theme: one image for each kind of theme. */
export interface LewisViewImages {
  /** Data URI of the diagram in dark ink, for light themes. */
  readonly light: string;
  /** Data URI of the diagram in light ink, for dark and high-contrast themes. */
  readonly dark: string;
  readonly altText: string;
}

/** Past this many atoms the side panel's diagram is too dense to read and too slow to follow the cursor. */
export const MAX_VIEW_DIAGRAM_ATOMS = 60;

/**
 * The diagram of structure 1 as two transparent images (light and dark themes), at most
 * `maxSize` pixels on a side; undefined for a lone atom, a species of more than
 * {@link MAX_VIEW_DIAGRAM_ATOMS} atoms, or one that cannot be drawn.
 */
export function lewisViewImages(analysis: SpeciesAnalysis, maxSize = 260): LewisViewImages | undefined {
  const atomCount = analysis.graph.atoms.length;
  if (atomCount < 2 || atomCount > MAX_VIEW_DIAGRAM_ATOMS) return undefined;
  const light = lewisDiagram(analysis, { theme: "light", maxSize });
  const dark = lewisDiagram(analysis, { theme: "dark", maxSize });
  if (!light.ok || !dark.ok) return undefined;
  return { light: svgDataUri(light.diagram.svg), dark: svgDataUri(dark.diagram.svg), altText: light.diagram.altText };
}
