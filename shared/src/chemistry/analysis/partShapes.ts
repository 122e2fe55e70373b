/**
 * One short phrase for the shape of a part of a salt, hydrate or complex ion ("tetrahedral",
 * "C trigonal planar, O bent", "monatomic ion, no shape of its own"), shared by the messages of
 * the core and every report, so that they always say the same thing.
 */
import { elementBySymbol } from "../elements";
import type { AnalysisResult, SpeciesPart } from "../types";

/** The shape phrase for one part. */
export function partShapeText(part: SpeciesPart): string {
  if (part.monatomic) return part.formula.includes("^") ? "monatomic ion, no shape of its own" : "single atom, no shape of its own";
  if (part.analysis === undefined) return "not analysed";
  return resultShapeText(part.analysis);
}

/** The shape phrase for an analysis: its centres' geometries, or in a few words why there is none. */
export function resultShapeText(result: AnalysisResult): string {
  if (!result.ok) {
    if (result.parts) return `made of ${partsListText(result.parts, true)}`;
    if (result.problem.code === "transition-metal-centre" || result.problem.code === "f-block-centre") {
      const metal = result.reading?.composition
        .map((part) => elementBySymbol(part.symbol))
        .find((element) => element && element.category !== "main-group" && element.category !== "noble-gas");
      const kind = result.problem.code === "f-block-centre" ? "an f-block metal" : "a transition metal";
      return `its centre is ${metal ? metal.name + ", " : ""}${kind}, so VSEPR predicts no shape`;
    }
    return `no shape predicted (${result.problem.code})`;
  }
  const { centres, graph } = result.value;
  if (centres.length === 0) return graph.atoms.length === 2 ? "linear (two atoms)" : "no shape of its own";
  if (centres.length === 1) return centres[0].molecularGeometry;
  const entries: string[] = [];
  for (const centre of centres) {
    const entry = `${centre.atom} ${centre.molecularGeometry}`;
    if (!entries.includes(entry)) entries.push(entry);
  }
  return entries.join(", ");
}

/**
 * "Cu^2+ and SO4^2-", "NH4^+ (×2) and SO4^2-": parts with their counts, and with `withShapes` the
 * shape of each polyatomic part ("SO4^2- (tetrahedral)").
 */
export function partsListText(parts: readonly SpeciesPart[], withShapes = false): string {
  const named = parts.map((part) => {
    const counted = part.count > 1 ? `${part.formula} ×${part.count}` : part.formula;
    return withShapes && !part.monatomic
      ? `${counted} (${partShapeText(part)})`
      : part.count > 1
        ? `${part.formula} (×${part.count})`
        : part.formula;
  });
  return named.length <= 1 ? named.join("") : `${named.slice(0, -1).join(", ")} and ${named[named.length - 1]}`;
}
