/**
 * Other names for species the vocabulary already knows: trade and household names, older
 * spellings, and the abbreviations of the solvent shelf. Each is read as the name it stands for,
 * which is also the name shown, so "table salt" never becomes the name of every NaCl.
 */

/** Lower-case, single-spaced other names -> the name they stand for. */
export const NAME_SYNONYMS: ReadonlyMap<string, string> = new Map([
  ["table salt", "sodium chloride"],
  ["baking soda", "sodium hydrogen carbonate"],
  ["washing soda", "sodium carbonate"],
  ["caustic soda", "sodium hydroxide"],
  ["caustic potash", "potassium hydroxide"],
  ["quicklime", "calcium oxide"],
  ["slaked lime", "calcium hydroxide"],
  ["milk of magnesia", "magnesium hydroxide"],
  ["epsom salt", "magnesium sulfate heptahydrate"],
  ["epsom salts", "magnesium sulfate heptahydrate"],
  ["silica", "silicon dioxide"],
  ["alumina", "aluminium oxide"],
  ["laughing gas", "nitrous oxide"],
  ["methylene chloride", "dichloromethane"],
  ["orthophosphoric acid", "phosphoric acid"],
  ["muriatic acid", "hydrochloric acid"],
  ["ethanoic acid", "acetic acid"],
  ["methanoic acid", "formic acid"],
  ["propanone", "acetone"],
  ["dimethyl ketone", "acetone"],
  ["ethanal", "acetaldehyde"],
  ["ethanenitrile", "acetonitrile"],
  ["methylbenzene", "toluene"],
  ["hydroxybenzene", "phenol"],
  ["aminobenzene", "aniline"],
  ["benzenamine", "aniline"],
  ["trichloromethane", "chloroform"],
  ["ether", "diethyl ether"],
  ["ethyl ether", "diethyl ether"],
  ["1,4-dioxane", "dioxane"],
  ["n,n-dimethylformamide", "dimethylformamide"],
  ["methyl sulfoxide", "dimethyl sulfoxide"],
  ["isopropyl alcohol", "isopropanol"],
  ["ethyl alcohol", "ethanol"],
  ["methyl alcohol", "methanol"],
  ["tert-butanol", "2-methylpropan-2-ol"],
  ["tert-butyl alcohol", "2-methylpropan-2-ol"],
  ["n-butanol", "butan-1-ol"],
  ["n-propanol", "propan-1-ol"],
  ["2-propanol", "isopropanol"],
  ["propan-2-ol", "isopropanol"],
  ["glycerin", "glycerol"],
  ["glycerine", "glycerol"],
  ["propane-1,2,3-triol", "glycerol"],
  ["ethane-1,2-diol", "ethylene glycol"],
  ["dextrose", "glucose"],
  ["aspirin", "acetylsalicylic acid"],
  ["edta", "ethylenediaminetetraacetic acid"],
  ["2-methylpropane", "isobutane"],
  ["2-methylbutane", "isopentane"],
  ["2,2-dimethylpropane", "neopentane"],
  ["2,2,4-trimethylpentane", "isooctane"],
]);

/**
 * Abbreviations chemists use for one compound only, read in exactly this case: "DCM" is
 * dichloromethane, "dcm" is nothing.
 */
export const LAB_ABBREVIATIONS: ReadonlyMap<string, string> = new Map([
  ["EtOH", "ethanol"],
  ["MeOH", "methanol"],
  ["DCM", "dichloromethane"],
  ["THF", "tetrahydrofuran"],
  ["DMSO", "dimethyl sulfoxide"],
  ["DMF", "dimethylformamide"],
  ["EtOAc", "ethyl acetate"],
  ["MeCN", "acetonitrile"],
  ["AcOH", "acetic acid"],
  ["Et2O", "diethyl ether"],
  ["EDTA", "ethylenediaminetetraacetic acid"],
]);
