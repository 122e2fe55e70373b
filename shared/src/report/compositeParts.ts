/**
 * What every report shows for a species made of parts (a salt's ions, a hydrate's parts, the
 * ligands of a hydroxo ion): one wording, shared by the card, the hover, the JSON and the table.
 */
import { partShapeText } from "../chemistry/analysis/partShapes";
import type { LatticeSite, ProblemCode, SpeciesAnalysis, SpeciesPart } from "../chemistry/types";

/** How a kind of composite species is named, and what its parts are called. */
export interface CompositeKind {
  readonly noun: string;
  readonly partsLabel: string;
}

/** The kind of species, from the code its analysis carries. */
export function compositeKind(code: ProblemCode): CompositeKind {
  switch (code) {
    case "ionic-solid":
      return { noun: "ionic compound", partsLabel: "Ions" };
    case "ions-in-solution":
      return { noun: "ions in solution", partsLabel: "Ions" };
    case "hydrate":
      return { noun: "hydrate", partsLabel: "Parts" };
    case "adduct":
      return { noun: "adduct", partsLabel: "Parts" };
    case "metal-ion-complex":
      return { noun: "metal ion with ligands", partsLabel: "Parts" };
    default:
      return { noun: "made of parts", partsLabel: "Parts" };
  }
}

const ROLE_WORDS: Readonly<Record<SpeciesPart["role"], string>> = {
  cation: "cation",
  anion: "anion",
  "metal-ion": "metal ion",
  ligand: "ligand",
  compound: "compound",
  water: "water of crystallisation",
};

/** "NH4^+ ×2 (cation): tetrahedral". */
export function partLabel(part: SpeciesPart): string {
  return `${part.formula} ×${part.count} (${ROLE_WORDS[part.role]}): ${partShapeText(part)}`;
}

/** The role in words: "cation", "water of crystallisation". */
export function roleWords(part: SpeciesPart): string {
  return ROLE_WORDS[part.role];
}

/** The parts of a part: the ions of the salt in a hydrate; none for a plain ion or molecule. */
export function innerParts(part: SpeciesPart): readonly SpeciesPart[] {
  return part.analysis && !part.analysis.ok ? (part.analysis.parts ?? []) : [];
}

/** Every polyatomic part that was analysed, parts of parts included, each formula once. */
export function distinctAnalysedParts(parts: readonly SpeciesPart[]): SpeciesAnalysis[] {
  const seen = new Set<string>();
  const found: SpeciesAnalysis[] = [];
  for (const part of leafParts(parts)) {
    const result = part.analysis;
    if (!result?.ok || seen.has(result.value.reading.formula)) continue;
    seen.add(result.value.reading.formula);
    found.push(result.value);
  }
  return found;
}

/** The parts with any part that is itself made of parts (the salt of a hydrate) replaced by those. */
export function leafParts(parts: readonly SpeciesPart[]): SpeciesPart[] {
  const leaves: SpeciesPart[] = [];
  for (const part of parts) {
    const inner = part.analysis && !part.analysis.ok ? part.analysis.parts : undefined;
    if (inner) leaves.push(...leafParts(inner).map((leaf) => ({ ...leaf, count: leaf.count * part.count })));
    else leaves.push(part);
  }
  return leaves;
}

/** What every report calls a network solid (SiO2, GaAs), which has atoms' surroundings, not parts. */
export const NETWORK_SOLID_NOUN = "network solid";

/** "Si: tetrahedral, bonded to 4 O". */
export function latticeSiteLabel(site: LatticeSite): string {
  return `${site.symbol}: ${site.geometry}, bonded to ${site.neighbourCount} ${site.neighbour}`;
}
