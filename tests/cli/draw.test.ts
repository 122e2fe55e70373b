// `lonepair draw` as a user meets it: `node dist/cli.js`, SVG on standard output or in a file,
// structure numbers, themes and exit codes.
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
