/**
 * The hover card's SVG sketch of a species' shape: well-formed, self-contained, small, one ball
 * per atom and one lobe per lone pair on the centre; and a browser really draws it.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BrowserContext } from "playwright-core";
import { CHROMIUM, launchHeadlessChromium } from "../support/headlessChromium";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seededRandom } from "../support/seededRandom";
import { analyzeSmiles, analyzeSpecies, type SpeciesAnalysis } from "../../shared/src/index";
import { hoverMarkdown } from "../../shared/src/report/hoverMarkdown";
import { MAX_SKETCH_ATOMS, shapePictureSvg, shapeSketchSvg, svgDataUri } from "../../shared/src/report/shapeSketch";

const ARTIFACTS = join(fileURLToPath(new URL("../..", import.meta.url)), ".test-artifacts");

function analysis(text: string): SpeciesAnalysis {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text}: ${result.problem.message}`);
  return result.value;
}

function sketch(text: string): string {
  const svg = shapeSketchSvg(analysis(text));
  if (!svg) throw new Error(`${text}: no sketch`);
  return svg;
}

function count(svg: string, pattern: RegExp): number {
  return svg.match(pattern)?.length ?? 0;
}

/** Well-formed enough for an XML reader: one root, every opened tag closed in order, attributes quoted. */
function wellFormedProblems(svg: string): string[] {
  const problems: string[] = [];
  const stack: string[] = [];
  const tags = svg.match(/<[^>]*>/g) ?? [];
  const outsideTags = svg.replace(/<[^>]*>/g, "");
  if (/[<>&]/.test(outsideTags)) problems.push("stray <, > or & in text");
  for (const tag of tags) {
    const closing = /^<\/([A-Za-z][\w-]*)>$/.exec(tag);
    if (closing) {
      if (stack.pop() !== closing[1]) problems.push(`unbalanced ${tag}`);
      if (stack.length === 0 && tag !== tags[tags.length - 1]) problems.push("content after the root element");
      continue;
    }
    const opening = /^<([A-Za-z][\w-]*)((?:\s+[\w:-]+="[^"<&]*")*)\s*(\/?)>$/.exec(tag);
    if (!opening) {
      problems.push(`malformed tag ${tag}`);
      continue;
    }
    if (stack.length === 0 && tag !== tags[0]) problems.push("second root element");
    if (opening[3] !== "/") stack.push(opening[1]);
  }
  if (stack.length > 0) problems.push(`unclosed ${stack.join(", ")}`);
  return problems;
}

describe("shape sketch", () => {
  it.each(["SF4", "XeF4", "H2O", "CH4", "SF6", "CO2", "C2H4", "HCN", "NH4+", "C6H6"])(
    "%s is a well-formed, self-contained SVG",
    (formula) => {
      const svg = sketch(formula);
      expect(svg.startsWith("<svg ")).toBe(true);
      expect(svg).toContain('xmlns="http://www.w3.org/2000/svg"');
      expect(wellFormedProblems(svg)).toEqual([]);
      expect(svg).not.toMatch(/<script|<foreignObject|<image|<use|href=|url\(|@import|on\w+=/i);
    },
  );

  it.each([
    // common practice: SF4 is AX4E1, one S and four F, one lone pair on S
    ["SF4", 5, 1],
    // common practice: XeF4 is AX4E2, two lone pairs on Xe
    ["XeF4", 5, 2],
    // common practice: H2O is AX2E2, two lone pairs on O
    ["H2O", 3, 2],
    // common practice: CH4 is AX4, no lone pair on C
    ["CH4", 5, 0],
    // common practice: NH3 is AX3E1
    ["NH3", 4, 1],
  ])("%s has %i atom balls and %i lone-pair lobes on the centre", (formula, atoms, lonePairs) => {
    const svg = sketch(formula);
    expect(count(svg, /<circle /g)).toBe(atoms);
    expect(count(svg, /<ellipse /g)).toBe(lonePairs);
  });

  // Each bond is drawn as two halves, one from each atom, so each line count is doubled.
  it("draws a double bond as two lines and a triple bond as three // common practice: CO2 O=C=O, HCN H-C≡N", () => {
    expect(count(sketch("CO2"), /<line /g)).toBe(2 * (2 + 2));
    expect(count(sketch("HCN"), /<line /g)).toBe(2 * (1 + 3));
  });

  it("colours atoms by element // common practice: CPK colours, O red, F green, S yellow", () => {
    const svg = sketch("SOF4");
    const fills = new Set([...svg.matchAll(/<circle [^>]*fill="([^"]+)"/g)].map((match) => match[1]));
    expect(fills.size).toBe(3);
  });

  it.each([
    [320, 240, 'width="320" height="240"'],
    [Number.NaN, 1e9, 'width="160" height="1000"'],
  ])("takes a size of %s × %s as %s", (width, height, expected) => {
    expect(shapeSketchSvg(analysis("SF4"), { width, height })).toContain(expected);
  });

  it("has nothing to draw for a single atom, and gives up on large molecules", () => {
    expect(shapeSketchSvg(analysis("Ne"))).toBeUndefined();
    // common practice: icosane, C20H42, has 62 atoms
    const icosane = analyzeSmiles("C".repeat(20));
    if (!icosane.ok) throw new Error(icosane.problem.message);
    expect(icosane.value.graph.atoms.length).toBe(62);
    expect(icosane.value.graph.atoms.length).toBeGreaterThan(MAX_SKETCH_ATOMS);
    expect(shapeSketchSvg(icosane.value)).toBeUndefined();
  });

  it("keeps SF6's data URI under 6 KB, and the URI decodes to the same SVG", () => {
    const svg = sketch("SF6");
    const uri = svgDataUri(svg);
    expect(uri.startsWith("data:image/svg+xml;base64,")).toBe(true);
    expect(uri.length).toBeLessThan(6_000);
    expect(Buffer.from(uri.slice(uri.indexOf(",") + 1), "base64").toString("utf8")).toBe(svg);
  });

  it("writes long SVG text with characters beyond ASCII into a URI that decodes to the same text", () => {
    // common practice: UTF-8 for SVG text; the Ångström sign and degree sign take two bytes each
    const svg = `<svg xmlns="http://www.w3.org/2000/svg">${"<text>S–F 1.56 Å, 90°</text>".repeat(700)}</svg>`;
    expect(new TextEncoder().encode(svg).length).toBeGreaterThan(3 * 4096);
    const uri = svgDataUri(svg);
    expect(Buffer.from(uri.slice(uri.indexOf(",") + 1), "base64").toString("utf8")).toBe(svg);
  });

  it("encodes as Node's own base64 does, for every length and for text beyond ASCII", () => {
    // source: RFC 4648 base64, as Node's Buffer writes it
    const random = seededRandom(4648);
    const alphabet = ["<", ">", "a", "Z", "0", " ", "=", '"', "°", "Å", "–", "→", "😀"];
    for (let length = 0; length < 300; length++) {
      const text = Array.from({ length }, () => alphabet[Math.floor(random() * alphabet.length)]).join("");
      expect(svgDataUri(text), JSON.stringify(text)).toBe(`data:image/svg+xml;base64,${Buffer.from(text, "utf8").toString("base64")}`);
    }
  });

  it("appears in the hover card as a markdown image right after the title, naming the geometry", () => {
    const card = hoverMarkdown(analysis("SF4"), { angleDecimals: 1 });
    const lines = card.split("\n");
    // common practice: SF4 is seesaw
    expect(lines[2]).toMatch(/!\[ball-and-stick sketch of SF4, seesaw\]\(data:image\/svg\+xml;base64,[A-Za-z0-9+/=]+\)$/);
    expect(card).not.toMatch(/<svg|<img/);
    expect(card.length).toBeLessThan(100_000);
  });

  it("keeps the card of a molecule near the atom limit well under the editor's 100,000 characters", () => {
    // common practice: dodecane, C12H26, has 38 atoms
    const dodecane = analyzeSmiles("C".repeat(12));
    if (!dodecane.ok) throw new Error(dodecane.problem.message);
    expect(dodecane.value.graph.atoms.length).toBe(38);
    const card = hoverMarkdown(dodecane.value, { angleDecimals: 1 });
    expect(card).toContain("](data:image/svg+xml;base64,");
    expect(card.length).toBeLessThan(25_000);
  });

  /** Ball centres in paint order, moved to their centroid and scaled to unit spread. */
  function normalisedBalls(svg: string, ballPattern: RegExp): [number, number][] {
    const centres = [...svg.matchAll(ballPattern)].map((match) => [Number(match[1]), Number(match[2])] as [number, number]);
    const mean = centres.reduce((sum, [x, y]) => [sum[0] + x / centres.length, sum[1] + y / centres.length], [0, 0]);
    const spread = Math.sqrt(centres.reduce((sum, [x, y]) => sum + (x - mean[0]) ** 2 + (y - mean[1]) ** 2, 0) / centres.length);
    return centres.map(([x, y]) => [(x - mean[0]) / spread, (y - mean[1]) / spread]);
  }

  it.each(["ClF3", "SF4", "XeF4", "NH3", "SF6", "C2H4"])("%s: the sketch shows the same view as the 3D view's picture", (formula) => {
    const sketchBalls = normalisedBalls(sketch(formula), /<circle cx="([\d.-]+)" cy="([\d.-]+)"/g);
    const pictureBalls = normalisedBalls(shapePictureSvg(analysis(formula))!, /<circle class="ball" cx="([\d.-]+)" cy="([\d.-]+)"/g);
    expect(sketchBalls).toHaveLength(pictureBalls.length);
    sketchBalls.forEach(([x, y], index) => {
      expect(x).toBeCloseTo(pictureBalls[index][0], 1);
      expect(y).toBeCloseTo(pictureBalls[index][1], 1);
    });
  });

  it("leaves the image out of a card for a single atom", () => {
    expect(hoverMarkdown(analysis("Ne"), { angleDecimals: 1 })).not.toContain("data:image");
  });
});

// CI installs Chromium; elsewhere a missing browser skips the drawing check.
const haveBrowser = existsSync(CHROMIUM) || process.env.CI !== undefined;

describe.skipIf(!haveBrowser)("shape sketch in headless Chromium", () => {
  let context: BrowserContext;
  let userDataDir: string;

  beforeAll(async () => {
    userDataDir = mkdtempSync(join(tmpdir(), "lonepair-sketch-"));
    context = await launchHeadlessChromium(userDataDir, { viewport: { width: 840, height: 392 }, deviceScaleFactor: 2 });
  });

  afterAll(async () => {
    await context?.close();
    if (userDataDir) rmSync(userDataDir, { recursive: true, force: true });
  });

  it("loads each sketch as an image of the stated size and saves a picture of them", async () => {
    const formulas = ["SF4", "XeF4", "H2O", "CH4", "SF6", "NH3", "BF3", "PCl5", "ClF3", "C2H4", "CO2", "HCN", "C6H6", "O3", "XeF2"];
    const page = await context.newPage();
    const requests: string[] = [];
    page.on("request", (request) => {
      if (!request.url().startsWith("data:") && request.url() !== "about:blank") requests.push(request.url());
    });
    const images = formulas.map((formula) => `<img alt="${formula}" src="${svgDataUri(sketch(formula))}">`).join("");
    await page.setContent(`<!doctype html><body style="margin:8px;background:#f3f3f3">${images}</body>`);
    const sizes = await page.$$eval("img", (nodes) =>
      nodes.map((node) => {
        const image = node as unknown as { complete: boolean; naturalWidth: number; naturalHeight: number };
        return [image.complete, image.naturalWidth, image.naturalHeight];
      }),
    );
    expect(sizes).toEqual(formulas.map(() => [true, 160, 120]));
    expect(requests).toEqual([]);
    mkdirSync(ARTIFACTS, { recursive: true });
    await page.screenshot({ path: join(ARTIFACTS, "shape-sketches.png") });
    await page.close();
  });
});
