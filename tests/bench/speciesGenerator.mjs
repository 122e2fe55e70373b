// Builds many distinct, chemically sensible species for the benchmark: a central atom with
// hydrogen, halogen and oxo ligands and a charge, kept only when simple electron counting
// gives a closed-shell structure the VSEPR model covers (steric number 2 to 6, octet kept
// on second-row centres).

/** Central atoms with their valence electrons and whether they may exceed an octet. */
const CENTRES = [
  ["B", 3, false],
  ["Al", 3, true],
  ["Ga", 3, true],
  ["C", 4, false],
  ["Si", 4, true],
  ["Ge", 4, true],
  ["Sn", 4, true],
  ["N", 5, false],
  ["P", 5, true],
  ["As", 5, true],
  ["Sb", 5, true],
  ["O", 6, false],
  ["S", 6, true],
  ["Se", 6, true],
  ["Te", 6, true],
  ["Cl", 7, true],
  ["Br", 7, true],
  ["I", 7, true],
  ["Kr", 8, true],
  ["Xe", 8, true],
];

/** Single-bonded ligands, in the order they are written after the centre. */
const SINGLE_LIGANDS = ["H", "F", "Cl", "Br", "I"];
const CHARGES = [0, 1, -1, 2, -2];

/** All ways to pick `count` ligands from `kinds`, as count vectors. */
function* multisets(kinds, count, start = 0, prefix = []) {
  if (start === kinds.length - 1) {
    yield [...prefix, count];
    return;
  }
  for (let take = count; take >= 0; take -= 1) {
    yield* multisets(kinds, count - take, start + 1, [...prefix, take]);
  }
}

function chargeSuffix(charge) {
  if (charge === 0) return "";
  const sign = charge > 0 ? "+" : "-";
  return Math.abs(charge) === 1 ? sign : `^${Math.abs(charge)}${sign}`;
}

function formulaText(centre, oxo, counts, charge) {
  let text = centre;
  SINGLE_LIGANDS.forEach((ligand, position) => {
    // Oxo ligands go before the halogens and after hydrogen, as chemists usually write them.
    if (ligand === "F" && oxo > 0) text += oxo === 1 ? "O" : `O${oxo}`;
    const count = counts[position];
    if (count > 0) text += count === 1 ? ligand : `${ligand}${count}`;
  });
  return text + chargeSuffix(charge);
}

/** Returns the steric number, or null when the counting gives no sensible structure. */
function stericNumber(valence, expands, singles, oxo, charge) {
  const used = singles + 2 * oxo;
  const left = valence - charge - used;
  if (left < 0 || left % 2 !== 0) return null;
  const lonePairs = left / 2;
  const domains = singles + oxo;
  const steric = domains + lonePairs;
  if (domains < 2 || steric > 6) return null;
  // Second-row centres keep an exact octet; only neutral boron may stay at six electrons.
  const shell = 2 * used + 2 * lonePairs;
  if (!expands && shell !== 8 && !(valence === 3 && charge === 0 && shell === 6)) return null;
  return steric;
}

/** Up to `limit` distinct species strings, in a fixed systematic order. */
export function generateSpecies(limit) {
  const seen = new Set();
  const species = [];
  for (const [centre, valence, expands] of CENTRES) {
    const ligands = SINGLE_LIGANDS.filter((ligand) => ligand !== centre);
    for (const charge of CHARGES) {
      for (let oxo = 0; oxo <= 3; oxo += 1) {
        if (centre === "O" && oxo > 0) continue;
        for (let singles = 0; singles <= 6; singles += 1) {
          for (const counts of multisets(SINGLE_LIGANDS, singles)) {
            // Skip ligands equal to the centre (ClCl2F): they blur which atom is central.
            if (counts.some((count, position) => count > 0 && !ligands.includes(SINGLE_LIGANDS[position]))) continue;
            // Hydrogen with oxo ligands would be read as hydroxo acids; keep those out.
            if (oxo > 0 && counts[0] > 0) continue;
            if (stericNumber(valence, expands, singles, oxo, charge) === null) continue;
            const text = formulaText(centre, oxo, counts, charge);
            if (seen.has(text)) continue;
            seen.add(text);
            species.push(text);
            if (species.length >= limit) return species;
          }
        }
      }
    }
  }
  return species;
}
