/**
 * The VS Code client is a thin edge: its bundle holds the language-client library and the
 * client's own files, and none of the chemistry core, which the server alone runs.
 */
import { build } from "esbuild";
import { describe, expect, it } from "vitest";

describe("the client bundle", () => {
  it("contains no module of the core but the request contract", async () => {
    const result = await build({
      entryPoints: ["client/src/extension.ts"],
      bundle: true,
      platform: "node",
      format: "cjs",
      external: ["vscode"],
      metafile: true,
      write: false,
    });
    const inputs = Object.keys(result.metafile.inputs);
    expect(inputs.some((input) => input.startsWith("client/src/"))).toBe(true);
    expect(inputs.filter((input) => input.startsWith("shared/"))).toEqual(["shared/src/editorRequests.ts"]);
    expect(inputs.filter((input) => input.startsWith("server/"))).toEqual([]);
  });
});
