/**
 * A small reader for the names of simple organic compounds, built by rule rather than listed:
 * substitutive names on a chain of one to ten carbons ("propan-2-ol", "2-propanol",
 * "1,2-dichloroethane", "but-2-ene", "butan-2-one", "hexanal", "propanoic acid", "ethanamide",
 * "propanenitrile", "ethane-1,2-diol", "2-methylpropane", "cyclohexanol"), substituted benzenes
 * ("chlorobenzene", "1,4-dimethylbenzene") and functional-class names ("ethyl acetate", "methyl
 * propanoate", "diethyl ether", "isopropyl alcohol", "methyl chloride", "triethylamine"). The result
 * is a SMILES of the structure, which the SMILES analysis reads. A name that leaves the structure
 * open ("butene", "propanol", "dichloroethane") is no name here.
 */

// from memory: IUPAC recommendations for organic nomenclature, numerical chain roots C1-C10
const STEMS: readonly string[] = ["meth", "eth", "prop", "but", "pent", "hex", "hept", "oct", "non", "dec"];

const MULTIPLIERS: readonly (readonly [prefix: string, count: number])[] = [
  ["tetra", 4],
  ["penta", 5],
  ["hexa", 6],
  ["tri", 3],
  ["di", 2],
];

/** Alkyl groups as SMILES written from the atom that attaches. */
const ALKYL_GROUPS: ReadonlyMap<string, string> = new Map([
  ["methyl", "C"],
  ["ethyl", "CC"],
  ["propyl", "CCC"],
  ["n-propyl", "CCC"],
  ["isopropyl", "C(C)C"],
  ["butyl", "CCCC"],
  ["n-butyl", "CCCC"],
  ["isobutyl", "CC(C)C"],
  ["sec-butyl", "C(C)CC"],
  ["tert-butyl", "C(C)(C)C"],
  ["t-butyl", "C(C)(C)C"],
  ["pentyl", "CCCCC"],
  ["hexyl", "CCCCCC"],
  ["heptyl", "CCCCCCC"],
  ["octyl", "CCCCCCCC"],
  ["nonyl", "CCCCCCCCC"],
  ["decyl", "CCCCCCCCCC"],
  ["amyl", "CCCCC"],
  ["isoamyl", "CCC(C)C"],
  ["isopentyl", "CCC(C)C"],
  ["vinyl", "C=C"],
  ["allyl", "CC=C"],
  ["phenyl", "c9ccccc9"],
  ["benzyl", "Cc9ccccc9"],
]);

/** Substituent prefixes of substitutive names, longest first so "isopropyl" wins over "propyl". */
const SUBSTITUENTS: readonly (readonly [prefix: string, smiles: string])[] = [
  ["tert-butyl", "C(C)(C)C"],
  ["isopropyl", "C(C)C"],
  ["hydroxy", "O"],
  ["chloro", "Cl"],
  ["fluoro", "F"],
  ["methyl", "C"],
  ["propyl", "CCC"],
  ["phenyl", "c9ccccc9"],
  ["amino", "N"],
  ["bromo", "Br"],
  ["butyl", "CCCC"],
  ["ethyl", "CC"],
  ["nitro", "[N+](=O)[O-]"],
  ["iodo", "I"],
];

const HALIDES: ReadonlyMap<string, string> = new Map([
  ["fluoride", "F"],
  ["chloride", "Cl"],
  ["bromide", "Br"],
  ["iodide", "I"],
]);

/** Acyl groups of aromatic acids whose esters keep the old name, written from the carbonyl carbon. */
const AROMATIC_ACYL_GROUPS: ReadonlyMap<string, string> = new Map([
  ["benzoate", "c1ccccc1"],
  ["salicylate", "c1ccccc1O"],
]);

/** Older acid names whose esters keep them: "ethyl acetate" is ethyl ethanoate. */
const TRIVIAL_ACID_STEMS: ReadonlyMap<string, number> = new Map([
  ["formate", 1],
  ["acetate", 2],
  ["propionate", 3],
  ["butyrate", 4],
]);

const LOCANTS = /^(\d+(?:,\d+)*)-/;
const SUFFIX = /^(e)?(?:-(\d+(?:,\d+)*)-)?(di|tri|tetra)?(ol|al|one|amine|amide|nitrile|oic|oate)$/;
const UNSATURATION = /^(a)?(?:-(\d+(?:,\d+)*)-)?(di|tri)?(en|yn)/;

type Suffix = "ol" | "al" | "one" | "amine" | "amide" | "nitrile" | "oic" | "oate";

interface Group {
  readonly order: number;
  readonly smiles: string;
}

/** The SMILES for a lower-case, single-spaced organic name, or undefined. */
export function smilesForOrganicName(name: string): string | undefined {
  // Every such name holds a chain root, an alkyl group or benzene; most words hold none.
  if (name.length < 5 || name.length > 80) return undefined;
  const words = name.split(" ");
  if (words.length === 1) return aminesByClass(words[0]) ?? substitutive(words[0]);
  const last = words[words.length - 1];
  if (words.length === 2) {
    const [first] = words;
    if (last === "acid") return first.endsWith("oic") ? substitutive(first, "") : undefined;
    const alkyl = ALKYL_GROUPS.get(first);
    if (last === "alcohol") return alkyl && `O${alkyl}`;
    const halogen = HALIDES.get(last);
    if (halogen !== undefined) return alkyl && `${halogen}${alkyl}`;
    if (last === "ether") return dialkyl(first);
    if (alkyl === undefined) return undefined;
    const trivial = TRIVIAL_ACID_STEMS.get(last);
    if (trivial !== undefined) return chainSmiles(trivial, false, [], [], [{ position: 1, suffix: "oate" }], alkyl);
    const aromatic = AROMATIC_ACYL_GROUPS.get(last);
    if (aromatic !== undefined) return `C(=O)(O${alkyl})${aromatic}`;
    return last.endsWith("oate") ? substitutive(last, alkyl) : undefined;
  }
  if (words.length === 3 && last === "ether") {
    const first = ALKYL_GROUPS.get(words[0]);
    const second = ALKYL_GROUPS.get(words[1]);
    return first && second && `O(${first})${second}`;
  }
  return undefined;
}

/** "diethyl" -> the ether CCOCC. */
function dialkyl(word: string): string | undefined {
  if (!word.startsWith("di")) return undefined;
  const alkyl = ALKYL_GROUPS.get(word.slice(2));
  return alkyl && `O(${alkyl})${alkyl}`;
}

/** "ethylamine", "dimethylamine", "triethylamine": alkyl groups on one nitrogen. */
function aminesByClass(word: string): string | undefined {
  if (!word.endsWith("amine")) return undefined;
  let stem = word.slice(0, -"amine".length);
  let count = 1;
  if (stem.startsWith("tri")) [stem, count] = [stem.slice(3), 3];
  else if (stem.startsWith("di")) [stem, count] = [stem.slice(2), 2];
  const alkyl = ALKYL_GROUPS.get(stem);
  if (alkyl === undefined) return undefined;
  return `N${`(${alkyl})`.repeat(count - 1)}${alkyl}`;
}

interface Substituent {
  readonly locants: readonly number[] | undefined;
  readonly count: number;
  readonly smiles: string;
}

interface SuffixAt {
  readonly position: number;
  readonly suffix: Suffix;
}

interface Unsaturation {
  readonly position: number;
  readonly order: number;
}

/**
 * A one-word substitutive name; `acid` is "" for the first word of "... acid" and an alkyl SMILES
 * for the acid part of an ester, undefined for a word that is a name on its own.
 */
function substitutive(word: string, acid?: string): string | undefined {
  let position = 0;
  let straight = false;
  if (word.startsWith("n-")) {
    position = 2;
    straight = true;
  }
  const substituents: Substituent[] = [];
  let leadingLocants: number[] | undefined;
  for (;;) {
    const locantMatch = LOCANTS.exec(word.slice(position));
    const afterLocants = locantMatch ? position + locantMatch[0].length : position;
    const substituent = substituentAt(word, afterLocants);
    if (substituent === undefined) {
      if (locantMatch) {
        leadingLocants = locantsOf(locantMatch[1]);
        position = afterLocants;
      }
      break;
    }
    const locants = locantMatch ? locantsOf(locantMatch[1]) : undefined;
    if (locants !== undefined && locants.length !== substituent.count) return undefined;
    substituents.push({ locants, count: substituent.count, smiles: substituent.smiles });
    position = substituent.end;
    if (word[position] === "-" && /\d/.test(word[position + 1] ?? "")) position++;
  }
  if (straight && substituents.length > 0) return undefined;

  if (word.slice(position) === "benzene") {
    return acid === undefined && leadingLocants === undefined ? benzeneSmiles(substituents) : undefined;
  }
  const cyclic = word.startsWith("cyclo", position);
  if (cyclic) position += "cyclo".length;
  const carbons = stemAt(word, position);
  if (carbons === 0) return undefined;
  position += STEMS[carbons - 1].length;
  if (cyclic && carbons < 3) return undefined;

  let rest = word.slice(position);
  const unsaturations: Unsaturation[] = [];
  if (rest.startsWith("an")) {
    rest = rest.slice(2);
  } else {
    const match = UNSATURATION.exec(rest);
    if (!match) return undefined;
    const count = match[3] === "tri" ? 3 : match[3] === "di" ? 2 : 1;
    const order = match[4] === "yn" ? 3 : 2;
    let locants = match[2] === undefined ? undefined : locantsOf(match[2]);
    rest = rest.slice(match[0].length);
    if (locants === undefined && rest === "e" && leadingLocants !== undefined) {
      locants = leadingLocants;
      leadingLocants = undefined;
    }
    locants ??= carbons <= 3 || cyclic ? (count === 1 ? [1] : undefined) : undefined;
    if (locants === undefined || locants.length !== count) return undefined;
    for (const locant of locants) unsaturations.push({ position: locant, order });
  }

  const suffixes: SuffixAt[] = [];
  if (rest !== "e") {
    const match = SUFFIX.exec(rest);
    if (!match) return undefined;
    const suffix = match[4] as Suffix;
    if ((suffix === "oic") !== (acid === "") || (suffix === "oate") !== (acid !== undefined && acid !== "")) return undefined;
    const count = match[3] === "tetra" ? 4 : match[3] === "tri" ? 3 : match[3] === "di" ? 2 : 1;
    let locants = match[2] === undefined ? leadingLocants : locantsOf(match[2]);
    if (match[2] !== undefined && leadingLocants !== undefined) return undefined;
    leadingLocants = undefined;
    locants ??= defaultSuffixLocants(suffix, count, carbons, cyclic);
    if (locants === undefined || locants.length !== count) return undefined;
    for (const locant of locants) suffixes.push({ position: locant, suffix });
  } else if (acid !== undefined) {
    return undefined;
  }
  if (leadingLocants !== undefined) return undefined;

  // Substituents without locants only where every place is alike: one carbon, or a single group on
  // two carbons or a ring with nothing else on it.
  const placed: Substituent[] = [];
  for (const substituent of substituents) {
    if (substituent.locants !== undefined) {
      placed.push(substituent);
      continue;
    }
    const alone = substituents.length === 1 && substituent.count === 1 && suffixes.length === 0;
    if (carbons === 1) placed.push({ ...substituent, locants: new Array<number>(substituent.count).fill(1) });
    else if (alone && (carbons === 2 || (cyclic && unsaturations.length === 0))) placed.push({ ...substituent, locants: [1] });
    else return undefined;
  }
  return chainSmiles(carbons, cyclic, unsaturations, placed, suffixes, acid);
}

function substituentAt(word: string, start: number): { count: number; smiles: string; end: number } | undefined {
  for (const [prefix, count] of [...MULTIPLIERS, ["", 1] as const]) {
    if (!word.startsWith(prefix, start)) continue;
    const at = start + prefix.length;
    for (const [name, smiles] of SUBSTITUENTS) {
      if (word.startsWith(name, at)) return { count, smiles, end: at + name.length };
    }
  }
  return undefined;
}

function stemAt(word: string, start: number): number {
  let best = 0;
  STEMS.forEach((stem, index) => {
    if (word.startsWith(stem, start) && (best === 0 || stem.length > STEMS[best - 1].length)) best = index + 1;
  });
  return best;
}

function locantsOf(text: string): number[] {
  return text.split(",").map(Number);
}

function defaultSuffixLocants(suffix: Suffix, count: number, carbons: number, cyclic: boolean): number[] | undefined {
  if (suffix === "ol" || suffix === "amine") return count === 1 && (carbons <= 2 || cyclic) ? [1] : undefined;
  if (suffix === "one") {
    if (count !== 1) return undefined;
    if (cyclic) return [1];
    return carbons === 3 || carbons === 4 ? [2] : undefined;
  }
  if (cyclic) return undefined;
  if (count === 1) return [1];
  return count === 2 && carbons > 1 ? [1, carbons] : undefined;
}

const TERMINAL: ReadonlySet<Suffix> = new Set(["al", "oic", "oate", "amide", "nitrile"]);

function suffixGroups(suffix: Suffix, esterAlkyl: string | undefined): Group[] {
  switch (suffix) {
    case "ol":
      return [{ order: 1, smiles: "O" }];
    case "amine":
      return [{ order: 1, smiles: "N" }];
    case "al":
    case "one":
      return [{ order: 2, smiles: "O" }];
    case "oic":
      return [
        { order: 2, smiles: "O" },
        { order: 1, smiles: "O" },
      ];
    case "oate":
      return [
        { order: 2, smiles: "O" },
        { order: 1, smiles: `O${esterAlkyl ?? ""}` },
      ];
    case "amide":
      return [
        { order: 2, smiles: "O" },
        { order: 1, smiles: "N" },
      ];
    case "nitrile":
      return [{ order: 3, smiles: "N" }];
  }
}

/** The chain (or ring) written out, after checking every locant and every carbon's four bonds. */
function chainSmiles(
  carbons: number,
  cyclic: boolean,
  unsaturations: readonly Unsaturation[],
  substituents: readonly Substituent[],
  suffixes: readonly SuffixAt[],
  esterAlkyl: string | undefined,
): string | undefined {
  const bondAfter = new Array<number>(carbons + 1).fill(1);
  const bonds = new Array<number>(carbons + 1).fill(0);
  const groups: Group[][] = Array.from({ length: carbons + 1 }, () => []);
  const links = cyclic ? carbons : carbons - 1;
  for (let index = 1; index <= links; index++) {
    bonds[index]++;
    bonds[index === carbons ? 1 : index + 1]++;
  }
  for (const { position, order } of unsaturations) {
    if (position < 1 || position > links || bondAfter[position] !== 1) return undefined;
    bondAfter[position] = order;
    bonds[position] += order - 1;
    bonds[position === carbons ? 1 : position + 1] += order - 1;
  }
  const place = (position: number, group: Group): boolean => {
    if (position < 1 || position > carbons) return false;
    groups[position].push(group);
    bonds[position] += group.order;
    return true;
  };
  for (const { position, suffix } of suffixes) {
    const terminal = position === 1 || position === carbons;
    if (TERMINAL.has(suffix) && !terminal) return undefined;
    // a ketone at a chain end is an aldehyde
    if (suffix === "one" && terminal && !cyclic) return undefined;
    for (const group of suffixGroups(suffix, esterAlkyl)) if (!place(position, group)) return undefined;
  }
  for (const substituent of substituents) {
    for (const locant of substituent.locants ?? []) if (!place(locant, { order: 1, smiles: substituent.smiles })) return undefined;
  }
  if (bonds.some((count) => count > 4)) return undefined;

  let smiles = "";
  for (let index = 1; index <= carbons; index++) {
    if (index > 1) smiles += bondText(bondAfter[index - 1]);
    smiles += "C";
    if (cyclic && index === 1) smiles += "1";
    if (cyclic && index === carbons) smiles += `${bondText(bondAfter[carbons])}1`;
    for (const group of groups[index]) smiles += `(${bondText(group.order)}${group.smiles})`;
  }
  return smiles;
}

function benzeneSmiles(substituents: readonly Substituent[]): string | undefined {
  if (substituents.length === 0) return undefined;
  const groups: string[][] = Array.from({ length: 7 }, () => []);
  const alone = substituents.length === 1 && substituents[0].count === 1;
  for (const substituent of substituents) {
    const locants = substituent.locants ?? (alone ? [1] : undefined);
    if (locants === undefined) return undefined;
    for (const locant of locants) {
      if (locant < 1 || locant > 6 || groups[locant].length > 0) return undefined;
      groups[locant].push(substituent.smiles);
    }
  }
  let smiles = "";
  for (let index = 1; index <= 6; index++) {
    // ring-closure digits come straight after their atom, before its branches
    smiles += index === 1 || index === 6 ? "c1" : "c";
    for (const group of groups[index]) smiles += `(${group})`;
  }
  return smiles;
}

function bondText(order: number): string {
  return order === 3 ? "#" : order === 2 ? "=" : "";
}

/** Alkyl group names, for the words that may begin a name in prose ("ethyl acetate"). */
export function alkylGroupNames(): readonly string[] {
  return [...ALKYL_GROUPS.keys()];
}
