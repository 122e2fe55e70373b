/**
 * How the pictures read, measured in headless Chromium: for every VSEPR shape and a set of
 * molecules with several centres, the 3D page's starting view and the hover sketch keep every
 * ball clear of every other ball and every label clear of the balls, and the page's model fills
 * its pane. Label boxes come from the browser's own text layout, not from our estimates.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHROMIUM, launchHeadlessChromium } from "../support/headlessChromium";
import { routeShapePage, SHAPE_PAGE_ORIGIN } from "../support/shapePageRoutes";
import { analyzeTyped, shapeSketchSvg, shapeViewModelOf, type ShapeViewModel, type SpeciesAnalysis } from "../../shared/src/index";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
const ARTIFACTS = join(ROOT, ".test-artifacts", "shapes");

// common practice: one species for each VSEPR shape, as general-chemistry tables list them.
const VSEPR_SHAPES: readonly (readonly [string, string])[] = [
  ["BeCl2", "linear"],
  ["BF3", "trigonal planar"],
  ["SO2", "bent"],
  ["CH4", "tetrahedral"],
  ["NH3", "trigonal pyramidal"],
  ["H2O", "bent"],
  ["PCl5", "trigonal bipyramidal"],
  ["SF4", "seesaw"],
  ["ClF3", "T-shaped"],
  ["XeF2", "linear"],
  ["SF6", "octahedral"],
  ["BrF5", "square pyramidal"],
  ["XeF4", "square planar"],
  ["IF7", "pentagonal bipyramidal"],
];

// common practice: small molecules with two or more centres, written as SMILES.
const MULTI_CENTRE: readonly string[] = [
  "smiles:CC",
  "smiles:C=C",
  "smiles:C#C",
  "smiles:CO",
  "smiles:CC(=O)O",
  "smiles:c1ccccc1",
  "smiles:OO",
  "smiles:NN",
  "smiles:CC(C)=O",
  "smiles:CC#N",
];

interface Circle {
  readonly atom: number;
  readonly x: number;
  readonly y: number;
  readonly r: number;
}

interface Box {
  readonly kind: string;
  readonly atom: number | null;
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

interface Segment {
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
}

interface Layout {
  readonly width: number;
  readonly height: number;
  readonly atoms: readonly Circle[];
  readonly labels: readonly Box[];
  readonly bonds: readonly Segment[];
}

/** What the page script sees in the page's global scope (the type-check has no DOM library). */
interface PageGlobals {
  posted: { type: string; svg?: string }[];
  acquireVsCodeApi: () => unknown;
  postMessage(message: unknown, targetOrigin: string): void;
}

function analysed(text: string): SpeciesAnalysis {
  const result = analyzeTyped(text);
  if (!result.ok) throw new Error(`${text} was not analysed: ${result.problem.message}`);
  return result.value;
}

function modelOf(text: string): ShapeViewModel {
  const model = shapeViewModelOf(analysed(text));
  if (!model) throw new Error(`${text}: no model`);
  return model;
}

/** Two balls overlap when their centres are closer than the sum of their radii (half a pixel of rounding allowed). */
function overlappingAtoms(atoms: readonly Circle[]): string[] {
  const found: string[] = [];
  for (let first = 0; first < atoms.length; first++) {
    for (let second = first + 1; second < atoms.length; second++) {
      const a = atoms[first];
      const b = atoms[second];
      const apart = Math.hypot(a.x - b.x, a.y - b.y);
      if (apart < a.r + b.r - 0.5) found.push(`atoms ${a.atom} and ${b.atom}: ${apart.toFixed(1)} px apart, radii ${a.r} + ${b.r}`);
    }
  }
  return found;
}

/** A label touches a ball when the nearest point of its box lies inside the ball; a symbol may sit on its own atom. */
function labelsOnAtoms(layout: Layout): string[] {
  const found: string[] = [];
  for (const label of layout.labels) {
    for (const atom of layout.atoms) {
      if (label.atom === atom.atom) continue;
      const nearestX = Math.max(label.x, Math.min(atom.x, label.x + label.width));
      const nearestY = Math.max(label.y, Math.min(atom.y, label.y + label.height));
      if (Math.hypot(atom.x - nearestX, atom.y - nearestY) < atom.r - 0.5) found.push(`${label.kind} "${label.text}" on atom ${atom.atom}`);
    }
  }
  return found;
}

/** Angle labels that a bond line runs through (sampled every half pixel along each line). */
function angleLabelsOnBonds(layout: Layout): string[] {
  const found: string[] = [];
  for (const label of layout.labels.filter((box) => box.kind === "angle label")) {
    for (const bond of layout.bonds) {
      const steps = Math.max(1, Math.ceil(2 * Math.hypot(bond.x2 - bond.x1, bond.y2 - bond.y1)));
      for (let step = 0; step <= steps; step++) {
        const x = bond.x1 + ((bond.x2 - bond.x1) * step) / steps;
        const y = bond.y1 + ((bond.y2 - bond.y1) * step) / steps;
        if (x > label.x && x < label.x + label.width && y > label.y && y < label.y + label.height) {
          found.push(`"${label.text}" crosses a bond at ${x.toFixed(0)},${y.toFixed(0)}`);
          break;
        }
      }
    }
  }
  return found;
}

/** The larger side of the balls' bounding box against the pane's smaller side. */
function filledFraction(layout: Layout): number {
  const left = Math.min(...layout.atoms.map((atom) => atom.x - atom.r));
  const right = Math.max(...layout.atoms.map((atom) => atom.x + atom.r));
  const top = Math.min(...layout.atoms.map((atom) => atom.y - atom.r));
  const bottom = Math.max(...layout.atoms.map((atom) => atom.y + atom.r));
  return Math.max(right - left, bottom - top) / Math.min(layout.width, layout.height);
}

function insidePane(layout: Layout): string[] {
  return layout.atoms
    .filter((atom) => atom.x - atom.r < 0 || atom.y - atom.r < 0 || atom.x + atom.r > layout.width || atom.y + atom.r > layout.height)
    .map((atom) => `atom ${atom.atom} outside the pane`);
}

/** Reads balls and labels off an SVG in the page: balls from their attributes, labels from getBBox. */
async function layoutIn(page: Page, selector: string): Promise<Layout> {
  return page.evaluate((svgSelector) => {
    const doc = (globalThis as unknown as { document: { querySelector(s: string): SvgLike } }).document;
    interface SvgLike {
      getAttribute(name: string): string | null;
      querySelectorAll(s: string): ArrayLike<SvgLike>;
      getBBox(): { x: number; y: number; width: number; height: number };
      textContent: string | null;
      clientWidth: number;
      clientHeight: number;
      classList: { contains(name: string): boolean };
    }
    const svg = doc.querySelector(svgSelector);
    const all = (within: SvgLike, query: string): SvgLike[] => Array.from(within.querySelectorAll(query));
    const viewBox = (svg.getAttribute("viewBox") ?? "0 0 0 0").split(/\s+/).map(Number);
    // Hover sketches are plain circles; the page's balls are the "ball" circles of atom groups.
    const ballSelector = all(svg, "circle.ball").length > 0 ? "circle.ball" : "circle";
    const atoms = all(svg, ballSelector).map((circle, index) => ({
      atom: index,
      x: Number(circle.getAttribute("cx")),
      y: Number(circle.getAttribute("cy")),
      r: Number(circle.getAttribute("r")),
    }));
    // In the page each ball's group names its atom; sketch circles are numbered in paint order.
    const atomIndexOfBall = all(svg, "g.atom").map((group) => Number(group.getAttribute("data-atom")));
    const numbered = atoms.map((atom, index) => ({ ...atom, atom: atomIndexOfBall[index] ?? index }));
    const labels = all(svg, "text").map((text) => {
      const box = text.getBBox();
      const atom = text.getAttribute("data-atom");
      const kind = text.classList.contains("angle-label") ? "angle label" : "symbol";
      // A sketch's symbol sits at its ball's centre: find the ball it belongs to.
      let owner: number | null = atom === null ? null : Number(atom);
      if (owner === null && kind === "symbol") {
        const x = Number(text.getAttribute("x"));
        const match = numbered.find((ball) => Math.abs(ball.x - x) < 0.2 && Math.abs(ball.y - (box.y + box.height / 2)) < ball.r);
        owner = match ? match.atom : null;
      }
      return { kind, atom: owner, text: text.textContent ?? "", x: box.x, y: box.y, width: box.width, height: box.height };
    });
    const bonds = all(svg, "g.bond line").map((line) => ({
      x1: Number(line.getAttribute("x1")),
      y1: Number(line.getAttribute("y1")),
      x2: Number(line.getAttribute("x2")),
      y2: Number(line.getAttribute("y2")),
    }));
    return { width: viewBox[2], height: viewBox[3], atoms: numbered, labels, bonds };
  }, selector);
}

const haveBrowser = existsSync(CHROMIUM) || process.env.CI !== undefined;

describe.skipIf(!haveBrowser)("pictures that read at a glance (headless Chromium)", () => {
  let context: BrowserContext;
  let userDataDir: string;
  let page: Page;

  beforeAll(async () => {
    userDataDir = mkdtempSync(join(tmpdir(), "lonepair-chromium-"));
    context = await launchHeadlessChromium(userDataDir, { viewport: { width: 960, height: 560 } });
    page = await openShapePage(context);
    mkdirSync(ARTIFACTS, { recursive: true });
  });

  afterAll(async () => {
    await context?.close();
    if (userDataDir) rmSync(userDataDir, { recursive: true, force: true });
  });

  async function show(model: ShapeViewModel): Promise<void> {
    await page.evaluate((message) => (globalThis as unknown as PageGlobals).postMessage(message, "*"), { type: "show", model });
    await page.waitForFunction(
      (count) =>
        (globalThis as unknown as { document: { querySelectorAll(s: string): { length: number } } }).document.querySelectorAll(
          "#model g.atom",
        ).length === count,
      model.atoms.length,
    );
  }

  it.each(VSEPR_SHAPES)("%s (%s): the core names the shape the table gives", (species, geometry) => {
    expect(analysed(species).centres[0].molecularGeometry).toBe(geometry);
  });

  describe.each([...VSEPR_SHAPES.map(([species]) => species), ...MULTI_CENTRE])("%s", (species) => {
    it("3D page, starting view: balls apart, labels clear, model fills the pane", async () => {
      await show(modelOf(species));
      const layout = await layoutIn(page, "#model");
      expect(layout.atoms.length).toBe(modelOf(species).atoms.length);
      expect(overlappingAtoms(layout.atoms), "balls that overlap").toEqual([]);
      expect(labelsOnAtoms(layout), "labels on a ball").toEqual([]);
      expect(angleLabelsOnBonds(layout), "angle labels on a bond").toEqual([]);
      expect(insidePane(layout)).toEqual([]);
      expect(filledFraction(layout), "share of the pane's smaller side the model spans").toBeGreaterThanOrEqual(0.6);
      await page.screenshot({ path: join(ARTIFACTS, `page-${species.replace(/[^A-Za-z0-9]+/g, "_")}.png`) });
    });

    it("hover sketch: balls apart and symbols clear of other balls", async () => {
      const svg = shapeSketchSvg(analysed(species));
      expect(svg).toBeDefined();
      await page.evaluate((markup) => {
        const doc = (globalThis as unknown as { document: { getElementById(id: string): { innerHTML: string } } }).document;
        doc.getElementById("sketch-host").innerHTML = markup;
      }, svg!);
      const layout = await layoutIn(page, "#sketch-host svg");
      expect(layout.atoms.length).toBe(modelOf(species).atoms.length);
      expect(overlappingAtoms(layout.atoms), "balls that overlap").toEqual([]);
      expect(labelsOnAtoms(layout), "symbols on another ball").toEqual([]);
      expect(insidePane(layout)).toEqual([]);
    });
  });

  it("refits the model when the pane changes size", async () => {
    await show(modelOf("ClF3"));
    for (const viewport of [
      { width: 1400, height: 900 },
      { width: 560, height: 900 },
      { width: 960, height: 560 },
    ]) {
      await page.setViewportSize(viewport);
      // The page redraws when its drawing area changes size: wait until the drawing matches the area.
      await page.waitForFunction(() => {
        const svg = (
          globalThis as unknown as { document: { querySelector(s: string): { getAttribute(n: string): string; clientWidth: number } } }
        ).document.querySelector("#model");
        return Number(svg.getAttribute("viewBox").split(" ")[2]) === Math.round(svg.clientWidth);
      });
      const layout = await layoutIn(page, "#model");
      const paneWidth = await page.evaluate(
        () =>
          (globalThis as unknown as { document: { querySelector(s: string): { clientWidth: number } } }).document.querySelector("#model")
            .clientWidth,
      );
      expect(layout.width).toBe(Math.round(paneWidth));
      expect(insidePane(layout)).toEqual([]);
      expect(filledFraction(layout), `${viewport.width} × ${viewport.height}`).toBeGreaterThanOrEqual(0.6);
    }
  });

  it("saves the current view as a standalone SVG that an XML parser reads", async () => {
    await show(modelOf("SF4"));
    await page.click("#show-electron");
    await page.click("#save-svg");
    const saved = await page.evaluate(() =>
      (globalThis as unknown as PageGlobals).posted.filter((message) => message.type === "save-svg").pop(),
    );
    expect(saved?.svg?.startsWith("<svg ")).toBe(true);
    const parsed = await page.evaluate((text) => {
      const parser = new (globalThis as unknown as { DOMParser: new () => { parseFromString(t: string, m: string): unknown } }).DOMParser();
      const doc = parser.parseFromString(text, "image/svg+xml") as {
        getElementsByTagName(n: string): { length: number };
        documentElement: { getAttribute(n: string): string | null };
      };
      return {
        errors: doc.getElementsByTagName("parsererror").length,
        balls: doc.getElementsByTagName("circle").length,
        width: doc.documentElement.getAttribute("width"),
      };
    }, saved!.svg!);
    expect(parsed.errors).toBe(0);
    // common practice: SF4 has five atoms; in the electron view its lone pair is one more (ghost) circle
    expect(parsed.balls).toBeGreaterThanOrEqual(5);
    expect(Number(parsed.width)).toBeGreaterThan(100);
    await page.click("#show-molecular");
  });
});

/** The page as the extension builds it, plus an empty host for sketches. */
async function openShapePage(context: BrowserContext): Promise<Page> {
  const page = await context.newPage();
  await routeShapePage(page, '<div id="sketch-host"></div>');
  await page.addInitScript(() => {
    const record = globalThis as unknown as PageGlobals;
    record.posted = [];
    record.acquireVsCodeApi = () => ({
      postMessage: (message: { type: string }) => record.posted.push(message),
      getState: () => undefined,
      setState: () => undefined,
    });
  });
  await page.goto(`${SHAPE_PAGE_ORIGIN}/index.html`);
  await page.waitForFunction(() => (globalThis as unknown as PageGlobals).posted.some((message) => message.type === "ready"));
  return page;
}
