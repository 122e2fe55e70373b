/**
 * Where an inserted figure's link goes after a mention: never inside the markup that encloses
 * the chemistry (a code span, an mhchem `\ce{}` or chemformula `\ch{}`, the `$` of math).
 */
import { describe, expect, it } from "vitest";
import { figureLinkOffset } from "../../shared/src/index";

describe("figure link offset", () => {
  // common practice: text inserted inside a macro's argument or a code span changes what it means
  it.each([
    // [line with the mention, the mention, the text the link follows]
    ["Bay C keeps XeF4 cold.", "XeF4", "XeF4"],
    ["Bay C keeps \\ce{XeF4} cold.", "XeF4", "\\ce{XeF4}"],
    ["Bay C keeps \\ch{XeF4} cold.", "XeF4", "\\ch{XeF4}"],
    ["Bay C keeps $\\ch{XeF4}$ cold.", "XeF4", "$\\ch{XeF4}$"],
    ["Run `smiles:FS(F)(F)F` first.", "smiles:FS(F)(F)F", "`smiles:FS(F)(F)F`"],
  ])("%s", (line, mention, enclosing) => {
    const start = line.indexOf(mention);
    expect(figureLinkOffset(line, start, start + mention.length)).toBe(line.indexOf(enclosing) + enclosing.length);
  });
});
