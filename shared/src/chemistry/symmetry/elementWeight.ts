/**
 * Weights for the centre and the inertia tensor of a molecule in symmetry analysis. Only one
 * property matters there: every atom of an element gets the same weight. Atomic numbers give
 * that and need no table of masses.
 */

// Symbols in order of atomic number, 1-118.
const SYMBOLS_BY_ATOMIC_NUMBER = (
  "H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr " +
  "Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm " +
  "Yb Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No " +
  "Lr Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og"
).split(" ");

const ATOMIC_NUMBER = new Map(SYMBOLS_BY_ATOMIC_NUMBER.map((symbol, index) => [symbol, index + 1]));

/**
 * Writes an element label the way the periodic table does ("cl" and "CL" become "Cl"), so that
 * atoms labelled in different cases still count as the same element.
 */
export function normalizeElementLabel(label: string): string {
  const trimmed = label.trim();
  return trimmed.charAt(0).toUpperCase() + trimmed.slice(1).toLowerCase();
}

/**
 * Atomic number of a (normalised) element label; deuterium and tritium count as hydrogen, and an
 * unknown label (a dummy atom, a ghost) gets 1 so it still has a consistent weight.
 */
export function elementWeight(label: string): number {
  if (label === "D" || label === "T") return 1;
  return ATOMIC_NUMBER.get(label) ?? 1;
}
