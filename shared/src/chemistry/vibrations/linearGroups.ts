/**
 * Linear molecules: C∞v and D∞h have infinitely many operations, so the counting is done in a
 * finite subgroup with z along the molecular axis (C2v for C∞v, D2h for D∞h) and the result is
 * carried back by correlation. For the vibrations of a linear molecule only Σ and Π occur.
 */

/** A symmetry species of a linear group with its activity. */
export interface LinearSpecies {
  readonly label: string;
  readonly degeneracy: number;
  readonly ir: boolean;
  readonly raman: boolean;
}

/** The finite subgroup a linear group is counted in. */
export function linearSubgroup(group: string): "C2v" | "D2h" | undefined {
  if (group === "C∞v") return "C2v";
  if (group === "D∞h") return "D2h";
  return undefined;
}

// from memory: the C∞v and D∞h character tables of chemical group theory texts: z spans Σ+
// (Σu+), (x, y) span Π (Πu); x²+y² and z² are Σ+ (Σg+), (xz, yz) Π (Πg), (x²−y², xy) Δ (Δg)
const SIGMA_PLUS: LinearSpecies = { label: "Σ+", degeneracy: 1, ir: true, raman: true };
const SIGMA_MINUS: LinearSpecies = { label: "Σ−", degeneracy: 1, ir: false, raman: false };
const PI: LinearSpecies = { label: "Π", degeneracy: 2, ir: true, raman: true };
const SIGMA_G_PLUS: LinearSpecies = { label: "Σg+", degeneracy: 1, ir: false, raman: true };
const SIGMA_G_MINUS: LinearSpecies = { label: "Σg−", degeneracy: 1, ir: false, raman: false };
const PI_G: LinearSpecies = { label: "Πg", degeneracy: 2, ir: false, raman: true };
const SIGMA_U_PLUS: LinearSpecies = { label: "Σu+", degeneracy: 1, ir: true, raman: false };
const SIGMA_U_MINUS: LinearSpecies = { label: "Σu−", degeneracy: 1, ir: false, raman: false };
const PI_U: LinearSpecies = { label: "Πu", degeneracy: 2, ir: true, raman: false };

/**
 * How subgroup species combine into the linear group's (z along the axis): a one-dimensional
 * species maps alone; the two halves of a Π map together.
 */
const CORRELATION: Readonly<Record<"C2v" | "D2h", readonly { readonly parts: readonly string[]; readonly species: LinearSpecies }[]>> = {
  C2v: [
    { parts: ["A1"], species: SIGMA_PLUS },
    { parts: ["A2"], species: SIGMA_MINUS },
    { parts: ["B1", "B2"], species: PI },
  ],
  D2h: [
    { parts: ["Ag"], species: SIGMA_G_PLUS },
    { parts: ["B1g"], species: SIGMA_G_MINUS },
    { parts: ["B2g", "B3g"], species: PI_G },
    { parts: ["B1u"], species: SIGMA_U_PLUS },
    { parts: ["Au"], species: SIGMA_U_MINUS },
    { parts: ["B2u", "B3u"], species: PI_U },
  ],
};

/**
 * Carries counts in the subgroup back to the linear group. Undefined when the halves of a Π do
 * not come in equal numbers (or a count is left over), which a linear molecule never gives.
 */
export function correlateToLinear(
  subgroup: "C2v" | "D2h",
  counts: ReadonlyMap<string, number>,
): { readonly species: LinearSpecies; readonly count: number }[] | undefined {
  const result: { species: LinearSpecies; count: number }[] = [];
  let used = 0;
  for (const { parts, species } of CORRELATION[subgroup]) {
    const values = parts.map((part) => counts.get(part) ?? 0);
    if (values.some((value) => value !== values[0])) return undefined;
    used += values.reduce((sum, value) => sum + value, 0);
    if (values[0] > 0) result.push({ species, count: values[0] });
  }
  const total = [...counts.values()].reduce((sum, value) => sum + value, 0);
  return used === total ? result : undefined;
}
