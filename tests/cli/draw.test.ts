// `lonepair draw` as a user meets it: `node dist/cli.js`, SVG on standard output or in a file,
// structure numbers, themes and exit codes. Shape pictures are read back geometrically: a
// T-shaped molecule must look like a T, a seesaw like a seesaw, a square planar one like a square.
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseXml } from "../support/parseXml";
import { ensureBuilt, runCli } from "./cliRunner";

const scratch = mkdtempSync(join(tmpdir(), "lonepair-draw-"));
beforeAll(() => ensureBuilt());
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const classCount = (svg: string, name: string) => parseXml(svg).filter((element) => element.attributes.class === name).length;

describe("lonepair draw --lewis", () => {
  it("prints an SVG document of SF4 that an XML parser reads: five symbols, four bond lines, 26 dots", () => {
    const run = runCli(["draw", "--lewis", "SF4"]);
    expect(run.status, run.stderr).toBe(0);
    const elements = parseXml(run.stdout);
    expect(elements[0].name).toBe("svg");
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (SF4: four S-F single bonds, one lone pair on S, three on each F)
    expect(classCount(run.stdout, "atom")).toBe(5);
    expect(classCount(run.stdout, "bond")).toBe(4);
    expect(classCount(run.stdout, "electron")).toBe(2 * (1 + 4 * 3));
    expect(elements.find((element) => element.name === "desc")?.text).toContain("not measured data");
  });

  it("draws each of nitrate's equivalent structures by number and says how many there are", () => {
    const orders = new Set<string>();
    for (const form of ["1", "2", "3"]) {
      const run = runCli(["draw", "--lewis", "--form", form, "NO3-"]);
      expect(run.status, run.stderr).toBe(0);
      // from memory: Zumdahl, Chemistry, ch. 8 (three resonance structures of nitrate)
      expect(run.stderr).toContain("of 3 equivalent ones");
      const doubled = parseXml(run.stdout)
        .filter((element) => element.attributes.class === "bond")
        .map((element) => element.attributes["data-bond"])
        .filter((bond, index, all) => all.indexOf(bond) !== index);
      orders.add(doubled.join(","));
    }
    expect(orders.size).toBe(3);
  });

  it("writes to --output and reports where", () => {
    const file = join(scratch, "clf3.svg");
    const run = runCli(["draw", "--lewis", "--theme", "dark", "--output", file, "ClF3"]);
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain(file);
    const svg = readFileSync(file, "utf8");
    expect(parseXml(svg).some((element) => element.attributes.fill === "#ececec")).toBe(true);
  });

  it.each([
    [["draw", "SF4"], 2, "choose one picture"],
    [["draw", "--lewis"], 2, "exactly one species"],
    [["draw", "--lewis", "--theme", "neon", "SF4"], 2, "unknown theme"],
    [["draw", "--lewis", "--form", "0", "SF4"], 2, "whole number"],
    [["draw", "--lewis", "--form", "4", "NO3-"], 1, "choose 1 to 3"],
    [["draw", "--lewis", "Xq9"], 1, "Xq9"],
  ])("%j exits %i saying %s", (args, status, message) => {
    const run = runCli(args);
    expect(run.status).toBe(status);
    expect(run.stderr).toContain(message);
    expect(run.stdout).toBe("");
  });
});

interface Ball {
  readonly symbol: string;
  readonly x: number;
  readonly y: number;
  readonly r: number;
}

/** The balls of a picture: each atom group's circle and the symbol in its title. */
function ballsOf(svg: string): Ball[] {
  return [
    ...svg.matchAll(
      /<g class="atom[^"]*" data-atom="\d+"><circle class="ball" cx="([\d.-]+)" cy="([\d.-]+)" r="([\d.]+)"[^>]*\/>.*?<title>([^<]+)<\/title><\/g>/g,
    ),
  ].map((match) => ({ symbol: match[4], x: Number(match[1]), y: Number(match[2]), r: Number(match[3]) }));
}

function draw(species: string, ...options: string[]): string {
  const run = runCli(["draw", "--shape", ...options, species]);
  expect(run.stderr).toBe("");
  expect(run.status).toBe(0);
  return run.stdout;
}

/** The two outer atoms farthest apart on screen: the axial pair of a T or a seesaw. */
function farthestPair(outer: readonly Ball[]): [Ball, Ball] {
  let best: [Ball, Ball] = [outer[0], outer[1]];
  for (const a of outer)
    for (const b of outer) if (Math.hypot(a.x - b.x, a.y - b.y) > Math.hypot(best[0].x - best[1].x, best[0].y - best[1].y)) best = [a, b];
  return best;
}

describe("lonepair draw --shape", () => {
  it("writes one standalone SVG document with the species' atoms", () => {
    const svg = draw("ClF3");
    const elements = parseXml(svg);
    expect(elements[0].name).toBe("svg");
    expect(svg).not.toMatch(/<script|<foreignObject|<image|href=["']http|\son\w+=/i);
    // common practice: ClF3 is one Cl and three F
    expect(
      ballsOf(svg)
        .map((ball) => ball.symbol)
        .sort(),
    ).toEqual(["Cl", "F", "F", "F"]);
    expect(elements.find((element) => element.name === "desc")?.text).toMatch(/model prediction, not measured data/i);
  });

  it("draws ClF3 as an upright T: the axial pair level, the third F straight below the Cl", () => {
    // common practice: ClF3 is T-shaped — two axial F at 180° and one equatorial F at 90° to both.
    const balls = ballsOf(draw("ClF3"));
    const chlorine = balls.find((ball) => ball.symbol === "Cl")!;
    const fluorines = balls.filter((ball) => ball.symbol === "F");
    const [left, right] = farthestPair(fluorines);
    const stem = fluorines.find((ball) => ball !== left && ball !== right)!;
    expect(Math.abs(left.y - right.y), "the bar of the T is level").toBeLessThan(2);
    expect(Math.abs(left.y - chlorine.y)).toBeLessThan(2);
    expect(Math.abs(stem.x - chlorine.x), "the stem hangs straight down").toBeLessThan(2);
    expect(stem.y, "the stem is below the bar").toBeGreaterThan(chlorine.y + chlorine.r);
  });

  it("draws SF4 as a seesaw: a level axial board with both equatorial F below it", () => {
    // common practice: SF4 is a seesaw — axial F-S-F near 180°, two equatorial F on the side away from the lone pair.
    const balls = ballsOf(draw("SF4"));
    const sulfur = balls.find((ball) => ball.symbol === "S")!;
    const fluorines = balls.filter((ball) => ball.symbol === "F");
    const [left, right] = farthestPair(fluorines);
    expect(Math.abs(left.y - right.y), "the board is level").toBeLessThan(4);
    const legs = fluorines.filter((ball) => ball !== left && ball !== right);
    for (const leg of legs) expect(leg.y).toBeGreaterThan(sulfur.y + sulfur.r * 0.5);
    // The two legs stand apart, one on each side of the pivot.
    expect(Math.sign(legs[0].x - sulfur.x)).toBe(-Math.sign(legs[1].x - sulfur.x));
  });

  it("draws XeF4 face-on: four F at equal distances and right angles round the Xe", () => {
    // common practice: XeF4 is square planar, F-Xe-F 90° and 180°.
    const balls = ballsOf(draw("XeF4"));
    const xenon = balls.find((ball) => ball.symbol === "Xe")!;
    const arms = balls.filter((ball) => ball.symbol === "F").map((ball) => Math.atan2(ball.y - xenon.y, ball.x - xenon.x));
    const lengths = balls.filter((ball) => ball.symbol === "F").map((ball) => Math.hypot(ball.x - xenon.x, ball.y - xenon.y));
    for (const length of lengths) expect(length / lengths[0]).toBeCloseTo(1, 1);
    const sorted = [...arms].sort((a, b) => a - b);
    for (let index = 1; index < sorted.length; index++) expect(((sorted[index] - sorted[index - 1]) * 180) / Math.PI).toBeCloseTo(90, 0);
  });

  it("shows the electron geometry on request: lone pairs become empty sites", () => {
    // common practice: ClF3 is AX3E2, two lone pairs on Cl
    const svg = draw("ClF3", "--electron");
    expect(svg.match(/class="lone-pair ghost"/g)).toHaveLength(2);
    expect(svg).not.toMatch(/class="lone-pair lobe"/);
  });

  it("takes a size and a theme, and writes to a file", () => {
    const target = join(scratch, "kestrel-clf3-shape.svg");
    const run = runCli(["draw", "--shape", "--width", "640", "--height", "480", "--output", target, "ClF3"]);
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain(target);
    expect(run.stdout).toMatch(/not measured data/i);
    const svg = readFileSync(target, "utf8");
    expect(svg).toContain('width="640" height="480"');
    // The default plate is a white card; a dark page gets no card and light angle labels.
    expect(svg).toContain('<rect width="100%" height="100%" fill="#ffffff"/>');
    const dark = draw("ClF3", "--theme", "dark");
    expect(dark).not.toContain("<rect");
    expect(
      parseXml(dark)
        .filter((element) => element.attributes.class === "angle-label")
        .every((label) => label.attributes.fill === "#d4d4d4"),
    ).toBe(true);
  });

  it.each([
    ["no picture chosen", ["draw", "ClF3"], /choose one picture/],
    ["two species", ["draw", "--shape", "ClF3", "SF4"], /exactly one species/],
    ["a size that is not a number", ["draw", "--shape", "--width", "wide", "ClF3"], /whole pixels/],
    ["a size too small", ["draw", "--shape", "--height", "3", "ClF3"], /whole pixels/],
    ["an unknown option", ["draw", "--shape", "--colour", "ClF3"], /Unknown option/],
  ])("refuses %s with the usage exit code", (_label, args, message) => {
    const run = runCli(args);
    expect(run.status).toBe(2);
    expect(run.stdout).toBe("");
    expect(run.stderr).toMatch(message);
    expect(run.stderr).toContain("Usage: lonepair draw");
  });

  it("says why when a species cannot be read, with exit code 1", () => {
    const run = runCli(["draw", "--shape", "Qq7"]);
    expect(run.status).toBe(1);
    expect(run.stdout).toBe("");
    expect(run.stderr).toMatch(/^lonepair draw: Qq7: .+/);
  });
});
