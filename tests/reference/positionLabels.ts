/**
 * Matches an engine's free-text `between` label ("axial-equatorial", "apical-basal", ...) against
 * the kind of position pair a reference angle spans, allowing the usual synonyms.
 */
import type { PositionPair } from "./data/measuredAngles";

export type PositionKind = "axial" | "equatorial";

// Square-pyramid "apical" sits where the bipyramid's "axial" does; "basal" plays "equatorial".
const KIND_OF_WORD: Readonly<Record<string, PositionKind>> = {
  axial: "axial",
  ax: "axial",
  apical: "axial",
  apex: "axial",
  ap: "axial",
  equatorial: "equatorial",
  eq: "equatorial",
  basal: "equatorial",
  base: "equatorial",
  bas: "equatorial",
};

const KINDS_OF_PAIR: Readonly<Record<PositionPair, readonly PositionKind[]>> = {
  "axial-axial": ["axial", "axial"],
  "axial-equatorial": ["axial", "equatorial"],
  "equatorial-equatorial": ["equatorial", "equatorial"],
  "apical-basal": ["axial", "equatorial"],
};

/** The kind of position a word names ("apical" is axial), or undefined for other words. */
export function positionKindOfWord(word: string): PositionKind | undefined {
  return KIND_OF_WORD[word.toLowerCase()];
}

/** True when `label` names the same two kinds of position as `pair`, in either order. */
export function labelFitsPair(label: string | undefined, pair: PositionPair): boolean {
  if (label === undefined) return false;
  const kinds = label
    .toLowerCase()
    .split(/[^a-z]+/)
    .map((word) => KIND_OF_WORD[word])
    .filter((kind): kind is PositionKind => kind !== undefined)
    .sort();
  const wanted = [...KINDS_OF_PAIR[pair]].sort();
  return kinds.length === wanted.length && kinds.every((kind, i) => kind === wanted[i]);
}
