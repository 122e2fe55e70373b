/**
 * The words people write around a reagent's name for its grade, form and strength ("Hydrochloric
 * acid, 37%", "ammonia solution", "dilute nitric acid", "sulfuric acid (conc.)"): they describe
 * the bottle, not the species, so a reader may set them aside.
 */

// common practice: words inventories and handouts write after a name for grade, form and strength
const QUALIFIER_WORDS: ReadonlySet<string> = new Set(
  (
    "solution soln aqueous aq anhydrous anhyd dilute dil concentrated conc fuming glacial absolute abs " +
    "reagent grade acs ar lr gr tech technical analytical laboratory lab pure puriss purified extra hplc " +
    "crystals crystal crystalline powder powdered granules granular pellets pellet flakes flake beads turnings " +
    "filings shot wire foil ribbon chips lumps pieces sticks rod rods sheet dust mossy metal gas liquid solid " +
    "compressed liquefied cylinder bottle standard standardised standardized volumetric stock hydrate " +
    "hydrated in water approx approximately ca min max for analysis under oil stabilised stabilized dry dried " +
    "saturated sat satd fine coarse mesh approx. tablets"
  ).split(" "),
);

// common practice: the qualifiers that are also written before the name ("dilute nitric acid",
// "glacial acetic acid", "conc. HCl")
const LEADING_QUALIFIER_WORDS: ReadonlySet<string> = new Set(
  "dilute dil concentrated conc aqueous aq fuming glacial anhydrous anhyd saturated sat satd absolute abs".split(" "),
);

// common practice: strengths as labels write them ("2 M", "37%", "0.1 mol/L", "30% w/w")
const UNIT_WORDS: ReadonlySet<string> = new Set(
  "% m mm n mol l g kg mg ml ppm w/w w/v v/v wt wt% vol% mol/l mol/dm3 mol/dm-3 dm-3 dm3 l-1 g/l mg/l".split(" "),
);
const STRENGTH = /^[~≈≥≤<>]?\d+(?:[.,]\d+)?(?:%|m|mm|n|ppm)?$/;

// common practice: label words and strengths that say the bottle holds a solution ("sodium chloride
// solution", "aqueous ammonia", "0.1 M", "saturated"); a purity ("99%") or a form ("crystals") does not
const DISSOLVED_WORDS: ReadonlySet<string> = new Set(
  "solution soln aqueous aq water dilute dil saturated sat satd standard standardised standardized volumetric m mm n mol/l mol/dm3 mol/dm-3 w/v g/l mg/l".split(
    " ",
  ),
);
const MOLAR_STRENGTH = /^\d+(?:[.,]\d+)?(?:m|mm|n)$/;

/** Whether qualifiers say the reagent is a solution: a word such as "solution" or a molar strength. */
function saysDissolved(qualifiers: string): boolean {
  return qualifiers
    .toLowerCase()
    .split(/[\s,;:()[\]]+/)
    .some((token) => {
      const word = token.endsWith(".") ? token.slice(0, -1) : token;
      return DISSOLVED_WORDS.has(word) || MOLAR_STRENGTH.test(word);
    });
}
/** A bracket that is part of a name or charge: "(III)", "(2+)". */
const NAMING_BRACKET = /^\s*(?:[ivx]+|\d*[+\-\u2212]|[+\-\u2212]\d*)\s*$/i;

function isQualifierToken(token: string): boolean {
  const word = token.endsWith(".") ? token.slice(0, -1) : token;
  return QUALIFIER_WORDS.has(word) || UNIT_WORDS.has(word) || STRENGTH.test(word);
}

/** Words, strengths and separators only; every token must be a qualifier. */
function isQualifierRun(text: string): boolean {
  for (const token of text.toLowerCase().split(/[\s,;:]+/)) {
    if (token.length === 0 || /^[-\u2013\u2014/&+]+$/.test(token)) continue;
    if (!isQualifierToken(token)) return false;
  }
  return true;
}

/**
 * Whether the text after a name in a table cell says only its grade, form or strength. A bracket
 * is set aside whatever it holds (a synonym, "(acetone)"), unless it is part of a name or charge.
 */
export function isQualifierTail(tail: string): boolean {
  let naming = false;
  const unbracketed = tail.replace(/[([]([^)\]]*)[)\]]/g, (_, inner: string) => {
    if (NAMING_BRACKET.test(inner)) naming = true;
    return " ";
  });
  if (naming || /[()[\]]/.test(unbracketed)) return false;
  return isQualifierRun(unbracketed);
}

/** Whether a tail holds qualifiers only, brackets included: "(conc.)" is one, "(acetone)" is not. */
function isStrictQualifierTail(tail: string): boolean {
  let bracketsHoldQualifiers = true;
  const unbracketed = tail.replace(/[([]([^)\]]*)[)\]]/g, (_, inner: string) => {
    if (!isQualifierRun(inner) || inner.trim() === "") bracketsHoldQualifiers = false;
    return " ";
  });
  return bracketsHoldQualifiers && !/[()[\]]/.test(unbracketed) && isQualifierRun(unbracketed);
}

/** A species written with qualifiers around it, and what they say. */
export interface QualifiedSpecies {
  /** The text of the species alone. */
  readonly species: string;
  /** The qualifiers as written, before and after the species, joined by a space. */
  readonly qualifiers: string;
  /** The qualifiers say the reagent is a solution ("solution", "aq", "0.1 M"). */
  readonly dissolved: boolean;
}

/**
 * The species inside a reagent's label, when qualifiers stand before or after it ("dilute nitric
 * acid", "hydrochloric acid, 37%", "ammonia solution"); undefined when there are none, or nothing
 * else. Whether the rest is a species is the reader's to say.
 */
export function splitReagentQualifiers(text: string): QualifiedSpecies | undefined {
  let start = 0;
  let end = text.length;
  while (start < end && /\s/.test(text[start])) start++;
  while (end > start && /\s/.test(text[end - 1])) end--;
  const leading: string[] = [];
  for (;;) {
    const word = /^([A-Za-z]+)(\.?)(?:\s+|(?<=\.))/.exec(text.slice(start, end));
    if (word === null || !LEADING_QUALIFIER_WORDS.has(word[1].toLowerCase())) break;
    leading.push(text.slice(start, start + word[1].length + word[2].length));
    start += word[0].length;
    while (start < end && /\s/.test(text[start])) start++;
  }
  // The longest run of qualifiers at the end: every cut after a space, comma or before a bracket.
  let cut = end;
  for (let position = start + 1; position < end; position++) {
    const character = text[position];
    const boundary = character === "(" || character === "[" || (/[\s,;]/.test(character) && !/[\s,;]/.test(text[position - 1]));
    if (boundary && isStrictQualifierTail(text.slice(position, end))) {
      cut = position;
      break;
    }
  }
  let speciesEnd = cut;
  while (speciesEnd > start && /[\s,;]/.test(text[speciesEnd - 1])) speciesEnd--;
  const trailing = text.slice(cut, end).replace(/^[\s,;]+/, "");
  if (speciesEnd <= start || (leading.length === 0 && trailing === "")) return undefined;
  const qualifiers = [...leading, trailing].filter((part) => part !== "").join(" ");
  return { species: text.slice(start, speciesEnd), qualifiers, dissolved: saysDissolved(qualifiers) };
}
