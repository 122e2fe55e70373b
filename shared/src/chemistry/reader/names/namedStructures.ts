/**
 * Names of lab chemicals and solvents whose connectivity a molecular formula does not show (rings,
 * several groups on one carbon, isomers), each with the SMILES of the structure the name means.
 * Where chemists also write a condensed formula, it is kept: it is what the species shows as its
 * formula, and how a written formula ("C6H5CH3") finds its name.
 */
export interface NamedStructure {
  /** Lower case, single-spaced. */
  readonly name: string;
  /** The structure the name stands for. */
  readonly smiles: string;
  /** A condensed formula the formula reader reads, where one is usual. */
  readonly formula?: string;
}

// Preferred name first where two names share a structure: the first is the one shown for a formula.
const ROWS: readonly (readonly [name: string, smiles: string, formula?: string])[] = [
  // aromatic rings
  ["benzene", "c1ccccc1", "C6H6"],
  ["toluene", "Cc1ccccc1", "C6H5CH3"],
  ["phenol", "Oc1ccccc1", "C6H5OH"],
  ["aniline", "Nc1ccccc1", "C6H5NH2"],
  ["benzoic acid", "OC(=O)c1ccccc1", "C6H5COOH"],
  ["benzaldehyde", "O=Cc1ccccc1", "C6H5CHO"],
  ["nitrobenzene", "O=[N+]([O-])c1ccccc1", "C6H5NO2"],
  ["anisole", "COc1ccccc1", "C6H5OCH3"],
  ["styrene", "C=Cc1ccccc1", "C6H5CH=CH2"],
  ["naphthalene", "c1ccc2ccccc2c1"],
  ["pyridine", "c1ccncc1", "C5H5N"],
  ["salicylic acid", "OC(=O)c1ccccc1O"],
  ["acetylsalicylic acid", "CC(=O)Oc1ccccc1C(O)=O"],
  ["phenolphthalein", "O=C1OC(c2ccccc12)(c1ccc(O)cc1)c1ccc(O)cc1"],
  ["caffeine", "Cn1cnc2c1c(=O)n(C)c(=O)n2C"],
  // saturated rings
  ["cyclohexane", "C1CCCCC1", "C6H12"],
  ["tetrahydrofuran", "C1CCOC1"],
  ["dioxane", "C1COCCO1"],
  // sugars and acids of the bench
  ["glucose", "OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O"],
  ["sucrose", "OC[C@H]1O[C@@](CO)(O[C@H]2O[C@H](CO)[C@@H](O)[C@H](O)[C@H]2O)[C@@H](O)[C@@H]1O"],
  ["citric acid", "OC(=O)CC(O)(CC(O)=O)C(O)=O"],
  ["ascorbic acid", "OC[C@H](O)[C@H]1OC(=O)C(O)=C1O"],
  ["tartaric acid", "OC(C(O)C(O)=O)C(O)=O"],
  ["oxalic acid", "OC(=O)C(O)=O", "HOOCCOOH"],
  ["lactic acid", "CC(O)C(O)=O", "CH3CH(OH)COOH"],
  ["trifluoroacetic acid", "OC(=O)C(F)(F)F", "CF3COOH"],
  ["trichloroacetic acid", "OC(=O)C(Cl)(Cl)Cl", "CCl3COOH"],
  ["acetic anhydride", "CC(=O)OC(C)=O", "CH3COOCOCH3"],
  ["acetyl chloride", "CC(Cl)=O", "CH3COCl"],
  ["ethylenediaminetetraacetic acid", "OC(=O)CN(CC(O)=O)CCN(CC(O)=O)CC(O)=O"],
  ["alanine", "CC(N)C(O)=O", "CH3CH(NH2)COOH"],
  ["malonic acid", "OC(=O)CC(O)=O", "HOOCCH2COOH"],
  ["succinic acid", "OC(=O)CCC(O)=O", "HOOCCH2CH2COOH"],
  ["malic acid", "OC(=O)CC(O)C(O)=O"],
  ["salicylate", "Oc1ccccc1C(=O)[O-]"],
  // indicators and titration standards, as the salts sold
  ["methyl orange", "CN(C)c1ccc(cc1)N=Nc1ccc(cc1)S(=O)(=O)[O-].[Na+]"],
  ["potassium hydrogen phthalate", "OC(=O)c1ccccc1C(=O)[O-].[K+]"],
  // alcohols, ethers, amines and amides of the solvent shelf
  ["glycerol", "OCC(O)CO", "HOCH2CH(OH)CH2OH"],
  ["ethylene glycol", "OCCO", "HOCH2CH2OH"],
  ["propylene glycol", "CC(O)CO", "CH3CH(OH)CH2OH"],
  ["isopropanol", "CC(C)O", "CH3CH(OH)CH3"],
  ["diethyl ether", "CCOCC", "CH3CH2OCH2CH3"],
  ["methyl tert-butyl ether", "COC(C)(C)C", "CH3OC(CH3)3"],
  ["triethylamine", "CCN(CC)CC"],
  ["ethylenediamine", "NCCN", "H2NCH2CH2NH2"],
  ["ethanolamine", "NCCO", "H2NCH2CH2OH"],
  ["dimethylformamide", "CN(C)C=O", "HCON(CH3)2"],
  ["acetamide", "CC(N)=O", "CH3CONH2"],
  ["formamide", "NC=O", "HCONH2"],
  // branched alkanes known by their old names, and the usual solvent grade of hexane
  ["isobutane", "CC(C)C", "CH(CH3)3"],
  ["isopentane", "CCC(C)C"],
  ["neopentane", "CC(C)(C)C", "C(CH3)4"],
  ["isooctane", "CC(C)CC(C)(C)C"],
  ["hexanes", "CCCCCC"],
];

export const NAMED_STRUCTURES: readonly NamedStructure[] = ROWS.map(([name, smiles, formula]) =>
  formula === undefined ? { name, smiles } : { name, smiles, formula },
);
