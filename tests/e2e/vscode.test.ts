/**
 * The packaged extension in a real VS Code (code-server 4.100.3, VS Code 1.100.3) driven through
 * Debian's headless Chromium, on a copy of the demo workspace: hover card, squiggle and Problems
 * panel, quick fix, summary-table insertion with undo, Lewis-diagram insertion with undo, and the 3D view. Each scenario leaves a
 * screenshot in .test-artifacts/e2e/.
 */
import { execFile } from "node:child_process";
import { cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import { parse } from "csv-parse/sync";
import type { Page } from "playwright-core";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from "vitest";
import {
  REPOSITORY_ROOT,
  installExtension,
  installedCodeServer,
  packagedExtension,
  prepareEditorFolders,
  startCodeServer,
  type RunningCodeServer,
} from "./codeServer";
import {
  goTo,
  hoverCard,
  openFile,
  openWorkbench,
  problemsOfFile,
  runCommand,
  squiggleBoxes,
  textBox,
  webviewFrame,
  type Workbench,
} from "./workbench";
import { parseXml } from "../support/parseXml";

const ARTIFACTS = join(REPOSITORY_ROOT, ".test-artifacts", "e2e");
const SCENARIO_TIMEOUT_MS = 150_000;

/** 1-based line and column of the first occurrence of `needle` in `text`. */
function positionOf(text: string, needle: string): { line: number; column: number } {
  const lines = text.split("\n");
  const index = lines.findIndex((line) => line.includes(needle));
  if (index < 0) throw new Error(`"${needle}" is not in the file`);
  return { line: index + 1, column: lines[index].indexOf(needle) + 1 };
}

/** Waits until the file on disk satisfies `ready` (the editor saves asynchronously). */
async function diskText(path: string, ready: (text: string) => boolean): Promise<string> {
  const deadline = Date.now() + 30_000;
  for (;;) {
    const text = readFileSync(path, "utf8");
    if (ready(text) || Date.now() > deadline) return text;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** The command line's findings for one file: the second edge over the same core. */
async function cliFindings(file: string): Promise<{ line: number; severity: string; code: string }[]> {
  const cli = join(REPOSITORY_ROOT, "dist", "cli.js");
  // The command line exits 1 when it finds problems; its JSON is on stdout either way.
  const stdout = await promisify(execFile)(process.execPath, [cli, "check", "--format", "json", file]).then(
    (result) => result.stdout,
    (failure: { stdout?: string }) => failure.stdout ?? "",
  );
  return JSON.parse(stdout);
}

/**
 * Picks an entry of the open code-action menu (Ctrl+.) with the keyboard, as the menu expects;
 * its pointer guard swallows clicks while it settles.
 */
async function chooseAction(page: Page, title: string): Promise<void> {
  const entries = page.locator(".action-widget .monaco-list-row.action");
  await page.locator(".action-widget .monaco-list-row.action", { hasText: title }).first().waitFor();
  await screenshot(page, "3-quick-fix-menu");
  const count = await entries.count();
  for (let step = 0; step <= count; step++) {
    const focused = await page.locator(".action-widget .monaco-list-row.action.focused").first().getAttribute("aria-label");
    if (focused === title) {
      await page.keyboard.press("Enter");
      await page.locator(".action-widget").first().waitFor({ state: "hidden" });
      return;
    }
    await page.keyboard.press("ArrowDown");
  }
  throw new Error(`the code-action menu never focused "${title}"`);
}

/** Closes whatever popup a failed step may have left open, so the next scenario starts clean. */
async function dismissPopups(page: Page): Promise<void> {
  for (let press = 0; press < 3; press++) await page.keyboard.press("Escape");
}

async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`) });
}

describe("lonepair in a real VS Code (code-server in headless Chromium)", () => {
  let scratch: string;
  let workspace: string;
  let server: RunningCodeServer | undefined;
  let workbench: Workbench | undefined;
  let page: Page;

  beforeAll(async () => {
    rmSync(ARTIFACTS, { recursive: true, force: true });
    mkdirSync(ARTIFACTS, { recursive: true });
    scratch = mkdtempSync(join(tmpdir(), "lonepair-e2e-"));
    workspace = join(scratch, "workspace");
    cpSync(join(REPOSITORY_ROOT, "examples"), workspace, { recursive: true });
    const [launcher, vsix] = await Promise.all([installedCodeServer(join(ARTIFACTS, "install.log")), packagedExtension(scratch)]);
    const folders = prepareEditorFolders(join(scratch, "editor"));
    await installExtension(launcher, folders, vsix);
    server = await startCodeServer(launcher, folders, join(ARTIFACTS, "code-server.log"));
    workbench = await openWorkbench(server.url, workspace, join(scratch, "chromium-profile"));
    page = workbench.page;
    // A cold install on a new machine takes minutes; later runs reuse the cached editor.
  }, 25 * 60_000);

  beforeEach(async () => {
    if (page) await dismissPopups(page);
  });

  afterEach(async (context) => {
    // What the screen showed when a scenario failed is the first thing to look at.
    if (page && context.task.result?.state === "fail") await screenshot(page, `failed-${context.task.name.replace(/\W+/g, "-")}`);
  });

  afterAll(async () => {
    await workbench?.context.close();
    await server?.stop();
    if (scratch) rmSync(scratch, { recursive: true, force: true });
  }, 60_000);

  it(
    "shows the shape in a hover card over a formula in a lab write-up",
    async () => {
      await openFile(page, "run-14-fluorinating-agents.md");
      // Hovers answer only once the language server is up; its first squiggle says it is.
      await page.locator(".editor-group-container.active .monaco-editor [class*='squiggly-']").first().waitFor();
      const text = readFileSync(join(workspace, "notebook", "run-14-fluorinating-agents.md"), "utf8");
      const at = positionOf(text, "\\ce{SF4}");
      await goTo(page, at.line, at.column);
      expect(await textBox(page, "\\ce{SF4", "SF4")).not.toBeNull();
      const card = await hoverCard(page, () => textBox(page, "\\ce{SF4", "SF4"), "seesaw");
      await screenshot(page, "1-hover-sf4");
      // from memory: VSEPR tables (any general chemistry handbook) — SF4 is AX4E1, seesaw, polar
      expect(card).toContain("SF4");
      expect(card).toContain("AX4E1");
      expect(card).toContain("seesaw");
      expect(card.toLowerCase()).toContain("model prediction");
      // The card shows the Lewis diagram as an SVG data image beside the ball-and-stick sketch.
      const lewis = page.locator(".monaco-hover:visible img[alt^='Lewis structure of SF4']").first();
      expect(await lewis.getAttribute("src")).toMatch(/^data:image\/svg\+xml;base64,/);
    },
    SCENARIO_TIMEOUT_MS,
  );

  it(
    "squiggles the impossible CH5 and counts the file's problems in the Problems panel",
    async () => {
      const file = join(workspace, "inventory", "cylinders.csv");
      await openFile(page, "cylinders.csv");
      await page.locator(".editor-group-container.active .monaco-editor .squiggly-error").first().waitFor();
      const ch5 = await textBox(page, "methane,CH5,", "CH5");
      expect(ch5).not.toBeNull();
      const errors = await squiggleBoxes(page, "error");
      const middle = (ch5!.top + ch5!.bottom) / 2;
      const underCh5 = errors.filter(
        (box) => box.left < ch5!.right && box.right > ch5!.left && box.top <= middle && box.bottom >= middle - 2,
      );
      expect(underCh5.length).toBeGreaterThan(0);

      await page.keyboard.press("Control+Shift+M");
      await page.locator(".markers-panel").waitFor();
      const expected = await cliFindings(file);
      await page.waitForFunction(
        ([count]) =>
          Array.from(
            (
              globalThis as unknown as { document: { querySelectorAll(s: string): ArrayLike<{ getAttribute(n: string): string | null }> } }
            ).document.querySelectorAll(".markers-panel .monaco-list-row"),
          ).some((row) => (row.getAttribute("aria-label") ?? "").startsWith(`${count} problems in file cylinders.csv `)),
        [expected.length],
      );
      const problems = await problemsOfFile(page, "cylinders.csv");
      await screenshot(page, "2-problems-ch5");
      const ours = problems.rows.filter((row) => row.endsWith("generated by lonepair"));
      expect(problems.count).toBe(ours.length);
      // The editor and the command line read the file with the same core: same count, same lines.
      expect(ours.length).toBe(expected.length);
      const linesInPanel = ours.map((row) => Number(/ at line (\d+) /.exec(row)?.[1])).sort((a, b) => a - b);
      expect(linesInPanel).toEqual(expected.map((finding) => finding.line).sort((a, b) => a - b));
      // The demo table's deliberate mistakes are among them.
      // from memory: valence electrons — N 5 + 3 × F 7 = 26, not the 24 the table gives NF3
      expect(ours.some((row) => /^Warning: Valence electrons for NF3 are 26/.test(row))).toBe(true);
      // from memory: VSEPR — NH3 is AX3E1, trigonal pyramidal, not trigonal planar
      expect(ours.some((row) => /^Warning: .*NH3 is trigonal pyramidal/.test(row))).toBe(true);
      // from memory: octet rule — carbon (period 2) has no valence-shell d orbitals, so no CH5
      expect(ours.some((row) => /^Error: CH5: .* at line 15 /.test(row))).toBe(true);
      await page.keyboard.press("Control+Shift+M");
    },
    SCENARIO_TIMEOUT_MS,
  );

  it(
    "fixes one wrong cell of the cylinder table with a quick fix and leaves every other byte alone",
    async () => {
      const file = join(workspace, "inventory", "cylinders.csv");
      const before = readFileSync(file, "utf8");
      await openFile(page, "cylinders.csv");
      const cell = positionOf(before, "nitrogen trifluoride,NF3,24,");
      const column = cell.column + "nitrogen trifluoride,NF3,".length;
      await goTo(page, cell.line, column);
      await page.keyboard.press("Control+.");
      // from memory: valence electrons — N 5 + 3 × F 7 = 26
      await chooseAction(page, "Change to 26");
      await page.keyboard.press("Control+S");
      const after = await diskText(file, (text) => text !== before);

      const offset =
        before
          .split("\n")
          .slice(0, cell.line - 1)
          .join("\n").length +
        1 +
        (column - 1);
      expect(after).toBe(`${before.slice(0, offset)}26${before.slice(offset + 2)}`);
      const rowsBefore: Record<string, string>[] = parse(before, { columns: true });
      const rowsAfter: Record<string, string>[] = parse(after, { columns: true });
      const nf3 = rowsBefore.findIndex((row) => row.formula === "NF3");
      expect(rowsAfter[nf3]["valence electrons"]).toBe("26");
      expect(rowsAfter).toEqual(rowsBefore.map((row, index) => (index === nf3 ? { ...row, "valence electrons": "26" } : row)));
      await screenshot(page, "3-quick-fix-applied");
    },
    SCENARIO_TIMEOUT_MS,
  );

  it(
    "inserts the summary table at the cursor, and one undo takes it out again",
    async () => {
      const file = join(workspace, "notebook", "run-15-nf3-vs-sf6.md");
      const original = readFileSync(file, "utf8");
      await openFile(page, "run-15-nf3-vs-sf6.md");
      // The blank line under the "Conclusion" heading.
      const heading = positionOf(original, "## Conclusion");
      const line = heading.line + 1;
      expect(original.split("\n")[line - 1]).toBe("");
      const offset =
        original
          .split("\n")
          .slice(0, line - 1)
          .join("\n").length + 1;
      await goTo(page, line, 1);
      await runCommand(page, "lonepair: Insert geometry summary table");
      await page.locator(".editor-group-container.active .view-line", { hasText: "| Formula | Name |" }).first().waitFor();
      await screenshot(page, "4-table-inserted");
      await page.keyboard.press("Control+S");
      const withTable = await diskText(file, (text) => text !== original);

      expect(withTable.slice(0, offset)).toBe(original.slice(0, offset));
      expect(withTable.endsWith(original.slice(offset))).toBe(true);
      const inserted = withTable.slice(offset, withTable.length - (original.length - offset));
      const tableRows = inserted.split("\n").filter((row) => row.startsWith("| "));
      const rowOf = (formula: string) => tableRows.find((row) => row.startsWith(`| ${formula} |`)) ?? "";
      // from memory: VSEPR tables — SF6 AX6 octahedral; NF3 and NH3 AX3E1 trigonal pyramidal
      expect(rowOf("SF6")).toMatch(/\| AX6 \|.*\| octahedral \|/);
      expect(rowOf("NF3")).toMatch(/\| AX3E1 \|.*\| trigonal pyramidal \|/);
      expect(rowOf("NH3")).toMatch(/\| AX3E1 \|.*\| trigonal pyramidal \|/);
      expect(inserted.toLowerCase()).toContain("model prediction");

      await page.keyboard.press("Control+Z");
      await page.keyboard.press("Control+S");
      const undone = await diskText(file, (text) => text === original);
      expect(undone).toBe(original);
      await screenshot(page, "4-table-undone");
    },
    SCENARIO_TIMEOUT_MS,
  );

  it(
    "inserts a Lewis diagram after the species under the cursor, writes its SVG, and one undo takes the link out",
    async () => {
      const file = join(workspace, "notebook", "run-14-fluorinating-agents.md");
      const figure = join(workspace, "notebook", "figures", "lewis-ClF3.svg");
      const original = readFileSync(file, "utf8");
      await openFile(page, "run-14-fluorinating-agents.md");
      const at = positionOf(original, "\\ce{ClF3} has two");
      await goTo(page, at.line, at.column + "\\ce{".length + 2);
      await runCommand(page, "lonepair: Insert Lewis diagram");
      await page.locator(".editor-group-container.active .view-line", { hasText: "![Lewis structure of ClF3" }).first().waitFor();
      await screenshot(page, "6-lewis-inserted");
      await page.keyboard.press("Control+S");
      const withLink = await diskText(file, (text) => text !== original);
      // The link follows the whole mhchem span, never splitting it.
      const link = "![Lewis structure of ClF3 (chlorine trifluoride)](figures/lewis-ClF3.svg)";
      expect(withLink).toBe(original.replace("\\ce{ClF3} has two", `\\ce{ClF3} ${link} has two`));
      const svg = readFileSync(figure, "utf8");
      // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (ClF3: two lone pairs on Cl, three on each F)
      expect(parseXml(svg).filter((element) => element.attributes.class === "electron").length).toBe(22);

      await page.keyboard.press("Control+Z");
      await page.keyboard.press("Control+S");
      const undone = await diskText(file, (text) => text === original);
      expect(undone).toBe(original);
      await screenshot(page, "6-lewis-undone");
    },
    SCENARIO_TIMEOUT_MS,
  );

  it(
    "opens the 3D view on the species under the cursor with its AXE class",
    async () => {
      const text = readFileSync(join(workspace, "notebook", "run-14-fluorinating-agents.md"), "utf8");
      await openFile(page, "run-14-fluorinating-agents.md");
      const at = positionOf(text, "\\ce{ClF3}");
      await goTo(page, at.line, at.column + "\\ce{".length + 1);
      await runCommand(page, "lonepair: Show 3D shape");
      const view = await webviewFrame(page, "#centres");
      const centres = view.locator("#centres");
      // from memory: VSEPR tables — ClF3 is AX3E2, T-shaped (two equatorial lone pairs)
      await expect.poll(() => centres.innerText(), { timeout: 30_000 }).toContain("AX3E2");
      expect(await centres.innerText()).toContain("T-shaped");
      expect(await view.locator("#title").innerText()).toContain("ClF3");
      expect(await view.locator("#model circle, #model g").count()).toBeGreaterThan(0);
      await screenshot(page, "5-shape-view-clf3");
    },
    SCENARIO_TIMEOUT_MS,
  );
});
