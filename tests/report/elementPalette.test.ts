/**
 * The one element palette: model-kit colours where the trade has a convention, colours from the
 * periodic table elsewhere, and every ball visible on a white page and in a dark editor.
 */
import { ChemElements } from "@chemistry/elements";
import { describe, expect, it } from "vitest";
import {
  DARK_BACKGROUND,
  LIGHT_BACKGROUND,
  atomPaint,
  contrastRatio,
  elementColour,
  isConventionColour,
  relativeLuminance,
} from "../../shared/src/index";

/** Hue (degrees), saturation and lightness of `#rrggbb`, for checks by colour family. */
function hsl(colour: string): { hue: number; saturation: number; lightness: number } {
  const [red, green, blue] = [1, 3, 5].map((at) => parseInt(colour.slice(at, at + 2), 16) / 255);
  const high = Math.max(red, green, blue);
  const low = Math.min(red, green, blue);
  const lightness = (high + low) / 2;
  const chroma = high - low;
  if (chroma === 0) return { hue: 0, saturation: 0, lightness };
  const saturation = chroma / (1 - Math.abs(2 * lightness - 1));
  const sector = high === red ? ((green - blue) / chroma + 6) % 6 : high === green ? (blue - red) / chroma + 2 : (red - green) / chroma + 4;
  return { hue: sector * 60, saturation, lightness };
}

function hueDistance(a: number, b: number): number {
  const apart = Math.abs(a - b) % 360;
  return Math.min(apart, 360 - apart);
}

function channelDistance(a: string, b: string): number {
  const channels = (colour: string): number[] => [1, 3, 5].map((at) => parseInt(colour.slice(at, at + 2), 16));
  const [x, y] = [channels(a), channels(b)];
  return Math.hypot(x[0] - y[0], x[1] - y[1], x[2] - y[2]);
}

// source: @chemistry/elements npm package (every element to oganesson, with group and period as posY/posX)
const REFERENCE = ChemElements.getAll().filter((element) => element.id >= 1 && element.id <= 118);
const CONVENTION_SYMBOLS = ["H", "C", "N", "O", "F", "Cl", "Br", "I", "S", "P"];

describe("element palette", () => {
  it("gives every element from hydrogen to oganesson a #rrggbb colour", () => {
    expect(REFERENCE).toHaveLength(118);
    for (const element of REFERENCE) expect(elementColour(element.symbol), element.symbol).toMatch(/^#[0-9a-f]{6}$/);
  });

  // common practice: the model-kit convention — white H, dark grey C, blue N, red O, green F and
  // Cl, dark red Br, violet I, yellow S, orange P.
  it.each([
    ["H", (c: ReturnType<typeof hsl>) => c.lightness > 0.95],
    ["C", (c: ReturnType<typeof hsl>) => c.saturation < 0.1 && c.lightness < 0.35],
    ["N", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 228) < 20 && c.saturation > 0.5],
    ["O", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 0) < 12 && c.saturation > 0.5],
    ["F", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 110) < 25],
    ["Cl", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 120) < 20],
    ["Br", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 5) < 15 && c.lightness < 0.4],
    ["I", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 285) < 20],
    ["S", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 52) < 12],
    ["P", (c: ReturnType<typeof hsl>) => hueDistance(c.hue, 30) < 10],
  ] as const)("keeps the model-kit colour family of %s", (symbol, inFamily) => {
    const colour = elementColour(symbol);
    expect(isConventionColour(symbol)).toBe(true);
    expect(inFamily(hsl(colour)), `${symbol} is ${colour}`).toBe(true);
  });

  it("colours every other element by rule: one hue per group, darker down each group", () => {
    const byGroup = new Map<number, { period: number; symbol: string }[]>();
    for (const element of REFERENCE) {
      // source: @chemistry/elements npm package (posY is the group of the main table; rows 9 and 10 are the f-block)
      if (element.posX > 7 || isConventionColour(element.symbol)) continue;
      const members = byGroup.get(element.posY) ?? [];
      members.push({ period: element.posX, symbol: element.symbol });
      byGroup.set(element.posY, members);
    }
    expect(byGroup.size).toBe(18);
    for (const [group, members] of byGroup) {
      const hues = members.map((member) => hsl(elementColour(member.symbol)).hue);
      for (const hue of hues) expect(hueDistance(hue, hues[0]), `group ${group}`).toBeLessThan(3);
      const ordered = [...members].sort((a, b) => a.period - b.period);
      for (let index = 1; index < ordered.length; index++) {
        expect(
          relativeLuminance(elementColour(ordered[index].symbol)),
          `${ordered[index].symbol} after ${ordered[index - 1].symbol}`,
        ).toBeLessThan(relativeLuminance(elementColour(ordered[index - 1].symbol)));
      }
    }
  });

  it("never gives a ruled colour that could pass for a model-kit colour", () => {
    const convention = CONVENTION_SYMBOLS.map(elementColour);
    for (const element of REFERENCE) {
      if (isConventionColour(element.symbol)) continue;
      const nearest = Math.min(...convention.map((colour) => channelDistance(elementColour(element.symbol), colour)));
      expect(nearest, element.symbol).toBeGreaterThanOrEqual(24);
    }
  });

  it("keeps neighbours of the same period apart", () => {
    for (const element of REFERENCE) {
      const next = REFERENCE.find((other) => other.id === element.id + 1);
      if (!next || isConventionColour(element.symbol) || isConventionColour(next.symbol)) continue;
      expect(elementColour(element.symbol), `${element.symbol} and ${next.symbol}`).not.toBe(elementColour(next.symbol));
    }
  });

  // source: WCAG 2.x contrast ratio (relative luminance); 3:1 is its minimum for graphical objects.
  it.each([
    ["a white page", LIGHT_BACKGROUND],
    ["a dark editor", DARK_BACKGROUND],
  ])("shows every ball's edge on %s at 3:1 or better, by fill or outline", (_label, background) => {
    for (const element of REFERENCE) {
      const paint = atomPaint(element.symbol);
      const edge = Math.max(contrastRatio(paint.fill, background), contrastRatio(paint.outline, background));
      expect(edge, `${element.symbol} (${paint.fill} / ${paint.outline}) on ${background}`).toBeGreaterThanOrEqual(3);
    }
  });

  it("gives ruled fills 2:1 against both backgrounds on their own", () => {
    // source: WCAG 2.x contrast ratio formula
    for (const element of REFERENCE) {
      if (isConventionColour(element.symbol)) continue;
      for (const background of [LIGHT_BACKGROUND, DARK_BACKGROUND]) {
        expect(contrastRatio(elementColour(element.symbol), background), `${element.symbol} on ${background}`).toBeGreaterThanOrEqual(2);
      }
    }
  });

  it("writes each symbol in the ink that reads on its ball (4.5:1 or better)", () => {
    // source: WCAG 2.x, 4.5:1 for normal text
    for (const element of REFERENCE) {
      const paint = atomPaint(element.symbol);
      expect(contrastRatio(paint.ink, paint.fill), element.symbol).toBeGreaterThanOrEqual(4.5);
    }
  });

  it("checks contrast the WCAG way // source: WCAG 2.x, black on white is 21:1, white on white 1:1", () => {
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrastRatio("#ffffff", "#ffffff")).toBeCloseTo(1, 5);
    // source: WCAG 2.x, #777777 on white is about 4.48:1
    expect(contrastRatio("#777777", "#ffffff")).toBeCloseTo(4.48, 1);
  });

  it("paints unknown symbols grey rather than failing", () => {
    expect(elementColour("Zz")).toMatch(/^#[0-9a-f]{6}$/);
    expect(hsl(elementColour("Zz")).saturation).toBeLessThan(0.05);
  });
});
