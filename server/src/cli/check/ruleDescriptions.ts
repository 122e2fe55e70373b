/**
 * One plain sentence per finding code, for the rules of a SARIF log. Codes not listed here get
 * a sentence made from the code itself, so a new check in the core never breaks the log.
 */

const DESCRIPTIONS: Readonly<Record<string, string>> = {
  "empty-input": "A species cell or mention is empty.",
  "unknown-element": "A formula uses a symbol that is not a chemical element.",
  "unbalanced-brackets": "A formula has brackets that do not pair up.",
  "malformed-formula": "Text in a species position cannot be read as a formula.",
  "unknown-name": "A species name is not one lonepair knows.",
  "input-too-long": "A species is too long to analyse.",
  "oxidation-state": "An element in an oxidation state, such as S(VI): shared by many species, so no one shape.",
  "too-few-electrons": "A species has too few valence electrons for any Lewis structure.",
  "octet-exceeded": "A period-2 atom would need more than an octet.",
  "hydrogen-overbonded": "A hydrogen atom would need more than one bond.",
  "transition-metal-centre": "A transition-metal centre: VSEPR does not predict its shape.",
  "ionic-solid": "An ionic solid: it has no molecular shape; its polyatomic ions are analysed one by one.",
  "ions-in-solution": "Ions in solution, such as an acid of a complex anion: no molecular shape; its polyatomic ions are analysed.",
  "metallic-element": "A lone metal symbol: the element as a metallic solid, with no molecular shape.",
  hydrate: "A hydrate: a salt or molecule with water of crystallisation; each part is analysed on its own.",
  adduct: "An adduct written with a dot: each part is analysed as a free species.",
  "network-solid": "A network solid: one covalent lattice with no molecules, so no molecular shape.",
  "metal-ion-complex": "A hydroxo or aqua ion: a metal ion holding hydroxide or water; its ligands are analysed.",
  "f-block-centre": "A lanthanide or actinide centre: VSEPR does not predict its shape.",
  "superheavy-element": "A superheavy element (Z 104 and up): too little known chemistry for a VSEPR shape.",
  "three-centre-bonding": "Bonds shared by three atoms (a borane's B-H-B bridges): no Lewis structure or VSEPR shape.",
  "ambiguous-connectivity": "The formula allows several skeletons; SMILES would settle it.",
  "no-central-atom": "No central atom can be chosen for this species.",
  "no-valid-structure": "No valid Lewis structure was found for this species.",
  radical: "An odd number of valence electrons: the species is a radical.",
  "csv-quote": "A quoted CSV field is not closed or has text after its closing quote.",
  "json-syntax": "The JSON document has a syntax error.",
  "yaml-syntax": "The YAML document has a syntax error.",
  "document-unreadable": "The document could not be read.",
  "table-valence-electrons": "A table's valence-electron count disagrees with the model.",
  "table-lone-pairs": "A table's lone-pair count disagrees with the model.",
  "table-lone-pairs-mismatch": "A table's lone-pair count disagrees with the model.",
  "table-axe": "A table's AXE class disagrees with the model.",
  "table-electron-geometry": "A table's electron geometry disagrees with the model.",
  "table-molecular-geometry": "A table's molecular geometry disagrees with the model.",
  "table-bond-angle": "A table's bond angle is far from the model's range.",
  "table-hybridization": "A table's hybridization disagrees with the model.",
  "table-polarity": "A table's polarity disagrees with the model.",
  "table-ir-bands": "A table's count of IR bands disagrees with the symmetry prediction.",
  "table-raman-bands": "A table's count of Raman bands disagrees with the symmetry prediction.",
  "table-ir-active-modes": "A table's count of IR-active modes disagrees with the symmetry prediction.",
  "equation-unbalanced": "An equation does not conserve every element and the charge; the fix rewrites its coefficients.",
  "equation-balance-not-unique": "An unbalanced equation that balances in more than one independent way: no single fix.",
  "equation-cannot-balance": "An equation that no positive coefficients balance: an element or the charge cannot match.",
  "table-name-formula": "A record's name and its formula name different species; change one or the other.",
  "table-vibrational-modes": "A table's count of vibrational modes is not 3N - 6 (3N - 5 if linear).",
};

/** The sentence for `code`. */
export function ruleDescription(code: string): string {
  const known = DESCRIPTIONS[code];
  if (known) return known;
  const words = code.replace(/-/g, " ");
  return `${words.charAt(0).toUpperCase()}${words.slice(1)}.`;
}
