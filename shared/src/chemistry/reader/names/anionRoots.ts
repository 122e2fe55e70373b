/**
 * Names of monatomic anions ("-ide" names) used as the second word of binary names, with the
 * charge of the bare ion.
 */
export interface AnionRoot {
  readonly root: string;
  readonly symbol: string;
  readonly charge: number;
}

export const ANION_ROOTS: readonly AnionRoot[] = [
  { root: "fluoride", symbol: "F", charge: -1 },
  { root: "chloride", symbol: "Cl", charge: -1 },
  { root: "bromide", symbol: "Br", charge: -1 },
  { root: "iodide", symbol: "I", charge: -1 },
  { root: "oxide", symbol: "O", charge: -2 },
  { root: "sulfide", symbol: "S", charge: -2 },
  { root: "sulphide", symbol: "S", charge: -2 },
  { root: "selenide", symbol: "Se", charge: -2 },
  { root: "telluride", symbol: "Te", charge: -2 },
  { root: "nitride", symbol: "N", charge: -3 },
  { root: "phosphide", symbol: "P", charge: -3 },
  { root: "arsenide", symbol: "As", charge: -3 },
  { root: "hydride", symbol: "H", charge: -1 },
  { root: "carbide", symbol: "C", charge: -4 },
  { root: "silicide", symbol: "Si", charge: -4 },
  { root: "boride", symbol: "B", charge: -3 },
];

const BY_ROOT = new Map(ANION_ROOTS.map((entry) => [entry.root, entry]));
const BY_SYMBOL = new Map<string, AnionRoot>();
for (const entry of ANION_ROOTS) if (!BY_SYMBOL.has(entry.symbol)) BY_SYMBOL.set(entry.symbol, entry);

export function anionRootByName(root: string): AnionRoot | undefined {
  return BY_ROOT.get(root);
}

export function anionRootBySymbol(symbol: string): AnionRoot | undefined {
  return BY_SYMBOL.get(symbol);
}
