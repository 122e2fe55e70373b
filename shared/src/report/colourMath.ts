/**
 * Colour arithmetic for pictures: WCAG relative luminance and contrast, mixing, hex parsing.
 * Pure and free of chemistry, so the drawing code can use it in a browser as well.
 */

/** Red, green and blue channels, 0-255 (not rounded). */
export type Rgb = readonly [number, number, number];

/** WCAG relative luminance of `#rrggbb`. */
export function relativeLuminance(colour: string): number {
  return luminanceOf(rgbOf(colour));
}

/** WCAG contrast ratio of two `#rrggbb` colours, from 1 to 21. */
export function contrastRatio(first: string, second: string): number {
  const a = relativeLuminance(first);
  const b = relativeLuminance(second);
  return (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05);
}

/** `#rrggbb` of `colour` moved `fraction` of the way towards `towards`. */
export function mixColours(colour: string, towards: string, fraction: number): string {
  return hexOf(mixRgb(rgbOf(colour), rgbOf(towards), fraction));
}

/** WCAG relative luminance of channels. */
export function luminanceOf([red, green, blue]: Rgb): number {
  const linear = (channel: number): number => {
    const value = channel / 255;
    return value <= 0.04045 ? value / 12.92 : ((value + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * linear(red) + 0.7152 * linear(green) + 0.0722 * linear(blue);
}

/** Channels moved `fraction` of the way from `from` to `to`. */
export function mixRgb(from: Rgb, to: Rgb, fraction: number): Rgb {
  return [0, 1, 2].map((k) => from[k] + (to[k] - from[k]) * fraction) as unknown as Rgb;
}

/** Channels of `#rrggbb`; a neutral grey for anything else. */
export function rgbOf(colour: string): Rgb {
  const match = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(colour);
  if (!match) return [138, 138, 138];
  return [parseInt(match[1], 16), parseInt(match[2], 16), parseInt(match[3], 16)];
}

/** `#rrggbb` of channels, clamped and rounded. */
export function hexOf(rgb: Rgb): string {
  return `#${rgb
    .map((channel) =>
      Math.round(Math.max(0, Math.min(255, channel)))
        .toString(16)
        .padStart(2, "0"),
    )
    .join("")}`;
}

/** True for a `#rrggbb` colour. */
export function isHexColour(value: unknown): value is string {
  return typeof value === "string" && /^#[0-9a-f]{6}$/i.test(value);
}
