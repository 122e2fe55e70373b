// The cylinder store's export the table benchmarks read: mostly correct rows, one wrong valence
// electron count in every 997 (common practice: the counts and shapes of these gases).
const SPECIES = [
  ["sulfur hexafluoride", "SF6", 48, 0, "octahedral", "nonpolar"],
  ["nitrogen trifluoride", "NF3", 26, 1, "trigonal pyramidal", "polar"],
  ["chlorine trifluoride", "ClF3", 28, 2, "T-shaped", "polar"],
  ["boron trifluoride", "BF3", 24, 0, "trigonal planar", "nonpolar"],
  ["ammonia", "NH3", 8, 1, "trigonal pyramidal", "polar"],
  ["carbon dioxide", "CO2", 16, 0, "linear", "nonpolar"],
  ["sulfur dioxide", "SO2", 18, 1, "bent", "polar"],
  ["xenon tetrafluoride", "XeF4", 36, 2, "square planar", "nonpolar"],
];

/** The header line, without its line break. */
export const CYLINDER_HEADER = "id,species,formula,valence electrons,lone pairs on central atom,molecular geometry,polarity,supplier lot";

/** Whether row `index` is one of the seeded mistakes. */
export function isSeededMistake(index) {
  return index % 997 === 5;
}

/** Row `index` without its line break; `wrong` lowers its electron count by two. */
export function cylinderRow(index, wrong = isSeededMistake(index)) {
  const [name, formula, electrons, lonePairs, shape, polarity] = SPECIES[index % SPECIES.length];
  return `CYL-${index},${name},${formula},${wrong ? electrons - 2 : electrons},${lonePairs},${shape},${polarity},KR-${String(index % 9000).padStart(4, "0")}`;
}
