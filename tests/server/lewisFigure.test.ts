/**
 * `lonepair/lewisFigure` answered by the real server (dist/server.js): the figure every LSP
 * editor writes beside a document and links from it, for the species at a position or a typed one.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { LewisFigureRequestResult, ShapeModelResult } from "../../shared/src/editorRequests";
import { parseXml } from "../support/parseXml";
import { fixtureUri, startSession, type LspSession } from "./lspSession";

const NOTE = [
  "# Run 14: fluorinating agents for the etch study",
  "",
  "Bay C keeps ClF3 beside the SF4 cylinder.",
  "In mhchem: $\\ce{XeF4}$ and `smiles:FS(F)(F)F` as code.",
  "",
].join("\n");
const NOTE_URI = fixtureUri("notebook/run-14.md");

let figuresFolder: unknown = undefined;
let session: LspSession;

beforeAll(async () => {
  session = await startSession({ configuration: () => (figuresFolder === undefined ? {} : { figuresFolder }) });
  session.open(NOTE_URI, "markdown", NOTE);
});
afterAll(async () => {
  await session?.stop();
});

const ask = (params: object) =>
  session.connection.sendRequest<LewisFigureRequestResult | null>("lonepair/lewisFigure", { uri: NOTE_URI, ...params });

describe("lonepair/lewisFigure", () => {
  it("draws the species under the cursor and names its file in the figures folder", async () => {
    figuresFolder = undefined;
    // "SF4" starts at character 28 of line 2.
    const result = await ask({ position: { line: 2, character: 29 } });
    expect(result?.text).toBe("SF4");
    expect(result?.range).toEqual({ start: { line: 2, character: 28 }, end: { line: 2, character: 31 } });
    const figure = result!.figure!;
    expect(figure.relativePath).toBe("figures/lewis-SF4.svg");
    expect(figure.markdown).toBe("![Lewis structure of SF4 (sulfur tetrafluoride)](figures/lewis-SF4.svg)");
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (SF4: one lone pair on S, three on each F)
    expect(parseXml(figure.svg).filter((element) => element.attributes.class === "electron").length).toBe(26);
  });

  it.each([
    ["a folder of the user's", "lab figures", "<lab figures/lewis-NO3-minus-2.svg>"],
    ["the document's own folder", "", "lewis-NO3-minus-2.svg"],
    ["the default for an absolute path", "/etc", "figures/lewis-NO3-minus-2.svg"],
  ])("draws a typed species' second structure into %s", async (_, folder, destination) => {
    figuresFolder = folder;
    session.connection.sendNotification("workspace/didChangeConfiguration", { settings: { lonepair: { figuresFolder: folder } } });
    const result = await ask({ species: "NO3-", form: 2 });
    // from memory: Zumdahl, Chemistry, ch. 8 (three resonance structures of nitrate)
    expect(result?.figure?.drawableForms).toBe(3);
    expect(result?.figure?.markdown).toBe(`![Lewis structure of NO3^- (nitrate), structure 2 of 3 equivalent ones](${destination})`);
  });

  it.each([
    ["no species under the cursor", { position: { line: 0, character: 2 } }],
    ["an empty typed species", { species: "  " }],
  ])("answers null for %s", async (_, params) => {
    expect(await ask(params)).toBeNull();
  });

  it("says why a typed species cannot be drawn", async () => {
    const result = await ask({ species: "CH5" });
    expect(result?.figure).toBeUndefined();
    expect(result?.problem?.message).toBeTruthy();
  });

  it("gives the 3D view's side panel the diagram in dark and light ink", async () => {
    const result = await session.connection.sendRequest<ShapeModelResult | null>("lonepair/shapeModel", {
      uri: NOTE_URI,
      position: { line: 2, character: 13 },
    });
    expect(result?.text).toBe("ClF3");
    const lewis = result!.lewis!;
    expect(lewis.altText).toBe("Lewis structure of ClF3 (chlorine trifluoride)");
    const decoded = (uri: string) => Buffer.from(uri.slice(uri.indexOf(",") + 1), "base64").toString("utf8");
    expect(parseXml(decoded(lewis.dark)).some((element) => element.attributes.fill === "#ececec")).toBe(true);
    expect(parseXml(decoded(lewis.light)).some((element) => element.attributes.fill === "#1b1b1b")).toBe(true);
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (ClF3: two lone pairs on Cl, three on each F)
    expect(parseXml(decoded(lewis.light)).filter((element) => element.attributes.class === "electron").length).toBe(2 * (2 + 9));
  });

  it.each([
    // [character on line 3 inside the mention, the text the link follows]
    [18, "$\\ce{XeF4}$"],
    [36, "`smiles:FS(F)(F)F`"],
  ])("puts the link after the markup round a mention (cursor at %i)", async (character, enclosing) => {
    figuresFolder = undefined;
    const result = await ask({ position: { line: 3, character } });
    const line = NOTE.split("\n")[3];
    expect(result?.figure, JSON.stringify(result)).toBeDefined();
    expect(result?.linkPosition).toEqual({ line: 3, character: line.indexOf(enclosing) + enclosing.length });
  });

  it("puts the link right after a mention in prose", async () => {
    const result = await ask({ position: { line: 2, character: 13 } });
    expect(result?.linkPosition).toEqual({ line: 2, character: 16 });
  });
});
