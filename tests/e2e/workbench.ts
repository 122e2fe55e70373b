/**
 * Driving the VS Code workbench in Debian's headless Chromium the way a person would: keyboard
 * shortcuts, the quick-open box, the command palette and the mouse.
 */
import type { BrowserContext, Frame, Page } from "playwright-core";
import { launchHeadlessChromium } from "../support/headlessChromium";

/** The browser with its own fresh profile, showing the workbench on one folder. */
export interface Workbench {
  readonly context: BrowserContext;
  readonly page: Page;
}

export async function openWorkbench(serverUrl: string, folder: string, profile: string): Promise<Workbench> {
  const context = await launchHeadlessChromium(profile, { viewport: { width: 1400, height: 900 } });
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(60_000);
  await page.goto(`${serverUrl}/?folder=${encodeURIComponent(folder)}`);
  await page.waitForSelector(".monaco-workbench .part.editor");
  await page.waitForSelector(".monaco-workbench .part.statusbar");
  return { context, page };
}

/** Opens a workspace file through quick open (Ctrl+P) and waits for its tab to be the active one. */
export async function openFile(page: Page, fileName: string): Promise<void> {
  const tab = page.locator(`.tab[aria-label^="${fileName}"]`);
  if ((await tab.count()) > 0) {
    await tab.first().click();
  } else {
    await page.keyboard.press("Control+P");
    await page.waitForSelector(".quick-input-widget input", { state: "visible" });
    await page.keyboard.type(fileName);
    // Enter opens the focused row, which is the wanted file only once the list has caught up with the
    // typing; file search also waits for the extension host's search provider on a cold start.
    await page.waitForSelector(`.quick-input-widget .monaco-list-row.focused[aria-label^="${fileName}"]`, { timeout: 90_000 });
    await page.keyboard.press("Enter");
  }
  await page.waitForSelector(`.tab.active[aria-label^="${fileName}"]`);
  await page.waitForSelector(".editor-group-container.active .monaco-editor .view-lines");
}

/** Runs a command by its title from the command palette (F1). */
export async function runCommand(page: Page, title: string): Promise<void> {
  await page.keyboard.press("F1");
  await page.waitForSelector(".quick-input-widget input", { state: "visible" });
  await page.keyboard.type(title);
  await page.waitForSelector(`.quick-input-widget .monaco-list-row.focused[aria-label^="${title}"]`);
  await page.keyboard.press("Enter");
  await page.waitForSelector(".quick-input-widget", { state: "hidden" });
}

/** Moves the cursor with "Go to Line/Column" (Ctrl+G); line and column count from 1. */
export async function goTo(page: Page, line: number, column: number): Promise<void> {
  await page.keyboard.press("Control+G");
  await page.waitForSelector(".quick-input-widget input", { state: "visible" });
  await page.keyboard.type(`${line}:${column}`);
  await page.keyboard.press("Enter");
  await page.waitForSelector(".quick-input-widget", { state: "hidden" });
  await page.waitForFunction(
    ([wanted]) =>
      Array.from((globalThis as unknown as BrowserGlobals).document.querySelectorAll(".statusbar-item")).some(
        (item) => item.textContent?.trim() === wanted,
      ),
    [`Ln ${line}, Col ${column}`],
  );
}

/** Screen box of text as the editor shows it. */
export interface TextBox {
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

/**
 * Where `target` is drawn in the first visible line of the active editor that contains `context`
 * (spaces match the editor's non-breaking ones); null when no visible line has it.
 */
export async function textBox(page: Page, context: string, target: string): Promise<TextBox | null> {
  if (!context.includes(target)) throw new Error(`"${target}" is not inside "${context}"`);
  // The editor may still be scrolling to reveal the cursor: trust a place only once it holds still.
  let previous: TextBox | null = null;
  for (let look = 0; look < 40; look++) {
    const box = await page.evaluate(findTextInVisibleLines, { context, target });
    if (box && previous && box.left === previous.left && box.top === previous.top) return box;
    previous = box;
    await page.waitForTimeout(150);
  }
  return previous;
}

/** Minimal DOM shapes for code that runs in the page (the project's type-check has no DOM library). */
interface BrowserNode {
  readonly data: string;
}
interface BrowserElement {
  readonly textContent: string | null;
}
interface BrowserRange {
  setStart(node: BrowserNode, offset: number): void;
  setEnd(node: BrowserNode, offset: number): void;
  getBoundingClientRect(): TextBox;
}
interface BrowserGlobals {
  document: {
    querySelectorAll(selector: string): Iterable<BrowserElement> & ArrayLike<BrowserElement>;
    createTreeWalker(root: BrowserElement, filter: number): { nextNode(): BrowserNode | null };
    createRange(): BrowserRange;
  };
}

function findTextInVisibleLines({ context, target }: { context: string; target: string }): TextBox | null {
  const browser = globalThis as unknown as BrowserGlobals;
  const showText = 4; // NodeFilter.SHOW_TEXT
  for (const line of Array.from(
    browser.document.querySelectorAll(".editor-group-container.active .monaco-editor .view-lines .view-line"),
  )) {
    const pieces: { node: BrowserNode; start: number }[] = [];
    let text = "";
    const walker = browser.document.createTreeWalker(line, showText);
    for (let node = walker.nextNode(); node; node = walker.nextNode()) {
      pieces.push({ node, start: text.length });
      text += node.data.replace(/\u00a0/g, " ");
    }
    const at = text.indexOf(context);
    if (at < 0) continue;
    const start = at + context.indexOf(target);
    const end = start + target.length;
    const holding = (offset: number, isEnd: boolean) =>
      pieces.find(
        (piece) =>
          offset >= piece.start && (isEnd ? offset <= piece.start + piece.node.data.length : offset < piece.start + piece.node.data.length),
      );
    const first = holding(start, false);
    const last = holding(end, true);
    if (!first || !last) continue;
    const range = browser.document.createRange();
    range.setStart(first.node, start - first.start);
    range.setEnd(last.node, end - last.start);
    const box = range.getBoundingClientRect();
    return { left: box.left, right: box.right, top: box.top, bottom: box.bottom };
  }
  return null;
}

/** Screen boxes of the squiggles of one severity ("error", "warning", "info") in the active editor. */
export async function squiggleBoxes(page: Page, severity: "error" | "warning" | "info"): Promise<TextBox[]> {
  return page.locator(`.editor-group-container.active .monaco-editor .squiggly-${severity}`).evaluateAll((elements) =>
    elements.map((element) => {
      const box = (element as unknown as { getBoundingClientRect(): TextBox }).getBoundingClientRect();
      return { left: box.left, right: box.right, top: box.top, bottom: box.bottom };
    }),
  );
}

/**
 * Hovers over a box the way a hand does: the mouse leaves, then comes back in small steps (the editor
 * ignores a pointer that jumps), retried because the first hover after opening can be dropped.
 */
export async function hoverCard(page: Page, where: () => Promise<TextBox | null>, expected: string): Promise<string> {
  const card = page.locator(".monaco-hover:visible", { hasText: expected });
  for (let attempt = 0; attempt < 4; attempt++) {
    // Measured afresh each time: a hover card or a scroll may have moved the text.
    const box = await where();
    if (!box) throw new Error("the text to hover is not on screen");
    const x = (box.left + box.right) / 2;
    const y = (box.top + box.bottom) / 2;
    // Away first, to the left along the same line (no other species on the way), then back.
    await page.mouse.move(Math.max(box.left - 40, 0), y, { steps: 5 });
    await page.mouse.move(x, y, { steps: 15 });
    try {
      await card.first().waitFor({ state: "visible", timeout: 8_000 });
      return (await card.first().innerText()) ?? "";
    } catch {
      // Not shown yet: move away and come back.
    }
  }
  throw new Error(`no hover card containing "${expected}" appeared`);
}

/** The frame of a webview whose page has `selector` (webviews are an iframe inside an iframe). */
export async function webviewFrame(page: Page, selector: string, timeoutMs = 60_000): Promise<Frame> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    for (const frame of page.frames()) {
      const found = await frame.$(selector).catch(() => null);
      if (found) return frame;
    }
    await page.waitForTimeout(250);
  }
  throw new Error(`no webview frame with ${selector}`);
}

/** The Problems panel's entries for one file: its own count and the rows listed under it. */
export interface FileProblems {
  /** The count the panel gives beside the file name. */
  readonly count: number;
  /** Each row's accessible label: severity, message, position and source. */
  readonly rows: readonly string[];
}

/** Reads the Problems panel (opened with Ctrl+Shift+M) for the file named `fileName`. */
export async function problemsOfFile(page: Page, fileName: string): Promise<FileProblems> {
  const rows = page.locator(".markers-panel .monaco-list-row");
  await rows.first().waitFor({ state: "visible" });
  const labelled = await rows.evaluateAll((elements) =>
    elements.map((element) => {
      const row = element as unknown as { getAttribute(name: string): string | null };
      return { index: Number(row.getAttribute("data-index")), label: row.getAttribute("aria-label") ?? "" };
    }),
  );
  // Rows are placed by index, not by document order: sort, then take the ones under the file's row.
  labelled.sort((a, b) => a.index - b.index);
  const fileRow = new RegExp(`^(\\d+) problems? in file ${fileName.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")} `);
  const start = labelled.findIndex((row) => fileRow.test(row.label));
  if (start < 0) return { count: 0, rows: [] };
  const count = Number(fileRow.exec(labelled[start].label)?.[1]);
  const under: string[] = [];
  for (const row of labelled.slice(start + 1)) {
    if (/ problems? in file /.test(row.label)) break;
    under.push(row.label);
  }
  return { count, rows: under };
}
