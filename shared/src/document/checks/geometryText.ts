/**
 * Geometry names as tables write them ("Trigonal-Pyramidal", "see-saw", "T shaped",
 * "tetrahedron", "V-shaped"), reduced to the names the core uses for comparison.
 */

const SYNONYMS: Readonly<Record<string, string>> = {
  "see saw": "seesaw",
  sawhorse: "seesaw",
  disphenoidal: "seesaw",
  "t shaped": "t-shaped",
  "t shape": "t-shaped",
  t: "t-shaped",
  tetrahedron: "tetrahedral",
  octahedron: "octahedral",
  "trigonal bipyramid": "trigonal bipyramidal",
  "triangular bipyramidal": "trigonal bipyramidal",
  "trigonal pyramid": "trigonal pyramidal",
  pyramidal: "trigonal pyramidal",
  "square pyramid": "square pyramidal",
  "pentagonal bipyramid": "pentagonal bipyramidal",
  "pentagonal pyramid": "pentagonal pyramidal",
  angular: "bent",
  "v shaped": "bent",
  "v shape": "bent",
  "bent angular": "bent",
  "non linear": "bent",
  nonlinear: "bent",
  "triangular planar": "trigonal planar",
  "planar triangular": "trigonal planar",
  "trigonal plane": "trigonal planar",
  trigonal: "trigonal planar",
};

/** Cells that say "no value" rather than a wrong one. */
const NO_VALUE = /^(?:|n\/?a|none|unknown|tbd|tbc|\?+|-+|\u2014|\u2013|not applicable)$/;

/** The cell's geometry in the core's spelling (lower case), or undefined when it states none. */
export function normalizeGeometry(cell: string): string | undefined {
  const plain = cell
    .toLowerCase()
    .replace(/\([^)]*\)/g, " ")
    .trim();
  if (NO_VALUE.test(plain)) return undefined;
  const words = plain
    .replace(/[-_\u2010\u2011]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
  return SYNONYMS[words] ?? (words === "t shaped" ? "t-shaped" : words);
}

/** The core's geometry name in the same reduced spelling. */
export function computedGeometry(geometry: string): string {
  return geometry.toLowerCase();
}
