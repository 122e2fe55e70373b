/**
 * Column headers in German, French and Spanish, as lab exports and course tables in those
 * languages write them ("Summenformel", "freie Elektronenpaare", "Polarität", "géométrie",
 * "electrones de valencia"). Their value cells are in the same language, so a column remembers it:
 * the checks read its words and write their fixes in it.
 *
 * General words for the row's subject ("Verbindung", "Stoff", "molécule", "compuesto") mean a name
 * column here, not a species column: they mostly hold names lonepair does not know in these
 * languages, and an unread name is no mistake where an unread formula would be.
 */
import type { ColumnMeaning, TableLanguage } from "../types";

/** A header's meaning and the language it is written in. */
export interface ForeignHeader {
  readonly meaning: ColumnMeaning;
  readonly language: TableLanguage;
}

// Keys are normalised as `normalizeHeader` leaves them: lower case, single spaces, units
// dropped, and German umlauts and ß spelt out (ae, oe, ue, ss), so both spellings meet.
const GERMAN: Readonly<Partial<Record<ColumnMeaning, readonly string[]>>> = {
  species: ["summenformel", "formel", "molekuelformel", "molekularformel", "chemische formel", "verhaeltnisformel", "ionenformel"],
  name: [
    "bezeichnung",
    "stoffname",
    "stoff",
    "substanz",
    "verbindung",
    "molekuel",
    "teilchen",
    "spezies",
    "trivialname",
    "chemische bezeichnung",
    "systematischer name",
    "molekuel ion",
    "molekuel oder ion",
    "reagenz",
    "chemikalie",
  ],
  constituent: ["kation", "kationen", "anionen"],
  charge: ["ladung", "ionenladung", "gesamtladung", "nettoladung", "ladungszahl"],
  valenceElectrons: [
    "valenzelektronen",
    "anzahl valenzelektronen",
    "anzahl der valenzelektronen",
    "valenzelektronen gesamt",
    "gesamtzahl valenzelektronen",
    "gesamtzahl der valenzelektronen",
    "zahl der valenzelektronen",
  ],
  lonePairs: [
    "freie elektronenpaare",
    "freie elektronenpaare am zentralatom",
    "freie elektronenpaare zentralatom",
    "freie ep",
    "freie ep am zentralatom",
    "freie paare",
    "nichtbindende elektronenpaare",
    "nichtbindende paare",
    "einsame elektronenpaare",
    "anzahl freier elektronenpaare",
    "anzahl der freien elektronenpaare",
  ],
  electronGeometry: [
    "elektronenpaargeometrie",
    "elektronengeometrie",
    "elektronenpaaranordnung",
    "anordnung der elektronenpaare",
    "ep geometrie",
  ],
  molecularGeometry: [
    "molekuelgeometrie",
    "geometrie",
    "molekuelform",
    "molekuelstruktur",
    "raumstruktur",
    "raeumlicher bau",
    "molekuelgestalt",
  ],
  bondAngle: ["bindungswinkel", "winkel"],
  hybridization: ["hybridisierung", "hybridisierung des zentralatoms", "hybridisierung zentralatom"],
  polarity: ["polaritaet", "polar unpolar", "dipol", "dipolmolekuel", "polaritaet des molekuels"],
  irBands: ["ir banden", "anzahl ir banden", "anzahl der ir banden"],
  ramanBands: ["raman banden", "anzahl raman banden", "anzahl der raman banden"],
  vibrationalModes: ["normalschwingungen", "anzahl normalschwingungen", "anzahl der normalschwingungen", "schwingungsfreiheitsgrade"],
};

const FRENCH: Readonly<Partial<Record<ColumnMeaning, readonly string[]>>> = {
  species: ["formule", "formule brute", "formule chimique", "formule moléculaire"],
  name: ["nom", "composé", "espèce", "molécule", "nom du composé", "espèce chimique", "molécule ou ion"],
  valenceElectrons: ["électrons de valence", "nombre d'électrons de valence", "nombre d électrons de valence"],
  lonePairs: ["doublets non liants", "doublets libres", "paires libres", "doublets non liants de l'atome central"],
  electronGeometry: ["géométrie électronique"],
  molecularGeometry: ["géométrie", "géométrie moléculaire", "forme de la molécule"],
  bondAngle: ["angle de liaison", "angles de liaison"],
  hybridization: ["hybridation"],
  polarity: ["polarité"],
};

const SPANISH: Readonly<Partial<Record<ColumnMeaning, readonly string[]>>> = {
  species: ["fórmula", "fórmula molecular", "fórmula química"],
  name: ["nombre", "compuesto", "especie", "molécula", "sustancia", "molécula o ion"],
  charge: ["carga"],
  valenceElectrons: ["electrones de valencia", "número de electrones de valencia"],
  lonePairs: ["pares libres", "pares solitarios", "pares de electrones libres", "pares no enlazantes"],
  electronGeometry: ["geometría electrónica"],
  molecularGeometry: ["geometría", "geometría molecular", "forma molecular"],
  bondAngle: ["ángulo de enlace", "ángulos de enlace"],
  hybridization: ["hibridación"],
  polarity: ["polaridad"],
};

/** Normalised header -> meaning and language. */
export const FOREIGN_HEADERS: ReadonlyMap<string, ForeignHeader> = new Map([
  ...entries(GERMAN, "de"),
  ...entries(FRENCH, "fr"),
  ...entries(SPANISH, "es"),
]);

function entries(headers: Readonly<Partial<Record<ColumnMeaning, readonly string[]>>>, language: TableLanguage): [string, ForeignHeader][] {
  return Object.entries(headers).flatMap(([meaning, words]) =>
    (words ?? []).map((word): [string, ForeignHeader] => [word, { meaning: meaning as ColumnMeaning, language }]),
  );
}

/** Longer German headers that still say it plainly: "freie Elektronenpaare (am S)", "Hybridisierung von S". */
export function germanHeaderByPrefix(normalized: string): ForeignHeader | undefined {
  for (const [prefix, meaning] of GERMAN_PREFIXES) {
    if (normalized.startsWith(prefix)) return { meaning, language: "de" };
  }
  return undefined;
}

const GERMAN_PREFIXES: readonly (readonly [string, ColumnMeaning])[] = [
  ["freie elektronenpaare ", "lonePairs"],
  ["freie ep ", "lonePairs"],
  ["valenzelektronen ", "valenceElectrons"],
  ["hybridisierung ", "hybridization"],
  ["bindungswinkel ", "bondAngle"],
  ["molekuelgeometrie ", "molecularGeometry"],
];
