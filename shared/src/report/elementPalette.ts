/**
 * The one palette every picture uses (the 3D view, the hover sketch, the command line's SVG).
 * The model-kit colours chemists expect stay; every other element gets a colour worked out from
 * where it sits in the periodic table: its group sets the hue, its period the brightness, and
 * the brightness is solved so the ball stands out on light and dark backgrounds alike.
 */
import { elementBySymbol } from "../chemistry/elements";
import { contrastRatio, hexOf, luminanceOf, mixRgb, rgbOf, type Rgb } from "./colourMath";

/** How one element is painted: ball fill, the ball's outline and the ink of its symbol. */
export interface AtomPaint {
  /** `#rrggbb`. */
  readonly fill: string;
  /** `#rrggbb`: a shade of the fill that keeps the ball's edge visible where the fill alone would not be. */
  readonly outline: string;
  /** `#rrggbb`: black or white, whichever reads better on the fill. */
  readonly ink: string;
}

/** The backgrounds a picture must read on: a white page and a dark editor theme. */
export const LIGHT_BACKGROUND = "#ffffff";
export const DARK_BACKGROUND = "#1e1e1e";

// The model-kit convention, kept as the trade knows it.
const CONVENTION: Readonly<Record<string, string>> = {
  H: "#ffffff",
  C: "#3f3f3f",
  N: "#2f55e6",
  O: "#de2418",
  F: "#7fd656",
  Cl: "#2ab033",
  Br: "#8a2317",
  I: "#76209a",
  S: "#e3c82b",
  P: "#ee8616",
};

/** Colour for text that is no element symbol at all. */
const UNKNOWN_FILL = "#8a8a8a";

/** A ball reads on a background if its fill, or failing that its outline, reaches this contrast. */
export const EDGE_CONTRAST = 3;
/** Fills of the rule alone reach this contrast with both backgrounds. */
export const RULE_FILL_CONTRAST = 2;

// The brightness window that gives RULE_FILL_CONTRAST on both backgrounds, with a little room.
const BRIGHTEST_RULE_LUMINANCE = 0.44;
const DARKEST_RULE_LUMINANCE = 0.1;
const MAIN_GROUP_SATURATION = 0.55;
const METAL_SATURATION = 0.35;
const GROUP_ONE_HUE = 165;
const HUE_STEP = 20;

// Bound: one paint per element symbol; a symbol that names no element is painted but not kept.
const paints = new Map<string, AtomPaint>();

/** The paint of an element symbol ("Cl"); unknown symbols get a neutral grey. */
export function atomPaint(symbol: string): AtomPaint {
  const cached = paints.get(symbol);
  if (cached) return cached;
  const fill = elementFill(symbol);
  const paint: AtomPaint = Object.freeze({ fill, outline: outlineFor(fill), ink: inkFor(fill) });
  if (elementBySymbol(symbol) || CONVENTION[symbol]) paints.set(symbol, paint);
  return paint;
}

/** The ball colour of an element symbol, `#rrggbb`. */
export function elementColour(symbol: string): string {
  return atomPaint(symbol).fill;
}

/** True when the colour is the model-kit convention rather than the periodic-table rule. */
export function isConventionColour(symbol: string): boolean {
  return symbol in CONVENTION;
}

function elementFill(symbol: string): string {
  const convention = CONVENTION[symbol];
  if (convention) return convention;
  const element = elementBySymbol(symbol);
  if (!element) return UNKNOWN_FILL;
  const isFBlock = element.category === "lanthanide" || element.category === "actinide";
  // Groups go round the colour wheel backwards in 20° steps from a teal group 1, which puts the
  // noble gases on cyan and the p-block elements on blues, violets and purples, away from the
  // model-kit greens, reds and yellows. The f-block fans out between groups 3 and 4.
  const firstOfSeries = element.category === "lanthanide" ? 57 : 89;
  const groupStep = isFBlock ? 2.5 + (element.atomicNumber - firstOfSeries) / 14 : element.group - 1;
  const hue = (((GROUP_ONE_HUE - HUE_STEP * groupStep) % 360) + 360) % 360;
  const saturation = element.group >= 3 && element.group <= 12 ? METAL_SATURATION : MAIN_GROUP_SATURATION;
  // Lighter for the short early periods, darker down the table: heavier atoms look heavier.
  const periodFraction = (Math.min(7, Math.max(1, element.period)) - 1) / 6;
  const luminance = BRIGHTEST_RULE_LUMINANCE - periodFraction * (BRIGHTEST_RULE_LUMINANCE - DARKEST_RULE_LUMINANCE);
  return hexOf(hslWithLuminance(hue, saturation, luminance));
}

/** The HSL colour of this hue and saturation whose relative luminance is `target`, by bisection on lightness. */
function hslWithLuminance(hue: number, saturation: number, target: number): Rgb {
  let low = 0;
  let high = 1;
  for (let step = 0; step < 40; step++) {
    const middle = (low + high) / 2;
    if (luminanceOf(hslToRgb(hue, saturation, middle)) < target) low = middle;
    else high = middle;
  }
  return hslToRgb(hue, saturation, (low + high) / 2);
}

/** The fill where it reads on both backgrounds; a darker or lighter shade where it fades into one. */
function outlineFor(fill: string): string {
  const rgb = rgbOf(fill);
  const fadesOnLight = contrastRatio(fill, LIGHT_BACKGROUND) < EDGE_CONTRAST;
  const fadesOnDark = contrastRatio(fill, DARK_BACKGROUND) < EDGE_CONTRAST;
  if (fadesOnLight) return hexOf(mixRgb(rgb, [0, 0, 0], 0.7));
  if (fadesOnDark) return hexOf(mixRgb(rgb, [255, 255, 255], 0.65));
  return hexOf(mixRgb(rgb, [0, 0, 0], 0.45));
}

function inkFor(fill: string): string {
  return contrastRatio(fill, "#000000") >= contrastRatio(fill, "#ffffff") ? "#000000" : "#ffffff";
}

function hslToRgb(hue: number, saturation: number, lightness: number): Rgb {
  const chroma = (1 - Math.abs(2 * lightness - 1)) * saturation;
  const sector = hue / 60;
  const second = chroma * (1 - Math.abs((sector % 2) - 1));
  const [r, g, b] =
    sector < 1
      ? [chroma, second, 0]
      : sector < 2
        ? [second, chroma, 0]
        : sector < 3
          ? [0, chroma, second]
          : sector < 4
            ? [0, second, chroma]
            : sector < 5
              ? [second, 0, chroma]
              : [chroma, 0, second];
  const lift = lightness - chroma / 2;
  return [(r + lift) * 255, (g + lift) * 255, (b + lift) * 255];
}
