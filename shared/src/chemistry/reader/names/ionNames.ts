/**
 * Names of common polyatomic ions with their formula and charge. The formula is read by the
 * formula reader like anything a person types, so a typo here fails the name tests.
 */
export interface IonName {
  readonly name: string;
  /** Formula of the ion without its charge. */
  readonly body: string;
  readonly charge: number;
}

// Preferred name first where two names share a formula: the first is the one shown for the formula.
const ROWS: readonly (readonly [string, string, number])[] = [
  ["ammonium", "NH4", 1],
  ["hydronium", "H3O", 1],
  ["oxonium", "H3O", 1],
  ["nitronium", "NO2", 1],
  ["nitrosonium", "NO", 1],
  ["phosphonium", "PH4", 1],
  ["vanadyl", "VO", 2],
  ["uranyl", "UO2", 2],
  ["hydroxide", "OH", -1],
  ["cyanide", "CN", -1],
  ["cyanate", "OCN", -1],
  ["thiocyanate", "SCN", -1],
  ["azide", "N3", -1],
  ["triiodide", "I3", -1],
  ["amide", "NH2", -1],
  ["nitrate", "NO3", -1],
  ["nitrite", "NO2", -1],
  ["sulfate", "SO4", -2],
  ["sulphate", "SO4", -2],
  ["sulfite", "SO3", -2],
  ["sulphite", "SO3", -2],
  ["hydrogen sulfate", "HSO4", -1],
  ["hydrogensulfate", "HSO4", -1],
  ["bisulfate", "HSO4", -1],
  ["hydrogen sulfite", "HSO3", -1],
  ["hydrogensulfite", "HSO3", -1],
  ["bisulfite", "HSO3", -1],
  ["thiosulfate", "S2O3", -2],
  ["perchlorate", "ClO4", -1],
  ["chlorate", "ClO3", -1],
  ["chlorite", "ClO2", -1],
  ["hypochlorite", "ClO", -1],
  ["perbromate", "BrO4", -1],
  ["bromate", "BrO3", -1],
  ["bromite", "BrO2", -1],
  ["hypobromite", "BrO", -1],
  ["periodate", "IO4", -1],
  ["iodate", "IO3", -1],
  ["hypoiodite", "IO", -1],
  ["phosphate", "PO4", -3],
  ["hydrogen phosphate", "HPO4", -2],
  ["hydrogenphosphate", "HPO4", -2],
  ["dihydrogen phosphate", "H2PO4", -1],
  ["dihydrogenphosphate", "H2PO4", -1],
  ["carbonate", "CO3", -2],
  ["hydrogen carbonate", "HCO3", -1],
  ["hydrogencarbonate", "HCO3", -1],
  ["bicarbonate", "HCO3", -1],
  ["acetate", "CH3COO", -1],
  ["formate", "HCOO", -1],
  ["oxalate", "C2O4", -2],
  ["peroxide", "O2", -2],
  ["superoxide", "O2", -1],
  ["acetylide", "C2", -2],
  ["borate", "BO3", -3],
  ["tetrafluoroborate", "BF4", -1],
  ["tetrahydroborate", "BH4", -1],
  ["borohydride", "BH4", -1],
  ["tetrahydroaluminate", "AlH4", -1],
  ["hexafluorophosphate", "PF6", -1],
  ["hexafluorosilicate", "SiF6", -2],
  ["hexafluoroantimonate", "SbF6", -1],
  ["tetrachloroaluminate", "AlCl4", -1],
  ["tetrachloroiodate", "ICl4", -1],
  ["arsenate", "AsO4", -3],
  ["selenate", "SeO4", -2],
  ["silicate", "SiO3", -2],
  ["metasilicate", "SiO3", -2],
  ["orthosilicate", "SiO4", -4],
  ["metaborate", "BO2", -1],
  ["permanganate", "MnO4", -1],
  ["manganate", "MnO4", -2],
  ["chromate", "CrO4", -2],
  ["dichromate", "Cr2O7", -2],
  ["hydrogensulfide", "HS", -1],
  ["bisulfide", "HS", -1],
  ["disulfide", "S2", -2],
  ["metabisulfite", "S2O5", -2],
  ["disulfite", "S2O5", -2],
  ["peroxodisulfate", "S2O8", -2],
  ["persulfate", "S2O8", -2],
  ["pyrophosphate", "P2O7", -4],
  ["dithionate", "S2O6", -2],
  ["dithionite", "S2O4", -2],
  ["tetrathionate", "S4O6", -2],
  ["tetraborate", "B4O7", -2],
  ["tetrahydroxoaluminate", "Al(OH)4", -1],
  ["molybdate", "MoO4", -2],
  ["heptamolybdate", "Mo7O24", -6],
  ["tungstate", "WO4", -2],
  ["metavanadate", "VO3", -1],
  ["vanadate", "VO4", -3],
  ["hexacyanoferrate(iii)", "Fe(CN)6", -3],
  ["ferricyanide", "Fe(CN)6", -3],
  ["hexacyanoferrate(ii)", "Fe(CN)6", -4],
  ["ferrocyanide", "Fe(CN)6", -4],
];

export const ION_NAMES: readonly IonName[] = ROWS.map(([name, body, charge]) => ({ name, body, charge }));

const BY_NAME = new Map(ION_NAMES.map((ion) => [ion.name, ion]));

/** The ion with this lower-case, single-spaced name. */
export function ionByName(name: string): IonName | undefined {
  return BY_NAME.get(name);
}
