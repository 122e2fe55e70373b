/**
 * The one decision about elements VSEPR says nothing for: d-block metals, f-block metals and the
 * superheavy elements. Formulas and SMILES both ask here, so their refusals read alike.
 */
import { elementBySymbol, FIRST_SUPERHEAVY } from "../elements";
import type { ElementData, Problem } from "../types";

/** The refusal for the first element of `symbols` outside VSEPR's reach, or undefined. */
export function metalCentreProblem(written: string, symbols: Iterable<string>): Problem | undefined {
  let dBlock: ElementData | undefined;
  let fBlock: ElementData | undefined;
  for (const symbol of symbols) {
    const element = elementBySymbol(symbol);
    if (element === undefined) continue;
    if (element.atomicNumber >= FIRST_SUPERHEAVY) return superheavy(written, element);
    if (element.category === "transition-metal") dBlock ??= element;
    else if (element.category === "lanthanide" || element.category === "actinide") fBlock ??= element;
  }
  if (fBlock) {
    return {
      code: "f-block-centre",
      message:
        `${written} contains ${fBlock.name}, an f-block metal (${fBlock.category}): VSEPR does not apply to ` +
        "f-block centres (their bonds are largely ionic and their shapes follow coordination number and ion " +
        "size, not electron pairs). No shape is predicted.",
    };
  }
  if (dBlock) {
    return {
      code: "transition-metal-centre",
      message:
        `${written} contains ${dBlock.name}, a transition metal: VSEPR does not apply to ` +
        "d-block centres (their shapes follow ligand-field and coordination rules). No shape is predicted.",
    };
  }
  return undefined;
}

function superheavy(written: string, element: ElementData): Problem {
  return {
    code: "superheavy-element",
    message:
      `${written} contains ${element.name} (Z = ${element.atomicNumber}), a superheavy element made a few atoms ` +
      "at a time: its chemistry is too little known, and too much changed by relativistic effects, for VSEPR " +
      "to predict a shape.",
  };
}
