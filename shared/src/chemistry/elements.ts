/**
 * Element data for hydrogen to oganesson (Z = 1-118): every element lonepair reads in formulas.
 *
 * Electronegativities are Pauling values (Allred's 1961 revision as commonly tabulated); none is
 * tabulated from rutherfordium on, whose chemistry is known from a few atoms at a time.
 * Covalent radii are single-bond radii in picometres from the self-consistent set of
 * Pyykkö and Atsumi (2009), chosen because it is one set for every element, noble gases and
 * lanthanides included, and it is explicitly a single-bond set.
 */
import type { ElementCategory, ElementData } from "./types";

/** Hand-written row: symbol, IUPAC name, Z, group, period, Pauling electronegativity, covalent radius (pm). */
type ElementRow = readonly [string, string, number, number, number, number | null, number];

// prettier-ignore
const ROWS: readonly ElementRow[] = [
  ["H", "hydrogen", 1, 1, 1, 2.2, 32],
  ["He", "helium", 2, 18, 1, null, 46],
  ["Li", "lithium", 3, 1, 2, 0.98, 133],
  ["Be", "beryllium", 4, 2, 2, 1.57, 102],
  ["B", "boron", 5, 13, 2, 2.04, 85],
  ["C", "carbon", 6, 14, 2, 2.55, 75],
  ["N", "nitrogen", 7, 15, 2, 3.04, 71],
  ["O", "oxygen", 8, 16, 2, 3.44, 63],
  ["F", "fluorine", 9, 17, 2, 3.98, 64],
  ["Ne", "neon", 10, 18, 2, null, 67],
  ["Na", "sodium", 11, 1, 3, 0.93, 155],
  ["Mg", "magnesium", 12, 2, 3, 1.31, 139],
  ["Al", "aluminium", 13, 13, 3, 1.61, 126],
  ["Si", "silicon", 14, 14, 3, 1.9, 116],
  ["P", "phosphorus", 15, 15, 3, 2.19, 111],
  ["S", "sulfur", 16, 16, 3, 2.58, 103],
  ["Cl", "chlorine", 17, 17, 3, 3.16, 99],
  ["Ar", "argon", 18, 18, 3, null, 96],
  ["K", "potassium", 19, 1, 4, 0.82, 196],
  ["Ca", "calcium", 20, 2, 4, 1.0, 171],
  ["Sc", "scandium", 21, 3, 4, 1.36, 148],
  ["Ti", "titanium", 22, 4, 4, 1.54, 136],
  ["V", "vanadium", 23, 5, 4, 1.63, 134],
  ["Cr", "chromium", 24, 6, 4, 1.66, 122],
  ["Mn", "manganese", 25, 7, 4, 1.55, 119],
  ["Fe", "iron", 26, 8, 4, 1.83, 116],
  ["Co", "cobalt", 27, 9, 4, 1.88, 111],
  ["Ni", "nickel", 28, 10, 4, 1.91, 110],
  ["Cu", "copper", 29, 11, 4, 1.9, 112],
  ["Zn", "zinc", 30, 12, 4, 1.65, 118],
  ["Ga", "gallium", 31, 13, 4, 1.81, 124],
  ["Ge", "germanium", 32, 14, 4, 2.01, 121],
  ["As", "arsenic", 33, 15, 4, 2.18, 121],
  ["Se", "selenium", 34, 16, 4, 2.55, 116],
  ["Br", "bromine", 35, 17, 4, 2.96, 114],
  ["Kr", "krypton", 36, 18, 4, 3.0, 117],
  ["Rb", "rubidium", 37, 1, 5, 0.82, 210],
  ["Sr", "strontium", 38, 2, 5, 0.95, 185],
  ["Y", "yttrium", 39, 3, 5, 1.22, 163],
  ["Zr", "zirconium", 40, 4, 5, 1.33, 154],
  ["Nb", "niobium", 41, 5, 5, 1.6, 147],
  ["Mo", "molybdenum", 42, 6, 5, 2.16, 138],
  ["Tc", "technetium", 43, 7, 5, 1.9, 128],
  ["Ru", "ruthenium", 44, 8, 5, 2.2, 125],
  ["Rh", "rhodium", 45, 9, 5, 2.28, 125],
  ["Pd", "palladium", 46, 10, 5, 2.2, 120],
  ["Ag", "silver", 47, 11, 5, 1.93, 128],
  ["Cd", "cadmium", 48, 12, 5, 1.69, 136],
  ["In", "indium", 49, 13, 5, 1.78, 142],
  ["Sn", "tin", 50, 14, 5, 1.96, 140],
  ["Sb", "antimony", 51, 15, 5, 2.05, 140],
  ["Te", "tellurium", 52, 16, 5, 2.1, 136],
  ["I", "iodine", 53, 17, 5, 2.66, 133],
  ["Xe", "xenon", 54, 18, 5, 2.6, 131],
  ["Cs", "caesium", 55, 1, 6, 0.79, 232],
  ["Ba", "barium", 56, 2, 6, 0.89, 196],
  ["La", "lanthanum", 57, 3, 6, 1.1, 180],
  ["Ce", "cerium", 58, 3, 6, 1.12, 163],
  ["Pr", "praseodymium", 59, 3, 6, 1.13, 176],
  ["Nd", "neodymium", 60, 3, 6, 1.14, 174],
  ["Pm", "promethium", 61, 3, 6, 1.13, 173],
  ["Sm", "samarium", 62, 3, 6, 1.17, 172],
  ["Eu", "europium", 63, 3, 6, 1.2, 168],
  ["Gd", "gadolinium", 64, 3, 6, 1.2, 169],
  ["Tb", "terbium", 65, 3, 6, 1.1, 168],
  ["Dy", "dysprosium", 66, 3, 6, 1.22, 167],
  ["Ho", "holmium", 67, 3, 6, 1.23, 166],
  ["Er", "erbium", 68, 3, 6, 1.24, 165],
  ["Tm", "thulium", 69, 3, 6, 1.25, 164],
  ["Yb", "ytterbium", 70, 3, 6, 1.1, 170],
  ["Lu", "lutetium", 71, 3, 6, 1.27, 162],
  ["Hf", "hafnium", 72, 4, 6, 1.3, 152],
  ["Ta", "tantalum", 73, 5, 6, 1.5, 146],
  ["W", "tungsten", 74, 6, 6, 2.36, 137],
  ["Re", "rhenium", 75, 7, 6, 1.9, 131],
  ["Os", "osmium", 76, 8, 6, 2.2, 129],
  ["Ir", "iridium", 77, 9, 6, 2.2, 122],
  ["Pt", "platinum", 78, 10, 6, 2.28, 123],
  ["Au", "gold", 79, 11, 6, 2.54, 124],
  ["Hg", "mercury", 80, 12, 6, 2.0, 133],
  ["Tl", "thallium", 81, 13, 6, 1.62, 144],
  // Pb: 2.33 is the Pauling value usually tabulated (for Pb(IV)); Pb(II) compounds behave nearer 1.87.
  ["Pb", "lead", 82, 14, 6, 2.33, 144],
  ["Bi", "bismuth", 83, 15, 6, 2.02, 151],
  ["Po", "polonium", 84, 16, 6, 2.0, 145],
  ["At", "astatine", 85, 17, 6, 2.2, 147],
  ["Rn", "radon", 86, 18, 6, 2.2, 142],
  ["Fr", "francium", 87, 1, 7, 0.7, 223],
  ["Ra", "radium", 88, 2, 7, 0.9, 201],
  ["Ac", "actinium", 89, 3, 7, 1.1, 186],
  ["Th", "thorium", 90, 3, 7, 1.3, 175],
  ["Pa", "protactinium", 91, 3, 7, 1.5, 169],
  ["U", "uranium", 92, 3, 7, 1.38, 170],
  ["Np", "neptunium", 93, 3, 7, 1.36, 171],
  ["Pu", "plutonium", 94, 3, 7, 1.28, 172],
  ["Am", "americium", 95, 3, 7, 1.13, 166],
  ["Cm", "curium", 96, 3, 7, 1.28, 166],
  ["Bk", "berkelium", 97, 3, 7, 1.3, 168],
  ["Cf", "californium", 98, 3, 7, 1.3, 168],
  ["Es", "einsteinium", 99, 3, 7, 1.3, 165],
  ["Fm", "fermium", 100, 3, 7, 1.3, 167],
  ["Md", "mendelevium", 101, 3, 7, 1.3, 173],
  ["No", "nobelium", 102, 3, 7, 1.3, 176],
  ["Lr", "lawrencium", 103, 3, 7, 1.3, 161],
  ["Rf", "rutherfordium", 104, 4, 7, null, 157],
  ["Db", "dubnium", 105, 5, 7, null, 149],
  ["Sg", "seaborgium", 106, 6, 7, null, 143],
  ["Bh", "bohrium", 107, 7, 7, null, 141],
  ["Hs", "hassium", 108, 8, 7, null, 134],
  ["Mt", "meitnerium", 109, 9, 7, null, 129],
  ["Ds", "darmstadtium", 110, 10, 7, null, 128],
  ["Rg", "roentgenium", 111, 11, 7, null, 121],
  ["Cn", "copernicium", 112, 12, 7, null, 122],
  ["Nh", "nihonium", 113, 13, 7, null, 136],
  ["Fl", "flerovium", 114, 14, 7, null, 143],
  ["Mc", "moscovium", 115, 15, 7, null, 162],
  ["Lv", "livermorium", 116, 16, 7, null, 175],
  ["Ts", "tennessine", 117, 17, 7, null, 165],
  ["Og", "oganesson", 118, 18, 7, null, 157],
];

const FIRST_LANTHANIDE = 57;
const LAST_LANTHANIDE = 71;
const FIRST_ACTINIDE = 89;
const LAST_ACTINIDE = 103;
/** Rutherfordium on: made a few atoms at a time, with no bulk chemistry to check a model against. */
export const FIRST_SUPERHEAVY = 104;

function isLanthanideNumber(atomicNumber: number): boolean {
  return atomicNumber >= FIRST_LANTHANIDE && atomicNumber <= LAST_LANTHANIDE;
}

function isActinideNumber(atomicNumber: number): boolean {
  return atomicNumber >= FIRST_ACTINIDE && atomicNumber <= LAST_ACTINIDE;
}

function categoryOf(atomicNumber: number, group: number): ElementCategory {
  if (isLanthanideNumber(atomicNumber)) return "lanthanide";
  if (isActinideNumber(atomicNumber)) return "actinide";
  if (group === 18) return "noble-gas";
  if (group >= 3 && group <= 11) return "transition-metal";
  // Group 12 counts as main-group: Zn, Cd and Hg keep a full d10 shell, so VSEPR treats
  // ZnCl2 and HgCl2 as two-domain linear species built from the s electrons alone.
  return "main-group";
}

/**
 * Main groups follow the s + p count used for Lewis structures (helium has its 2 s electrons).
 * Groups 3-11 carry the group number, i.e. ns + (n-1)d electrons; lanthanides and actinides carry
 * 3, the electrons given up in the +3 state (the actinides' own range runs from +2 to +7). Neither d- nor f-block counts is ever used to
 * build a Lewis structure.
 */
function valenceElectronsOf(atomicNumber: number, group: number): number {
  if (atomicNumber === 2) return 2;
  if (isLanthanideNumber(atomicNumber) || isActinideNumber(atomicNumber)) return 3;
  if (group === 12) return 2;
  if (group >= 13) return group - 10;
  return group;
}

/** Every element from hydrogen (Z = 1) to oganesson (Z = 118), in order of atomic number. */
export const ELEMENTS: readonly ElementData[] = Object.freeze(
  ROWS.map(([symbol, name, atomicNumber, group, period, electronegativity, covalentRadius]) =>
    Object.freeze({
      symbol,
      name,
      atomicNumber,
      group,
      period,
      valenceElectrons: valenceElectronsOf(atomicNumber, group),
      electronegativity,
      covalentRadius,
      category: categoryOf(atomicNumber, group),
    }),
  ),
);

const BY_SYMBOL: ReadonlyMap<string, ElementData> = new Map(ELEMENTS.map((el) => [el.symbol, el]));

// Spellings other than the IUPAC ones that writers commonly use.
const NAME_VARIANTS: Readonly<Record<string, string>> = {
  sulphur: "sulfur",
  aluminum: "aluminium",
  cesium: "caesium",
};

const BY_NAME: ReadonlyMap<string, ElementData> = buildNameIndex();

function buildNameIndex(): Map<string, ElementData> {
  const index = new Map(ELEMENTS.map((el) => [el.name, el] as const));
  for (const [variant, iupacName] of Object.entries(NAME_VARIANTS)) {
    const element = index.get(iupacName);
    if (element) index.set(variant, element);
  }
  return index;
}

/** The element with this exact, case-sensitive symbol ("Cl", not "CL"), or undefined. */
export function elementBySymbol(symbol: string): ElementData | undefined {
  return BY_SYMBOL.get(symbol);
}

/**
 * The element with this English name, ignoring case; accepts the IUPAC spellings and the
 * common variants "sulphur", "aluminum" and "cesium". Undefined for anything else.
 */
export function elementByName(name: string): ElementData | undefined {
  return BY_NAME.get(name.toLowerCase());
}

/** True for the d-block metals of groups 3-11 (group 12, the lanthanides and actinides excluded). */
export function isTransitionMetal(element: ElementData): boolean {
  return element.category === "transition-metal";
}
