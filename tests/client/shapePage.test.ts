/**
 * The 3D shape page rendered standalone in headless Chromium under the same Content-Security-
 * Policy the extension gives it: the page's files are served from a made-up origin by request
 * interception (no network), and `acquireVsCodeApi` is stood in for by an init script.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { CHROMIUM, launchHeadlessChromium } from "../support/headlessChromium";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { routeShapePage, SHAPE_PAGE_ORIGIN } from "../support/shapePageRoutes";
import { analyzeSpecies, lewisViewImages } from "../../shared/src/index";
import { buildCoordinates } from "../../shared/src/chemistry/geometry/buildCoordinates";
import { shapeViewModel, type ShapeViewModel } from "../../shared/src/report/shapeViewModel";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
const ARTIFACTS = join(ROOT, ".test-artifacts");
const INJECTED = "<script>alert(1)</script>";

/** What the tests touch in the page's global scope (the project's type-check has no DOM library). */
interface PageGlobals {
  posted: { type: string }[];
  savedState: unknown;
  acquireVsCodeApi: () => unknown;
  ranInjected?: boolean;
  postMessage(message: unknown, targetOrigin: string): void;
  document: { createElement(tag: string): { textContent: string }; body: { appendChild(node: unknown): void } };
}

function viewOf(text: string): ShapeViewModel {
  const result = analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text} was not analysed: ${result.problem.message}`);
  return shapeViewModel(result.value, buildCoordinates(result.value.graph, result.value.radical));
}

// CI installs Chromium (.ci/run); elsewhere a missing browser skips the page tests.
const haveBrowser = existsSync(CHROMIUM) || process.env.CI !== undefined;

describe.skipIf(!haveBrowser)("3D shape page in headless Chromium", () => {
  let context: BrowserContext;
  let userDataDir: string;

  beforeAll(async () => {
    userDataDir = mkdtempSync(join(tmpdir(), "lonepair-chromium-"));
    context = await launchHeadlessChromium(userDataDir, { viewport: { width: 960, height: 560 } });
  });

  afterAll(async () => {
    await context?.close();
    if (userDataDir) rmSync(userDataDir, { recursive: true, force: true });
  });

  /** Opens the page as the extension builds it; collects console errors, page errors and dialogs. */
  async function openPage(savedState?: unknown): Promise<{ page: Page; errors: string[]; dialogs: string[] }> {
    const page = await context.newPage();
    const errors: string[] = [];
    const dialogs: string[] = [];
    page.on("console", (message) => {
      if (message.type() === "error") errors.push(message.text());
    });
    page.on("pageerror", (error) => errors.push(error.message));
    page.on("dialog", (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    await routeShapePage(page);
    // The editor injects acquireVsCodeApi; this stand-in records what the page posts and saves.
    await page.addInitScript((initialState) => {
      const record = globalThis as unknown as PageGlobals;
      record.posted = [];
      record.savedState = initialState;
      record.acquireVsCodeApi = () => ({
        postMessage: (message: { type: string }) => record.posted.push(message),
        getState: () => record.savedState,
        setState: (state: unknown) => {
          record.savedState = state;
        },
      });
    }, savedState);
    await page.goto(`${SHAPE_PAGE_ORIGIN}/index.html`);
    await page.waitForFunction(() => (globalThis as unknown as PageGlobals).posted.some((message) => message.type === "ready"));
    return { page, errors, dialogs };
  }

  async function show(page: Page, model: unknown): Promise<void> {
    await page.evaluate((message) => (globalThis as unknown as PageGlobals).postMessage(message, "*"), { type: "show", model });
  }

  it("draws SF4: five atoms, one lone-pair lobe, three labelled angles and the legend", async () => {
    const { page, errors, dialogs } = await openPage();
    await show(page, viewOf("SF4"));
    await page.waitForSelector("g.atom");
    // common practice: SF4 is AX4E1, a seesaw in a trigonal bipyramid, sp3d, angles 90/120/180 ideal.
    expect(await page.locator("g.atom").count()).toBe(5);
    expect(await page.locator("g.lone-pair").count()).toBe(1);
    expect(await page.locator("g.lone-pair.lobe").count()).toBe(1);
    const bondIds = await page.locator("g.bond").evaluateAll((groups) => groups.map((group) => group.getAttribute("data-bond")));
    expect(new Set(bondIds).size).toBe(4);
    expect(await page.locator(".angle-label").allTextContents()).toEqual(["90.0°", "120.0°", "180.0°"]);
    const legend = await page.locator(".legend").innerText();
    for (const expected of ["AX4E1", "trigonal bipyramidal", "seesaw", "sp3d"]) expect(legend).toContain(expected);
    expect(await page.locator("#caution").textContent()).toMatch(/model prediction, not measured data/i);

    mkdirSync(ARTIFACTS, { recursive: true });
    await page.screenshot({ path: join(ARTIFACTS, "shape-view-SF4-molecular.png") });

    // Electron geometry: the lone pair becomes a ghost site; still one lone-pair element.
    await page.click("#show-electron");
    expect(await page.locator("g.lone-pair.ghost").count()).toBe(1);
    expect(await page.locator("g.lone-pair.lobe").count()).toBe(0);
    expect(await page.locator("#show-electron").getAttribute("aria-pressed")).toBe("true");
    expect(await page.locator("dd.current").textContent()).toBe("trigonal bipyramidal");
    await page.screenshot({ path: join(ARTIFACTS, "shape-view-SF4-electron.png") });

    expect(errors).toEqual([]);
    expect(dialogs).toEqual([]);
    await page.close();
  });

  it("rotates on drag and keeps the rotation and the mode in the saved state", async () => {
    const { page, errors } = await openPage();
    await show(page, viewOf("XeF4"));
    await page.waitForSelector("g.atom");
    await page.click("#show-electron");
    const before = await page.locator("g.atom circle").evaluateAll((circles) => circles.map((circle) => circle.getAttribute("cx")));
    const box = (await page.locator("#model").boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width / 2 + 120, box.y + box.height / 2 + 40, { steps: 6 });
    await page.mouse.up();
    const after = await page.locator("g.atom circle").evaluateAll((circles) => circles.map((circle) => circle.getAttribute("cx")));
    expect(after).not.toEqual(before);
    const saved = await page.evaluate(
      () => (globalThis as unknown as PageGlobals).savedState as { mode: string; rotation: number[]; model: { formula: string } },
    );
    expect(saved.mode).toBe("electron");
    expect(saved.model.formula).toBe("XeF4");
    expect(saved.rotation).toHaveLength(9);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("shows the Lewis diagram in the side panel in the ink of the editor's theme, and only as an SVG data image", async () => {
    const { page, errors } = await openPage();
    const analysed = analyzeSpecies("ClF3");
    if (!analysed.ok) throw new Error(analysed.problem.message);
    const lewis = lewisViewImages(analysed.value)!;
    await page.evaluate(
      () => ((globalThis as unknown as { document: { body: { className: string } } }).document.body.className = "vscode-dark"),
    );
    await page.evaluate((message) => (globalThis as unknown as PageGlobals).postMessage(message, "*"), {
      type: "show",
      model: viewOf("ClF3"),
      lewis,
    });
    await page.waitForSelector("#lewis img");
    expect(await page.locator("#lewis img").getAttribute("src")).toBe(lewis.dark);
    expect(await page.locator("#lewis img").getAttribute("alt")).toBe("Lewis structure of ClF3 (chlorine trifluoride)");
    const hostile = { ...lewis, light: "https://lonepair-webview.test/elsewhere.svg", dark: "javascript:alert(4)" };
    await page.evaluate((message) => (globalThis as unknown as PageGlobals).postMessage(message, "*"), {
      type: "show",
      model: viewOf("SF4"),
      lewis: hostile,
    });
    await page.waitForFunction(
      () => (globalThis as unknown as { document: { querySelector(s: string): unknown } }).document.querySelector("#lewis img") === null,
    );
    expect(await page.locator("#lewis").isHidden()).toBe(true);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("keeps an injected script in the species text as inert text", async () => {
    const { page, errors, dialogs } = await openPage();
    const model = viewOf("SF4");
    const hostile = {
      ...model,
      title: INJECTED,
      name: `<img src=x onerror=alert(2)>`,
      warnings: [INJECTED],
      centres: model.centres.map((centre) => ({ ...centre, molecularGeometry: INJECTED })),
      atoms: model.atoms.map((atom) => ({ ...atom, symbol: `${atom.symbol}${INJECTED}`, colour: `red" onload="alert(3)` })),
    };
    await show(page, hostile);
    await page.waitForSelector("g.atom");
    expect(await page.locator("#title").textContent()).toBe(INJECTED);
    expect(await page.locator("#warnings li").textContent()).toBe(INJECTED);
    // The page's own two script elements only: the renderer and the page script.
    expect(await page.locator("script").count()).toBe(2);
    expect(await page.locator("img").count()).toBe(0);
    await page.evaluate((message) => (globalThis as unknown as PageGlobals).postMessage(message, "*"), {
      type: "problem",
      text: INJECTED,
      message: INJECTED,
    });
    expect(await page.locator("#title").textContent()).toBe(INJECTED);
    expect(await page.locator("script").count()).toBe(2);
    await page.waitForTimeout(200);
    expect(dialogs).toEqual([]);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("refuses an inline script the policy does not allow", async () => {
    const { page, errors } = await openPage();
    // A script added without the nonce must not run; Chromium reports the refusal on the console.
    await page.evaluate(() => {
      const { document } = globalThis as unknown as PageGlobals;
      const script = document.createElement("script");
      script.textContent = "window.ranInjected = true";
      document.body.appendChild(script);
    });
    await page.waitForTimeout(100);
    expect(await page.evaluate(() => (globalThis as unknown as PageGlobals).ranInjected)).toBeUndefined();
    expect(errors.some((error) => /Content Security Policy/i.test(error))).toBe(true);
    await page.close();
  });

  // Shapes of damaged messages: each must leave the page drawing nothing and saying "No model".
  const sf4 = (): Record<string, unknown> => JSON.parse(JSON.stringify(viewOf("SF4"))) as Record<string, unknown>;
  const withAtoms = (change: (atoms: Record<string, unknown>[]) => unknown): Record<string, unknown> => {
    const model = sf4();
    model.atoms = change(model.atoms as Record<string, unknown>[]);
    return model;
  };
  const withFirst = (key: string, change: (item: Record<string, unknown>) => unknown): Record<string, unknown> => {
    const model = sf4();
    const list = model[key] as Record<string, unknown>[];
    list[0] = change(list[0]) as Record<string, unknown>;
    return model;
  };
  const MALFORMED: readonly [string, unknown][] = [
    ["no atoms at all", { ...sf4(), atoms: undefined }],
    ["an empty atom list", withAtoms(() => [])],
    ["atoms that are not a list", withAtoms(() => "S F F F F")],
    ["a null atom", withAtoms((atoms) => [null, ...atoms.slice(1)])],
    ["a null symbol", withAtoms((atoms) => [{ ...atoms[0], symbol: null }, ...atoms.slice(1)])],
    ["a numeric symbol", withAtoms((atoms) => [{ ...atoms[0], symbol: 16 }, ...atoms.slice(1)])],
    ["an atom without a position", withAtoms((atoms) => [{ ...atoms[0], position: undefined }, ...atoms.slice(1)])],
    ["a position of text", withAtoms((atoms) => [{ ...atoms[0], position: ["0", "0", "0"] }, ...atoms.slice(1)])],
    ["a position of two numbers", withAtoms((atoms) => [{ ...atoms[0], position: [0, 0] }, ...atoms.slice(1)])],
    ["a bond to a missing atom", withFirst("bonds", (bond) => ({ ...bond, to: 99 }))],
    ["a bond with a fractional index", withFirst("bonds", (bond) => ({ ...bond, from: 0.5 }))],
    ["a lone pair on a missing atom", withFirst("lonePairs", (lonePair) => ({ ...lonePair, atom: -1 }))],
    ["a lone pair without a direction", withFirst("lonePairs", (lonePair) => ({ ...lonePair, direction: null }))],
    ["an angle arc with a hole", withFirst("angles", (angle) => ({ ...angle, arc: [null] }))],
    ["a centre without ideal angles", withFirst("centres", (centre) => ({ ...centre, idealAngles: null }))],
    ["warnings that are not a list", { ...sf4(), warnings: "check the cylinder" }],
    ["a polarity of the wrong type", { ...sf4(), polarity: { polar: "yes", reason: 3 } }],
    ["a numeric title", { ...sf4(), title: 42 }],
    ["a model that is text", "SF4"],
    ["a model that is a list", [1, 2, 3]],
  ];

  it.each(MALFORMED)("shows no model for %s, without an error", async (_label, model) => {
    const { page, errors } = await openPage();
    await show(page, viewOf("SF4"));
    await page.waitForSelector("g.atom");
    await show(page, model);
    await page.waitForFunction(
      () =>
        (globalThis as unknown as { document: { getElementById(id: string): { textContent: string } } }).document.getElementById("title")
          .textContent === "No model",
    );
    expect(await page.locator("g.atom").count()).toBe(0);
    expect(await page.locator("#subtitle").textContent()).toMatch(/^The shape could not be drawn: .+\.$/);
    expect(errors).toEqual([]);
    // A good model afterwards is drawn again: the page is still alive.
    await show(page, viewOf("XeF4"));
    await page.waitForSelector("g.atom");
    // common practice: XeF4 has five atoms
    expect(await page.locator("g.atom").count()).toBe(5);
    await page.close();
  });

  it.each([
    ["not an object", 42],
    ["an unknown type", { type: "explode", model: null }],
    ["a problem with text that is not text", { type: "problem", text: { toString: null }, message: ["a"] }],
    ["null", null],
  ])("ignores or answers calmly a message that is %s", async (_label, message) => {
    const { page, errors } = await openPage();
    await page.evaluate((sent) => (globalThis as unknown as PageGlobals).postMessage(sent, "*"), message);
    await page.waitForTimeout(50);
    expect(await page.locator("g.atom").count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });

  it.each([
    [
      "a model with a null symbol",
      { model: withAtoms((atoms) => [{ ...atoms[0], symbol: null }, ...atoms.slice(1)]), mode: "electron", rotation: [1] },
    ],
    ["text", "garbage"],
    ["a rotation of text", { model: null, problem: null, mode: 3, rotation: "abc" }],
  ])("opens with a saved state that is %s without an error", async (_label, saved) => {
    const { page, errors } = await openPage(saved);
    expect(await page.locator("g.atom").count()).toBe(0);
    expect(errors).toEqual([]);
    await show(page, viewOf("SF4"));
    await page.waitForSelector("g.atom");
    expect(await page.locator("g.atom").count()).toBe(5);
    await page.close();
  });
});
